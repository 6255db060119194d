import { beforeAll, describe, expect, it } from 'vitest';
import * as importRoute from '@/app/api/projects/[projectId]/routes/import/route';
import { importSurvey } from '@/lib/data/route-import';
import { listKeys } from '@/lib/storage';
import { call, createTeamFixture } from '../support/api';
import { multipartBody } from '../support/multipart';
import { GPS_OPTIONS, fixtureText, importFile, surveyTableCounts } from '../support/route-calls';

type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;
let f: Fixture;

beforeAll(async () => {
  f = await createTeamFixture();
});

const GPX_HEAD =
  '<?xml version="1.0"?>\n<gpx version="1.1" creator="Runnel test" xmlns="http://www.topografix.com/GPX/1/1">\n';
const GPX = { format: 'gpx', name: 'GPX walk' };
/** lat, lon, ele and no time column. */
const GPS3 = { ...GPS_OPTIONS, mapping: { ...GPS_OPTIONS.mapping, time: null } };
const STATION = {
  format: 'station-csv',
  name: 'Stations',
  chainageUnit: 'm',
  elevationUnit: 'm',
  mapping: { chainage: 0, elevation: 1, name: null },
};
const LEVEL = { format: 'level-book-csv', name: 'Level run', startElevationM: 40 };
const INCL = { format: 'inclinometer-csv', name: 'Clino walk', startElevationM: 100 };
const bytes = (s: string) => new TextEncoder().encode(s);
const PNG = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52]);

interface Case {
  name: string;
  file: string;
  content: string | Uint8Array;
  options: Record<string, unknown>;
  status: number;
  /** What the message must say: the place (line and column) or the file. */
  message: RegExp;
}

// Each bad file goes through the real upload handler; every answer must say what and where.
const CASES: Case[] = [
  {
    name: 'empty file',
    file: 'empty.csv',
    content: '',
    options: GPS_OPTIONS,
    status: 400,
    message: /the file “empty\.csv” is empty/,
  },
  {
    name: 'whitespace only',
    file: 'blank.csv',
    content: ' \n\r\n\t\n',
    options: GPS_OPTIONS,
    status: 400,
    message: /the file “blank\.csv” holds no text/,
  },
  {
    name: 'PNG renamed .csv',
    file: 'track.csv',
    content: PNG,
    options: GPS_OPTIONS,
    status: 415,
    message: /the file “track\.csv” is a PNG image, not a survey text file/,
  },
  {
    name: 'ZIP posing as CSV',
    file: 'track.csv',
    content: new Uint8Array([0x50, 0x4b, 0x03, 0x04, 1, 2, 3, 4]),
    options: GPS_OPTIONS,
    status: 415,
    message: /“track\.csv” is a ZIP archive/,
  },
  {
    name: 'PDF posing as GPX',
    file: 'walk.gpx',
    content: bytes('%PDF-1.7\n%...'),
    options: GPX,
    status: 415,
    message: /“walk\.gpx” is a PDF document/,
  },
  {
    name: 'NUL bytes inside text',
    file: 'nul.csv',
    content: bytes('lat,lon\n45\u00001,11\n'),
    options: GPS_OPTIONS,
    status: 415,
    message: /“nul\.csv” contains binary data \(a NUL byte at byte 11\)/,
  },
  {
    name: 'header only',
    file: 'head.csv',
    content: 'lat,lon,ele\n',
    options: GPS3,
    status: 400,
    message: /^“head\.csv”, line 2: the file has a header row but no data rows/,
  },
  {
    name: 'one column only',
    file: 'one.csv',
    content: 'lat\n45.5\n45.6\n',
    options: GPS_OPTIONS,
    status: 400,
    message: /^“one\.csv”, line 1: every row is a single column/,
  },
  {
    name: 'wrong delimiter chosen',
    file: 'semi.csv',
    content: 'lat;lon;ele\n45,5;11,8;800\n45,6;11,9;790\n',
    options: { ...GPS_OPTIONS, dialect: { delimiter: ',' } },
    status: 400,
    message: /^“semi\.csv”, line 1: splitting on commas gives only one column; the file looks semicolon-separated/,
  },
  {
    name: 'missing latitude column',
    file: 'nolat.csv',
    content: 'lon,ele\n11.8,800\n11.9,790\n',
    options: {
      ...GPS_OPTIONS,
      mapping: { ...GPS_OPTIONS.mapping, latitude: null, longitude: 0, elevation: 1, time: null },
    },
    status: 400,
    message: /^“nolat\.csv”, line 1: no latitude column found among “lon”, “ele”/,
  },
  {
    name: 'mapped column beyond the file',
    file: 'short.csv',
    content: 'lat,lon,ele\n45.5,11.8,800\n45.6,11.9,790\n',
    options: GPS_OPTIONS,
    status: 400,
    message:
      /^“short\.csv”, line 1: the time column is set to column 4, but the file has 3 columns \(“lat”, “lon”, “ele”\)/,
  },
  {
    name: 'text in a number',
    file: 'text.csv',
    content: 'lat,lon,ele\n45.5,11.8,800\nabc,11.9,790\n',
    options: GPS3,
    status: 400,
    message: /^“text\.csv”, line 3, column “lat”: “abc” is not a number \(expected the latitude\)/,
  },
  {
    name: 'latitude 91',
    file: 'lat.csv',
    content: 'lat,lon,ele\n45.5,11.8,800\n91,11.9,790\n',
    options: GPS3,
    status: 400,
    message: /line 3, column “lat”: latitude 91 is outside −90 to 90 degrees/,
  },
  {
    name: 'longitude 181',
    file: 'lon.csv',
    content: 'lat,lon,ele\n45.5,181,800\n45.6,11.9,790\n',
    options: GPS3,
    status: 400,
    message: /line 2, column “lon”: longitude 181 is outside −180 to 180 degrees/,
  },
  {
    name: 'NaN elevation',
    file: 'nan.csv',
    content: 'lat,lon,ele\n45.5,11.8,800\n45.6,11.9,NaN\n',
    options: GPS3,
    status: 400,
    message: /line 3, column “ele”: “NaN” is not a number/,
  },
  {
    name: 'Infinity elevation',
    file: 'inf.csv',
    content: 'lat,lon,ele\n45.5,11.8,Infinity\n45.6,11.9,1\n',
    options: GPS3,
    status: 400,
    message: /line 2, column “ele”: “Infinity” is not a number/,
  },
  {
    name: 'empty elevation cell',
    file: 'gap.csv',
    content: 'lat,lon,ele\n45.5,11.8,800\n45.6,11.9,\n',
    options: GPS3,
    status: 400,
    message: /line 3, column “ele”: no elevation given/,
  },
  {
    name: 'thousands separator',
    file: 'thou.csv',
    content: 'lat;lon;ele\n45,5;11,8;1.234,5\n45,6;11,9;790\n',
    options: GPS3,
    status: 400,
    message: /line 2, column “ele”: “1\.234,5” is not a number/,
  },
  {
    name: 'unreadable time',
    file: 'time.csv',
    content: 'lat,lon,ele,time\n45.5,11.8,800,yesterday noon\n45.6,11.9,790,\n',
    options: GPS_OPTIONS,
    status: 400,
    message: /line 2, column “time”: “yesterday noon” is not a date and time/,
  },
  {
    name: 'mixed line endings, error on the third line',
    file: 'mixed.csv',
    content: 'lat,lon,ele\r\n45.5,11.8,800\n45.6,11.9,abc\r\n',
    options: GPS3,
    status: 400,
    message: /line 3, column “ele”: “abc” is not a number/,
  },
  {
    name: 'one point only',
    file: 'single.csv',
    content: 'lat,lon,ele\n45.5,11.8,800\n',
    options: GPS3,
    status: 400,
    message: /^“single\.csv”, a route needs at least two points; the file has 1/,
  },
  {
    name: 'duplicate points only',
    file: 'dupes.csv',
    content: 'lat,lon,ele\n45.5,11.8,800\n45.5,11.8,800\n',
    options: GPS3,
    status: 400,
    message: /line 3: the file's 2 points are all copies of one point/,
  },
  {
    name: 'unterminated quote',
    file: 'quote.csv',
    content: 'lat,lon,ele\n45.5,11.8,800\n"45.6,11.9,790\n',
    options: GPS3,
    status: 400,
    message: /line 3: the row could not be read as CSV/,
  },
  {
    name: 'station CSV: negative chainage',
    file: 'st.csv',
    content: 'chainage,elevation\n-5,100\n10,99\n',
    options: STATION,
    status: 400,
    message: /line 2, column “chainage”: chainage -5 m is negative/,
  },
  {
    name: 'station CSV: chainage going back',
    file: 'st.csv',
    content: 'chainage,elevation\n0,100\n20,99\n15,98\n',
    options: STATION,
    status: 400,
    message: /line 4, column “chainage”: chainage 15 m is not greater than 20 m on line 3/,
  },
  {
    name: 'station CSV: no elevation column mapped',
    file: 'st.csv',
    content: 'chainage,note\n0,a\n10,b\n',
    options: { ...STATION, mapping: { chainage: 0, elevation: null, name: 1 } },
    status: 400,
    message: /“st\.csv”, no elevation column found among “chainage”, “note”/,
  },
  {
    name: 'GPX with no track',
    file: 'no-track.gpx',
    content: fixtureText('no-track.gpx'),
    options: GPX,
    status: 400,
    message: /“no-track\.gpx”, the GPX file has no track/,
  },
  {
    name: 'GPX with only waypoints',
    file: 'wpts.gpx',
    content: fixtureText('waypoints-only.gpx'),
    options: GPX,
    status: 400,
    message: /“wpts\.gpx”, the GPX file has 3 waypoints but no track or route/,
  },
  {
    name: 'broken XML',
    file: 'broken.gpx',
    content: fixtureText('broken.gpx'),
    options: GPX,
    status: 400,
    message: /“broken\.gpx”, line 6, column “character \d+”: the GPX file is not well-formed XML/,
  },
  {
    name: 'XML that is not GPX',
    file: 'map.gpx',
    content: '<?xml version="1.0"?>\n<kml><Document/></kml>\n',
    options: GPX,
    status: 400,
    message: /“map\.gpx”, the file was chosen as GPX but has no <gpx> root element/,
  },
  {
    name: 'GPX chosen for a CSV',
    file: 'walk.csv',
    content: 'lat,lon,ele\n45.5,11.8,800\n45.6,11.9,790\n',
    options: GPX,
    status: 400,
    message: /“walk\.csv”, the file was chosen as GPX/,
  },
  {
    name: 'CSV chosen for a GPX',
    file: 'walk.gpx',
    content: fixtureText('walked-route.gpx'),
    options: GPS_OPTIONS,
    status: 400,
    message: /“walk\.gpx”, the file is GPX \(XML\), not CSV/,
  },
  {
    name: 'GPX point without <ele>',
    file: 'noele.gpx',
    content: `${GPX_HEAD}<trk><trkseg>\n<trkpt lat="45.5" lon="11.8"><ele>800</ele></trkpt>\n<trkpt lat="45.6" lon="11.9"></trkpt>\n</trkseg></trk></gpx>`,
    options: GPX,
    status: 400,
    message: /line 5, column “trkpt”: no ele given/,
  },
  {
    name: 'GPX latitude 91',
    file: 'lat.gpx',
    content: `${GPX_HEAD}<trk><trkseg>\n<trkpt lat="91" lon="11.8"><ele>800</ele></trkpt>\n<trkpt lat="45.6" lon="11.9"><ele>1</ele></trkpt>\n</trkseg></trk></gpx>`,
    options: GPX,
    status: 400,
    message: /line 4, column “trkpt”: lat="91" is outside −90 to 90 degrees/,
  },
  {
    name: 'GPX with one track point',
    file: 'one.gpx',
    content: `${GPX_HEAD}<trk><trkseg><trkpt lat="45.5" lon="11.8"><ele>800</ele></trkpt></trkseg></trk></gpx>`,
    options: GPX,
    status: 400,
    message: /“one\.gpx”, a route needs at least two points; the file has 1/,
  },
  {
    name: 'inclinometer: vertical angle of 95°',
    file: 'clino.csv',
    content: 'to,slope_distance,vertical_angle\nA,30,-4\nB,30,95\n',
    options: INCL,
    status: 400,
    message: /line 3, column “vertical_angle”/,
  },
  {
    name: 'level book: missing foresight at a change point',
    file: 'lb.csv',
    content: 'station,chainage,BS,IS,FS\nBM1,0,1.5,,\nCP1,20,1.2,,\nX,40,,,1.1\n',
    options: LEVEL,
    status: 400,
    message: /line 3, column “FS”: missing foresight/,
  },
  {
    name: 'level book: text for a reading',
    file: 'lb.csv',
    content: 'station,chainage,BS,IS,FS\nBM1,0,1.5,,\nA,20,,one,\nB,30,,,1.1\n',
    options: LEVEL,
    status: 400,
    message: /line 3, column “IS”: “one” is not a number/,
  },
];

async function nothingStored(projectId: string, run: () => Promise<void>): Promise<void> {
  const tables = await surveyTableCounts();
  const objects = await listKeys(`projects/${projectId}/`);
  await run();
  expect(await surveyTableCounts()).toEqual(tables);
  expect(await listKeys(`projects/${projectId}/`)).toEqual(objects);
}

describe('malformed survey uploads through the import handler: a clear error, nothing stored', () => {
  it('covers at least 25 malformed files', () => {
    expect(CASES.length).toBeGreaterThanOrEqual(25);
  });

  it.each(CASES)('$name', async (c) => {
    await nothingStored(f.projectId, async () => {
      const res = await importFile(f.users.surveyor.id, f.projectId, c.file, c.content, c.options);
      expect({ status: res.status, message: res.json?.error?.message }).toMatchObject({
        status: c.status,
        message: expect.stringMatching(c.message),
      });
      expect(res.json.error.fields.file).toEqual([res.json.error.message]);
    });
  });

  it('a 60 MB file is refused from its declared size (413) before it is read', async () => {
    await nothingStored(f.projectId, async () => {
      const big = new Uint8Array(60 * 1024 * 1024).fill(0x41);
      const upload = multipartBody([
        { name: 'file', value: big, fileName: 'huge.csv', contentType: 'text/csv' },
        { name: 'options', value: JSON.stringify(GPS_OPTIONS) },
      ]);
      const declared = await call(importRoute.POST, {
        method: 'POST',
        path: 'x',
        params: { projectId: f.projectId },
        rawBody: upload.body,
        userId: f.users.surveyor.id,
        headers: { 'content-type': upload.contentType, 'content-length': String(upload.body.byteLength) },
      });
      expect(declared.status).toBe(413);
      expect(declared.json.error.message).toBe('The upload is 60.0 MB; a survey file may be at most 50.0 MB');
      // Without a declared length the stream is cut off at the limit.
      const streamed = await importFile(f.users.surveyor.id, f.projectId, 'huge.csv', big, GPS_OPTIONS);
      expect(streamed.status).toBe(413);
    });
  });

  it('refuses a body that is not a form (415), a form without a file, and bad options (400)', async () => {
    await nothingStored(f.projectId, async () => {
      const json = await call(importRoute.POST, {
        method: 'POST',
        path: 'x',
        params: { projectId: f.projectId },
        body: { csv: 'lat,lon' },
        userId: f.users.owner.id,
      });
      expect(json.status).toBe(415);
      const noFile = multipartBody([{ name: 'options', value: JSON.stringify(GPS_OPTIONS) }]);
      const res = await call(importRoute.POST, {
        method: 'POST',
        path: 'x',
        params: { projectId: f.projectId },
        rawBody: noFile.body,
        headers: { 'content-type': noFile.contentType },
        userId: f.users.owner.id,
      });
      expect(res.status).toBe(400);
      expect(res.json.error.message).toBe('No file was sent in the “file” field');
      const badOptions = await importFile(f.users.owner.id, f.projectId, 'ok.csv', 'lat,lon,ele\n1,1,1\n2,2,2\n', {
        ...GPS_OPTIONS,
        elevationUnit: 'yards',
      });
      expect(badOptions.status).toBe(400);
      expect(badOptions.json.error.fields.elevationUnit).toEqual(['Units must be "m" or "ft"']);
      const notJson = multipartBody([
        { name: 'file', value: 'lat,lon,ele\n1,1,1\n', fileName: 'a.csv' },
        { name: 'options', value: '{format:' },
      ]);
      const r2 = await call(importRoute.POST, {
        method: 'POST',
        path: 'x',
        params: { projectId: f.projectId },
        rawBody: notJson.body,
        headers: { 'content-type': notJson.contentType },
        userId: f.users.owner.id,
      });
      expect(r2.status).toBe(400);
      expect(r2.json.error.message).toBe('The import options are not valid JSON');
    });
  });

  it('a write the database refuses after the file was read leaves no route, no points and no stored file', async () => {
    // A project that does not exist: the attachment row is refused inside the transaction while the
    // original is being stored alongside it; both must be undone.
    const missingProject = '00000000-0000-4000-8000-00000000dead';
    await nothingStored(missingProject, async () => {
      const bytes = new TextEncoder().encode(fixtureText('walked-route.gpx'));
      const error = await importSurvey({
        projectId: missingProject,
        userId: f.users.owner.id,
        fileName: 'walk.gpx',
        contentType: 'application/gpx+xml',
        bytes,
        options: GPX as never,
      }).catch((e: unknown) => e);
      expect(String(error)).toMatch(/foreign key/i);
    });
  });

  it('a reviewer is refused (403) before the upload is read, and nothing is stored', async () => {
    await nothingStored(f.projectId, async () => {
      const res = await importFile(f.users.reviewer.id, f.projectId, 'walk.gpx', fixtureText('walked-route.gpx'), GPX);
      expect(res.status).toBe(403);
    });
  });
});
