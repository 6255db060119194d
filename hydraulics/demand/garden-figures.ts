import { INCH_M } from '../constants';
import type { GardenDepthFigure } from './figures';

/** Published garden water depths (core.md §3.7). */
export const GARDEN_DEPTH_FIGURES: readonly GardenDepthFigure[] = [
  {
    id: 'vegetables-inch-per-week',
    label: 'Vegetable garden, 1 inch a week',
    depthMPerDay: INCH_M / 7,
    published: { value: 1, unit: 'in/week' },
    source: 'NC State guidance via 98905.com',
    note: 'Many extension sources give the same figure; 1 inch over 1 ft² is about 0.62 US gal.',
  },
  {
    id: 'hot-dry-climate',
    label: 'Crops in a very hot, dry climate',
    depthMPerDay: 10 / 1000,
    published: { value: 10, unit: 'mm/day' },
    source: 'FAO Irrigation Water Management Training Manual No. 3 (Brouwer & Heibloem, 1986)',
    note: 'Example figure from §2 of the manual; actual crop need depends on climate and crop.',
  },
];
