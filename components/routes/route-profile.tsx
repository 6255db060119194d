'use client';

import { scaleLinear } from 'd3-scale';
import { line } from 'd3-shape';
import { useRef, type MouseEvent } from 'react';
import { PhotoCardOverlay, PhotoTargets, usePhotoCard } from '@/components/photos/photo-targets';
import { photoMarkPlaces, photoMarksLayer, PHOTO_MARK_COLOUR } from '@/lib/chart/photo-marks';
import { valueAt } from '@/lib/chart/profile-marks';
import type { NumberedPhoto } from '@/lib/queries/photos';
import { chainagePinMark } from '@/lib/chart/profile-review';
import type { ProfilePin } from '@/lib/chart/profile-types';
import { fromDisplay, toDisplay, unitOf } from '@/lib/units';
import { SvgNodes } from '../lines/svg-node-view';
import type { ProfilePoint } from '@/lib/routes/profile-series';
import type { UnitSystem } from '@/lib/units';

const W = 800;
const H = 260;
const M = { top: 14, right: 16, bottom: 34, left: 58 };

export interface ProfileMarker extends ProfilePoint {
  label: string;
}

export interface RouteProfileProps {
  /** Heights as surveyed (all points, excluded ones too). */
  raw?: readonly ProfilePoint[];
  /** Heights the design uses (kept points). */
  cleaned: readonly ProfilePoint[];
  /** Points with a pending clean-up proposal, drawn as rings on the raw line. */
  markers?: readonly ProfileMarker[];
  units: UnitSystem;
  title: string;
  /** Site photos along the route: marked at their chainages, their card shown on hover or click. */
  photos?: readonly NumberedPhoto[];
  /** Sketch mode: the area shown when there are no points yet, metres, and what a click does. */
  sketch?: { lengthM: number; lowM: number; highM: number; onAdd: (chainageM: number, elevationM: number) => void };
  /** Review comments pinned at chainages of the route. */
  pins?: readonly ProfilePin[];
  /** Called with the chainage clicked (pinning a comment), when set and not sketching. */
  onPick?: (chainageM: number) => void;
}

type Pt = { x: number; y: number };

/**
 * A small long-section: raw heights dashed, cleaned heights solid, side by side, in the project's
 * units. In sketch mode a click on the chart adds a station at that chainage and height.
 */
export function RouteProfile({
  raw = [],
  cleaned,
  markers = [],
  units,
  title,
  sketch,
  pins = [],
  onPick,
  photos = [],
}: RouteProfileProps) {
  const svgRef = useRef<SVGSVGElement>(null);
  const card = usePhotoCard();
  const d = (p: ProfilePoint): Pt => ({
    x: toDisplay('length', p.chainageM, units),
    y: toDisplay('length', p.elevationM, units),
  });
  const rawD = raw.map(d);
  const cleanD = cleaned.map(d);
  const all = [...rawD, ...cleanD];
  const xs = all.map((p) => p.x);
  const ys = all.map((p) => p.y);
  // A sketch keeps its area while points are added, so the chart does not jump under the pointer.
  const xDomain: [number, number] = [
    Math.min(0, ...xs),
    Math.max(sketch ? toDisplay('length', sketch.lengthM, units) : 1, ...xs),
  ];
  const yLow = Math.min(...(sketch ? [toDisplay('length', sketch.lowM, units)] : []), ...ys);
  const yHigh = Math.max(...(sketch ? [toDisplay('length', sketch.highM, units)] : []), ...ys);
  const pad = Math.max(1, (yHigh - yLow) * 0.08);
  const x = scaleLinear()
    .domain(xDomain)
    .range([M.left, W - M.right])
    .nice();
  const y = scaleLinear()
    .domain([yLow - pad, yHigh + pad])
    .range([H - M.bottom, M.top])
    .nice();
  const path = line<Pt>()
    .x((p) => x(p.x))
    .y((p) => y(p.y));
  const u = unitOf('length', units);
  // Photo marks: the same layer the line's long profile draws, on this chart's scales.
  const chainages = cleaned.map((p) => p.chainageM);
  const heights = cleaned.map((p) => p.elevationM);
  const photoFrame = {
    fromM: chainages[0] ?? 0,
    toM: chainages[chainages.length - 1] ?? 0,
    x: (c: number) => x(toDisplay('length', c, units)),
    groundY: (c: number) => y(toDisplay('length', valueAt(chainages, heights, c), units)),
    topY: M.top,
  };
  const photoLayer = cleaned.length > 1 ? photoMarksLayer(photos, photoFrame, units) : null;
  const byId = new Map(photos.map((p) => [p.id, p]));
  const photoPlaces =
    cleaned.length < 2
      ? []
      : photoMarkPlaces(photos, photoFrame).flatMap((place) => {
          const photo = byId.get(place.photo.id);
          return photo ? [{ photo, x: place.x, y: place.y }] : [];
        });

  function pointAt(e: MouseEvent<SVGRectElement>) {
    const ctm = svgRef.current?.getScreenCTM();
    return ctm ? new DOMPoint(e.clientX, e.clientY).matrixTransform(ctm.inverse()) : null;
  }

  function onClick(e: MouseEvent<SVGRectElement>) {
    const pt = pointAt(e);
    if (!pt || !sketch) return;
    sketch.onAdd(fromDisplay('length', x.invert(pt.x), units), fromDisplay('length', y.invert(pt.y), units));
  }

  function onPickClick(e: MouseEvent<SVGRectElement>) {
    const pt = pointAt(e);
    if (!pt || !onPick) return;
    const lastM = Math.max(0, ...cleaned.map((p) => p.chainageM), ...raw.map((p) => p.chainageM));
    onPick(Math.min(Math.max(fromDisplay('length', x.invert(pt.x), units), 0), lastM));
  }
  const pinMarks = pins.map((p) =>
    chainagePinMark(p, x(toDisplay('length', p.chainageM, units)), M.top - 4, H - M.bottom, units),
  );

  return (
    <figure className="relative space-y-1">
      <svg
        ref={svgRef}
        viewBox={`0 0 ${W} ${H}`}
        role={photoPlaces.length > 0 ? 'group' : 'img'}
        aria-label={title}
        className="w-full rounded-md border border-creek-100 bg-white"
        data-testid="route-profile"
      >
        <title>{title}</title>
        {y.ticks(5).map((t) => (
          <g key={`y${t}`}>
            <line x1={M.left} x2={W - M.right} y1={y(t)} y2={y(t)} className="stroke-creek-50" />
            <text x={M.left - 6} y={y(t)} dy="0.32em" textAnchor="end" className="fill-creek-600 text-[10px]">
              {t}
            </text>
          </g>
        ))}
        {x.ticks(8).map((t) => (
          <text key={`x${t}`} x={x(t)} y={H - M.bottom + 14} textAnchor="middle" className="fill-creek-600 text-[10px]">
            {t}
          </text>
        ))}
        <text x={(M.left + W - M.right) / 2} y={H - 4} textAnchor="middle" className="fill-creek-700 text-[11px]">
          chainage ({u})
        </text>
        <text
          transform={`translate(12 ${(H - M.bottom + M.top) / 2}) rotate(-90)`}
          textAnchor="middle"
          className="fill-creek-700 text-[11px]"
        >
          elevation ({u})
        </text>
        {rawD.length > 1 && (
          <path
            d={path(rawD) ?? ''}
            fill="none"
            strokeDasharray="4 3"
            strokeWidth={1.2}
            className="stroke-ochre-500"
            data-series="raw"
          />
        )}
        {cleanD.length > 1 && (
          <path d={path(cleanD) ?? ''} fill="none" strokeWidth={2} className="stroke-creek-700" data-series="cleaned" />
        )}
        {cleanD.length <= 60 &&
          cleanD.map((p, i) => <circle key={i} cx={x(p.x)} cy={y(p.y)} r={2.5} className="fill-creek-700" />)}
        {markers.map((m, i) => {
          const p = d(m);
          return (
            <circle
              key={`m${i}`}
              cx={x(p.x)}
              cy={y(p.y)}
              r={6}
              fill="none"
              strokeWidth={2}
              className="stroke-clay-500"
              data-marker="proposal"
            >
              <title>{m.label}</title>
            </circle>
          );
        })}
        {!sketch && onPick && (
          <rect
            x={M.left}
            y={M.top}
            width={W - M.left - M.right}
            height={H - M.top - M.bottom}
            fill="transparent"
            className="cursor-crosshair"
            onClick={onPickClick}
            data-testid="route-profile-capture"
          />
        )}
        {pinMarks.length > 0 && (
          <g data-layer="comment-pins" pointerEvents="none">
            <SvgNodes nodes={pinMarks} />
          </g>
        )}
        {photoLayer && <SvgNodes nodes={[photoLayer]} />}
        <PhotoTargets places={photoPlaces} card={card} />
        {sketch && (
          <rect
            x={M.left}
            y={M.top}
            width={W - M.left - M.right}
            height={H - M.top - M.bottom}
            fill="transparent"
            className="cursor-crosshair"
            onClick={onClick}
            data-testid="sketch-area"
          />
        )}
      </svg>
      <PhotoCardOverlay places={photoPlaces} card={card} units={units} width={W} height={H} />
      <figcaption className="flex flex-wrap gap-4 text-xs text-creek-700">
        <span className="flex items-center gap-1">
          <span className="inline-block h-0.5 w-5 bg-creek-700" /> cleaned (used for design)
        </span>
        {rawD.length > 0 && (
          <span className="flex items-center gap-1">
            <span className="inline-block h-0 w-5 border-t-2 border-dashed border-ochre-500" /> as surveyed
          </span>
        )}
        {markers.length > 0 && (
          <span className="flex items-center gap-1">
            <span className="inline-block h-2.5 w-2.5 rounded-full border-2 border-clay-500" /> proposed clean-up
          </span>
        )}
        {photoPlaces.length > 0 && (
          <span className="flex items-center gap-1">
            <span className="inline-block h-2.5 w-3.5 rounded-sm" style={{ background: PHOTO_MARK_COLOUR }} /> site
            photo (point at it to see it)
          </span>
        )}
        {sketch && <span>Click on the chart to add a station at that chainage and height.</span>}
      </figcaption>
    </figure>
  );
}
