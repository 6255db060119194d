import { beforeEach, describe, expect, it } from 'vitest';
import { PUT as setNotifications } from '@/app/api/accounts/notifications/route';
import { notifyForActivity } from '@/lib/notifications/from-activity';
import { models } from '@/models';
import { call, createTeamFixture } from '../support/api';

type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;
const kindsTo = async (to: string) =>
  (await models().MailOutbox.findAll({ where: { toAddress: to } })).map((m) => m.kind);
const notify = (activity: Parameters<typeof notifyForActivity>[1]) =>
  models().sequelize.transaction((t) => notifyForActivity(t, activity));

describe('notifications from project activity', () => {
  let f: Fixture;
  beforeEach(async () => {
    f = await createTeamFixture();
  });

  it('a revision submitted for review is mailed to those who review (owner, reviewer), not to its author', async () => {
    const revisionId = '00000000-0000-4000-8000-00000000abcd';
    const sent = await notify({
      projectId: f.projectId,
      actorUserId: f.users.designer.id,
      kind: 'revision.submitted',
      subjectType: 'revision',
      subjectId: revisionId,
      summary: 'Fixture designer submitted revision 2 for review',
    });
    expect(sent).toBe(2);
    expect(await kindsTo(f.users.reviewer.email)).toEqual(['revision-submitted']);
    expect(await kindsTo(f.users.owner.email)).toEqual(['revision-submitted']);
    for (const who of ['designer', 'surveyor', 'viewer', 'outsider'] as const)
      expect(await kindsTo(f.users[who].email)).toEqual([]);
    const [mail] = await models().MailOutbox.findAll({ where: { toAddress: f.users.reviewer.email } });
    expect(mail.subject).toBe('Fixture project: Fixture designer submitted revision 2 for review');
    // The link opens the revision that waits.
    expect(mail.textBody).toContain(`/projects/${f.projectId}/reviews/${revisionId}\n`);
  });

  it('approval and changes requested go to the revision author; mentions to the members mentioned', async () => {
    await notify({
      projectId: f.projectId,
      actorUserId: f.users.reviewer.id,
      kind: 'revision.approved',
      summary: 'approved revision 2',
      data: { authorUserId: f.users.designer.id },
    });
    await notify({
      projectId: f.projectId,
      actorUserId: f.users.reviewer.id,
      kind: 'revision.changes-requested',
      summary: 'sent back revision 3',
      data: { authorUserId: f.users.designer.id },
    });
    await notify({
      projectId: f.projectId,
      actorUserId: f.users.reviewer.id,
      kind: 'comment.added',
      summary: 'commented at 412 m',
      data: { mentions: [f.users.surveyor.id, f.users.outsider.id] },
    });
    expect(await kindsTo(f.users.designer.email)).toEqual(['revision-approved', 'revision-changes-requested']);
    expect(await kindsTo(f.users.surveyor.email)).toEqual(['comment-mention']);
    // A comment on the working copy links to the project; one on a revision to that revision.
    expect((await models().MailOutbox.findOne({ where: { toAddress: f.users.surveyor.email } }))!.textBody).toMatch(
      new RegExp(`/projects/${f.projectId}\n`),
    );
    // Not on the team: never told, whatever the activity names.
    expect(await kindsTo(f.users.outsider.email)).toEqual([]);
    expect(
      await notify({
        projectId: f.projectId,
        actorUserId: f.users.designer.id,
        kind: 'line.edited',
        summary: 'edited a line',
      }),
    ).toBe(0);
  });

  it('a kind turned off is not mailed to that person; others still get it', async () => {
    const off = await call(setNotifications, {
      method: 'PUT',
      path: '/x',
      body: { 'revision-submitted': false },
      userId: f.users.reviewer.id,
    });
    expect(off.status).toBe(200);
    expect(off.json.preferences['revision-submitted']).toBe(false);
    expect(off.json.preferences['comment-mention']).toBe(true);
    await notify({
      projectId: f.projectId,
      actorUserId: f.users.designer.id,
      kind: 'revision.submitted',
      summary: 'submitted revision 4',
    });
    expect(await kindsTo(f.users.reviewer.email)).toEqual([]);
    expect(await kindsTo(f.users.owner.email)).toEqual(['revision-submitted']);
  });

  it('an unknown kind in the preferences is refused', async () => {
    const res = await call(setNotifications, {
      method: 'PUT',
      path: '/x',
      body: { 'weekly-digest': true },
      userId: f.users.reviewer.id,
    });
    expect(res.status).toBe(400);
  });
});
