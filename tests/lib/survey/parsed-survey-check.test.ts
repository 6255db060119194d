import { describe, expect, it } from 'vitest';
import { SurveyImportError } from '../../../lib/survey/errors';
import { ParsedSurveySchema, validateParsedSurvey } from '../../../lib/survey/parsed-survey';

const good = (order: number) => ({
  order,
  lat: 54.2 + order * 1e-5,
  lon: -2.9,
  chainageM: order * 1.1,
  elevationM: 400,
  label: order === 0 ? 'intake' : undefined,
  heightSource: 'gps',
  confidence: 4.5,
  time: '2026-04-18T06:00:00.000Z',
});

const survey = (second: Record<string, unknown>) => ({
  points: [good(0), { ...good(1), ...second }],
  warnings: [],
  stats: {
    format: 'gps-csv',
    pointCount: 2,
    rowsRead: 2,
    totalHorizontalLengthM: 1.1,
    totalSlopeLengthM: 1.1,
    minElevationM: 400,
    maxElevationM: 400,
    duplicateCount: 0,
  },
});

// The points are checked field by field (not by zod, for speed); these cases hold that check to the schema's rules.
describe('validateParsedSurvey checks each point by the rules of SurveyPointSchema', () => {
  it.each([
    ['a good point', {}, null],
    ['no position (station files)', { lat: undefined, lon: undefined }, null],
    ['latitude 90 exactly', { lat: 90 }, null],
    ['a time with an offset', { time: '2026-04-18T08:00:00+02:00' }, null],
    ['latitude above 90', { lat: 90.0001 }, 'points.1.lat'],
    ['longitude below −180', { lon: -180.5 }, 'points.1.lon'],
    ['latitude as text', { lat: '54.2' }, 'points.1.lat'],
    ['a negative chainage', { chainageM: -0.01 }, 'points.1.chainageM'],
    ['an infinite chainage', { chainageM: Infinity }, 'points.1.chainageM'],
    ['a NaN elevation', { elevationM: NaN }, 'points.1.elevationM'],
    ['a fractional order', { order: 1.5 }, 'points.1.order'],
    ['an unknown height source', { heightSource: 'guess' }, 'points.1.heightSource'],
    ['a negative confidence', { confidence: -1 }, 'points.1.confidence'],
    ['a time without an offset', { time: '2026-04-18T06:00:00' }, 'points.1.time'],
    ['a date that does not exist', { time: '2026-02-30T06:00:00Z' }, 'points.1.time'],
    ['a label that is not text', { label: 7 }, 'points.1.label'],
  ])('%s', (_name, change, failsAt) => {
    const value = survey(change);
    expect(ParsedSurveySchema.safeParse(value).success).toBe(failsAt === null);
    if (failsAt === null) {
      expect(validateParsedSurvey(value).points).toHaveLength(2);
      return;
    }
    let caught: unknown;
    try {
      validateParsedSurvey(value);
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(SurveyImportError);
    expect((caught as SurveyImportError).code).toBe('invalid-result');
    expect((caught as Error).message).toContain(`at ${failsAt}:`);
  });
  it('still checks the rest of the survey with zod', () => {
    const value = { ...survey({}), stats: { ...survey({}).stats, pointCount: -1 } };
    expect(() => validateParsedSurvey(value)).toThrow(/at stats\.pointCount/);
  });
  it('refuses fewer than two points', () => {
    expect(() => validateParsedSurvey({ ...survey({}), points: [good(0)] })).toThrow(/at points:/);
  });
});
