import type { LineAnalysis, LineDevice } from '../../hydraulics/index';
import { profileScene } from '../chart/profile-scene';
import type { ReviewStamp } from '../review/stamp';
import type { DisplayUnits } from '../units';

/** Width of the profile drawn into the SVG file, px (the PDF draws at 1000, `reportProfileScene`). */
const SVG_EXPORT_WIDTH = 1200;

/** The vertical exaggeration as the screen's setting says it: `auto` or the number. */
export type ExaggerationSetting = number | 'auto';

/**
 * The long profile as the SVG file draws it: the screen's drawing at export width, with a title and
 * the review stamp, at the screen's exaggeration setting (the same exaggeration on every width).
 */
export function svgExportScene(
  analysis: LineAnalysis,
  options: {
    units: DisplayUnits;
    devices: readonly LineDevice[];
    title: string;
    stamp: ReviewStamp;
    exaggeration: ExaggerationSetting;
  },
) {
  return profileScene(analysis, { ...options, width: SVG_EXPORT_WIDTH }, 'export');
}

/** Where the saved line's PDF report is read, drawn at the screen's exaggeration setting. */
export const lineReportUrl = (lineId: string, exaggeration: ExaggerationSetting) =>
  `/api/lines/${lineId}/report?exaggeration=${exaggeration === 'auto' ? 'auto' : Number(exaggeration.toFixed(4))}`;
