import { PDFParse } from 'pdf-parse';
import { describe, expect, it } from 'vitest';
import { analyzeLine, PRESSURE_CAUTION } from '../../../hydraulics/index';
import type { LineRecord } from '../../../lib/data/lines';
import { LINE_CAUTIONS } from '../../../lib/lines/cautions';
import { warningText } from '../../../lib/lines/warning-words';
import { displayUnits } from '../../../lib/units';
import { WARNING_TITLES } from '../../../lib/lines/warning-words';
import { revisionStamp } from '../../../lib/review/stamp';
import { lineReportPdf } from '../../../lib/report/line-report';
import { LineDesignSchema } from '../../../lib/validations/line-design';
import { referenceDesignParts, referenceLine } from '../../lines/reference-line';

const squash = (text: string) => text.replace(/\s+/g, ' ');

async function reportText(
  unitSystem: 'metric' | 'us',
  change: (input: ReturnType<typeof referenceLine>) => ReturnType<typeof referenceLine> = (i) => i,
  withPlan = false,
) {
  const input = change(referenceLine());
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
    revision: 40,
    preparedBy: 'Tobias Wren',
    design,
    createdAt: '2026-11-30T10:00:00.000Z',
    updatedAt: '2026-12-01T10:00:00.000Z',
  };
  const analysis = analyzeLine(input);
  const stations = withPlan
    ? Array.from(analysis.points.chainageM, (c) => ({
        chainageM: c,
        latitudeDeg: 54.2 + c / 111_000,
        longitudeDeg: -2.9 + Math.sin(c / 300) / 400,
      }))
    : [];
  const pdf = await lineReportPdf({
    project: { name: 'Kestrel Hollow spring line', unitSystem },
    line,
    analysis,
    stations,
    stamp: revisionStamp({
      number: 7,
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
  return { pdf, text: squash(result.text), pages: result.total, analysis };
}

describe('line design report (PDF)', () => {
  it('never reports a design flow the line cannot carry as delivered, and names the friction formula', async () => {
    const found = analyzeLine({ ...referenceLine(), flow: { kind: 'find' } });
    const { text } = await reportText('metric', (input) => ({
      ...input,
      flow: { kind: 'design', flowM3s: found.flowM3s * 1.5 },
    }));
    expect(text).toMatch(
      /Flow delivered: at most [\d.,]+ L\/s \(the design flow of [\d.,]+ L\/s is more than the line carries by gravity\)/,
    );
    expect(text).toMatch(/Friction by (Hazen-Williams|Darcy-Weisbach)/);
  });

  it('parses, runs to several pages and carries the title block', async () => {
    const { pdf, text, pages } = await reportText('metric');
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    expect(pages).toBeGreaterThanOrEqual(2);
    for (const words of [
      'Spring box to house: line design report',
      'Kestrel Hollow spring line',
      'Tobias Wren',
      'Dara Okafor',
      'Revision 7',
      'Approved',
      '2026-11-30',
      '2026-12-01',
    ]) {
      expect(text).toContain(words);
    }
  });

  it('lists every warning with its words, the stretch schedule, the devices and the assumptions', async () => {
    const { text, analysis } = await reportText('metric');
    expect(analysis.warnings.length).toBeGreaterThan(3);
    for (const w of analysis.warnings) {
      expect(text).toContain(WARNING_TITLES[w.code]);
      // The report words each warning from its code and values, as the screen does.
      expect(text).toContain(squash(warningText(w, displayUnits('metric')).message).slice(0, 60));
    }
    for (const words of [
      'Stretch schedule',
      '40 mm PE80 SDR 17 (PN 8)',
      'Devices by chainage',
      'Air-release valve',
      'Assumptions',
      'Hazen-Williams',
      '20 °C',
    ]) {
      expect(text).toContain(words);
    }
  });

  it('draws the plan of the line when its stations have positions, and heads the later pages', async () => {
    const without = await reportText('metric');
    expect(without.text).not.toContain('Plan of the line');
    const withPlan = await reportText('metric', (i) => i, true);
    expect(withPlan.text).toContain('Plan of the line');
    expect(withPlan.pages).toBe(without.pages + 1);
    expect(withPlan.text).toContain('Kestrel Hollow spring line · Spring box to house · line design report');
  });

  it('carries the cautions: pressure, surge, trenching and drinking water', async () => {
    const { text } = await reportText('metric');
    expect(text).toContain(squash(PRESSURE_CAUTION));
    for (const c of LINE_CAUTIONS) expect(text).toContain(squash(`${c.title}. ${c.text}`).slice(0, 120));
  });

  it('states figures in US units for a US project', async () => {
    const { text, analysis } = await reportText('us');
    expect(text).toContain('US customary');
    expect(text).toContain('gpm');
    expect(text).toContain('psi');
    const over = analysis.warnings.find((w) => w.code === 'static-over-rating')!;
    const words = warningText(over, displayUnits('us')).message;
    expect(words).toMatch(/ ft /);
    expect(words).not.toMatch(/\d m\b/);
    expect(text).toContain(squash(words).slice(0, 60));
  });
});
