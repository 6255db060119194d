import type { Actor } from '../support/api';
import {
  commissioningBody,
  createCommissioningFixture,
  createDemandUseFixture,
  createRamSiteFixture,
  createSeasonalTaskFixture,
  createSourceFixture,
  createTankFixture,
  createYieldReadingFixture,
  demandUseBody,
  ramSiteBody,
  seasonalTaskBody,
  sourceBody,
  tankBody,
  yieldReadingBody,
} from '../support/lift-fixtures';
import type { EndpointCase } from './endpoints';

type Expect = Record<Actor, number>;
const designers = (ok: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  viewer: 403,
  reviewer: 403,
  surveyor: 403,
  designer: ok,
  owner: ok,
});
// The working copy: the whole team but not the client (viewer).
const teamWorkers = (ok: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  viewer: 403,
  reviewer: ok,
  surveyor: ok,
  designer: ok,
  owner: ok,
});
/** Yield readings are field work: surveyors log them too. */
const fieldLoggers = (ok: number): Expect => ({ ...designers(ok), surveyor: ok });

const P = 'projects/[projectId]';

/** The lift, storage, yield, demand and seasonal-task endpoints, with the status each caller must get. */
export const LIFT_ENDPOINTS: EndpointCase[] = [
  { file: `${P}/lift/route.ts`, method: 'GET', params: (f) => ({ projectId: f.projectId }), expect: teamWorkers(200) },
  {
    file: `${P}/ram-sites/route.ts`,
    method: 'GET',
    params: (f) => ({ projectId: f.projectId }),
    expect: teamWorkers(200),
  },
  {
    file: `${P}/ram-sites/route.ts`,
    method: 'POST',
    params: (f) => ({ projectId: f.projectId }),
    body: ramSiteBody,
    expect: designers(201),
  },
  {
    file: `${P}/ram-sites/[siteId]/route.ts`,
    method: 'PUT',
    body: () => ({ ...ramSiteBody(), liftM: 12 }),
    expect: designers(200),
    params: async (f) => ({
      projectId: f.projectId,
      siteId: (await createRamSiteFixture(f.projectId, f.users.owner.id)).id,
    }),
  },
  {
    file: `${P}/ram-sites/[siteId]/route.ts`,
    method: 'DELETE',
    expect: designers(204),
    params: async (f) => ({
      projectId: f.projectId,
      siteId: (await createRamSiteFixture(f.projectId, f.users.owner.id)).id,
    }),
  },
  {
    file: `${P}/ram-sites/[siteId]/commissioning/route.ts`,
    method: 'POST',
    body: commissioningBody,
    expect: designers(201),
    params: async (f) => ({
      projectId: f.projectId,
      siteId: (await createRamSiteFixture(f.projectId, f.users.owner.id)).id,
    }),
  },
  {
    file: `${P}/ram-sites/[siteId]/commissioning/[readingId]/route.ts`,
    method: 'DELETE',
    expect: designers(204),
    params: async (f) => {
      const { site, reading } = await createCommissioningFixture(f.projectId, f.users.owner.id);
      return { projectId: f.projectId, siteId: site.id, readingId: reading.id };
    },
  },
  {
    file: `${P}/sources/route.ts`,
    method: 'GET',
    params: (f) => ({ projectId: f.projectId }),
    expect: teamWorkers(200),
  },
  {
    file: `${P}/sources/route.ts`,
    method: 'POST',
    params: (f) => ({ projectId: f.projectId }),
    body: sourceBody,
    expect: designers(201),
  },
  {
    file: `${P}/sources/[sourceId]/route.ts`,
    method: 'PUT',
    body: () => ({ ...sourceBody(), name: 'Renamed creek' }),
    expect: designers(200),
    params: async (f) => ({
      projectId: f.projectId,
      sourceId: (await createSourceFixture(f.projectId, f.users.owner.id)).id,
    }),
  },
  {
    file: `${P}/sources/[sourceId]/route.ts`,
    method: 'DELETE',
    expect: designers(204),
    params: async (f) => ({
      projectId: f.projectId,
      sourceId: (await createSourceFixture(f.projectId, f.users.owner.id)).id,
    }),
  },
  {
    file: `${P}/sources/[sourceId]/yield-readings/route.ts`,
    method: 'POST',
    body: yieldReadingBody,
    expect: fieldLoggers(201),
    params: async (f) => ({
      projectId: f.projectId,
      sourceId: (await createSourceFixture(f.projectId, f.users.owner.id)).id,
    }),
  },
  {
    file: `${P}/sources/[sourceId]/yield-readings/[readingId]/route.ts`,
    method: 'DELETE',
    expect: fieldLoggers(204),
    params: async (f) => {
      const { source, reading } = await createYieldReadingFixture(f.projectId, f.users.owner.id);
      return { projectId: f.projectId, sourceId: source.id, readingId: reading.id };
    },
  },
  { file: `${P}/tanks/route.ts`, method: 'GET', params: (f) => ({ projectId: f.projectId }), expect: teamWorkers(200) },
  {
    file: `${P}/tanks/route.ts`,
    method: 'POST',
    params: (f) => ({ projectId: f.projectId }),
    body: tankBody,
    expect: designers(201),
  },
  {
    file: `${P}/tanks/[tankId]/route.ts`,
    method: 'PUT',
    body: () => ({ ...tankBody(), volumeM3: 6 }),
    expect: designers(200),
    params: async (f) => ({
      projectId: f.projectId,
      tankId: (await createTankFixture(f.projectId, f.users.owner.id)).id,
    }),
  },
  {
    file: `${P}/tanks/[tankId]/route.ts`,
    method: 'DELETE',
    expect: designers(204),
    params: async (f) => ({
      projectId: f.projectId,
      tankId: (await createTankFixture(f.projectId, f.users.owner.id)).id,
    }),
  },
  {
    file: `${P}/demand-uses/route.ts`,
    method: 'GET',
    params: (f) => ({ projectId: f.projectId }),
    expect: teamWorkers(200),
  },
  {
    file: `${P}/demand-uses/route.ts`,
    method: 'POST',
    params: (f) => ({ projectId: f.projectId }),
    body: demandUseBody,
    expect: designers(201),
  },
  {
    file: `${P}/demand-uses/[useId]/route.ts`,
    method: 'PUT',
    body: () => ({ ...demandUseBody(), count: 5 }),
    expect: designers(200),
    params: async (f) => ({ projectId: f.projectId, useId: (await createDemandUseFixture(f.projectId)).id }),
  },
  {
    file: `${P}/demand-uses/[useId]/route.ts`,
    method: 'DELETE',
    expect: designers(204),
    params: async (f) => ({ projectId: f.projectId, useId: (await createDemandUseFixture(f.projectId)).id }),
  },
  {
    file: `${P}/seasonal-tasks/route.ts`,
    method: 'GET',
    params: (f) => ({ projectId: f.projectId }),
    expect: teamWorkers(200),
  },
  {
    file: `${P}/seasonal-tasks/route.ts`,
    method: 'POST',
    params: (f) => ({ projectId: f.projectId }),
    body: seasonalTaskBody,
    expect: designers(201),
  },
  {
    file: `${P}/seasonal-tasks/generate/route.ts`,
    method: 'POST',
    params: (f) => ({ projectId: f.projectId }),
    expect: designers(201),
    body: () => ({ year: 2027, hemisphere: 'north', firstFrost: '10-15', lastFrost: '04-20' }),
  },
  {
    file: `${P}/seasonal-tasks/[taskId]/route.ts`,
    method: 'PATCH',
    body: () => ({ done: true }),
    expect: designers(200),
    params: async (f) => ({ projectId: f.projectId, taskId: (await createSeasonalTaskFixture(f.projectId)).id }),
  },
  {
    file: `${P}/seasonal-tasks/[taskId]/route.ts`,
    method: 'DELETE',
    expect: designers(204),
    params: async (f) => ({ projectId: f.projectId, taskId: (await createSeasonalTaskFixture(f.projectId)).id }),
  },
];
