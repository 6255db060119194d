'use client';

import { useQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { profileScene } from '@/lib/chart/profile-scene';
import { standaloneSvg } from '@/lib/chart/svg-node';
import type { ChainageView } from '@/lib/chart/profile-view';
import { downloadText } from '@/lib/lines/download';
import { reportFileName } from '@/lib/lines/file-names';
import { WARNING_TITLES } from '@/lib/lines/warning-words';
import { projectCommentsQuery } from '@/lib/queries/reviews';
import type { CommentRecord } from '@/lib/review/comment-types';
import type { RevisionRecord } from '@/lib/review/revision-types';
import { analyseSnapshotLine } from '@/lib/review/snapshot-analysis';
import type { ReviewStamp } from '@/lib/review/stamp';
import { pinChainage, pinsOf, threadsOf } from '@/lib/review/threads';
import { displayUnits, formatQuantity, type UnitSystem } from '@/lib/units';
import { Button } from '@/components/ui/button';
import { Panel } from '@/components/ui/panel';
import { ProfileChart } from '@/components/lines/profile-chart';
import { CommentsPanel, type AnchorChoice } from './comments-panel';

export interface RevisionWorkspaceProps {
  revision: RevisionRecord;
  lineId: string | null;
  stamp: ReviewStamp;
  canComment: boolean;
  members: { id: string; name: string }[];
}

/** One line of a revision: its frozen long profile with comment pins (click to pin a new one), the exports, and the comments. */
export function RevisionWorkspace({ revision, lineId, stamp, canComment, members }: RevisionWorkspaceProps) {
  const system: UnitSystem = revision.snapshot.project.unitSystem;
  const units = useMemo(() => displayUnits(system), [system]);
  const line = revision.snapshot.lines.find((l) => l.id === lineId) ?? null;
  const analysis = useMemo(() => (line ? analyseSnapshotLine(line) : null), [line]);
  const { data: comments = [] } = useQuery(projectCommentsQuery(revision.projectId));
  const [view, setView] = useState<ChainageView | null>(null);
  const [hoverM, setHoverM] = useState<number | null>(null);
  const [pickedM, setPickedM] = useState<number | null>(null);
  const [selectedId, setSelectedId] = useState<string | null>(null);
  const threads = useMemo(() => threadsOf(comments, revision.id, lineId), [comments, revision.id, lineId]);
  const pins = useMemo(() => pinsOf(threads, lineId, selectedId), [threads, lineId, selectedId]);
  const lineNames = useMemo(() => new Map(revision.snapshot.lines.map((l) => [l.id, l.name])), [revision.snapshot.lines]);
  const c = analysis?.points.chainageM;
  const fullView = c ? { fromM: c[0], toM: c[c.length - 1] } : null;

  const anchors: AnchorChoice[] = [
    ...(line && pickedM !== null ? [{ key: 'picked', label: `${line.name}, ch. ${formatQuantity('chainage', pickedM, system)} (picked on the profile)`, anchor: { kind: 'line-chainage' as const, lineId: line.id, chainageM: Math.round(pickedM * 100) / 100 } }] : []),
    { key: 'project', label: 'Whole project', anchor: { kind: 'project' } },
    ...(line && analysis ? analysis.warnings.map((w, i) => {
      const at = 'chainageM' in w.at ? w.at.chainageM : w.at.fromM;
      return { key: `warning-${i}`, label: `${WARNING_TITLES[w.code]}, ch. ${formatQuantity('chainage', at, system)}`, anchor: { kind: 'warning' as const, lineId: line.id, code: w.code, chainageM: at } };
    }) : []),
  ];

  function jump(comment: CommentRecord) {
    setSelectedId(comment.id);
    const at = pinChainage(comment, lineId);
    if (at === null || !fullView) return;
    const current = view ?? fullView;
    const half = (current.toM - current.fromM) / 2;
    const from = Math.max(fullView.fromM, Math.min(at - half, fullView.toM - 2 * half));
    setView({ fromM: from, toM: from + 2 * half });
  }

  function exportSvg() {
    if (!analysis || !line) return;
    const scene = profileScene(analysis, { units, devices: line.design.devices, width: 1200, title: `${revision.snapshot.project.name}: ${line.name}, revision ${revision.number}`, stamp, pins }, 'export');
    downloadText(standaloneSvg(scene.root), reportFileName(line.name, revision.number, 'svg', 'profile'), 'image/svg+xml');
  }

  return (
    <div className="grid grid-cols-[minmax(0,1fr)] gap-5 xl:grid-cols-[minmax(0,1fr)_24rem]">
      <Panel
        title={line ? `${line.name}: long profile` : 'Long profile'}
        aside={line && (
          <div className="flex gap-2">
            <Button tone="quiet" className="py-1 text-xs" onClick={exportSvg} disabled={!analysis}>Profile as SVG</Button>
            <a href={`/api/revisions/${revision.id}/lines/${line.id}/report`} className="inline-flex items-center rounded-md bg-creek-700 px-3.5 py-1 text-xs font-medium text-white hover:bg-creek-800">PDF report</a>
          </div>
        )}
      >
        {!line && <p className="text-sm text-creek-700">This revision has no lines.</p>}
        {line && !analysis && <p role="alert" className="text-sm text-clay-700">This line could not be analysed as frozen: {line.problem ?? 'too few stations'}.</p>}
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
              onPick={canComment ? (m) => setPickedM(m) : undefined}
              pickLabel="pin a comment"
              pins={pins}
            />
            <p className="mt-2 text-xs text-creek-700" role="status" data-testid="picked-chainage">
              {canComment ? (pickedM === null ? 'Click the profile to pin a comment at a chainage.' : `Picked ch. ${formatQuantity('chainage', pickedM, system)}: write the comment on the right.`) : 'Pins mark the reviewers’ comments.'}
            </p>
          </>
        )}
      </Panel>
      <Panel title={`Comments (${threads.length})`}>
        <CommentsPanel
          projectId={revision.projectId}
          revisionId={revision.id}
          threads={threads}
          canComment={canComment}
          members={members}
          anchors={anchors}
          lineNames={lineNames}
          unitSystem={system}
          selectedId={selectedId}
          onJump={jump}
        />
      </Panel>
    </div>
  );
}
