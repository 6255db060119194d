import { heightDatumOf, surveyHeightScatterM, type HeightConfidence, type LineInput, type LineStation } from '../../hydraulics/index';
import type { LineDesign } from '../validations/line-design';
import { EMPTY_SITE_CONTEXT, flowFromRam, ramStartOf, type LineSiteContext } from './ram-start';

/**
 * The engineering core's input for a saved design on its stations (map positions dropped). A line
 * started at a ram site reads the ram's plan from `context` now, so a change to the ram site reaches
 * the line at its next analysis. The route's height confidence becomes the analysis's height
 * scatter (see `surveyHeightScatterM`), so a walked GPS route is read no finer than it was surveyed.
 */
export function lineInputOf(design: LineDesign, stations: readonly (LineStation & HeightConfidence)[], context: LineSiteContext = EMPTY_SITE_CONTEXT): LineInput {
  const heightScatterM = surveyHeightScatterM(stations);
  const heightDatum = stations.some((s) => s.heightSource !== undefined) ? heightDatumOf(stations.map((s) => s.heightSource)) : 'geodetic';
  const ram = ramStartOf(design.start, context, stations[0]?.groundElevationM ?? 0);
  return {
    stations: stations.map((s) => (s.coverM === undefined ? { chainageM: s.chainageM, groundElevationM: s.groundElevationM } : { chainageM: s.chainageM, groundElevationM: s.groundElevationM, coverM: s.coverM })),
    stretches: design.stretches,
    fittings: design.fittings,
    devices: design.devices,
    pipes: design.pipes,
    start: ram ? ram.start : (design.start as LineInput['start']),
    end: design.end,
    flow: flowFromRam(design.flow, ram),
    // The survey's scatter and datum come with the route, not from the designer: they are what the heights are worth.
    settings: { ...design.settings, ...(heightScatterM > 0 ? { heightScatterM } : {}), ...(heightDatum === 'assumed' ? { heightDatum } : {}) },
  };
}

/** The design parts a one-click fix may change, taken back from a fixed core input. */
export function designWithInput(design: LineDesign, input: LineInput): LineDesign {
  return { ...design, stretches: [...input.stretches], devices: [...(input.devices ?? [])] };
}
