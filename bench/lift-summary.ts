import { buildLiftSummary } from '../lib/lift/summary';
import { planRamSite } from '../lib/lift/ram-plan';
import type { LiftRecords, RamSiteRecord } from '../lib/lift/records';
import type { Benchmark } from './harness';

const L_PER_MIN = 1e-3 / 60;

function ramSite(index: number, sourceId: string, tankId: string): RamSiteRecord {
  return {
    id: `ram-${index}`,
    name: `Ram ${index}`,
    sourceId,
    tankId,
    driveFlowM3s: (20 + index) * L_PER_MIN,
    fallM: 2 + index * 0.2,
    drivePipe: { lengthM: 14 + index, insideDiameterM: 0.03505, material: 'steel', rigid: null },
    liftM: 10.7 + index * 2,
    pumpElevationM: null,
    deliveryPipe: {
      routeId: null,
      lengthM: 107 + index * 10,
      pipeId: 'pe-d2239-sidr9-1in',
      insideDiameterM: null,
      hazenWilliamsC: null,
      pressureRatingPa: null,
    },
    sizeClassId: null,
    pumpCount: 1,
    measuredEfficiency: null,
    efficiencyTableId: 'trade-pocketbook',
    notes: '',
  };
}

/**
 * An invented, busy project: 5 sources with three years of weekly readings each, 5 ram sites with
 * a year of monthly commissioning readings, 3 tanks, 20 uses and 40 tasks. The lift page rebuilds
 * this summary on every read.
 */
function busyProject(): LiftRecords {
  const sources = Array.from({ length: 5 }, (_, s) => ({
    id: `source-${s}`,
    name: `Creek ${s}`,
    kind: 'creek' as const,
    notes: '',
    designYieldChoice: 'lowest-recent-dry' as const,
    designReadingId: null,
    enteredYieldM3s: null,
    otherDrawM3s: 0,
  }));
  const yieldReadings = sources.flatMap((source, s) =>
    Array.from({ length: 156 }, (_, week) => {
      const date = new Date(Date.UTC(2024, 0, 1 + week * 7));
      const month = date.getUTCMonth();
      return {
        id: `${source.id}-r${week}`,
        sourceId: source.id,
        measuredOn: date.toISOString().slice(0, 10),
        season: month >= 6 && month <= 8 ? ('dry' as const) : ('wet' as const),
        bucketVolumeM3: 0.02,
        bucketSeconds: 10 + s + (week % 13),
        flowM3s: null,
        note: '',
      };
    }),
  );
  const tanks = Array.from({ length: 3 }, (_, t) => ({
    id: `tank-${t}`,
    name: `Tank ${t}`,
    volumeM3: 5 + t,
    baseElevationM: 120,
    lowLevelM: 0.2,
    overflowLevelM: 1.6,
    supplyKind: 'ram-sites' as const,
    supplySourceId: null,
    supplyFlowM3s: null,
    supplyHoursPerDay: 24,
    supplyStartHour: 0,
    reserveDays: 2,
    outlets: [{ label: 'House', elevationM: 100, residualHeadM: 14, frictionLossM: 2 }],
    notes: '',
  }));
  const ramSites = Array.from({ length: 5 }, (_, r) => ramSite(r, sources[r].id, tanks[r % 3].id));
  const commissioning = ramSites.flatMap((site) =>
    Array.from({ length: 12 }, (_, m) => ({
      id: `${site.id}-c${m}`,
      ramSiteId: site.id,
      measuredOn: `2026-${String(m + 1).padStart(2, '0')}-15`,
      beatsPerMinute: 60,
      deliveredBucketVolumeM3: 0.01,
      deliveredBucketSeconds: 240 + m,
      deliveredFlowM3s: null,
      driveMeasure: 'waste' as const,
      driveBucketVolumeM3: 0.01,
      driveBucketSeconds: 30,
      driveFlowM3s: null,
      pressureAtPumpPa: null,
      supplyHeadM: site.fallM,
      deliveryHeadM: site.liftM + 0.3,
      notes: '',
    })),
  );
  const demandUses = Array.from({ length: 20 }, (_, u) => ({
    id: `use-${u}`,
    position: u,
    label: '',
    kind: 'people' as const,
    count: 4,
    areaM2: null,
    figureId: 'most-needs',
    ownFigure: null,
    season: null,
    deliveryKind: 'pattern' as const,
    patternPresetId: u % 2 ? 'jordan-midday' : 'jordan-morning-evening',
    hourlyFractions: null,
    peakFactor: null,
    deliveryHours: null,
    startHour: null,
  }));
  const seasonalTasks = Array.from({ length: 40 }, (_, t) => ({
    id: `task-${t}`,
    kind: 'other' as const,
    title: `Task ${t}`,
    detail: '',
    dueOn: `2026-${String((t % 12) + 1).padStart(2, '0')}-01`,
    done: false,
    doneOn: null,
    source: '',
  }));
  return { sources, yieldReadings, ramSites, commissioning, tanks, demandUses, seasonalTasks, routes: [] };
}

const records = busyProject();

export const liftSummary: Benchmark = { name: 'lift-summary', run: () => buildLiftSummary(records) };

/** One plan, as the ram form recomputes on every keystroke. */
export const ramPlanPreview: Benchmark = {
  name: 'ram-plan-preview',
  run: () => planRamSite(records.ramSites[0], { routes: [], tankVolumeM3: 5 }),
  runs: 51,
};
