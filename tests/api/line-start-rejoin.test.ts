import { beforeAll, describe, expect, it } from 'vitest';
import * as lineRoute from '@/app/api/lines/[lineId]/route';
import { linkLineIntoNetwork } from '@/migrations/support/network-from-records.cjs';
import { models } from '@/models';
import { call, createTeamFixture } from '../support/api';
import { createRamSiteFixture } from '../support/lift-fixtures';

type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;

describe("changing a line's start re-joins its network link", () => {
  let f: Fixture;
  let ramSiteId: string;
  let design: Record<string, unknown>;
  beforeAll(async () => {
    f = await createTeamFixture();
    ramSiteId = (await createRamSiteFixture(f.projectId, f.users.owner.id)).id;
    const res = await call(lineRoute.GET, {
      method: 'GET',
      path: '/api/x',
      params: { lineId: f.lineId },
      userId: f.users.designer.id,
    });
    design = res.json.line.design;
    // The fixture writes its line straight to the table; join it as a line write would.
    await models().sequelize.transaction((transaction) =>
      linkLineIntoNetwork(models().sequelize, transaction, f.lineId),
    );
  });

  const patch = (changes: Record<string, unknown>) =>
    call(lineRoute.PATCH, {
      method: 'PATCH',
      path: '/api/x',
      params: { lineId: f.lineId },
      body: { design: { ...design, ...changes } },
      userId: f.users.designer.id,
    });
  const startNode = async () => {
    const link = await models().NetworkLink.findOne({ where: { lineId: f.lineId } });
    return models().NetworkNode.findByPk(link!.fromNodeId);
  };

  it('moves from its own intake to the ram site it now names, and the intake only it used goes', async () => {
    const intake = await startNode();
    expect(intake!.kind).toBe('source');
    const res = await patch({
      start: { kind: 'ram-site', ramSiteId },
      end: { kind: 'tank-inlet', elevationM: 200 },
      flow: { kind: 'pump-delivery' },
    });
    expect(res.status).toBe(200);
    const ram = await startNode();
    expect(ram!.kind).toBe('ram-outlet');
    expect(ram!.ramSiteId).toBe(ramSiteId);
    expect(await models().NetworkNode.findByPk(intake!.id)).toBeNull();
  });

  it('back on a water level it starts at a source of its own at that level; the ram keeps its node', async () => {
    const ram = await startNode();
    expect((await patch({ start: { kind: 'water-level', levelM: 241.5 } })).status).toBe(200);
    const source = await startNode();
    expect(source!.kind).toBe('source');
    expect(source!.data.waterLevelM).toBe(241.5);
    expect(await models().NetworkNode.findByPk(ram!.id)).not.toBeNull();
  });

  it('a new level moves its own intake in place (same node, new level)', async () => {
    const before = await startNode();
    expect((await patch({ start: { kind: 'water-level', levelM: 242 } })).status).toBe(200);
    const after = await startNode();
    expect(after!.id).toBe(before!.id);
    expect(after!.data.waterLevelM).toBe(242);
    expect(after!.elevationM).toBe(242);
  });
});
