import 'server-only';
import { models } from '../../models';
import type { HeightSource } from '../../hydraulics/index';
import type { RouteColumns } from '../lines/route-stations';
import type { UnitSystem } from '../units/index';
import type { FieldWordTable } from '../validations/field-words';
import { unitSystemOfProject } from './projects';

export interface RouteChoice {
  id: string;
  name: string;
  pointCount: number;
  lengthM: number;
  /** First and last chainage of its stations, m. */
  firstChainageM: number;
  lastChainageM: number;
}

/** The routes of a project a line can follow (those with at least two stations). */
export async function listRouteChoices(projectId: string): Promise<RouteChoice[]> {
  const { Route, RoutePoint, sequelize } = models();
  const routes = await Route.findAll({ where: { projectId }, order: [['name', 'ASC']] });
  if (routes.length === 0) return [];
  const ranges = (await RoutePoint.findAll({
    attributes: [
      'routeId',
      [sequelize.fn('min', sequelize.col('chainage_m')), 'first'],
      [sequelize.fn('max', sequelize.col('chainage_m')), 'last'],
      [sequelize.fn('count', sequelize.col('seq')), 'n'],
    ],
    // Points a surveyor took out in clean-up are kept for the record but never designed on.
    where: { routeId: routes.map((r) => r.id), excluded: false },
    group: ['routeId'],
    raw: true,
  })) as unknown as { routeId: string; first: number; last: number; n: string }[];
  const byRoute = new Map(ranges.map((r) => [r.routeId, r]));
  return routes.flatMap((r) => {
    const range = byRoute.get(r.id);
    if (!range || Number(range.n) < 2) return [];
    return [
      {
        id: r.id,
        name: r.name,
        pointCount: Number(range.n),
        lengthM: r.lengthM,
        firstChainageM: Number(range.first),
        lastChainageM: Number(range.last),
      },
    ];
  });
}

/** The project a route belongs to and its name, or null. */
/** A route's `bodyWords` for a handler under /routes/[routeId]: refusals worded in its project's units. */
export function inRouteUnits(table: FieldWordTable) {
  return {
    table,
    unitsOf: async ({ routeId }: { routeId: string }): Promise<UnitSystem> => {
      const owner = await routeOwner(routeId);
      return owner ? unitSystemOfProject(owner.projectId) : 'metric';
    },
  };
}

export async function routeOwner(routeId: string): Promise<{ projectId: string; name: string } | null> {
  const route = await models().Route.findByPk(routeId, { attributes: ['projectId', 'name'] });
  return route ? { projectId: route.projectId, name: route.name } : null;
}

/** A route's kept stations in order, as columns. */
export async function routeColumns(routeId: string): Promise<RouteColumns> {
  const rows = (await models().RoutePoint.findAll({
    attributes: ['chainageM', 'elevationM', 'latitude', 'longitude', 'heightSource', 'confidenceM'],
    where: { routeId, excluded: false },
    order: [['seq', 'ASC']],
    raw: true,
  })) as unknown as {
    chainageM: number;
    elevationM: number;
    latitude: number | null;
    longitude: number | null;
    heightSource: HeightSource;
    confidenceM: number | null;
  }[];
  return {
    chainageM: rows.map((r) => r.chainageM),
    elevationM: rows.map((r) => r.elevationM),
    latitude: rows.map((r) => r.latitude),
    longitude: rows.map((r) => r.longitude),
    heightSource: rows.map((r) => r.heightSource),
    confidenceM: rows.map((r) => r.confidenceM),
  };
}
