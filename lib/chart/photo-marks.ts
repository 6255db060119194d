import { formatQuantity, type UnitSystem } from '../units/index';
import { PROFILE_COLOURS } from './profile-palette';
import { el, type SvgNode } from './svg-node';

/** A site photo as the drawings need it: where along the route, and its number in the list. */
export interface ChartPhoto {
  id: string;
  chainageM: number;
  /** Number shown in the mark; the same number heads the photo in lists and the report. */
  number: number;
  /** Caption, or the file name when it has none. */
  label: string;
  /** The photo's own position, when it carried one (the plan draws it there). */
  latitudeDeg?: number | null;
  longitudeDeg?: number | null;
}

/** Where a photo's mark is drawn on a profile. */
export interface PhotoMarkPlace {
  photo: ChartPhoto;
  x: number;
  /** The ground under the mark (the stem's foot). */
  groundY: number;
  /** The middle of the mark's body. */
  y: number;
}

/** How a profile drawing maps chainage and ground to its pixels, and the window it shows. */
export interface PhotoMarkFrame {
  fromM: number;
  toM: number;
  x: (chainageM: number) => number;
  /** Ground at a chainage, as a pixel row. */
  groundY: (chainageM: number) => number;
  /** Highest row a mark may reach (the top of the plot). */
  topY: number;
}

const r2 = (v: number) => Math.round(v * 100) / 100;
export const PHOTO_MARK_COLOUR = '#6b3f8f';
const STEM_PX = 16;
const BODY = { width: 18, height: 13 } as const;

/** The marks of the photos inside the window, by chainage: a body on a stem standing on the ground. */
export function photoMarkPlaces(photos: readonly ChartPhoto[], frame: PhotoMarkFrame): PhotoMarkPlace[] {
  return photos
    .filter((p) => p.chainageM >= frame.fromM - 1e-9 && p.chainageM <= frame.toM + 1e-9)
    .sort((a, b) => a.chainageM - b.chainageM)
    .map((photo) => {
      const x = r2(frame.x(photo.chainageM));
      const groundY = r2(frame.groundY(photo.chainageM));
      const y = r2(Math.max(groundY - STEM_PX - BODY.height / 2, frame.topY + BODY.height / 2 + 2));
      return { photo, x, groundY, y };
    });
}

/** One mark: a small camera body (with its number) above the ground, on a stem down to it. */
export function photoMark(place: PhotoMarkPlace, units: UnitSystem): SvgNode {
  const { photo, x, groundY, y } = place;
  const left = r2(x - BODY.width / 2);
  const top = r2(y - BODY.height / 2);
  return el(
    'g',
    { 'data-photo-id': photo.id, 'data-chainage-m': r2(photo.chainageM), 'data-x': x },
    el('title', {}, `Photo ${photo.number} at ${formatQuantity('chainage', photo.chainageM, units)}: ${photo.label}`),
    el('line', {
      x1: x,
      y1: r2(top + BODY.height),
      x2: x,
      y2: groundY,
      stroke: PHOTO_MARK_COLOUR,
      'stroke-width': 1.2,
    }),
    el('rect', { x: r2(x - 4), y: r2(top - 3), width: 8, height: 4, rx: 1, fill: PHOTO_MARK_COLOUR }),
    el('rect', {
      x: left,
      y: top,
      width: BODY.width,
      height: BODY.height,
      rx: 3,
      fill: PHOTO_MARK_COLOUR,
      stroke: '#ffffff',
      'stroke-width': 1,
    }),
    el(
      'text',
      { x, y: r2(top + 9.5), 'font-size': 8.5, 'font-weight': 'bold', fill: '#ffffff', 'text-anchor': 'middle' },
      String(photo.number),
    ),
    el('circle', {
      cx: x,
      cy: groundY,
      r: 2,
      fill: PROFILE_COLOURS.paper,
      stroke: PHOTO_MARK_COLOUR,
      'stroke-width': 1.2,
    }),
  );
}

/** The photos layer of a profile: one mark per photo in the window (null when none). */
export function photoMarksLayer(
  photos: readonly ChartPhoto[] | undefined,
  frame: PhotoMarkFrame,
  units: UnitSystem,
): SvgNode | null {
  if (!photos || photos.length === 0) return null;
  return el('g', { 'data-layer': 'photos' }, ...photoMarkPlaces(photos, frame).map((p) => photoMark(p, units)));
}

/** Numbers photos 1, 2, … along the route (then the unplaced ones), as every list and drawing shows them. */
export function numberPhotos<
  T extends {
    id: string;
    chainageM: number | null;
    caption: string;
    fileName: string;
    latitude?: number | null;
    longitude?: number | null;
  },
>(photos: readonly T[]): (ChartPhoto & { source: T })[] {
  return [...photos]
    .filter((p): p is T & { chainageM: number } => p.chainageM !== null)
    .sort((a, b) => a.chainageM - b.chainageM || a.id.localeCompare(b.id))
    .map((p, i) => ({
      id: p.id,
      chainageM: p.chainageM,
      number: i + 1,
      label: p.caption || p.fileName,
      latitudeDeg: p.latitude ?? null,
      longitudeDeg: p.longitude ?? null,
      source: p,
    }));
}
