import type { PumpOutletHead } from '../lift/pump-outlet';
import type { LineDesign } from '../validations/line-design';
import { ramStartOf, type LineSiteContext, type RamLineStart } from './ram-start';

/** What the answers and the report say about the ram feeding a delivery line. */
export interface RamFeedAnswers {
  outlet: PumpOutletHead;
  pumpElevationM: number;
  pumpElevationFrom: RamLineStart['pumpElevationFrom'];
  /** Pressure head at the pump outlet while delivering, m. */
  workingHeadM: number;
  /** True when the line's flow is what the ram delivers (not a flow the designer set). */
  flowFromRam: boolean;
  /** Head against a shut line at the pump, m, and what the line's pipe at the pump allows. */
  peakHeadAtPumpM: number;
  allowableHeadAtPumpM: number;
  pipeAtPumpLabel: string;
  peakWithinRating: boolean;
}

interface AnalysisAtPump {
  stretches: readonly { allowableHeadM: number; pipe: { label: string } }[];
}

/** The ram figures for a line started at a ram site, or null for any other start (or a ram that cannot be read). */
export function ramFeedAnswers(
  design: LineDesign,
  context: LineSiteContext,
  analysis: AnalysisAtPump,
  lineStartGroundM: number,
): RamFeedAnswers | null {
  let ram: RamLineStart | null;
  try {
    ram = ramStartOf(design.start, context, lineStartGroundM);
  } catch {
    return null;
  }
  if (!ram || analysis.stretches.length === 0) return null;
  const atPump = analysis.stretches[0];
  return {
    outlet: ram.outlet,
    pumpElevationM: ram.pumpElevationM,
    pumpElevationFrom: ram.pumpElevationFrom,
    workingHeadM: ram.outlet.workingHeadM,
    flowFromRam: design.flow.kind === 'pump-delivery',
    peakHeadAtPumpM: ram.outlet.peakHeadAtPumpM,
    allowableHeadAtPumpM: atPump.allowableHeadM,
    pipeAtPumpLabel: atPump.pipe.label,
    peakWithinRating: ram.outlet.peakHeadAtPumpM <= atPump.allowableHeadM,
  };
}
