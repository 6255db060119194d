import {
  heightDatumOf,
  surveyHeightScatterM,
  type HeightConfidence,
  type LineFlow,
  type LineInput,
  type LineStart,
  type LineStation,
} from '../../hydraulics/index';
import type { LineDesign } from '../validations/line-design';
import { EMPTY_SITE_CONTEXT, flowFromRam, ramStartOf, type LineSiteContext } from './ram-start';

/** Where a line's start and flow came from: the network (its feed node and solved pieces) or the line's own design. */
export interface LineFeed {
  start: LineStart;
  flow: LineFlow;
  startFrom: 'network' | 'design';
  flowFrom: 'network' | 'design';
}

/**
 * The one place that says what feeds a line. A line that names its ram site reads the ram's plan.
 * Otherwise, when the network knows the node at the line's start, its level or head is the start
 * (the line's own saved level or typed heads are not read), and when the network is solved each
 * piece's solved flow is the flow. Otherwise the design's start and flow.
 */
export function lineFeedOf(
  design: LineDesign,
  stations: readonly LineStation[],
  context: LineSiteContext = EMPTY_SITE_CONTEXT,
): LineFeed {
  const groundM = stations[0]?.groundElevationM ?? 0;
  // A line that names its ram site reads that ram's plan (the same plan the network's ram outlet reads),
  // so switching a delivery line to its ram takes effect at once, before the network is re-joined.
  const ram = ramStartOf(design.start, context, groundM);
  const network = ram ? null : (context.network ?? null);
  const pieces = context.network?.schedule;
  const schedule = design.flow.kind !== 'pump-delivery' && pieces && pieces.length > 0 ? pieces : null;
  const start: LineStart = ram ? ram.start : (network?.start ?? (design.start as LineStart));
  const flow: LineFlow = schedule ? { kind: 'schedule', pieces: schedule } : flowFromRam(design.flow, ram);
  return {
    start,
    flow,
    startFrom: !ram && network?.start ? 'network' : 'design',
    flowFrom: schedule ? 'network' : 'design',
  };
}

/**
 * The engineering core's input for a saved design on its stations (map positions dropped). Its start
 * and flow come from `lineFeedOf`: the network's feed and solved pieces when `context` carries them,
 * else the design (a line started at a ram site reads the ram's plan from `context` now). The route's height confidence
 * becomes the analysis's height
 * scatter (see `surveyHeightScatterM`), so a walked GPS route is read no finer than it was surveyed.
 */
export function lineInputOf(
  design: LineDesign,
  stations: readonly (LineStation & HeightConfidence)[],
  context: LineSiteContext = EMPTY_SITE_CONTEXT,
): LineInput {
  const heightScatterM = surveyHeightScatterM(stations);
  const heightDatum = stations.some((s) => s.heightSource !== undefined)
    ? heightDatumOf(stations.map((s) => s.heightSource))
    : 'geodetic';
  const feed = lineFeedOf(design, stations, context);
  return {
    stations: stations.map((s) =>
      s.coverM === undefined
        ? { chainageM: s.chainageM, groundElevationM: s.groundElevationM }
        : { chainageM: s.chainageM, groundElevationM: s.groundElevationM, coverM: s.coverM },
    ),
    stretches: design.stretches,
    fittings: design.fittings,
    devices: design.devices,
    pipes: design.pipes,
    start: feed.start,
    end: design.end,
    flow: feed.flow,
    // The survey's scatter and datum come with the route, not from the designer: they are what the heights are worth.
    settings: {
      ...design.settings,
      ...(heightScatterM > 0 ? { heightScatterM } : {}),
      ...(heightDatum === 'assumed' ? { heightDatum } : {}),
    },
  };
}

/** The design parts a one-click fix may change, taken back from a fixed core input. */
export function designWithInput(design: LineDesign, input: LineInput): LineDesign {
  return { ...design, stretches: [...input.stretches], devices: [...(input.devices ?? [])] };
}
