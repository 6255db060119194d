import { PDFParse } from 'pdf-parse';
import { describe, expect, it } from 'vitest';
import { analyzeLine } from '../../../hydraulics/index';
import type { LineRecord } from '../../../lib/data/lines';
import type { PumpOutletHead } from '../../../lib/lift/pump-outlet';
import { lineInputOf } from '../../../lib/lines/line-input';
import type { LineSiteContext } from '../../../lib/lines/ram-start';
import { workingCopyStamp } from '../../../lib/review/stamp';
import { lineReportPdf } from '../../../lib/report/line-report';
import { LineDesignSchema, type LineDesignInput } from '../../../lib/validations/line-design';

const squash = (text: string) => text.replace(/\s+/g, ' ');
const US_GAL = 0.003785411784;
const RAM_ID = '00000000-0000-4000-8000-0000000000aa';

const outlet: PumpOutletHead = {
  ramSiteId: RAM_ID,
  name: 'Test weir ram',
  tankId: 't',
  tankName: 'Test knoll tank',
  pumpElevationM: 99,
  workingHeadM: 23,
  liftM: 21.3,
  deliveryFrictionM: 1.7,
  deliveredFlowM3s: (900 * US_GAL) / 86_400,
  deliveredM3PerDay: 900 * US_GAL,
  tankFillTimeS: 5 * 3600 + 30 * 60,
  tankVolumeM3: 1,
  efficiency: 0.58,
  efficiencyBasis: 'table',
  efficiencySource: 'Test efficiency table, p. 1',
  peakHeadAtPumpM: 60,
  deliveryRatingHeadM: 110,
  caution: 'Ram surge test caution: defer to local codes and licensed practice.',
};

/** Pipe laid on the ground (no cover): low start at ch. 0, one sag at ch. 50 m, rising to the tank. */
const stations = [
  { chainageM: 0, groundElevationM: 99 },
  { chainageM: 30, groundElevationM: 104 },
  { chainageM: 50, groundElevationM: 101 },
  { chainageM: 70, groundElevationM: 110 },
  { chainageM: 100, groundElevationM: 120 },
];

async function reportText(designParts: LineDesignInput, context: LineSiteContext) {
  const design = LineDesignSchema.parse(designParts);
  const line: LineRecord = {
    id: '00000000-0000-4000-8000-000000000001',
    projectId: '00000000-0000-4000-8000-000000000002',
    routeId: '00000000-0000-4000-8000-000000000003',
    routeName: 'Test delivery route',
    name: 'Ram delivery',
    notes: '',
    fromChainageM: null,
    toChainageM: null,
    revision: 3,
    preparedBy: 'Test designer',
    design,
    createdAt: '2026-11-30T10:00:00.000Z',
    updatedAt: '2026-12-01T10:00:00.000Z',
  };
  const analysis = analyzeLine(lineInputOf(design, stations, context));
  const pdf = await lineReportPdf({
    project: { name: 'Test project', unitSystem: 'us' },
    line,
    analysis,
    context,
    startGroundM: 99,
    stamp: workingCopyStamp('Test designer'),
    generatedAt: new Date('2026-12-01T12:00:00Z'),
  });
  const parser = new PDFParse({ data: new Uint8Array(pdf) });
  const result = await parser.getText();
  await parser.destroy();
  return squash(result.text);
}

const parts = (overrides: Partial<LineDesignInput> = {}): LineDesignInput => ({
  start: { kind: 'ram-site', ramSiteId: RAM_ID },
  end: { kind: 'tank-inlet', elevationM: 120.3 },
  flow: { kind: 'pump-delivery' },
  stretches: [{ fromM: 0, toM: 100, pipe: 'pe100-iso4427-sdr11-50mm' }],
  winter: { treatment: 'drained-for-winter' },
  ...overrides,
});

describe('line report: lift and winter sections', () => {
  it('has a Lift section for a line fed by a ram: site, delivery per day, fill time, efficiency with its source, surge caution', async () => {
    const text = await reportText(parts(), { ramOutlets: [outlet], frostDepthM: 1.0 });
    for (const words of [
      'Lift',
      'Test weir ram',
      'Delivered flow per day',
      '900 US gal/day',
      'Test knoll tank from empty in 5.5 h',
      '58 %, from Test efficiency table, p. 1',
      'Peak head at the pump, line shut',
      squash(outlet.caution),
    ])
      expect(text).toContain(words);
  });

  it('states the winter treatment and the drain points by chainage in project units', async () => {
    const text = await reportText(parts(), { ramOutlets: [outlet], frostDepthM: 1.0 });
    expect(text).toContain('Through winter the line is drained for winter');
    expect(text).toContain('Site frost depth: 3.28 ft');
    expect(text).toMatch(/ch\. 0 ft low start/);
    expect(text).toMatch(/ch\. 164 ft low point/);
  });

  it('has no Lift section for a line fed from a water surface, and warns of a shallow line left full', async () => {
    const text = await reportText(
      parts({
        start: { kind: 'water-level', levelM: 125 },
        flow: { kind: 'design', flowM3s: 1e-4 },
        winter: { treatment: 'buried-below-frost' },
      }),
      { ramOutlets: [outlet], frostDepthM: 1.0 },
    );
    expect(text).not.toContain('Test weir ram');
    expect(text).not.toContain('Delivered flow per day');
    expect(text).toContain('Shallower than frost');
    expect(text).not.toContain('Drain point');
    expect(text).not.toContain('low start');
  });
});
