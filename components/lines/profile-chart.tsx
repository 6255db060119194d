'use client';

import { useEffect, useMemo, useRef, useState, type PointerEvent as ReactPointerEvent } from 'react';
import type { LineDevice } from '@/hydraulics/index';
import { indexAtOrBefore } from '@/lib/chart/profile-frame';
import { profileScene } from '@/lib/chart/profile-scene';
import type { ProfileChartData, ProfileChartOptions, ProfilePin } from '@/lib/chart/profile-types';
import { panView, zoomView, type ChainageView } from '@/lib/chart/profile-view';
import type { DisplayUnits } from '@/lib/units';
import type { NumberedPhoto } from '@/lib/queries/photos';
import { PhotoCardOverlay, PhotoTargets, usePhotoCard } from '@/components/photos/photo-targets';
import { SvgNodeView } from './svg-node-view';

export interface ProfileChartProps {
  data: ProfileChartData;
  devices: readonly LineDevice[];
  units: DisplayUnits;
  view: ChainageView;
  onViewChange: (view: ChainageView) => void;
  exaggeration: number | 'auto';
  highlight: { fromM: number; toM: number } | null;
  hoverM: number | null;
  onHover: (chainageM: number | null) => void;
  /** Called with the chainage clicked (placing a device), when set. */
  onPick?: (chainageM: number) => void;
  pickLabel?: string;
  /** Review comments pinned at chainages (a layer of the same drawing). */
  pins?: readonly ProfilePin[];
  /** An earlier revision's grade line, drawn dashed beside this one. */
  earlierGrade?: ProfileChartOptions['earlierGrade'];
  /** Site photos along the route: marked at their chainages, their card shown on hover or click. */
  photos?: readonly NumberedPhoto[];
}

/**
 * The long profile on screen: the pure drawing from lib/chart plus a pointer layer for hover,
 * click-to-place, drag to pan and wheel to zoom on chainage.
 */
export function ProfileChart({
  data,
  devices,
  units,
  view,
  onViewChange,
  exaggeration,
  highlight,
  hoverM,
  onHover,
  onPick,
  pickLabel,
  pins,
  earlierGrade,
  photos,
}: ProfileChartProps) {
  const boxRef = useRef<HTMLDivElement>(null);
  const svgRef = useRef<HTMLDivElement>(null);
  const captureRef = useRef<SVGRectElement>(null);
  const [width, setWidth] = useState(960);
  const [dragging, setDragging] = useState(false);
  const card = usePhotoCard();
  const drag = useRef<{ x: number; view: ChainageView; moved: boolean } | null>(null);
  const { chainageM } = data.points;
  const firstM = chainageM[0];
  const lastM = chainageM[chainageM.length - 1];

  useEffect(() => {
    const box = boxRef.current;
    if (!box) return;
    const observer = new ResizeObserver(([entry]) => setWidth(Math.max(Math.floor(entry.contentRect.width), 520)));
    observer.observe(box);
    return () => observer.disconnect();
  }, []);

  const scene = useMemo(
    () =>
      profileScene(
        data,
        { units, devices, width, view, exaggeration, highlight, pins, earlierGrade, photos },
        'screen',
      ),
    [data, units, devices, width, view, exaggeration, highlight, pins, earlierGrade, photos],
  );
  const { frame } = scene;
  const photoPlaces = useMemo(() => {
    const byId = new Map((photos ?? []).map((p) => [p.id, p]));
    return scene.photos.flatMap((place) => {
      const photo = byId.get(place.photo.id);
      return photo ? [{ photo, x: place.x, y: place.y }] : [];
    });
  }, [scene, photos]);

  const chainageAtEvent = (clientX: number) => {
    const rect = captureRef.current?.ownerSVGElement?.getBoundingClientRect();
    if (!rect) return null;
    const x = ((clientX - rect.left) / rect.width) * frame.width;
    return Math.min(Math.max(frame.chainageAt(x), frame.fromM), frame.toM);
  };

  // The wheel zooms the chart instead of scrolling the page: needs a non-passive listener.
  const wheelState = useRef({ view, firstM, lastM, onViewChange, chainageAtEvent });
  useEffect(() => {
    wheelState.current = { view, firstM, lastM, onViewChange, chainageAtEvent };
  });
  useEffect(() => {
    const target = captureRef.current;
    if (!target) return;
    const onWheel = (event: WheelEvent) => {
      event.preventDefault();
      const s = wheelState.current;
      const about = s.chainageAtEvent(event.clientX);
      if (about === null) return;
      s.onViewChange(zoomView(s.view, event.deltaY > 0 ? 1.25 : 0.8, about, s.firstM, s.lastM));
    };
    target.addEventListener('wheel', onWheel, { passive: false });
    return () => target.removeEventListener('wheel', onWheel);
  }, []);

  function onPointerDown(event: ReactPointerEvent<SVGRectElement>) {
    event.currentTarget.setPointerCapture(event.pointerId);
    drag.current = { x: event.clientX, view, moved: false };
    setDragging(true);
  }

  function onPointerMove(event: ReactPointerEvent<SVGRectElement>) {
    const d = drag.current;
    if (d) {
      const rect = event.currentTarget.ownerSVGElement?.getBoundingClientRect();
      const pxPerUnit = rect ? rect.width / frame.width : 1;
      const dxPx = (event.clientX - d.x) / pxPerUnit;
      if (Math.abs(dxPx) > 3) d.moved = true;
      if (d.moved) {
        const metresPerPx = (d.view.toM - d.view.fromM) / (frame.plotRight - frame.plotLeft);
        onViewChange(panView(d.view, -dxPx * metresPerPx, firstM, lastM));
        return;
      }
    }
    onHover(chainageAtEvent(event.clientX));
  }

  function onPointerUp(event: ReactPointerEvent<SVGRectElement>) {
    const d = drag.current;
    drag.current = null;
    setDragging(false);
    if (d && !d.moved && onPick) {
      const c = chainageAtEvent(event.clientX);
      if (c !== null) onPick(c);
    }
  }

  function onKeyDown(event: React.KeyboardEvent<SVGRectElement>) {
    const span = view.toM - view.fromM;
    const centre = hoverM ?? (view.fromM + view.toM) / 2;
    const moves: Record<string, () => void> = {
      ArrowLeft: () => onHover(Math.max(centre - span / 50, frame.fromM)),
      ArrowRight: () => onHover(Math.min(centre + span / 50, frame.toM)),
      '+': () => onViewChange(zoomView(view, 0.8, centre, firstM, lastM)),
      '-': () => onViewChange(zoomView(view, 1.25, centre, firstM, lastM)),
      Enter: () => onPick?.(centre),
    };
    const move = moves[event.key];
    if (move) {
      event.preventDefault();
      move();
    }
  }

  const hover = hoverM !== null && hoverM >= frame.fromM && hoverM <= frame.toM ? nearestPoint(data, hoverM) : null;
  const hx = hover ? frame.x(chainageM[hover]) : 0;

  return (
    <div ref={boxRef} className="relative w-full" data-testid="profile-chart">
      <div ref={svgRef} className="overflow-hidden rounded-md border border-creek-100">
        <SvgNodeView node={scene.root}>
          {hover !== null && (
            <g pointerEvents="none" data-layer="hover">
              <line
                x1={hx}
                x2={hx}
                y1={frame.elevationTop}
                y2={frame.pressureBottom}
                stroke="#122e3a"
                strokeWidth={1}
                strokeDasharray="2 2"
              />
              <circle cx={hx} cy={frame.yElevation(data.points.groundElevationM[hover])} r={3.5} fill="#7d5410" />
              <circle cx={hx} cy={frame.yElevation(data.points.hydraulicGradeM[hover])} r={3.5} fill="#1c4b5f" />
              <circle cx={hx} cy={frame.yPressure(data.points.pressureHeadM[hover])} r={3.5} fill="#1c4b5f" />
            </g>
          )}
          <rect
            ref={captureRef}
            x={frame.plotLeft}
            y={frame.elevationTop}
            width={frame.plotRight - frame.plotLeft}
            height={frame.pressureBottom - frame.elevationTop}
            fill="transparent"
            tabIndex={0}
            role="application"
            aria-label={
              onPick
                ? `Profile: click to ${pickLabel ?? 'place'}; arrow keys move the readout, + and - zoom`
                : 'Profile: arrow keys move the readout, + and - zoom, drag to pan'
            }
            style={{ cursor: onPick ? 'crosshair' : dragging ? 'grabbing' : 'grab', touchAction: 'none' }}
            onPointerDown={onPointerDown}
            onPointerMove={onPointerMove}
            onPointerUp={onPointerUp}
            onPointerLeave={() => onHover(null)}
            onKeyDown={onKeyDown}
            data-testid="profile-capture"
          />
          <PhotoTargets places={photoPlaces} card={card} />
        </SvgNodeView>
      </div>
      <PhotoCardOverlay
        places={photoPlaces}
        card={card}
        units={units.system}
        width={frame.width}
        height={frame.height}
      />
    </div>
  );
}

/** The analysed point nearest a chainage. */
export function nearestPoint(data: ProfileChartData, chainageM: number): number {
  const c = data.points.chainageM;
  const i = indexAtOrBefore(c, chainageM);
  return i < c.length - 1 && Math.abs(c[i + 1] - chainageM) < Math.abs(c[i] - chainageM) ? i + 1 : i;
}
