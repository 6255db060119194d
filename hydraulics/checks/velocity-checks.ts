import { nextSizeInSeries } from '../design/upsize';
import type { LineProfile } from '../profile/result-types';
import type { LineWarning } from './types';
import { chainageRange, speed } from './wording';

/**
 * Velocity per stretch against the self-cleaning minimum and the erosion maximum (defaults
 * 0.7 and 3.0 m/s, Jordan p.53 via ITACA [R1]). Only while water flows.
 */
export function velocityWarnings(profile: LineProfile): LineWarning[] {
  if (profile.flowM3s === 0) return [];
  const { velocityMinMs, velocityMaxMs } = profile.settings;
  const warnings: LineWarning[] = [];
  for (const stretch of profile.stretches) {
    const v = Math.abs(stretch.velocityMs);
    const at = { fromM: stretch.fromM, toM: stretch.toM };
    const base = {
      ...at,
      velocityMs: v,
      stretchIndex: stretch.index,
      pipeId: stretch.pipe.id,
      pipeLabel: stretch.pipe.label,
    };
    const where = chainageRange(stretch.fromM, stretch.toM);
    if (v < velocityMinMs) {
      warnings.push({
        code: 'velocity-low',
        severity: 'info',
        at,
        values: { ...base, limitVelocityMs: velocityMinMs },
        message:
          `Water moves at ${speed(v)} in ${stretch.pipe.label} from ${where}, below the self-cleaning ` +
          `${speed(velocityMinMs)}: silt settles and air bubbles are not carried through.`,
        suggestedFix: 'Use a smaller pipe if the head allows it, and fit washouts at the low points of this stretch.',
        fixes: [],
      });
    } else if (v > velocityMaxMs) {
      const next = nextSizeInSeries(stretch.pipe);
      warnings.push({
        code: 'velocity-high',
        severity: 'warning',
        at,
        values: {
          ...base,
          limitVelocityMs: velocityMaxMs,
          ...(next ? { toPipeId: next.id, toPipeLabel: next.label } : {}),
        },
        message:
          `Water moves at ${speed(v)} in ${stretch.pipe.label} from ${where}, above ${speed(velocityMaxMs)}: ` +
          'suspended sand wears the pipe and fittings, and a sudden stop gives a larger pressure surge.',
        suggestedFix: next ? `Use the next size up, ${next.label}.` : 'Use a larger pipe for this stretch.',
        fixes: next ? [{ kind: 'change-pipe', stretchIndex: stretch.index, pipeId: next.id }] : [],
      });
    }
  }
  return warnings;
}
