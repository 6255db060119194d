import { PDFParse } from 'pdf-parse';
import { beforeAll, describe, expect, it } from 'vitest';
import { linkLineIntoNetwork } from '../../migrations/support/network-from-records.cjs';
import * as Links from '../../app/api/projects/[projectId]/network/links/route';
import * as Nodes from '../../app/api/projects/[projectId]/network/nodes/route';
import * as Runs from '../../app/api/projects/[projectId]/network/runs/route';
import * as RunOne from '../../app/api/projects/[projectId]/network/runs/[jobId]/route';
import * as Apply from '../../app/api/projects/[projectId]/network/runs/[jobId]/apply/route';
import * as NetworkReport from '../../app/api/projects/[projectId]/network/report/route';
import * as TankStorage from '../../app/api/projects/[projectId]/network/tank-storage/route';
import * as PriceList from '../../app/api/teams/[teamId]/price-list/route';
import * as LineOne from '../../app/api/lines/[lineId]/route';
import { models } from '../../models';
import type { NetworkJobView } from '../../lib/network/jobs';
import type { DayRunResult, SizeRunResult } from '../../lib/network/run-result';
import type { ProjectTankStorage } from '../../lib/data/network-tank-storage';
import { call, createTeamFixture } from '../support/api';
import { createTankFixture } from '../support/lift-fixtures';
import { createLineFixture } from '../support/line-fixture';
import * as TakeOffs from '../../app/api/projects/[projectId]/network/take-offs/route';
import * as NodeOne from '../../app/api/projects/[projectId]/network/nodes/[nodeId]/route';
import * as Analysis from '../../app/api/lines/[lineId]/analysis/route';
import * as Report from '../../app/api/lines/[lineId]/report/route';
import { readNetworkRecords } from '../../lib/data/network-records';

type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;
const PRICES: [string, number][] = [
  ['pe100-iso4427-sdr11-20mm', 0.6],
  ['pe100-iso4427-sdr11-25mm', 0.9],
  ['pe100-iso4427-sdr11-32mm', 1.4],
  ['pe100-iso4427-sdr11-40mm', 2.2],
  ['pe100-iso4427-sdr11-50mm', 3.1],
];

async function newProject(f: Fixture, name: string): Promise<string> {
  return (
    await models().Project.create({ teamId: f.teamId, name, description: '', siteNotes: '', unitSystem: 'metric' })
  ).id;
}

async function run(f: Fixture, projectId: string, kind: 'solve' | 'day' | 'size'): Promise<NetworkJobView> {
  const started = await call(Runs.POST, {
    method: 'POST',
    path: '/runs',
    params: { projectId },
    body: { kind, timeLimitS: 10 },
    userId: f.users.designer.id,
  });
  expect(started.status).toBe(202);
  for (let i = 0; i < 300; i++) {
    const res = await call(RunOne.GET, {
      method: 'GET',
      path: '/run',
      params: { projectId, jobId: started.json.run.id },
      userId: f.users.designer.id,
    });
    const polled = res.json.run as NetworkJobView;
    if (polled.status === 'done' || polled.status === 'failed') return polled;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error('run did not finish');
}

describe('network results: day run, storage per tank, applying sizes, nothing to size', () => {
  let f: Fixture;
  let tankProject: string;
  const ids: Record<string, string> = {};

  async function post(projectId: string, handler: typeof Nodes.POST, body: object, key: string) {
    const res = await call(handler, {
      method: 'POST',
      path: '/x',
      params: { projectId },
      body,
      userId: f.users.designer.id,
    });
    expect(res.status).toBe(201);
    ids[key] = (res.json.node ?? res.json.link).id;
  }

  beforeAll(async () => {
    f = await createTeamFixture();
    const put = await call(PriceList.PUT, {
      method: 'PUT',
      path: '/p',
      params: { teamId: f.teamId },
      userId: f.users.designer.id,
      body: { items: PRICES.map(([pipeId, costPerM]) => ({ pipeId, costPerM })) },
    });
    expect(put.status).toBe(200);
    // Invented: a spring at 130 m fills a 5 m³ tank (floor 120 m, 0.2-1.6 m working, 2 days' reserve)
    // that feeds one tap at 100 m drawing a steady 0.2 L/s.
    tankProject = await newProject(f, 'Tank fixture');
    const tank = await createTankFixture(tankProject, f.users.designer.id);
    await post(
      tankProject,
      Nodes.POST,
      { kind: 'source', name: 'Spring', elevationM: 130, data: { waterLevelM: 130 } },
      'spring',
    );
    await post(
      tankProject,
      Nodes.POST,
      { kind: 'tank', name: 'Hill tank', tankId: tank.id, data: { inletFloatValve: true } },
      'tank',
    );
    await post(
      tankProject,
      Nodes.POST,
      {
        kind: 'outlet',
        name: 'Yard tap',
        elevationM: 100,
        data: { outletKind: 'tap', residualHeadM: 3, demandFrom: 'fixed', fixedDemandM3s: 0.0002 },
      },
      'tap',
    );
    await post(
      tankProject,
      Links.POST,
      {
        kind: 'pipe',
        name: 'Spring pipe',
        fromNodeId: ids.spring,
        toNodeId: ids.tank,
        data: { lengthM: 300, pipe: 'pe100-iso4427-sdr11-32mm' },
      },
      'inlet',
    );
    await post(
      tankProject,
      Links.POST,
      {
        kind: 'pipe',
        name: 'Tap pipe',
        fromNodeId: ids.tank,
        toNodeId: ids.tap,
        data: { lengthM: 200, pipe: 'pe100-iso4427-sdr11-50mm' },
      },
      'outlet',
    );
  });

  it("sizes each tank's storage from the outlets it serves: the tap's day plus the tank record's reserve days", async () => {
    const res = await call(TankStorage.GET, {
      method: 'GET',
      path: '/s',
      params: { projectId: tankProject },
      userId: f.users.reviewer.id,
    });
    expect(res.status).toBe(200);
    const storage = res.json.storage as ProjectTankStorage;
    expect(storage.reason).toBeNull();
    expect(storage.tanks).toHaveLength(1);
    const tank = storage.tanks[0];
    expect(tank.nodeId).toBe(ids.tank);
    expect(tank.servedOutlets).toEqual([{ nodeId: ids.tap, share: 1, demandM3s: 0.0002 }]);
    // By hand: 0.0002 m³/s x 86,400 s = 17.28 m³ a day; the tank record keeps 2 days in reserve = 34.56 m³.
    expect(tank.dailyDemandM3).toBeCloseTo(17.28, 9);
    expect(tank.reserveStorageM3).toBeCloseTo(34.56, 9);
    expect(tank.totalStorageM3!).toBeCloseTo(tank.cycleStorageM3! + 34.56, 9);
    expect(storage.outletNames[ids.tap]).toBe('Yard tap');
  });

  it('runs the 24-hour day: tank levels per hour, every outlet pressure per step, and the storage its outlets need', async () => {
    const job = await run(f, tankProject, 'day');
    expect(job.status).toBe('done');
    const day = job.result as DayRunResult;
    // The network solves with the line analysis's law, and the result says so.
    expect(day.friction).toEqual({ method: 'darcy-weisbach', freeSurfaceLosses: true });
    expect(day.hours).toHaveLength(24);
    expect(day.tanks[0].levelsM).toHaveLength(25);
    const tap = day.outlets.find((o) => o.nodeId === ids.tap)!;
    expect(tap.pressureHeadsM).toHaveLength(24);
    expect(tap.minPressureHeadM).toBe(3);
    const lowest = Math.min(...tap.pressureHeadsM.map((p) => p!));
    expect(tap.lowest!.pressureHeadM).toBeCloseTo(lowest, 9);
    // The tap sits 20 m and more below the tank floor: its pressure is at least that less the pipe's loss.
    expect(lowest).toBeGreaterThan(15);
    expect(day.tanks[0].storageNeededM3).toBeCloseTo(34.56 + 0, 0);
  });

  it("sizes the spring pipe to fill the tank with its tap's day over the tank's supply hours, not as a pipe into a fixed level", async () => {
    const job = await run(f, tankProject, 'size');
    expect(job.status).toBe('done');
    const sized = job.result as SizeRunResult;
    expect(sized.feasible).toBe(true);
    // The tap draws 0.2 L/s all day (no uses tied): 17.28 m³ a day, brought in over 24 supply hours = 0.2 L/s.
    const inlet = sized.solution!.links.find((l) => l.linkId === ids.inlet)!;
    expect(inlet.flowM3s).toBeCloseTo(17.28 / 86_400, 12);
  });

  it('applies the chosen sizes to the typed pipes in one go', async () => {
    // Invented: a spring at 140 m, a tee at 120 m, taps at 100 m and 105 m; every pipe typed as 50 mm.
    const pipes = await newProject(f, 'Pipes fixture');
    await post(
      pipes,
      Nodes.POST,
      { kind: 'source', name: 'Spring', elevationM: 140, data: { waterLevelM: 140 } },
      'p-spring',
    );
    await post(
      pipes,
      Nodes.POST,
      {
        kind: 'outlet',
        name: 'Tee',
        elevationM: 120,
        data: { outletKind: 'free', demandFrom: 'fixed', fixedDemandM3s: 0 },
      },
      'p-tee',
    );
    await post(
      pipes,
      Nodes.POST,
      {
        kind: 'outlet',
        name: 'Tap one',
        elevationM: 100,
        data: { outletKind: 'tap', residualHeadM: 5, demandFrom: 'fixed', fixedDemandM3s: 0.0003 },
      },
      'p-one',
    );
    await post(
      pipes,
      Nodes.POST,
      {
        kind: 'outlet',
        name: 'Tap two',
        elevationM: 105,
        data: { outletKind: 'tap', residualHeadM: 5, demandFrom: 'fixed', fixedDemandM3s: 0.0002 },
      },
      'p-two',
    );
    for (const [name, from, to, lengthM] of [
      ['Main', 'p-spring', 'p-tee', 300],
      ['Branch one', 'p-tee', 'p-one', 150],
      ['Branch two', 'p-tee', 'p-two', 120],
    ] as const) {
      await post(
        pipes,
        Links.POST,
        {
          kind: 'pipe',
          name,
          fromNodeId: ids[from],
          toNodeId: ids[to],
          data: { lengthM, pipe: 'pe100-iso4427-sdr11-50mm' },
        },
        name,
      );
    }
    const job = await run(f, pipes, 'size');
    const sized = job.result as SizeRunResult;
    expect(sized.feasible).toBe(true);
    // Least cost does not keep 50 mm everywhere for half a litre a second.
    expect(sized.solution!.links.some((link) => link.pieces[0].pipeId !== 'pe100-iso4427-sdr11-50mm')).toBe(true);
    const res = await call(Apply.POST, {
      method: 'POST',
      path: '/a',
      params: { projectId: pipes, jobId: job.id },
      userId: f.users.designer.id,
    });
    expect(res.status).toBe(200);
    for (const link of sized.solution!.links) {
      const row = await models().NetworkLink.findByPk(link.linkId);
      expect(row!.data.pipe).toBe(link.pieces[0].pipeId);
    }
    // The network report carries the schematic, the heads and pressures, flows and velocities, the sizes and the cost.
    const report = await call(NetworkReport.GET, {
      method: 'GET',
      path: '/r',
      params: { projectId: pipes },
      userId: f.users.reviewer.id,
    });
    expect(report.status).toBe(200);
    expect(report.headers.get('content-type')).toBe('application/pdf');
    const text = (await new PDFParse({ data: new Uint8Array(report.bytes) }).getText()).text.replace(/\s+/g, ' ');
    for (const words of [
      'Schematic at the peak hour',
      'Nodes at the peak hour',
      'Links at the peak hour',
      'Least-cost sizes',
      'Pressure head',
      'Velocity',
      'Tap one',
      'Branch two',
      'NOT FOR CONSTRUCTION',
    ]) {
      expect(text, words).toContain(words);
    }
    // The main carries both taps' peak: 0.3 + 0.2 L/s; the cost is the sizing's, to the unit.
    expect(text).toContain('0.50 L/s');
    expect(text).toContain(`Material cost of the chosen pipes: ${Math.round(sized.cost!).toLocaleString('en-US')}`);
    // A reviewer may not write sizes.
    const refused = await call(Apply.POST, {
      method: 'POST',
      path: '/a',
      params: { projectId: pipes, jobId: job.id },
      userId: f.users.reviewer.id,
    });
    expect(refused.status).toBe(403);
  });

  it('applies sizes to a line: its stretches become the chosen pipes and its page shows them', async () => {
    await models().sequelize.transaction((transaction) =>
      linkLineIntoNetwork(models().sequelize, transaction, f.lineId),
    );
    const before = (
      await call(LineOne.GET, { method: 'GET', path: '/l', params: { lineId: f.lineId }, userId: f.users.designer.id })
    ).json.line;
    const job = await run(f, f.projectId, 'size');
    expect(job.status).toBe('done');
    const sized = job.result as SizeRunResult;
    expect(sized.feasible).toBe(true);
    const pieces = sized.solution!.links.find((l) => l.pieces[0]?.fromChainageM !== null)!.pieces;
    const res = await call(Apply.POST, {
      method: 'POST',
      path: '/a',
      params: { projectId: f.projectId, jobId: job.id },
      userId: f.users.designer.id,
    });
    expect(res.status).toBe(200);
    expect(res.json.applied.lines).toBe(1);
    const after = (
      await call(LineOne.GET, { method: 'GET', path: '/l', params: { lineId: f.lineId }, userId: f.users.designer.id })
    ).json.line;
    expect(after.revision).toBe(before.revision + 1);
    const pipeAt = (m: number) =>
      after.design.stretches.find((s: { fromM: number; toM: number }) => m >= s.fromM && m <= s.toM).pipe;
    for (const piece of pieces) expect(pipeAt((piece.fromChainageM! + piece.toChainageM!) / 2)).toBe(piece.pipeId);
    expect(after.design.stretches[0].fromM).toBe(0);
    expect(after.design.stretches.at(-1).toM).toBe(400);
  });

  it('refuses to apply a run that is not a finished sizing', async () => {
    const solve = await run(f, tankProject, 'solve');
    const res = await call(Apply.POST, {
      method: 'POST',
      path: '/a',
      params: { projectId: tankProject, jobId: solve.id },
      userId: f.users.designer.id,
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fields).toHaveProperty('jobId');
  });

  it('answers sizing a one-node network with a 400 saying there is nothing to size', async () => {
    const lonely = await newProject(f, 'One node');
    await post(
      lonely,
      Nodes.POST,
      { kind: 'source', name: 'Lone spring', elevationM: 50, data: { waterLevelM: 50 } },
      'lone',
    );
    const res = await call(Runs.POST, {
      method: 'POST',
      path: '/runs',
      params: { projectId: lonely },
      body: { kind: 'size' },
      userId: f.users.designer.id,
    });
    expect(res.status).toBe(400);
    expect(res.json.error.message).toMatch(/^Nothing to size: the network has only one part/);
    expect(await models().NetworkJob.count({ where: { projectId: lonely } })).toBe(0);
  });
});

describe("a line's own analysis reads what feeds it from the network", () => {
  it('takes its start from the source node and its flow per piece from the solve (the flow drops at the take-off)', async () => {
    const f = await createTeamFixture();
    const projectId = await newProject(f, 'Line in a network');
    // Invented: the fixture line (400 m, 240 m down to 200 m, 0.001 m³/s to its house) with a take-off
    // at chainage 200 m feeding a trough that draws 0.4 L/s.
    const { lineId } = await createLineFixture(projectId);
    await models().sequelize.transaction((transaction) => linkLineIntoNetwork(models().sequelize, transaction, lineId));
    const records = await readNetworkRecords(projectId);
    const sourceNode = records.nodes.find((n) => n.id === records.links.find((l) => l.lineId === lineId)!.fromNodeId)!;
    const asDesigner = { userId: f.users.designer.id };
    const tee = await call(TakeOffs.POST, {
      method: 'POST',
      path: '/t',
      params: { projectId },
      body: { lineId, chainageM: 200, name: 'Trough tee' },
      ...asDesigner,
    });
    expect(tee.status).toBe(201);
    const trough = await call(Nodes.POST, {
      method: 'POST',
      path: '/n',
      params: { projectId },
      body: {
        kind: 'outlet',
        name: 'Trough',
        elevationM: 215,
        data: { outletKind: 'trough', residualHeadM: 2, demandFrom: 'fixed', fixedDemandM3s: 0.0004 },
      },
      ...asDesigner,
    });
    const branch = await call(Links.POST, {
      method: 'POST',
      path: '/l',
      params: { projectId },
      body: {
        kind: 'pipe',
        name: 'Trough pipe',
        fromNodeId: tee.json.node.id,
        toNodeId: trough.json.node.id,
        data: { lengthM: 60, pipe: 'pe100-iso4427-sdr11-32mm' },
      },
      ...asDesigner,
    });
    expect(branch.status).toBe(201);
    // The network's source is raised to 245 m: the line's own saved start (241 m) is no longer read.
    const sourceBody = { ...sourceNode, id: undefined };
    const raised = await call(NodeOne.PUT, {
      method: 'PUT',
      path: '/n',
      params: { projectId, nodeId: sourceNode.id },
      body: { ...sourceBody, elevationM: 245, data: { ...sourceBody.data, waterLevelM: 245 } },
      ...asDesigner,
    });
    expect(raised.status).toBe(200);

    const res = await call(Analysis.POST, { method: 'POST', path: '/a', params: { lineId }, ...asDesigner });
    expect(res.status).toBe(200);
    const profile = res.json.analysis;
    expect(profile.flowSchedule).toHaveLength(2);
    expect(profile.flowSchedule[0]).toMatchObject({ fromM: 0 });
    // By continuity: 0.001 m³/s to the house plus 0.0004 m³/s to the trough before the tee, 0.001 after it.
    expect(profile.flowSchedule[0].flowM3s).toBeCloseTo(0.0014, 9);
    expect(profile.flowSchedule[1]).toMatchObject({ fromM: 200 });
    expect(profile.flowSchedule[1].flowM3s).toBeCloseTo(0.001, 9);
    expect(profile.flowM3s).toBeCloseTo(0.0014, 9);
    // The grade starts at the network's 245 m less the entrance loss (1 + 0.5) v²/2g of a few centimetres, far from the
    // saved 241 m.
    expect(profile.points.hydraulicGradeM[0]).toBeGreaterThan(244.8);
    expect(profile.points.hydraulicGradeM[0]).toBeLessThanOrEqual(245);

    // The report is drawn from the same analysis, and says where its flows came from.
    const pdf = await call(Report.GET, { method: 'GET', path: '/r', params: { lineId }, ...asDesigner });
    expect(pdf.status).toBe(200);
    const text = (await new PDFParse({ data: new Uint8Array(pdf.bytes) }).getText()).text.replace(/\s+/g, ' ');
    expect(text).toContain('In the network');
    expect(text).toContain('The profile starts at the water level of');
    expect(text).toContain('Trough tee');
    expect(text).toContain('1.40 L/s');
  });
});
