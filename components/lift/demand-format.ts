import type { DemandUseInput } from '@/lib/validations/demand-uses';
import { DAILY_USE_PATTERN_PRESETS } from '@/hydraulics/index';
import { demandUseWords } from '@/lib/validations/field-word-tables';
import { formatNumber, formatQuantity, type Quantity, type UnitSystem } from '@/lib/units';

/** The quantity a use's per-unit figure is shown in (the one its refusals state their bounds in). */
export function figureQuantity(kind: DemandUseInput['kind']): Quantity {
  return demandUseWords({ kind }).ownFigure?.quantity ?? 'volumePerDay';
}

export const PER_UNIT: Record<DemandUseInput['kind'], string> = {
  people: 'per person',
  livestock: 'per head',
  garden: 'of depth',
  fixed: 'in all',
};

/** "4 people", "12 head (summer)", "37 m² of garden". */
export function amountText(use: DemandUseInput, units: UnitSystem): string {
  switch (use.kind) {
    case 'people':
      return `${use.count ?? 0} people`;
    case 'livestock':
      return `${use.count ?? 0} head (${use.season ?? 'summer'})`;
    case 'garden':
      return `${formatQuantity('area', use.areaM2 ?? 0, units)} of garden`;
    default:
      return 'fixed volume';
  }
}

/** "peak factor 3", "over 4 h from 06:00", "Village taps, morning and evening peaks". */
export function deliveryText(use: DemandUseInput): string {
  if (use.deliveryKind === 'peak-factor') return `peak factor ${formatNumber(use.peakFactor ?? 1, 1)}`;
  if (use.deliveryKind === 'delivery-hours')
    return `over ${formatNumber(use.deliveryHours ?? 0, 1)} h from ${String(use.startHour ?? 6).padStart(2, '0')}:00`;
  return DAILY_USE_PATTERN_PRESETS.find((preset) => preset.id === use.patternPresetId)?.label ?? 'own hourly pattern';
}
