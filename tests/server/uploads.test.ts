import zlib from 'node:zlib';
import { beforeAll, describe, expect, it } from 'vitest';
import { projectStoragePrefix } from '@/lib/data/project-files';
import { listKeys } from '@/lib/storage';
import { MAX_ROUTE_POINTS } from '@/lib/validations/routes';
import { multipartBody, surveyUpload, type FormPart } from '../support/multipart';
import { PLAIN_PNG } from '../support/photo-fixtures';
import { createCast, freshFixture, type Cast, type Fixture } from './cast';
import { changedTables, fingerprint, settle } from './fingerprint';
import { live, type LiveAnswer } from './live';

/**
 * Hostile files against the running app's two upload endpoints (survey import, site photos):
 * forged types, polyglots, oversize files, decompression bombs, path tricks, XML entity tricks,
 * broken multipart. Each is refused with a 4xx in the one error shape before anything is stored:
 * the database and the project's object storage are exactly as before.
 */

let cast: Cast;
let f: Fixture;

const enc = (s: string) => new TextEncoder().encode(s);
const cat = (...parts: (Uint8Array | string)[]) =>
  new Uint8Array(Buffer.concat(parts.map((p) => (typeof p === 'string' ? Buffer.from(p) : Buffer.from(p)))));

function crc32(bytes: Uint8Array): number {
  let c = ~0;
  for (const b of bytes) {
    c ^= b;
    for (let k = 0; k < 8; k++) c = (c >>> 1) ^ (0xedb88320 & -(c & 1));
  }
  return ~c >>> 0;
}

function pngChunk(type: string, data: Uint8Array): Uint8Array {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.byteLength);
  const typed = cat(type, data);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(typed));
  return cat(len, typed, crc);
}

/** A PNG that claims `w` × `h` pixels: a few hundred bytes that would decode to gigabytes. */
function pngClaiming(w: number, h: number): Uint8Array {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(w, 0);
  ihdr.writeUInt32BE(h, 4);
  ihdr.set([8, 2, 0, 0, 0], 8);
  const rows = zlib.deflateSync(Buffer.alloc(Math.min(w * 3 + 1, 1 << 20) * 4));
  return cat(
    new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    pngChunk('IHDR', ihdr),
    pngChunk('IDAT', rows),
    pngChunk('IEND', new Uint8Array()),
  );
}

const STATION_OPTIONS = {
  format: 'station-csv',
  name: 'Walk',
  mapping: { chainage: 0, elevation: 1, name: null },
  chainageUnit: 'm',
  elevationUnit: 'm',
  heightSource: 'level',
};
const GPX_OPTIONS = { format: 'gpx', name: 'Walk' };
const GPX_HEAD = '<?xml version="1.0"?>';
const gpx = (inner: string, head = GPX_HEAD) =>
  `${head}<gpx version="1.1" creator="x" xmlns="http://www.topografix.com/GPX/1/1"><trk><trkseg>${inner}</trkseg></trk></gpx>`;
const trkpts = (n: number) =>
  Array.from({ length: n }, (_, i) => `<trkpt lat="${54 + i * 1e-6}" lon="-2.9"><ele>300</ele></trkpt>`).join('');

type Upload = { name: string; body: () => { body: Uint8Array; contentType: string } };
const survey = (
  name: string,
  fileName: string,
  content: Uint8Array | string,
  options: unknown = STATION_OPTIONS,
): Upload => ({ name, body: () => surveyUpload(fileName, content, options) });
const surveyParts = (name: string, parts: FormPart[]): Upload => ({ name, body: () => multipartBody(parts) });

const MZ = cat(new Uint8Array([0x4d, 0x5a, 0x90, 0x00]), 'This program cannot be run in DOS mode');
const ZIP = cat(new Uint8Array([0x50, 0x4b, 0x03, 0x04]), new Uint8Array(60));
const PDF = enc('%PDF-1.7\n1 0 obj<<>>endobj\n%%EOF');
const ELF = cat(new Uint8Array([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1]), new Uint8Array(40));

const SURVEY_FILES: Upload[] = [
  survey('an empty file', 'walk.csv', ''),
  survey('only a header row', 'walk.csv', 'chainage,elevation\n'),
  survey('a PNG named .csv', 'walk.csv', PLAIN_PNG),
  survey('a Windows program named .csv', 'walk.csv', MZ),
  survey('an ELF program named .gpx', 'walk.gpx', ELF, GPX_OPTIONS),
  survey('a zip archive named .csv', 'walk.csv', ZIP),
  survey('a PDF named .csv', 'walk.csv', PDF),
  survey('a gzip bomb (50 MB of zeros) named .csv', 'walk.csv', zlib.gzipSync(Buffer.alloc(50 * 1024 * 1024))),
  survey('a gzip bomb named .gpx', 'walk.gpx', zlib.gzipSync(Buffer.alloc(50 * 1024 * 1024)), GPX_OPTIONS),
  survey(
    'a GIF/CSV polyglot',
    'walk.csv',
    cat('GIF89a', new Uint8Array([1, 0, 1, 0, 0x80, 0, 0]), '\nchainage,elevation\n0,1\n'),
  ),
  survey('HTML with a script named .csv', 'walk.csv', '<html><script>alert(1)</script></html>'),
  survey(
    'invalid UTF-8 throughout',
    'walk.csv',
    new Uint8Array(Array.from({ length: 2000 }, (_, i) => 0x80 + (i % 60))),
  ),
  survey('random binary', 'walk.csv', new Uint8Array(Array.from({ length: 4096 }, (_, i) => (i * 7919) % 256))),
  survey('over 50 MB', 'walk.csv', new Uint8Array(50 * 1024 * 1024 + 10).fill(0x31)),
  survey('one 10 MB line with no newline', 'walk.csv', `chainage,elevation\n${'1'.repeat(10 * 1024 * 1024)}`),
  survey('100,000 columns', 'walk.csv', `${Array.from({ length: 100_000 }, (_, i) => `c${i}`).join(',')}\n0,1\n`),
  survey('a path-traversal name and hostile content', '../../../etc/passwd', MZ),
  survey('a NUL in the name and binary content', 'walk\u0000.csv', ZIP),
  survey('a 2,000-character name and no rows', `${'a'.repeat(2000)}.csv`, 'chainage,elevation\n'),
  survey(
    'XML billion laughs',
    'walk.gpx',
    gpx(
      '<trkpt lat="54" lon="-2"><ele>&lol9;</ele></trkpt>',
      `${GPX_HEAD}<!DOCTYPE gpx [<!ENTITY lol "lol">${Array.from({ length: 9 }, (_, i) => `<!ENTITY lol${i + 1} "${`&lol${i || ''};`.repeat(10)}">`).join('')}]>`,
    ),
    GPX_OPTIONS,
  ),
  survey(
    'XML external entity (file)',
    'walk.gpx',
    gpx(
      '<trkpt lat="54" lon="-2"><name>&xxe;</name></trkpt>',
      `${GPX_HEAD}<!DOCTYPE gpx [<!ENTITY xxe SYSTEM "file:///etc/passwd">]>`,
    ),
    GPX_OPTIONS,
  ),
  survey(
    'XML external DTD (network)',
    'walk.gpx',
    gpx('<trkpt lat="54" lon="-2"/>', `${GPX_HEAD}<!DOCTYPE gpx SYSTEM "http://127.0.0.1:9/evil.dtd">`),
    GPX_OPTIONS,
  ),
  survey(
    'XML parameter entities',
    'walk.gpx',
    gpx('<trkpt lat="54" lon="-2"/>', `${GPX_HEAD}<!DOCTYPE gpx [<!ENTITY % p "<!ENTITY x 'y'>"> %p;]>`),
    GPX_OPTIONS,
  ),
  survey(
    'GPX nested 100,000 elements deep',
    'walk.gpx',
    gpx(`${'<extensions>'.repeat(100_000)}${'</extensions>'.repeat(100_000)}`),
    GPX_OPTIONS,
  ),
  survey(
    `GPX over the point cap (${MAX_ROUTE_POINTS + 1} points)`,
    'walk.gpx',
    gpx(trkpts(MAX_ROUTE_POINTS + 1)),
    GPX_OPTIONS,
  ),
  survey('unclosed GPX', 'walk.gpx', `${GPX_HEAD}<gpx><trk><trkseg><trkpt lat="54"`, GPX_OPTIONS),
  surveyParts('no file part', [{ name: 'options', value: JSON.stringify(STATION_OPTIONS) }]),
  surveyParts('two file parts', [
    { name: 'file', value: 'chainage,elevation\n0,1\n10,2\n', fileName: 'a.csv', contentType: 'text/csv' },
    { name: 'file', value: MZ, fileName: 'b.exe', contentType: 'application/octet-stream' },
    { name: 'options', value: JSON.stringify(STATION_OPTIONS) },
  ]),
  surveyParts('options that are not JSON', [
    { name: 'file', value: 'chainage,elevation\n0,1\n10,2\n', fileName: 'a.csv', contentType: 'text/csv' },
    { name: 'options', value: '{format:' },
  ]),
  {
    name: 'a multipart body cut short',
    body: () => ({
      body: surveyUpload('a.csv', 'chainage,elevation\n0,1\n', STATION_OPTIONS).body.slice(0, 120),
      contentType: surveyUpload('a.csv', '', STATION_OPTIONS).contentType,
    }),
  },
  {
    name: 'a boundary that does not match',
    body: () => ({
      body: surveyUpload('a.csv', 'chainage,elevation\n0,1\n10,2\n', STATION_OPTIONS).body,
      contentType: 'multipart/form-data; boundary=not-the-one',
    }),
  },
];

const photo = (name: string, fileName: string, bytes: Uint8Array, contentType = 'image/jpeg'): Upload => ({
  name,
  body: () =>
    multipartBody([
      { name: 'file', value: bytes, fileName, contentType },
      { name: 'caption', value: 'Gate' },
    ]),
});
const JPEG_SOI = new Uint8Array([0xff, 0xd8, 0xff, 0xe0]);

const PHOTO_FILES: Upload[] = [
  photo('an empty file', 'gate.jpg', new Uint8Array()),
  photo('a Windows program named .jpg', 'gate.jpg', MZ),
  photo('an ELF program named .png', 'gate.png', ELF, 'image/png'),
  photo('a zip named .jpg', 'gate.jpg', ZIP),
  photo('a PDF named .jpg', 'gate.jpg', PDF),
  photo('HTML named .jpg', 'gate.jpg', enc('<html><script>alert(1)</script></html>')),
  photo(
    'an SVG with a script',
    'gate.svg',
    enc('<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>'),
    'image/svg+xml',
  ),
  photo('an SVG named .png', 'gate.png', enc('<svg xmlns="http://www.w3.org/2000/svg"/>'), 'image/png'),
  photo(
    'a GIF',
    'gate.gif',
    cat(
      'GIF89a',
      new Uint8Array([
        1, 0, 1, 0, 0x80, 0, 0, 0, 0, 0, 0xff, 0xff, 0xff, 0x2c, 0, 0, 0, 0, 1, 0, 1, 0, 0, 2, 2, 0x44, 1, 0, 0x3b,
      ]),
    ),
    'image/gif',
  ),
  photo('a BMP', 'gate.bmp', cat('BM', new Uint8Array(60)), 'image/bmp'),
  photo('a TIFF', 'gate.tif', cat(new Uint8Array([0x49, 0x49, 0x2a, 0]), new Uint8Array(60)), 'image/tiff'),
  photo('a truncated JPEG (header only)', 'gate.jpg', JPEG_SOI),
  photo('a truncated PNG (signature only)', 'gate.png', PLAIN_PNG.slice(0, 8), 'image/png'),
  photo('a PNG cut in the middle', 'gate.png', PLAIN_PNG.slice(0, Math.floor(PLAIN_PNG.byteLength / 2)), 'image/png'),
  photo('a JPEG start with HTML after it', 'gate.jpg', cat(JPEG_SOI, '<html><script>alert(1)</script>')),
  photo(
    'a PNG claiming 100,000 × 100,000 pixels (decompression bomb)',
    'bomb.png',
    pngClaiming(100_000, 100_000),
    'image/png',
  ),
  photo('a PNG claiming 30,000 × 30,000 pixels', 'bomb.png', pngClaiming(30_000, 30_000), 'image/png'),
  photo('a gzip bomb named .jpg', 'gate.jpg', zlib.gzipSync(Buffer.alloc(50 * 1024 * 1024))),
  photo('over the size cap', 'gate.jpg', cat(JPEG_SOI, new Uint8Array(25 * 1024 * 1024 + 10))),
  photo('random binary', 'gate.jpg', new Uint8Array(Array.from({ length: 4096 }, (_, i) => (i * 104729) % 256))),
  photo('a path-traversal name and hostile content', '../../../../tmp/x.jpg', MZ),
  photo('a NUL in the name and a PDF', 'gate\u0000.jpg', PDF),
  photo('text declared as a JPEG', 'gate.jpg', enc('just some words')),
  photo('a RIFF/WEBP header only', 'gate.webp', cat('RIFF', new Uint8Array([0, 0, 0, 0]), 'WEBPVP8 '), 'image/webp'),
  photo(
    'a HEIC-like box only',
    'gate.heic',
    cat(new Uint8Array([0, 0, 0, 0x18]), 'ftypheic', new Uint8Array(12)),
    'image/heic',
  ),
  { name: 'no file part', body: () => multipartBody([{ name: 'caption', value: 'Gate' }]) },
  {
    name: 'a good photo with a 10,000-character caption',
    body: () =>
      multipartBody([
        { name: 'file', value: PLAIN_PNG, fileName: 'gate.png', contentType: 'image/png' },
        { name: 'caption', value: 'c'.repeat(10_000) },
      ]),
  },
  {
    name: 'a good photo with a chainage of 1e400',
    body: () =>
      multipartBody([
        { name: 'file', value: PLAIN_PNG, fileName: 'gate.png', contentType: 'image/png' },
        { name: 'chainageM', value: '1e400' },
      ]),
  },
];

async function upload(path: string, u: Upload): Promise<LiveAnswer> {
  const { body, contentType } = u.body();
  return live(path, {
    method: 'POST',
    headers: { cookie: cast.cookies.surveyor!, 'content-type': contentType },
    body: body as BodyInit,
  });
}

async function refusesAll(path: string, files: Upload[]): Promise<void> {
  expect(files.length).toBeGreaterThanOrEqual(25);
  await settle();
  const before = await fingerprint();
  const keys = await listKeys(projectStoragePrefix(f.projectId));
  const outcomes: string[] = [];
  for (const u of files) {
    let r: LiveAnswer;
    try {
      r = await upload(path, u);
    } catch (error) {
      outcomes.push(`${u.name}: no answer (${String(error)})`);
      continue;
    }
    const refused = r.status >= 400 && r.status < 500 && typeof r.json?.error?.code === 'string';
    outcomes.push(`${u.name}: ${refused ? 'refused' : `${r.status} ${r.text.slice(0, 160)}`}`);
  }
  expect(outcomes).toEqual(files.map((u) => `${u.name}: refused`));
  await settle();
  expect(changedTables(before, await fingerprint())).toEqual([]);
  expect(await listKeys(projectStoragePrefix(f.projectId))).toEqual(keys);
}

describe('hostile files against the running app', () => {
  beforeAll(async () => {
    cast = await createCast();
    f = await freshFixture(cast);
  }, 120_000);

  it(`survey import refuses ${SURVEY_FILES.length} hostile files before storing anything`, async () => {
    await refusesAll(`/api/projects/${f.projectId}/routes/import`, SURVEY_FILES);
  });

  it(`site photos refuse ${PHOTO_FILES.length} hostile files before storing anything`, async () => {
    await refusesAll(`/api/projects/${f.projectId}/photos`, PHOTO_FILES);
  });

  it('a good file is still taken (the endpoints are not simply closed)', async () => {
    const ok = await upload(`/api/projects/${f.projectId}/photos`, photo('plain', 'gate.png', PLAIN_PNG, 'image/png'));
    expect(ok.status).toBe(201);
    const route = await upload(
      `/api/projects/${f.projectId}/routes/import`,
      survey('plain', 'walk.csv', 'chainage,elevation\n0,412\n40,409.5\n80,404\n'),
    );
    expect(route.status).toBe(201);
  });
});
