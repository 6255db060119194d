import { models } from '../../models';
import type { Actor } from '../support/api';
import { createDemandUseFixture } from '../support/lift-fixtures';
import {
  createNodeFixture,
  createPipeNetworkFixture,
  createSizedJobFixture,
  outletNodeBody,
  pipeLinkBody,
  sourceNodeBody,
} from '../support/network-fixtures';
import type { EndpointCase } from './endpoints';

type Expect = Record<Actor, number>;
const anyMember = (ok: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  viewer: ok,
  reviewer: ok,
  surveyor: ok,
  designer: ok,
  owner: ok,
});
// The working copy's network is not the client's to see (a viewer sees approved revisions).
const teamWorkers = (ok: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  viewer: 403,
  reviewer: ok,
  surveyor: ok,
  designer: ok,
  owner: ok,
});
const designers = (ok: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  viewer: 403,
  reviewer: 403,
  surveyor: 403,
  designer: ok,
  owner: ok,
});

const P = 'projects/[projectId]/network';
/** Nodes made by a case's params for its body (params run first). */
const madeFor = new WeakMap<object, { from: string; to: string }>();

/** The network endpoints and the team price list, with the status each caller must get. */
export const NETWORK_ENDPOINTS: EndpointCase[] = [
  { file: `${P}/route.ts`, method: 'GET', params: (f) => ({ projectId: f.projectId }), expect: teamWorkers(200) },
  {
    file: `${P}/nodes/route.ts`,
    method: 'POST',
    params: (f) => ({ projectId: f.projectId }),
    body: sourceNodeBody,
    expect: designers(201),
  },
  {
    file: `${P}/nodes/[nodeId]/route.ts`,
    method: 'PUT',
    body: () => ({ ...outletNodeBody(), name: 'Renamed tap' }),
    expect: designers(200),
    params: async (f) => ({
      projectId: f.projectId,
      nodeId: (await createNodeFixture(f.projectId, outletNodeBody())).id,
    }),
  },
  {
    file: `${P}/nodes/[nodeId]/route.ts`,
    method: 'DELETE',
    expect: designers(204),
    params: async (f) => ({
      projectId: f.projectId,
      nodeId: (await createNodeFixture(f.projectId, outletNodeBody())).id,
    }),
  },
  {
    file: `${P}/links/route.ts`,
    method: 'POST',
    expect: designers(201),
    bodyIds: ['fromNodeId', 'toNodeId'],
    params: async (f) => {
      const from = await createNodeFixture(f.projectId, sourceNodeBody());
      const to = await createNodeFixture(f.projectId, outletNodeBody());
      madeFor.set(f, { from: from.id, to: to.id });
      return { projectId: f.projectId };
    },
    body: (f) => pipeLinkBody(madeFor.get(f)!.from, madeFor.get(f)!.to),
  },
  {
    file: `${P}/links/[linkId]/route.ts`,
    method: 'PUT',
    expect: designers(200),
    bodyIds: ['fromNodeId', 'toNodeId'],
    params: async (f) => {
      const made = await createPipeNetworkFixture(f.projectId);
      madeFor.set(f, { from: made.source.id, to: made.outlet.id });
      return { projectId: f.projectId, linkId: made.link.id };
    },
    body: (f) => ({ ...pipeLinkBody(madeFor.get(f)!.from, madeFor.get(f)!.to), name: 'Renamed pipe' }),
  },
  {
    file: `${P}/links/[linkId]/route.ts`,
    method: 'DELETE',
    expect: designers(204),
    params: async (f) => ({ projectId: f.projectId, linkId: (await createPipeNetworkFixture(f.projectId)).link.id }),
  },
  {
    file: `${P}/take-offs/route.ts`,
    method: 'POST',
    expect: designers(201),
    bodyIds: ['lineId'],
    params: (f) => ({ projectId: f.projectId }),
    body: (f) => ({ lineId: f.lineId, chainageM: 10, name: 'Garden tee' }),
  },
  {
    file: 'projects/[projectId]/demand-uses/[useId]/outlet/route.ts',
    method: 'PUT',
    expect: designers(200),
    bodyIds: ['outletNodeId'],
    params: async (f) => {
      const outlet = await createNodeFixture(f.projectId, outletNodeBody());
      madeFor.set(f, { from: outlet.id, to: outlet.id });
      return { projectId: f.projectId, useId: (await createDemandUseFixture(f.projectId)).id };
    },
    body: (f) => ({ outletNodeId: madeFor.get(f)!.from }),
  },
  {
    file: `${P}/runs/route.ts`,
    method: 'POST',
    expect: teamWorkers(202),
    body: () => ({ kind: 'solve' }),
    params: async (f) => {
      await createPipeNetworkFixture(f.projectId);
      return { projectId: f.projectId };
    },
  },
  {
    file: `${P}/runs/[jobId]/route.ts`,
    method: 'GET',
    expect: teamWorkers(200),
    params: async (f) => ({
      projectId: f.projectId,
      jobId: (await models().NetworkJob.create({ projectId: f.projectId, kind: 'solve' })).id,
    }),
  },
  {
    file: `${P}/runs/[jobId]/apply/route.ts`,
    method: 'POST',
    expect: designers(200),
    params: async (f) => ({ projectId: f.projectId, jobId: (await createSizedJobFixture(f.projectId)).id }),
  },
  {
    file: `${P}/report/route.ts`,
    method: 'GET',
    params: (f) => ({ projectId: f.projectId }),
    expect: teamWorkers(200),
  },
  {
    file: `${P}/tank-storage/route.ts`,
    method: 'GET',
    params: (f) => ({ projectId: f.projectId }),
    expect: teamWorkers(200),
  },
  {
    file: 'teams/[teamId]/price-list/route.ts',
    method: 'GET',
    params: (f) => ({ teamId: f.teamId }),
    expect: anyMember(200),
  },
  {
    file: 'teams/[teamId]/price-list/route.ts',
    method: 'PUT',
    params: (f) => ({ teamId: f.teamId }),
    expect: designers(200),
    body: () => ({ items: [{ pipeId: 'pe100-iso4427-sdr11-32mm', costPerM: 2.4 }] }),
  },
];
