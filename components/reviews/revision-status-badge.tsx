import { REVISION_STATUS_LABELS, type RevisionStatus } from '@/lib/review/statuses';

const COLOURS: Record<RevisionStatus, string> = {
  draft: 'bg-stone-100 text-stone-700',
  submitted: 'bg-ochre-100 text-ochre-700',
  'changes-requested': 'bg-clay-100 text-clay-700',
  approved: 'bg-moss-100 text-moss-700',
  issued: 'bg-creek-800 text-white',
  superseded: 'bg-stone-100 text-stone-500 line-through',
};

export function RevisionStatusBadge({ status }: { status: RevisionStatus }) {
  return (
    <span
      data-testid="revision-status"
      data-status={status}
      className={`inline-block rounded-full px-2 py-0.5 text-xs font-medium ${COLOURS[status]}`}
    >
      {REVISION_STATUS_LABELS[status]}
    </span>
  );
}
