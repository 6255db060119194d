/**
 * Shapes of the published demand figures. The figures are plain data so a project can replace any
 * of them; the defaults live in per-person-figures.ts, livestock-figures.ts and garden-figures.ts.
 */

/** Daily water per person for one level of service. */
export interface PerPersonDemandFigure {
  id: string;
  label: string;
  /** Design figure, m³ per person per day. */
  perPersonM3PerDay: number;
  /** The figure as the source prints it. */
  published: { value: number; unit: 'L/person/day' | 'US gal/person/day' };
  source: string;
  note?: string;
}

export type LivestockSeason = 'winter' | 'summer';

/** Daily water per head for one class of stock, winter and summer. */
export interface LivestockDemandFigure {
  id: string;
  label: string;
  winterPerHeadM3PerDay: number;
  summerPerHeadM3PerDay: number;
  /**
   * The figures as the source prints them. The AAFC/PFRA table prints litres and *imperial*
   * gallons side by side; a range is stored by its upper value (used for design) with the range in the note.
   */
  published: {
    winterLitres: number;
    summerLitres: number;
    winterImperialGallons: number;
    summerImperialGallons: number;
  };
  source: string;
  /** True where the stored copy of the source is garbled and the value was inferred. */
  uncertain?: boolean;
  note?: string;
}

/** Water depth a garden or crop needs per day. */
export interface GardenDepthFigure {
  id: string;
  label: string;
  /** Depth of water per day, m (1 mm over 1 m² = 1 L). */
  depthMPerDay: number;
  published: { value: number; unit: 'in/week' | 'mm/day' };
  source: string;
  note?: string;
}

/** The editable set of figures a demand calculation draws its defaults from. */
export interface DemandFigures {
  perPerson: readonly PerPersonDemandFigure[];
  livestock: readonly LivestockDemandFigure[];
  garden: readonly GardenDepthFigure[];
}
