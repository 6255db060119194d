import { describe, expect, it } from 'vitest';
import { analyzeLine, HydraulicsInputError } from '../../../hydraulics/index';
import type { PumpOutletHead } from '../../../lib/lift/pump-outlet';
import { lineInputOf } from '../../../lib/lines/line-input';
import { ramFeedAnswers } from '../../../lib/lines/ram-feed';
import { lineStartFromRam, ramStartOf, type LineSiteContext } from '../../../lib/lines/ram-start';
import { LineDesignSchema } from '../../../lib/validations/line-design';

const RAM_ID = '0b5f0c1e-4d3a-4f6e-8a1b-2c3d4e5f6a7b';

/** A ram plan as the lift page gives it (figures chosen for the test, not a real site). */
const outlet = (patch: Partial<PumpOutletHead> = {}): PumpOutletHead => ({
  ramSiteId: RAM_ID,
  name: 'Test ram',
  tankId: null,
  tankName: null,
  pumpElevationM: 100,
  workingHeadM: 22.5,
  liftM: 21.3,
  deliveryFrictionM: 1.2,
  deliveredFlowM3s: 5e-5,
  deliveredM3PerDay: 4.32,
  tankFillTimeS: null,
  tankVolumeM3: null,
  efficiency: 0.6,
  efficiencyBasis: 'table',
  efficiencySource: 'test table',
  peakHeadAtPumpM: 80,
  deliveryRatingHeadM: 110,
  caution: 'Surge caution; defer to local codes and licensed practice.',
  ...patch,
});

const stations = [
  { chainageM: 0, groundElevationM: 99 },
  { chainageM: 50, groundElevationM: 108 },
  { chainageM: 100, groundElevationM: 120 },
];

const design = (flow: unknown = { kind: 'pump-delivery' }) =>
  LineDesignSchema.parse({
    start: { kind: 'ram-site', ramSiteId: RAM_ID },
    end: { kind: 'tank-inlet', elevationM: 121.3 },
    flow,
    stretches: [{ fromM: 0, toM: 100, pipe: 'pe100-iso4427-sdr11-50mm' }],
  });

describe('the ram plan as the start of a delivery line', () => {
  it('puts the outlet grade at the pump elevation plus the working head, and the shut grade at the peak head', () => {
    const ram = lineStartFromRam(outlet(), 99);
    expect(ram.start).toEqual({ kind: 'pump', outletHeadM: 122.5, shutoffHeadM: 180 });
    expect(ram.pumpElevationFrom).toBe('ram-site');
  });

  it('takes the ground at the line start when the ram site gives no pump elevation, and says so', () => {
    const ram = lineStartFromRam(outlet({ pumpElevationM: null }), 99);
    expect(ram.pumpElevationM).toBe(99);
    expect(ram.pumpElevationFrom).toBe('line-start');
    expect(ram.start.outletHeadM).toBe(121.5);
  });

  it('never puts the shut grade below the working grade', () => {
    expect(lineStartFromRam(outlet({ peakHeadAtPumpM: 10 }), 99).start.shutoffHeadM).toBe(122.5);
  });

  it("gives the core the ram's delivered flow unless the designer sets one", () => {
    const context: LineSiteContext = { ramOutlets: [outlet()], frostDepthM: null };
    expect(lineInputOf(design(), stations, context).flow).toEqual({ kind: 'design', flowM3s: 5e-5 });
    expect(lineInputOf(design({ kind: 'design', flowM3s: 2e-4 }), stations, context).flow).toEqual({
      kind: 'design',
      flowM3s: 2e-4,
    });
  });

  it("reads the ram again at each analysis: a changed plan moves the line's start", () => {
    const before = lineInputOf(design(), stations, { ramOutlets: [outlet()], frostDepthM: null });
    const after = lineInputOf(design(), stations, { ramOutlets: [outlet({ workingHeadM: 30 })], frostDepthM: null });
    expect(before.start).toMatchObject({ outletHeadM: 122.5 });
    expect(after.start).toMatchObject({ outletHeadM: 130 });
  });

  it("refuses a ram site that is not among the project's planned ones, naming the field", () => {
    try {
      ramStartOf({ kind: 'ram-site', ramSiteId: RAM_ID }, { ramOutlets: [], frostDepthM: null }, 99);
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(HydraulicsInputError);
      expect((error as HydraulicsInputError).field).toBe('start.ramSiteId');
    }
  });

  it("refuses the ram's flow on a line that is not fed by a ram", () => {
    const parsed = LineDesignSchema.safeParse({ ...design(), start: { kind: 'water-level', levelM: 130 } });
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues[0].path).toEqual(['flow', 'kind']);
  });

  it('answers which ram feeds the line and compares its peak head with the pipe at the pump', () => {
    const context: LineSiteContext = { ramOutlets: [outlet()], frostDepthM: null };
    const analysis = analyzeLine(lineInputOf(design(), stations, context));
    const feed = ramFeedAnswers(design(), context, analysis, 99)!;
    expect(feed.outlet.name).toBe('Test ram');
    expect(feed.flowFromRam).toBe(true);
    expect(feed.allowableHeadAtPumpM).toBe(analysis.stretches[0].allowableHeadM);
    expect(feed.peakWithinRating).toBe(80 <= analysis.stretches[0].allowableHeadM);
    expect(
      ramFeedAnswers(design(), context, { stretches: [{ allowableHeadM: 50, pipe: { label: 'weak pipe' } }] }, 99)!
        .peakWithinRating,
    ).toBe(false);
    // The analysis starts from the ram: the grade at ch. 0 is the pump outlet grade, the static line the peak.
    expect(analysis.points.hydraulicGradeM[0]).toBeCloseTo(122.5, 6);
    expect(analysis.points.staticHeadM[0]).toBeCloseTo(180, 6);
    expect(analysis.flowM3s).toBe(5e-5);
  });
});
