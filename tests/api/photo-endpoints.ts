import type { Actor } from '../support/api';
import { createPhotoFixture, photoUpload, PLAIN_PNG } from '../support/photo-fixtures';
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
/** The team's working copy: everyone but the client (viewer), as for survey routes. */
const teamWorkers = (ok: number): Expect => ({ ...anyMember(ok), viewer: 403 });
const surveyEditors = (ok: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  viewer: 403,
  reviewer: 403,
  surveyor: ok,
  designer: ok,
  owner: ok,
});

/** Site photos: the team's workers see them; those who edit the survey upload, place and remove them. */
export const PHOTO_ENDPOINTS: EndpointCase[] = [
  {
    file: 'projects/[projectId]/photos/route.ts',
    method: 'GET',
    params: (f) => ({ projectId: f.projectId }),
    expect: teamWorkers(200),
  },
  {
    file: 'projects/[projectId]/photos/route.ts',
    method: 'POST',
    params: (f) => ({ projectId: f.projectId }),
    upload: () => photoUpload(PLAIN_PNG, 'sketch.png', { caption: 'Gate' }, 'image/png'),
    expect: surveyEditors(201),
  },
  {
    file: 'photos/[photoId]/route.ts',
    method: 'PATCH',
    params: async (f) => ({ photoId: await createPhotoFixture(f.projectId, f.users.surveyor.id) }),
    body: () => ({ caption: 'Crossing', inReport: true }),
    expect: surveyEditors(200),
  },
  {
    file: 'photos/[photoId]/route.ts',
    method: 'DELETE',
    params: async (f) => ({ photoId: await createPhotoFixture(f.projectId, f.users.surveyor.id) }),
    expect: surveyEditors(204),
  },
  {
    file: 'photos/[photoId]/image/route.ts',
    method: 'GET',
    params: async (f) => ({ photoId: await createPhotoFixture(f.projectId, f.users.surveyor.id) }),
    expect: teamWorkers(200),
  },
];
