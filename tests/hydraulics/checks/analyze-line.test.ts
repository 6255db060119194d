import { describe, expect, it } from 'vitest';
import {
  analyzeLine,
  applyLineFixes,
  findTurningPoints,
  joukowskyHeadRise,
  PRESSURE_CAUTION,
  type LineInput,
  type LineWarning,
} from '../../../hydraulics/index';
import { simpleLine, testPipe } from '../profile/fixtures';

const codes = (warnings: readonly LineWarning[]) => warnings.map((w) => w.code);
const PRESSURE_CODES = new Set([
  'negative-pressure',
  'siphon-limit',
  'vapour-limit',
  'residual-below-target',
  'static-over-rating',
  'surge-over-rating',
]);

describe('analyzeLine checks', () => {
  it('velocity band defaults 0.7 and 3.0 m/s (Jordan p.53 via ITACA [R1])', () => {
    const area = Math.PI * 0.05 * 0.05;
    const at = (v: number) =>
      analyzeLine(
        simpleLine(
          [
            [0, 100],
            [1000, 99],
          ],
          200,
          v * area,
        ),
      ).warnings;
    expect(codes(at(0.69))).toContain('velocity-low');
    expect(codes(at(0.71))).not.toContain('velocity-low');
    expect(codes(at(2.99))).not.toContain('velocity-high');
    const high = at(3.01).find((w) => w.code === 'velocity-high');
    expect(high?.severity).toBe('warning');
  });

  it('static pressure over the rating: danger with the fewest break-pressure tanks as a one-click fix that clears it', () => {
    const pipe = testPipe({ pressureRatingPa: 980_665 }); // ~100 m of head: the [R1] example's allowable
    const input: LineInput = {
      ...simpleLine(
        [
          [0, 1000],
          [4000, 600],
        ],
        1000,
        0.001,
        pipe,
      ),
      settings: { checkSurge: false },
    };
    const analysis = analyzeLine(input);
    const over = analysis.warnings.filter((w) => w.code === 'static-over-rating');
    expect(over).toHaveLength(1);
    expect(over[0].severity).toBe('danger');
    expect(over[0].message).toContain(PRESSURE_CAUTION);
    const tanks = over[0].fixes;
    expect(tanks.every((fix) => fix.kind === 'add-device' && fix.device === 'break-pressure-tank')).toBe(true);
    expect(tanks).toHaveLength(3);
    const fixed = analyzeLine(applyLineFixes(input, tanks));
    expect(codes(fixed.warnings)).not.toContain('static-over-rating');
    expect(fixed.tanks).toHaveLength(3);
    expect(input.devices).toBeUndefined();
  });

  it('surge: static plus the Joukowsky rise a V / g over the rating is a warning with the critical closure time', () => {
    const pipe = testPipe({ pressureRatingPa: 980_665, waveSpeedMs: 400 });
    const flow = 1.0 * Math.PI * 0.05 * 0.05; // 1 m/s
    const analysis = analyzeLine(
      simpleLine(
        [
          [0, 200],
          [1000, 120],
        ],
        200,
        flow,
        pipe,
      ),
    );
    const surge = analysis.warnings.find((w) => w.code === 'surge-over-rating');
    expect(surge?.severity).toBe('warning');
    const rise = joukowskyHeadRise({ waveSpeedMs: 400, velocityChangeMs: 1 });
    expect(analysis.stretches[0].surgeHeadM).toBeCloseTo(rise, 9);
    // 80 m static + 40.8 m surge passes ~100 m where the static head reaches 100 - 40.8 m.
    const allowable = analysis.stretches[0].allowableHeadM;
    expect(surge && 'fromM' in surge.at ? surge.at.fromM : NaN).toBeCloseTo(((allowable - rise) / 80) * 1000, 0);
    expect(surge?.message).toContain(PRESSURE_CAUTION);
    expect(surge?.message).toMatch(/2L\/a = \d/);
  });

  it('a summit above the source with no flow is a true siphon with its exact range; the practical siphon limit is danger', () => {
    const analysis = analyzeLine({
      ...simpleLine(
        [
          [0, 100],
          [500, 112.6],
          [1000, 80],
        ],
        105,
        0,
      ),
      settings: { siteAltitudeM: 0 },
    });
    // Issue 13: with nothing flowing this is not "suction while flowing" but a true siphon (BC Factsheet 590.304-5
    // [R10]).
    expect(analysis.warnings.map((w) => w.code)).not.toContain('negative-pressure');
    const negative = analysis.warnings.find((w) => w.code === 'true-siphon');
    expect(negative?.severity).toBe('danger');
    expect(negative && 'fromM' in negative.at ? negative.at.fromM : NaN).toBeCloseTo((5 / 12.6) * 500, 6);
    expect(analysis.warnings.find((w) => w.code === 'siphon-limit')?.severity).toBe('danger');
  });

  it('residual below target: the smallest single upsizing that meets it, as a change-pipe fix', () => {
    const input: LineInput = {
      stations: [
        { chainageM: 0, groundElevationM: 100 },
        { chainageM: 300, groundElevationM: 90 },
        { chainageM: 1500, groundElevationM: 70 },
      ],
      stretches: [
        { fromM: 0, toM: 300, pipe: 'pvc-d2241-sdr21-1.5in' },
        { fromM: 300, toM: 1500, pipe: 'pvc-d2241-sdr21-1.5in' },
      ],
      start: { kind: 'water-level', levelM: 101 },
      end: { kind: 'outlet', elevationM: 70, residualHeadM: 9 },
      flow: { kind: 'design', flowM3s: 0.0016 },
    };
    const analysis = analyzeLine(input);
    const residual = analysis.warnings.find((w) => w.code === 'residual-below-target');
    expect(residual).toBeDefined();
    expect(residual?.fixes).toEqual([{ kind: 'change-pipe', stretchIndex: 1, pipeId: 'pvc-d2241-sdr21-2in' }]);
    const fixed = analyzeLine(applyLineFixes(input, residual!.fixes));
    expect(fixed.end.residualHeadM).toBeGreaterThanOrEqual(9);
    // The short stretch alone would not do: upsizing it leaves the outlet short.
    const other = analyzeLine(
      applyLineFixes(input, [{ kind: 'change-pipe', stretchIndex: 0, pipeId: 'pvc-d2241-sdr21-2in' }]),
    );
    expect(other.end.residualHeadM).toBeLessThan(9);
  });

  it('"find the flow" with no head to spare is danger; a tank the design flow cannot fill is danger', () => {
    const none = analyzeLine({
      ...simpleLine(
        [
          [0, 100],
          [100, 99],
        ],
        100,
        0,
      ),
      end: { kind: 'outlet', elevationM: 99, residualHeadM: 5 },
      flow: { kind: 'find' },
    });
    expect(none.flowM3s).toBe(0);
    expect(none.warnings.find((w) => w.code === 'no-gravity-flow')?.severity).toBe('danger');
    const unreachable = analyzeLine({
      ...simpleLine(
        [
          [0, 100],
          [1000, 97],
          [2000, 10],
        ],
        100.5,
        0.01,
        testPipe({ insideDiameterM: 0.05, outsideDiameterM: 0.06 }),
      ),
      devices: [{ kind: 'break-pressure-tank', chainageM: 1000 }],
    });
    expect(unreachable.warnings.find((w) => w.code === 'tank-not-reached')?.severity).toBe('danger');
  });

  it('air-release valves at summits and washouts at sags of the pipe profile, skipping those already fitted', () => {
    const input = simpleLine(
      [
        [0, 100],
        [400, 80],
        [800, 90],
        [1200, 60],
      ],
      101,
      0.002,
    );
    const analysis = analyzeLine(input);
    const air = analysis.warnings.filter((w) => w.code === 'air-release-needed');
    const sag = analysis.warnings.filter((w) => w.code === 'washout-needed');
    expect(air.map((w) => w.at)).toEqual([{ chainageM: 800 }]);
    expect(air[0].fixes).toEqual([{ kind: 'add-device', device: 'air-release-valve', chainageM: 800 }]);
    expect(sag.map((w) => w.at)).toEqual([{ chainageM: 400 }]);
    const fitted = analyzeLine(applyLineFixes(input, [...air[0].fixes, ...sag[0].fixes]));
    expect(codes(fitted.warnings).filter((c) => c === 'air-release-needed' || c === 'washout-needed')).toEqual([]);
  });

  it('GPS noise smaller than the tolerance does not flood the list with high and low points', () => {
    let seed = 7;
    const noise = () => ((seed = (seed * 16807) % 2147483647) / 2147483647 - 0.5) * 0.8;
    const elevation = Array.from({ length: 2000 }, (_, i) => 500 - i * 0.05 + noise());
    expect(findTurningPoints(elevation, 1)).toEqual({ highs: [], lows: [] });
    expect(findTurningPoints(elevation, 0).highs.length).toBeGreaterThan(100);
  });

  it("every pressure or surge message carries the caution to defer to local codes and the maker's data", () => {
    const analysis = analyzeLine({
      ...simpleLine(
        [
          [0, 300],
          [500, 320],
          [1000, 100],
          [1500, 90],
        ],
        305,
        0.004,
        testPipe({ pressureRatingPa: 9e5 }),
      ),
      end: { kind: 'outlet', elevationM: 90, residualHeadM: 300 },
    });
    const pressure = analysis.warnings.filter((w) => PRESSURE_CODES.has(w.code));
    expect(pressure.length).toBeGreaterThanOrEqual(3);
    for (const warning of pressure) expect(warning.message).toContain('local codes');
  });
});
