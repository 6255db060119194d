import { beforeAll, describe, expect, it } from 'vitest';
import * as revisionsRoute from '@/app/api/projects/[projectId]/revisions/route';
import * as revisionRoute from '@/app/api/revisions/[revisionId]/route';
import { networkFlowsOfLine } from '@/lib/data/line-network-flows';
import { analyseSnapshotLine } from '@/lib/review/snapshot-analysis';
import type { SnapshotLine } from '@/lib/review/snapshot-types';
import { linkLineIntoNetwork } from '@/migrations/support/network-from-records.cjs';
import { models } from '@/models';
import { call, createTeamFixture } from '../support/api';

type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;

describe('a revision freezes the network feed of its lines', () => {
  let f: Fixture;
  let outletId: string;
  beforeAll(async () => {
    f = await createTeamFixture();
    // The fixture writes its line straight to the table; join it as a line write would.
    const linkId = await models().sequelize.transaction((transaction) =>
      linkLineIntoNetwork(models().sequelize, transaction, f.lineId),
    );
    outletId = (await models().NetworkLink.findByPk(linkId!))!.toNodeId;
  });

  const drawAtEnd = async (fixedDemandM3s: number) => {
    const outlet = (await models().NetworkNode.findByPk(outletId))!;
    outlet.data = { ...outlet.data, demandFrom: 'fixed', fixedDemandM3s };
    await outlet.save();
  };
  const frozenLine = async (revisionId: string): Promise<SnapshotLine> => {
    const read = await call(revisionRoute.GET, {
      method: 'GET',
      path: '/api/x',
      params: { revisionId },
      userId: f.users.reviewer.id,
    });
    return read.json.revision.snapshot.lines.find((l: SnapshotLine) => l.id === f.lineId);
  };

  it('keeps the flow the network gave the line when the revision was made, after the network changes', async () => {
    await drawAtEnd(0.0004);
    const made = await call(revisionsRoute.POST, {
      method: 'POST',
      path: '/api/x',
      params: { projectId: f.projectId },
      body: { note: 'With the network' },
      userId: f.users.designer.id,
    });
    expect(made.status).toBe(201);
    const revisionId = made.json.revision.id as string;

    const before = await frozenLine(revisionId);
    expect(before.context.network?.schedule).toEqual([{ fromM: 0, flowM3s: expect.closeTo(0.0004, 12) }]);
    const analysisBefore = analyseSnapshotLine(before)!;
    expect(analysisBefore.flowM3s).toBeCloseTo(0.0004, 12);

    // The network changes after the revision: the line's end now draws 0.9 L/s.
    await drawAtEnd(0.0009);
    expect((await networkFlowsOfLine(f.lineId)).schedule).toEqual([{ fromM: 0, flowM3s: expect.closeTo(0.0009, 12) }]);

    const after = await frozenLine(revisionId);
    expect(after.context.network).toEqual(before.context.network);
    const analysisAfter = analyseSnapshotLine(after)!;
    expect(analysisAfter.flowM3s).toBeCloseTo(0.0004, 12);
    expect(Array.from(analysisAfter.points.hydraulicGradeM)).toEqual(Array.from(analysisBefore.points.hydraulicGradeM));
  });
});
