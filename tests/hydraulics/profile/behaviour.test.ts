import { describe, expect, it } from 'vitest';
import { analyzeProfile, hazenWilliamsHeadLoss, minorLossHeadM, profileRows } from '../../../hydraulics/index';
import { simpleLine, testPipe } from './fixtures';

describe('analyzeProfile behaviour', () => {
  it('computes friction on the 3-D slope length of the pipe (a 300 m run rising 400 m is 500 m of pipe)', () => {
    const profile = analyzeProfile({
      ...simpleLine(
        [
          [0, 0],
          [300, 400],
        ],
        500,
        0.005,
      ),
      settings: { frictionMethod: 'hazen-williams' },
    });
    expect(profile.totals.horizontalLengthM).toBe(300);
    expect(profile.totals.slopeLengthM).toBeCloseTo(500, 12);
    const expected = hazenWilliamsHeadLoss({ flowM3s: 0.005, lengthM: 500, diameterM: 0.1, c: 150 });
    expect(profile.totals.frictionLossM).toBeCloseTo(expected, 12);
  });

  it('lays the pipe at ground minus cover (station cover, else the default cover)', () => {
    const line = simpleLine(
      [
        [0, 100],
        [100, 90],
      ],
      105,
      0,
    );
    const profile = analyzeProfile({
      ...line,
      stations: [
        { chainageM: 0, groundElevationM: 100, coverM: 1.2 },
        { chainageM: 100, groundElevationM: 90 },
      ],
      settings: { defaultCoverM: 0.6 },
    });
    expect(Array.from(profile.points.pipeElevationM)).toEqual([98.8, 89.4]);
    expect(profile.points.staticPressureHeadM[1]).toBeCloseTo(15.6, 12);
  });

  it('adds points at stretch ends and fittings between stations, and drops the grade by K v^2/2g there', () => {
    const small = testPipe({ id: 'small', insideDiameterM: 0.05, outsideDiameterM: 0.06, wallM: 0.005 });
    const profile = analyzeProfile({
      ...simpleLine(
        [
          [0, 100],
          [1000, 80],
        ],
        101,
        0.002,
      ),
      stretches: [
        { fromM: 0, toM: 400, pipe: testPipe() },
        { fromM: 400, toM: 1000, pipe: small },
      ],
      fittings: [{ chainageM: 700, k: 2 }],
    });
    const p = profile.points;
    expect(Array.from(p.chainageM)).toEqual([0, 400, 700, 1000]);
    expect(Array.from(p.stationIndex)).toEqual([0, -1, -1, 1]);
    expect(Array.from(p.stretchIndex)).toEqual([0, 1, 1, 1]);
    expect(p.groundElevationM[1]).toBeCloseTo(92, 12);
    const v = 0.002 / (Math.PI * 0.025 * 0.025);
    expect(p.velocityMs[2]).toBeCloseTo(v, 12);
    // Velocity head and sharp entrance at the source in the 100 mm pipe (profile-and-checks.md §5.2), then K = 2 at the
    // fitting.
    const entryM = minorLossHeadM({ kTotal: 1.5, velocityMs: 0.002 / (Math.PI * 0.05 * 0.05) });
    expect(p.minorLossM[0]).toBeCloseTo(entryM, 12);
    expect(p.minorLossM[2] - p.minorLossM[0]).toBeCloseTo(minorLossHeadM({ kTotal: 2, velocityMs: v }), 12);
    expect(profile.totals.minorLossM).toBeCloseTo(p.minorLossM[2], 15);
    expect(profileRows(profile, true).map((row) => row.chainageM)).toEqual([0, 1000]);
    expect(profileRows(profile)).toHaveLength(4);
  });

  it('a break-pressure tank resets the static line and the grade to its water level (ground by default)', () => {
    const profile = analyzeProfile({
      ...simpleLine(
        [
          [0, 300],
          [500, 200],
          [1000, 100],
        ],
        301,
        0.001,
      ),
      devices: [{ kind: 'break-pressure-tank', chainageM: 500 }],
    });
    const p = profile.points;
    expect(p.staticHeadM[0]).toBe(301);
    expect(p.staticHeadM[1]).toBe(200);
    // The tank's level less the velocity head and entrance loss of the pipe leaving it (§5.2).
    expect(p.hydraulicGradeM[1]).toBeCloseTo(200 - (1.5 * p.velocityMs[1] ** 2) / (2 * 9.80665), 12);
    expect(p.staticPressureHeadM[2]).toBeCloseTo(100, 12);
    expect(profile.tanks).toEqual([{ chainageM: 500, waterLevelM: 200 }]);
    expect(profile.reaches).toHaveLength(2);
    expect(profile.reaches[1].startHeadM).toBe(200);
    expect(profile.totals.breakPressureDropM).toBeGreaterThan(90);
  });

  it('"find the flow" with a tank is limited by the weaker reach', () => {
    const profile = analyzeProfile({
      ...simpleLine(
        [
          [0, 300],
          [500, 290],
          [1000, 100],
        ],
        301,
        0,
      ),
      devices: [{ kind: 'break-pressure-tank', chainageM: 500 }],
      flow: { kind: 'find' },
    });
    const [upper, lower] = profile.reaches;
    expect(upper.capacityM3s).toBeLessThan(lower.capacityM3s);
    expect(profile.flowM3s).toBe(upper.capacityM3s);
    // The upper reach has exactly its 11 m to spend.
    expect(upper.arrivingHeadM).toBeCloseTo(290, 8);
  });

  it('a pump start uses the outlet head while flowing and the shut-off head for the static line', () => {
    const profile = analyzeProfile({
      ...simpleLine(
        [
          [0, 100],
          [1000, 150],
        ],
        0,
        0.003,
      ),
      start: { kind: 'pump', outletHeadM: 180, shutoffHeadM: 200 },
    });
    expect(profile.points.hydraulicGradeM[0]).toBe(180);
    expect(profile.points.staticHeadM[0]).toBe(200);
    expect(profile.end.hydraulicGradeM).toBeCloseTo(180 - profile.totals.frictionLossM, 12);
  });

  it('a pump without a shut-off head is not taken to shut off at its duty head: 1.25 × its head above the pipe (common practice, no source)', () => {
    const line = simpleLine(
      [
        [0, 100],
        [1000, 150],
      ],
      0,
      0.003,
    );
    const profile = analyzeProfile({ ...line, start: { kind: 'pump', outletHeadM: 180 } });
    const pipeAtPump = profile.points.pipeElevationM[0];
    expect(profile.points.staticHeadM[0]).toBeCloseTo(pipeAtPump + 1.25 * (180 - pipeAtPump), 9);
    expect(profile.points.staticHeadM[0]).toBeGreaterThan(180);
  });

  it('a shut-off head below the pumping head is refused on start.shutoffHeadM', () => {
    const line = simpleLine(
      [
        [0, 100],
        [1000, 150],
      ],
      0,
      0.003,
    );
    expect(() => analyzeProfile({ ...line, start: { kind: 'pump', outletHeadM: 180, shutoffHeadM: 170 } })).toThrow(
      /start\.shutoffHeadM.*below the grade while pumping/,
    );
  });

  it('an outlet end reports its residual head against its target (default 3 m, Akvopedia [R2])', () => {
    const profile = analyzeProfile({
      ...simpleLine(
        [
          [0, 100],
          [1000, 60],
        ],
        101,
        0.002,
      ),
      end: { kind: 'outlet', elevationM: 61 },
    });
    expect(profile.end.targetResidualHeadM).toBe(3);
    expect(profile.end.residualHeadM).toBeCloseTo(profile.end.hydraulicGradeM - 61, 12);
  });
});
