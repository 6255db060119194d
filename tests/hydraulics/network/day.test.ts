import { describe, expect, it } from 'vitest';
import {
  runNetworkDay,
  servedOutletsByTank,
  sizeStorage,
  sizeTankStorage,
  solveNetwork,
  type NetworkInput,
} from '../../../hydraulics/index';

// C for Hazen-Williams, roughness for the default Darcy-Weisbach (PE, 0.0015 mm: catalogue value).
const PIPE = { id: 'p50', insideDiameterM: 0.05, hazenWilliamsC: 140, roughnessM: 0.0000015 };
/** Morning and evening draw: a quarter of the day's water in each of 06, 07, 18 and 19 h. */
const TWO_PEAKS = Array.from({ length: 24 }, (_, hour) => ([6, 7, 18, 19].includes(hour) ? 0.25 : 0));

/** A ram delivering 1 L/s into a 10 m² tank that feeds a house (invented). */
function ramTankHouse(): NetworkInput {
  return {
    nodes: [
      { id: 'ram', kind: 'ram-outlet', elevationM: 60, inflowM3s: 0.001 },
      { id: 'tank', kind: 'tank', elevationM: 100, waterLevelM: 101, tank: { overflowLevelM: 103, areaM2: 10 } },
      {
        id: 'house',
        kind: 'outlet',
        elevationM: 80,
        demandM3s: 0.0005,
        hourlyFractions: TWO_PEAKS,
        minPressureHeadM: 10,
      },
    ],
    links: [
      { id: 'delivery', from: 'ram', to: 'tank', lengthM: 400, pipe: PIPE },
      { id: 'service', from: 'tank', to: 'house', lengthM: 300, pipe: PIPE },
    ],
  };
}

describe('runNetworkDay', () => {
  it('moves a tank level by the mass balance worked by hand', () => {
    // By hand: the ram adds 3.6 m³/h = 0.36 m/h on 10 m². The house draws 0.5 L/s × 24 × 0.25 =
    // 3 L/s = 10.8 m³/h in hours 06, 07, 18 and 19, so those hours net -7.2 m³ = -0.72 m.
    //   00-05: 101 -> 101.36, 101.72, 102.08, 102.44, 102.80, then 103.16 capped at 103 (1.6 m³ spilt)
    //   06-07: 102.28, 101.56
    //   08-17: 101.92, 102.28, 102.64, 103.00, then full: 3.6 m³ spilt in each of 12-17 (21.6 m³)
    //   18-19: 102.28, 101.56;  20-23: 101.92, 102.28, 102.64, 103.00
    const day = runNetworkDay(ramTankHouse());
    const levels = day.tankLevelsM.tank;
    expect(levels).toHaveLength(25);
    const expected = [
      101, 101.36, 101.72, 102.08, 102.44, 102.8, 103, 102.28, 101.56, 101.92, 102.28, 102.64, 103, 103, 103, 103, 103,
      103, 103, 102.28, 101.56, 101.92, 102.28, 102.64, 103,
    ];
    // Continuity holds to ~1e-13 m³/s, so levels agree to 1e-8 m.
    expected.forEach((level, i) => expect(levels[i]).toBeCloseTo(level, 8));
    expect(day.tankOverflowM3.tank).toBeCloseTo(1.6 + 6 * 3.6, 6);
    expect(day.warnings.map((w) => w.code)).toContain('tank-overflows');
    expect(day.steps[6].tankNetInflowM3s.tank).toBeCloseTo(0.001 - 0.003, 12);
  });

  it('flags a tank that runs empty, with the time and the water missing', () => {
    const input = ramTankHouse();
    const small: NetworkInput = {
      ...input,
      nodes: input.nodes.map((node) =>
        node.id === 'tank' ? { ...node, waterLevelM: 100.2, tank: { overflowLevelM: 101, areaM2: 2 } } : node,
      ),
    };
    const day = runNetworkDay(small);
    const empty = day.warnings.find((w) => w.code === 'tank-empties');
    expect(empty?.severity).toBe('danger');
    // By hand: the tank (2 m², 1 m deep) is full by 06:00. In hour 06 it has 2 m³ plus 3.6 m³ from
    // the ram against a 10.8 m³ draw: 5.2 m³ short; in hour 07 it starts empty: 7.2 m³ short. The
    // same again at 18 and 19 h: 2 × (5.2 + 7.2) = 24.8 m³.
    expect(empty?.message).toContain('06:00');
    expect(day.tankShortfallM3.tank).toBeCloseTo(24.8, 6);
  });

  it('flags an outlet short of its residual at its peak hour, and a source drawn beyond its yield', () => {
    const input: NetworkInput = {
      nodes: [
        { id: 'spring', kind: 'source', elevationM: 100, yieldM3s: 0.002 },
        {
          id: 'garden',
          kind: 'outlet',
          elevationM: 85,
          demandM3s: 0.0005,
          hourlyFractions: TWO_PEAKS,
          minPressureHeadM: 12,
        },
      ],
      links: [
        {
          id: 'line',
          from: 'spring',
          to: 'garden',
          lengthM: 900,
          pipe: { id: 'p32', insideDiameterM: 0.032, hazenWilliamsC: 140, roughnessM: 0.0000015 },
        },
      ],
    };
    const day = runNetworkDay(input);
    const codes = day.warnings.map((w) => w.code);
    expect(codes).toContain('outlet-short-at-peak');
    expect(codes).toContain('source-over-yield');
    // Off-peak the outlet draws nothing and stands at its static 15 m.
    expect(day.steps[0].outletPressureHeadsM.garden).toBeCloseTo(15, 9);
    expect(day.outletLowestPressureHeadM.garden.hour).toBe(6);
  });
});

describe('servedOutletsByTank and sizeTankStorage', () => {
  function twoTanks(): NetworkInput {
    return {
      nodes: [
        { id: 'upper', kind: 'tank', elevationM: 120, waterLevelM: 122, tank: { overflowLevelM: 123, areaM2: 5 } },
        { id: 'lower', kind: 'tank', elevationM: 116, waterLevelM: 118, tank: { overflowLevelM: 119, areaM2: 5 } },
        { id: 'tee', kind: 'junction', elevationM: 90 },
        { id: 'barn', kind: 'outlet', elevationM: 95, demandM3s: 0.0008 },
        { id: 'yard', kind: 'outlet', elevationM: 80, demandM3s: 0.0012, hourlyFractions: TWO_PEAKS },
      ],
      links: [
        { id: 'a', from: 'upper', to: 'barn', lengthM: 200, pipe: PIPE },
        { id: 'b', from: 'upper', to: 'tee', lengthM: 500, pipe: PIPE },
        { id: 'c', from: 'lower', to: 'tee', lengthM: 300, pipe: PIPE },
        { id: 'd', from: 'tee', to: 'yard', lengthM: 100, pipe: PIPE },
      ],
    };
  }

  it('traces which tank each outlet draws from, in proportion to the flows', () => {
    const input = twoTanks();
    const solution = solveNetwork(input);
    const served = servedOutletsByTank(input, solution);
    expect(served.upper.find((s) => s.outletId === 'barn')?.share).toBeCloseTo(1, 12);
    expect(served.lower.find((s) => s.outletId === 'barn')).toBeUndefined();
    // Both tanks feed the tee here.
    expect(solution.flowsM3s.b).toBeGreaterThan(0);
    expect(solution.flowsM3s.c).toBeGreaterThan(0);
    const fromUpper = solution.flowsM3s.b / (solution.flowsM3s.b + solution.flowsM3s.c);
    expect(served.upper.find((s) => s.outletId === 'yard')?.share).toBeCloseTo(fromUpper, 12);
    expect(served.lower.find((s) => s.outletId === 'yard')?.share).toBeCloseTo(1 - fromUpper, 12);
  });

  it('sizes a tank from the outlets it serves with the storage core', () => {
    const results = sizeTankStorage(ramTankHouse(), { reserveDays: 1 });
    expect(results).toHaveLength(1);
    const [tank] = results;
    expect(tank.servedOutlets.map((s) => s.outletId)).toEqual(['house']);
    expect(tank.supply.flowM3s).toBeCloseTo(0.001, 12);
    // The same sizing by hand through the storage core: 10.8 m³ in each of hours 06, 07, 18, 19.
    const direct = sizeStorage({
      supply: { flowM3s: 0.001 },
      demand: { hourlyVolumeM3: TWO_PEAKS.map((f) => f * 0.0005 * 86400) },
      reserveDays: 1,
    });
    expect(tank.storage?.totalStorageM3).toBeCloseTo(direct.totalStorageM3, 9);
    expect(tank.storage?.reserveStorageM3).toBeCloseTo(43.2, 9);
  });
});
