'use client';

import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { FormMessage } from '@/components/ui/form-message';
import { HeadCell, TableFrame } from '@/components/ui/table-frame';
import { RoleBadge } from '@/components/ui/role-badge';
import { teamInvitationsQuery, useRevokeInvitation } from '@/lib/queries/invitations';
import { TableSkeleton } from '@/components/ui/widget-skeletons';

/** Invitations sent and not yet accepted; an owner withdraws one and its link stops working. */
export function InvitationsTable({ teamId }: { teamId: string }) {
  const { data: invitations } = useQuery(teamInvitationsQuery(teamId));
  const revoke = useRevokeInvitation(teamId);
  const [error, setError] = useState<string | null>(null);
  if (!invitations) return <InvitationsTableSkeleton />;

  if (invitations.length === 0)
    return <p className="text-sm text-creek-600">No invitation is waiting for an answer.</p>;
  return (
    <div className="space-y-2">
      <FormMessage message={error} />
      <TableFrame
        head={
          <>
            <HeadCell>E-mail</HeadCell>
            <HeadCell>Role</HeadCell>
            <HeadCell>Sent by</HeadCell>
            <HeadCell>Link works until</HeadCell>
            <HeadCell>
              <span className="sr-only">Actions</span>
            </HeadCell>
          </>
        }
      >
        {invitations.map((i) => (
          <tr key={i.id} className="border-t border-creek-50">
            <td className="px-4 py-2.5 font-medium text-creek-900">{i.email}</td>
            <td className="px-4 py-2.5">
              <RoleBadge role={i.role} />
            </td>
            <td className="px-4 py-2.5 text-creek-700">{i.invitedBy ?? '—'}</td>
            <td className="px-4 py-2.5 text-creek-700">
              {i.expired ? <span className="text-clay-600">Expired</span> : i.expiresAt.slice(0, 10)}
            </td>
            <td className="px-4 py-2.5 text-right">
              <button
                type="button"
                className="text-sm text-clay-600 underline"
                aria-label={`Withdraw the invitation of ${i.email}`}
                onClick={() => {
                  setError(null);
                  revoke.mutate(i.id, { onError: (err) => setError(err.message) });
                }}
              >
                Withdraw
              </button>
            </td>
          </tr>
        ))}
      </TableFrame>
    </div>
  );
}

export function InvitationsTableSkeleton() {
  return <TableSkeleton label="Loading invitations" rows={1} />;
}
