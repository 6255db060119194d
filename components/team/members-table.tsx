'use client';

import { TableFrame } from '@/components/ui/table-frame';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { FormMessage } from '@/components/ui/form-message';
import { useConfirm } from '@/components/ui/confirm-dialog';
import { RoleBadge } from '@/components/ui/role-badge';
import { teamMembersQuery, useChangeRole, useRemoveMember } from '@/lib/queries/members';
import { ROLE_LABELS, ROLES, type Role } from '@/lib/roles';
import { TableSkeleton } from '@/components/ui/widget-skeletons';

interface Props {
  teamId: string;
  manage: boolean;
  selfId: string;
}

export function MembersTable({ teamId, manage, selfId }: Props) {
  const { data: members } = useQuery(teamMembersQuery(teamId));
  const changeRole = useChangeRole(teamId);
  const remove = useRemoveMember(teamId);
  const [error, setError] = useState<string | null>(null);
  const confirm = useConfirm();
  if (!members) return <MembersTableSkeleton />;

  return (
    <div className="space-y-2">
      <FormMessage message={error} />
      <TableFrame
        head={
          <>
            <th scope="col" className="px-4 py-2 font-medium">
              Name
            </th>
            <th scope="col" className="px-4 py-2 font-medium">
              E-mail
            </th>
            <th scope="col" className="px-4 py-2 font-medium">
              Role
            </th>
            {manage && (
              <th scope="col" className="px-4 py-2 font-medium">
                <span className="sr-only">Actions</span>
              </th>
            )}
          </>
        }
      >
        {members.map((m) => (
          <tr key={m.userId} className="border-t border-creek-50">
            <td className="px-4 py-2.5 font-medium text-creek-900">
              {m.name}
              {m.userId === selfId && <span className="ml-1 text-xs text-creek-600">(you)</span>}
            </td>
            <td className="px-4 py-2.5 text-creek-700">
              {m.email ?? <span className="text-creek-500">not shown to clients</span>}
            </td>
            <td className="px-4 py-2.5">
              {manage ? (
                <select
                  aria-label={`Role of ${m.name}`}
                  value={m.role}
                  className="rounded-md border border-creek-200 px-2 py-1"
                  onChange={(e) => {
                    setError(null);
                    changeRole.mutate(
                      { userId: m.userId, role: e.target.value as Role },
                      { onError: (err) => setError(err.message) },
                    );
                  }}
                >
                  {ROLES.map((r) => (
                    <option key={r} value={r}>
                      {ROLE_LABELS[r]}
                    </option>
                  ))}
                </select>
              ) : (
                <RoleBadge role={m.role} />
              )}
            </td>
            {manage && (
              <td className="px-4 py-2.5 text-right">
                <button
                  type="button"
                  className="text-sm text-clay-600 underline"
                  onClick={() => {
                    setError(null);
                    confirm.ask({
                      title: `Remove ${m.name} from the team?`,
                      body: (
                        <p>
                          {m.name} loses access to the team&apos;s projects at once. What they made stays. To bring them
                          back, invite them again.
                        </p>
                      ),
                      confirmLabel: 'Remove from the team',
                      onConfirm: () => remove.mutateAsync(m.userId),
                    });
                  }}
                >
                  Remove
                </button>
              </td>
            )}
          </tr>
        ))}
      </TableFrame>
      {confirm.dialog}
    </div>
  );
}

export function MembersTableSkeleton() {
  return <TableSkeleton label="Loading members" rows={4} />;
}
