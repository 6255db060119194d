import { PDFParse } from 'pdf-parse';
import { describe, expect, it } from 'vitest';
import { analyzeLine } from '../../../hydraulics/index';
import { profileScene } from '../../../lib/chart/profile-scene';
import { svgToString } from '../../../lib/chart/svg-node';
import type { LineRecord } from '../../../lib/data/lines';
import { lineReportUrl, svgExportScene } from '../../../lib/lines/profile-exports';
import { lineReportPdf, reportProfileScene } from '../../../lib/report/line-report';
import { workingCopyStamp } from '../../../lib/review/stamp';
import { displayUnits } from '../../../lib/units/index';
import { LineDesignSchema } from '../../../lib/validations/line-design';
import { LineReportQuerySchema } from '../../../lib/validations/lines';
import { referenceDesignParts, referenceLine } from '../../lines/reference-line';
import { findAll, parseSvg, type XmlElement } from './svg-tree';

const metric = displayUnits('metric');
const input = referenceLine();
const analysis = analyzeLine(input);
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

/** The exaggeration a drawing really has, from the numbers it writes on its elevation panel. */
function drawnExaggeration(svg: XmlElement): number {
  const g = findAll(svg, (e) => e.attrs['data-panel'] === 'elevation')[0];
  const [left, right] = g.attrs['data-x-range'].split(' ').map(Number);
  const [bottom, top] = g.attrs['data-y-range'].split(' ').map(Number);
  const [lo, hi] = g.attrs['data-y-domain-m'].split(' ').map(Number);
  const horizontal = (right - left) / (Number(svg.attrs['data-to-m']) - Number(svg.attrs['data-from-m']));
  return (bottom - top) / (hi - lo) / horizontal;
}

/** The words the drawing prints about its exaggeration (the element tree keeps no text, so read the file). */
const label = (file: string) => /data-role="exaggeration"[^>]*>([^<]*)</.exec(file)?.[1] ?? '';

/** The three drawings of one line: the screen (at a phone's and a desk's width), the SVG file and the PDF's profile. */
function files(exaggeration: number | 'auto') {
  const screen = (width: number) =>
    svgToString(
      profileScene(analysis, { units: metric, devices: input.devices ?? [], width, exaggeration }, 'screen').root,
    );
  const file = svgToString(
    svgExportScene(analysis, {
      units: metric,
      devices: input.devices ?? [],
      title: 'Spring box to house',
      stamp: workingCopyStamp('Tobias Wren'),
      exaggeration,
    }).root,
  );
  const report = svgToString(reportProfileScene(analysis, line, 'metric', [], exaggeration).root);
  return { phone: screen(390), desk: screen(1100), file, report };
}

function drawings(exaggeration: number | 'auto') {
  const f = files(exaggeration);
  return { phone: parseSvg(f.phone), desk: parseSvg(f.desk), file: parseSvg(f.file), report: parseSvg(f.report) };
}

describe('one vertical exaggeration on screen, in the SVG file and in the PDF', () => {
  for (const setting of ['auto', 8, 25] as const) {
    it(`draws and prints the same exaggeration everywhere (${setting})`, () => {
      const all = drawings(setting);
      const figures = Object.values(all).map(drawnExaggeration);
      for (const f of figures) expect(f).toBeCloseTo(figures[0], 6);
      if (setting !== 'auto') expect(figures[0]).toBeCloseTo(setting, 6);
      const words = Object.values(files(setting)).map(label);
      expect(new Set(words).size).toBe(1);
      expect(words[0]).toMatch(/^Vertical exaggeration ×[\d.]+$/);
    });
  }

  it('fits the whole profile at the set exaggeration: the elevation panel grows with the width instead of cutting the lines', () => {
    const { desk, file } = drawings('auto');
    const heights = [desk, file].map((svg) => {
      const [bottom, top] = findAll(svg, (e) => e.attrs['data-panel'] === 'elevation')[0]
        .attrs['data-y-range'].split(' ')
        .map(Number);
      return bottom - top;
    });
    expect(heights[1]).toBeGreaterThan(heights[0]);
    const ground = Array.from(analysis.points.groundElevationM);
    for (const svg of [desk, file]) {
      const [lo, hi] = findAll(svg, (e) => e.attrs['data-panel'] === 'elevation')[0]
        .attrs['data-y-domain-m'].split(' ')
        .map(Number);
      expect(lo).toBeLessThan(Math.min(...ground));
      expect(hi).toBeGreaterThan(Math.max(...ground));
    }
  });

  it("prints the screen's setting in the PDF report, and the report link carries it", async () => {
    const pdf = await lineReportPdf({
      project: { name: 'Kestrel Hollow spring line', unitSystem: 'metric' },
      line,
      analysis,
      stamp: workingCopyStamp('Tobias Wren'),
      generatedAt: new Date('2026-12-01T12:00:00Z'),
      exaggeration: 8,
    });
    const parser = new PDFParse({ data: new Uint8Array(pdf) });
    const text = (await parser.getText()).text.replace(/\s+/g, ' ');
    await parser.destroy();
    expect(label(files(8).desk)).toBe('Vertical exaggeration ×8.0');
    expect(text).toContain('Vertical exaggeration ×8.0');
    expect(lineReportUrl(line.id, 8)).toBe(`/api/lines/${line.id}/report?exaggeration=8`);
    expect(LineReportQuerySchema.parse({ exaggeration: '8' })).toEqual({ exaggeration: 8 });
    expect(LineReportQuerySchema.parse({})).toEqual({ exaggeration: 'auto' });
    expect(LineReportQuerySchema.safeParse({ exaggeration: '0' }).success).toBe(false);
    expect(LineReportQuerySchema.safeParse({ exaggeration: 'tall' }).success).toBe(false);
  });
});
