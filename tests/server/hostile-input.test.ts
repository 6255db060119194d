import fc from 'fast-check';
import { beforeAll, describe, expect, it } from 'vitest';
import { ENDPOINTS } from '../api/endpoints';
import { ACTORS } from '../support/api';
import { surveyUpload } from '../support/multipart';
import { apiPath, createCast, freshFixture, type Cast, type Fixture } from './cast';
import { changedTables, fingerprint, settle } from './fingerprint';
import { live, type LiveAnswer } from './live';

/**
 * Hostile input against the running app: a catalogue of crafted requests and property-based
 * random bodies for every write endpoint. Every one is refused with a 4xx in the one error shape
 * (never a server error) and the database is untouched; slow-pattern input is answered within a
 * second while another endpoint keeps answering.
 */

let cast: Cast;
let f: Fixture;

type Body = string | Uint8Array | ReadableStream<Uint8Array> | undefined;
interface HostileCase {
  name: string;
  method: string;
  path: () => string;
  body?: () => Body;
  contentType?: string | null;
  actor?: 'designer' | 'anonymous' | 'surveyor';
  /** Some bodies are legal text that the app may keep (a right-to-left mark in a note): only "no 5xx" then. */
  mayAccept?: boolean;
}

const J = 'application/json';
const enc = (s: string) => new TextEncoder().encode(s);
const projectsOfA = () => `/api/teams/${f.teamId}/projects`;
const project = () => `/api/projects/${f.projectId}`;
const line = () => `/api/lines/${f.lineId}`;
const points = () => `/api/routes/${f.routeId}/points`;
const split = () => `/api/routes/${f.routeId}/split`;
const analysis = () => '/api/analysis/line';
const accounts = () => '/api/accounts';

function nested(depth: number, open: string, close: string, inner = '1'): string {
  return open.repeat(depth) + inner + close.repeat(depth);
}

/** A body that arrives in chunks with no Content-Length: the cap must hold while streaming. */
function streamOf(totalBytes: number, chunk = 64 * 1024): () => ReadableStream<Uint8Array> {
  return () => {
    let sent = 0;
    const piece = enc(`{"name":"${'x'.repeat(chunk - 10)}`.slice(0, chunk));
    return new ReadableStream<Uint8Array>({
      pull(controller) {
        if (sent >= totalBytes) return controller.close();
        controller.enqueue(piece);
        sent += piece.byteLength;
      },
    });
  };
}

const pointsBody = (value: unknown) =>
  JSON.stringify({
    points: [0, 50, 100].map((c, i) => ({
      sourceSeq: null,
      latitude: null,
      longitude: null,
      chainageM: i === 1 ? value : c,
      elevationM: 400 - i,
      label: null,
      heightSource: 'typed',
      confidenceM: null,
      excluded: false,
    })),
  });

const json = (name: string, path: () => string, body: string, extra: Partial<HostileCase> = {}): HostileCase => ({
  name,
  method: 'POST',
  path,
  body: () => body,
  contentType: J,
  ...extra,
});

/** The catalogue: syntax, types, NUL bytes, numbers, nesting, size, content types, unicode, ids, slow patterns. */
const CATALOGUE: HostileCase[] = [
  // Syntax
  ...[
    '{',
    '{"name":',
    '[',
    'nul',
    '{"name":"x",}',
    "{'name':'x'}",
    '{"name":"x"}{"name":"y"}',
    '\uFEFF{"name":"x"',
    '{"name":"x" "description":"y"}',
    '{"name":"\\x41"}',
    '{"name":"\\u12"}',
    '{"name":"a\nb"}',
    '"just a string"',
    '12',
    'true',
    'null',
    '{"name":undefined}',
    '{name:"x"}',
  ].map((b, i) => json(`syntax ${i}: ${JSON.stringify(b).slice(0, 30)}`, projectsOfA, b)),
  // Types
  ...[42, true, null, [], {}, ['x'], { first: 'x' }, 1e3].map((v, i) =>
    json(`name of type ${i}: ${JSON.stringify(v)}`, projectsOfA, JSON.stringify({ name: v })),
  ),
  json('array body', projectsOfA, JSON.stringify([{ name: 'x' }])),
  json('notes as object', line, JSON.stringify({ notes: { text: 'x' } }), { method: 'PATCH' }),
  json('baseRevision as string', line, JSON.stringify({ notes: 'x', baseRevision: '1' }), { method: 'PATCH' }),
  json('site notes as array', project, JSON.stringify({ siteNotes: ['a', 'b'] }), { method: 'PATCH' }),
  json('email as number', accounts, JSON.stringify({ name: 'X', email: 12, password: 'a long enough passphrase' }), {
    actor: 'anonymous',
  }),
  // NUL bytes
  json('NUL in a name', projectsOfA, JSON.stringify({ name: 'a\u0000b' })),
  json('NUL in a key', projectsOfA, '{"na\\u0000me":"x"}'),
  {
    name: 'raw NUL bytes in the body',
    method: 'POST',
    path: projectsOfA,
    body: () => new Uint8Array([123, 34, 110, 0, 34, 58, 0, 125]),
    contentType: J,
  },
  json(
    'NUL in an e-mail',
    accounts,
    JSON.stringify({ name: 'X', email: 'a\u0000@b.test', password: 'a long enough passphrase' }),
    { actor: 'anonymous' },
  ),
  json('NUL in a note', line, JSON.stringify({ notes: 'x\u0000y' }), { method: 'PATCH' }),
  // Huge and tiny numbers
  ...[
    '1e308',
    '-1e308',
    '1e400',
    '-1e400',
    '1e-400',
    '9007199254740993',
    '-0.0e-0',
    '0x10',
    'NaN',
    'Infinity',
    '1.7976931348623157e309',
    '-',
  ].map(
    (n, i) =>
      // A number too small to tell from zero is zero: a second station at 0 m is the app's to keep or refuse.
      ({
        name: `chainage ${i}: ${n}`,
        method: 'PUT',
        path: points,
        body: () => pointsBody('__N__').replace('"__N__"', n),
        contentType: J,
        mayAccept: n === '1e-400' || n === '-0.0e-0',
      }) as HostileCase,
  ),
  json('split at 1e308 m', split, JSON.stringify({ chainageM: 1e308 })),
  json('split at -1e-320 m', split, JSON.stringify({ chainageM: -1e-320 })),
  json('analysis with a 1e300 flow', analysis, JSON.stringify({ flow: 1e300 })),
  json('base revision 2^63', line, '{"notes":"x","baseRevision":9223372036854775808}', { method: 'PATCH' }),
  // Deep nesting
  json('arrays nested 100,000 deep', projectsOfA, nested(100_000, '[', ']')),
  json('objects nested 20,000 deep', projectsOfA, nested(20_000, '{"a":', '}', '{}')),
  json('a name inside 5,000 objects', project, `{"siteNotes":${nested(5_000, '{"a":', '}', '"x"')}}`, {
    method: 'PATCH',
  }),
  json('analysis nested 50,000 deep', analysis, nested(50_000, '[', ']')),
  // Oversize and streamed bodies
  json('2 MB body with its length', projectsOfA, JSON.stringify({ name: 'x', description: 'y'.repeat(2_000_000) })),
  {
    name: '30 MB streamed with no length',
    method: 'POST',
    path: projectsOfA,
    body: streamOf(30 * 1024 * 1024),
    contentType: J,
  },
  {
    name: '30 MB streamed to the analysis endpoint',
    method: 'POST',
    path: analysis,
    body: streamOf(30 * 1024 * 1024),
    contentType: J,
  },
  {
    name: '30 MB streamed to the import endpoint',
    method: 'POST',
    path: () => `/api/projects/${f.projectId}/routes/import`,
    body: streamOf(30 * 1024 * 1024),
    contentType: 'multipart/form-data; boundary=x',
    actor: 'surveyor',
  },
  json(
    '100,000 keys',
    projectsOfA,
    JSON.stringify(Object.fromEntries(Array.from({ length: 100_000 }, (_, i) => [`k${i}`, i]))),
  ),
  // Wrong content types
  ...(
    [
      'text/plain',
      'application/x-www-form-urlencoded',
      'multipart/form-data; boundary=zz',
      'application/xml',
      'application/json-patch',
      'text/html',
      null,
    ] as (string | null)[]
  ).map(
    (type, i) =>
      ({
        name: `content type ${i}: ${type}`,
        method: 'POST',
        path: projectsOfA,
        body: () => JSON.stringify({ name: 'Typed wrong' }),
        contentType: type,
      }) as HostileCase,
  ),
  {
    name: 'UTF-16 body',
    method: 'POST',
    path: projectsOfA,
    body: () => new Uint8Array(Buffer.from('\uFEFF{"name":"x"}', 'utf16le')),
    contentType: 'application/json; charset=utf-16',
  },
  {
    name: 'JSON to the import endpoint',
    method: 'POST',
    path: () => `/api/projects/${f.projectId}/routes/import`,
    body: () => JSON.stringify({ file: 'x' }),
    contentType: J,
    actor: 'surveyor',
  },
  // Unicode tricks
  {
    name: 'invalid UTF-8 (overlong slash)',
    method: 'POST',
    path: projectsOfA,
    body: () => new Uint8Array([...enc('{"name":"'), 0xc0, 0xaf, ...enc('"}')]),
    contentType: J,
  },
  {
    name: 'invalid UTF-8 (lone continuation)',
    method: 'POST',
    path: projectsOfA,
    body: () => new Uint8Array([...enc('{"name":"'), 0x80, 0x80, ...enc('"}')]),
    contentType: J,
  },
  json('a lone surrogate escape', projectsOfA, '{"name":"x\\ud800y","description":1}'),
  json('a right-to-left override in a name', projectsOfA, JSON.stringify({ name: 'gpj.\u202Eexe', description: 1 })),
  json('fullwidth digits for a chainage', split, JSON.stringify({ chainageM: '１２' })),
  json('10,000 combining marks', projectsOfA, JSON.stringify({ name: `a${'\u0301'.repeat(10_000)}` })),
  json(
    'a homoglyph e-mail with no @',
    accounts,
    JSON.stringify({ name: 'X', email: 'admin＠example.test', password: 'a long enough passphrase' }),
    { actor: 'anonymous' },
  ),
  json('zero-width only name', projectsOfA, JSON.stringify({ name: '\u200B\u200B\u200B' }), { mayAccept: true }),
  // Prototype tricks
  json('__proto__ key', projectsOfA, '{"name":"x","__proto__":{"isAdmin":true}}', { mayAccept: true }),
  json('constructor.prototype key', projectsOfA, '{"name":"x","constructor":{"prototype":{"isAdmin":true}}}'),
  // Ids in the address
  ...[
    "1' OR '1'='1",
    '..%2F..%2Fetc%2Fpasswd',
    '%00',
    'x'.repeat(5000),
    '00000000-0000-0000-0000-00000000000g',
    '%E2%80%AE',
  ].map(
    (id, i) =>
      ({
        name: `malformed project id ${i}`,
        method: 'PATCH',
        path: () => `/api/projects/${id}`,
        body: () => JSON.stringify({ siteNotes: 'x' }),
        contentType: J,
      }) as HostileCase,
  ),
];

const SLOW_CELL = `${'9'.repeat(40_000)}x`;
/** Survey files whose cells used to make the number patterns backtrack (time grew with the square of the cell). */
const SLOW_CASES: { name: string; upload: () => { body: Uint8Array; contentType: string } }[] = [
  {
    name: '40 kB digit cell ending in a letter (station CSV)',
    upload: () =>
      surveyUpload('slow.csv', `chainage,elevation\n0,${SLOW_CELL}\n10,400\n`, {
        format: 'station-csv',
        name: 'Walk',
        mapping: { chainage: 0, elevation: 1, name: null },
        chainageUnit: 'm',
        elevationUnit: 'm',
        heightSource: 'level',
      }),
  },
  {
    name: '40 kB digit cell ending in a letter (GPS CSV)',
    upload: () =>
      surveyUpload('slow.csv', `lat,lon,ele\n54.1,-2.9,${SLOW_CELL}\n54.2,-2.9,300\n`, {
        format: 'gps-csv',
        name: 'Slow',
        elevationUnit: 'm',
        mapping: { latitude: 0, longitude: 1, elevation: 2, time: null, name: null, accuracy: null },
      }),
  },
  {
    name: 'a 40 kB row of separators and digits',
    upload: () =>
      surveyUpload('slow.csv', `chainage,elevation\n${'1,'.repeat(20_000)}x\n`, {
        format: 'station-csv',
        name: 'Walk',
        mapping: { chainage: 0, elevation: 1, name: null },
        chainageUnit: 'm',
        elevationUnit: 'm',
        heightSource: 'level',
      }),
  },
  {
    name: 'digits with decimal marks 1.1.1.… (40 kB)',
    upload: () =>
      surveyUpload('slow.csv', `chainage,elevation\n0,${'1.'.repeat(20_000)}x\n`, {
        format: 'station-csv',
        name: 'Walk',
        mapping: { chainage: 0, elevation: 1, name: null },
        chainageUnit: 'm',
        elevationUnit: 'm',
        heightSource: 'level',
      }),
  },
];

async function send(c: HostileCase): Promise<LiveAnswer> {
  const headers: Record<string, string> = {};
  if (c.contentType) headers['content-type'] = c.contentType;
  const cookie = cast.cookies[c.actor ?? 'designer'];
  if (cookie && c.actor !== 'anonymous') headers.cookie = cookie;
  const body = c.body?.();
  return live(c.path(), {
    method: c.method,
    headers,
    body: body as BodyInit | undefined,
    ...(body instanceof ReadableStream ? { duplex: 'half' } : {}),
  } as RequestInit);
}

const oneErrorShape = (r: LiveAnswer) =>
  typeof r.json?.error?.code === 'string' && typeof r.json?.error?.message === 'string';

describe('hostile input against the running app', () => {
  beforeAll(async () => {
    cast = await createCast();
    f = await freshFixture(cast);
  }, 120_000);

  it(`refuses every one of the ${CATALOGUE.length} catalogued requests with a 4xx in the one error shape, and writes nothing`, async () => {
    expect(CATALOGUE.length).toBeGreaterThanOrEqual(80);
    await settle();
    const before = await fingerprint();
    const answers: string[] = [];
    for (const c of CATALOGUE.filter((x) => !x.mayAccept)) {
      const r = await send(c);
      const ok = r.status >= 400 && r.status < 500 && oneErrorShape(r);
      answers.push(`${c.name}: ${ok ? 'refused' : `${r.status} ${r.text.slice(0, 120)}`}`);
    }
    expect(answers).toEqual(CATALOGUE.filter((x) => !x.mayAccept).map((c) => `${c.name}: refused`));
    await settle();
    expect(changedTables(before, await fingerprint())).toEqual([]);
    // Legal if odd text: kept or refused, never a server error.
    for (const c of CATALOGUE.filter((x) => x.mayAccept)) {
      const r = await send(c);
      expect(`${c.name}: ${r.status < 500 ? 'answered' : r.status}`).toBe(`${c.name}: answered`);
      if (r.status >= 400) expect(oneErrorShape(r)).toBe(true);
    }
  });

  it('answers each slow-pattern file within 1 s, while another endpoint answers within 200 ms', async () => {
    // One good import first: the worker pool starts on first use, and that start is not what is measured.
    const warm = surveyUpload('warm.csv', 'chainage,elevation\n0,412\n40,409.5\n', {
      format: 'station-csv',
      name: 'Walk',
      mapping: { chainage: 0, elevation: 1, name: null },
      chainageUnit: 'm',
      elevationUnit: 'm',
      heightSource: 'level',
    });
    expect(
      (
        await live(`/api/projects/${f.projectId}/routes/import`, {
          method: 'POST',
          headers: { cookie: cast.cookies.surveyor!, 'content-type': warm.contentType },
          body: warm.body as BodyInit,
        })
      ).status,
    ).toBe(201);
    const results: string[] = [];
    for (const c of SLOW_CASES) {
      const upload = c.upload();
      const t0 = performance.now();
      const slow = live(`/api/projects/${f.projectId}/routes/import`, {
        method: 'POST',
        headers: { cookie: cast.cookies.surveyor!, 'content-type': upload.contentType },
        body: upload.body as BodyInit,
      }).then((r) => ({ r, ms: performance.now() - t0 }));
      // Another user's request sent while the file is being read.
      await new Promise((r) => setTimeout(r, 30));
      const t1 = performance.now();
      const other = await live(`/api/teams/${f.teamId}/projects`, { headers: { cookie: cast.cookies.viewer! } });
      const otherMs = performance.now() - t1;
      const { r, ms } = await slow;
      expect(other.status).toBe(200);
      results.push(
        `${c.name}: ${r.status < 500 && oneErrorShape(r) ? 'refused' : r.status}${ms < 1000 ? '' : ` in ${Math.round(ms)} ms`}${otherMs < 200 ? '' : `, other ${Math.round(otherMs)} ms`}`,
      );
    }
    expect(results).toEqual(SLOW_CASES.map((c) => `${c.name}: refused`));
  });

  describe('property-based bodies for every write endpoint', () => {
    const writes = ENDPOINTS.filter((e) => e.method !== 'GET' && e.body && !e.upload);
    /** A JSON value of another type than `v` (never null: a nullable field may take it). */
    const otherType = (v: unknown) =>
      fc
        .oneof(
          fc.string(),
          fc.double(),
          fc.integer(),
          fc.boolean(),
          fc.array(fc.jsonValue(), { maxLength: 4 }),
          fc.dictionary(fc.string(), fc.jsonValue(), { maxKeys: 4 }),
        )
        .filter((x) => typeof x !== typeof v || Array.isArray(x) !== Array.isArray(v));

    it.each(writes.map((e, n) => ({ n, name: `${e.method} ${e.file}`, e })))(
      '$name: random and type-flipped bodies are refused (4xx, one shape), nothing written',
      async ({ e }) => {
        const planned: { path: string; body: string }[] = [];
        const own = { ...f };
        const params = await e.params(own);
        const valid = e.body!(own, ACTORS.indexOf('owner'));
        const path = apiPath(e.file, params);
        // Whole bodies that are not objects, or objects with a key no schema has.
        for (const v of fc.sample(
          fc.oneof(
            fc.jsonValue().filter((x) => x === null || typeof x !== 'object' || Array.isArray(x)),
            fc.dictionary(
              fc.string({ minLength: 1 }).map((k) => `zz${k}`),
              fc.jsonValue(),
              { minKeys: 1, maxKeys: 5 },
            ),
          ),
          { numRuns: 8, seed: 20261202 },
        )) {
          planned.push({ path, body: JSON.stringify(v) ?? 'null' });
        }
        // The valid body with one field flipped to another type.
        if (valid && typeof valid === 'object' && !Array.isArray(valid)) {
          const keys = Object.keys(valid as object);
          for (const key of keys) {
            const original = (valid as Record<string, unknown>)[key];
            for (const v of fc.sample(otherType(original), { numRuns: 2, seed: key.length * 7919 }))
              planned.push({ path, body: JSON.stringify({ ...(valid as object), [key]: v }) });
          }
        }
        await settle();
        const before = await fingerprint();
        const bad: string[] = [];
        for (const p of planned) {
          const r = await live(p.path, {
            method: e.method,
            headers: { cookie: cast.cookies.owner!, 'content-type': J },
            body: p.body,
          });
          if (!(r.status >= 400 && r.status < 500 && oneErrorShape(r)))
            bad.push(`${r.status} for ${p.body.slice(0, 160)}: ${r.text.slice(0, 160)}`);
        }
        expect(bad).toEqual([]);
        await settle();
        expect(changedTables(before, await fingerprint())).toEqual([]);
        expect(planned.length).toBeGreaterThanOrEqual(8);
      },
    );
  });
});
