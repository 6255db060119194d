import { describe, expect, it } from 'vitest';
import { findPipe } from '../../../hydraulics/catalogue/index';
import { pipeHeadLossM } from '../../../hydraulics/index';
import { EMPTY_SITE_CONTEXT } from '../../../lib/lines/ram-start';
import { solveNetworkRun } from '../../../lib/network/run-network';
import { compareSnapshots } from '../../../lib/review/compare';
import { networkContextOfSnapshot } from '../../../lib/review/snapshot-network';
import type { DesignSnapshot, SnapshotLine } from '../../../lib/review/snapshot-types';
import { LineDesignSchema } from '../../../lib/validations/line-design';
import { NetworkLinkSchema, NetworkNodeSchema } from '../../../lib/validations/network';
import { referenceDesignParts, referenceStations } from '../../lines/reference-line';
import { outletNodeBody, pipeLinkBody, sourceNodeBody } from '../../support/network-fixtures';

const LINE_ID = '00000000-0000-4000-8000-0000000000a1';

function snapshot(line: Partial<SnapshotLine['design']>, tanks: DesignSnapshot['lift']['tanks'] = []): DesignSnapshot {
  const design = LineDesignSchema.parse({ ...referenceDesignParts(), ...line });
  return {
    format: 1,
    project: { name: 'Invented project', description: '', unitSystem: 'metric', siteNotes: '', frostDepthM: null },
    lines: [
      {
        id: LINE_ID,
        name: 'Spring box to house',
        notes: '',
        routeId: null,
        routeName: 'Reference route',
        fromChainageM: null,
        toChainageM: null,
        design,
        stations: referenceStations(),
        context: EMPTY_SITE_CONTEXT,
        problem: null,
      },
    ],
    lift: { sources: [], yieldReadings: [], ramSites: [], tanks, demandUses: [] },
  };
}

const label = (id: string) => findPipe(id)!.label;

// Revision 1: the reference line (PE80 SDR 17, 40 mm to ch. 300 then 50 mm; an air-release valve at 900).
// Revision 2: PE100 SDR 11 50 mm from 300 to 900 m, the valve at 900 taken out, a washout added at 650, a tank added.
const before = snapshot({});
const after = snapshot(
  {
    stretches: [
      { fromM: 0, toM: 300, pipe: 'pe80-iso4427-sdr17-40mm' },
      { fromM: 300, toM: 900, pipe: 'pe100-iso4427-sdr11-50mm' },
      { fromM: 900, toM: 1400, pipe: 'pe80-iso4427-sdr17-50mm' },
    ],
    devices: [{ kind: 'washout', chainageM: 650 }],
  },
  [{ id: '00000000-0000-4000-8000-0000000000b1', name: 'Knoll tank' } as DesignSnapshot['lift']['tanks'][number]],
);

describe('revision compare', () => {
  it('lists exactly the pipe, class and device changes written into the pair', () => {
    const [line] = compareSnapshots(before, after).lines;
    expect(line.change).toBe('changed');
    expect(line.pipes).toEqual([
      { fromM: 300, toM: 900, before: label('pe80-iso4427-sdr17-50mm'), after: label('pe100-iso4427-sdr11-50mm') },
    ]);
    expect(line.devices).toEqual([
      { kind: 'washout', chainageM: 650, change: 'added' },
      { kind: 'air-release-valve', chainageM: 900, change: 'removed' },
    ]);
  });

  it('moves the outlet pressure the way the change must: SDR 11 has the smaller bore, so more friction and less head at the house', () => {
    const [line] = compareSnapshots(before, after).lines;
    expect(line.outletHeadM.before).not.toBeNull();
    expect(line.outletHeadM.after!).toBeLessThan(line.outletHeadM.before!);
    expect(line.flowM3s).toEqual({ before: 0.001, after: 0.001 });
  });

  it('names added storage, and finds nothing changed between a revision and itself', () => {
    expect(compareSnapshots(before, after).tanks).toEqual({ added: ['Knoll tank'], removed: [], changed: [] });
    const same = compareSnapshots(before, before);
    expect(same.lines[0]).toMatchObject({ change: 'unchanged', pipes: [], devices: [] });
  });

  it('names network parts added between revisions (a take-off junction)', () => {
    const node = { id: '00000000-0000-4000-8000-0000000000c1', kind: 'junction', name: 'Take-off T1' };
    const withNode = {
      ...after,
      network: { projectId: 'p', nodes: [node], links: [], demandUseTies: [] },
    } as unknown as DesignSnapshot;
    expect(compareSnapshots(before, withNode).networkNodes).toEqual({
      added: ['Take-off T1 (junction)'],
      removed: [],
      changed: [],
    });
  });

  it('reports a line only in the later revision as added, and one only in the earlier as removed', () => {
    const empty: DesignSnapshot = { ...before, lines: [] };
    expect(compareSnapshots(empty, after).lines[0].change).toBe('added');
    expect(compareSnapshots(before, empty).lines[0].change).toBe('removed');
  });
});

// --- Cost and network outlet pressures -------------------------------------------------------------
const SOURCE_ID = '00000000-0000-4000-8000-0000000000d1';
const OUTLET_ID = '00000000-0000-4000-8000-0000000000d2';
const PIPE_LINK_ID = '00000000-0000-4000-8000-0000000000d3';
// Invented prices per metre (the demo's currency is whatever the team prices in).
const PRICES = [
  { pipeId: 'pe80-iso4427-sdr17-40mm', costPerM: 1.9 },
  { pipeId: 'pe80-iso4427-sdr17-50mm', costPerM: 2.6 },
  { pipeId: 'pe100-iso4427-sdr11-50mm', costPerM: 3.8 },
  { pipeId: 'pe100-iso4427-sdr11-32mm', costPerM: 2.1 },
  { pipeId: 'pe100-iso4427-sdr11-40mm', costPerM: 3.4 },
];

/**
 * A revision with the reference line plus a small network (intake at 120 m, 250 m of `pipeId`, a tap at 100 m drawing
 * 0.2 L/s), solved as a revision freezes it.
 */
function withNetwork(base: DesignSnapshot, pipeId: string): DesignSnapshot {
  const snap: DesignSnapshot = {
    ...base,
    network: {
      projectId: 'p',
      nodes: [
        { id: SOURCE_ID, ...NetworkNodeSchema.parse(sourceNodeBody()) },
        { id: OUTLET_ID, ...NetworkNodeSchema.parse(outletNodeBody()) },
      ],
      links: [
        {
          id: PIPE_LINK_ID,
          ...NetworkLinkSchema.parse({ ...pipeLinkBody(SOURCE_ID, OUTLET_ID), data: { lengthM: 250, pipe: pipeId } }),
        },
      ],
      demandUseTies: [],
    },
    networkBasis: { prices: PRICES, ramOutlets: [], sourceYieldsM3s: {} },
  };
  return { ...snap, networkSolve: { ok: true, result: solveNetworkRun(networkContextOfSnapshot(snap)!) } };
}

/** Slope length of the reference route between two chainages, from its stations (straight between stations). */
function slopeLength(fromM: number, toM: number): number {
  const s = referenceStations().filter((st) => st.chainageM >= fromM && st.chainageM <= toM);
  let sum = 0;
  for (let i = 1; i < s.length; i++)
    sum += Math.hypot(s[i].chainageM - s[i - 1].chainageM, s[i].groundElevationM - s[i - 1].groundElevationM);
  return sum;
}

/**
 * Loss from the intake's water surface by the network's default law, the line analysis's: Darcy-Weisbach
 * with Colebrook (the core's `pipeHeadLossM`, not the network solver) plus the sharp entrance and the
 * velocity head where the water leaves the intake, K = 1.5 (profile-and-checks.md §5.2).
 */
function lossFromIntakeM(lengthM: number, flowM3s: number, pipeId: string): number {
  const pipe = findPipe(pipeId)!;
  const velocity = flowM3s / (Math.PI * (pipe.insideDiameterM / 2) ** 2);
  return pipeHeadLossM({ method: 'darcy-weisbach', flowM3s, lengthM, pipe }) + (1.5 * velocity ** 2) / (2 * 9.80665);
}

describe('revision compare: pipe cost and network outlet pressures', () => {
  const costBefore = withNetwork(before, 'pe100-iso4427-sdr11-32mm');
  const costAfter = withNetwork(after, 'pe100-iso4427-sdr11-40mm');
  const comparison = compareSnapshots(costBefore, costAfter);

  it('prices every stretch by its slope length and the network pipe by its length, at the frozen price list', () => {
    // Revision 1: 40 mm PE80 0-300, 50 mm PE80 300-1400, 250 m of 32 mm PE100 on the network.
    const expectedBefore = slopeLength(0, 300) * 1.9 + slopeLength(300, 1400) * 2.6 + 250 * 2.1;
    // Revision 2: 300-900 becomes PE100 SDR 11 50 mm, and the network pipe 40 mm.
    const expectedAfter =
      slopeLength(0, 300) * 1.9 + slopeLength(300, 900) * 3.8 + slopeLength(900, 1400) * 2.6 + 250 * 3.4;
    expect(comparison.cost.before!.total).toBeCloseTo(expectedBefore, 6);
    expect(comparison.cost.after!.total).toBeCloseTo(expectedAfter, 6);
    expect(comparison.cost.difference).toBeCloseTo(expectedAfter - expectedBefore, 6);
    // The change costs about 600 m x 1.2 + 250 m x 1.3 = 1045 more on plan; the sag's slope adds a few per cent.
    expect(comparison.cost.difference!).toBeGreaterThan(1045);
    expect(comparison.cost.difference!).toBeLessThan(1045 * 1.03);
    expect(comparison.cost.after!.rows.find((r) => r.pipeId === 'pe100-iso4427-sdr11-50mm')).toMatchObject({
      costPerM: 3.8,
    });
    expect(comparison.cost.after!.unpricedLengthM).toBe(0);
  });

  it('leaves unpriced pipe out of the total and says how much, and has no cost for a revision that kept no price list', () => {
    const unpriced = compareSnapshots(before, {
      ...costAfter,
      networkBasis: {
        ...costAfter.networkBasis!,
        prices: PRICES.filter((p) => p.pipeId !== 'pe100-iso4427-sdr11-40mm'),
      },
    });
    expect(unpriced.cost.after!.unpricedLengthM).toBeCloseTo(250, 9);
    expect(unpriced.cost.after!.rows.find((r) => r.pipeId === 'pe100-iso4427-sdr11-40mm')).toMatchObject({
      costPerM: null,
      cost: null,
    });
    expect(unpriced.cost.before).toBeNull();
    expect(unpriced.cost.difference).toBeNull();
  });

  it('gives each outlet its residual pressure in both solves, matching the loss worked out beside it', () => {
    // Intake water level 120 m, tap at 100 m: 20 m static, less the loss of 250 m at 0.2 L/s (friction plus the
    // intake's entrance).
    const [tap] = comparison.outlets;
    expect(tap).toMatchObject({ nodeId: OUTLET_ID, name: 'Fixture tap', change: 'changed', minimumM: 3 });
    expect(tap.before!).toBeCloseTo(20 - lossFromIntakeM(250, 0.0002, 'pe100-iso4427-sdr11-32mm'), 3);
    expect(tap.after!).toBeCloseTo(20 - lossFromIntakeM(250, 0.0002, 'pe100-iso4427-sdr11-40mm'), 3);
    // The larger bore loses less: pressure at the tap rises.
    expect(tap.after!).toBeGreaterThan(tap.before!);
    expect(comparison.outletsMissing).toEqual({ before: null, after: null });
  });

  it('says why a side has no outlet pressures: a revision from before solves were kept, or a network that did not solve', () => {
    const old = compareSnapshots(before, costAfter);
    expect(old.outlets[0]).toMatchObject({
      before: null,
      after: costAfter.networkSolve!.ok ? expect.any(Number) : null,
    });
    expect(old.outletsMissing.before).toMatch(/before network solves were kept/);
    const failed = compareSnapshots(costBefore, {
      ...costAfter,
      networkSolve: { ok: false, problem: 'Outlet "Fixture tap" is not joined to any source' },
    });
    expect(failed.outletsMissing.after).toBe(
      'the network did not solve: Outlet "Fixture tap" is not joined to any source',
    );
    expect(failed.outlets[0].after).toBeNull();
  });
});
