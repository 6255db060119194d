import '../support/env';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { insertRoutePoints, loadRoutePoints } from '@/lib/data/route-points-store';
import type { PointRecord } from '@/lib/routes/edit-ops';
import { models } from '@/models';
import { createTeamFixture } from '../support/api';

describe('route points stored with COPY', () => {
  let fixture: Awaited<ReturnType<typeof createTeamFixture>>;
  let routeId: string;

  beforeAll(async () => {
    fixture = await createTeamFixture();
    const route = await models().Route.findByPk(fixture.routeId);
    routeId = route!.id;
  });
  afterAll(async () => {
    await models().Project.destroy({ where: { id: fixture.projectId } });
  });

  it('reads back every field exactly: labels with tabs, line breaks, backslashes, quotes and non-ASCII, extreme numbers, times either side of 2000', async () => {
    const records: PointRecord[] = [
      {
        latitude: 54.2000001,
        longitude: -2.9000003,
        chainageM: 0,
        slopeChainageM: 0,
        elevationM: 412.125,
        rawElevationM: 412.5,
        label: 'Spring box\tnorth\\east "A"',
        heightSource: 'gps',
        confidenceM: 3.2,
        recordedAt: '2026-04-18T06:00:00.000Z',
        excluded: false,
        dismissedChecks: [],
      },
      {
        latitude: null,
        longitude: null,
        chainageM: 40.000000000001,
        slopeChainageM: null,
        elevationM: -0.5,
        rawElevationM: 1e-9,
        label: 'two\nlines\r\nhere',
        heightSource: 'level',
        confidenceM: null,
        recordedAt: null,
        excluded: true,
        dismissedChecks: ['spike', 'gps-height'],
      },
      {
        latitude: 0,
        longitude: 0,
        chainageM: 80,
        slopeChainageM: 80.5,
        elevationM: 400,
        rawElevationM: 400,
        label: null,
        heightSource: 'typed',
        confidenceM: 0,
        recordedAt: '1999-12-31T23:59:59.999Z',
        excluded: false,
        dismissedChecks: [],
      },
      {
        latitude: -33.9,
        longitude: 151.2,
        chainageM: 100,
        slopeChainageM: 100.25,
        elevationM: Number.MIN_VALUE,
        rawElevationM: 1.7976931348623157e308,
        label: 'Source à l’ouest 💧 “Ø”',
        heightSource: 'gnss',
        confidenceM: 0.1 + 0.2,
        recordedAt: '2087-06-30T12:34:56.789Z',
        excluded: false,
        dismissedChecks: ['duplicate'],
      },
      {
        latitude: 1,
        longitude: 2,
        chainageM: 120,
        slopeChainageM: null,
        elevationM: 399,
        rawElevationM: 399,
        label: '\\N',
        heightSource: 'map',
        confidenceM: null,
        recordedAt: null,
        excluded: false,
        dismissedChecks: [],
      },
    ];
    await models().sequelize.transaction(async (transaction) => {
      await models().RoutePoint.destroy({ where: { routeId }, transaction });
      await insertRoutePoints(routeId, records, transaction);
    });
    const back = await loadRoutePoints(routeId);
    expect(back).toEqual(records.map((r, seq) => ({ seq, ...r })));
  });

  it('writes nothing when the transaction rolls back', async () => {
    const before = await loadRoutePoints(routeId);
    const record: PointRecord = {
      latitude: null,
      longitude: null,
      chainageM: 500,
      slopeChainageM: null,
      elevationM: 1,
      rawElevationM: 1,
      label: null,
      heightSource: 'typed',
      confidenceM: null,
      recordedAt: null,
      excluded: false,
      dismissedChecks: [],
    };
    await expect(
      models().sequelize.transaction(async (transaction) => {
        await models().RoutePoint.destroy({ where: { routeId }, transaction });
        await insertRoutePoints(routeId, [record], transaction);
        throw new Error('refused after the points went in');
      }),
    ).rejects.toThrow('refused after');
    expect(await loadRoutePoints(routeId)).toEqual(before);
  });

  it('fails with the database message when a row is refused', async () => {
    const record: PointRecord = {
      latitude: null,
      longitude: null,
      chainageM: 1,
      slopeChainageM: null,
      elevationM: 1,
      rawElevationM: 1,
      label: null,
      heightSource: 'typed',
      confidenceM: null,
      recordedAt: null,
      excluded: false,
      dismissedChecks: [],
    };
    // seq 0 is taken by the points already stored: COPY's error reaches the caller.
    await expect(
      models().sequelize.transaction((transaction) => insertRoutePoints(routeId, [record], transaction)),
    ).rejects.toThrow(/duplicate key/);
  });
});
