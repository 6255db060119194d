import { describe, expect, it } from 'vitest';
import { HydraulicsInputError } from '../../../hydraulics/errors';
import { commissioningResult, type CommissioningReading } from '../../../hydraulics/ram/commissioning';
import { RAM_COMMISSIONING_CHECKLIST, RAM_TROUBLESHOOTING_NOTES } from '../../../hydraulics/ram/commissioning-notes';

// Bucket readings: 10 L in 250 s at the top (2.4 L/min); 10 L in 35 s at the waste valve.
const reading: CommissioningReading = {
  beatsPerMinute: 62,
  delivered: { bucket: { volumeM3: 0.01, seconds: 250 } },
  drive: { wasteFlow: { bucket: { volumeM3: 0.01, seconds: 35 } } },
  supplyHeadM: 2,
  deliveryHeadM: 10.8,
};

describe('commissioningResult', () => {
  it("drive flow = waste + delivered; D'Aubuisson efficiency q·h/(Q·H)", () => {
    const result = commissioningResult({ reading });
    const q = 0.01 / 250;
    const drive = 0.01 / 35 + q;
    expect(result.driveFlowM3s).toBeCloseTo(drive, 15);
    expect(result.measuredEfficiency).toBeCloseTo((q * 10.8) / (drive * 2), 12);
    expect(result.deliveredPerBeatM3).toBeCloseTo((q * 60) / 62, 15);
    expect(result.checks).toEqual([]);
  });

  it('compares with the plan and warns when well below it (common practice, no source)', () => {
    const result = commissioningResult({ reading, plannedEfficiency: 0.9, plannedDeliveredFlowM3s: 0.01 / 200 });
    expect(result.efficiencyRatioToPlan).toBeCloseTo(result.measuredEfficiency / 0.9, 12);
    expect(result.deliveredRatioToPlan).toBeCloseTo(0.8, 12);
    expect(result.checks.map((check) => check.code)).toEqual(['below-planned-efficiency']);
  });

  it('a beat rate far from the usual 60 a minute is noted (USDA bulletin p.27)', () => {
    const check = commissioningResult({ reading: { ...reading, beatsPerMinute: 150 } }).checks[0];
    expect(check.code).toBe('unusual-beat-rate');
    expect(check.source).toMatch(/USDA/);
  });

  it('accepts a direct drive flow instead of a waste bucket', () => {
    const result = commissioningResult({ reading: { ...reading, drive: { driveFlow: { flowM3s: 20 / 60000 } } } });
    expect(result.wasteFlowM3s).toBeCloseTo(20 / 60000 - 0.01 / 250, 15);
  });

  it('rejects a delivered flow at or above the drive flow and bad bucket times, naming the field', () => {
    expect(() => commissioningResult({ reading: { ...reading, drive: { driveFlow: { flowM3s: 1e-6 } } } })).toThrow(
      HydraulicsInputError,
    );
    try {
      commissioningResult({ reading: { ...reading, delivered: { bucket: { volumeM3: 0.01, seconds: 0 } } } });
      expect.unreachable();
    } catch (error) {
      expect((error as HydraulicsInputError).field).toBe('reading.delivered.bucket.seconds');
    }
  });
});

describe('commissioning checklist and troubleshooting notes (common practice, no source, unless named)', () => {
  const text = [...RAM_COMMISSIONING_CHECKLIST, ...RAM_TROUBLESHOOTING_NOTES].map((note) => note.text).join(' ');
  it('say the things the trade knows', () => {
    expect(text).toMatch(/delivery line .*(empty|open)/);
    expect(text).toMatch(/up to a hundred/);
    expect(text).toMatch(/[Aa]ir in the drive pipe/);
    expect(text).toMatch(/settling bucket or box/);
    expect(text).toMatch(/frost depth/);
  });
  it('every note has a source or says it has none', () => {
    for (const note of [...RAM_COMMISSIONING_CHECKLIST, ...RAM_TROUBLESHOOTING_NOTES])
      expect(note.source.length).toBeGreaterThan(5);
  });
});
