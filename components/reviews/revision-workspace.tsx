'use client';

import { useMemo, useRef, useState } from 'react';
import { profileScene } from '@/lib/chart/profile-scene';
import { standaloneSvg } from '@/lib/chart/svg-node';
import { viewAround, type ChainageView } from '@/lib/chart/profile-view';
import { downloadText } from '@/lib/lines/download';
import { reportFileName } from '@/lib/lines/file-names';
import { lineAnchorChoices, networkAnchorChoices } from '@/lib/review/anchor-choices';
import { snapshotNetworkView } from '@/lib/review/snapshot-network';
import type { CommentRecord } from '@/lib/review/comment-types';
import type { RevisionRecord } from '@/lib/review/revision-types';
import { analyseSnapshotLine, snapshotPartNames } from '@/lib/review/snapshot-analysis';
import type { ReviewStamp } from '@/lib/review/stamp';
import { networkPart, networkPinsOf, pinChainage, pinsOf, type ThreadScope } from '@/lib/review/threads';
import { displayUnits, formatQuantity, type UnitSystem } from '@/lib/units';
import { Button } from '@/components/ui/button';
import { Panel, Skeleton } from '@/components/ui/panel';
import { ListSkeleton } from '@/components/ui/widget-skeletons';
import { ProfileChart } from '@/components/lines/profile-chart';
import { CommentsPanel } from './comments-panel';
import { RevisionSchematic } from './revision-schematic';
import { useCommentThreads } from './use-comment-threads';

export interface RevisionWorkspaceProps {
  revision: RevisionRecord;
  lineId: string | null;
  stamp: ReviewStamp;
  canComment: boolean;
  members: { id: string; name: string }[];
}

/**
 * One line of a revision: its frozen long profile with comment pins (click to pin a new one), the exports, and the
 * comments.
 */
export function RevisionWorkspace({ revision, lineId, stamp, canComment, members }: RevisionWorkspaceProps) {
  const system: UnitSystem = revision.snapshot.project.unitSystem;
  const units = useMemo(() => displayUnits(system), [system]);
  const line = revision.snapshot.lines.find((l) => l.id === lineId) ?? null;
  const analysis = useMemo(() => (line ? analyseSnapshotLine(line) : null), [line]);
  const [view, setView] = useState<ChainageView | null>(null);
  const [hoverM, setHoverM] = useState<number | null>(null);
  const [pickedM, setPickedM] = useState<number | null>(null);
  const networkView = useMemo(() => snapshotNetworkView(revision.snapshot), [revision.snapshot]);
  const frozenSolve = revision.snapshot.networkSolve?.ok ? revision.snapshot.networkSolve.result : null;
  const scopes: ThreadScope[] = [
    ...(lineId ? [{ kind: 'line' as const, lineId }] : []),
    ...(networkView ? [{ kind: 'network' as const }] : []),
  ];
  const { threads, selectedId, setSelectedId } = useCommentThreads(revision.projectId, revision.id, scopes, true);
  const pins = useMemo(() => pinsOf(threads, (c) => pinChainage(c, lineId), selectedId), [threads, lineId, selectedId]);
  const networkPins = useMemo(() => networkPinsOf(threads, selectedId), [threads, selectedId]);
  const [pickedPartId, setPickedPartId] = useState<string | null>(null);
  const [lastPick, setLastPick] = useState<'chainage' | 'part'>('chainage');
  const schematicRef = useRef<HTMLDivElement>(null);
  const partNames = useMemo(() => snapshotPartNames(revision.snapshot), [revision.snapshot]);
  const c = analysis?.points.chainageM;
  const fullView = c ? { fromM: c[0], toM: c[c.length - 1] } : null;

  const pickedPart =
    [
      ...(networkView?.records.nodes ?? []).map((n) => ({ part: 'node' as const, id: n.id, name: n.name })),
      ...(networkView?.records.links ?? []).map((l) => ({ part: 'link' as const, id: l.id, name: l.name })),
    ].find((p) => p.id === pickedPartId) ?? null;
  const partChoices = networkAnchorChoices(pickedPart).filter((c) => c.anchor.kind === 'network');
  const lineChoices = lineAnchorChoices(line, pickedM, analysis?.warnings ?? [], system);
  // Whatever was picked last (a chainage on the profile or a part on the schematic) is offered first.
  const anchors = lastPick === 'part' ? [...partChoices, ...lineChoices] : [...lineChoices, ...partChoices];

  function jump(comment: CommentRecord) {
    setSelectedId(comment.id);
    const part = networkPart(comment);
    if (part) {
      setPickedPartId(part.partId);
      schematicRef.current?.scrollIntoView({ behavior: 'smooth', block: 'start' });
      return;
    }
    const at = pinChainage(comment, lineId);
    if (at === null || !fullView) return;
    setView(viewAround(at, at, fullView.fromM, fullView.toM));
  }

  function exportSvg() {
    if (!analysis || !line) return;
    const scene = profileScene(
      analysis,
      {
        units,
        devices: line.design.devices,
        width: 1200,
        title: `${revision.snapshot.project.name}: ${line.name}, revision ${revision.number}`,
        stamp,
        pins,
      },
      'export',
    );
    downloadText(
      standaloneSvg(scene.root),
      reportFileName(line.name, revision.number, 'svg', 'profile'),
      'image/svg+xml',
    );
  }

  return (
    <div className="grid grid-cols-[minmax(0,1fr)] gap-5 xl:grid-cols-[minmax(0,1fr)_24rem]">
      <div className="min-w-0 space-y-5">
        <Panel
          title={line ? `${line.name}: long profile` : 'Long profile'}
          aside={
            line && (
              <div className="flex gap-2">
                <Button tone="quiet" className="py-1 text-xs" onClick={exportSvg} disabled={!analysis}>
                  Profile as SVG
                </Button>
                <a
                  href={`/api/revisions/${revision.id}/lines/${line.id}/report`}
                  className="inline-flex items-center rounded-md bg-creek-700 px-3.5 py-1 text-xs font-medium text-white hover:bg-creek-800"
                >
                  PDF report
                </a>
              </div>
            )
          }
        >
          {!line && <p className="text-sm text-creek-700">This revision has no lines.</p>}
          {line && !analysis && (
            <p role="alert" className="text-sm text-clay-700">
              This line could not be analysed as frozen: {line.problem ?? 'too few stations'}.
            </p>
          )}
          {analysis && fullView && (
            <>
              <ProfileChart
                data={analysis}
                devices={line!.design.devices}
                units={units}
                view={view ?? fullView}
                onViewChange={setView}
                exaggeration="auto"
                highlight={null}
                hoverM={hoverM}
                onHover={setHoverM}
                onPick={
                  canComment
                    ? (m) => {
                        setPickedM(m);
                        setLastPick('chainage');
                      }
                    : undefined
                }
                pickLabel="pin a comment"
                pins={pins}
              />
              <p className="mt-2 text-xs text-creek-700" role="status" data-testid="picked-chainage">
                {canComment
                  ? pickedM === null
                    ? 'Click the profile to pin a comment at a chainage.'
                    : `Picked ch. ${formatQuantity('chainage', pickedM, system)}: write the comment on the right.`
                  : 'Pins mark the reviewers’ comments.'}
              </p>
            </>
          )}
        </Panel>
        {networkView && (
          <div ref={schematicRef} className="scroll-mt-4">
            <Panel
              title="Network schematic, as frozen"
              aside={
                <span className="text-xs text-creek-600">
                  {frozenSolve ? 'Peak-hour solve kept with the revision' : 'No solve kept with this revision'}
                </span>
              }
            >
              <RevisionSchematic
                view={networkView}
                solve={frozenSolve}
                units={system}
                pins={networkPins}
                selectedPartId={pickedPartId}
                onPickPart={(id) => {
                  setPickedPartId(id);
                  if (id) setLastPick('part');
                }}
                onPickPin={(id) => {
                  const t = threads.find((x) => x.thread.id === id);
                  if (t) jump(t.thread);
                }}
              />
              {canComment && (
                <p className="mt-2 text-xs text-creek-700" role="status" data-testid="picked-part">
                  {pickedPart
                    ? `Picked ${pickedPart.name}: write the comment beside the profile.`
                    : 'Click a node or link to pin a comment on it.'}
                </p>
              )}
            </Panel>
          </div>
        )}
      </div>
      <Panel title={`Comments (${threads.length})`}>
        <CommentsPanel
          projectId={revision.projectId}
          revisionId={revision.id}
          threads={threads}
          canComment={canComment}
          members={members}
          anchors={anchors}
          partNames={partNames}
          unitSystem={system}
          selectedId={selectedId}
          onJump={jump}
        />
      </Panel>
    </div>
  );
}

export function RevisionWorkspaceSkeleton() {
  return (
    <div className="space-y-4" aria-busy="true" aria-label="Loading the revision">
      <Skeleton className="h-9 w-96" />
      <Skeleton className="h-[460px] w-full" />
      <ListSkeleton label="Loading the revision's comments" />
    </div>
  );
}
