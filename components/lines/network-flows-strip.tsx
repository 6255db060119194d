'use client';

import Link from 'next/link';
import type { LineNetworkFlows } from '@/lib/network/line-flows';
import { formatQuantity, type UnitSystem } from '@/lib/units';

/**
 * Under the long profile: what feeds the line in the network and the flow in each piece (it drops at every take-off).
 */
export function NetworkFlowsStrip({
  flows,
  projectId,
  units,
  startUsed,
  flowUsed,
}: {
  flows: LineNetworkFlows | null | undefined;
  projectId: string;
  units: UnitSystem;
  /** Whether the analysis took its start and its flow from the network (lineFeedOf). */
  startUsed: boolean;
  flowUsed: boolean;
}) {
  if (!flows) return null;
  return (
    <div className="rounded-md border border-creek-100 bg-creek-50/40 p-3 text-sm" data-testid="network-flows">
      <p className="font-medium text-creek-900">
        Flow along the line, from the{' '}
        <Link className="underline" href={`/projects/${projectId}/network`}>
          network
        </Link>
        {flows.feed ? ` (fed from ${flows.feed.name})` : ''}
      </p>
      {startUsed && flows.startFrom && (
        <p className="text-creek-700" data-testid="network-start">
          The profile starts at {flows.startFrom}, as the network joins it.
        </p>
      )}
      {flows.solved && flows.schedule ? (
        <>
          <ol className="mt-1 flex flex-wrap gap-x-4 gap-y-1">
            {flows.pieces.map((piece, index) => {
              const takeOff = flows.takeOffs.find((t) => Math.abs(t.chainageM - (piece.fromChainageM ?? -1)) < 1e-6);
              return (
                <li key={index} className="tabular">
                  {takeOff ? <span className="text-creek-600">after {takeOff.name}: </span> : null}
                  {formatQuantity('chainage', piece.fromChainageM ?? 0, units)}–
                  {formatQuantity('chainage', piece.toChainageM ?? 0, units)}:{' '}
                  <strong>{formatQuantity('designFlow', piece.flowM3s, units)}</strong> in {piece.pipeLabel}
                </li>
              );
            })}
          </ol>
          <p className="mt-1 text-xs text-creek-600">
            {flowUsed
              ? 'The profile, its checks and the report use these flows (solved with the pipes as saved when the page opened).'
              : "The profile uses the ram's delivered flow this line asks for; these are the network's flows for comparison."}
          </p>
        </>
      ) : (
        <p className="mt-1 text-creek-700">
          Not solved: {flows.reason ?? 'the network gives no flow for this line'}. The profile uses the line&apos;s own
          design flow.
        </p>
      )}
    </div>
  );
}
