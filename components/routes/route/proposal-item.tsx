import { Button } from '@/components/ui/button';
import { formatQuantity } from '@/lib/units';
import type { RouteProposal } from '@/lib/routes/types';
import type { UnitSystem } from '@/lib/units';

const KIND_LABELS: Record<RouteProposal['kind'], string> = {
  'grade-spike': 'Spike',
  'median-outlier': 'Outlier',
  duplicate: 'Duplicate',
  'chainage-backwards': 'Out of order',
  'time-backwards': 'Out of order (time)',
  smoothing: 'Smoothing',
  'benchmark-offset': 'Benchmark offset',
};

export interface ProposalItemProps {
  proposal: RouteProposal;
  chainageM: number | undefined;
  units: UnitSystem;
  editable: boolean;
  disabled: boolean;
  onDecide: (decision: 'accept' | 'reject') => void;
  onShow: () => void;
}

/** One proposed change, said plainly, with its accept and reject buttons. */
export function ProposalItem({
  proposal: p,
  chainageM,
  units,
  editable,
  disabled,
  onDecide,
  onShow,
}: ProposalItemProps) {
  const n = p.index + 1;
  const change =
    p.field === 'deleted'
      ? 'leave the point out of the cleaned profile'
      : `${formatQuantity('length', p.from, units, 2)} → ${formatQuantity('length', p.to, units, 2)}`;
  return (
    <li className="flex flex-wrap items-center gap-x-3 gap-y-1 border-t border-creek-50 py-2 text-sm" data-proposal={n}>
      <span className="rounded bg-clay-50 px-1.5 py-0.5 text-xs font-medium text-clay-700">{KIND_LABELS[p.kind]}</span>
      <button type="button" onClick={onShow} className="font-medium text-creek-800 underline-offset-2 hover:underline">
        Point {n}
        {chainageM !== undefined ? ` at ${formatQuantity('length', chainageM, units, 0)}` : ''}
      </button>
      <span className="tabular text-creek-900">{change}</span>
      <span className="basis-full text-xs text-creek-600">{p.reason}</span>
      {editable && (
        <span className="flex gap-2">
          <Button
            tone="primary"
            className="px-2.5 py-1"
            disabled={disabled}
            onClick={() => onDecide('accept')}
            aria-label={`Accept the change to point ${n}`}
          >
            Accept
          </Button>
          <Button
            tone="quiet"
            className="px-2.5 py-1"
            disabled={disabled}
            onClick={() => onDecide('reject')}
            aria-label={`Reject the change to point ${n}`}
          >
            Reject
          </Button>
        </span>
      )}
    </li>
  );
}
