import type { Actor } from '../support/api';
import { createTeamFixture } from '../support/api';
import { referenceLine } from './analysis-fixtures';
import { ACCOUNT_MAIL_ENDPOINTS } from './account-mail-endpoints';
import { LIFT_ENDPOINTS } from './lift-endpoints';
import { REVIEW_ENDPOINTS } from './review-endpoints';
import { NETWORK_ENDPOINTS } from './network-endpoints';
import { PHOTO_ENDPOINTS } from './photo-endpoints';
import { REFERENCE_ENDPOINTS } from './reference-endpoints';
import { surveyUpload } from '../support/multipart';

type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;
type Expect = Record<Actor, number>;

export interface EndpointCase {
  /** Route file under app/api, e.g. `teams/[teamId]/route.ts`. */
  file: string;
  method: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  /** May create the nested resource the path names (a ram site, a reading...) before the call. */
  params: (f: Fixture) => Record<string, string> | Promise<Record<string, string>>;
  body?: (f: Fixture, n: number) => unknown;
  /** A non-JSON body (a file upload) with its content type, instead of `body`. */
  upload?: (f: Fixture) => { body: Uint8Array; contentType: string };
  /**
   * Where the body names other records: dot paths into the JSON body (`anchor.lineId`,
   * `mentions.0`) or field names of an upload. The live matrix swaps each for team B's and for a
   * missing id (the same 404, nothing written) and fails on any id in a body not listed here.
   */
  bodyIds?: string[];
  expect: Expect;
}

const anyMember = (ok: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  viewer: ok,
  reviewer: ok,
  surveyor: ok,
  designer: ok,
  owner: ok,
});
// The working copy, drafts and raw survey files: the whole team but not the client (viewer).
const teamWorkers = (ok: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  viewer: 403,
  reviewer: ok,
  surveyor: ok,
  designer: ok,
  owner: ok,
});
const onlyOwner = (ok: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  viewer: 403,
  reviewer: 403,
  surveyor: 403,
  designer: 403,
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
const signedIn = (ok: number): Expect => ({
  anonymous: 401,
  outsider: ok,
  viewer: ok,
  reviewer: ok,
  surveyor: ok,
  designer: ok,
  owner: ok,
});
const surveyEditors = (ok: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  viewer: 403,
  reviewer: 403,
  surveyor: ok,
  designer: ok,
  owner: ok,
});
const everyone = (ok: number): Expect => ({
  anonymous: ok,
  outsider: ok,
  viewer: ok,
  reviewer: ok,
  surveyor: ok,
  designer: ok,
  owner: ok,
});

/** Every endpoint of the API with the status each kind of caller must get for a valid request. */
export const ENDPOINTS: EndpointCase[] = [
  {
    file: 'accounts/route.ts',
    method: 'POST',
    params: () => ({}),
    body: (_f, n) => ({
      name: 'New Person',
      email: `new-${Date.now()}-${n}@fixture.test`,
      password: 'a long enough passphrase',
    }),
    expect: everyone(202),
  },
  ...ACCOUNT_MAIL_ENDPOINTS,
  { file: 'accounts/sign-out-everywhere/route.ts', method: 'POST', params: () => ({}), expect: signedIn(200) },
  { file: 'health/route.ts', method: 'GET', params: () => ({}), expect: everyone(200) },
  { file: 'ready/route.ts', method: 'GET', params: () => ({}), expect: everyone(200) },
  { file: 'teams/route.ts', method: 'GET', params: () => ({}), expect: signedIn(200) },
  {
    file: 'teams/route.ts',
    method: 'POST',
    params: () => ({}),
    body: () => ({ name: 'Another team' }),
    expect: signedIn(201),
  },
  { file: 'teams/[teamId]/route.ts', method: 'GET', params: (f) => ({ teamId: f.teamId }), expect: anyMember(200) },
  {
    file: 'teams/[teamId]/route.ts',
    method: 'PATCH',
    params: (f) => ({ teamId: f.teamId }),
    body: () => ({ name: 'Renamed team' }),
    expect: onlyOwner(200),
  },
  {
    file: 'teams/[teamId]/members/route.ts',
    method: 'GET',
    params: (f) => ({ teamId: f.teamId }),
    expect: anyMember(200),
  },
  {
    file: 'teams/[teamId]/members/[userId]/route.ts',
    method: 'PATCH',
    params: (f) => ({ teamId: f.teamId, userId: f.users.extra.id }),
    body: () => ({ role: 'reviewer' }),
    expect: onlyOwner(200),
  },
  {
    file: 'teams/[teamId]/members/[userId]/route.ts',
    method: 'DELETE',
    params: (f) => ({ teamId: f.teamId, userId: f.users.extra.id }),
    expect: onlyOwner(204),
  },
  {
    file: 'teams/[teamId]/projects/route.ts',
    method: 'GET',
    params: (f) => ({ teamId: f.teamId }),
    expect: anyMember(200),
  },
  {
    file: 'teams/[teamId]/projects/route.ts',
    method: 'POST',
    params: (f) => ({ teamId: f.teamId }),
    body: () => ({ name: 'Matrix project' }),
    expect: designers(201),
  },
  {
    file: 'projects/[projectId]/route.ts',
    method: 'GET',
    params: (f) => ({ projectId: f.projectId }),
    expect: anyMember(200),
  },
  {
    file: 'projects/[projectId]/route.ts',
    method: 'PATCH',
    params: (f) => ({ projectId: f.projectId }),
    body: () => ({ siteNotes: 'Checked the spring box.' }),
    expect: designers(200),
  },
  {
    file: 'analysis/line/route.ts',
    method: 'POST',
    params: () => ({}),
    body: () => referenceLine(),
    expect: signedIn(200),
  },
  {
    file: 'projects/[projectId]/route.ts',
    method: 'DELETE',
    params: (f) => ({ projectId: f.projectId }),
    expect: onlyOwner(204),
  },
  {
    file: 'projects/[projectId]/lines/route.ts',
    method: 'GET',
    params: (f) => ({ projectId: f.projectId }),
    expect: teamWorkers(200),
  },
  {
    file: 'projects/[projectId]/lines/route.ts',
    method: 'POST',
    params: (f) => ({ projectId: f.projectId }),
    body: (f) => ({ name: 'Matrix line', routeId: f.lineRouteId }),
    bodyIds: ['routeId'],
    expect: designers(201),
  },
  { file: 'lines/[lineId]/route.ts', method: 'GET', params: (f) => ({ lineId: f.lineId }), expect: teamWorkers(200) },
  {
    file: 'lines/[lineId]/route.ts',
    method: 'PATCH',
    params: (f) => ({ lineId: f.lineId }),
    body: () => ({ notes: 'Trench walked.' }),
    expect: designers(200),
  },
  { file: 'lines/[lineId]/route.ts', method: 'DELETE', params: (f) => ({ lineId: f.lineId }), expect: designers(204) },
  {
    file: 'lines/[lineId]/duplicate/route.ts',
    method: 'POST',
    params: (f) => ({ lineId: f.lineId }),
    body: () => ({}),
    expect: designers(201),
  },
  {
    file: 'lines/[lineId]/stations/route.ts',
    method: 'GET',
    params: (f) => ({ lineId: f.lineId }),
    expect: teamWorkers(200),
  },
  {
    file: 'lines/[lineId]/site-context/route.ts',
    method: 'GET',
    params: (f) => ({ lineId: f.lineId }),
    expect: teamWorkers(200),
  },
  {
    file: 'lines/[lineId]/analysis/route.ts',
    method: 'POST',
    params: (f) => ({ lineId: f.lineId }),
    expect: teamWorkers(200),
  },
  {
    file: 'lines/[lineId]/report/route.ts',
    method: 'GET',
    params: (f) => ({ lineId: f.lineId }),
    expect: teamWorkers(200),
  },
  ...LIFT_ENDPOINTS,
  ...PHOTO_ENDPOINTS,
  {
    file: 'lines/[lineId]/network-flows/route.ts',
    method: 'GET',
    params: (f) => ({ lineId: f.lineId }),
    expect: teamWorkers(200),
  },
  ...REVIEW_ENDPOINTS,
  ...NETWORK_ENDPOINTS,
  ...REFERENCE_ENDPOINTS,
  // Survey routes: every member reads; surveyors, designers and owners import and edit.
  {
    file: 'projects/[projectId]/routes/route.ts',
    method: 'GET',
    params: (f) => ({ projectId: f.projectId }),
    expect: teamWorkers(200),
  },
  {
    file: 'projects/[projectId]/routes/route.ts',
    method: 'POST',
    params: (f) => ({ projectId: f.projectId }),
    body: () => ({ name: 'Sketch of the lower field' }),
    expect: surveyEditors(201),
  },
  {
    file: 'projects/[projectId]/routes/import/route.ts',
    method: 'POST',
    params: (f) => ({ projectId: f.projectId }),
    upload: () =>
      surveyUpload('walk.csv', 'lat,lon,ele\n54.1,-2.9,300\n54.1005,-2.9004,298\n54.101,-2.9008,296\n', {
        format: 'gps-csv',
        name: 'Matrix walk',
        elevationUnit: 'm',
        mapping: { latitude: 0, longitude: 1, elevation: 2, time: null, name: null, accuracy: null },
      }),
    expect: surveyEditors(201),
  },
  {
    file: 'routes/[routeId]/route.ts',
    method: 'GET',
    params: (f) => ({ routeId: f.routeId }),
    expect: teamWorkers(200),
  },
  {
    file: 'routes/[routeId]/route.ts',
    method: 'PATCH',
    params: (f) => ({ routeId: f.routeId }),
    body: () => ({ notes: 'Walked again after the thaw.' }),
    expect: surveyEditors(200),
  },
  {
    file: 'routes/[routeId]/route.ts',
    method: 'DELETE',
    params: (f) => ({ routeId: f.routeId }),
    expect: surveyEditors(204),
  },
  // The route page's reads: its view (thinned profile), pages of rows, clean-up proposed on request.
  {
    file: 'routes/[routeId]/view/route.ts',
    method: 'GET',
    params: (f) => ({ routeId: f.routeId }),
    expect: teamWorkers(200),
  },
  {
    file: 'routes/[routeId]/points/route.ts',
    method: 'GET',
    params: (f) => ({ routeId: f.routeId }),
    expect: teamWorkers(200),
  },
  {
    file: 'routes/[routeId]/proposals/route.ts',
    method: 'GET',
    params: (f) => ({ routeId: f.routeId }),
    expect: teamWorkers(200),
  },
  {
    file: 'routes/[routeId]/points/route.ts',
    method: 'PUT',
    params: (f) => ({ routeId: f.routeId }),
    body: () => ({
      points: [0, 50, 100].map((c, i) => ({
        sourceSeq: null,
        latitude: null,
        longitude: null,
        chainageM: c,
        elevationM: 400 - i,
        label: null,
        heightSource: 'typed',
        confidenceM: null,
        excluded: false,
      })),
    }),
    expect: surveyEditors(200),
  },
  {
    file: 'routes/[routeId]/cleanup/route.ts',
    method: 'POST',
    params: (f) => ({ routeId: f.routeId }),
    body: () => ({ reject: [{ kind: 'grade-spike', index: 2, field: 'elevationM', from: 431, to: 407.15 }] }),
    expect: surveyEditors(200),
  },
  {
    file: 'routes/[routeId]/reverse/route.ts',
    method: 'POST',
    params: (f) => ({ routeId: f.routeId }),
    expect: surveyEditors(200),
  },
  {
    file: 'routes/[routeId]/split/route.ts',
    method: 'POST',
    params: (f) => ({ routeId: f.routeId }),
    body: () => ({ chainageM: 100 }),
    expect: surveyEditors(201),
  },
  {
    file: 'routes/[routeId]/trim/route.ts',
    method: 'POST',
    params: (f) => ({ routeId: f.routeId }),
    body: () => ({ fromChainageM: 40, toChainageM: 160 }),
    expect: surveyEditors(200),
  },
  {
    file: 'routes/[routeId]/join/route.ts',
    method: 'POST',
    params: (f) => ({ routeId: f.routeId }),
    body: (f) => ({ otherRouteId: f.otherRouteId }),
    bodyIds: ['otherRouteId'],
    expect: surveyEditors(201),
  },
  {
    file: 'routes/[routeId]/source/route.ts',
    method: 'GET',
    params: (f) => ({ routeId: f.routeId }),
    expect: teamWorkers(200),
  },
];

/** Library endpoints not built from lib/api/route.ts; exercised end to end by the Playwright sign-in tests. */
export const EXEMPT: Record<string, string> = {
  'auth/[...nextauth]/route.ts GET': 'next-auth session endpoints',
  'auth/[...nextauth]/route.ts POST': 'next-auth sign-in and sign-out',
};
