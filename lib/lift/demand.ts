import {
  DAILY_USE_PATTERN_PRESETS,
  dailyDemand,
  type DailyDemandResult,
  DEFAULT_DEMAND_FIGURES,
  type UseDelivery,
  type WaterUse,
} from '../../hydraulics/index';
import type { DemandUseInput } from '../validations/demand-uses';
import { outcomeOf } from './outcome';
import type { DemandUseRecord, Outcome } from './records';

/** The published figure a use names (or would fall back on), as shown beside the user's own. */
export interface PublishedFigure {
  id: string;
  label: string;
  /** m³/person/day, m³/head/day (for the use's season) or m of depth/day. */
  value: number;
  source: string;
  note?: string;
}

export function publishedFigureOf(use: Pick<DemandUseInput, 'kind' | 'figureId' | 'season'>): PublishedFigure | null {
  if (use.figureId === null) return null;
  switch (use.kind) {
    case 'people': {
      const figure = DEFAULT_DEMAND_FIGURES.perPerson.find((candidate) => candidate.id === use.figureId);
      return figure
        ? {
            id: figure.id,
            label: figure.label,
            value: figure.perPersonM3PerDay,
            source: figure.source,
            note: figure.note,
          }
        : null;
    }
    case 'livestock': {
      const figure = DEFAULT_DEMAND_FIGURES.livestock.find((candidate) => candidate.id === use.figureId);
      if (!figure) return null;
      const value = use.season === 'winter' ? figure.winterPerHeadM3PerDay : figure.summerPerHeadM3PerDay;
      return { id: figure.id, label: figure.label, value, source: figure.source, note: figure.note };
    }
    case 'garden': {
      const figure = DEFAULT_DEMAND_FIGURES.garden.find((candidate) => candidate.id === use.figureId);
      return figure
        ? { id: figure.id, label: figure.label, value: figure.depthMPerDay, source: figure.source, note: figure.note }
        : null;
    }
    default:
      return null;
  }
}

function deliveryOf(use: DemandUseInput): UseDelivery {
  switch (use.deliveryKind) {
    case 'pattern': {
      const preset = DAILY_USE_PATTERN_PRESETS.find((candidate) => candidate.id === use.patternPresetId);
      return { kind: 'pattern', hourlyFractions: preset?.hourlyFractions ?? use.hourlyFractions ?? [] };
    }
    case 'delivery-hours':
      return {
        kind: 'delivery-hours',
        hours: use.deliveryHours ?? Number.NaN,
        ...(use.startHour !== null ? { startHour: use.startHour } : {}),
      };
    default:
      return { kind: 'peak-factor', peakFactor: use.peakFactor ?? Number.NaN };
  }
}

/** A stored use as the demand engine's input; the user's own figure wins over the named one. */
export function toWaterUse(use: DemandUseInput): WaterUse {
  const common = { delivery: deliveryOf(use), ...(use.label ? { label: use.label } : {}) };
  const own = use.ownFigure ?? undefined;
  const figureId = use.figureId ?? undefined;
  switch (use.kind) {
    case 'people':
      return { ...common, kind: 'people', count: use.count ?? Number.NaN, perPersonM3PerDay: own, figureId };
    case 'livestock':
      return {
        ...common,
        kind: 'livestock',
        count: use.count ?? Number.NaN,
        season: use.season ?? 'summer',
        perHeadM3PerDay: own,
        figureId,
      };
    case 'garden':
      return { ...common, kind: 'garden', areaM2: use.areaM2 ?? Number.NaN, depthMPerDay: own, figureId };
    default:
      return { ...common, kind: 'fixed', volumeM3PerDay: own ?? Number.NaN };
  }
}

export interface DemandView {
  uses: (DemandUseRecord & { published: PublishedFigure | null })[];
  total: Outcome<DailyDemandResult>;
}

/** Daily volume and peak flow per use and in total, with each use's published figure beside it. */
export function demandView(records: readonly DemandUseRecord[]): DemandView {
  const ordered = [...records].sort((a, b) => a.position - b.position);
  return {
    uses: ordered.map((use) => ({ ...use, published: publishedFigureOf(use) })),
    total: outcomeOf(() => dailyDemand({ uses: ordered.map(toWaterUse) })),
  };
}
