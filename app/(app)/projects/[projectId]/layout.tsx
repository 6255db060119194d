import type { ReactNode } from 'react';
import { ProjectNav } from '@/components/projects/project-nav';
import { DecimalMarkScope } from '@/components/ui/decimal-mark';
import { RoleBadge } from '@/components/ui/role-badge';
import { requireProjectPage } from '@/lib/auth/project-page';

export default async function ProjectLayout({
  children,
  params,
}: {
  children: ReactNode;
  params: Promise<{ projectId: string }>;
}) {
  const { project, role } = await requireProjectPage(params);
  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-2xl font-semibold text-creek-900">{project.name}</h1>
        <RoleBadge role={role} />
        {project.archived && <span className="rounded bg-stone-100 px-2 py-0.5 text-xs text-stone-700">Archived</span>}
      </div>
      <ProjectNav projectId={project.id} role={role} />
      <DecimalMarkScope mark={project.decimalMark}>{children}</DecimalMarkScope>
    </div>
  );
}
