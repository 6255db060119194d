'use client';

import { LoadError } from '@/components/ui/load-error';
import { useEffect, useMemo, useRef, useState } from 'react';
import { applyLineFixes, type LineDeviceKind, type LineWarning } from '@/hydraulics/index';
import { warningRange } from '@/lib/chart/profile-marks';
import { panView, viewAround, zoomView, type ChainageView } from '@/lib/chart/profile-view';
import { lineAnchorChoices } from '@/lib/review/anchor-choices';
import type { CommentRecord } from '@/lib/review/comment-types';
import { pinChainage, pinsOf } from '@/lib/review/threads';
import type { LineRecord } from '@/lib/data/lines';
import { lineAnswers } from '@/lib/lines/answers';
import { SHORT_CAUTION } from '@/lib/lines/cautions';
import { addDevice } from '@/lib/lines/edit-design';
import { designWithInput, lineFeedOf, lineInputOf } from '@/lib/lines/line-input';
import { ramFeedAnswers } from '@/lib/lines/ram-feed';
import type { LineSiteContext } from '@/lib/lines/ram-start';
import { lineFixItems } from '@/lib/lines/fix-items';
import { useRoutePhotos } from '@/lib/queries/photos';
import type { LineRouteStation } from '@/lib/lines/route-stations';
import { fixWords } from '@/lib/lines/warning-words';
import { displayUnits, formatQuantity, type UnitSystem } from '@/lib/units';
import { Panel } from '@/components/ui/panel';
import { CommentsPanel } from '@/components/reviews/comments-panel';
import { useCommentThreads } from '@/components/reviews/use-comment-threads';
import { DeviceTable } from './device-table';
import { EndsForm } from './ends-form';
import { FittingTable } from './fitting-table';
import { LineAnswersStrip } from './line-answers';
import { LineDetailsForm } from './line-details-form';
import { LineHeader } from './line-header';
import { LineToolbar } from './line-toolbar';
import { PlanView } from './plan-view';
import { nearestPoint, ProfileChart } from './profile-chart';
import { ProfileReadout } from './profile-readout';
import { RamFeedStrip } from './ram-feed-strip';
import { ResultsTables } from './results-tables';
import { SettingsForm } from './settings-form';
import { StretchTable } from './stretch-table';
import { useLineDraft } from './use-line-draft';
import { UnsavedValuesProvider, useUnsavedValues } from './unsaved-values';
import { reportFileName } from '@/lib/lines/file-names';
import { WarningsPanel } from './warnings-panel';
import { NetworkFlowsStrip } from './network-flows-strip';
import { WinterPanel } from './winter-panel';

export interface LineWorkspaceProps {
  line: LineRecord;
  stations: LineRouteStation[];
  /** Ram sites that can feed the line and the site's frost depth. */
  context: LineSiteContext;
  projectName: string;
  unitSystem: UnitSystem;
  canEdit: boolean;
  /** May pin comments on the working copy's profile (owners, designers, reviewers). */
  canComment: boolean;
  members: { id: string; name: string }[];
}

/**
 * The designer's screen: answers first, warnings, the long profile beside the plan, then the design and the results.
 */
export function LineWorkspace({
  line,
  stations,
  context,
  projectName,
  unitSystem,
  canEdit,
  canComment,
  members,
}: LineWorkspaceProps) {
  const units = displayUnits(unitSystem);
  const draft = useLineDraft(line, stations, context, canEdit);
  const unsaved = useUnsavedValues();
  const { design, result } = draft;
  const firstM = stations[0].chainageM;
  const lastM = stations[stations.length - 1].chainageM;
  const comments = useCommentThreads(line.projectId, null, [{ kind: 'line', lineId: line.id }, { kind: 'project' }]);
  // A thread picked by the address opens with the profile round its pin.
  const [view, setView] = useState<ChainageView>(() => {
    const at = comments.threads.find((t) => t.thread.id === comments.selectedId)?.thread;
    const pinnedAt = at ? pinChainage(at, line.id) : null;
    return pinnedAt === null ? { fromM: firstM, toM: lastM } : viewAround(pinnedAt, pinnedAt, firstM, lastM);
  });
  const [exaggeration, setExaggeration] = useState<number | 'auto'>('auto');
  const [hoverM, setHoverM] = useState<number | null>(null);
  const [selected, setSelected] = useState<number | null>(null);
  const [placing, setPlacing] = useState(false);
  const [placeKind, setPlaceKind] = useState<LineDeviceKind>('air-release-valve');
  const [note, setNote] = useState<string | null>(null);
  const profileRef = useRef<HTMLDivElement>(null);
  const photos = useRoutePhotos(line.projectId, line.routeId);
  const openedWithComment = useRef(comments.selectedId !== null);
  useEffect(() => {
    if (openedWithComment.current) profileRef.current?.scrollIntoView({ block: 'start' });
  }, []);
  const [pickedM, setPickedM] = useState<number | null>(null);
  const pins = useMemo(
    () => pinsOf(comments.threads, (c) => pinChainage(c, line.id), comments.selectedId),
    [comments.threads, comments.selectedId, line.id],
  );
  const partNames = useMemo(() => new Map([[line.id, line.name]]), [line.id, line.name]);

  const analysis = 'analysis' in result ? result.analysis : null;
  // Where the analysis took its start and flow from (the network or the design); a ram site that is gone leaves it
  // unknown.
  const feed = useMemo(() => {
    try {
      return lineFeedOf(design, stations, context);
    } catch {
      return null;
    }
  }, [design, stations, context]);
  const ramFeed = useMemo(
    () => (analysis ? ramFeedAnswers(design, context, analysis, stations[0].groundElevationM) : null),
    [analysis, design, context, stations],
  );
  // The winter findings stand with the line's other items: counted in the answers and listed under "What to fix".
  const items = useMemo(
    () =>
      analysis
        ? lineFixItems(
            analysis,
            design.winter,
            context,
            stations.every((s) => s.coverM === undefined),
          )
        : null,
    [analysis, design.winter, context, stations],
  );
  const winter = items?.winter ?? null;
  const warnings = useMemo(() => items?.warnings ?? [], [items]);
  const answers = useMemo(() => (analysis ? lineAnswers({ ...analysis, warnings }) : null), [analysis, warnings]);
  const highlight = analysis && selected !== null && warnings[selected] ? warningRange(warnings[selected]) : null;

  function selectWarning(index: number) {
    if (!analysis) return;
    setSelected(index);
    const w = warnings[index];
    const range = warningRange(w);
    // A grouped item shows all its small highs or lows, not only the real one.
    const members = w.memberChainagesM ?? [];
    const fromM = Math.min(range.fromM, ...members);
    const toM = Math.max(range.toM, ...members);
    setView(viewAround(fromM, toM, firstM, lastM));
    profileRef.current?.scrollIntoView({ behavior: 'smooth', block: 'start' });
  }

  function jumpToComment(comment: CommentRecord) {
    comments.setSelectedId(comment.id);
    const at = pinChainage(comment, line.id);
    if (at === null) return;
    setView(viewAround(at, at, firstM, lastM));
    setHoverM(at);
    profileRef.current?.scrollIntoView({ behavior: 'smooth', block: 'start' });
  }

  function applyFix(w: LineWarning) {
    const fixed = applyLineFixes(lineInputOf(design, stations, context), w.fixes);
    const problem = draft.change(
      designWithInput(design, fixed),
      fixWords(w.fixes, units).replace(/^Add/, 'add').replace(/^Use/, 'use'),
    );
    setSelected(null);
    setNote(problem ? `The fix could not be applied: ${problem}` : null);
  }

  function place(chainageM: number) {
    const problem = draft.change(
      addDevice(design, { kind: placeKind, chainageM }),
      `place ${placeKind.replace(/-/g, ' ')} at ch. ${formatQuantity('chainage', chainageM, units.system)}`,
    );
    setNote(problem);
    setPlacing(false);
  }

  return (
    <UnsavedValuesProvider value={unsaved.report}>
      <div className="space-y-5">
        <LineHeader
          line={line}
          projectName={projectName}
          units={units}
          draft={draft}
          analysis={analysis}
          canEdit={canEdit}
          notTaken={unsaved.labels}
          exaggeration={exaggeration}
        />
        {'error' in result && (
          <p role="alert" className="rounded-md border border-clay-100 bg-clay-50 p-3 text-sm text-clay-700">
            The saved design does not fit its route any more: {result.error}. Change the stretches or devices below to
            fit the route.
          </p>
        )}
        {answers && analysis && (
          <LineAnswersStrip
            answers={answers}
            units={units}
            temperatureC={analysis.settings.waterTemperatureC}
            flowNote={ramFeed?.flowFromRam ? `what ${ramFeed.outlet.name} delivers` : undefined}
          />
        )}
        {ramFeed && analysis && (
          <RamFeedStrip feed={ramFeed} units={units} temperatureC={analysis.settings.waterTemperatureC} />
        )}
        <p className="text-xs text-creek-700">{SHORT_CAUTION}</p>
        {note && (
          <p role="alert" className="text-sm text-clay-700">
            {note}
          </p>
        )}

        {analysis && (
          <section aria-labelledby="warnings-heading" className="space-y-2">
            <h2 id="warnings-heading" className="text-base font-semibold text-creek-900">
              What to fix ({warnings.length})
            </h2>
            {winter?.warning && (
              <p
                role="alert"
                className="rounded-md border border-clay-100 bg-clay-50 p-2 text-sm text-clay-700"
                data-testid="winter-alert"
              >
                Winter: the pipe lies shallower than the site&apos;s frost depth and the line is not drained. See{' '}
                <a className="underline" href="#winter">
                  Winter
                </a>{' '}
                below for the fix.
              </p>
            )}
            {analysis.settings.heightScatterM > 0.1 && (
              <p className="text-sm text-creek-700" data-testid="survey-scatter-note">
                Heights on this route scatter by about{' '}
                {formatQuantity('depth', analysis.settings.heightScatterM, units.system)} (the survey&apos;s stated
                accuracy): highs and lows smaller than that are grouped under the real one, and a result within that of
                its limit says so. Level the critical points before ordering pipe.
              </p>
            )}
            <WarningsPanel
              csvFileName={reportFileName(line.name, draft.revision, 'csv', 'warnings')}
              warnings={warnings}
              units={units}
              selected={selected}
              onSelect={selectWarning}
              onApply={applyFix}
              canEdit={canEdit}
            />
          </section>
        )}

        {analysis && (
          <section
            ref={profileRef}
            aria-labelledby="profile-heading"
            className="scroll-mt-4 space-y-3 rounded-lg border border-creek-100 bg-white p-4 shadow-sm"
          >
            <h2 id="profile-heading" className="text-base font-semibold text-creek-900">
              Long profile and plan
            </h2>
            <LineToolbar
              onZoomIn={() => setView(zoomView(view, 0.6, (view.fromM + view.toM) / 2, firstM, lastM))}
              onZoomOut={() => setView(zoomView(view, 1 / 0.6, (view.fromM + view.toM) / 2, firstM, lastM))}
              onWhole={() => setView({ fromM: firstM, toM: lastM })}
              exaggeration={exaggeration}
              onExaggeration={setExaggeration}
              canEdit={canEdit}
              placing={placing}
              onPlacing={setPlacing}
              placeKind={placeKind}
              onPlaceKind={setPlaceKind}
            />
            <ProfileReadout
              data={analysis}
              index={hoverM === null ? null : nearestPoint(analysis, hoverM)}
              units={units}
            />
            <NetworkFlowsStrip
              flows={context.network}
              projectId={line.projectId}
              units={unitSystem}
              startUsed={feed?.startFrom === 'network'}
              flowUsed={feed?.flowFrom === 'network'}
            />
            <div className="grid grid-cols-[minmax(0,1fr)] gap-3 xl:grid-cols-[minmax(0,1fr)_322px]">
              <ProfileChart
                data={analysis}
                devices={design.devices}
                units={units}
                view={view}
                onViewChange={setView}
                exaggeration={exaggeration}
                highlight={highlight}
                hoverM={hoverM}
                onHover={setHoverM}
                onPick={placing ? place : canComment ? setPickedM : undefined}
                pickLabel={placing ? `place a ${placeKind.replace(/-/g, ' ')}` : 'pin a comment'}
                pins={pins}
                photos={photos}
              />
              <div className="space-y-2">
                {canComment && !placing && (
                  <p className="text-xs text-creek-700" role="status" data-testid="picked-chainage">
                    {pickedM === null ? (
                      'Click the profile to pin a comment at a chainage.'
                    ) : (
                      <>
                        Picked ch. {formatQuantity('chainage', pickedM, units.system)}: write the comment under{' '}
                        <a className="underline" href="#line-comments">
                          Comments
                        </a>
                        .
                      </>
                    )}
                  </p>
                )}
                <PlanView
                  stations={stations}
                  warnings={analysis.warnings}
                  devices={design.devices}
                  units={units}
                  hoverM={hoverM}
                  onHover={setHoverM}
                  photos={photos}
                />
                <p className="text-xs text-creek-600">
                  Plan from the surveyed positions, north up. Point at either drawing to find the same place on the
                  other.
                </p>
                <div className="flex gap-1 text-xs">
                  <button
                    type="button"
                    className="underline"
                    onClick={() => setView(panView(view, -(view.toM - view.fromM) / 2, firstM, lastM))}
                  >
                    ◀ Back along the line
                  </button>
                  <span aria-hidden>·</span>
                  <button
                    type="button"
                    className="underline"
                    onClick={() => setView(panView(view, (view.toM - view.fromM) / 2, firstM, lastM))}
                  >
                    On along the line ▶
                  </button>
                </div>
              </div>
            </div>
          </section>
        )}

        <Panel
          title={`Comments on this line and the project (${comments.threads.length})`}
          aside={<span className="text-xs text-creek-600">Working copy, not a revision</span>}
        >
          <span id="line-comments" className="block scroll-mt-4" />
          {comments.isError ? (
            <LoadError what="The comments" onRetry={() => void comments.refetch()} />
          ) : (
            <CommentsPanel
              projectId={line.projectId}
              revisionId={null}
              threads={comments.threads}
              canComment={canComment}
              members={members}
              anchors={lineAnchorChoices(line, pickedM, analysis?.warnings ?? [], unitSystem)}
              partNames={partNames}
              unitSystem={unitSystem}
              selectedId={comments.selectedId}
              onJump={jumpToComment}
            />
          )}
        </Panel>

        <Panel title="Ends and flow">
          <EndsForm
            design={design}
            units={units}
            change={draft.change}
            canEdit={canEdit}
            firstGroundM={stations[0].groundElevationM}
            lastGroundM={stations[stations.length - 1].groundElevationM}
            ramOutlets={context.ramOutlets}
            networkStart={feed?.startFrom === 'network' ? (context.network?.startFrom ?? null) : null}
          />
        </Panel>
        {winter && (
          <Panel title="Winter">
            <span id="winter" className="block scroll-mt-4" />
            <WinterPanel
              design={design}
              plan={winter}
              units={units}
              change={draft.change}
              canEdit={canEdit}
              onProblem={setNote}
            />
          </Panel>
        )}
        <Panel title="Pipe stretches">
          <StretchTable
            design={design}
            results={analysis?.stretches ?? []}
            units={units}
            change={draft.change}
            canEdit={canEdit}
            temperatureC={analysis?.settings.waterTemperatureC ?? 20}
          />
        </Panel>
        <div className="grid gap-5 lg:grid-cols-2">
          <Panel title="Devices">
            <DeviceTable
              design={design}
              units={units}
              change={draft.change}
              canEdit={canEdit}
              tankLevels={analysis?.tanks ?? []}
            />
          </Panel>
          <Panel title="Fittings">
            <FittingTable design={design} units={units} change={draft.change} canEdit={canEdit} />
          </Panel>
        </div>
        <Panel title="Settings">
          <SettingsForm
            design={design}
            units={units}
            change={draft.change}
            canEdit={canEdit}
            assumedDatum={analysis?.settings.heightDatum === 'assumed'}
          />
        </Panel>
        {analysis && (
          <Panel title="Results">
            <ResultsTables analysis={analysis} units={units} lineName={line.name} onHover={setHoverM} />
          </Panel>
        )}
        {canEdit && (
          <Panel title="Line details (report title block)">
            <LineDetailsForm line={line} baseRevision={() => draft.revisionRef.current} onSaved={draft.adoptRevision} />
          </Panel>
        )}
      </div>
    </UnsavedValuesProvider>
  );
}
