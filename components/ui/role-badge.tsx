import { ROLE_LABELS, type Role } from '@/lib/roles';

const COLOURS: Record<Role, string> = {
  owner: 'bg-creek-800 text-white',
  designer: 'bg-creek-100 text-creek-800',
  surveyor: 'bg-moss-100 text-moss-700',
  reviewer: 'bg-ochre-100 text-ochre-700',
  viewer: 'bg-stone-100 text-stone-700',
};

export function RoleBadge({ role }: { role: Role }) {
  return (
    <span className={`inline-block rounded-full px-2 py-0.5 text-xs font-medium ${COLOURS[role]}`}>
      {ROLE_LABELS[role]}
    </span>
  );
}
