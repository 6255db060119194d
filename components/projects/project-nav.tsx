'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';
import { can, type Permission } from '@/lib/permissions';
import type { Role } from '@/lib/roles';

/**
 * The sections of a project. Each capability adds its one entry here when its pages exist;
 * `path` is relative to /projects/[projectId].
 */
export const PROJECT_SECTIONS: { path: string; label: string; needs?: Permission }[] = [
  { path: '', label: 'Overview' },
  { path: '/routes', label: 'Survey routes', needs: 'design.view' },
  { path: '/lines', label: 'Lines', needs: 'design.view' },
  { path: '/lift', label: 'Lift & storage', needs: 'design.view' },
  { path: '/network', label: 'Network', needs: 'design.view' },
  { path: '/reviews', label: 'Reviews' },
  { path: '/activity', label: 'Activity', needs: 'design.view' },
];

export function ProjectNav({ projectId, role }: { projectId: string; role: Role }) {
  const pathname = usePathname();
  const base = `/projects/${projectId}`;
  return (
    <nav
      aria-label="Project sections"
      className="-mx-1 flex gap-1 overflow-x-auto border-b border-creek-100 pb-px text-sm"
    >
      {PROJECT_SECTIONS.filter((s) => !s.needs || can(role, s.needs)).map((s) => {
        const href = `${base}${s.path}`;
        const active = s.path === '' ? pathname === base : pathname.startsWith(href);
        return (
          <Link
            key={s.path}
            href={href}
            aria-current={active ? 'page' : undefined}
            className={`whitespace-nowrap rounded-t-md px-3 py-2 ${active ? 'border-b-2 border-creek-700 font-semibold text-creek-900' : 'text-creek-700 hover:bg-creek-50'}`}
          >
            {s.label}
          </Link>
        );
      })}
    </nav>
  );
}
