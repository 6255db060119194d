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
import { routeProfileSeries } from '@/lib/routes/profile-series';
import { keepDraft, keptDraft } from '@/lib/routes/kept-drafts';
import { useLeaveWarning } from '@/components/ui/use-leave-warning';
import type { RouteDetail } from '@/lib/routes/types';
import { displayUnits, type UnitSystem } from '@/lib/units';
import type { ProfilePin } from '@/lib/chart/profile-types';
import { GpsWarningBanner } from '../gps-warning-banner';
import { RouteProfile } from '../route-profile';
import { CleanupPanel } from './cleanup-panel';
import { PAGE_SIZE, PointsTable } from './points-table';
import { RouteHeader } from './route-header';
import { RouteTools } from './route-tools';
import { SketchAreaForm, type SketchArea } from './sketch-area-form';

export interface RouteWorkspaceProps {
  detail: RouteDetail;
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

/** One version of the route as the server has it, with the user's unsaved edits on top. */
export function RouteWorkspace({ detail, units, editable, sketchArea, onSketchArea, page, onPage, pins, onPick }: RouteWorkspaceProps) {
  const routeId = detail.route.id;
  const baseUpdatedAt = detail.route.updatedAt;
  // Edits left unsaved when the person went to another section of the project come back.
  const [restored] = useState(() => keptDraft(routeId, baseUpdatedAt) !== null);
  const [draft, dispatch] = useReducer(draftReducer, detail.points, (points) => keptDraft(routeId, baseUpdatedAt) ?? draftFromPoints(points));
  useEffect(() => keepDraft(routeId, baseUpdatedAt, draft), [routeId, baseUpdatedAt, draft]);
  useLeaveWarning(editable && draft.dirty);
  const [message, setMessage] = useState<string | null>(null);
  const [planHoverM, setPlanHoverM] = useState<number | null>(null);
  const photos = useRoutePhotos(detail.route.projectId, detail.route.id);
  const planStations = useMemo(
    () => detail.points.filter((p) => !p.excluded && p.latitude !== null && p.longitude !== null).map((p) => ({ chainageM: p.chainageM, latitudeDeg: p.latitude!, longitudeDeg: p.longitude! })),
    [detail.points],
  );
  const save = useSavePoints(detail.route.projectId, detail.route.id);
  const positioned = detail.points.length > 0 && detail.points.every((p) => p.latitude !== null && p.longitude !== null);
  const sketching = editable && detail.points.length === 0;
  const flagged = new Set(detail.proposals.map((p) => p.index));
  const placed = draft.points.filter((p) => p.chainageM !== null);
  const { raw, cleaned } = routeProfileSeries(draft.points);
  const bySeq = new Map(detail.points.map((p) => [p.seq, p]));
  const markers = detail.proposals.flatMap((c) => {
    const p = bySeq.get(c.index);
    return p ? [{ chainageM: p.chainageM, elevationM: p.rawElevationM, label: `Point ${c.index + 1}: ${c.reason}` }] : [];
  });

  function showPoint(seq: number) {
    const i = draft.points.findIndex((p) => p.sourceSeq === seq);
    if (i < 0) return;
    onPage(Math.floor(i / PAGE_SIZE));
    requestAnimationFrame(() => document.querySelector(`[data-point="${i + 1}"]`)?.scrollIntoView({ block: 'center', behavior: 'smooth' }));
  }

  async function onSave() {
    setMessage(null);
    try {
      await save.mutateAsync({ points: draftToSaveInput(draft.points), baseUpdatedAt: detail.route.updatedAt });
    } catch (error) {
      setMessage(error instanceof Error ? error.message : 'Not saved.');
    }
  }

  return (
    <div className="space-y-5">
      <RouteHeader detail={detail} units={units} editable={editable} />
      {detail.gpsWarning && <GpsWarningBanner units={units} warning={detail.gpsWarning} />}
      <Panel title="Ground profile">
        {sketching && <div className="mb-3"><SketchAreaForm area={sketchArea} units={units} onChange={onSketchArea} /></div>}
        {placed.length > 0 || sketching ? (
          <div className={planStations.length >= 2 ? 'grid gap-3 xl:grid-cols-[minmax(0,1fr)_322px]' : ''}>
          <RouteProfile
            raw={raw}
            cleaned={cleaned}
            markers={markers}
            units={units}
            title={`Ground profile of ${detail.route.name}`}
            pins={pins}
            onPick={onPick}
            sketch={sketching ? { ...sketchArea, onAdd: (chainageM, elevationM) => dispatch({ type: 'sketch', chainageM: Math.max(0, chainageM), elevationM, heightSource: 'map' }) } : undefined}
            photos={photos}
          />
          {planStations.length >= 2 && (
            <div className="space-y-1">
              <PlanView stations={planStations} warnings={[]} devices={[]} units={displayUnits(units)} hoverM={planHoverM} onHover={setPlanHoverM} photos={photos} />
              <p className="text-xs text-creek-600">Plan from the surveyed positions, north up{photos.length > 0 ? '; photos where they were taken' : ''}.</p>
            </div>
          )}
          </div>
        ) : (
          <p className="text-sm text-creek-700">This route has no points yet.</p>
        )}
        {detail.route.features.length > 0 && (
          <p className="mt-2 text-xs text-creek-700">Along the route: {detail.route.features.map((f) => `${f.label} at ${formatQuantity('length', f.chainageM, units, 0)}`).join(' · ')}</p>
        )}
      </Panel>
      {detail.points.length > 0 && <CleanupPanel detail={detail} units={units} editable={editable} blocked={draft.dirty} onShowPoint={showPoint} />}
      <Panel title="Points" aside={positioned && editable ? <span className="text-xs text-creek-600">Chainage is measured on the WGS84 ellipsoid from the positions when you save.</span> : undefined}>
        {editable && draft.dirty && (
          <div className="mb-3 flex flex-wrap items-center gap-3 rounded-md border border-ochre-100 bg-ochre-50 px-3 py-2 text-sm" role="status">
            <span className="font-medium text-ochre-700">Unsaved changes{restored ? ' (kept from before you left this page)' : ''}</span>
            <Button tone="quiet" className="px-2.5 py-1" disabled={draft.past.length === 0} onClick={() => dispatch({ type: 'undo' })}>Undo</Button>
            <Button tone="quiet" className="px-2.5 py-1" onClick={() => dispatch({ type: 'reset', points: detail.points })}>Discard</Button>
            <Button className="px-2.5 py-1" disabled={save.isPending} onClick={onSave}>{save.isPending ? 'Saving…' : 'Save points'}</Button>
          </div>
        )}
        <FormMessage message={message} />
        <PointsTable points={draft.points} units={units} editable={editable} positioned={positioned} flagged={flagged} page={page} onPage={onPage} dispatch={dispatch} />
      </Panel>
      {editable && detail.points.length > 0 && <RouteTools detail={detail} units={units} blocked={draft.dirty} />}
      {detail.route.importNotes.some((n) => n.code !== 'consumer-gps-heights') && (
        <Panel title="Notes from the import">
          <ul className="list-disc space-y-0.5 pl-5 text-sm text-creek-800">
            {detail.route.importNotes.filter((n) => n.code !== 'consumer-gps-heights').map((n, i) => <li key={i}>{n.line !== undefined ? `line ${n.line}: ` : ''}{n.message}</li>)}
          </ul>
        </Panel>
      )}
    </div>
  );
}
