import { HydraulicsInputError } from '../errors';
import type { DemandFigures } from './figures';
import { assertNonNegative } from '../input-guards';
import type { WaterUse } from './use-types';

export interface UseFigure {
  /** m³/person/day, m³/head/day, m/day depth, or m³/day for a fixed use. */
  value: number;
  source: string;
  label: string;
}

function pickFigure<T extends { id: string }>(
  list: readonly T[],
  id: string | undefined,
  field: string,
  index: number,
): T {
  if (id === undefined) {
    throw new HydraulicsInputError(field, 'give either a figure of your own or the id of a published figure', index);
  }
  const found = list.find((figure) => figure.id === id);
  if (!found) {
    throw new HydraulicsInputError(field, `unknown figure "${id}"; known: ${list.map((f) => f.id).join(', ')}`, index);
  }
  return found;
}

/** The per-unit figure one use is computed with: the user's own figure wins over a named default. */
export function resolveUseFigure(use: WaterUse, figures: DemandFigures, index: number): UseFigure {
  const field = `uses.${use.kind}`;
  switch (use.kind) {
    case 'people': {
      if (use.perPersonM3PerDay !== undefined) {
        assertNonNegative(use.perPersonM3PerDay, 'uses.perPersonM3PerDay', index);
        return { value: use.perPersonM3PerDay, source: 'entered', label: use.label ?? 'People' };
      }
      const figure = pickFigure(figures.perPerson, use.figureId, 'uses.figureId', index);
      return { value: figure.perPersonM3PerDay, source: figure.source, label: use.label ?? figure.label };
    }
    case 'livestock': {
      if (use.season !== 'winter' && use.season !== 'summer') {
        throw new HydraulicsInputError('uses.season', `must be "winter" or "summer", got ${String(use.season)}`, index);
      }
      if (use.perHeadM3PerDay !== undefined) {
        assertNonNegative(use.perHeadM3PerDay, 'uses.perHeadM3PerDay', index);
        return { value: use.perHeadM3PerDay, source: 'entered', label: use.label ?? 'Livestock' };
      }
      const figure = pickFigure(figures.livestock, use.figureId, 'uses.figureId', index);
      const value = use.season === 'winter' ? figure.winterPerHeadM3PerDay : figure.summerPerHeadM3PerDay;
      return { value, source: figure.source, label: use.label ?? `${figure.label} (${use.season})` };
    }
    case 'garden': {
      if (use.depthMPerDay !== undefined) {
        assertNonNegative(use.depthMPerDay, 'uses.depthMPerDay', index);
        return { value: use.depthMPerDay, source: 'entered', label: use.label ?? 'Garden' };
      }
      const figure = pickFigure(figures.garden, use.figureId, 'uses.figureId', index);
      return { value: figure.depthMPerDay, source: figure.source, label: use.label ?? figure.label };
    }
    case 'fixed':
      assertNonNegative(use.volumeM3PerDay, 'uses.volumeM3PerDay', index);
      return { value: use.volumeM3PerDay, source: 'entered', label: use.label ?? 'Other use' };
    default:
      throw new HydraulicsInputError(field, `unknown use kind ${String((use as { kind: unknown }).kind)}`, index);
  }
}

/** How many units the figure multiplies: people, head, m² of garden, or 1 for a fixed use. */
export function useQuantity(use: WaterUse, index: number): number {
  switch (use.kind) {
    case 'people':
    case 'livestock':
      assertNonNegative(use.count, 'uses.count', index);
      if (!Number.isInteger(use.count)) {
        throw new HydraulicsInputError('uses.count', `must be a whole number, got ${use.count}`, index);
      }
      return use.count;
    case 'garden':
      assertNonNegative(use.areaM2, 'uses.areaM2', index);
      return use.areaM2;
    case 'fixed':
      return 1;
  }
}
