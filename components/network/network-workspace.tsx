'use client';

import { useQuery } from '@tanstack/react-query';
import { useMemo, useRef, useState } from 'react';
import { SvgNodeView } from '@/components/lines/svg-node-view';
import { LoadError } from '@/components/ui/load-error';
import { Panel } from '@/components/ui/panel';
import { CommentsPanel } from '@/components/reviews/comments-panel';
import { useCommentThreads } from '@/components/reviews/use-comment-threads';
import { buildNetworkScene } from '@/lib/chart/network-scene';
import { layoutNetwork } from '@/lib/network/layout';
import type { SizeRunResult, SolveRunResult } from '@/lib/network/run-result';
import { networkQuery } from '@/lib/queries/network';
import { networkAnchorChoices } from '@/lib/review/anchor-choices';
import type { CommentRecord } from '@/lib/review/comment-types';
import { networkPart, networkPinsOf } from '@/lib/review/threads';
import type { UnitSystem } from '@/lib/units';
import { AddLinkForm, AddNodeForm } from './network-forms';
import { DayView } from './day-view';
import { EditPart } from './edit-part';
import { DemandEditor } from './demand-editor';
import { LinkTable, NodeTable } from './network-tables';
import { NetworkRunPanel } from './network-run-panel';
import { TakeOffPicker } from './take-off-picker';
import { NetworkWorkspaceSkeleton } from './network-workspace-skeleton';

export interface NetworkWorkspaceProps {
  projectId: string;
  units: UnitSystem;
  canEdit: boolean;
  /** May pin comments on the working copy's parts (owners, designers, reviewers). */
  canComment: boolean;
  members: { id: string; name: string }[];
}

/**
 * The network page: runs, the schematic with comment pins, the parts' tables, adding and joining parts, demand per
 * outlet, comments.
 */
export function NetworkWorkspace({ projectId, units, canEdit, canComment, members }: NetworkWorkspaceProps) {
  const { data: view, error, refetch } = useQuery(networkQuery(projectId));
  const comments = useCommentThreads(projectId, null, [{ kind: 'network' }, { kind: 'project' }]);
  // A thread picked by the address opens with its part picked.
  const [selectedId, setSelectedId] = useState<string | null>(() => {
    const opened = comments.threads.find((t) => t.thread.id === comments.selectedId);
    return opened ? (networkPart(opened.thread)?.partId ?? null) : null;
  });
  const [showing, setShowing] = useState<'solve' | 'size'>('solve');
  const layout = useMemo(() => (view ? layoutNetwork(view) : null), [view]);
  const schematicRef = useRef<HTMLDivElement>(null);
  const partNames = useMemo(
    () => new Map([...(view?.records.nodes ?? []), ...(view?.records.links ?? [])].map((p) => [p.id, p.name])),
    [view],
  );
  if (error) return <LoadError what="The network" onRetry={() => void refetch()} />;
  if (!view || !layout) return <NetworkWorkspaceSkeleton />;

  const pickedNode = view.records.nodes.find((n) => n.id === selectedId);
  const pickedLink = view.records.links.find((l) => l.id === selectedId);
  const picked = pickedNode
    ? { part: 'node' as const, id: pickedNode.id, name: pickedNode.name }
    : pickedLink
      ? { part: 'link' as const, id: pickedLink.id, name: pickedLink.name }
      : null;
  const pins = networkPinsOf(comments.threads, comments.selectedId);

  function jumpToComment(comment: CommentRecord) {
    comments.setSelectedId(comment.id);
    const part = networkPart(comment);
    if (part) setSelectedId(part.partId);
    schematicRef.current?.scrollIntoView({ behavior: 'smooth', block: 'start' });
  }

  const solved = view.runs.solve?.status === 'done' ? (view.runs.solve.result as SolveRunResult) : null;
  const sized = view.runs.size?.status === 'done' ? (view.runs.size.result as SizeRunResult) : null;
  const shown = showing === 'size' && sized?.solution ? sized.solution : solved;
  const scene = buildNetworkScene({ view, layout, solve: shown, units, width: 960, height: 540, selectedId, pins });

  return (
    <div className="space-y-5">
      <NetworkRunPanel
        projectId={projectId}
        view={view}
        units={units}
        showing={showing}
        onShow={setShowing}
        canEdit={canEdit}
      />
      <div ref={schematicRef} className="scroll-mt-4" />
      <Panel
        title="Schematic"
        aside={
          <span className="text-xs text-creek-600">
            {shown
              ? showing === 'size'
                ? 'Showing the least-cost sizes'
                : 'Showing the peak-hour solve'
              : 'Not solved yet'}
          </span>
        }
      >
        {view.records.nodes.length === 0 ? (
          <p className="text-sm text-creek-700">
            This project has no network yet. Add a line on the Lines page, or add a source and an outlet below and join
            them.
          </p>
        ) : (
          <div
            className="overflow-hidden rounded-md border border-creek-100"
            onClick={(event) => {
              const pin = (event.target as Element).closest('[data-comment-id]');
              const thread = pin && comments.threads.find((t) => t.thread.id === pin.getAttribute('data-comment-id'));
              if (thread) return jumpToComment(thread.thread);
              const target = (event.target as Element).closest('[data-node-id],[data-link-id]');
              setSelectedId(target?.getAttribute('data-node-id') ?? target?.getAttribute('data-link-id') ?? null);
            }}
          >
            <SvgNodeView node={scene} />
          </div>
        )}
        {canComment && view.records.nodes.length > 0 && (
          <p className="mt-2 text-xs text-creek-700" role="status" data-testid="picked-part">
            {picked ? (
              <>
                Picked {picked.name}: write a comment on it under{' '}
                <a className="underline" href="#network-comments">
                  Comments
                </a>
                .
              </>
            ) : (
              'Click a node or link (or a row of the tables) to pin a comment on it.'
            )}
          </p>
        )}
      </Panel>
      <DayView view={view} units={units} />
      <div className="grid gap-5 xl:grid-cols-2">
        <Panel title="Nodes">
          <NodeTable
            view={view}
            solve={shown}
            units={units}
            selectedId={selectedId}
            onSelect={setSelectedId}
            projectId={projectId}
            canEdit={canEdit}
          />
        </Panel>
        <Panel title="Links">
          <LinkTable
            view={view}
            solve={shown}
            units={units}
            selectedId={selectedId}
            onSelect={setSelectedId}
            projectId={projectId}
            canEdit={canEdit}
          />
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
      <Panel
        title={`Comments on the network and the project (${comments.threads.length})`}
        aside={<span className="text-xs text-creek-600">Working copy, not a revision</span>}
      >
        <span id="network-comments" className="block scroll-mt-4" />
        <CommentsPanel
          projectId={projectId}
          revisionId={null}
          threads={comments.threads}
          canComment={canComment}
          members={members}
          anchors={networkAnchorChoices(picked)}
          partNames={partNames}
          unitSystem={units}
          selectedId={comments.selectedId}
          onJump={jumpToComment}
        />
      </Panel>
    </div>
  );
}
