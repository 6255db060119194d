import type { Actor } from '../support/api';
import {
  createRamSiteFixture,
  createSourceFixture,
  createTankFixture,
  createYieldReadingFixture,
  ramSiteBody,
  sourceBody,
  tankBody,
} from '../support/lift-fixtures';
import { createLineFixture } from '../support/line-fixture';
import {
  createNodeFixture,
  createPipeNetworkFixture,
  outletNodeBody,
  sourceNodeBody,
} from '../support/network-fixtures';
import { createPhotoFixture, photoUpload, PLAIN_PNG } from '../support/photo-fixtures';
import { createCommentFixture, createRevisionFixture } from '../support/review-fixtures';
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
const surveyEditors = (ok: number): Expect => ({ ...designers(ok), surveyor: ok });
const commenters = (ok: number): Expect => ({ ...designers(ok), reviewer: ok });

/** Records a case's params made for its body (params run first, on the same fixture object). */
const made = new WeakMap<object, Record<string, string>>();
const keep = (f: object, ids: Record<string, string>) => {
  made.set(f, ids);
  return ids;
};
const got = (f: object, key: string) => made.get(f)![key]!;

/** The fixture line fed by a ram site: 400 m falling from 240 m to a tank inlet at 200 m. */
const ramDesign = (ramSiteId: string) => ({
  start: { kind: 'ram-site', ramSiteId },
  end: { kind: 'tank-inlet', elevationM: 200 },
  flow: { kind: 'pump-delivery' },
  stretches: [{ fromM: 0, toM: 400, pipe: 'pe100-iso4427-sdr11-50mm' }],
});

const P = 'projects/[projectId]';

/**
 * Writes whose body names other records (a route, a ram site, a node, a revision, a member...),
 * beyond those the other tables already send. `bodyIds` lists where the ids sit: the live matrix
 * swaps each for team B's and for a missing one and expects the same 404, nothing written.
 */
export const REFERENCE_ENDPOINTS: EndpointCase[] = [
  {
    file: `${P}/lines/route.ts`,
    method: 'POST',
    expect: designers(201),
    bodyIds: ['routeId', 'design.start.ramSiteId'],
    params: async (f) => {
      keep(f, { ramSiteId: (await createRamSiteFixture(f.projectId, f.users.owner.id)).id });
      return { projectId: f.projectId };
    },
    body: (f) => ({ name: 'Ram delivery', routeId: f.lineRouteId, design: ramDesign(got(f, 'ramSiteId')) }),
  },
  {
    file: 'lines/[lineId]/route.ts',
    method: 'PATCH',
    expect: designers(200),
    bodyIds: ['routeId', 'design.start.ramSiteId'],
    params: async (f) => {
      keep(f, { ramSiteId: (await createRamSiteFixture(f.projectId, f.users.owner.id)).id });
      return { lineId: f.lineId };
    },
    body: (f) => ({ routeId: f.lineRouteId, design: ramDesign(got(f, 'ramSiteId')) }),
  },
  {
    file: `${P}/ram-sites/route.ts`,
    method: 'POST',
    expect: designers(201),
    bodyIds: ['sourceId', 'tankId', 'deliveryPipe.routeId'],
    params: async (f) => {
      keep(f, {
        sourceId: (await createSourceFixture(f.projectId, f.users.owner.id)).id,
        tankId: (await createTankFixture(f.projectId, f.users.owner.id)).id,
      });
      return { projectId: f.projectId };
    },
    body: (f) => {
      const body = ramSiteBody();
      return {
        ...body,
        sourceId: got(f, 'sourceId'),
        tankId: got(f, 'tankId'),
        deliveryPipe: { ...body.deliveryPipe, routeId: f.lineRouteId },
      };
    },
  },
  {
    file: `${P}/ram-sites/[siteId]/route.ts`,
    method: 'PUT',
    expect: designers(200),
    bodyIds: ['sourceId', 'tankId'],
    params: async (f) => {
      keep(f, {
        sourceId: (await createSourceFixture(f.projectId, f.users.owner.id)).id,
        tankId: (await createTankFixture(f.projectId, f.users.owner.id)).id,
      });
      return { projectId: f.projectId, siteId: (await createRamSiteFixture(f.projectId, f.users.owner.id)).id };
    },
    body: (f) => ({ ...ramSiteBody(), sourceId: got(f, 'sourceId'), tankId: got(f, 'tankId') }),
  },
  {
    file: `${P}/tanks/route.ts`,
    method: 'POST',
    expect: designers(201),
    bodyIds: ['supplySourceId'],
    params: async (f) => {
      keep(f, { sourceId: (await createSourceFixture(f.projectId, f.users.owner.id)).id });
      return { projectId: f.projectId };
    },
    body: (f) => ({ ...tankBody(), supplyKind: 'source', supplyFlowM3s: null, supplySourceId: got(f, 'sourceId') }),
  },
  {
    file: `${P}/tanks/[tankId]/route.ts`,
    method: 'PUT',
    expect: designers(200),
    bodyIds: ['supplySourceId'],
    params: async (f) => {
      keep(f, { sourceId: (await createSourceFixture(f.projectId, f.users.owner.id)).id });
      return { projectId: f.projectId, tankId: (await createTankFixture(f.projectId, f.users.owner.id)).id };
    },
    body: (f) => ({ ...tankBody(), supplyKind: 'source', supplyFlowM3s: null, supplySourceId: got(f, 'sourceId') }),
  },
  {
    file: `${P}/sources/[sourceId]/route.ts`,
    method: 'PUT',
    expect: designers(200),
    bodyIds: ['designReadingId'],
    params: async (f) => {
      const { source, reading } = await createYieldReadingFixture(f.projectId, f.users.owner.id);
      keep(f, { readingId: reading.id });
      return { projectId: f.projectId, sourceId: source.id };
    },
    body: (f) => ({ ...sourceBody(), designYieldChoice: 'reading', designReadingId: got(f, 'readingId') }),
  },
  {
    file: `${P}/network/nodes/route.ts`,
    method: 'POST',
    expect: designers(201),
    bodyIds: ['waterSourceId'],
    params: async (f) => {
      keep(f, { sourceId: (await createSourceFixture(f.projectId, f.users.owner.id)).id });
      return { projectId: f.projectId };
    },
    body: (f) => ({ ...sourceNodeBody(), waterSourceId: got(f, 'sourceId') }),
  },
  {
    file: `${P}/network/nodes/route.ts`,
    method: 'POST',
    expect: designers(201),
    bodyIds: ['tankId'],
    params: async (f) => {
      keep(f, { tankId: (await createTankFixture(f.projectId, f.users.owner.id)).id });
      return { projectId: f.projectId };
    },
    body: (f) => ({ kind: 'tank', name: 'Fixture header tank', elevationM: 120, tankId: got(f, 'tankId') }),
  },
  {
    file: `${P}/network/nodes/[nodeId]/route.ts`,
    method: 'PUT',
    expect: designers(200),
    bodyIds: ['ramSiteId'],
    params: async (f) => {
      keep(f, { ramSiteId: (await createRamSiteFixture(f.projectId, f.users.owner.id)).id });
      return { projectId: f.projectId, nodeId: (await createNodeFixture(f.projectId, outletNodeBody())).id };
    },
    body: (f) => ({ kind: 'ram-outlet', name: 'Fixture ram outlet', elevationM: 130, ramSiteId: got(f, 'ramSiteId') }),
  },
  {
    file: `${P}/network/links/route.ts`,
    method: 'POST',
    expect: designers(201),
    bodyIds: ['fromNodeId', 'toNodeId', 'lineId'],
    params: async (f) => {
      const from = await createNodeFixture(f.projectId, sourceNodeBody());
      const to = await createNodeFixture(f.projectId, outletNodeBody());
      // A line of its own: a line is one link at most.
      keep(f, { from: from.id, to: to.id, lineId: (await createLineFixture(f.projectId)).lineId });
      return { projectId: f.projectId };
    },
    body: (f) => ({
      kind: 'line',
      name: 'Fixture main',
      fromNodeId: got(f, 'from'),
      toNodeId: got(f, 'to'),
      lineId: got(f, 'lineId'),
    }),
  },
  {
    file: `${P}/photos/route.ts`,
    method: 'POST',
    expect: surveyEditors(201),
    bodyIds: ['routeId'],
    params: (f) => ({ projectId: f.projectId }),
    upload: (f) =>
      photoUpload(PLAIN_PNG, 'gate.png', { caption: 'Gate', routeId: f.routeId, chainageM: '40' }, 'image/png'),
  },
  {
    file: 'photos/[photoId]/route.ts',
    method: 'PATCH',
    expect: surveyEditors(200),
    bodyIds: ['routeId'],
    params: async (f) => ({ photoId: await createPhotoFixture(f.projectId, f.users.surveyor.id) }),
    body: (f) => ({ routeId: f.routeId, chainageM: 80 }),
  },
  {
    // Names the route alone: a photo without a position is then kept unplaced on it.
    file: 'photos/[photoId]/route.ts',
    method: 'PATCH',
    expect: surveyEditors(200),
    bodyIds: ['routeId'],
    params: async (f) => ({ photoId: await createPhotoFixture(f.projectId, f.users.surveyor.id) }),
    body: (f) => ({ routeId: f.routeId }),
  },
  {
    file: `${P}/comments/route.ts`,
    method: 'POST',
    expect: commenters(201),
    bodyIds: ['revisionId', 'anchor.lineId', 'mentions.0'],
    params: async (f) => {
      keep(f, { revisionId: (await createRevisionFixture(f, 'submitted')).id });
      return { projectId: f.projectId };
    },
    body: (f) => ({
      body: 'Class 10 in the sag?',
      revisionId: got(f, 'revisionId'),
      anchor: { kind: 'line-chainage', lineId: f.lineId, chainageM: 200 },
      mentions: [f.users.designer.id],
    }),
  },
  {
    file: `${P}/comments/route.ts`,
    method: 'POST',
    expect: commenters(201),
    bodyIds: ['parentId'],
    params: async (f) => {
      keep(f, { parentId: (await createCommentFixture(f)).id });
      return { projectId: f.projectId };
    },
    body: (f) => ({ body: 'Agreed, class 16 there.', parentId: got(f, 'parentId') }),
  },
  {
    file: `${P}/comments/route.ts`,
    method: 'POST',
    expect: commenters(201),
    bodyIds: ['anchor.partId'],
    params: async (f) => {
      keep(f, { linkId: (await createPipeNetworkFixture(f.projectId)).link.id });
      return { projectId: f.projectId };
    },
    body: (f) => ({
      body: 'Bury this pipe deeper',
      anchor: { kind: 'network', part: 'link', partId: got(f, 'linkId') },
    }),
  },
];
