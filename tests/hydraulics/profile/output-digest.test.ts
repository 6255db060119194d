import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { benchmarkLine } from '../../../bench/profile-100k';
import { analyzeLine, type LineInput, type LineStation } from '../../../hydraulics/index';

/**
 * Regression guard for speed work on the profile: the full `analyzeLine` output of a few long generated lines must
 * stay bit for bit what it was. The expected digests below were computed from the implementation as it stood before
 * the passes were fused (December 2026); they pin today's results, not independently checked values (the published
 * checks live in the other files of this folder). A change that alters any number, however slightly, changes the
 * digest: if it is meant, say why in the commit and recompute the digest.
 */

/** Canonical bytes of a value: keys sorted, numbers by their 64-bit pattern, typed arrays by their bytes. */
function feed(hash: ReturnType<typeof createHash>, value: unknown): void {
  if (value === undefined) hash.update('u');
  else if (value === null) hash.update('n');
  else if (typeof value === 'number') {
    const bits = Buffer.alloc(8);
    bits.writeDoubleLE(value);
    hash.update('d').update(bits);
  } else if (typeof value === 'string') hash.update(`s${value.length}:${value}`);
  else if (typeof value === 'boolean') hash.update(value ? 't' : 'f');
  else if (ArrayBuffer.isView(value)) {
    hash.update(`${value.constructor.name}${value.byteLength}:`);
    hash.update(new Uint8Array(value.buffer, value.byteOffset, value.byteLength));
  } else if (Array.isArray(value)) {
    hash.update(`a${value.length}[`);
    for (const item of value) feed(hash, item);
    hash.update(']');
  } else if (typeof value === 'object') {
    const keys = Object.keys(value).sort();
    hash.update(`o${keys.length}{`);
    for (const key of keys) {
      hash.update(`k${key}`);
      feed(hash, (value as Record<string, unknown>)[key]);
    }
    hash.update('}');
  } else throw new Error(`cannot digest a ${typeof value}`);
}

function digest(value: unknown): string {
  const hash = createHash('sha256');
  feed(hash, value);
  return hash.digest('hex');
}

/** Deterministic pseudo-random numbers in [0, 1) (32-bit LCG). */
function lcg(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
}

/**
 * An invented 20 km hill line with GPS-like scatter: a ridge it must siphon over, a deep valley that passes the
 * pipe ratings, fittings, a break-pressure tank, an air valve and a washout, a flow that drops at two take-offs.
 */
function hillLine(): LineInput {
  const random = lcg(7);
  const n = 20_000;
  const stations: LineStation[] = [];
  for (let i = 0; i < n; i++) {
    const x = i * 1 + (i > 0 ? random() * 0.2 : 0);
    const ridge = 18 * Math.exp(-(((x - 3000) / 600) ** 2));
    const valley = -160 * Math.exp(-(((x - 12000) / 2500) ** 2));
    const z = 500 - x * 0.01 + ridge + valley + (random() - 0.5) * 1.5;
    stations.push(
      i % 7 === 0 ? { chainageM: x, groundElevationM: z } : { chainageM: x, groundElevationM: z, coverM: 0.9 },
    );
  }
  const last = stations[n - 1].chainageM;
  return {
    stations,
    stretches: [
      { fromM: 0, toM: 6000, pipe: 'pe100-iso4427-sdr11-90mm' },
      { fromM: 6000, toM: 15000, pipe: 'pe100-iso4427-sdr17-110mm' },
      { fromM: 15000, toM: last, pipe: 'pe100-iso4427-sdr11-90mm' },
    ],
    fittings: [
      { chainageM: 2500.5, k: 0.9, label: 'bend' },
      { chainageM: 9000, k: 0.2, label: 'gate valve' },
    ],
    devices: [
      { kind: 'break-pressure-tank', chainageM: 16000 },
      { kind: 'air-release-valve', chainageM: 3000 },
      { kind: 'washout', chainageM: 12000 },
    ],
    start: { kind: 'water-level', levelM: 505 },
    end: { kind: 'outlet', elevationM: stations[n - 1].groundElevationM, residualHeadM: 5 },
    flow: {
      kind: 'schedule',
      pieces: [
        { fromM: 0, flowM3s: 0.004 },
        { fromM: 7000, flowM3s: 0.003 },
        { fromM: 17000, flowM3s: 0.0015 },
      ],
    },
    settings: { heightScatterM: 0.5, frictionMethod: 'darcy-weisbach' },
  };
}

/** A pumped 10 km line over a hill and down to a tank inlet at a design flow. */
function pumpedLine(): LineInput {
  const random = lcg(99);
  const n = 10_000;
  const stations: LineStation[] = [];
  for (let i = 0; i < n; i++) {
    const x = i;
    stations.push({ chainageM: x, groundElevationM: 100 + 60 * Math.sin(x / 2000) + (random() - 0.5) * 0.8 });
  }
  return {
    stations,
    stretches: [{ fromM: 0, toM: n - 1, pipe: 'pe100-iso4427-sdr11-63mm' }],
    start: { kind: 'pump', outletHeadM: 230 },
    end: { kind: 'tank-inlet', elevationM: stations[n - 1].groundElevationM + 1 },
    flow: { kind: 'design', flowM3s: 0.0012 },
    settings: { heightDatum: 'assumed', frictionMethod: 'hazen-williams' },
  };
}

/** The hill line without a fixed flow: the flow it carries by gravity is found. */
function foundFlowLine(): LineInput {
  const line = hillLine();
  return { ...line, flow: { kind: 'find' }, devices: [], settings: { frictionMethod: 'hazen-williams' } };
}

describe('analyzeLine output stays bit for bit the same (regression digest, taken from the code before speed work)', () => {
  const cases: [string, () => LineInput, string][] = [
    [
      'benchmark line, Hazen-Williams',
      () => benchmarkLine('hazen-williams'),
      '2c35704d35ec1ae863669df5a7cf64c51263bfda1cf324def8249572bc26d921',
    ],
    [
      'benchmark line, Darcy-Weisbach',
      () => benchmarkLine('darcy-weisbach'),
      '75caca13a544007e04e3181a51b4d3adf4651dd854e4d29d18dac095befccebd',
    ],
    [
      'hill line with siphon, tank, fittings and a flow schedule',
      hillLine,
      '82bcacda376e456e949481e2e28dde16bcd1d3348b4c851fc45dd9437244de8b',
    ],
    ['pumped line to a tank inlet', pumpedLine, '8bf5224aa1df8190a0900d4d0300a4c6c5cffd259eb834b424c619f65123cba4'],
    [
      'hill line, flow found by gravity',
      foundFlowLine,
      '74f035da5bd52bc75ca2190c2a96e4cc79c0788be868edaa47faab7efb742040',
    ],
  ];
  for (const [name, make, expected] of cases) {
    it(name, () => {
      const result = analyzeLine(make());
      // Each line reaches the checks (zones and warnings), so the digest covers them too.
      expect(result.zones.length).toBeGreaterThan(0);
      expect(result.warnings.length).toBeGreaterThan(0);
      expect(digest(result)).toBe(expected);
    });
  }
});
