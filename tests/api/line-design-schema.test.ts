import { beforeAll, describe, expect, it } from 'vitest';
import { POST as analyse } from '@/app/api/analysis/line/route';
import * as lineRoute from '@/app/api/lines/[lineId]/route';
import { models } from '@/models';
import { call, createTeamFixture } from '../support/api';
import { REFERENCE_PIPE, referenceLine } from './analysis-fixtures';

type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;

/**
 * One line-design schema and one wording: a saved line's design (PATCH /api/lines/:id, under `design`)
 * and a line given whole to the stateless analysis (POST /api/analysis/line) refuse the same bad part
 * at the same field through the same words table, the saved line in its project's units and the
 * stateless call in the units `?units=` names (metric by default): the same input in the same units
 * gets the same words.
 */
const savedDesign = {
  start: { kind: 'water-level', levelM: 241 },
  end: { kind: 'outlet', elevationM: 200, residualHeadM: 5 },
  flow: { kind: 'design', flowM3s: 0.001 },
  stretches: [{ fromM: 0, toM: 400, pipe: 'pe100-iso4427-sdr11-50mm' }],
};

// [what, the bad part, the field it is refused at]
const badParts: [string, Record<string, unknown>, string][] = [
  ['a negative design flow', { flow: { kind: 'design', flowM3s: -1 } }, 'flow.flowM3s'],
  [
    'text for a pump shut-off head',
    { start: { kind: 'pump', outletHeadM: 260, shutoffHeadM: 'high' } },
    'start.shutoffHeadM',
  ],
  ['text for an outlet elevation', { end: { kind: 'outlet', elevationM: 'high' } }, 'end.elevationM'],
  ['a negative pressure wanted', { end: { kind: 'outlet', elevationM: 200, residualHeadM: -2 } }, 'end.residualHeadM'],
  [
    'a stretch ending before it starts',
    { stretches: [{ fromM: 300, toM: 100, pipe: 'pe100-iso4427-sdr11-50mm' }] },
    'stretches.0.toM',
  ],
  ['no stretch at all', { stretches: [] }, 'stretches'],
  ['a negative loss coefficient', { fittings: [{ chainageM: 10, k: -1 }] }, 'fittings.0.k'],
  ['a device kind nobody knows', { devices: [{ kind: 'tap', chainageM: 10 }] }, 'devices.0.kind'],
  [
    'a NUL byte in a device label',
    { devices: [{ kind: 'washout', chainageM: 10, label: 'a\u0000b' }] },
    'devices.0.label',
  ],
  [
    'a custom pipe wider inside than out',
    { pipes: [{ ...REFERENCE_PIPE, insideDiameterM: 0.2 }] },
    'pipes.0.insideDiameterM',
  ],
  ['water too hot', { settings: { waterTemperatureC: 99 } }, 'settings.waterTemperatureC'],
  ['a friction method nobody knows', { settings: { frictionMethod: 'guesswork' } }, 'settings.frictionMethod'],
  [
    'a highest velocity below the lowest',
    { settings: { velocityMinMs: 2, velocityMaxMs: 1 } },
    'settings.velocityMaxMs',
  ],
  ['a safety factor below 1', { settings: { safetyFactor: 0.5 } }, 'settings.safetyFactor'],
  ['an unknown setting', { settings: { colour: 'blue' } }, 'settings.colour'],
];

describe('one line-design schema for saved lines and the stateless analysis', () => {
  let f: Fixture;
  beforeAll(async () => {
    f = await createTeamFixture();
  });
  const setUnits = (unitSystem: 'us' | 'metric') =>
    models().Project.update({ unitSystem }, { where: { id: f.projectId } });
  const save = (design: unknown) =>
    call(lineRoute.PATCH, {
      method: 'PATCH',
      path: '/api/x',
      params: { lineId: f.lineId },
      body: { design },
      userId: f.users.designer.id,
    });
  const analyseWhole = (body: unknown, query = '') =>
    call(analyse, { method: 'POST', path: `/api/analysis/line${query}`, body, userId: f.users.designer.id });
  /** The saved line's refusal in a project of `system`, and the stateless one asked in the same system. */
  async function bothIn(
    system: 'us' | 'metric',
    savedPart: Record<string, unknown>,
    wholePart: Record<string, unknown>,
  ) {
    await setUnits(system);
    const saved = await save({ ...savedDesign, ...savedPart }).finally(() => setUnits('metric'));
    const whole = await analyseWhole({ ...referenceLine(), ...wholePart }, `?units=${system}`);
    return { saved, whole };
  }

  it.each(badParts)(
    'refuses %s with the same words on both endpoints, in either unit system',
    async (_what, part, field) => {
      const metric = await bothIn('metric', part, part);
      const us = await bothIn('us', part, part);
      const byDefault = await analyseWhole({ ...referenceLine(), ...part });
      for (const { saved, whole } of [metric, us]) {
        expect(saved.status).toBe(400);
        expect(whole.status).toBe(400);
        const savedWords = saved.json.error.fields?.[`design.${field}`];
        expect(savedWords, JSON.stringify(saved.json.error.fields)).toBeDefined();
        expect(whole.json.error.fields?.[field]).toEqual(savedWords);
        expect(whole.json.error.message).toBe(saved.json.error.message);
        // Named as the screen names it, never by its path.
        if (field.includes('.')) expect(savedWords.join(' ')).not.toContain(field);
      }
      // Without `?units=` the stateless call words as a metric project does.
      expect(byDefault.json.error.fields?.[field]).toEqual(metric.whole.json.error.fields?.[field]);
    },
  );

  it('states a bound in the units asked: a negative design flow in L/s, or in US gpm', async () => {
    const part = { flow: { kind: 'design', flowM3s: -1 } };
    const metric = await bothIn('metric', part, part);
    const us = await bothIn('us', part, part);
    expect(metric.whole.json.error.fields['flow.flowM3s']).toEqual(['Design flow must be at least 0 L/s']);
    expect(us.whole.json.error.fields['flow.flowM3s']).toEqual(['Design flow must be at least 0 US gpm']);
    expect(us.saved.json.error.fields['design.flow.flowM3s']).toEqual(['Design flow must be at least 0 US gpm']);
  });

  it('refuses a unit system it does not know, before reading the body', async () => {
    const res = await analyseWhole(referenceLine(), '?units=imperial');
    expect(res.status).toBe(400);
    expect(res.json.error.fields.units).toEqual(['Units must be "metric" or "us"']);
  });

  // The core's own refusals (stretches that leave a gap, a pipe nobody has), worded by the one mapping.
  const coreRefusals: [string, (line: 'saved' | 'whole') => Record<string, unknown>, string][] = [
    [
      'stretches that leave a gap',
      (line) => ({
        stretches: [
          { fromM: 0, toM: 150, pipe: 'pe100-iso4427-sdr11-63mm' },
          { fromM: 160, toM: line === 'saved' ? 400 : 1000, pipe: 'pe100-iso4427-sdr11-50mm' },
        ],
      }),
      'stretches.fromM.1',
    ],
    [
      'a pipe id nobody has',
      (line) => ({ stretches: [{ fromM: 0, toM: line === 'saved' ? 400 : 1000, pipe: 'copper-99mm' }] }),
      'stretches.pipe.0',
    ],
  ];

  it.each(coreRefusals)(
    'refuses %s in the words of the line page on both endpoints, in either unit system',
    async (_what, part, field) => {
      for (const system of ['metric', 'us'] as const) {
        const { saved, whole } = await bothIn(system, part('saved'), part('whole'));
        expect(saved.status).toBe(400);
        expect(whole.status).toBe(400);
        const savedWords = saved.json.error.fields?.[`design.${field}`];
        expect(savedWords, JSON.stringify(saved.json.error.fields)).toBeDefined();
        expect(whole.json.error.fields?.[field]).toEqual(savedWords);
        expect(whole.json.error.message).toBe(saved.json.error.message);
        expect(savedWords[0]).toMatch(/^Pipe stretch (1|2): /);
      }
    },
  );

  it('refuses a ram-site start or a ram delivery on the stateless endpoint, saying which starts it takes', async () => {
    const ram = await analyseWhole({
      ...referenceLine(),
      start: { kind: 'ram-site', ramSiteId: '00000000-0000-4000-8000-000000000000' },
    });
    expect(ram.status).toBe(400);
    expect(ram.json.error.fields['start.kind']).toEqual([
      'Start must be a water level ("water-level") or a pump outlet ("pump")',
    ]);
    const delivery = await analyseWhole({ ...referenceLine(), flow: { kind: 'pump-delivery' } });
    expect(delivery.status).toBe(400);
    expect(delivery.json.error.fields['flow.kind']).toEqual(['Flow must be a design flow ("design") or "find"']);
  });

  it('still takes a height datum on the stateless endpoint (a saved line reads it from its route)', async () => {
    const res = await analyseWhole({
      ...referenceLine(),
      settings: { checkSurge: false, heightDatum: 'assumed', siteAltitudeM: 300 },
    });
    expect(res.status).toBe(200);
    expect(res.json.analysis.settings.heightDatum).toBe('assumed');
    const saved = await save({ ...savedDesign, settings: { heightDatum: 'assumed' } });
    expect(saved.status).toBe(400);
    expect(saved.json.error.fields['design.settings.heightDatum']).toEqual(['Unknown field "heightDatum"']);
  });
});
