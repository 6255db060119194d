import { describe, expect, it } from 'vitest';
import * as generateRoute from '@/app/api/projects/[projectId]/seasonal-tasks/generate/route';
import * as taskRoute from '@/app/api/projects/[projectId]/seasonal-tasks/[taskId]/route';
import { models } from '@/models';
import { call, createTeamFixture } from '../support/api';

const generate = (projectId: string, userId: string, body: unknown) =>
  call(generateRoute.POST, { method: 'POST', path: 'x', params: { projectId }, body, userId });

describe('seasonal tasks', () => {
  it('makes a dated year of upkeep from the frost dates, refuses a second run, and replaces open tasks on request', async () => {
    const f = await createTeamFixture();
    const body = { year: 2027, hemisphere: 'north', firstFrost: '10-15', lastFrost: '04-20' };
    const first = await generate(f.projectId, f.users.designer.id, body);
    expect(first.status).toBe(201);
    const kinds = first.json.tasks.map((task: { kind: string }) => task.kind);
    expect(kinds).toEqual(
      expect.arrayContaining(['drain-down', 'refill', 'silt-cleaning', 'intake-screen', 'valve-exercise']),
    );
    // Drain-down 14 days before the first frost (Runnel's default lead; common practice, no source).
    expect(first.json.tasks.find((task: { kind: string }) => task.kind === 'drain-down').dueOn).toBe('2027-10-01');
    const count = first.json.tasks.length;

    const done = first.json.tasks[0];
    const patched = await call(taskRoute.PATCH, {
      method: 'PATCH',
      path: 'x',
      params: { projectId: f.projectId, taskId: done.id },
      body: { done: true },
      userId: f.users.owner.id,
    });
    expect(patched.json.task.doneOn).toMatch(/^\d{4}-\d{2}-\d{2}$/);

    const again = await generate(f.projectId, f.users.designer.id, body);
    expect(again.status).toBe(409);
    expect(await models().SeasonalTask.count({ where: { projectId: f.projectId } })).toBe(count);

    const replaced = await generate(f.projectId, f.users.designer.id, { ...body, replace: true });
    expect(replaced.status).toBe(201);
    // The done task is kept; the open ones are replaced, not doubled.
    expect(await models().SeasonalTask.count({ where: { projectId: f.projectId } })).toBe(count + 1);
  });

  it.each([
    ['a first frost on the 13th month', { firstFrost: '13-01' }, 'firstFrost'],
    ['a two-digit year', { year: 27 }, 'year'],
    ['an unknown hemisphere', { hemisphere: 'east' }, 'hemisphere'],
  ])('refuses %s (400) and writes nothing', async (_what, patch, field) => {
    const f = await createTeamFixture();
    const res = await generate(f.projectId, f.users.owner.id, {
      year: 2027,
      hemisphere: 'north',
      firstFrost: '10-15',
      ...patch,
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error.fields)).toContain(field);
    expect(await models().SeasonalTask.count({ where: { projectId: f.projectId } })).toBe(0);
  });
});

describe('an overdue drain-down reaches the lines of the project', () => {
  it('the earliest open drain-down past its date, not a done one nor one still to come', async () => {
    const { lineSiteContext } = await import('@/lib/data/line-context');
    const f = await createTeamFixture();
    const task = (dueOn: string, done = false, kind: 'drain-down' | 'refill' = 'drain-down') =>
      models().SeasonalTask.create({
        projectId: f.projectId,
        kind,
        title: `${kind} ${dueOn}`,
        dueOn,
        done,
        doneOn: done ? dueOn : null,
      });
    expect((await lineSiteContext(f.projectId, '2026-12-02')).overdueDrainDownOn).toBeNull();
    await task('2026-09-15', true);
    await task('2026-11-20', false, 'refill');
    await task('2026-12-20');
    expect((await lineSiteContext(f.projectId, '2026-12-02')).overdueDrainDownOn).toBeNull();
    await task('2026-10-01');
    await task('2026-11-01');
    const context = await lineSiteContext(f.projectId, '2026-12-02');
    expect(context.overdueDrainDownOn).toBe('2026-10-01');
    expect(context.unitSystem).toBe('metric');
  });
});
