'use client';

import { useMemo } from 'react';
import { SvgNodeView } from '@/components/lines/svg-node-view';
import { buildNetworkScene } from '@/lib/chart/network-scene';
import { layoutNetwork } from '@/lib/network/layout';
import type { SolveRunResult } from '@/lib/network/run-result';
import type { NetworkView } from '@/lib/network/view';
import type { NetworkPin } from '@/lib/review/threads';
import type { UnitSystem } from '@/lib/units';

export interface RevisionSchematicProps {
  view: NetworkView;
  /** The peak-hour solve the revision kept, if it solved. */
  solve: SolveRunResult | null;
  units: UnitSystem;
  pins: readonly NetworkPin[];
  selectedPartId: string | null;
  /** A node or link clicked (null: the background), or a comment pin clicked. */
  onPickPart: (partId: string | null) => void;
  onPickPin: (commentId: string) => void;
}

/**
 * A revision's network as it was frozen, drawn by the one schematic scene, with comment pins; click a part to pin a
 * comment on it.
 */
export function RevisionSchematic({
  view,
  solve,
  units,
  pins,
  selectedPartId,
  onPickPart,
  onPickPin,
}: RevisionSchematicProps) {
  const layout = useMemo(() => layoutNetwork(view), [view]);
  const scene = useMemo(
    () => buildNetworkScene({ view, layout, solve, units, width: 960, height: 540, selectedId: selectedPartId, pins }),
    [view, layout, solve, units, selectedPartId, pins],
  );
  return (
    <div
      className="overflow-hidden rounded-md border border-creek-100"
      data-testid="revision-schematic"
      onClick={(event) => {
        const pin = (event.target as Element).closest('[data-comment-id]');
        if (pin) return onPickPin(pin.getAttribute('data-comment-id')!);
        const part = (event.target as Element).closest('[data-node-id],[data-link-id]');
        onPickPart(part?.getAttribute('data-node-id') ?? part?.getAttribute('data-link-id') ?? null);
      }}
    >
      <SvgNodeView node={scene} />
    </div>
  );
}
