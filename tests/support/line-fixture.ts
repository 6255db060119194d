import { models } from '@/models';

/**
 * A short invented route (five stations, 400 m, falling 40 m) and a line on it with one
 * catalogue stretch, for handler tests.
 */
export async function createLineFixture(projectId: string): Promise<{ routeId: string; lineId: string }> {
  const { Route, RoutePoint, Line } = models();
  const profile: [number, number][] = [
    [0, 240],
    [100, 231],
    [200, 226],
    [300, 214],
    [400, 200],
  ];
  const route = await Route.create({ projectId, name: 'Fixture route', pointCount: profile.length, lengthM: 400 });
  await RoutePoint.bulkCreate(
    profile.map(([chainageM, elevationM], seq) => ({
      routeId: route.id,
      seq,
      chainageM,
      elevationM,
      rawElevationM: elevationM,
      heightSource: 'level' as const,
      latitude: 54.5 + seq * 0.0009,
      longitude: -2.6,
      slopeChainageM: null,
      label: null,
      confidenceM: null,
      recordedAt: null,
    })),
  );
  const line = await Line.create({
    projectId,
    routeId: route.id,
    name: 'Fixture line',
    fromChainageM: null,
    toChainageM: null,
    startCondition: { kind: 'water-level', levelM: 241 },
    endCondition: { kind: 'outlet', elevationM: 200, residualHeadM: 5 },
    flow: { kind: 'design', flowM3s: 0.001 },
    stretches: [{ fromM: 0, toM: 400, pipe: 'pe100-iso4427-sdr11-50mm' }],
    fittings: [],
    devices: [],
    pipes: [],
    settings: {},
    createdBy: null,
    updatedBy: null,
  });
  return { routeId: route.id, lineId: line.id };
}
