import { assertNonNegative } from '../input-guards';
import { HydraulicsInputError } from '../errors';
import { findLowPoints, type LowPoint, type PipeProfile } from './low-points';

/** One line as the winter plan sees it. */
export interface WinterLine {
  label: string;
  profile: PipeProfile;
  /** Depth of cover over the pipe, m (the shallowest along the line). */
  coverDepthM: number;
  /** Depth frost reaches at the site, m (local code or records). */
  frostDepthM: number;
  /** Prominence for low points, m. @default 1 (the washout rule, see `findLowPoints`) */
  prominenceM?: number;
  /**
   * The designer drains this line for winter whatever its cover (a shallow line is drained in any case). @default false
   */
  drainForWinter?: boolean;
}

export interface WinterTreatment {
  label: string;
  treatment: 'buried-below-frost' | 'drain-for-winter';
  /** Where to drain the line (empty when it is buried below frost depth). */
  drainPoints: LowPoint[];
}

/** Whether a line can stay full through winter, and where to drain it if not. */
export function winterTreatment(line: WinterLine, index = 0): WinterTreatment {
  assertNonNegative(line.coverDepthM, 'lines.coverDepthM', index);
  assertNonNegative(line.frostDepthM, 'lines.frostDepthM', index);
  const drainPoints = lowPointsOfLine(line, index);
  if (line.coverDepthM > line.frostDepthM && !line.drainForWinter)
    return { label: line.label, treatment: 'buried-below-frost', drainPoints: [] };
  return { label: line.label, treatment: 'drain-for-winter', drainPoints };
}

/** Low points of one line, with a bad profile reported against the line it belongs to. */
function lowPointsOfLine(line: WinterLine, lineIndex: number): LowPoint[] {
  try {
    return findLowPoints({ ...line.profile, prominenceM: line.prominenceM });
  } catch (error) {
    if (!(error instanceof HydraulicsInputError)) throw error;
    const message = error.message.slice(error.message.indexOf(': ') + 2);
    throw new HydraulicsInputError(`lines[${lineIndex}].profile.${error.field}`, message, error.index);
  }
}
