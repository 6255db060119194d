'use client';

import { useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { lineNetworkFlowsQuery } from '@/lib/queries/network';
import { formatQuantity, type UnitSystem } from '@/lib/units';

/** Under the long profile: the flow in each piece of the line from the network solve (it drops at every take-off). */
export function NetworkFlowsStrip({ lineId, projectId, units }: { lineId: string; projectId: string; units: UnitSystem }) {
  const { data } = useQuery(lineNetworkFlowsQuery(lineId));
  if (!data) return null;
  return (
    <div className="rounded-md border border-creek-100 bg-creek-50/40 p-3 text-sm" data-testid="network-flows">
      <p className="font-medium text-creek-900">
        Flow along the line, from the <Link className="underline" href={`/projects/${projectId}/network`}>network</Link>
        {data.feed ? ` (fed from ${data.feed.name})` : ''}
      </p>
      {data.solved ? (
        <ol className="mt-1 flex flex-wrap gap-x-4 gap-y-1">
          {data.pieces.map((piece, index) => {
            const takeOff = data.takeOffs.find((t) => Math.abs(t.chainageM - (piece.fromChainageM ?? -1)) < 1e-6);
            return (
              <li key={index} className="tabular">
                {takeOff ? <span className="text-creek-600">after {takeOff.name}: </span> : null}
                {formatQuantity('chainage', piece.fromChainageM ?? 0, units)}–{formatQuantity('chainage', piece.toChainageM ?? 0, units)}:{' '}
                <strong>{formatQuantity('designFlow', piece.flowM3s, units)}</strong> in {piece.pipeLabel}
              </li>
            );
          })}
        </ol>
      ) : (
        <p className="mt-1 text-creek-700">Not solved: {data.reason}</p>
      )}
    </div>
  );
}
