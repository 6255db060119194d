'use client';

import { useQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { SvgNodeView } from '@/components/lines/svg-node-view';
import { LoadError } from '@/components/ui/load-error';
import { Panel } from '@/components/ui/panel';
import { buildNetworkScene } from '@/lib/chart/network-scene';
import { layoutNetwork } from '@/lib/network/layout';
import type { SizeRunResult, SolveRunResult } from '@/lib/network/run-result';
import { networkQuery } from '@/lib/queries/network';
import type { UnitSystem } from '@/lib/units';
import { AddLinkForm, AddNodeForm } from './network-forms';
import { DayView } from './day-view';
import { EditPart } from './edit-part';
import { DemandEditor } from './demand-editor';
import { LinkTable, NodeTable } from './network-tables';
import { NetworkRunPanel } from './network-run-panel';
import { TakeOffPicker } from './take-off-picker';

/** The network page: runs, the schematic, the parts' tables, adding and joining parts, demand per outlet. */
export function NetworkWorkspace({ projectId, units, canEdit }: { projectId: string; units: UnitSystem; canEdit: boolean }) {
  const { data: view, error, refetch } = useQuery(networkQuery(projectId));
  const [selectedId, setSelectedId] = useState<string | null>(null);
  const [showing, setShowing] = useState<'solve' | 'size'>('solve');
  const layout = useMemo(() => (view ? layoutNetwork(view) : null), [view]);
  if (error) return <LoadError what="The network" onRetry={() => void refetch()} />;
  if (!view || !layout) return null;

  const solved = view.runs.solve?.status === 'done' ? (view.runs.solve.result as SolveRunResult) : null;
  const sized = view.runs.size?.status === 'done' ? (view.runs.size.result as SizeRunResult) : null;
  const shown = showing === 'size' && sized?.solution ? sized.solution : solved;
  const scene = buildNetworkScene({ view, layout, solve: shown, units, width: 960, height: 540, selectedId });

  return (
    <div className="space-y-5">
      <NetworkRunPanel projectId={projectId} view={view} units={units} showing={showing} onShow={setShowing} canEdit={canEdit} />
      <Panel title="Schematic" aside={<span className="text-xs text-creek-600">{shown ? (showing === 'size' ? 'Showing the least-cost sizes' : 'Showing the peak-hour solve') : 'Not solved yet'}</span>}>
        {view.records.nodes.length === 0 ? (
          <p className="text-sm text-creek-700">This project has no network yet. Add a line on the Lines page, or add a source and an outlet below and join them.</p>
        ) : (
          <div
            className="overflow-hidden rounded-md border border-creek-100"
            onClick={(event) => {
              const target = (event.target as Element).closest('[data-node-id],[data-link-id]');
              setSelectedId(target?.getAttribute('data-node-id') ?? target?.getAttribute('data-link-id') ?? null);
            }}
          >
            <SvgNodeView node={scene} />
          </div>
        )}
      </Panel>
      <DayView view={view} units={units} />
      <div className="grid gap-5 xl:grid-cols-2">
        <Panel title="Nodes">
          <NodeTable view={view} solve={shown} units={units} selectedId={selectedId} onSelect={setSelectedId} projectId={projectId} canEdit={canEdit} />
        </Panel>
        <Panel title="Links">
          <LinkTable view={view} solve={shown} units={units} selectedId={selectedId} onSelect={setSelectedId} projectId={projectId} canEdit={canEdit} />
        </Panel>
      </div>
      {canEdit && (
        <Panel title="Change the picked part">
          <EditPart projectId={projectId} view={view} units={units} selectedId={selectedId} />
        </Panel>
      )}
      {canEdit && (
        <div className="grid gap-5 xl:grid-cols-2">
          <Panel title="Add a part">
            <AddNodeForm projectId={projectId} view={view} units={units} />
          </Panel>
          <Panel title="Join two parts">
            <AddLinkForm projectId={projectId} view={view} units={units} />
          </Panel>
        </div>
      )}
      {canEdit && view.lines.length > 0 && (
        <Panel title="Place a take-off on a line">
          <TakeOffPicker projectId={projectId} view={view} units={units} />
        </Panel>
      )}
      <Panel title="Demand per outlet">
        <DemandEditor projectId={projectId} view={view} units={units} canEdit={canEdit} />
      </Panel>
    </div>
  );
}
