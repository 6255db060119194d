import type { DemandFigures } from './figures';
import { GARDEN_DEPTH_FIGURES } from './garden-figures';
import { LIVESTOCK_DEMAND_FIGURES } from './livestock-figures';
import { PER_PERSON_DEMAND_FIGURES } from './per-person-figures';

/** The published defaults, as one editable set. */
export const DEFAULT_DEMAND_FIGURES: DemandFigures = {
  perPerson: PER_PERSON_DEMAND_FIGURES,
  livestock: LIVESTOCK_DEMAND_FIGURES,
  garden: GARDEN_DEPTH_FIGURES,
};
