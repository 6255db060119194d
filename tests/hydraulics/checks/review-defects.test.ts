import { describe, expect, it } from 'vitest';
import { analyzeLine, findLimitRanges, findLowPoints, type LineInput } from '../../../hydraulics/index';

const f64 = (values: number[]) => Float64Array.from(values);

describe('rating warnings name the pipe that is over its rating (review defect, issue 13)', () => {
  // Falling to ch. 200 in PN 8 pipe, then rising in PN 16: the static pressure peaks AT the boundary,
  // inside the PN 8 stretch's range. Ratings: ISO 4427-2 PN = 20 e sigma / (d - e) via the catalogue [R12].
  const input: LineInput = {
    stations: [
      [0, 300],
      [100, 250],
      [200, 200],
      [300, 230],
      [400, 260],
    ].map(([chainageM, groundElevationM]) => ({ chainageM, groundElevationM })),
    stretches: [
      { fromM: 0, toM: 200, pipe: 'pe80-iso4427-sdr17-50mm' },
      { fromM: 200, toM: 400, pipe: 'pe100-iso4427-sdr11-50mm' },
    ],
    start: { kind: 'water-level', levelM: 301 },
    end: { kind: 'outlet', elevationM: 260, residualHeadM: 3 },
    flow: { kind: 'design', flowM3s: 0.0005 },
  };
  const analysis = analyzeLine(input);

  it('static over-rating whose worst point is the stretch boundary names the upstream (PN 8) pipe', () => {
    const over = analysis.warnings.find((w) => w.code === 'static-over-rating')!;
    expect(over.values.worstChainageM).toBeCloseTo(200, 6);
    expect(over.values.pipeId).toBe('pe80-iso4427-sdr17-50mm');
    expect(over.message).toContain(analysis.stretches[0].pipe.label);
    expect(over.values.limitHeadM).toBeCloseTo(analysis.stretches[0].allowableHeadM, 9);
  });

  it('surge over-rating at the same boundary names the same pipe', () => {
    const surge = analysis.warnings.find((w) => w.code === 'surge-over-rating');
    expect(surge).toBeDefined();
    expect(surge!.values.pipeId).toBe('pe80-iso4427-sdr17-50mm');
  });
});

describe('one rule for low points (review defect, issue 13)', () => {
  // A 0.7 m sag: below the 1 m washout rule (common practice, no source), so neither a washout
  // nor a winter drain point; before, the drain-point finder used 0.5 m and found it.
  const profile = { chainageM: [0, 50, 100, 150, 200], elevationM: [110, 100, 99.3, 100, 95] };

  it("findLowPoints defaults to the washout check's tolerance", () => {
    expect(findLowPoints(profile)).toEqual([]);
  });

  it('and the line check agrees on the same pipe profile', () => {
    const analysis = analyzeLine({
      stations: profile.chainageM.map((chainageM, i) => ({ chainageM, groundElevationM: profile.elevationM[i] })),
      stretches: [{ fromM: 0, toM: 200, pipe: 'pe100-iso4427-sdr11-50mm' }],
      start: { kind: 'water-level', levelM: 111 },
      end: { kind: 'free-discharge' },
      flow: { kind: 'design', flowM3s: 0.0005 },
    });
    expect(analysis.warnings.filter((w) => w.code === 'washout-needed')).toEqual([]);
  });
});

describe('findLimitRanges: ranges the survey cannot resolve merge (issue 13)', () => {
  const args = {
    chainageM: f64([0, 10, 20, 30, 40, 50, 60]),
    // Suction dips twice with a 0.5 m return between: one range with 4 m scatter, two without.
    valueM: f64([2, -3, 0.5, -6, 1, 9, -1]),
    dropAtPointM: null,
    limitM: 0,
    side: 'below' as const,
  };

  it('without scatter: three ranges', () => {
    expect(findLimitRanges(args)).toHaveLength(3);
  });

  it('with 4 m scatter: the first two merge with their worst point; a return of 9 m keeps the third apart', () => {
    const ranges = findLimitRanges({ ...args, mergeWithinM: 4 });
    expect(ranges).toHaveLength(2);
    expect(ranges[0].fromM).toBeCloseTo(4, 12);
    expect(ranges[0].toM).toBeCloseTo(30 + 10 * (6 / 7), 12);
    expect(ranges[0].worstExcessM).toBe(6);
    expect(ranges[0].worstChainageM).toBe(30);
  });
});

describe('the static pressure arriving at a break-pressure tank counts (review defect, issue 13)', () => {
  // Falls 100 m to a tank at ch. 200 whose water stands at the ground: the pipe just above the tank
  // holds the full 101 m of static head (hydrostatics: static head = water level above the pipe).
  const input: LineInput = {
    stations: [
      [0, 200],
      [100, 150],
      [200, 100],
      [300, 90],
      [400, 80],
    ].map(([chainageM, groundElevationM]) => ({ chainageM, groundElevationM })),
    stretches: [{ fromM: 0, toM: 400, pipe: 'pe100-iso4427-sdr11-50mm' }],
    devices: [{ kind: 'break-pressure-tank', chainageM: 200 }],
    start: { kind: 'water-level', levelM: 201 },
    end: { kind: 'free-discharge' },
    flow: { kind: 'design', flowM3s: 0.0005 },
    settings: { defaultCoverM: 0 },
  };

  it("the stretch's highest static head is the 101 m arriving at the tank, not the 51 m upstream", () => {
    expect(analyzeLine(input).stretches[0].maxStaticPressureHeadM).toBeCloseTo(101, 9);
  });
});

describe("the practical siphon limit scales with the site's atmospheric head (review defect, issue 13)", () => {
  // 7.5 m of suction at sea level, where 1 atm = 10.33 m [R7]; ISA atmosphere p = 101325 (1 - 2.25577e-5 h)^5.25588
  // (docs/references/core.md §1.6).
  const atSite = (siteAltitudeM: number) =>
    analyzeLine({
      stations: [
        [0, 100],
        [100, 104],
        [200, 90],
      ].map(([chainageM, groundElevationM]) => ({ chainageM, groundElevationM })),
      stretches: [{ fromM: 0, toM: 200, pipe: 'pe100-iso4427-sdr11-50mm' }],
      start: { kind: 'water-level', levelM: 99.5 },
      end: { kind: 'free-discharge' },
      flow: { kind: 'design', flowM3s: 0.0005 },
      settings: { siteAltitudeM, defaultCoverM: 0 },
    });

  it('is 7.5 m at sea level', () => {
    expect(atSite(0).limits.siphonLimitHeadM).toBeCloseTo(7.5, 9);
  });

  it('at 3,000 m keeps the same share of the atmosphere (p/p0 = 0.692 by ISA) and stays below the vapour limit', () => {
    const { limits } = atSite(3000);
    expect(limits.siphonLimitHeadM).toBeCloseTo(7.5 * Math.pow(1 - 2.25577e-5 * 3000, 5.25588), 2);
    expect(limits.siphonLimitHeadM).toBeLessThan(limits.vapourLimitHeadM);
  });

  it('so a 4.5 m suction at 4,000 m is beyond the siphon limit (a fixed 7.5 m gave no warning above about 2,300 m)', () => {
    const codes = atSite(4000).warnings.map((w) => w.code);
    expect(codes).toContain('siphon-limit');
  });
});

describe('default pipe cover is common burial practice, not 0 m (review defect, issue 13)', () => {
  it('a station without cover puts the pipe 0.75 m below ground (common practice, no source)', () => {
    const analysis = analyzeLine({
      stations: [
        { chainageM: 0, groundElevationM: 100 },
        { chainageM: 100, groundElevationM: 90 },
      ],
      stretches: [{ fromM: 0, toM: 100, pipe: 'pe100-iso4427-sdr11-50mm' }],
      start: { kind: 'water-level', levelM: 101 },
      end: { kind: 'free-discharge' },
      flow: { kind: 'design', flowM3s: 0.0005 },
    });
    expect(analysis.settings.defaultCoverM).toBe(0.75);
    expect(analysis.points.pipeElevationM[1]).toBeCloseTo(89.25, 12);
  });
});

describe("a summit above the source's water level is a true siphon (review defect, issue 13; profile-and-checks.md §2.2)", () => {
  // BC Factsheet 590.304-5 "Water Flow, Air Locks and Siphons" [R10]: a pipe above the hydraulic
  // (static) line only runs as a siphon, must be primed and loses its prime as air collects.
  const line = (flowM3s: number): LineInput => ({
    stations: [
      [0, 100],
      [100, 103],
      [200, 80],
    ].map(([chainageM, groundElevationM]) => ({ chainageM, groundElevationM })),
    stretches: [{ fromM: 0, toM: 200, pipe: 'pe100-iso4427-sdr11-50mm' }],
    start: { kind: 'water-level', levelM: 101 },
    end: { kind: 'free-discharge' },
    flow: { kind: 'design', flowM3s },
    settings: { defaultCoverM: 0 },
  });

  it('is reported as a danger with its range and height above the source, even with no flow', () => {
    const still = analyzeLine(line(0)).warnings;
    const siphon = still.find((w) => w.code === 'true-siphon')!;
    expect(siphon.severity).toBe('danger');
    expect(siphon.values.headM).toBeCloseTo(2, 9);
    expect(siphon.values.worstChainageM).toBe(100);
    expect(siphon.message).toContain('must be primed');
    // No "while flowing" suction when nothing flows.
    expect(still.map((w) => w.code)).not.toContain('negative-pressure');
  });

  it('and while flowing too', () => {
    expect(analyzeLine(line(0.0005)).warnings.map((w) => w.code)).toContain('true-siphon');
  });
});
