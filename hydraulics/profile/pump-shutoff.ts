import type { LineStart } from './types';

/**
 * Shut-off head of a pump over its duty head when the pump curve is not given. Centrifugal pumps
 * typically build 1.1-1.3 times their duty head against a shut valve (from memory); the upper part
 * is taken so the static line is not understated. Common practice, no source.
 */
export const DEFAULT_SHUTOFF_TO_DUTY_HEAD = 1.25;

/**
 * Grade with the line shut, m above datum: the pump's own shut-off grade when given; otherwise its
 * head above the pipe at the pump, scaled by {@link DEFAULT_SHUTOFF_TO_DUTY_HEAD}. Never below the
 * pumping grade (the validator refuses a shut-off below it).
 */
export function pumpShutoffGradeM(start: Extract<LineStart, { kind: 'pump' }>, pumpPipeElevationM: number): number {
  if (start.shutoffHeadM !== undefined) return start.shutoffHeadM;
  const dutyHeadM = start.outletHeadM - pumpPipeElevationM;
  return dutyHeadM > 0 ? pumpPipeElevationM + DEFAULT_SHUTOFF_TO_DUTY_HEAD * dutyHeadM : start.outletHeadM;
}
