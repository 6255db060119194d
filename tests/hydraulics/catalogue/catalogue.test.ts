import { describe, expect, it } from 'vitest';
import { isoWallToleranceMm } from '../../../hydraulics/catalogue/data/pe-iso4427';
import {
  assertPipeSpec,
  findPipe,
  PIPE_CATALOGUE,
  PIPE_SERIES,
  PIPE_SERIES_IDS,
  pipesOfSeries,
} from '../../../hydraulics/catalogue';

const IN = 0.0254;
const PSI = 6894.757293168361;
const inches = (m: number) => m / IN;

describe('catalogue integrity', () => {
  it('every entry passes the guard and has a unique id that starts with its series id', () => {
    const ids = new Set<string>();
    PIPE_SERIES.forEach((series) => {
      series.pipes.forEach((pipe, index) => {
        assertPipeSpec(pipe, series.id, index);
        expect(pipe.id.startsWith(`${series.id}-`)).toBe(true);
        expect(ids.has(pipe.id)).toBe(false);
        ids.add(pipe.id);
      });
    });
    expect(ids.size).toBe(PIPE_CATALOGUE.length);
  });
  it('has the series the standards define', () => {
    expect(PIPE_SERIES_IDS).toEqual(
      expect.arrayContaining([
        'pvc-d2241-sdr13.5',
        'pvc-d2241-sdr17',
        'pvc-d2241-sdr21',
        'pvc-d2241-sdr26',
        'pvc-d2241-sdr32.5',
        'pvc-d2241-sdr41',
        'pe-d2239-sidr7',
        'pe-d2239-sidr9',
        'pe-d2239-sidr11.5',
        'pe-d2239-sidr15',
        'pe-d2239-sidr19',
        'pe100-iso4427-sdr11',
        'pe80-iso4427-sdr11',
        'steel-sch40',
      ]),
    );
  });
  it('is frozen so callers cannot change shared data', () => {
    const pipe = findPipe('pvc-d2241-sdr21-2in')!;
    expect(Object.isFrozen(pipe)).toBe(true);
    expect(Object.isFrozen(PIPE_CATALOGUE)).toBe(true);
  });
  it('pipesOfSeries returns sizes ascending, and nothing for an unknown series', () => {
    const sizes = pipesOfSeries('pvc-d2241-sdr26').map((pipe) => pipe.insideDiameterM);
    expect(sizes).toEqual([...sizes].sort((a, b) => a - b));
    expect(pipesOfSeries('pvc-d2241-sdr26')[0].nominalSize).toBe('1 in');
    expect(pipesOfSeries('no-such-series')).toEqual([]);
    expect(findPipe('no-such-pipe')).toBeUndefined();
  });
});

describe('ASTM D2241 PVC dimensions', () => {
  it('½ in OD = 0.840 in (ASTM D2241-09 Table 1 [R13]); 2 in OD = 2.375 in (Available Plastics table [R13])', () => {
    expect(inches(findPipe('pvc-d2241-sdr13.5-0.5in')!.outsideDiameterM)).toBeCloseTo(0.84, 10);
    expect(inches(findPipe('pvc-d2241-sdr21-2in')!.outsideDiameterM)).toBeCloseTo(2.375, 10);
  });
  it('minimum walls = OD/SDR with a 0.060 in floor (core.md §2.2 [C], regression)', () => {
    expect(inches(findPipe('pvc-d2241-sdr21-3/4in'.replace('3/4', '0.75'))!.wallM)).toBeCloseTo(0.06, 10);
    expect(inches(findPipe('pvc-d2241-sdr21-1in')!.wallM)).toBeCloseTo(0.063, 10);
    expect(inches(findPipe('pvc-d2241-sdr21-2in')!.wallM)).toBeCloseTo(0.113, 10);
    expect(inches(findPipe('pvc-d2241-sdr26-4in')!.wallM)).toBeCloseTo(0.173, 10);
    expect(inches(findPipe('pvc-d2241-sdr17-6in')!.wallM)).toBeCloseTo(0.39, 10);
  });
  it('flow diameters use the published average walls: SDR 21 1/2/4/6 in = 0.073/0.123/0.227/0.335 in (Available Plastics [R13])', () => {
    const averageWall = (id: string) => {
      const pipe = findPipe(id)!;
      return inches(pipe.outsideDiameterM - pipe.insideDiameterM) / 2;
    };
    expect(averageWall('pvc-d2241-sdr21-1in')).toBeCloseTo(0.073, 9);
    expect(averageWall('pvc-d2241-sdr21-2in')).toBeCloseTo(0.123, 9);
    expect(averageWall('pvc-d2241-sdr21-4in')).toBeCloseTo(0.227, 9);
    expect(averageWall('pvc-d2241-sdr21-6in')).toBeCloseTo(0.335, 9);
  });
  it('SDR 26 2/4/6 in average walls 0.101/0.183/0.271 in (Available Plastics [R13])', () => {
    for (const [size, wall] of [
      ['2', 0.101],
      ['4', 0.183],
      ['6', 0.271],
    ] as const) {
      const pipe = findPipe(`pvc-d2241-sdr26-${size}in`)!;
      expect(inches(pipe.outsideDiameterM - pipe.insideDiameterM) / 2).toBeCloseTo(wall, 9);
    }
  });
  it('rates SDR 21 at 200 psi and SDR 26 at 160 psi (ASTM D2241 via homesteady.com [R13])', () => {
    expect(findPipe('pvc-d2241-sdr21-2in')!.pressureRatingPa / PSI).toBeCloseTo(200, 9);
    expect(findPipe('pvc-d2241-sdr26-6in')!.pressureRatingPa / PSI).toBeCloseTo(160, 9);
    expect(findPipe('pvc-d2241-sdr21-2in')!.label).toBe('2 in PVC SDR 21 (200 psi)');
  });
});

describe('ASTM D2239 PE (controlled ID)', () => {
  it('keeps the Schedule 40 ID for every SIDR: 1 in = 1.049 in, 2 in = 2.067 in (Sch 40 table [R13])', () => {
    for (const sidr of [7, 9, 11.5, 15, 19]) {
      expect(inches(findPipe(`pe-d2239-sidr${sidr}-1in`)!.insideDiameterM)).toBeCloseTo(1.049, 10);
      expect(inches(findPipe(`pe-d2239-sidr${sidr}-2in`)!.insideDiameterM)).toBeCloseTo(2.067, 10);
    }
  });
  it('1 in SIDR 15: wall 0.070 in, OD 1.189 in (core.md §2.3 [C], regression); rated 100 psi (Qualpol [R13])', () => {
    const pipe = findPipe('pe-d2239-sidr15-1in')!;
    expect(inches(pipe.wallM)).toBeCloseTo(0.07, 10);
    expect(inches(pipe.outsideDiameterM)).toBeCloseTo(1.189, 10);
    expect(pipe.pressureRatingPa / PSI).toBeCloseTo(100, 9);
    expect(findPipe('pe-d2239-sidr19-2in')!.pressureRatingPa / PSI).toBeCloseTo(80, 9);
  });
});

describe('ISO 4427 / EN 12201 metric PE', () => {
  it('stores the printed walls where rounding OD/SDR up would differ (VESBO PE100 brochure p.3 [R12])', () => {
    expect(findPipe('pe100-iso4427-sdr17-110mm')!.wallM).toBeCloseTo(0.0066, 12);
    expect(findPipe('pe100-iso4427-sdr17-90mm')!.wallM).toBeCloseTo(0.0054, 12);
    expect(findPipe('pe100-iso4427-sdr11-75mm')!.wallM).toBeCloseTo(0.0068, 12);
  });
  it('bores use the mean outside diameter and the mean wall, not the minimum wall (core.md §2.7 [C]): 110 SDR 17 → 96.35 mm, not 96.8', () => {
    // Mean OD 110 + 0.7/2; wall 6.6 + (0.1·6.6 + 0.1 → 0.8)/2 = 7.0 (tolerances of ISO 11922-1 grades B and V, from
    // memory).
    expect(findPipe('pe100-iso4427-sdr17-110mm')!.insideDiameterM * 1000).toBeCloseTo(96.35, 9);
    expect(findPipe('pe100-iso4427-sdr11-110mm')!.insideDiameterM * 1000).toBeCloseTo(110.35 - 2 * (10 + 1.1 / 2), 9);
    for (const id of ['pe100-iso4427-sdr11-20mm', 'pe100-iso4427-sdr17-160mm', 'pe80-iso4427-sdr7.4-63mm']) {
      const pipe = findPipe(id)!;
      expect(pipe.insideDiameterM).toBeLessThan(pipe.outsideDiameterM - 2 * pipe.wallM);
    }
  });
  it('wall tolerance 0.1·e + 0.1 mm rounded up to 0.1 mm (grade V; neutrium ISO 11922 module: max = 1.1 × min + 0.1 [R30])', () => {
    expect(isoWallToleranceMm(2.0)).toBeCloseTo(0.3, 12);
    expect(isoWallToleranceMm(6.6)).toBeCloseTo(0.8, 12);
    expect(isoWallToleranceMm(10.0)).toBeCloseTo(1.1, 12);
    expect(isoWallToleranceMm(3.0)).toBeCloseTo(0.4, 12);
  });
  it('rates PE100 by the printed PN column (VESBO p.3 [R12]) and PE80 SDR 11 at PN 12.5 (veryfocus [R12])', () => {
    const pn = (id: string) => findPipe(id)!.pressureRatingPa / 1e5;
    expect(pn('pe100-iso4427-sdr17-63mm')).toBe(10);
    expect(pn('pe100-iso4427-sdr13.6-63mm')).toBe(12.5);
    expect(pn('pe100-iso4427-sdr11-63mm')).toBe(16);
    expect(pn('pe100-iso4427-sdr9-63mm')).toBe(20);
    expect(pn('pe100-iso4427-sdr7.4-63mm')).toBe(25);
    expect(pn('pe80-iso4427-sdr11-63mm')).toBe(12.5);
  });
  it('omits sizes the table does not list (20 mm SDR 17)', () => {
    expect(findPipe('pe100-iso4427-sdr17-20mm')).toBeUndefined();
  });
});

describe('steel Schedule 40', () => {
  it('1 in and 2 in IDs 1.049 / 2.067 in (Sch 40 table [R13]), OD 2.375 in', () => {
    expect(inches(findPipe('steel-sch40-1in')!.insideDiameterM)).toBeCloseTo(1.049, 10);
    expect(inches(findPipe('steel-sch40-2in')!.insideDiameterM)).toBeCloseTo(2.067, 10);
    expect(inches(findPipe('steel-sch40-2in')!.outsideDiameterM)).toBeCloseTo(2.375, 10);
  });
  it('rates threaded 2 in at 2·20000·(0.875·0.154 − 0.0696)/2.375 psi (Barlow, allowances from memory; regression)', () => {
    expect(findPipe('steel-sch40-2in')!.pressureRatingPa / PSI).toBeCloseTo(
      (40000 * (0.875 * 0.154 - 0.0696)) / 2.375,
      6,
    );
  });
});
