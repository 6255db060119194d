'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { can } from '@/lib/permissions';
import { useRevisionAction } from '@/lib/queries/reviews';
import type { RevisionSummary } from '@/lib/review/revision-types';
import { REVISION_ACTIONS, TRANSITIONS, type RevisionAction } from '@/lib/review/transitions';
import type { Role } from '@/lib/roles';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';

/** The review steps open to this person on this revision (the server checks again). */
export function availableActions(
  revision: Pick<RevisionSummary, 'status' | 'createdBy'>,
  role: Role,
  userId: string,
): RevisionAction[] {
  return REVISION_ACTIONS.filter((a) => {
    const rule = TRANSITIONS[a];
    return (
      can(role, rule.permission) &&
      rule.from.includes(revision.status) &&
      !(rule.notByAuthor && revision.createdBy?.id === userId)
    );
  });
}

export function RevisionActions({ revision, role, userId }: { revision: RevisionSummary; role: Role; userId: string }) {
  const router = useRouter();
  const act = useRevisionAction(revision.projectId);
  const [note, setNote] = useState('');
  const [message, setMessage] = useState<string | null>(null);
  const actions = availableActions(revision, role, userId);
  const ownRevisionWaiting =
    can(role, 'review.decide') && revision.status === 'submitted' && revision.createdBy?.id === userId;

  async function run(action: RevisionAction) {
    setMessage(null);
    try {
      await act.mutateAsync({ revisionId: revision.id, action, note });
      setNote('');
      router.refresh();
    } catch (error) {
      setMessage(error instanceof Error ? error.message : 'That step did not go through');
    }
  }

  if (actions.length === 0) {
    return ownRevisionWaiting ? (
      <p className="text-sm text-creek-700">You made this revision, so someone else must review it.</p>
    ) : null;
  }
  return (
    <div className="space-y-2" data-testid="revision-actions">
      {actions.some((a) => TRANSITIONS[a].notByAuthor) && (
        <label className="block text-sm text-creek-800">
          Decision note (optional)
          <textarea
            value={note}
            onChange={(e) => setNote(e.target.value)}
            rows={2}
            className="mt-1 block w-full rounded-md border border-creek-200 px-2 py-1 text-sm"
          />
        </label>
      )}
      <div className="flex flex-wrap gap-2">
        {actions.map((a) => (
          <Button
            key={a}
            tone={a === 'request-changes' ? 'danger' : 'primary'}
            disabled={act.isPending}
            onClick={() => void run(a)}
          >
            {TRANSITIONS[a].label}
          </Button>
        ))}
      </div>
      <FormMessage message={message} />
    </div>
  );
}
