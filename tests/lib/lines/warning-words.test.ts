import { describe, expect, it } from 'vitest';
import { analyzeLine, consumerGpsHeightWarning, type LineWarning } from '../../../hydraulics/index';
import { ridgeWalk, SPIKE, STATED_ACCURACY_M, WALK_LINE } from '../../../lib/demo/ridge-walk.cjs';
import { gpsWarningText, warningsCsv, warningText } from '../../../lib/lines/warning-words';
import { displayUnits } from '../../../lib/units';
import { referenceLine } from '../../lines/reference-line';

const walk = ridgeWalk().filter((p) => p.seq !== SPIKE.seq);
const walked = analyzeLine({
  ...WALK_LINE,
  stations: walk.map((p) => ({ chainageM: p.chainageM, groundElevationM: p.elevationM })),
  settings: { ...WALK_LINE.settings, heightScatterM: STATED_ACCURACY_M },
});
const reference = analyzeLine(referenceLine());
const all: LineWarning[] = [...walked.warnings, ...reference.warnings];
const us = displayUnits('us');
const metric = displayUnits('metric');

describe('warnings worded from code and values (issue 13, point 2)', () => {
  it('covers every code the two lines raise', () => {
    const codes = new Set(all.map((w) => w.code));
    for (const code of [
      'static-over-rating',
      'surge-over-rating',
      'siphon-limit',
      'negative-pressure',
      'air-release-needed',
      'washout-needed',
      'velocity-low',
    ]) {
      expect(codes).toContain(code);
    }
  });

  it('a US project reads every figure in feet, psi, gpm and ft/s: no metric figure is left', () => {
    for (const w of all) {
      const { message, fix } = warningText(w, us);
      const text = `${message} ${fix}`;
      expect(text, w.code).not.toMatch(/\d m\b|L\/s|m\/s|kPa|\bch\. \d+(\.\d+)? m/);
      if (w.values.chainageM !== undefined || w.values.fromM !== undefined) expect(text, w.code).toMatch(/ ft\b/);
    }
  });

  it('figures carry thousands separators, in both systems', () => {
    const ridge = walked.warnings.find((w) => w.code === 'siphon-limit')!;
    expect(warningText(ridge, metric).message).toMatch(/ch\. 1,\d{3}\.\d m to 1,\d{3}\.\d m/);
    expect(warningText(ridge, us).message).toMatch(/ch\. 5,\d{3} ft to 5,\d{3} ft/);
  });

  it('words the grouped summit the way the issue asks', () => {
    const grouped = walked.warnings.find((w) => w.code === 'air-release-needed' && (w.values.memberCount ?? 0) > 1)!;
    expect(warningText(grouped, metric).message).toMatch(
      /^\d+ small highs between ch\. [\d,.]+ m to [\d,.]+ m lie within the survey's height scatter of 4\.00 m; the real summit is at ch\. [\d,.]+ m/,
    );
    expect(warningText(grouped, metric).fix).toContain('not at each small high');
  });

  it('pressure findings carry the caution; the CSV has one row per warning with the same words', () => {
    const over = reference.warnings.find((w) => w.code === 'static-over-rating')!;
    expect(warningText(over, us).message).toContain('qualified person');
    const csv = warningsCsv(reference.warnings, us).trim().split('\r\n');
    expect(csv).toHaveLength(reference.warnings.length + 1);
    expect(csv[0]).toBe('Severity,Code,What,Where,Why,Fix');
    expect(csv[1]).toContain('static-over-rating');
  });

  it("the consumer-GPS height warning reads in the project's units", () => {
    const warning = consumerGpsHeightWarning({
      heightSources: ['gps', 'gps'],
      decisions: [{ label: 'fall from start to end', elevationDifferenceM: 1234.5 }],
    })!;
    expect(gpsWarningText(warning, 'us')).toContain('fall from start to end (4,050.2 ft)'); // 1234.5 m / 0.3048 m per ft
    expect(gpsWarningText(warning, 'us')).toContain('wrong by 49 ft'); // 15 m
    expect(gpsWarningText(warning, 'metric')).toContain('(1,234.5 m)');
  });
});
