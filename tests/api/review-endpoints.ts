import type { Actor } from '../support/api';
import { createCommentFixture, createRevisionFixture } from '../support/review-fixtures';
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
const designers = (ok: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  viewer: 403,
  reviewer: 403,
  surveyor: 403,
  designer: ok,
  owner: ok,
});
const commenters = (ok: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  viewer: 403,
  reviewer: ok,
  surveyor: 403,
  designer: ok,
  owner: ok,
});
const teamWorkers = (ok: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  viewer: 403,
  reviewer: ok,
  surveyor: ok,
  designer: ok,
  owner: ok,
});
const deciders = (ok: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  viewer: 403,
  reviewer: ok,
  surveyor: 403,
  designer: 403,
  owner: ok,
});
// A draft is the team's: a client asking for one is told it does not exist.
const teamNotClient = (ok: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  viewer: 404,
  reviewer: ok,
  surveyor: ok,
  designer: ok,
  owner: ok,
});

const R = 'revisions/[revisionId]';
const revision =
  (status: Parameters<typeof createRevisionFixture>[1]) => async (f: Parameters<typeof createRevisionFixture>[0]) => ({
    revisionId: (await createRevisionFixture(f, status)).id,
  });

/**
 * Revisions and their review steps. The fixture revision is made by the designer, so the designer may never approve it.
 */
export const REVIEW_ENDPOINTS: EndpointCase[] = [
  {
    file: 'projects/[projectId]/revisions/route.ts',
    method: 'GET',
    params: (f) => ({ projectId: f.projectId }),
    expect: anyMember(200),
  },
  {
    file: 'projects/[projectId]/revisions/route.ts',
    method: 'POST',
    params: (f) => ({ projectId: f.projectId }),
    body: () => ({ note: 'For review' }),
    expect: designers(201),
  },
  { file: `${R}/route.ts`, method: 'GET', params: revision('submitted'), expect: teamNotClient(200) },
  { file: `${R}/route.ts`, method: 'GET', params: revision('approved'), expect: anyMember(200) },
  { file: `${R}/submit/route.ts`, method: 'POST', params: revision('draft'), expect: designers(200) },
  { file: `${R}/approve/route.ts`, method: 'POST', params: revision('submitted'), expect: { ...deciders(200) } },
  {
    file: `${R}/request-changes/route.ts`,
    method: 'POST',
    params: revision('submitted'),
    body: () => ({ note: 'Move the washout' }),
    expect: deciders(200),
  },
  { file: `${R}/issue/route.ts`, method: 'POST', params: revision('approved'), expect: designers(200) },
  {
    file: `${R}/lines/[lineId]/report/route.ts`,
    method: 'GET',
    expect: anyMember(200),
    params: async (f) => ({ ...(await revision('issued')(f)), lineId: f.lineId }),
  },
  {
    file: `${R}/compare/[otherId]/route.ts`,
    method: 'GET',
    expect: anyMember(200),
    params: async (f) => ({
      ...(await revision('approved')(f)),
      otherId: (await createRevisionFixture(f, 'issued')).id,
    }),
  },

  {
    file: 'projects/[projectId]/comments/route.ts',
    method: 'GET',
    params: (f) => ({ projectId: f.projectId }),
    expect: anyMember(200),
  },
  {
    file: 'projects/[projectId]/comments/route.ts',
    method: 'POST',
    params: (f) => ({ projectId: f.projectId }),
    expect: commenters(201),
    bodyIds: ['anchor.lineId'],
    body: (f) => ({
      body: 'Washout needed at the sag?',
      anchor: { kind: 'line-chainage', lineId: f.lineId, chainageM: 120 },
    }),
  },
  {
    // Surveyors comment on their routes.
    file: 'projects/[projectId]/comments/route.ts',
    method: 'POST',
    params: (f) => ({ projectId: f.projectId }),
    expect: teamWorkers(201),
    bodyIds: ['anchor.routeId'],
    body: (f) => ({ body: 'Peg 12 re-walked', anchor: { kind: 'route-chainage', routeId: f.routeId, chainageM: 40 } }),
  },
  {
    file: 'comments/[commentId]/route.ts',
    method: 'PATCH',
    body: () => ({ resolved: true }),
    expect: commenters(200),
    params: async (f) => ({ commentId: (await createCommentFixture(f)).id }),
  },
  {
    file: 'projects/[projectId]/activity/route.ts',
    method: 'GET',
    params: (f) => ({ projectId: f.projectId }),
    expect: teamWorkers(200),
  },
];
