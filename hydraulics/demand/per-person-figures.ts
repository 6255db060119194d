import { US_GALLON_M3 } from '../constants';
import type { PerPersonDemandFigure } from './figures';

const OPENLEARN_SPHERE = 'Sphere Project 2011 (via OpenLearn Create, Table 14.1)';
const WHO_EMERGENCY = 'WHO emergencies Q&A (via WASH helpdesk blog 2007)';
const WHO_TN9 = 'WHO Technical Notes for Emergencies No. 9';
const UNDP = 'UNDP HDR 2006 (via digital-campus)';
const RAM_NOTE = 'Water for the World, Technical Note RWS.4.D.5 Designing a Hydraulic Ram Pump (USAID)';

/** Published per-person daily figures (core.md §3.5). */
export const PER_PERSON_DEMAND_FIGURES: readonly PerPersonDemandFigure[] = [
  {
    id: 'survival-minimum',
    label: 'Survival minimum (drinking, cooking, basic hygiene)',
    perPersonM3PerDay: 7.5 / 1000,
    published: { value: 7.5, unit: 'L/person/day' },
    source: OPENLEARN_SPHERE,
  },
  {
    id: 'emergency-minimum',
    label: 'Emergency minimum',
    perPersonM3PerDay: 15 / 1000,
    published: { value: 15, unit: 'L/person/day' },
    source: WHO_EMERGENCY,
    note: `${WHO_TN9} gives 15-20 L/person/day for a medium-term emergency.`,
  },
  {
    id: 'basic-access',
    label: 'Basic access (absolute minimum)',
    perPersonM3PerDay: 20 / 1000,
    published: { value: 20, unit: 'L/person/day' },
    source: UNDP,
  },
  {
    id: 'village-ram-supply',
    label: 'Village supply, maximum use (ram-pump example)',
    perPersonM3PerDay: 40 / 1000,
    published: { value: 40, unit: 'L/person/day' },
    source: RAM_NOTE,
  },
  {
    id: 'most-needs',
    label: 'Most household needs (lower end of 50-100)',
    perPersonM3PerDay: 50 / 1000,
    published: { value: 50, unit: 'L/person/day' },
    source: UNDP,
    note: 'The source gives 50-100 L/person/day for most needs.',
  },
  {
    id: 'indian-standard-household',
    label: 'Household with flush toilet and bathing (Indian Standard)',
    perPersonM3PerDay: 135 / 1000,
    published: { value: 135, unit: 'L/person/day' },
    source: 'Indian Standard per-capita breakdown (quoted in a scribd tank-sizing note)',
  },
  {
    id: 'us-rural-home',
    label: 'Rural home, US planning figure',
    perPersonM3PerDay: 50 * US_GALLON_M3,
    published: { value: 50, unit: 'US gal/person/day' },
    source: 'J. Renewable Energy (Hindawi) 2017 art. 8504283 Table 1',
    note: 'Printed in US gallons.',
  },
];
