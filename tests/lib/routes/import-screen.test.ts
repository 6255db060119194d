import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { buildImportPreview } from '../../../lib/import/preview';
import { initialMappingDraft, mappingToOptions, routeNameFromFile } from '../../../lib/import/mapping-draft';
import { setProjectDecimalMark } from '../../../lib/units/decimal-mark-store';
import { inspectSurveyText } from '../../../lib/survey/inspect';
import { parseSurveyText } from '../../../lib/survey/run-import';

const fixture = (name: string) => readFileSync(path.join(__dirname, '../../fixtures/survey', name), 'utf8');

describe('the import screens’ logic', () => {
  it('inspects a semicolon CSV, guesses the mapping, and the options it builds parse the file', () => {
    const text = fixture('handheld-semicolon.csv').replace(/^\uFEFF/, '');
    const inspection = inspectSurveyText(text);
    expect(inspection).toMatchObject({
      kind: 'csv',
      suggestedFormat: 'gps-csv',
      dialect: { delimiter: ';', decimalComma: true, hasHeader: true },
    });
    if (inspection.kind !== 'csv') throw new Error('csv expected');
    expect(inspection.sampleRows[0]).toEqual(['45,501200', '11,802400', '2665,4', '2024-05-04T07:10:00Z']);
    const draft = initialMappingDraft(inspection, 'handheld_walk-may.csv');
    expect(draft.name).toBe('handheld walk may');
    expect(draft.gps).toMatchObject({
      mapping: { latitude: 0, longitude: 1, elevation: 2, time: 3 },
      elevationUnit: 'ft',
    });
    const built = mappingToOptions(draft, 'metric');
    if (!('options' in built)) throw new Error(JSON.stringify(built.errors));
    const preview = buildImportPreview(parseSurveyText(text, built.options));
    expect(preview.stats.pointCount).toBe(8);
    expect(preview.gpsWarning?.severity).toBe('danger');
  });

  it('suggests field-book formats from their headers and wants a start height, typed in project units', () => {
    const level = inspectSurveyText(fixture('level-book.csv'));
    expect(level.suggestedFormat).toBe('level-book-csv');
    expect(inspectSurveyText(fixture('inclinometer.csv')).suggestedFormat).toBe('inclinometer-csv');
    expect(inspectSurveyText(fixture('stations.csv')).suggestedFormat).toBe('station-csv');
    expect(inspectSurveyText(fixture('walked-route.gpx')).kind).toBe('gpx');
    const draft = initialMappingDraft(level, 'book.csv');
    expect(mappingToOptions(draft, 'us')).toEqual({
      errors: { startElevationM: ['Reduced level of the first station must be a number (ft)'] },
    });
    expect(mappingToOptions(draft, 'metric')).toEqual({
      errors: { startElevationM: ['Reduced level of the first station must be a number (m)'] },
    });
    // Out of range, the bound is stated in the project's units too (9,000 m = 29,527.56 ft).
    const high = { ...draft, fieldBook: { ...draft.fieldBook, startElevation: '30000' } };
    expect(mappingToOptions(high, 'us')).toEqual({
      errors: { startElevationM: ['Reduced level of the first station must be at most 29,527.56 ft'] },
    });
    expect(mappingToOptions({ ...high, fieldBook: { ...high.fieldBook, startElevation: '9500' } }, 'metric')).toEqual({
      errors: { startElevationM: ['Reduced level of the first station must be at most 9,000.00 m'] },
    });
    // Typed with the project's decimal mark: "131,234" in a comma project, "131.234" in a point project.
    setProjectDecimalMark(',');
    const typed = mappingToOptions({ ...draft, fieldBook: { ...draft.fieldBook, startElevation: '131,234' } }, 'us');
    setProjectDecimalMark('.');
    const pointTyped = mappingToOptions(
      { ...draft, fieldBook: { ...draft.fieldBook, startElevation: '131.234' } },
      'us',
    );
    setProjectDecimalMark(null);
    // 131.234 ft × 0.3048 m/ft = 40.0001232 m
    expect(
      'options' in typed && typed.options.format === 'level-book-csv' && typed.options.startElevationM,
    ).toBeCloseTo(40.0001232, 7);
    expect(
      'options' in pointTyped && pointTyped.options.format === 'level-book-csv' && pointTyped.options.startElevationM,
    ).toBeCloseTo(40.0001232, 7);
  });

  it('a delimiter chosen on screen overrides the detected one', () => {
    const inspection = inspectSurveyText('a;b,c\n1;2,3\n4;5,6\n', { delimiter: ';' });
    expect(inspection.kind === 'csv' && inspection.headers).toEqual(['a', 'b,c']);
  });

  it('route names come from file names', () => {
    expect(routeNameFromFile('.gpx')).toBe('Imported route');
  });
});
