import fs from 'node:fs';
import path from 'node:path';
import exifr from 'exifr';
import { beforeAll, describe, expect, it } from 'vitest';
import { GET as image } from '@/app/api/photos/[photoId]/image/route';
import { PATCH as updatePhoto } from '@/app/api/photos/[photoId]/route';
import { GET as listPhotos, POST as uploadPhoto } from '@/app/api/projects/[projectId]/photos/route';
import { importSurvey } from '@/lib/data/route-import';
import { getObject, listKeys } from '@/lib/storage';
import { models } from '@/models';
import { call, createTeamFixture } from '../support/api';
import { jpegWithPosition, photoUpload, PLAIN_PNG } from '../support/photo-fixtures';

// Hand computation with the WGS84 radii of curvature (docs/references/core.md §6.1a; a and f from
// NGA TR8350.2): along a meridian a step Δφ is M·Δφ, along a parallel a step Δλ is N·cos φ·Δλ.
const A = 6_378_137;
const F = 1 / 298.257223563;
const E2 = F * (2 - F);
const rad = (deg: number) => (deg * Math.PI) / 180;
const meridianRadius = (latDeg: number) => (A * (1 - E2)) / (1 - E2 * Math.sin(rad(latDeg)) ** 2) ** 1.5;
const primeVertical = (latDeg: number) => A / Math.sqrt(1 - E2 * Math.sin(rad(latDeg)) ** 2);

type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;

describe('site photos', () => {
  let f: Fixture;
  let walkId: string;
  beforeAll(async () => {
    f = await createTeamFixture();
    // A walked route due north along 2.9° W, from 54.000° to 54.010° N (GPS CSV, chainage measured on import).
    const csv = 'lat,lon,ele\n54.000,-2.9,300\n54.005,-2.9,296\n54.010,-2.9,290\n';
    const imported = await importSurvey({
      projectId: f.projectId,
      userId: f.users.surveyor.id,
      fileName: 'walk.csv',
      contentType: 'text/csv',
      bytes: new TextEncoder().encode(csv),
      options: {
        format: 'gps-csv',
        name: 'North walk',
        elevationUnit: 'm',
        heightSource: 'gps',
        mapping: { latitude: 0, longitude: 1, elevation: 2, time: null, name: null, accuracy: null },
      },
    });
    walkId = imported.route.id;
  });

  const upload = (bytes: Uint8Array, fileName: string, fields: Record<string, string> = {}, type = 'image/jpeg') => {
    const { body, contentType } = photoUpload(bytes, fileName, fields, type);
    return call(uploadPhoto, {
      method: 'POST',
      path: '/x',
      params: { projectId: f.projectId },
      rawBody: body,
      headers: { 'content-type': contentType },
      userId: f.users.surveyor.id,
    });
  };

  it('a JPEG with a position lands at the nearest chainage, with its distance off the line (computed by hand)', async () => {
    // 54.0025° N, 2.899° W: a quarter of the way up the walk, 0.001° of longitude east of it.
    const res = await upload(await jpegWithPosition(54.0025, -2.899), 'spring-box.jpg', { caption: 'Spring box lid' });
    expect(res.status).toBe(201);
    const photo = res.json.photo;
    const chainageByHand = meridianRadius(54.00125) * rad(0.0025); // ≈ 278.0 m
    const offsetByHand = primeVertical(54.0025) * Math.cos(rad(54.0025)) * rad(0.001); // ≈ 65.6 m
    expect(chainageByHand).toBeGreaterThan(277);
    expect(chainageByHand).toBeLessThan(279);
    expect(photo).toMatchObject({
      routeId: walkId,
      placement: 'position',
      caption: 'Spring box lid',
      takenAt: '2026-04-12T09:30:00.000Z',
    });
    expect(photo.chainageM).toBeCloseTo(chainageByHand, 1);
    expect(photo.offsetM).toBeCloseTo(offsetByHand, 1);
    expect(photo.latitude).toBeCloseTo(54.0025, 6);
    expect(photo.longitude).toBeCloseTo(-2.899, 6);
  });

  it('the image served carries no metadata, though position and time are kept in Runnel', async () => {
    const res = await upload(await jpegWithPosition(54.006, -2.9), 'crossing.jpg');
    const served = await call(image, {
      method: 'GET',
      path: `/api/photos/x/image`,
      params: { photoId: res.json.photo.id },
      userId: f.users.reviewer.id,
    });
    expect(served.status).toBe(200);
    expect(served.headers.get('content-type')).toBe('image/jpeg');
    const thumb = await call(image, {
      method: 'GET',
      path: '/api/photos/x/image?size=thumbnail',
      params: { photoId: res.json.photo.id },
      userId: f.users.reviewer.id,
    });
    expect(thumb.status).toBe(200);
    expect(thumb.headers.get('content-type')).toBe('image/jpeg');
    const stored = await models().SitePhoto.findByPk(res.json.photo.id);
    for (const key of [stored!.imageKey, stored!.thumbnailKey]) {
      const object = await getObject(key);
      expect(object!.bytes[0]).toBe(0xff);
      expect(await exifr.parse(Buffer.from(object!.bytes)).catch(() => undefined)).toBeUndefined();
      expect(Buffer.from(object!.bytes).includes(Buffer.from('Private Camera Owner'))).toBe(false);
    }
    expect(stored!.latitude).toBeCloseTo(54.006, 6);
  });

  it('a file whose bytes are not an image is refused and nothing is stored', async () => {
    const before = await listKeys(`projects/${f.projectId}/photos/`);
    const count = await models().SitePhoto.count({ where: { projectId: f.projectId } });
    const fake = new TextEncoder().encode('lat,lon\n54,-2.9\n<html>not a photo</html>');
    const res = await upload(fake, 'trough.jpg');
    expect(res.status).toBe(415);
    expect(res.json.error.fields.file[0]).toContain('not a JPEG, PNG or HEIC image');
    const heic = new Uint8Array([0, 0, 0, 24, 0x66, 0x74, 0x79, 0x70, 0x68, 0x65, 0x69, 0x63, 0, 0, 0, 0]);
    const heicRes = await upload(heic, 'IMG_0001.HEIC', {}, 'image/heic');
    expect(heicRes.status).toBe(415);
    // A HEIC header with no picture behind it: refused with the way out, nothing stored.
    expect(heicRes.json.error.message).toContain('is a HEIC photo that could not be decoded');
    expect(heicRes.json.error.message).toContain('Export it as JPEG');
    const truncated = (await jpegWithPosition(54, -2.9)).slice(0, 40);
    expect((await upload(truncated, 'cut.jpg')).status).toBe(415);
    expect(await listKeys(`projects/${f.projectId}/photos/`)).toEqual(before);
    expect(await models().SitePhoto.count({ where: { projectId: f.projectId } })).toBe(count);
  });

  it('a photo without a position goes where the person picks, and can be moved or put in the report', async () => {
    const res = await upload(PLAIN_PNG, 'sketch.png', { routeId: walkId, chainageM: '812.5' }, 'image/png');
    expect(res.status).toBe(201);
    expect(res.json.photo).toMatchObject({ placement: 'picked', chainageM: 812.5, offsetM: null, latitude: null });
    const off = await upload(PLAIN_PNG, 'sketch.png', { routeId: walkId, chainageM: '5000' }, 'image/png');
    expect(off.status).toBe(400);
    expect(Object.keys(off.json.error.fields)).toEqual(['chainageM']);
    const moved = await call(updatePhoto, {
      method: 'PATCH',
      path: '/x',
      params: { photoId: res.json.photo.id },
      body: { chainageM: 100, inReport: true },
      userId: f.users.designer.id,
    });
    expect(moved.status).toBe(200);
    expect(moved.json.photo).toMatchObject({ chainageM: 100, inReport: true, placement: 'picked' });
    // A chainage beyond any line is refused in the project's units (1,000 km = 3,280,840 ft).
    await models().Project.update({ unitSystem: 'us' }, { where: { id: f.projectId } });
    const far = await call(updatePhoto, {
      method: 'PATCH',
      path: '/x',
      params: { photoId: res.json.photo.id },
      body: { chainageM: 2e6 },
      userId: f.users.designer.id,
    });
    const farUpload = await upload(PLAIN_PNG, 'sketch.png', { routeId: walkId, chainageM: '2000000' }, 'image/png');
    await models().Project.update({ unitSystem: 'metric' }, { where: { id: f.projectId } });
    expect(far.status).toBe(400);
    expect(far.json.error.fields.chainageM).toEqual(['Chainage must be at most 3,280,840 ft']);
    expect(farUpload.json.error.fields.chainageM).toEqual(['Chainage must be at most 3,280,840 ft']);
  });

  it("an upload's chainage that is no number is refused in the project's unit: feet in a US project, metres in metric", async () => {
    const count = await models().SitePhoto.count({ where: { projectId: f.projectId } });
    await models().Project.update({ unitSystem: 'us' }, { where: { id: f.projectId } });
    const us = await upload(PLAIN_PNG, 'sketch.png', { routeId: walkId, chainageM: '12+50' }, 'image/png');
    await models().Project.update({ unitSystem: 'metric' }, { where: { id: f.projectId } });
    const metric = await upload(PLAIN_PNG, 'sketch.png', { routeId: walkId, chainageM: '12+50' }, 'image/png');
    expect(us.status).toBe(400);
    expect(us.json.error.fields.chainageM).toEqual(['Chainage must be a number (ft)']);
    expect(us.json.error.message).toBe('Some photo details are not valid: Chainage must be a number (ft)');
    expect(metric.json.error.fields.chainageM).toEqual(['Chainage must be a number (m)']);
    expect(await models().SitePhoto.count({ where: { projectId: f.projectId } })).toBe(count);
  });

  it('a HEIC photo (made by libheif’s encoder) is decoded, served as a metadata-free JPEG and lands at its chainage', async () => {
    // tests/fixtures/photos/README.md: 54.0075° N, 2.9015° W, taken 2026-04-12 10:15, Exif in the file's idat box.
    const heic = new Uint8Array(
      fs.readFileSync(path.join(process.cwd(), 'tests/fixtures/photos/walk-54.0075N-2.9015W.heic')),
    );
    const res = await upload(heic, 'IMG_2207.HEIC', { caption: 'Creek crossing' }, 'image/heic');
    expect(res.status).toBe(201);
    const chainageByHand = meridianRadius(54.00375) * rad(0.0075); // ≈ 834.1 m
    const offsetByHand = primeVertical(54.0075) * Math.cos(rad(54.0075)) * rad(0.0015); // ≈ 98.4 m
    expect(chainageByHand).toBeGreaterThan(833);
    expect(chainageByHand).toBeLessThan(835);
    expect(res.json.photo).toMatchObject({
      routeId: walkId,
      placement: 'position',
      width: 64,
      height: 48,
      takenAt: '2026-04-12T10:15:00.000Z',
    });
    expect(res.json.photo.chainageM).toBeCloseTo(chainageByHand, 1);
    expect(res.json.photo.offsetM).toBeCloseTo(offsetByHand, 1);
    const stored = await models().SitePhoto.findByPk(res.json.photo.id);
    expect(stored!.contentType).toBe('image/jpeg');
    const object = await getObject(stored!.imageKey);
    expect([...object!.bytes.subarray(0, 3)]).toEqual([0xff, 0xd8, 0xff]);
    expect(Buffer.from(object!.bytes).includes(Buffer.from('Private Camera Owner'))).toBe(false);
    expect(await exifr.parse(Buffer.from(object!.bytes)).catch(() => undefined)).toBeUndefined();
  });

  it("lists a route's photos by ?routeId=, and refuses a route id that is not one (400, not every photo)", async () => {
    await upload(await jpegWithPosition(54.005, -2.9), 'trough.jpg');
    const list = (query: string) =>
      call(listPhotos, {
        method: 'GET',
        path: `/x${query}`,
        params: { projectId: f.projectId },
        userId: f.users.surveyor.id,
      });
    const all = await list('');
    expect(all.status).toBe(200);
    expect(all.json.photos.length).toBeGreaterThan(0);
    const onWalk = await list(`?routeId=${walkId}`);
    expect(onWalk.json.photos.length).toBe(
      all.json.photos.filter((p: { routeId: string }) => p.routeId === walkId).length,
    );
    const none = await list('?routeId=00000000-0000-4000-8000-000000000000');
    expect(none.json.photos).toEqual([]);
    const bad = await list('?routeId=not-a-route');
    expect(bad.status).toBe(400);
    expect(bad.json.error.fields.routeId).toBeDefined();
    const unknown = await list('?colour=red');
    expect(unknown.status).toBe(400);
  });
});
