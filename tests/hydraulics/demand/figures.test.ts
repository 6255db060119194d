import { describe, expect, it } from 'vitest';
import { IMPERIAL_GALLON_M3, US_GALLON_M3 } from '../../../hydraulics/constants';
import { GARDEN_DEPTH_FIGURES } from '../../../hydraulics/demand/garden-figures';
import { LIVESTOCK_DEMAND_FIGURES } from '../../../hydraulics/demand/livestock-figures';
import { PER_PERSON_DEMAND_FIGURES } from '../../../hydraulics/demand/per-person-figures';

const perPerson = (id: string) => PER_PERSON_DEMAND_FIGURES.find((figure) => figure.id === id)!;
const stock = (id: string) => LIVESTOCK_DEMAND_FIGURES.find((figure) => figure.id === id)!;

describe('per-person demand defaults (core.md §3.5)', () => {
  it.each([
    // [id, litres per person per day, source named in the data]
    ['survival-minimum', 7.5, 'Sphere Project 2011 (via OpenLearn Create, Table 14.1)'],
    ['emergency-minimum', 15, 'WHO emergencies Q&A (via WASH helpdesk blog 2007)'],
    ['basic-access', 20, 'UNDP HDR 2006 (via digital-campus)'],
    ['village-ram-supply', 40, 'Water for the World, Technical Note RWS.4.D.5 Designing a Hydraulic Ram Pump (USAID)'],
    ['most-needs', 50, 'UNDP HDR 2006 (via digital-campus)'],
    ['indian-standard-household', 135, 'Indian Standard per-capita breakdown (quoted in a scribd tank-sizing note)'],
  ])('%s is %d L/person/day as published', (id, litres, source) => {
    expect(perPerson(id).perPersonM3PerDay).toBeCloseTo(litres / 1000, 12);
    expect(perPerson(id).published).toEqual({ value: litres, unit: 'L/person/day' });
    expect(perPerson(id).source).toBe(source);
  });

  it('US rural planning figure: 50 US gal/person/day (J. Renewable Energy 2017 Table 1), kept in US gallons', () => {
    const figure = perPerson('us-rural-home');
    expect(figure.published).toEqual({ value: 50, unit: 'US gal/person/day' });
    expect(figure.perPersonM3PerDay * 1000).toBeCloseTo(189.27, 2);
  });

  it('every figure names a source', () => {
    for (const figure of PER_PERSON_DEMAND_FIGURES) expect(figure.source.length).toBeGreaterThan(10);
  });
});

describe("livestock defaults (AAFC / PFRA Stockman's Guide, core.md §3.6, imperial gallons)", () => {
  it.each([
    // [id, winter L, summer L, winter imp gal, summer imp gal] as printed
    ['lactating-cow', 77, 95, 17, 21],
    ['cow-calf-pair', 50, 68, 11, 15],
    ['dry-cow', 36, 55, 8, 12],
    ['finishing-cattle', 55, 86, 12, 19],
    ['bull', 36, 55, 8, 12],
    ['horse', 36, 55, 8, 12],
    ['sheep', 3.6, 14, 0.8, 3],
  ])('%s: %d L winter, %d L summer', (id, winterL, summerL, winterGal, summerGal) => {
    const figure = stock(id);
    expect(figure.winterPerHeadM3PerDay).toBeCloseTo(winterL / 1000, 12);
    expect(figure.summerPerHeadM3PerDay).toBeCloseTo(summerL / 1000, 12);
    expect(figure.published).toEqual({
      winterLitres: winterL,
      summerLitres: summerL,
      winterImperialGallons: winterGal,
      summerImperialGallons: summerGal,
    });
    expect(figure.note).toMatch(/imperial gallons/);
  });

  it("the printed litres are imperial, not US, gallons (each within the source's rounding of 1 L)", () => {
    for (const figure of LIVESTOCK_DEMAND_FIGURES) {
      const { winterLitres, winterImperialGallons, summerLitres, summerImperialGallons } = figure.published;
      expect(Math.abs(winterImperialGallons * IMPERIAL_GALLON_M3 * 1000 - winterLitres)).toBeLessThan(1);
      expect(Math.abs(summerImperialGallons * IMPERIAL_GALLON_M3 * 1000 - summerLitres)).toBeLessThan(1);
      // Read as US gallons the larger figures would be off by more than the rounding.
      if (summerImperialGallons >= 12)
        expect(Math.abs(summerImperialGallons * US_GALLON_M3 * 1000 - summerLitres)).toBeGreaterThan(5);
    }
  });

  it('flags the garbled calf row and keeps the upper end of the growing-cattle range', () => {
    expect(stock('calf').uncertain).toBe(true);
    expect(stock('growing-cattle').winterPerHeadM3PerDay).toBeCloseTo(0.036, 12);
    expect(stock('growing-cattle').note).toMatch(/23-36/);
  });
});

describe('garden depth defaults (core.md §3.7)', () => {
  it('vegetables: 1 inch a week (NC State guidance via 98905.com) = 3.63 mm/day', () => {
    const figure = GARDEN_DEPTH_FIGURES.find((entry) => entry.id === 'vegetables-inch-per-week')!;
    expect(figure.published).toEqual({ value: 1, unit: 'in/week' });
    expect(figure.depthMPerDay * 1000).toBeCloseTo(3.63, 2);
  });

  it('very hot, dry climate: 10 mm/day (FAO Irrigation Water Management Training Manual No. 3)', () => {
    const figure = GARDEN_DEPTH_FIGURES.find((entry) => entry.id === 'hot-dry-climate')!;
    expect(figure.depthMPerDay).toBeCloseTo(0.01, 12);
  });
});
