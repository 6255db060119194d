import { beforeAll, describe, expect, it } from 'vitest';
import { findPipe, pipeHeadLossM } from '../../hydraulics/index';
import * as Network from '../../app/api/projects/[projectId]/network/route';
import * as Links from '../../app/api/projects/[projectId]/network/links/route';
import * as Nodes from '../../app/api/projects/[projectId]/network/nodes/route';
import * as NodeOne from '../../app/api/projects/[projectId]/network/nodes/[nodeId]/route';
import * as Runs from '../../app/api/projects/[projectId]/network/runs/route';
import * as RunOne from '../../app/api/projects/[projectId]/network/runs/[jobId]/route';
import * as TakeOffs from '../../app/api/projects/[projectId]/network/take-offs/route';
import * as PriceList from '../../app/api/teams/[teamId]/price-list/route';
import type { NetworkJobView } from '../../lib/network/jobs';
import type { SizeRunResult, SolveRunResult } from '../../lib/network/run-result';
import type { NetworkView } from '../../lib/network/view';
import { call, createTeamFixture } from '../support/api';
import { outletNodeBody, sourceNodeBody } from '../support/network-fixtures';

type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;
const PIPE = 'pe100-iso4427-sdr11-32mm';

async function waitForRun(f: Fixture, run: NetworkJobView): Promise<NetworkJobView> {
  for (let i = 0; i < 200; i++) {
    const res = await call(RunOne.GET, {
      method: 'GET',
      path: '/run',
      params: { projectId: f.projectId, jobId: run.id },
      userId: f.users.reviewer.id,
    });
    const polled = res.json.run as NetworkJobView;
    if (polled.status === 'done' || polled.status === 'failed') return polled;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error('run did not finish');
}

describe('network API', () => {
  let f: Fixture;
  const ids: Record<string, string> = {};

  async function addNode(name: string, body: object) {
    const res = await call(Nodes.POST, {
      method: 'POST',
      path: '/nodes',
      params: { projectId: f.projectId },
      body,
      userId: f.users.designer.id,
    });
    expect(res.status).toBe(201);
    ids[name] = res.json.node.id;
  }
  async function addPipe(name: string, from: string, to: string, lengthM: number, pipe = PIPE) {
    const res = await call(Links.POST, {
      method: 'POST',
      path: '/links',
      params: { projectId: f.projectId },
      userId: f.users.designer.id,
      body: { kind: 'pipe', name, fromNodeId: ids[from], toNodeId: ids[to], data: { lengthM, pipe } },
    });
    expect(res.status).toBe(201);
    ids[name] = res.json.link.id;
  }

  beforeAll(async () => {
    f = await createTeamFixture();
    // Invented: an intake at 120 m, a tee at 105 m, two taps at 100 m and 98 m.
    await addNode('intake', sourceNodeBody());
  });

  it('refuses a node that does not say what it needs, naming the field', async () => {
    const res = await call(Nodes.POST, {
      method: 'POST',
      path: '/nodes',
      params: { projectId: f.projectId },
      userId: f.users.designer.id,
      body: { kind: 'outlet', name: 'Tap without height', data: { outletKind: 'tap' } },
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fields).toHaveProperty('elevationM');
  });

  it("solves a branched network off the request thread: flows add up at the tee and heads follow the line analysis's Darcy-Weisbach", async () => {
    await addNode('tap A', {
      ...outletNodeBody(),
      name: 'Tap A',
      elevationM: 100,
      data: { outletKind: 'tap', residualHeadM: 3, demandFrom: 'fixed', fixedDemandM3s: 0.0003 },
    });
    await addNode('tap B', {
      ...outletNodeBody(),
      name: 'Tap B',
      elevationM: 98,
      data: { outletKind: 'trough', residualHeadM: 3, demandFrom: 'fixed', fixedDemandM3s: 0.0002 },
    });
    // A tee is an outlet with no demand here (a take-off needs a line); the solver treats both alike.
    await addNode('tee', {
      kind: 'outlet',
      name: 'Tee',
      elevationM: 105,
      data: { outletKind: 'free', demandFrom: 'fixed', fixedDemandM3s: 0 },
    });
    await addPipe('main', 'intake', 'tee', 400);
    await addPipe('branch A', 'tee', 'tap A', 150);
    await addPipe('branch B', 'tee', 'tap B', 200);

    const started = await call(Runs.POST, {
      method: 'POST',
      path: '/runs',
      params: { projectId: f.projectId },
      body: { kind: 'solve' },
      userId: f.users.reviewer.id,
    });
    expect(started.status).toBe(202);
    expect(started.json.run.status).toBe('running');
    const run = await waitForRun(f, started.json.run);
    expect(run.status).toBe('done');
    const result = run.result as SolveRunResult;
    expect(result.converged).toBe(true);
    const flow = (name: string) => result.links.find((l) => l.linkId === ids[name])!.flowM3s;
    expect(flow('main')).toBeCloseTo(0.0005, 9);
    expect(flow('branch A')).toBeCloseTo(0.0003, 9);
    expect(flow('branch B')).toBeCloseTo(0.0002, 9);
    // Head at the tee = source level - the main's loss, by the line analysis's law (the network's
    // default): Darcy-Weisbach with Colebrook, plus the sharp entrance and the velocity head where
    // the water leaves the intake (K = 1.5; analyze-profile.ts, profile-and-checks.md §5.2).
    expect(result.friction).toEqual({ method: 'darcy-weisbach', freeSurfaceLosses: true });
    const pipe = findPipe(PIPE)!;
    const velocity = 0.0005 / (Math.PI * (pipe.insideDiameterM / 2) ** 2);
    const loss =
      pipeHeadLossM({ method: 'darcy-weisbach', flowM3s: 0.0005, lengthM: 400, pipe }) +
      (1.5 * velocity ** 2) / (2 * 9.80665);
    const tee = result.nodes.find((n) => n.nodeId === ids.tee)!;
    expect(120 - tee.headM!).toBeCloseTo(loss, 6);
    expect(tee.pressureHeadM!).toBeCloseTo(tee.headM! - 105, 9);

    const view = await call(Network.GET, {
      method: 'GET',
      path: '/network',
      params: { projectId: f.projectId },
      userId: f.users.reviewer.id,
    });
    expect((view.json.network as NetworkView).runs.solve?.id).toBe(run.id);
  });

  it('sizes for least cost from the team price list on the worker pool, cheaper than one size everywhere', async () => {
    const prices = [
      ['pe100-iso4427-sdr11-20mm', 0.6],
      ['pe100-iso4427-sdr11-25mm', 0.9],
      ['pe100-iso4427-sdr11-32mm', 1.4],
      ['pe100-iso4427-sdr11-40mm', 2.2],
    ];
    const put = await call(PriceList.PUT, {
      method: 'PUT',
      path: '/p',
      params: { teamId: f.teamId },
      userId: f.users.designer.id,
      body: { items: prices.map(([pipeId, costPerM]) => ({ pipeId, costPerM })) },
    });
    expect(put.status).toBe(200);
    const started = await call(Runs.POST, {
      method: 'POST',
      path: '/runs',
      params: { projectId: f.projectId },
      body: { kind: 'size', timeLimitS: 10 },
      userId: f.users.designer.id,
    });
    expect(started.status).toBe(202);
    const run = await waitForRun(f, started.json.run);
    expect(run.error).toBeNull();
    const sized = run.result as SizeRunResult;
    expect(sized.feasible).toBe(true);
    // Every outlet gets its residual at the peak hour with the chosen sizes.
    for (const node of sized.solution!.nodes.filter((n) => n.minPressureHeadM !== null && n.demandM3s > 0)) {
      expect(node.pressureHeadM!).toBeGreaterThanOrEqual(node.minPressureHeadM! - 1e-3);
    }
    // The cost is the chosen pipes priced per metre (400 + 150 + 200 m).
    const price = Object.fromEntries(prices) as Record<string, number>;
    const length: Record<string, number> = { [ids.main]: 400, [ids['branch A']]: 150, [ids['branch B']]: 200 };
    const total = sized.solution!.links.reduce(
      (sum, link) => sum + price[link.pieces[0].pipeId] * length[link.linkId],
      0,
    );
    expect(sized.cost!).toBeCloseTo(total, 6);
    if (sized.uniform) expect(sized.uniform.cost).toBeGreaterThanOrEqual(sized.cost! - 1e-6);
  });

  it('answers a bad network with 400 naming the element, and starts no run', async () => {
    await addPipe('odd pipe', 'tap A', 'tap B', 30, 'no-such-pipe');
    const res = await call(Runs.POST, {
      method: 'POST',
      path: '/runs',
      params: { projectId: f.projectId },
      body: { kind: 'solve' },
      userId: f.users.designer.id,
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error.fields)[0]).toContain(ids['odd pipe']);
    expect(res.json.error.message).toContain('odd pipe');
  });

  it('places a take-off only on the line, and keeps a line end node while its line uses it', async () => {
    const off = await call(TakeOffs.POST, {
      method: 'POST',
      path: '/t',
      params: { projectId: f.projectId },
      body: { lineId: f.lineId, chainageM: 1e6, name: 'Far tee' },
      userId: f.users.designer.id,
    });
    expect(off.status).toBe(400);
    expect(off.json.error.fields).toHaveProperty('chainageM');
    const refused = await call(NodeOne.PUT, {
      method: 'PUT',
      path: '/n',
      params: { projectId: f.projectId, nodeId: ids.intake },
      userId: f.users.designer.id,
      body: { ...sourceNodeBody(), tankId: '00000000-0000-4000-8000-000000000000' },
    });
    expect(refused.status).toBe(404);
    expect(refused.json.error.fields).toHaveProperty('tankId');
  });
});
