import { findPipe, type LineFix, type WarningCode, type WarningSeverity } from '../../hydraulics/index';
import { formatQuantity, type DisplayUnits } from '../units/index';

/** Runnel's short titles for the core's warning codes. */
export const WARNING_TITLES: Record<WarningCode, string> = {
  'static-over-rating': 'Over-pressure with the line shut',
  'surge-over-rating': 'Surge could pass the pipe rating',
  'negative-pressure': 'Suction while flowing (siphon stretch)',
  'siphon-limit': 'Beyond the practical siphon limit',
  'vapour-limit': 'Water would boil in the pipe',
  'residual-below-target': 'Too little pressure at the end',
  'no-gravity-flow': 'No flow by gravity',
  'tank-not-reached': 'Break-pressure tank cannot fill',
  'air-release-needed': 'Air trap at a summit',
  'washout-needed': 'Silt trap at a sag',
  'velocity-low': 'Slow water',
  'velocity-high': 'Fast water',
};

export const SEVERITY_WORDS: Record<WarningSeverity, string> = { danger: 'Danger', warning: 'Warning', info: 'Advice' };

const DEVICE_WORDS = {
  'break-pressure-tank': 'a break-pressure tank',
  'air-release-valve': 'an air-release valve',
  washout: 'a washout',
  'isolation-valve': 'an isolation valve',
} as const;

/** Words for a one-click fix button, e.g. `Add a break-pressure tank at ch. 537.6 m`. */
export function fixWords(fixes: readonly LineFix[], u: DisplayUnits): string {
  return fixes
    .map((fix) =>
      fix.kind === 'add-device'
        ? `Add ${DEVICE_WORDS[fix.device]} at ch. ${formatQuantity('chainage', fix.chainageM, u.system)}`
        : `Use ${findPipe(fix.pipeId)?.label ?? fix.pipeId} on stretch ${fix.stretchIndex + 1}`,
    )
    .join('; ');
}

/** Where a warning applies, in the project's units. */
export function placeWords(at: { chainageM: number } | { fromM: number; toM: number }, u: DisplayUnits): string {
  return 'chainageM' in at ? `ch. ${formatQuantity('chainage', at.chainageM, u.system)}` : `ch. ${formatQuantity('chainage', at.fromM, u.system)} to ${formatQuantity('chainage', at.toM, u.system)}`;
}
