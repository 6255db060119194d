import { beforeAll, describe, expect, it } from 'vitest';
import { POST } from '@/app/api/analysis/line/route';
import { call, createUser } from '../support/api';
import { referenceLine } from './analysis-fixtures';

describe('POST /api/analysis/line', () => {
  let userId = '';
  beforeAll(async () => {
    userId = (await createUser('analyst')).id;
  });
  const post = (body: unknown) => call(POST, { method: 'POST', path: '/api/analysis/line', body, userId });

  it('analyses a reference line and returns plain JSON arrays', async () => {
    const res = await post({
      ...referenceLine(),
      settings: { ...referenceLine().settings, frictionMethod: 'hazen-williams', entranceLossK: 0 },
    });
    expect(res.status).toBe(200);
    const { analysis } = res.json;
    expect(analysis.settings.frictionMethod).toBe('hazen-williams');
    expect(Array.isArray(analysis.points.chainageM)).toBe(true);
    expect(analysis.points.chainageM).toEqual([0, 500, 1000]);
    // core.md §8.2: 10 L/s in D = 100 mm, C = 150 over 1 km loses 14.60 m (10.67 form); the exact
    // k = 0.849 form gives 14.629 m [C]; 0.5 % covers the choice of constant.
    // Friction only: the velocity head taken at the entrance (1 × v²/2g, profile-and-checks.md §5.2) is set apart.
    const loss = 30 - analysis.points.hydraulicGradeM[2] - analysis.points.minorLossM[2];
    expect(Math.abs(loss - 14.6) / 14.6).toBeLessThan(0.005);
    // Same source: velocity 1.273 m/s.
    expect(analysis.points.velocityMs[1]).toBeCloseTo(1.273, 3);
    expect(Array.isArray(analysis.warnings)).toBe(true);
  });

  it('finds the flow a line carries between fixed ends', async () => {
    const res = await post({
      ...referenceLine(),
      flow: { kind: 'find' },
      end: { kind: 'tank-inlet', elevationM: 15.4 },
    });
    expect(res.status).toBe(200);
    const hgl = res.json.analysis.points.hydraulicGradeM;
    expect(hgl[hgl.length - 1]).toBeCloseTo(15.4, 3);
  });

  const bad: [string, unknown, string][] = [
    ['one station only', { ...referenceLine(), stations: [{ chainageM: 0, groundElevationM: 0 }] }, 'stations'],
    [
      'text in a number',
      {
        ...referenceLine(),
        stations: [
          { chainageM: 'ten', groundElevationM: 0 },
          { chainageM: 10, groundElevationM: 0 },
        ],
      },
      'stations.0.chainageM',
    ],
    ['an unknown field', { ...referenceLine(), colour: 'blue' }, 'colour'],
    ['a negative design flow', { ...referenceLine(), flow: { kind: 'design', flowM3s: -1 } }, 'flow.flowM3s'],
    [
      'a negative diameter',
      { ...referenceLine(), pipes: [{ ...referenceLine().pipes[0], insideDiameterM: -0.1 }] },
      'pipes.0.insideDiameterM',
    ],
    [
      'non-increasing chainage',
      {
        ...referenceLine(),
        stations: [
          { chainageM: 0, groundElevationM: 0 },
          { chainageM: 0, groundElevationM: 0 },
          { chainageM: 1000, groundElevationM: 0 },
        ],
      },
      'stations',
    ],
    [
      'an unknown pipe',
      { ...referenceLine(), stretches: [{ fromM: 0, toM: 1000, pipe: 'no-such-pipe' }] },
      'stretches',
    ],
    [
      'a stretch that does not cover the line',
      { ...referenceLine(), stretches: [{ fromM: 0, toM: 600, pipe: 'test-100mm-c150' }] },
      'stretches',
    ],
    [
      'a NUL byte in a label',
      { ...referenceLine(), devices: [{ kind: 'washout', chainageM: 10, label: 'a\u0000b' }] },
      'devices.0.label',
    ],
  ];

  it.each(bad)('refuses %s with 400 naming the field', async (_name, body, field) => {
    const res = await post(body);
    expect(res.status).toBe(400);
    expect(res.json.error.code).toBe('bad_request');
    const fields = Object.keys(res.json.error.fields ?? {});
    expect(fields.some((f) => f.startsWith(field))).toBe(true);
  });

  it('refuses malformed JSON', async () => {
    const res = await call(POST, {
      method: 'POST',
      path: '/api/analysis/line',
      rawBody: '{"stations": [NaN]}',
      userId,
    });
    expect(res.status).toBe(400);
    expect(res.json.error.message).toMatch(/not valid JSON/);
  });
});
