import '../support/env';
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { insertRoutePoints } from '@/lib/data/route-points-store';
import type { PointRecord } from '@/lib/routes/edit-ops';
import { newPointRecord } from '@/lib/routes/new-point';
import { serializeError } from '@/lib/log';
import { models } from '@/models';
import { createTeamFixture } from '../support/api';

// Route points keep to their route through statement triggers (migration 20261203000001), not a per-row foreign
// key. These checks hold the triggers to every promise the key made.

const point = (chainageM: number): PointRecord =>
  newPointRecord({
    latitude: null,
    longitude: null,
    chainageM,
    slopeChainageM: null,
    elevationM: 400 - chainageM / 100,
    label: null,
    heightSource: 'typed',
    confidenceM: null,
    recordedAt: null,
  });

const points = (count: number) => Array.from({ length: count }, (_, i) => point(i * 10));

/** The database's error code, as the log reads it (Sequelize's wrapper or the driver's own error). */
const sqlState = (error: unknown) => serializeError(error).code;

async function newRoute(projectId: string, createdBy: string): Promise<string> {
  const route = await models().Route.create({
    projectId,
    name: `Integrity ${randomUUID().slice(0, 8)}`,
    sourceFormat: 'station-csv',
    createdBy,
    pointCount: 0,
    lengthM: 0,
  });
  return route.id;
}

describe('route points belong to a route that exists', () => {
  let fixture: Awaited<ReturnType<typeof createTeamFixture>>;

  beforeAll(async () => {
    fixture = await createTeamFixture();
  });
  afterAll(async () => {
    await models().Project.destroy({ where: { id: fixture.projectId } });
  });

  const count = (routeId: string) => models().RoutePoint.count({ where: { routeId } });

  it('refuses points for a route that does not exist, with the foreign-key error code, and stores none', async () => {
    const ghost = randomUUID();
    const error = await models()
      .sequelize.transaction((transaction) => insertRoutePoints(ghost, points(3), transaction))
      .catch((e: unknown) => e);
    expect(sqlState(error)).toBe('23503');
    expect(String((error as Error).message)).toContain(ghost);
    expect(await count(ghost)).toBe(0);
  });

  it('deletes a route’s points with the route, and only that route’s', async () => {
    const kept = await newRoute(fixture.projectId, fixture.users.surveyor.id);
    const gone = await newRoute(fixture.projectId, fixture.users.surveyor.id);
    await models().sequelize.transaction(async (transaction) => {
      await insertRoutePoints(kept, points(4), transaction);
      await insertRoutePoints(gone, points(5), transaction);
    });
    expect(await count(gone)).toBe(5);
    await models().Route.destroy({ where: { id: gone } });
    expect(await count(gone)).toBe(0);
    expect(await count(kept)).toBe(4);
  });

  it('deletes every route’s points when the project goes (the project’s key removes the routes)', async () => {
    const other = await createTeamFixture();
    const routeId = await newRoute(other.projectId, other.users.surveyor.id);
    await models().sequelize.transaction((transaction) => insertRoutePoints(routeId, points(6), transaction));
    const routeIds = (await models().Route.findAll({ where: { projectId: other.projectId } })).map((r) => r.id);
    expect(routeIds.length).toBeGreaterThan(1);
    await models().Team.destroy({ where: { id: other.teamId } });
    expect(await models().RoutePoint.count({ where: { routeId: routeIds } })).toBe(0);
  });

  it('never moves a point to another route, and never changes a route’s id', async () => {
    const from = await newRoute(fixture.projectId, fixture.users.surveyor.id);
    const to = await newRoute(fixture.projectId, fixture.users.surveyor.id);
    await models().sequelize.transaction((transaction) => insertRoutePoints(from, points(2), transaction));
    const moved = await models()
      .RoutePoint.update({ routeId: to }, { where: { routeId: from } })
      .catch((e: unknown) => e);
    expect(sqlState(moved)).toBe('23503');
    const renamed = await models()
      .Route.update({ id: randomUUID() }, { where: { id: from } })
      .catch((e: unknown) => e);
    expect(sqlState(renamed)).toBe('23503');
    expect(await count(from)).toBe(2);
    expect(await count(to)).toBe(0);
    // Other changes to both still go through.
    await models().Route.update({ name: 'Renamed route' }, { where: { id: from } });
    await models().RoutePoint.update({ label: 'Gate' }, { where: { routeId: from, seq: 0 } });
    expect((await models().RoutePoint.findOne({ where: { routeId: from, seq: 0 } }))?.label).toBe('Gate');
  });

  it('a route deleted while its points are being written: the write waits for the delete and then fails', async () => {
    const routeId = await newRoute(fixture.projectId, fixture.users.surveyor.id);
    const { sequelize, Route } = models();
    const deleting = await sequelize.transaction();
    await Route.destroy({ where: { id: routeId }, transaction: deleting });
    let settled = false;
    const writing = sequelize
      .transaction((transaction) => insertRoutePoints(routeId, points(3), transaction))
      .then(
        () => 'stored',
        (e: unknown) => sqlState(e),
      )
      .finally(() => {
        settled = true;
      });
    // The write holds on the route's row lock until the delete ends.
    await new Promise((resolve) => setTimeout(resolve, 300));
    expect(settled).toBe(false);
    await deleting.commit();
    expect(await writing).toBe('23503');
    expect(await count(routeId)).toBe(0);
  });

  it('a route deleted after its points were written in a transaction still open: the delete waits, then takes them', async () => {
    const routeId = await newRoute(fixture.projectId, fixture.users.surveyor.id);
    const { sequelize, Route } = models();
    const writing = await sequelize.transaction();
    await insertRoutePoints(routeId, points(3), writing);
    let settled = false;
    const deleting = Route.destroy({ where: { id: routeId } }).finally(() => {
      settled = true;
    });
    await new Promise((resolve) => setTimeout(resolve, 300));
    expect(settled).toBe(false);
    await writing.commit();
    await deleting;
    expect(await count(routeId)).toBe(0);
  });
});
