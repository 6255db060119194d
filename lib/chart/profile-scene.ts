import { profileFrame, PROFILE_LAYOUT } from './profile-frame';
import { axesLayer } from './profile-axes';
import { legendLayer } from './profile-legend';
import { photoMarkPlaces, photoMarksLayer, type PhotoMarkPlace } from './photo-marks';
import { devicesLayer, highlightLayer, valueAt, zonesLayer } from './profile-marks';
import { commentPinsLayer, earlierGradeLayer, stampLayer } from './profile-review';
import { FONT_FAMILY, PROFILE_COLOURS } from './profile-palette';
import { gradeLayer, groundLayer, pipeLayer, pressureLayer, staticLayer } from './profile-series';
import type { ProfileChartData, ProfileChartOptions, ProfileFrame } from './profile-types';
import { el, type SvgNode } from './svg-node';
import { thinProfile } from './thin-profile';

export interface ProfileScene {
  root: SvgNode;
  frame: ProfileFrame;
  /** Profile points drawn (after thinning), ascending indices. */
  drawnIndices: number[];
  /** Where each photo in the window is marked (the screen lays its pointer targets over them). */
  photos: PhotoMarkPlace[];
}

/** Points that must be drawn whatever the thinning: inserted points (stretch ends, fittings, tanks). */
function insertedPoints(stationIndex: ArrayLike<number>, from: number, to: number): number[] {
  const out: number[] = [];
  for (let i = from; i <= to; i++) if (stationIndex[i] < 0) out.push(i);
  return out;
}

/** Photo marks stand on the ground line of the elevation panel. */
function photoFrame(data: ProfileChartData, frame: ProfileFrame) {
  const { chainageM, groundElevationM } = data.points;
  return {
    fromM: frame.fromM,
    toM: frame.toM,
    x: frame.x,
    groundY: (c: number) =>
      Math.min(
        Math.max(frame.yElevation(valueAt(chainageM, groundElevationM, c)), frame.elevationTop),
        frame.elevationBottom,
      ),
    topY: frame.elevationTop,
  };
}

/**
 * The long profile as an SVG node tree: two panels on one chainage axis (elevation with ground,
 * pipe by class, static line and hydraulic grade; pressure head with allowed head), warning
 * ranges shaded, devices and site photos marked, axes in the project's units and a legend. Each layer is a `<g>`
 * with `data-layer` so exports and tests can find it. Long lines are thinned to about two
 * points per pixel column, keeping in each column the highest and lowest high or low of the ground
 * and of the pipe, so no summit or sag a column could show is lost.
 */
export function profileScene(data: ProfileChartData, options: ProfileChartOptions, idPrefix = 'profile'): ProfileScene {
  const width = options.width ?? PROFILE_LAYOUT.width;
  const legendProbe = legendLayer(data, options, width, PROFILE_LAYOUT.marginLeft, 0);
  const frame = profileFrame(data, options, legendProbe.height);
  const { points } = data;
  const drawnIndices = thinProfile(points.chainageM, points.groundElevationM, {
    targetPoints: Math.round(2 * (frame.plotRight - frame.plotLeft)),
    guardSeries: [points.pipeElevationM],
    columns: frame.plotRight - frame.plotLeft,
    keep: insertedPoints(points.stationIndex, frame.firstIndex, frame.lastIndex),
    from: frame.firstIndex,
    to: frame.lastIndex,
  });
  const legend = legendLayer(
    data,
    options,
    width,
    PROFILE_LAYOUT.marginLeft,
    frame.pressureBottom + PROFILE_LAYOUT.axisBelow,
  );
  const clip = (id: string, top: number, bottom: number) =>
    el(
      'clipPath',
      { id },
      el('rect', { x: frame.plotLeft, y: top, width: frame.plotRight - frame.plotLeft, height: bottom - top }),
    );
  const photosFrame = photoFrame(data, frame);
  const photoPlaces = options.photos ? photoMarkPlaces(options.photos, photosFrame) : [];
  const elevationClip = `${idPrefix}-elevation-clip`;
  const pressureClip = `${idPrefix}-pressure-clip`;
  const root = el(
    'svg',
    {
      viewBox: `0 0 ${frame.width} ${frame.height}`,
      width: frame.width,
      height: frame.height,
      // With photo marks to point at (focusable on screen) it is a labelled group, not a flat image.
      role: photoPlaces.length > 0 ? 'group' : 'img',
      'aria-labelledby': `${idPrefix}-title`,
      'font-family': FONT_FAMILY,
      'data-from-m': frame.fromM,
      'data-to-m': frame.toM,
    },
    el('title', { id: `${idPrefix}-title` }, options.title ?? 'Long profile of the line'),
    el(
      'defs',
      {},
      clip(elevationClip, frame.elevationTop, frame.elevationBottom),
      clip(pressureClip, frame.pressureTop, frame.pressureBottom),
    ),
    el('rect', {
      x: 0,
      y: 0,
      width: frame.width,
      height: frame.height,
      fill: PROFILE_COLOURS.paper,
      'data-layer': 'background',
    }),
    options.title
      ? el(
          'text',
          { x: frame.plotLeft, y: 22, 'font-size': 14, 'font-weight': 'bold', fill: PROFILE_COLOURS.ink },
          options.title,
        )
      : null,
    zonesLayer(data, frame),
    axesLayer(frame),
    el(
      'g',
      {
        'clip-path': `url(#${elevationClip})`,
        'data-panel': 'elevation',
        'data-x-range': `${frame.plotLeft} ${frame.plotRight}`,
        'data-y-range': `${frame.elevationBottom} ${frame.elevationTop}`,
        'data-y-domain-m': frame.elevationDomainM.join(' '),
      },
      groundLayer(data, frame, drawnIndices),
      pipeLayer(data, frame, drawnIndices),
      staticLayer(data, frame),
      earlierGradeLayer(frame, options),
      gradeLayer(data, frame, drawnIndices),
    ),
    el(
      'g',
      {
        'clip-path': `url(#${pressureClip})`,
        'data-panel': 'pressure',
        'data-x-range': `${frame.plotLeft} ${frame.plotRight}`,
        'data-y-range': `${frame.pressureBottom} ${frame.pressureTop}`,
        'data-y-domain-m': frame.pressureDomainM.join(' '),
      },
      pressureLayer(data, frame, drawnIndices),
    ),
    devicesLayer(data, frame, options),
    photoMarksLayer(options.photos, photosFrame, options.units.system),
    highlightLayer(frame, options),
    commentPinsLayer(frame, options),
    stampLayer(frame, options.stamp),
    legend.node,
  );
  return { root, frame, drawnIndices, photos: photoPlaces };
}
