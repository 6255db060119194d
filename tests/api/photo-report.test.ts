import { PDFParse } from 'pdf-parse';
import { beforeAll, describe, expect, it } from 'vitest';
import { GET as lineReport } from '@/app/api/lines/[lineId]/report/route';
import { PATCH as updatePhoto } from '@/app/api/photos/[photoId]/route';
import { findAll, layer, parseSvg } from '../lib/chart/svg-tree';
import { analyseSavedLine } from '@/lib/data/line-analysis';
import { getLine } from '@/lib/data/lines';
import { reportPhotosForLine, uploadPhoto } from '@/lib/data/photos';
import { svgToString } from '@/lib/chart/svg-node';
import { reportProfileScene } from '@/lib/report/line-report';
import { call, createTeamFixture } from '../support/api';
import { jpegWithPosition } from '../support/photo-fixtures';

// The fixture route runs due north from 54.5000° N along 2.6° W, a station every 0.0009° (≈ 100 m).
// A photo at 54.5000° + 1.5 × 0.0009° lies half-way between stations 1 and 2: chainage 150 m by
// proportion along the straight leg (the route's chainages are the fixture's own round numbers).
const STATION_DEG = 0.0009;

describe('site photos in the line report', () => {
  let f: Awaited<ReturnType<typeof createTeamFixture>>;
  let lineId: string;
  let chosenId: string;
  let otherId: string;
  beforeAll(async () => {
    f = await createTeamFixture();
    lineId = f.lineId; // the fixture's line (tests/support/line-fixture.ts)
    const chosen = await uploadPhoto({
      projectId: f.projectId,
      userId: f.users.surveyor.id,
      fileName: 'IMG_0412.jpg',
      bytes: await jpegWithPosition(54.5 + 1.5 * STATION_DEG, -2.6),
      caption: 'Washout pit at the dip',
    });
    const other = await uploadPhoto({
      projectId: f.projectId,
      userId: f.users.surveyor.id,
      fileName: 'IMG_0413.jpg',
      bytes: await jpegWithPosition(54.5 + 3.2 * STATION_DEG, -2.6),
      caption: 'Gate left open',
    });
    chosenId = chosen.id;
    otherId = other.id;
    const res = await call(updatePhoto, {
      method: 'PATCH',
      path: '/x',
      params: { photoId: chosenId },
      body: { inReport: true },
      userId: f.users.designer.id,
    });
    expect(res.status).toBe(200);
  });

  it('the PDF prints the chosen photo, its thumbnail and its chainage, and nothing of the photo not chosen', async () => {
    const res = await call(lineReport, { method: 'GET', path: '/x', params: { lineId }, userId: f.users.designer.id });
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('application/pdf');
    const parser = new PDFParse({ data: new Uint8Array(res.bytes) });
    const text = (await parser.getText()).text.replace(/\s+/g, ' ');
    await parser.destroy();
    expect(text).toContain('Site photos (1)');
    expect(text).toContain('Photo 1 · 150.0 m');
    expect(text).toContain('Washout pit at the dip');
    expect(text).toContain('Taken 2026-04-12 09:30');
    expect(text).not.toContain('Gate left open');
    expect(text).not.toContain('Photo 2');
    // One picture embedded: the chosen photo's thumbnail (the profile is vector drawing).
    expect(res.bytes.toString('latin1').match(/\/Subtype \/Image/g)).toHaveLength(1);
  });

  it('marks only the chosen photo on the report profile, at its chainage', async () => {
    const { line, analysis } = await analyseSavedLine(lineId);
    const c = analysis.points.chainageM;
    const photos = await reportPhotosForLine(line.routeId, { fromM: c[0], toM: c[c.length - 1] });
    expect(photos.map((p) => [p.id, p.number])).toEqual([[chosenId, 1]]);
    expect(photos[0].chainageM).toBeCloseTo(150, 0);
    expect(photos[0].thumbnail?.[0]).toBe(0xff);
    const svg = parseSvg(svgToString(reportProfileScene(analysis, (await getLine(lineId))!, 'metric', photos).root));
    const marks = findAll(layer(svg, 'photos'), (e) => e.attrs['data-photo-id'] !== undefined);
    expect(marks.map((m) => m.attrs['data-photo-id'])).toEqual([chosenId]);
    const g = findAll(svg, (e) => e.attrs['data-panel'] === 'elevation')[0];
    const [left, right] = g.attrs['data-x-range'].split(' ').map(Number);
    expect(Number(marks[0].attrs['data-x'])).toBeCloseTo(left + (photos[0].chainageM / 400) * (right - left), 1);
    expect(otherId).not.toBe(chosenId);
  });

  it('a photo taken off the chosen again leaves the report', async () => {
    await call(updatePhoto, {
      method: 'PATCH',
      path: '/x',
      params: { photoId: chosenId },
      body: { inReport: false },
      userId: f.users.designer.id,
    });
    const res = await call(lineReport, { method: 'GET', path: '/x', params: { lineId }, userId: f.users.designer.id });
    const parser = new PDFParse({ data: new Uint8Array(res.bytes) });
    const text = (await parser.getText()).text;
    await parser.destroy();
    expect(text).not.toContain('Site photos');
    expect(res.bytes.toString('latin1').match(/\/Subtype \/Image/g)).toBeNull();
  });
});
