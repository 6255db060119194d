'use client';

import { LoadError } from '@/components/ui/load-error';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { useMemo, useRef, useState } from 'react';
import { Panel } from '@/components/ui/panel';
import { CommentsPanel } from '@/components/reviews/comments-panel';
import { useCommentThreads } from '@/components/reviews/use-comment-threads';
import { ROUTE_PAGE_SIZE, routePointsQuery, routeViewQuery } from '@/lib/queries/routes';
import { keptDraftOffset } from '@/lib/routes/kept-drafts';
import { routeAnchorChoices } from '@/lib/review/anchor-choices';
import type { CommentRecord } from '@/lib/review/comment-types';
import { pinsOf, routePinChainage } from '@/lib/review/threads';
import { formatQuantity, fromDisplay, toDisplay, unitOf, type UnitSystem } from '@/lib/units';
import { UnitNumberInput } from '@/components/lines/unit-number-input';
import { RouteWorkspace } from './route-workspace';
import { RouteEditorSkeleton } from './route-editor-skeleton';

export interface RouteEditorProps {
  projectId: string;
  routeId: string;
  units: UnitSystem;
  editable: boolean;
  /** May pin comments on the route (surveyors too). */
  canComment: boolean;
  /** May also comment on the whole project (owners, designers, reviewers). */
  canCommentAnywhere: boolean;
  members: { id: string; name: string }[];
}

/**
 * The route page: the route's view (header, thinned profile, plan, proposals) and one page of its
 * rows, each read from the server as needed; a fresh workspace each time the server's rows change;
 * the comments pinned on the route.
 */
export function RouteEditor({
  projectId,
  routeId,
  units,
  editable,
  canComment,
  canCommentAnywhere,
  members,
}: RouteEditorProps) {
  const view = useQuery(routeViewQuery(routeId));
  const [sketchArea, setSketchArea] = useState({ lengthM: 1000, lowM: 0, highM: 100 });
  // Kept here so the table stays on its page when a decision brings a new version of the route;
  // edits left unsaved on a page bring the table back to that page.
  const [page, setPage] = useState(() => Math.floor((keptDraftOffset(routeId) ?? 0) / ROUTE_PAGE_SIZE));
  const rows = useQuery({ ...routePointsQuery(routeId, page * ROUTE_PAGE_SIZE), placeholderData: keepPreviousData });
  const data = view.data;
  const [pickedM, setPickedM] = useState<number | null>(null);
  const comments = useCommentThreads(projectId, null, [{ kind: 'route', routeId }, { kind: 'project' }]);
  const pins = useMemo(
    () => pinsOf(comments.threads, (c) => routePinChainage(c, routeId), comments.selectedId),
    [comments.threads, comments.selectedId, routeId],
  );
  const topRef = useRef<HTMLDivElement>(null);
  if (view.isError || rows.isError) {
    return <LoadError what="The route" onRetry={() => void (view.isError ? view.refetch() : rows.refetch())} />;
  }
  if (!data || !rows.data) return <RouteEditorSkeleton />;

  function jumpToComment(comment: CommentRecord) {
    comments.setSelectedId(comment.id);
    topRef.current?.scrollIntoView({ behavior: 'smooth', block: 'start' });
  }

  return (
    <div className="space-y-5">
      <div ref={topRef} className="scroll-mt-4" />
      <RouteWorkspace
        key={`${rows.data.updatedAt}:${rows.data.offset}`}
        view={data}
        rows={rows.data}
        loadingPage={rows.isPlaceholderData}
        units={units}
        editable={editable}
        sketchArea={sketchArea}
        onSketchArea={setSketchArea}
        page={page}
        onPage={setPage}
        pins={pins}
        onPick={canComment ? setPickedM : undefined}
      />
      <Panel title={`Comments on this route and the project (${comments.threads.length})`}>
        <span id="route-comments" className="block scroll-mt-4" />
        {canComment && (
          <div className="mb-2 flex flex-wrap items-end gap-3">
            <p className="text-xs text-creek-700" role="status" data-testid="picked-chainage">
              {pickedM === null
                ? 'Click the ground profile, or type a chainage, to pin a comment on the route.'
                : `Picked ch. ${formatQuantity('chainage', pickedM, units)}.`}
            </p>
            <UnitNumberInput
              id="route-comment-chainage"
              label="Pin at chainage"
              compact
              optional
              unit={unitOf('length', units)}
              value={pickedM === null ? undefined : toDisplay('length', pickedM, units)}
              onCommit={(v) => {
                if (v === undefined) {
                  setPickedM(null);
                  return null;
                }
                const metres = fromDisplay('length', v, units);
                const lengthM = data.route.lengthM ?? Infinity;
                if (metres < 0 || metres > lengthM + 1e-6)
                  return `The route runs from 0 to ${formatQuantity('chainage', lengthM, units)}`;
                setPickedM(metres);
                return null;
              }}
            />
          </div>
        )}
        <CommentsPanel
          projectId={projectId}
          revisionId={null}
          threads={comments.threads}
          canComment={canComment}
          members={members}
          anchors={routeAnchorChoices(data.route, pickedM, units, canCommentAnywhere)}
          partNames={new Map([[data.route.id, data.route.name]])}
          unitSystem={units}
          selectedId={comments.selectedId}
          onJump={jumpToComment}
        />
      </Panel>
    </div>
  );
}
