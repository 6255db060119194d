'use client';

import { useEffect, useMemo, useReducer, useState } from 'react';
import { PlanView } from '@/components/lines/plan-view';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';
import { Panel } from '@/components/ui/panel';
import { formatQuantity } from '@/lib/units';
import { useRoutePhotos } from '@/lib/queries/photos';
import { useSavePoints } from '@/lib/queries/routes';
import { draftFromPoints, draftReducer, draftToSaveInput } from '@/lib/routes/draft';
import { routeProfileSeries, withPageEdits } from '@/lib/routes/profile-series';
import { keepDraft, keptDraft } from '@/lib/routes/kept-drafts';
import { useLeaveWarning } from '@/components/ui/use-leave-warning';
import type { RoutePointsPage, RouteView } from '@/lib/routes/types';
import { displayUnits, type UnitSystem } from '@/lib/units';
import type { ProfilePin } from '@/lib/chart/profile-types';
import { GpsWarningBanner } from '../gps-warning-banner';
import { RouteProfile } from '../route-profile';
import { CleanupPanel } from './cleanup-panel';
import { ROUTE_PAGE_SIZE } from '@/lib/queries/routes';
import { PointsTable } from './points-table';
import { RouteHeader } from './route-header';
import { RouteTools } from './route-tools';
import { SketchAreaForm, type SketchArea } from './sketch-area-form';

export interface RouteWorkspaceProps {
  view: RouteView;
  /** The page of rows shown and edited (the draft covers these rows only). */
  rows: RoutePointsPage;
  /** Another page is being read; the rows shown are the last page's. */
  loadingPage?: boolean;
  units: UnitSystem;
  editable: boolean;
  sketchArea: SketchArea;
  onSketchArea: (a: SketchArea) => void;
  page: number;
  onPage: (page: number) => void;
  /** Review comments pinned on the ground profile, and what a click on it does (pin a comment). */
  pins?: readonly ProfilePin[];
  onPick?: (chainageM: number) => void;
}

/**
 * One version of the route as the server has it: its view (header, thinned profile, plan, proposals)
 * and one page of its rows, with the user's unsaved edits of that page on top. A save replaces the
 * page's stored rows only (the route is measured again whole on the server).
 */
export function RouteWorkspace({
  view,
  rows,
  loadingPage = false,
  units,
  editable,
  sketchArea,
  onSketchArea,
  page,
  onPage,
  pins,
  onPick,
}: RouteWorkspaceProps) {
  const routeId = view.route.id;
  const baseUpdatedAt = rows.updatedAt;
  const offset = rows.offset;
  // Edits left unsaved when the person went to another section of the project come back.
  const [restored] = useState(() => keptDraft(routeId, baseUpdatedAt, offset) !== null);
  const [draft, dispatch] = useReducer(
    draftReducer,
    rows.points,
    (points) => keptDraft(routeId, baseUpdatedAt, offset) ?? draftFromPoints(points),
  );
  useEffect(() => keepDraft(routeId, baseUpdatedAt, draft, offset), [routeId, baseUpdatedAt, draft, offset]);
  useLeaveWarning(editable && draft.dirty);
  const [message, setMessage] = useState<string | null>(null);
  const [planHoverM, setPlanHoverM] = useState<number | null>(null);
  const photos = useRoutePhotos(view.route.projectId, view.route.id);
  const planStations = view.plan;
  const save = useSavePoints(view.route.projectId, view.route.id);
  const positioned = view.positioned;
  const sketching = editable && view.route.pointCount === 0;
  const flagged = new Set(view.proposals.map((p) => p.index));
  const placed = draft.points.filter((p) => p.chainageM !== null);
  // The chart is the server's thinned profile; an unsaved edit of this page shows on it at once.
  const { raw, cleaned } = useMemo(() => {
    if (!draft.dirty) return view.profile;
    const span =
      rows.points.length > 0
        ? { fromM: rows.points[0].chainageM, toM: rows.points[rows.points.length - 1].chainageM }
        : null;
    const edited = routeProfileSeries(draft.points);
    return {
      raw: withPageEdits(view.profile.raw, span, edited.raw),
      cleaned: withPageEdits(view.profile.cleaned, span, edited.cleaned),
    };
  }, [draft.dirty, draft.points, rows.points, view.profile]);
  const markers = view.proposals.map((c, i) => ({
    chainageM: view.proposalPlaces[i].chainageM,
    elevationM: view.proposalPlaces[i].rawElevationM,
    label: `Point ${c.index + 1}: ${c.reason}`,
  }));
  const pageCount = Math.max(1, Math.ceil(rows.total / ROUTE_PAGE_SIZE));

  function showPoint(seq: number) {
    // seq is the point's place along the stored route, so its page is known without reading it.
    if (!draft.dirty) onPage(Math.floor(seq / ROUTE_PAGE_SIZE));
    let tries = 0;
    const find = () => {
      const row = document.querySelector(`[data-point="${seq + 1}"]`);
      if (row) row.scrollIntoView({ block: 'center', behavior: 'smooth' });
      else if (++tries < 30) setTimeout(find, 100);
    };
    requestAnimationFrame(find);
  }

  async function onSave() {
    setMessage(null);
    try {
      await save.mutateAsync({
        points: draftToSaveInput(draft.points),
        baseUpdatedAt,
        window: { fromSeq: offset, toSeq: offset + rows.points.length },
      });
    } catch (error) {
      setMessage(error instanceof Error ? error.message : 'Not saved.');
    }
  }

  return (
    <div className="space-y-5">
      <RouteHeader view={view} units={units} editable={editable} />
      {view.gpsWarning && <GpsWarningBanner units={units} warning={view.gpsWarning} />}
      <Panel title="Ground profile">
        {sketching && (
          <div className="mb-3">
            <SketchAreaForm area={sketchArea} units={units} onChange={onSketchArea} />
          </div>
        )}
        {placed.length > 0 || sketching ? (
          <div className={planStations.length >= 2 ? 'grid gap-3 xl:grid-cols-[minmax(0,1fr)_322px]' : ''}>
            <RouteProfile
              raw={raw}
              cleaned={cleaned}
              markers={markers}
              units={units}
              title={`Ground profile of ${view.route.name}`}
              pins={pins}
              onPick={onPick}
              sketch={
                sketching
                  ? {
                      ...sketchArea,
                      onAdd: (chainageM, elevationM) =>
                        dispatch({
                          type: 'sketch',
                          chainageM: Math.max(0, chainageM),
                          elevationM,
                          heightSource: 'map',
                        }),
                    }
                  : undefined
              }
              photos={photos}
            />
            {planStations.length >= 2 && (
              <div className="space-y-1">
                <PlanView
                  stations={planStations}
                  warnings={[]}
                  devices={[]}
                  units={displayUnits(units)}
                  hoverM={planHoverM}
                  onHover={setPlanHoverM}
                  photos={photos}
                />
                <p className="text-xs text-creek-600">
                  Plan from the surveyed positions, north up{photos.length > 0 ? '; photos where they were taken' : ''}.
                </p>
              </div>
            )}
          </div>
        ) : (
          <p className="text-sm text-creek-700">This route has no points yet.</p>
        )}
        {view.route.features.length > 0 && (
          <p className="mt-2 text-xs text-creek-700">
            Along the route:{' '}
            {view.route.features
              .map((f) => `${f.label} at ${formatQuantity('length', f.chainageM, units, 0)}`)
              .join(' · ')}
          </p>
        )}
      </Panel>
      {view.route.pointCount > 0 && (
        <CleanupPanel view={view} units={units} editable={editable} blocked={draft.dirty} onShowPoint={showPoint} />
      )}
      <Panel
        title="Points"
        aside={
          positioned && editable ? (
            <span className="text-xs text-creek-600">
              Chainage is measured on the WGS84 ellipsoid from the positions when you save.
            </span>
          ) : undefined
        }
      >
        {editable && draft.dirty && (
          <div
            className="mb-3 flex flex-wrap items-center gap-3 rounded-md border border-ochre-100 bg-ochre-50 px-3 py-2 text-sm"
            role="status"
          >
            <span className="font-medium text-ochre-700">
              Unsaved changes{restored ? ' (kept from before you left this page)' : ''}
            </span>
            <Button
              tone="quiet"
              className="px-2.5 py-1"
              disabled={draft.past.length === 0}
              onClick={() => dispatch({ type: 'undo' })}
            >
              Undo
            </Button>
            <Button
              tone="quiet"
              className="px-2.5 py-1"
              onClick={() => dispatch({ type: 'reset', points: rows.points })}
            >
              Discard
            </Button>
            <Button className="px-2.5 py-1" disabled={save.isPending} onClick={onSave}>
              {save.isPending ? 'Saving…' : 'Save points'}
            </Button>
          </div>
        )}
        <FormMessage message={message} />
        <PointsTable
          points={draft.points}
          offset={offset}
          total={rows.total + draft.points.length - rows.points.length}
          units={units}
          editable={editable}
          positioned={positioned}
          flagged={flagged}
          page={page}
          pageCount={pageCount}
          onPage={onPage}
          pagingBlocked={
            editable && draft.dirty
              ? 'Save or discard the changes on this page to turn to another.'
              : loadingPage
                ? 'Reading the page…'
                : null
          }
          dispatch={dispatch}
        />
      </Panel>
      {editable && view.route.pointCount > 0 && <RouteTools view={view} units={units} blocked={draft.dirty} />}
      {view.route.importNotes.some((n) => n.code !== 'consumer-gps-heights') && (
        <Panel title="Notes from the import">
          <ul className="list-disc space-y-0.5 pl-5 text-sm text-creek-800">
            {view.route.importNotes
              .filter((n) => n.code !== 'consumer-gps-heights')
              .map((n, i) => (
                <li key={i}>
                  {n.line !== undefined ? `line ${n.line}: ` : ''}
                  {n.message}
                </li>
              ))}
          </ul>
        </Panel>
      )}
    </div>
  );
}
