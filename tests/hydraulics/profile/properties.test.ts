import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyzeProfile, type LineInput, type LineStretch } from '../../../hydraulics/index';
import { testPipe } from './fixtures';

const PIPES = [
  testPipe({ id: 'p25', insideDiameterM: 0.025, outsideDiameterM: 0.03, wallM: 0.0025, hazenWilliamsC: 140 }),
  testPipe({ id: 'p50', insideDiameterM: 0.05, outsideDiameterM: 0.06, wallM: 0.005, hazenWilliamsC: 150 }),
  testPipe({ id: 'p100', insideDiameterM: 0.1, outsideDiameterM: 0.11, wallM: 0.005, hazenWilliamsC: 130 }),
];

interface LineOptions {
  fittings: boolean;
  tanks: boolean;
}

/** Random lines: a random-walk ground, 1-4 stretches, optional fittings and break-pressure tanks. */
function lineArbitrary({ fittings, tanks }: LineOptions): fc.Arbitrary<LineInput> {
  return fc
    .record({
      steps: fc.array(
        fc.record({
          dx: fc.double({ min: 1, max: 300, noNaN: true }),
          dz: fc.double({ min: -40, max: 25, noNaN: true }),
        }),
        {
          minLength: 1,
          maxLength: 25,
        },
      ),
      cuts: fc.array(fc.double({ min: 0.05, max: 0.95, noNaN: true }), { maxLength: 3 }),
      pipeChoice: fc.array(fc.integer({ min: 0, max: PIPES.length - 1 }), { minLength: 4, maxLength: 4 }),
      fittingsAt: fc.array(
        fc.record({ at: fc.double({ min: 0, max: 1, noNaN: true }), k: fc.double({ min: 0, max: 5, noNaN: true }) }),
        {
          maxLength: fittings ? 4 : 0,
        },
      ),
      tanksAt: fc.array(fc.double({ min: 0.05, max: 0.95, noNaN: true }), { maxLength: tanks ? 2 : 0 }),
      headroomM: fc.double({ min: 0, max: 60, noNaN: true }),
      flowM3s: fc.double({ min: 0, max: 0.02, noNaN: true }),
      method: fc.constantFrom('hazen-williams' as const, 'darcy-weisbach' as const),
    })
    .map((r) => {
      const stations = [{ chainageM: 0, groundElevationM: 200 }];
      for (const step of r.steps) {
        const last = stations[stations.length - 1];
        stations.push({ chainageM: last.chainageM + step.dx, groundElevationM: last.groundElevationM + step.dz });
      }
      const lengthM = stations[stations.length - 1].chainageM;
      const bounds = [...new Set(r.cuts.map((cut) => Math.round(cut * 100) / 100))]
        .sort((a, b) => a - b)
        .map((cut) => cut * lengthM);
      const edges = [0, ...bounds, lengthM];
      const stretches: LineStretch[] = edges.slice(0, -1).map((fromM, i) => ({
        fromM,
        toM: edges[i + 1],
        pipe: PIPES[r.pipeChoice[i]],
      }));
      const highestM = Math.max(...stations.map((s) => s.groundElevationM));
      return {
        stations,
        stretches,
        fittings: r.fittingsAt.map((f) => ({ chainageM: f.at * lengthM, k: f.k })),
        devices: r.tanksAt.map((at) => ({ kind: 'break-pressure-tank' as const, chainageM: at * lengthM })),
        start: { kind: 'water-level' as const, levelM: highestM + r.headroomM },
        end: { kind: 'free-discharge' as const },
        flow: { kind: 'design' as const, flowM3s: r.flowM3s },
        settings: { frictionMethod: r.method, siteAltitudeM: 0 },
      } satisfies LineInput;
    });
}

describe('line profile properties', () => {
  it('the hydraulic grade never rises along the flow without a pump (fittings and tanks included)', () => {
    fc.assert(
      fc.property(lineArbitrary({ fittings: true, tanks: true }), (input) => {
        const grade = analyzeProfile(input).points.hydraulicGradeM;
        for (let j = 1; j < grade.length; j++) expect(grade[j]).toBeLessThanOrEqual(grade[j - 1] + 1e-12);
      }),
      { numRuns: 150 },
    );
  });

  it('zero flow gives exactly the static line', () => {
    fc.assert(
      fc.property(lineArbitrary({ fittings: true, tanks: true }), (input) => {
        const profile = analyzeProfile({ ...input, flow: { kind: 'design', flowM3s: 0 } });
        expect(Array.from(profile.points.hydraulicGradeM)).toEqual(Array.from(profile.points.staticHeadM));
        expect(Array.from(profile.points.pressureHeadM)).toEqual(Array.from(profile.points.staticPressureHeadM));
        expect(profile.totals.frictionLossM).toBe(0);
      }),
      { numRuns: 100 },
    );
  });

  it('energy balance closes to 1e-9 m: start head - end grade = friction + fittings + tank drops', () => {
    fc.assert(
      fc.property(lineArbitrary({ fittings: true, tanks: true }), (input) => {
        const profile = analyzeProfile(input);
        const start = input.start.kind === 'water-level' ? input.start.levelM : Number.NaN;
        const { frictionLossM, minorLossM, breakPressureDropM } = profile.totals;
        const imbalance = start - profile.end.hydraulicGradeM - (frictionLossM + minorLossM + breakPressureDropM);
        expect(Math.abs(imbalance)).toBeLessThan(1e-9);
      }),
      { numRuns: 150 },
    );
  });

  it('"find the flow" returns a flow whose head loss matches the available head', () => {
    fc.assert(
      fc.property(
        lineArbitrary({ fittings: true, tanks: false }),
        fc.double({ min: 1, max: 80, noNaN: true }),
        (input, dropM) => {
          const endElevationM = (input.start as { levelM: number }).levelM - dropM;
          const profile = analyzeProfile({
            ...input,
            end: { kind: 'tank-inlet', elevationM: endElevationM },
            flow: { kind: 'find' },
          });
          expect(profile.flowM3s).toBeGreaterThan(0);
          const lossM = profile.totals.frictionLossM + profile.totals.minorLossM;
          expect(Math.abs(lossM - dropM)).toBeLessThan(1e-8);
          expect(Math.abs(profile.end.residualHeadM)).toBeLessThan(1e-8);
        },
      ),
      { numRuns: 100 },
    );
  });

  it('reversing a line gives the mirrored result (losses, velocities and pipe profile)', () => {
    fc.assert(
      fc.property(lineArbitrary({ fittings: false, tanks: false }), (input) => {
        const lastM = input.stations[input.stations.length - 1].chainageM;
        const reversed: LineInput = {
          ...input,
          stations: [...input.stations].reverse().map((s) => ({ ...s, chainageM: lastM - s.chainageM })),
          stretches: [...input.stretches].reverse().map((s) => ({ ...s, fromM: lastM - s.toM, toM: lastM - s.fromM })),
        };
        const forward = analyzeProfile(input).points;
        const backward = analyzeProfile(reversed).points;
        const n = forward.chainageM.length;
        expect(backward.chainageM.length).toBe(n);
        const total = forward.frictionLossM[n - 1];
        expect(backward.frictionLossM[n - 1]).toBeCloseTo(total, 9);
        for (let k = 0; k < n; k++) {
          expect(backward.pipeElevationM[k]).toBeCloseTo(forward.pipeElevationM[n - 1 - k], 9);
          expect(backward.frictionLossM[k]).toBeCloseTo(total - forward.frictionLossM[n - 1 - k], 9);
          if (k < n - 1) expect(backward.velocityMs[k]).toBeCloseTo(forward.velocityMs[n - 2 - k], 12);
        }
      }),
      { numRuns: 100 },
    );
  });

  it('never puts a NaN or an infinity in a result', () => {
    fc.assert(
      fc.property(lineArbitrary({ fittings: true, tanks: true }), fc.boolean(), (input, find) => {
        const profile = analyzeProfile(find ? { ...input, flow: { kind: 'find' } } : input);
        for (const column of Object.values(profile.points)) {
          for (const value of Array.from(column as ArrayLike<number>)) expect(Number.isFinite(value)).toBe(true);
        }
        expect(Number.isFinite(profile.flowM3s)).toBe(true);
        for (const zone of profile.zones) expect(Number.isFinite(zone.fromM) && Number.isFinite(zone.toM)).toBe(true);
      }),
      { numRuns: 100 },
    );
  });
});
