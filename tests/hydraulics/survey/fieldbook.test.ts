import { describe, expect, it } from 'vitest';
import { reduceInclinometerLeg, reduceInclinometerTraverse } from '../../../hydraulics/survey/fieldbook/inclinometer';
import { reduceLevelBook, type LevelBookReading } from '../../../hydraulics/survey/fieldbook/level-book';

describe('reduceInclinometerLeg', () => {
  it('zenith 45°26′30″, slope 123.213 m → horizontal 87.794 m (Taiwan civil-service exam 2015, Surveying, Q1, answer B; OpenTWBench tw-surveying-bench)', () => {
    const verticalAngle = 90 - (45 + 26 / 60 + 30 / 3600);
    const r = reduceInclinometerLeg({ slopeDistanceM: 123.213, verticalAngle, angleUnit: 'degrees' });
    expect(r.horizontalDistanceM.toFixed(3)).toBe('87.794');
  });

  it('25 m along a 9° slope → 24.6 m horizontal (Suunto Tandem instruction manual, Fig. 11 “Method 2”, cos 9° taken as 0.987; published to 0.1 m)', () => {
    const r = reduceInclinometerLeg({ slopeDistanceM: 25, verticalAngle: 9, angleUnit: 'degrees' });
    expect(Math.abs(r.horizontalDistanceM - 24.6)).toBeLessThan(0.1);
    expect(r.heightDifferenceM).toBeCloseTo(25 * Math.sin((9 * Math.PI) / 180), 12);
  });

  it('percent grade: 100 % is 45°, and Δh/horizontal equals the grade exactly (closed form)', () => {
    const r = reduceInclinometerLeg({ slopeDistanceM: 10, verticalAngle: 100, angleUnit: 'percent' });
    expect(r.verticalAngleDeg).toBeCloseTo(45, 12);
    const g = reduceInclinometerLeg({ slopeDistanceM: 30, verticalAngle: -12, angleUnit: 'percent' });
    expect(g.heightDifferenceM / g.horizontalDistanceM).toBeCloseTo(-0.12, 12);
    expect(Math.hypot(g.horizontalDistanceM, g.heightDifferenceM)).toBeCloseTo(30, 12);
  });

  it('downhill angles give negative height difference; 0° gives the tape length', () => {
    expect(
      reduceInclinometerLeg({ slopeDistanceM: 20, verticalAngle: -30, angleUnit: 'degrees' }).heightDifferenceM,
    ).toBeCloseTo(-10, 12);
    expect(
      reduceInclinometerLeg({ slopeDistanceM: 20, verticalAngle: 0, angleUnit: 'degrees' }).horizontalDistanceM,
    ).toBe(20);
  });

  it('rejects a vertical angle of 95° and a negative distance', () => {
    expect(() => reduceInclinometerLeg({ slopeDistanceM: 20, verticalAngle: 95, angleUnit: 'degrees' })).toThrow(
      'verticalAngle: a vertical angle must be between -90 and 90 degrees, got 95',
    );
    expect(() => reduceInclinometerLeg({ slopeDistanceM: -1, verticalAngle: 5, angleUnit: 'degrees' })).toThrow(
      /slopeDistanceM: must not be negative/,
    );
  });

  it('a traverse chains legs from the start mark', () => {
    const st = reduceInclinometerTraverse({
      startElevationM: 100,
      legs: [
        { slopeDistanceM: 20, verticalAngle: 30, angleUnit: 'degrees' },
        { slopeDistanceM: 20, verticalAngle: -30, angleUnit: 'degrees' },
      ],
    });
    expect(st.map((s) => s.elevationM)).toEqual([100, expect.closeTo(110, 12), expect.closeTo(100, 12)]);
    expect(st[2].chainageM).toBeCloseTo(40 * Math.cos(Math.PI / 6), 12);
    expect(st[2].slopeChainageM).toBe(40);
  });
});

// Published level book: Department of Surveying and Land Studies, The Papua New Guinea University
// of Technology, lecture “Level Books & Arithmetic Checks” (LECTURE TWO, scribd 462952948),
// height-of-collimation booking with BM1 = 40.000 m and an inverted staff at D (booked −2.956).
const UNITECH_BOOK: LevelBookReading[] = [
  { label: 'BM1', backsightM: 6.482 },
  { label: 'CP1', backsightM: 5.844, foresightM: 2.159 },
  { label: 'C', intermediateM: 3.141 },
  { label: 'D', intermediateM: -2.956 },
  { label: 'E', intermediateM: 5.6 },
  { label: 'CP2', backsightM: 4.298, foresightM: 7.318 },
  { label: 'F', intermediateM: 3.015 },
  { label: 'BM2', foresightM: 4.264 },
];
const PUBLISHED_RL = [40.0, 44.323, 47.026, 53.123, 44.567, 42.849, 44.132, 42.883];

describe('reduceLevelBook against the published PNG Unitech example', () => {
  it('height of collimation: HI 46.482 / 50.167 / 47.147 and the published reduced levels (to 1 mm)', () => {
    const r = reduceLevelBook({ readings: UNITECH_BOOK, startElevationM: 40, method: 'height-of-collimation' });
    r.stations.forEach((s, i) => expect(s.reducedLevelM).toBeCloseTo(PUBLISHED_RL[i], 3));
    expect(r.stations[0].heightOfCollimationM).toBeCloseTo(46.482, 9);
    expect(r.stations[2].heightOfCollimationM).toBeCloseTo(50.167, 9);
    expect(r.stations[7].heightOfCollimationM).toBeCloseTo(47.147, 9);
    expect(r.sumBacksightM).toBeCloseTo(16.624, 9);
    expect(r.sumForesightM).toBeCloseTo(13.741, 9);
    expect(r.backsightMinusForesightM).toBeCloseTo(2.883, 9);
    expect(Math.abs(r.arithmeticCheckM)).toBeLessThan(1e-9);
  });

  it('rise and fall gives the same levels, and ΣRise − ΣFall = ΣBS − ΣFS = 2.883 m', () => {
    const r = reduceLevelBook({ readings: UNITECH_BOOK, startElevationM: 40, method: 'rise-and-fall' });
    r.stations.forEach((s, i) => expect(s.reducedLevelM).toBeCloseTo(PUBLISHED_RL[i], 3));
    expect(r.stations[3].riseM).toBeCloseTo(6.097, 9); // 3.141 − (−2.956): inverted staff
    expect(r.stations[4].fallM).toBeCloseTo(8.556, 9);
    expect(r.riseMinusFallM).toBeCloseTo(2.883, 9);
  });

  it('closure error against a known closing level (closing level assumed 42.880 m for this test: +3 mm)', () => {
    const r = reduceLevelBook({
      readings: UNITECH_BOOK,
      startElevationM: 40,
      method: 'rise-and-fall',
      closingElevationM: 42.88,
    });
    expect(r.closureErrorM).toBeCloseTo(0.003, 9);
    expect(
      reduceLevelBook({ readings: UNITECH_BOOK, startElevationM: 40, method: 'rise-and-fall' }).closureErrorM,
    ).toBeUndefined();
  });

  it('a missing foresight is named with its line index', () => {
    const book = UNITECH_BOOK.map((r) => ({ ...r }));
    delete book[5].foresightM;
    expect(() => reduceLevelBook({ readings: book, startElevationM: 40, method: 'rise-and-fall' })).toThrow(
      /readings.foresightM\[5\]: missing foresight/,
    );
    const open = UNITECH_BOOK.slice(0, 7);
    expect(() => reduceLevelBook({ readings: open, startElevationM: 40, method: 'rise-and-fall' })).toThrow(
      /\[6\]: missing foresight: the run must close/,
    );
  });

  it('rejects a first line that is not a backsight and an intermediate sharing a line', () => {
    expect(() =>
      reduceLevelBook({
        readings: [{ foresightM: 1 }, { foresightM: 1 }],
        startElevationM: 0,
        method: 'rise-and-fall',
      }),
    ).toThrow(/first line must be a backsight/);
    expect(() =>
      reduceLevelBook({
        readings: [{ backsightM: 1 }, { intermediateM: 1, foresightM: 2 }],
        startElevationM: 0,
        method: 'rise-and-fall',
      }),
    ).toThrow(/intermediate sight cannot share a line/);
  });
});
