import { describe, expect, it } from 'vitest';
import {
  analyzeLine,
  lineFlowSchedule,
  pipeHeadLossM,
  solveNetwork,
  type LineInput,
  type NetworkInput,
} from '../../../hydraulics/index';

const PIPE = 'pe100-iso4427-sdr11-50mm';

/** A 1,200 m line falling 60 m with stations every 100 m (invented), feeding an outlet at its end. */
function line(
  flow: LineInput['flow'],
  settings: LineInput['settings'] = { frictionMethod: 'hazen-williams' },
): LineInput {
  return {
    stations: Array.from({ length: 13 }, (_, i) => ({ chainageM: i * 100, groundElevationM: 200 - 5 * i })),
    stretches: [{ fromM: 0, toM: 1200, pipe: PIPE }],
    start: { kind: 'water-level', levelM: 201 },
    end: { kind: 'outlet', elevationM: 140, residualHeadM: 5 },
    flow,
    // Hazen-Williams for the hand checks below; the line takes the velocity head and sharp entrance at the spring (K
    // 1.5).
    settings,
  };
}

describe('analyzeLine with a flow schedule', () => {
  it('gives exactly the single-flow result when the schedule has one piece', () => {
    const single = analyzeLine(line({ kind: 'design', flowM3s: 0.0015 }));
    const scheduled = analyzeLine(line({ kind: 'schedule', pieces: [{ fromM: 0, flowM3s: 0.0015 }] }));
    expect(Array.from(scheduled.points.hydraulicGradeM)).toEqual(Array.from(single.points.hydraulicGradeM));
    expect(scheduled.warnings).toEqual(single.warnings);
    expect(scheduled.flowSchedule).toEqual([{ fromM: 0, flowM3s: 0.0015 }]);
  });

  it("loses head on each piece at that piece's flow", () => {
    // 2 L/s to the take-off at 500 m, 0.8 L/s after it. Friction by the core's Hazen-Williams on the
    // 3-D slope length of each piece (fall 5 m per 100 m).
    const scheduled = analyzeLine(
      line({
        kind: 'schedule',
        pieces: [
          { fromM: 0, flowM3s: 0.002 },
          { fromM: 500, flowM3s: 0.0008 },
        ],
      }),
    );
    const slope = Math.hypot(100, 5) / 100;
    const spec = scheduled.stretches[0].pipe;
    const upper = pipeHeadLossM({ method: 'hazen-williams', flowM3s: 0.002, lengthM: 500 * slope, pipe: spec });
    const lower = pipeHeadLossM({ method: 'hazen-williams', flowM3s: 0.0008, lengthM: 700 * slope, pipe: spec });
    expect(scheduled.totals.frictionLossM).toBeCloseTo(upper + lower, 9);
    const atTakeOff = Array.from(scheduled.points.chainageM).indexOf(500);
    const entranceM = (1.5 * scheduled.points.velocityMs[0] ** 2) / (2 * 9.80665);
    expect(scheduled.points.hydraulicGradeM[atTakeOff]).toBeCloseTo(201 - entranceM - upper, 9);
    expect(scheduled.points.velocityMs[atTakeOff - 1]).toBeGreaterThan(scheduled.points.velocityMs[atTakeOff + 1]);
  });

  it('agrees with the network solver at the take-off, both on their defaults (Darcy-Weisbach, entrance at the spring)', () => {
    // The same line as a network: spring -> take-off (500 m) -> outlet (700 m), 1.2 L/s drawn at the take-off.
    // Neither side names a friction law or the spring's entrance loss: the defaults must be the same.
    const slope = Math.hypot(100, 5) / 100;
    const network: NetworkInput = {
      nodes: [
        { id: 'spring', kind: 'source', elevationM: 201 },
        { id: 'take-off', kind: 'junction', elevationM: 175, demandM3s: 0.0012 },
        { id: 'trough', kind: 'outlet', elevationM: 140, demandM3s: 0.0008 },
      ],
      links: [
        { id: 'upper', from: 'spring', to: 'take-off', lengthM: 500 * slope, pipe: PIPE },
        { id: 'lower', from: 'take-off', to: 'trough', lengthM: 700 * slope, pipe: PIPE },
      ],
    };
    const solution = solveNetwork(network);
    expect(solution.frictionMethod).toBe('darcy-weisbach');
    expect(solution.freeSurfaceLosses).toBe(true);
    const pieces = lineFlowSchedule(
      [
        { linkId: 'lower', fromM: 500 },
        { linkId: 'upper', fromM: 0 },
      ],
      solution,
    );
    expect(pieces).toEqual([
      { fromM: 0, flowM3s: solution.flowsM3s.upper },
      { fromM: 500, flowM3s: solution.flowsM3s.lower },
    ]);
    const profile = analyzeLine(line({ kind: 'schedule', pieces }, {}));
    expect(profile.settings.frictionMethod).toBe('darcy-weisbach');
    const atTakeOff = Array.from(profile.points.chainageM).indexOf(500);
    expect(profile.points.hydraulicGradeM[atTakeOff]).toBeCloseTo(solution.headsM['take-off'], 6);
    expect(profile.end.hydraulicGradeM).toBeCloseTo(solution.headsM.trough, 6);
  });

  it('refuses a schedule out of order, naming the piece', () => {
    expect(() =>
      analyzeLine(
        line({
          kind: 'schedule',
          pieces: [
            { fromM: 0, flowM3s: 0.001 },
            { fromM: 0, flowM3s: 0.002 },
          ],
        }),
      ),
    ).toThrow(/flow.pieces.fromM\[1\]: must increase/);
  });
});
