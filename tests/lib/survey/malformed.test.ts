import { describe, expect, it } from 'vitest';
import { sniffSurveyFile, MAX_SURVEY_FILE_BYTES } from '../../../lib/survey/sniff';
import { parseGpsCsv } from '../../../lib/survey/gps-csv';
import { parseStationCsv } from '../../../lib/survey/station-csv';
import { parseGpx } from '../../../lib/survey/gpx';
import { parseInclinometerCsv } from '../../../lib/survey/inclinometer-csv';
import { parseLevelBookCsv } from '../../../lib/survey/level-book-csv';
import { expectImportError, type ExpectedError } from './expect-import-error';
import { readFileSync } from 'node:fs';
import path from 'node:path';

const fixture = (name: string) => readFileSync(path.join(__dirname, '../../fixtures/survey', name), 'utf8');
const bytes = (s: string) => new TextEncoder().encode(s);
const gps = (body: string) => () => parseGpsCsv(body);
const station = (body: string) => () => parseStationCsv(body);
const incl = (body: string) => () => parseInclinometerCsv(body, { startElevationM: 100 });
const level = (body: string) => () => parseLevelBookCsv(body, { startElevationM: 40 });
const gpx = (body: string) => () => parseGpx(body);
const GPX_HEAD =
  '<?xml version="1.0"?>\n<gpx version="1.1" creator="Runnel demo" xmlns="http://www.topografix.com/GPX/1/1">\n';
const LEVEL_HEAD = 'station,chainage,BS,IS,FS\n';

// Each case: a bad input, and the code plus the place (line/column/field) the error must name.
const CASES: [string, () => unknown, ExpectedError][] = [
  [
    'empty file',
    () => sniffSurveyFile(new Uint8Array(0), { fileName: 'walk.csv' }),
    { code: 'empty-file', message: /“walk\.csv” is empty/ },
  ],
  ['whitespace-only file', () => sniffSurveyFile(bytes(' \n\r\n\t\n')), { code: 'empty-file' }],
  [
    '60 MB file (size checked before anything else)',
    () => sniffSurveyFile(new Uint8Array(60 * 1024 * 1024).fill(0x41)),
    { code: 'file-too-large', message: /60\.0 MB; the limit is 50\.0 MB/ },
  ],
  [
    'PNG renamed .csv',
    () =>
      sniffSurveyFile(new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0]), {
        fileName: 'track.csv',
      }),
    { code: 'binary-content', message: /“track\.csv” is a PNG image/ },
  ],
  [
    'ZIP posing as CSV',
    () => sniffSurveyFile(new Uint8Array([0x50, 0x4b, 0x03, 0x04, 1, 2, 3])),
    { code: 'binary-content', message: /ZIP archive/ },
  ],
  [
    'PDF posing as CSV',
    () => sniffSurveyFile(bytes('%PDF-1.7\n...')),
    { code: 'binary-content', message: /PDF document/ },
  ],
  [
    'NUL bytes inside text',
    () => sniffSurveyFile(bytes('lat,lon\n45\u00001,11\n')),
    { code: 'binary-content', message: /NUL byte at byte 11/ },
  ],
  ['header only', gps('lat,lon,ele\n'), { code: 'no-data-rows', line: 2 }],
  ['header only with blank lines', gps('lat,lon,ele\n\n\n'), { code: 'no-data-rows' }],
  ['one column only (no delimiter)', gps('lat\n45.5\n45.6\n'), { code: 'no-delimiter', line: 1 }],
  [
    'wrong delimiter chosen by the user',
    () => parseGpsCsv('lat;lon;ele\n45,5;11,8;800\n45,6;11,9;790\n', { dialect: { delimiter: ',' } }),
    { code: 'wrong-delimiter', line: 1, message: /semicolon-separated/ },
  ],
  [
    'missing latitude column',
    gps('lon,ele,time\n11.8,800,2024-05-04T07:10:00Z\n11.9,790,2024-05-04T07:11:00Z\n'),
    { code: 'missing-column', field: 'latitude' },
  ],
  ['missing elevation column', gps('lat,lon\n45.5,11.8\n45.6,11.9\n'), { code: 'missing-column', field: 'elevation' }],
  [
    'text in a number',
    gps('lat,lon,ele\n45.5,11.8,800\nabc,11.9,790\n'),
    { code: 'not-a-number', line: 3, column: 'lat', field: 'latitude' },
  ],
  [
    'latitude 91',
    gps('lat,lon,ele\n45.5,11.8,800\n91,11.9,790\n'),
    { code: 'latitude-out-of-range', line: 3, column: 'lat' },
  ],
  [
    'longitude 181',
    gps('lat,lon,ele\n45.5,181,800\n45.6,11.9,790\n'),
    { code: 'longitude-out-of-range', line: 2, column: 'lon' },
  ],
  [
    'NaN elevation',
    gps('lat,lon,ele\n45.5,11.8,800\n45.6,11.9,NaN\n'),
    { code: 'not-a-number', line: 3, column: 'ele', field: 'elevation' },
  ],
  ['Infinity elevation', gps('lat,lon,ele\n45.5,11.8,Infinity\n45.6,11.9,1\n'), { code: 'not-a-number', line: 2 }],
  [
    'empty elevation cell',
    gps('lat,lon,ele\n45.5,11.8,800\n45.6,11.9,\n'),
    { code: 'missing-value', line: 3, column: 'ele' },
  ],
  [
    'thousands separator in a number',
    gps('lat;lon;ele\n45,5;11,8;1.234,5\n45,6;11,9;790\n'),
    { code: 'not-a-number', line: 2, column: 'ele' },
  ],
  [
    'unreadable time',
    gps('lat,lon,ele,time\n45.5,11.8,800,yesterday noon\n45.6,11.9,790,\n'),
    { code: 'bad-time', line: 2, column: 'time' },
  ],
  [
    'line number counts blank lines',
    gps('lat,lon,ele\n45.5,11.8,800\n\n\n45.6,x,790\n'),
    { code: 'not-a-number', line: 5, column: 'lon' },
  ],
  [
    '1 point only',
    gps('lat,lon,ele\n45.5,11.8,800\n'),
    { code: 'too-few-points', message: /at least two points; the file has 1/ },
  ],
  [
    'duplicate points only (one place logged twice)',
    gps('lat,lon,ele\n45.5,11.8,800\n45.5,11.8,800\n'),
    { code: 'too-few-points', line: 3, message: /2 points are all copies of one point/ },
  ],
  [
    'station CSV: negative chainage',
    station('chainage,elevation\n-5,100\n10,99\n'),
    { code: 'negative-chainage', line: 2, column: 'chainage' },
  ],
  [
    'station CSV: non-increasing chainage',
    station('chainage,elevation\n0,100\n20,99\n15,98\n'),
    { code: 'chainage-not-increasing', line: 4, message: /not greater than 20 m on line 3/ },
  ],
  [
    'station CSV: same chainage, two heights',
    station('chainage,elevation\n0,100\n20,99\n20,97\n'),
    { code: 'chainage-not-increasing', line: 4 },
  ],
  [
    'station CSV: missing elevation column',
    station('chainage,note\n0,a\n10,b\n'),
    { code: 'missing-column', field: 'elevation' },
  ],
  ['GPX with no track', () => parseGpx(fixture('no-track.gpx')), { code: 'gpx-no-track' }],
  [
    'GPX with only waypoints',
    () => parseGpx(fixture('waypoints-only.gpx')),
    { code: 'gpx-only-waypoints', message: /3 waypoints but no track or route/ },
  ],
  [
    'broken XML',
    () => parseGpx(fixture('broken.gpx')),
    { code: 'broken-xml', line: 6, message: /Expected closing tag 'trkpt'/ },
  ],
  ['XML that is not GPX', gpx('<?xml version="1.0"?>\n<kml><Document/></kml>\n'), { code: 'not-gpx' }],
  [
    'GPX track point without <ele>',
    gpx(
      `${GPX_HEAD}<trk><trkseg>\n<trkpt lat="45.5" lon="11.8"><ele>800</ele></trkpt>\n<trkpt lat="45.6" lon="11.9"></trkpt>\n</trkseg></trk></gpx>`,
    ),
    { code: 'missing-value', line: 5, column: 'trkpt', field: 'ele' },
  ],
  [
    'GPX latitude 91',
    gpx(
      `${GPX_HEAD}<trk><trkseg>\n<trkpt lat="91" lon="11.8"><ele>800</ele></trkpt>\n<trkpt lat="45.6" lon="11.9"><ele>1</ele></trkpt>\n</trkseg></trk></gpx>`,
    ),
    { code: 'latitude-out-of-range', line: 4, field: 'lat' },
  ],
  [
    'GPX with one track point',
    gpx(`${GPX_HEAD}<trk><trkseg><trkpt lat="45.5" lon="11.8"><ele>800</ele></trkpt></trkseg></trk></gpx>`),
    { code: 'too-few-points' },
  ],
  [
    'vertical angle of 95 degrees',
    incl('to,slope_distance,vertical_angle\nA,30,-4\nB,30,95\n'),
    { code: 'angle-out-of-range', line: 3, column: 'vertical_angle' },
  ],
  [
    'inclinometer: negative tape distance',
    incl('to,slope_distance,vertical_angle\nA,-30,-4\nB,30,5\n'),
    { code: 'bad-reading', line: 2, column: 'slope_distance' },
  ],
  [
    'inclinometer: no angle column',
    incl('to,slope_distance\nA,30\nB,30\n'),
    { code: 'missing-column', field: 'verticalAngle' },
  ],
  [
    'level book with missing foresight at a change point',
    level(`${LEVEL_HEAD}BM1,0,1.5,,\nCP1,20,1.2,,\nX,40,,,1.1\n`),
    { code: 'level-book-missing-foresight', line: 3, column: 'FS' },
  ],
  [
    'level book that does not close on a foresight',
    level(`${LEVEL_HEAD}BM1,0,1.5,,\nA,20,,1.3,\n`),
    { code: 'level-book-missing-foresight', line: 3 },
  ],
  [
    'level book starting without a backsight',
    level(`${LEVEL_HEAD}BM1,0,,,1.5\nA,20,,,1.3\n`),
    { code: 'level-book-order', line: 2, column: 'BS' },
  ],
  [
    'level book with text for a reading',
    level(`${LEVEL_HEAD}BM1,0,1.5,,\nA,20,,one,\nB,30,,,1.1\n`),
    { code: 'not-a-number', line: 3, column: 'IS' },
  ],
  [
    'level book without a chainage column',
    () => parseLevelBookCsv('station,BS,IS,FS\nA,1,,\nB,,,1\n', { startElevationM: 10 }),
    { code: 'missing-column', field: 'chainage' },
  ],
  ['unterminated quote', gps('lat,lon,ele\n45.5,11.8,800\n"45.6,11.9,790\n'), { code: 'bad-reading', line: 3 }],
];

describe('malformed survey files: each gives a clear error with a code and where', () => {
  it('has at least 30 cases', () => {
    expect(CASES.length).toBeGreaterThanOrEqual(30);
  });
  it.each(CASES)('%s', (_name, run, expected) => {
    expectImportError(run, expected);
  });
  it('the limit is 50 MiB', () => {
    expect(MAX_SURVEY_FILE_BYTES).toBe(52_428_800);
  });
  it('the message names the line and column in plain words', () => {
    const e = expectImportError(gps('lat,lon,ele\n45.5,11.8,800\nabc,11.9,790\n'), { code: 'not-a-number' });
    expect(e.message).toBe('line 3, column “lat”: “abc” is not a number (expected the latitude)');
    expect(e.toJSON()).toEqual({ code: 'not-a-number', message: e.message, line: 3, column: 'lat', field: 'latitude' });
  });
});
