import { beforeAll, describe, expect, it } from 'vitest';
import * as activityRoute from '@/app/api/projects/[projectId]/activity/route';
import * as commentRoute from '@/app/api/comments/[commentId]/route';
import * as commentsRoute from '@/app/api/projects/[projectId]/comments/route';
import { models } from '@/models';
import { call, createTeamFixture } from '../support/api';
import { deleteNetworkLink } from '@/lib/data/network';
import { createPipeNetworkFixture } from '../support/network-fixtures';
import { createRevisionFixture } from '../support/review-fixtures';

type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;

describe('review comments', () => {
  let f: Fixture;
  beforeAll(async () => {
    f = await createTeamFixture();
  });
  const post = (userId: string, body: unknown) =>
    call(commentsRoute.POST, { method: 'POST', path: '/api/x', params: { projectId: f.projectId }, body, userId });
  const list = async (userId: string) =>
    (await call(commentsRoute.GET, { method: 'GET', path: '/api/x', params: { projectId: f.projectId }, userId })).json
      .comments;
  const resolve = (commentId: string, resolved: boolean, userId: string) =>
    call(commentRoute.PATCH, { method: 'PATCH', path: '/api/x', params: { commentId }, body: { resolved }, userId });

  it('pins a comment at a chainage of a revision, threads a reply under it, resolves and reopens it', async () => {
    const revision = await createRevisionFixture(f, 'submitted');
    const made = await post(f.users.reviewer.id, {
      body: 'PN 8 in the sag?',
      revisionId: revision.id,
      anchor: { kind: 'line-chainage', lineId: f.lineId, chainageM: 250 },
      mentions: [f.users.designer.id],
    });
    expect(made.status).toBe(201);
    const reply = await post(f.users.designer.id, {
      body: 'Changed to PN 16 in revision 2',
      parentId: made.json.comment.id,
    });
    expect(reply.status).toBe(201);
    const all = await list(f.users.reviewer.id);
    const thread = all.find((c: { id: string }) => c.id === made.json.comment.id);
    const answer = all.find((c: { id: string }) => c.id === reply.json.comment.id);
    expect(thread).toMatchObject({
      revisionId: revision.id,
      revisionNumber: revision.number,
      anchor: { kind: 'line-chainage', chainageM: 250 },
      mentions: [{ name: 'Fixture designer' }],
      anchorNow: { state: 'present' },
    });
    expect(answer).toMatchObject({
      parentId: thread.id,
      revisionId: revision.id,
      anchor: thread.anchor,
      author: { name: 'Fixture designer' },
    });
    expect((await resolve(thread.id, true, f.users.reviewer.id)).status).toBe(200);
    expect((await resolve(thread.id, true, f.users.reviewer.id)).status).toBe(409);
    expect((await resolve(thread.id, false, f.users.designer.id)).status).toBe(200);
    const feed = await call(activityRoute.GET, {
      method: 'GET',
      path: `/api/x?kinds=comment.added`,
      params: { projectId: f.projectId },
      userId: f.users.owner.id,
    });
    const added = feed.json.items.find((i: { subjectId: string }) => i.subjectId === thread.id);
    expect(added).toMatchObject({
      kind: 'comment.added',
      actor: { name: 'Fixture reviewer' },
      data: { mentions: [f.users.designer.id] },
    });
    expect(feed.json.items.every((i: { kind: string }) => i.kind === 'comment.added')).toBe(true);
  });

  it('a comment on an older revision stays readable and says its line is gone from the working copy', async () => {
    const g = await createTeamFixture();
    const revision = await createRevisionFixture(g, 'submitted');
    const made = await call(commentsRoute.POST, {
      method: 'POST',
      path: '/api/x',
      params: { projectId: g.projectId },
      userId: g.users.reviewer.id,
      body: {
        body: 'Air valve here',
        revisionId: revision.id,
        anchor: { kind: 'line-chainage', lineId: g.lineId, chainageM: 300 },
      },
    });
    expect(made.status).toBe(201);
    await models().Line.destroy({ where: { id: g.lineId } });
    const comments = (
      await call(commentsRoute.GET, {
        method: 'GET',
        path: '/api/x',
        params: { projectId: g.projectId },
        userId: g.users.designer.id,
      })
    ).json.comments;
    expect(comments[0]).toMatchObject({
      body: 'Air valve here',
      anchorNow: { state: 'gone', words: 'the line is no longer in the working copy' },
    });
  });

  it('surveyors comment on routes only; viewers read only comments on approved revisions; mentions must be team members', async () => {
    expect(
      (
        await post(f.users.surveyor.id, {
          body: 'Peg moved',
          anchor: { kind: 'route-chainage', routeId: f.routeId, chainageM: 10 },
        })
      ).status,
    ).toBe(201);
    const onLine = await post(f.users.surveyor.id, {
      body: 'Pipe?',
      anchor: { kind: 'line-chainage', lineId: f.lineId, chainageM: 10 },
    });
    expect(onLine.status).toBe(403);
    expect((await post(f.users.viewer.id, { body: 'Looks good' })).status).toBe(403);
    const outsider = await post(f.users.reviewer.id, { body: 'FYI', mentions: [f.users.outsider.id] });
    expect(outsider.status).toBe(404);
    expect(outsider.json.error.fields.mentions).toEqual(['Mention members of this team only']);
    const approved = await createRevisionFixture(f, 'approved');
    await post(f.users.reviewer.id, { body: 'Approved as drawn', revisionId: approved.id });
    const seen = await list(f.users.viewer.id);
    expect(seen.map((c: { body: string }) => c.body)).toEqual(['Approved as drawn']);
  });

  it('refuses a line that is not in the revision, with the field named', async () => {
    const revision = await createRevisionFixture(f, 'draft');
    const other = await createTeamFixture();
    const res = await post(f.users.reviewer.id, {
      body: 'x',
      revisionId: revision.id,
      anchor: { kind: 'line-chainage', lineId: other.lineId, chainageM: 5 },
    });
    expect(res.status).toBe(404);
    expect(res.json.error.fields['anchor.lineId']).toBeDefined();
  });

  it("pins a comment to a part of the working copy's network, says where it is now, and refuses a part that is not there", async () => {
    const g = await createTeamFixture();
    const network = await createPipeNetworkFixture(g.projectId);
    const postIn = (body: unknown) =>
      call(commentsRoute.POST, {
        method: 'POST',
        path: '/api/x',
        params: { projectId: g.projectId },
        body,
        userId: g.users.reviewer.id,
      });
    const onLink = await postIn({
      body: 'Is 32 mm enough to the tap?',
      anchor: { kind: 'network', part: 'link', partId: network.link.id },
    });
    expect(onLink.status).toBe(201);
    const read = async () =>
      (
        await call(commentsRoute.GET, {
          method: 'GET',
          path: '/api/x',
          params: { projectId: g.projectId },
          userId: g.users.designer.id,
        })
      ).json.comments;
    expect((await read())[0]).toMatchObject({
      revisionId: null,
      anchor: { kind: 'network', part: 'link', partId: network.link.id },
      anchorNow: { state: 'present', words: 'network link "Fixture pipe"' },
    });
    // A node id given as a link, and a part of another project, are both refused with the field named.
    const wrongPart = await postIn({ body: 'x', anchor: { kind: 'network', part: 'link', partId: network.outlet.id } });
    expect(wrongPart.status).toBe(404);
    expect(wrongPart.json.error.fields['anchor.partId']).toEqual(['Pick a link of this revision or working copy']);
    const other = await createPipeNetworkFixture(f.projectId);
    expect(
      (await postIn({ body: 'x', anchor: { kind: 'network', part: 'node', partId: other.outlet.id } })).status,
    ).toBe(404);
    // The link goes: the comment stays readable and says so.
    await deleteNetworkLink(g.projectId, network.link.id);
    expect((await read())[0]).toMatchObject({
      body: 'Is 32 mm enough to the tap?',
      anchorNow: { state: 'gone', words: 'the network link is no longer in the working copy' },
    });
  });
});
