import type { Actor } from '../support/api';
import { createTeamFixture } from '../support/api';
import { referenceLine } from './analysis-fixtures';
import { LIFT_ENDPOINTS } from './lift-endpoints';

type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;
type Expect = Record<Actor, number>;

export interface EndpointCase {
  /** Route file under app/api, e.g. `teams/[teamId]/route.ts`. */
  file: string;
  method: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  /** May create the nested resource the path names (a ram site, a reading...) before the call. */
  params: (f: Fixture) => Record<string, string> | Promise<Record<string, string>>;
  body?: (f: Fixture, n: number) => unknown;
  expect: Expect;
}

const anyMember = (ok: number): Expect => ({ anonymous: 401, outsider: 404, viewer: ok, reviewer: ok, surveyor: ok, designer: ok, owner: ok });
const onlyOwner = (ok: number): Expect => ({ anonymous: 401, outsider: 404, viewer: 403, reviewer: 403, surveyor: 403, designer: 403, owner: ok });
const designers = (ok: number): Expect => ({ anonymous: 401, outsider: 404, viewer: 403, reviewer: 403, surveyor: 403, designer: ok, owner: ok });
const signedIn = (ok: number): Expect => ({ anonymous: 401, outsider: ok, viewer: ok, reviewer: ok, surveyor: ok, designer: ok, owner: ok });
const everyone = (ok: number): Expect => ({ anonymous: ok, outsider: ok, viewer: ok, reviewer: ok, surveyor: ok, designer: ok, owner: ok });

/** Every endpoint of the API with the status each kind of caller must get for a valid request. */
export const ENDPOINTS: EndpointCase[] = [
  { file: 'accounts/route.ts', method: 'POST', params: () => ({}), body: (_f, n) => ({ name: 'New Person', email: `new-${Date.now()}-${n}@fixture.test`, password: 'a long enough passphrase' }), expect: everyone(201) },
  { file: 'accounts/sign-out-everywhere/route.ts', method: 'POST', params: () => ({}), expect: signedIn(200) },
  { file: 'teams/route.ts', method: 'GET', params: () => ({}), expect: signedIn(200) },
  { file: 'teams/route.ts', method: 'POST', params: () => ({}), body: () => ({ name: 'Another team' }), expect: signedIn(201) },
  { file: 'teams/[teamId]/route.ts', method: 'GET', params: (f) => ({ teamId: f.teamId }), expect: anyMember(200) },
  { file: 'teams/[teamId]/route.ts', method: 'PATCH', params: (f) => ({ teamId: f.teamId }), body: () => ({ name: 'Renamed team' }), expect: onlyOwner(200) },
  { file: 'teams/[teamId]/members/route.ts', method: 'GET', params: (f) => ({ teamId: f.teamId }), expect: anyMember(200) },
  { file: 'teams/[teamId]/members/route.ts', method: 'POST', params: (f) => ({ teamId: f.teamId }), body: (f) => ({ email: f.users.outsider.email, role: 'viewer' }), expect: onlyOwner(201) },
  { file: 'teams/[teamId]/members/[userId]/route.ts', method: 'PATCH', params: (f) => ({ teamId: f.teamId, userId: f.users.extra.id }), body: () => ({ role: 'reviewer' }), expect: onlyOwner(200) },
  { file: 'teams/[teamId]/members/[userId]/route.ts', method: 'DELETE', params: (f) => ({ teamId: f.teamId, userId: f.users.extra.id }), expect: onlyOwner(204) },
  { file: 'teams/[teamId]/projects/route.ts', method: 'GET', params: (f) => ({ teamId: f.teamId }), expect: anyMember(200) },
  { file: 'teams/[teamId]/projects/route.ts', method: 'POST', params: (f) => ({ teamId: f.teamId }), body: () => ({ name: 'Matrix project' }), expect: designers(201) },
  { file: 'projects/[projectId]/route.ts', method: 'GET', params: (f) => ({ projectId: f.projectId }), expect: anyMember(200) },
  { file: 'projects/[projectId]/route.ts', method: 'PATCH', params: (f) => ({ projectId: f.projectId }), body: () => ({ siteNotes: 'Checked the spring box.' }), expect: designers(200) },
  { file: 'analysis/line/route.ts', method: 'POST', params: () => ({}), body: () => referenceLine(), expect: signedIn(200) },
  { file: 'projects/[projectId]/route.ts', method: 'DELETE', params: (f) => ({ projectId: f.projectId }), expect: onlyOwner(204) },
  { file: 'projects/[projectId]/lines/route.ts', method: 'GET', params: (f) => ({ projectId: f.projectId }), expect: anyMember(200) },
  { file: 'projects/[projectId]/lines/route.ts', method: 'POST', params: (f) => ({ projectId: f.projectId }), body: (f) => ({ name: 'Matrix line', routeId: f.routeId }), expect: designers(201) },
  { file: 'lines/[lineId]/route.ts', method: 'GET', params: (f) => ({ lineId: f.lineId }), expect: anyMember(200) },
  { file: 'lines/[lineId]/route.ts', method: 'PATCH', params: (f) => ({ lineId: f.lineId }), body: () => ({ notes: 'Trench walked.' }), expect: designers(200) },
  { file: 'lines/[lineId]/route.ts', method: 'DELETE', params: (f) => ({ lineId: f.lineId }), expect: designers(204) },
  { file: 'lines/[lineId]/stations/route.ts', method: 'GET', params: (f) => ({ lineId: f.lineId }), expect: anyMember(200) },
  { file: 'lines/[lineId]/analysis/route.ts', method: 'POST', params: (f) => ({ lineId: f.lineId }), expect: anyMember(200) },
  { file: 'lines/[lineId]/report/route.ts', method: 'GET', params: (f) => ({ lineId: f.lineId }), expect: anyMember(200) },
  ...LIFT_ENDPOINTS,
];

/** Library endpoints not built from lib/api/route.ts; exercised end to end by the Playwright sign-in tests. */
export const EXEMPT: Record<string, string> = {
  'auth/[...nextauth]/route.ts GET': 'next-auth session endpoints',
  'auth/[...nextauth]/route.ts POST': 'next-auth sign-in and sign-out',
};
