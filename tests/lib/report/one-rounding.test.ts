import Papa from 'papaparse';
import { PDFParse } from 'pdf-parse';
import { describe, expect, it } from 'vitest';
import { analyzeLine } from '../../../hydraulics/index';
import type { LineRecord } from '../../../lib/data/lines';
import { cellText, stationColumns, stationRows, stretchColumns, tableCsv } from '../../../lib/lines/results-table';
import { warningsCsv, warningText } from '../../../lib/lines/warning-words';
import { lineReportPdf } from '../../../lib/report/line-report';
import { revisionStamp } from '../../../lib/review/stamp';
import { displayUnits, formatQuantity, type UnitSystem } from '../../../lib/units';
import { LineDesignSchema } from '../../../lib/validations/line-design';
import { referenceDesignParts, referenceLine } from '../../lines/reference-line';

/**
 * One figure, one text: the screen's formatters, the PDF report and the CSV files round a quantity the
 * same way (the quantity table's decimals through formatNumber, thousands grouped with commas).
 */
const squash = (text: string) => text.replace(/\s+/g, ' ');
const analysis = analyzeLine(referenceLine());

const pdfCache = new Map<UnitSystem, Promise<string>>();
const pdfText = (unitSystem: UnitSystem) =>
  pdfCache.get(unitSystem) ?? (pdfCache.set(unitSystem, makePdfText(unitSystem)), pdfCache.get(unitSystem)!);

async function makePdfText(unitSystem: UnitSystem): Promise<string> {
  const design = LineDesignSchema.parse(referenceDesignParts());
  const line: LineRecord = {
    id: '00000000-0000-4000-8000-000000000001',
    projectId: '00000000-0000-4000-8000-000000000002',
    routeId: '00000000-0000-4000-8000-000000000003',
    routeName: 'Spring line design profile',
    name: 'Spring box to house',
    notes: '',
    fromChainageM: null,
    toChainageM: null,
    revision: 3,
    preparedBy: 'Tobias Wren',
    design,
    createdAt: '2026-11-30T10:00:00.000Z',
    updatedAt: '2026-12-01T10:00:00.000Z',
  };
  const pdf = await lineReportPdf({
    project: { name: 'Kestrel Hollow spring line', unitSystem },
    line,
    analysis,
    stamp: revisionStamp({
      number: 3,
      status: 'approved',
      designerName: 'Tobias Wren',
      reviewerName: 'Dara Okafor',
      reviewedAt: '2026-11-30T15:20:00.000Z',
    }),
    generatedAt: new Date('2026-12-01T12:00:00Z'),
  });
  const parser = new PDFParse({ data: new Uint8Array(pdf) });
  const result = await parser.getText();
  await parser.destroy();
  return squash(result.text);
}

describe.each(['us', 'metric'] as const)('one rounding rule on screen, in the PDF and in the CSV (%s)', (system) => {
  const u = displayUnits(system);

  it("a stretch's figures: the stretch table cell, the CSV cell and the PDF stretch schedule agree", async () => {
    const text = await pdfText(system);
    const columns = stretchColumns(u, analysis.settings.waterTemperatureC);
    const [header, ...rows] = Papa.parse<string[]>(tableCsv(columns, analysis.stretches).trim()).data;
    const second = analysis.stretches[1];
    for (const [key, quantity, si] of [
      ['to', 'chainage', second.toM],
      ['length', 'length', second.slopeLengthM],
      ['friction', 'headLoss', second.frictionLossM],
      ['velocity', 'velocity', second.velocityMs],
    ] as const) {
      const column = columns.find((c) => c.key === key)!;
      const screen = formatQuantity(quantity, si, system);
      expect(`${cellText(column, second)} ${screen.split(' ').slice(1).join(' ')}`).toBe(screen);
      expect(rows[1][header.indexOf(column.heading)]).toBe(cellText(column, second));
      expect(text).toContain(screen);
    }
  });

  it('a chainage past a thousand keeps its thousands comma everywhere', async () => {
    const text = await pdfText(system);
    const rows = stationRows(analysis);
    const row = rows.find((r) => r.chainageM === 1400)!;
    const columns = stationColumns(u, analysis.settings.waterTemperatureC);
    const chainage = columns.find((c) => c.key === 'chainage')!;
    const expected = system === 'us' ? '4,593' : '1,400.0'; // 1,400 m = 4,593.2 ft (1 ft = 0.3048 m exactly)
    expect(cellText(chainage, row)).toBe(expected);
    expect(formatQuantity('chainage', 1400, system)).toBe(`${expected} ${u.length}`);
    const [header, ...body] = Papa.parse<string[]>(tableCsv(columns, rows).trim()).data;
    expect(body[body.length - 1][header.indexOf(chainage.heading)]).toBe(expected);
    expect(text).toContain(`${expected} ${u.length}`);
  });

  it('every warning reads the same in the panel, the warnings CSV and the PDF', async () => {
    const text = await pdfText(system);
    const [, ...csvRows] = Papa.parse<string[]>(warningsCsv(analysis.warnings, u).trim()).data;
    expect(csvRows).toHaveLength(analysis.warnings.length);
    analysis.warnings.forEach((w, i) => {
      const words = warningText(w, u).message;
      expect(csvRows[i][4]).toBe(words);
      expect(text).toContain(squash(words).slice(0, 80));
      // No figure of more than three decimals (a metre value with 13 decimals) in any sentence.
      expect(words).not.toMatch(/\d\.\d{4,}/);
    });
  });
});
