import type { LivestockDemandFigure } from './figures';

const STOCKMANS_GUIDE =
  "Agriculture and Agri-Food Canada livestock-watering page (table from PFRA The Stockman's Guide to Range Livestock Watering from Surface Water Sources)";

interface Row {
  id: string;
  label: string;
  winterLitres: number;
  summerLitres: number;
  winterImperialGallons: number;
  summerImperialGallons: number;
  uncertain?: boolean;
  note?: string;
}

// The source prints litres and imperial gallons side by side; the litres are used as printed.
const ROWS: readonly Row[] = [
  {
    id: 'lactating-cow',
    label: 'Lactating cow',
    winterLitres: 77,
    summerLitres: 95,
    winterImperialGallons: 17,
    summerImperialGallons: 21,
  },
  {
    id: 'cow-calf-pair',
    label: 'Cow-calf pair',
    winterLitres: 50,
    summerLitres: 68,
    winterImperialGallons: 11,
    summerImperialGallons: 15,
  },
  {
    id: 'dry-cow',
    label: 'Dry cow',
    winterLitres: 36,
    summerLitres: 55,
    winterImperialGallons: 8,
    summerImperialGallons: 12,
  },
  {
    id: 'calf',
    label: 'Calf',
    winterLitres: 23,
    summerLitres: 36,
    winterImperialGallons: 5,
    summerImperialGallons: 8,
    uncertain: true,
    note: 'Row garbled in the stored copy of the source; values inferred. Check before relying on them.',
  },
  {
    id: 'growing-cattle',
    label: 'Growing cattle 180-360 kg',
    winterLitres: 36,
    summerLitres: 55,
    winterImperialGallons: 8,
    summerImperialGallons: 12,
    note: 'Source range 23-36 L winter, 36-55 L summer; the upper value is used for design.',
  },
  {
    id: 'finishing-cattle',
    label: 'Finishing cattle 270-540 kg',
    winterLitres: 55,
    summerLitres: 86,
    winterImperialGallons: 12,
    summerImperialGallons: 19,
  },
  {
    id: 'bull',
    label: 'Bull',
    winterLitres: 36,
    summerLitres: 55,
    winterImperialGallons: 8,
    summerImperialGallons: 12,
  },
  {
    id: 'horse',
    label: 'Horse',
    winterLitres: 36,
    summerLitres: 55,
    winterImperialGallons: 8,
    summerImperialGallons: 12,
  },
  {
    id: 'sheep',
    label: 'Sheep',
    winterLitres: 3.6,
    summerLitres: 14,
    winterImperialGallons: 0.8,
    summerImperialGallons: 3,
  },
];

/**
 * Per-head daily water for range livestock (core.md §3.6). The source is Canadian and
 * prints **imperial** gallons (4.546 L), not US gallons.
 */
export const LIVESTOCK_DEMAND_FIGURES: readonly LivestockDemandFigure[] = ROWS.map((row) => ({
  id: row.id,
  label: row.label,
  winterPerHeadM3PerDay: row.winterLitres / 1000,
  summerPerHeadM3PerDay: row.summerLitres / 1000,
  published: {
    winterLitres: row.winterLitres,
    summerLitres: row.summerLitres,
    winterImperialGallons: row.winterImperialGallons,
    summerImperialGallons: row.summerImperialGallons,
  },
  source: STOCKMANS_GUIDE,
  ...(row.uncertain ? { uncertain: true } : {}),
  note: [row.note, 'Printed in imperial gallons and litres.'].filter(Boolean).join(' '),
}));
