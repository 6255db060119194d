import { SECONDS_PER_DAY } from '../constants';
import { HydraulicsInputError } from '../errors';
import { DEFAULT_DEMAND_FIGURES } from './default-figures';
import type { DemandFigures } from './figures';
import { assertPositive } from '../input-guards';
import { assertHourlyPattern, deliveryWindowPattern, HOURS_PER_DAY, uniformPattern } from './hourly-pattern';
import { resolveUseFigure, useQuantity } from './use-figure';
import type { UseDelivery, UseDemandResult, WaterUse } from './use-types';

const SECONDS_PER_HOUR = 3600;

interface Spread {
  fractions: readonly number[];
  peakToMean: number;
  nominal: boolean;
}

function spreadOf(delivery: UseDelivery, index: number): Spread {
  switch (delivery?.kind) {
    case 'pattern': {
      assertHourlyPattern(delivery.hourlyFractions, `uses[${index}].delivery.hourlyFractions`);
      return {
        fractions: delivery.hourlyFractions,
        peakToMean: Math.max(...delivery.hourlyFractions) * HOURS_PER_DAY,
        nominal: false,
      };
    }
    case 'peak-factor':
      assertPositive(delivery.peakFactor, 'uses.delivery.peakFactor', index);
      if (delivery.peakFactor < 1) {
        throw new HydraulicsInputError(
          'uses.delivery.peakFactor',
          `a peak factor below 1 is not a peak (${delivery.peakFactor})`,
          index,
        );
      }
      return { fractions: uniformPattern(), peakToMean: delivery.peakFactor, nominal: true };
    case 'delivery-hours': {
      const fractions = deliveryWindowPattern({ hours: delivery.hours, startHour: delivery.startHour });
      return { fractions, peakToMean: HOURS_PER_DAY / delivery.hours, nominal: false };
    }
    default:
      throw new HydraulicsInputError('uses.delivery', 'must be a pattern, a peak factor or hours of delivery', index);
  }
}

export interface UseDemandOptions {
  use: WaterUse;
  /** Figures the named defaults are drawn from. @default DEFAULT_DEMAND_FIGURES */
  figures?: DemandFigures;
  /** Position of the use in the caller's list, for error messages. @default 0 */
  index?: number;
}

/** Daily volume, peak flow and hourly profile of one use. */
export function useDemand({ use, figures = DEFAULT_DEMAND_FIGURES, index = 0 }: UseDemandOptions): UseDemandResult {
  const figure = resolveUseFigure(use, figures, index);
  const quantity = useQuantity(use, index);
  const spread = spreadOf(use.delivery, index);
  const dailyVolumeM3 = figure.value * quantity;
  return {
    kind: use.kind,
    label: figure.label,
    unitFigure: figure.value,
    figureSource: figure.source,
    dailyVolumeM3,
    // For a delivery window the peak is the window's even flow, which the hourly buckets also show.
    peakFlowM3s:
      use.delivery.kind === 'delivery-hours'
        ? dailyVolumeM3 / (use.delivery.hours * SECONDS_PER_HOUR)
        : (dailyVolumeM3 / SECONDS_PER_DAY) * spread.peakToMean,
    hourlyVolumeM3: spread.fractions.map((fraction) => fraction * dailyVolumeM3),
    hourlyShapeNominal: spread.nominal,
  };
}
