import { PDFParse } from 'pdf-parse';
import { beforeAll, describe, expect, it } from 'vitest';
import * as commentsRoute from '@/app/api/projects/[projectId]/comments/route';
import * as revisionsRoute from '@/app/api/projects/[projectId]/revisions/route';
import * as approveRoute from '@/app/api/revisions/[revisionId]/approve/route';
import * as issueRoute from '@/app/api/revisions/[revisionId]/issue/route';
import * as reportRoute from '@/app/api/revisions/[revisionId]/lines/[lineId]/report/route';
import * as requestChangesRoute from '@/app/api/revisions/[revisionId]/request-changes/route';
import * as revisionRoute from '@/app/api/revisions/[revisionId]/route';
import * as submitRoute from '@/app/api/revisions/[revisionId]/submit/route';
import * as lineRoute from '@/app/api/lines/[lineId]/route';
import * as membersRoute from '@/app/api/teams/[teamId]/members/route';
import * as sourceFileRoute from '@/app/api/routes/[routeId]/source/route';
import { models } from '@/models';
import { call, createTeamFixture } from '../support/api';
import * as compareRoute from '@/app/api/revisions/[revisionId]/compare/[otherId]/route';
import { findPipe, pipeHeadLossM } from '@/hydraulics/index';
import { updateNetworkLink } from '@/lib/data/network';
import { replacePriceList } from '@/lib/data/price-list';
import { NetworkLinkSchema } from '@/lib/validations/network';
import { createPipeNetworkFixture, pipeLinkBody } from '../support/network-fixtures';

type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;

async function pagesOf(bytes: Buffer): Promise<string[]> {
  const parser = new PDFParse({ data: new Uint8Array(bytes) });
  const result = await parser.getText();
  await parser.destroy();
  return result.pages.map((p: { text: string }) => p.text.replace(/\s+/g, ' '));
}

describe('revisions and the review cycle', () => {
  let f: Fixture;
  beforeAll(async () => {
    f = await createTeamFixture();
  });

  const make = (userId: string, body: unknown = { note: 'First layout' }) =>
    call(revisionsRoute.POST, { method: 'POST', path: '/api/x', params: { projectId: f.projectId }, body, userId });
  const step = (route: { POST: Parameters<typeof call>[0] }, revisionId: string, userId: string, body?: unknown) =>
    call(route.POST, { method: 'POST', path: '/api/x', params: { revisionId }, body, userId });
  const pdf = async (revisionId: string, userId: string) => {
    const res = await call(reportRoute.GET, {
      method: 'GET',
      path: '/api/x',
      params: { revisionId, lineId: f.lineId },
      userId,
    });
    expect(res.status).toBe(200);
    return res.bytes;
  };
  const statusOf = async (id: string) => (await models().Revision.findByPk(id))!.status;

  it('numbers revisions and freezes the whole design: lines with their route stations, the network, the project settings', async () => {
    const network = await createPipeNetworkFixture(f.projectId);
    const first = await make(f.users.designer.id);
    expect(first.status).toBe(201);
    const second = await make(f.users.designer.id, { note: 'Second', submit: true });
    expect(second.json.revision).toMatchObject({
      number: first.json.revision.number + 1,
      status: 'submitted',
      createdBy: { name: 'Fixture designer' },
    });
    const read = await call(revisionRoute.GET, {
      method: 'GET',
      path: '/api/x',
      params: { revisionId: first.json.revision.id },
      userId: f.users.reviewer.id,
    });
    const snap = read.json.revision.snapshot;
    expect(snap.project).toMatchObject({ name: 'Fixture project', unitSystem: 'metric' });
    const line = snap.lines.find((l: { id: string }) => l.id === f.lineId);
    expect(line.stations.map((s: { chainageM: number }) => s.chainageM)).toEqual([0, 100, 200, 300, 400]);
    expect(line.design.stretches).toEqual([{ fromM: 0, toM: 400, pipe: 'pe100-iso4427-sdr11-50mm' }]);
    expect(snap.network.nodes.map((n: { id: string }) => n.id).sort()).toEqual(
      [network.source.id, network.outlet.id].sort(),
    );
    expect(snap.network.links).toMatchObject([
      { id: network.link.id, fromNodeId: network.source.id, toNodeId: network.outlet.id },
    ]);
  });

  it('an edit after a revision changes only the working copy: the revision PDF stays byte-for-byte the same', async () => {
    const made = await make(f.users.designer.id, { note: 'Before the edit' });
    const id = made.json.revision.id;
    const before = await pdf(id, f.users.reviewer.id);
    const real = await call(lineRoute.PATCH, {
      method: 'PATCH',
      path: '/api/x',
      params: { lineId: f.lineId },
      userId: f.users.designer.id,
      body: { name: 'Renamed after the revision', notes: 'Moved on' },
    });
    expect(real.status).toBe(200);
    await models().Line.update(
      { stretches: [{ fromM: 0, toM: 400, pipe: 'pe100-iso4427-sdr17-50mm' }] },
      { where: { id: f.lineId } },
    );
    const after = await pdf(id, f.users.reviewer.id);
    expect(after.equals(before)).toBe(true);
    const later = await make(f.users.designer.id, { note: 'After the edit' });
    const laterPdf = await pdf(later.json.revision.id, f.users.reviewer.id);
    expect(laterPdf.equals(before)).toBe(false);
    const frozen = (
      await call(revisionRoute.GET, {
        method: 'GET',
        path: '/api/x',
        params: { revisionId: id },
        userId: f.users.reviewer.id,
      })
    ).json.revision.snapshot;
    expect(frozen.lines[0].name).not.toBe('Renamed after the revision');
  });

  it('runs the cycle by role: designer submits, reviewer sends back or approves, designer issues; the earlier issue is superseded', async () => {
    const a = (await make(f.users.designer.id)).json.revision.id;
    expect((await step(submitRoute, a, f.users.reviewer.id)).status).toBe(403);
    expect((await step(submitRoute, a, f.users.designer.id)).status).toBe(200);
    expect((await step(approveRoute, a, f.users.designer.id)).status).toBe(403);
    expect((await step(approveRoute, a, f.users.surveyor.id)).status).toBe(403);
    expect((await step(approveRoute, a, f.users.viewer.id)).status).toBe(403);
    const back = await step(requestChangesRoute, a, f.users.reviewer.id, { note: 'Washout at the sag' });
    expect(back.json.revision).toMatchObject({ status: 'changes-requested', reviewedBy: { name: 'Fixture reviewer' } });
    expect((await step(approveRoute, a, f.users.reviewer.id)).status).toBe(409);

    const b = (await make(f.users.designer.id, { note: 'Answered', submit: true })).json.revision.id;
    const ok = await step(approveRoute, b, f.users.reviewer.id);
    expect(ok.status).toBe(200);
    expect(ok.json.revision.reviewedBy.name).toBe('Fixture reviewer');
    expect(Date.now() - Date.parse(ok.json.revision.reviewedAt)).toBeLessThan(60_000);
    expect((await step(issueRoute, b, f.users.reviewer.id)).status).toBe(403);
    expect((await step(issueRoute, b, f.users.designer.id)).json.revision.status).toBe('issued');

    const c = (await make(f.users.designer.id, { submit: true })).json.revision.id;
    await step(approveRoute, c, f.users.owner.id);
    await step(issueRoute, c, f.users.designer.id);
    expect(await statusOf(b)).toBe('superseded');
    expect(await statusOf(c)).toBe('issued');
  });

  it('nobody approves their own revision, owners included', async () => {
    const mine = (await make(f.users.owner.id, { submit: true })).json.revision.id;
    const res = await step(approveRoute, mine, f.users.owner.id);
    expect(res.status).toBe(403);
    expect(res.json.error.message).toMatch(/someone else must review it/);
    expect(await statusOf(mine)).toBe('submitted');
    expect((await step(approveRoute, mine, f.users.reviewer.id)).status).toBe(200);
  });

  it('two reviewers racing: one approval lands, the other gets 409', async () => {
    const id = (await make(f.users.designer.id, { submit: true })).json.revision.id;
    const results = await Promise.all([
      step(approveRoute, id, f.users.reviewer.id),
      step(requestChangesRoute, id, f.users.owner.id),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
  });

  it('a forged "approved" in any body is refused and changes nothing', async () => {
    const count = await models().Revision.count({ where: { projectId: f.projectId } });
    const forgedNew = await make(f.users.designer.id, {
      note: 'sneaky',
      status: 'approved',
      reviewedBy: f.users.reviewer.id,
    });
    expect(forgedNew.status).toBe(400);
    expect(await models().Revision.count({ where: { projectId: f.projectId } })).toBe(count);
    const id = (await make(f.users.designer.id, { submit: true })).json.revision.id;
    for (const route of [submitRoute, approveRoute, requestChangesRoute, issueRoute]) {
      const res = await step(route, id, f.users.owner.id, { status: 'approved' });
      expect(res.status).toBe(400);
    }
    expect(await statusOf(id)).toBe('submitted');
    const line = await call(lineRoute.PATCH, {
      method: 'PATCH',
      path: '/api/x',
      params: { lineId: f.lineId },
      userId: f.users.designer.id,
      body: { status: 'issued', checkedBy: 'Anyone' },
    });
    expect(line.status).toBe(400);
    const comment = await call(commentsRoute.POST, {
      method: 'POST',
      path: '/api/x',
      params: { projectId: f.projectId },
      userId: f.users.designer.id,
      body: { body: 'ok', revisionId: id, status: 'approved' },
    });
    expect(comment.status).toBe(400);
    expect(await statusOf(id)).toBe('submitted');
  });

  it('a client sees approved and issued revisions only, and their PDFs carry the reviewer and date without the mark', async () => {
    const g = await createTeamFixture();
    const mk = (body: unknown) =>
      call(revisionsRoute.POST, {
        method: 'POST',
        path: '/api/x',
        params: { projectId: g.projectId },
        body,
        userId: g.users.designer.id,
      });
    const draft = (await mk({ note: 'draft' })).json.revision.id;
    const approved = (await mk({ note: 'to approve', submit: true })).json.revision.id;
    await call(approveRoute.POST, {
      method: 'POST',
      path: '/api/x',
      params: { revisionId: approved },
      userId: g.users.reviewer.id,
    });
    const list = await call(revisionsRoute.GET, {
      method: 'GET',
      path: '/api/x',
      params: { projectId: g.projectId },
      userId: g.users.viewer.id,
    });
    expect(list.json.revisions.map((r: { id: string }) => r.id)).toEqual([approved]);
    expect(
      (
        await call(revisionRoute.GET, {
          method: 'GET',
          path: '/api/x',
          params: { revisionId: draft },
          userId: g.users.viewer.id,
        })
      ).status,
    ).toBe(404);
    const report = await call(reportRoute.GET, {
      method: 'GET',
      path: '/api/x',
      params: { revisionId: draft, lineId: g.lineId },
      userId: g.users.viewer.id,
    });
    expect(report.status).toBe(404);
    const ok = await call(reportRoute.GET, {
      method: 'GET',
      path: '/api/x',
      params: { revisionId: approved, lineId: g.lineId },
      userId: g.users.viewer.id,
    });
    expect(ok.status).toBe(200);
    expect(ok.headers.get('content-disposition')).toMatch(/-rev-2\.pdf/);
    const approvedPages = await pagesOf(ok.bytes);
    expect(approvedPages[0]).toContain('Fixture reviewer');
    expect(approvedPages[0]).toContain(new Date().toISOString().slice(0, 10));
    expect(approvedPages.join(' ')).not.toContain('NOT FOR CONSTRUCTION');
    const draftPdf = await call(reportRoute.GET, {
      method: 'GET',
      path: '/api/x',
      params: { revisionId: draft, lineId: g.lineId },
      userId: g.users.reviewer.id,
    });
    const draftPages = await pagesOf(draftPdf.bytes);
    expect(draftPages.length).toBeGreaterThan(1);
    for (const page of draftPages) expect(page).toContain('NOT FOR CONSTRUCTION');
  });

  it("a client sees no other member's e-mail address and cannot download raw survey files", async () => {
    const members = await call(membersRoute.GET, {
      method: 'GET',
      path: '/api/x',
      params: { teamId: f.teamId },
      userId: f.users.viewer.id,
    });
    expect(members.status).toBe(200);
    for (const m of members.json.members)
      expect(m.email).toBe(m.userId === f.users.viewer.id ? f.users.viewer.email : null);
    const forTeam = await call(membersRoute.GET, {
      method: 'GET',
      path: '/api/x',
      params: { teamId: f.teamId },
      userId: f.users.reviewer.id,
    });
    expect(forTeam.json.members.every((m: { email: string | null }) => typeof m.email === 'string')).toBe(true);
    const raw = await call(sourceFileRoute.GET, {
      method: 'GET',
      path: '/api/x',
      params: { routeId: f.routeId },
      userId: f.users.viewer.id,
    });
    expect(raw.status).toBe(403);
  });

  it('a revision freezes the price list in force and its network solve: the compare shows the cost and outlet pressure moving as worked by hand', async () => {
    const g = await createTeamFixture();
    const network = await createPipeNetworkFixture(g.projectId);
    const prices = (fiftyMm: number) => ({
      items: [
        { pipeId: 'pe100-iso4427-sdr11-32mm', costPerM: 2.1, notes: '' },
        { pipeId: 'pe100-iso4427-sdr11-40mm', costPerM: 3.4, notes: '' },
        { pipeId: 'pe100-iso4427-sdr11-50mm', costPerM: fiftyMm, notes: '' },
      ],
    });
    await replacePriceList(g.teamId, prices(5));
    const makeIn = async (note: string) =>
      (
        await call(revisionsRoute.POST, {
          method: 'POST',
          path: '/api/x',
          params: { projectId: g.projectId },
          body: { note },
          userId: g.users.designer.id,
        })
      ).json.revision;
    const first = await makeIn('32 mm to the tap');
    // The designer puts in a larger pipe to the tap, and the 50 mm price goes up.
    await updateNetworkLink(
      g.projectId,
      network.link.id,
      NetworkLinkSchema.parse({
        ...pipeLinkBody(network.source.id, network.outlet.id),
        data: { lengthM: 250, pipe: 'pe100-iso4427-sdr11-40mm' },
      }),
    );
    await replacePriceList(g.teamId, prices(5.5));
    const second = await makeIn('40 mm to the tap');
    // A later price change does not touch what either revision froze.
    await replacePriceList(g.teamId, prices(9));

    const res = await call(compareRoute.GET, {
      method: 'GET',
      path: '/api/x',
      params: { revisionId: second.id, otherId: first.id },
      userId: g.users.reviewer.id,
    });
    expect(res.status).toBe(200);
    const { cost, outlets } = res.json.comparison;
    // The fixture line: 400 m on plan falling 240 -> 231 -> 226 -> 214 -> 200 m, all 50 mm.
    const lineSlopeM = Math.hypot(100, 9) + Math.hypot(100, 5) + Math.hypot(100, 12) + Math.hypot(100, 14);
    expect(cost.before.total).toBeCloseTo(250 * 2.1 + lineSlopeM * 5, 6);
    expect(cost.after.total).toBeCloseTo(250 * 3.4 + lineSlopeM * 5.5, 6);
    expect(cost.difference).toBeCloseTo(250 * 1.3 + lineSlopeM * 0.5, 6);
    // Intake 120 m, tap 100 m, 250 m at 0.2 L/s, by the network's default law (the line analysis's): Darcy-Weisbach
    // with Colebrook (the core's pipeHeadLossM) plus the sharp entrance and velocity head at the intake, K = 1.5
    // (profile-and-checks.md §5.2).
    const loss = (pipeId: string) => {
      const pipe = findPipe(pipeId)!;
      const velocity = 0.0002 / (Math.PI * (pipe.insideDiameterM / 2) ** 2);
      return (
        pipeHeadLossM({ method: 'darcy-weisbach', flowM3s: 0.0002, lengthM: 250, pipe }) +
        (1.5 * velocity ** 2) / (2 * 9.80665)
      );
    };
    expect(outlets).toHaveLength(1);
    expect(outlets[0]).toMatchObject({ nodeId: network.outlet.id, name: 'Fixture tap', change: 'changed' });
    expect(outlets[0].before).toBeCloseTo(20 - loss('pe100-iso4427-sdr11-32mm'), 3);
    expect(outlets[0].after).toBeCloseTo(20 - loss('pe100-iso4427-sdr11-40mm'), 3);
    const frozen = await models().Revision.findByPk(first.id);
    expect((frozen!.snapshot as { networkBasis: { prices: unknown[] } }).networkBasis.prices).toContainEqual({
      pipeId: 'pe100-iso4427-sdr11-50mm',
      costPerM: 5,
    });
  });
});
