import { describe, expect, it } from 'vitest';
import { analyzeLine, type LineDevice, type LineInput } from '../../../hydraulics/index';
import { warningText } from '../../../lib/lines/warning-words';
import { displayUnits } from '../../../lib/units';

/**
 * Summits at ch. 300 (110 m) and 900 (95 m), a sag at ch. 600 (80 m), between a spring and a trough (invented, pipe on
 * the ground).
 */
function line(devices: LineDevice[]): LineInput {
  return {
    stations: [
      [0, 100],
      [300, 110],
      [600, 80],
      [900, 95],
      [1200, 60],
    ].map(([chainageM, groundElevationM]) => ({ chainageM, groundElevationM, coverM: 0 })),
    stretches: [{ fromM: 0, toM: 1200, pipe: 'pe100-iso4427-sdr11-50mm' }],
    start: { kind: 'water-level', levelM: 125 },
    end: { kind: 'free-discharge' },
    flow: { kind: 'design', flowM3s: 0.001 },
    devices,
  };
}

const codes = (input: LineInput) => analyzeLine(input).warnings.map((w) => w.code);

describe('an air valve at a low point or a washout at a high point is warned (profile-and-checks.md §1.2, [R10])', () => {
  it('devices at the right points: no misplacement, and the points count as served', () => {
    const c = codes(
      line([
        { kind: 'air-release-valve', chainageM: 300 },
        { kind: 'washout', chainageM: 600 },
        { kind: 'air-release-valve', chainageM: 900 },
      ]),
    );
    expect(c).not.toContain('device-misplaced');
    expect(c).not.toContain('air-release-needed');
    expect(c).not.toContain('washout-needed');
  });

  it('swapped: each device is warned, naming where the other belongs, and the real needs stay listed', () => {
    const analysis = analyzeLine(
      line([
        { kind: 'washout', chainageM: 300 },
        { kind: 'air-release-valve', chainageM: 600 },
      ]),
    );
    const misplaced = analysis.warnings.filter((w) => w.code === 'device-misplaced');
    expect(misplaced.map((w) => [w.values.deviceKind, w.values.chainageM])).toEqual([
      ['washout', 300],
      ['air-release-valve', 600],
    ]);
    expect(analysis.warnings.map((w) => w.code)).toContain('air-release-needed');
    expect(analysis.warnings.map((w) => w.code)).toContain('washout-needed');
    const text = warningText(misplaced[1], displayUnits('us'));
    // 600 m = 1,969 ft; 80 m = 262.47 ft (1 ft = 0.3048 m, core.md §7; elevations to the hundredth, the one rounding
    // rule).
    expect(text.message).toContain('ch. 1,969 ft (262.47 ft)');
    expect(text.fix).toMatch(/fit a washout here at ch\. 1,969 ft/);
  });

  it('a valve on a slope, away from any high or low, is not called misplaced', () => {
    expect(codes(line([{ kind: 'air-release-valve', chainageM: 450 }]))).not.toContain('device-misplaced');
  });
});
