import { beforeAll, describe, expect, it } from 'vitest';
import { POST } from '@/app/api/analysis/line/route';
import { ANALYSIS_LIMIT, MAX_STATELESS_ANALYSIS_STATIONS } from '@/lib/validations/analysis';
import { call, createUser } from '../support/api';
import { referenceLine } from './analysis-fixtures';

/** A long rolling line on a falling grade (a few dozen highs and lows). */
function longLine(stations: number) {
  const line = referenceLine();
  const list = Array.from({ length: stations }, (_, i) => ({
    chainageM: i * 2,
    groundElevationM: 30 - i * 0.004 + Math.sin(i / 50) * 1.5,
  }));
  const endM = list[list.length - 1].chainageM;
  return { ...line, stations: list, stretches: [{ ...line.stretches[0], fromM: 0, toM: endM }] };
}

describe('the stateless analysis endpoint is bounded', () => {
  let userId = '';
  beforeAll(async () => {
    userId = (await createUser('bounded-analyst')).id;
  });
  const post = (body: unknown, query = '', who = userId) =>
    call(POST, { method: 'POST', path: `/api/analysis/line${query}`, body, userId: who });

  it(`refuses more than ${MAX_STATELESS_ANALYSIS_STATIONS} stations, naming the field`, async () => {
    const res = await post(longLine(MAX_STATELESS_ANALYSIS_STATIONS + 1));
    expect(res.status).toBe(400);
    expect(res.json.error.fields.stations[0]).toMatch(/At most 20,000 stations/);
  });

  it('thins the profile on request, keeping the ends and the lowest and highest pressure', async () => {
    const body = longLine(5000);
    const full = await post(body);
    const thin = await post(body, '?profilePoints=300');
    expect(full.status).toBe(200);
    expect(thin.status).toBe(200);
    const f = full.json.analysis.points;
    const t = thin.json.analysis.points;
    expect(t.chainageM.length).toBeLessThan(f.chainageM.length / 2);
    expect(t.chainageM[0]).toBe(f.chainageM[0]);
    expect(t.chainageM.at(-1)).toBe(f.chainageM.at(-1));
    expect(Math.min(...t.pressureHeadM)).toBe(Math.min(...f.pressureHeadM));
    expect(Math.max(...t.pressureHeadM)).toBe(Math.max(...f.pressureHeadM));
    expect(thin.json.analysis.warnings).toEqual(full.json.analysis.warnings);
    expect(thin.text.length).toBeLessThan(full.text.length / 2);
  });

  it('refuses a bad profilePoints value with 400', async () => {
    const res = await post(referenceLine(), '?profilePoints=3');
    expect(res.status).toBe(400);
    expect(res.json.error.fields.profilePoints).toBeDefined();
  });

  it(`answers 429 with Retry-After after ${ANALYSIS_LIMIT.points} analyses a minute from one user, and only for that user`, async () => {
    const busy = (await createUser('busy-analyst')).id;
    const other = (await createUser('other-analyst')).id;
    const answers = await Promise.all(
      Array.from({ length: ANALYSIS_LIMIT.points + 5 }, () => post(referenceLine(), '', busy)),
    );
    const statuses = answers.map((a) => a.status);
    expect(statuses.filter((s) => s === 200)).toHaveLength(ANALYSIS_LIMIT.points);
    expect(statuses.filter((s) => s === 429)).toHaveLength(5);
    const refused = answers.find((a) => a.status === 429)!;
    expect(Number(refused.headers.get('retry-after'))).toBeGreaterThan(0);
    expect(refused.json.error.code).toBe('rate_limited');
    expect((await post(referenceLine(), '', other)).status).toBe(200);
  });
});
