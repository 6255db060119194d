import type { PlanCheck, PlanCheckCode, PlanCheckValues } from '../../hydraulics/index';
import { formatHeadPressure, formatNumber, formatPercent, formatQuantity, type UnitSystem } from '../units/index';

/**
 * The one wording of the lift, storage, source-yield and season checks (the sibling of
 * lib/lines/warning-words.ts for line warnings): each check is worded from its code and typed
 * figures, in the project's units with thousands separators. Screens never restate the core's
 * English message.
 */
export interface PlanCheckText {
  message: string;
  fix?: string;
}

function figures(system: UnitSystem) {
  const n = (v: number | undefined) => v ?? Number.NaN;
  return {
    head: (h: number | undefined) => formatQuantity('head', n(h), system),
    headPressure: (h: number | undefined) => formatHeadPressure(n(h), system),
    flow: (q: number | undefined) => formatQuantity('flow', n(q), system),
    volume: (v: number | undefined) => formatQuantity('volume', n(v), system),
    ratio: (r: number | undefined, decimals = 1) => formatNumber(n(r), decimals),
    percent: (e: number | undefined) => formatPercent(n(e)),
    ram: (mm: number | undefined) => `${formatNumber(n(mm), 0)} mm`,
  };
}

type Figures = ReturnType<typeof figures>;
type Wording = (v: PlanCheckValues, f: Figures) => PlanCheckText;

const STANDPIPE_FIX =
  'Put a standpipe or an open tank part-way down so the drive pipe below it has the right length (it ends the surge there).';

const WORDING: Record<PlanCheckCode, Wording> = {
  'lift-ratio-beyond-table': (v, f) => ({
    message: `Delivery head is ${f.ratio(v.ratio)} times the fall, beyond the end of the table in use ("${v.tableLabel}", up to ${f.ratio(v.tableEndRatio, 0)}); ${
      (v.tableEndEfficiency ?? 0) > 0
        ? `its last efficiency (${f.percent(v.tableEndEfficiency)}) is held, not extrapolated`
        : 'it delivers nothing there'
    }.`,
    fix: v.widerTableLabel
      ? `Choose the "${v.widerTableLabel}" table, which reaches ${f.ratio(v.widerTableEndRatio, 0)}:1, or measure the efficiency at commissioning; gaining fall or lifting in two stages also helps.`
      : 'Gain fall (set the pump lower or take the drive water from higher up), lower the tank, lift in two stages, or measure the efficiency at commissioning.',
  }),
  'lift-ratio-below-table': (v, f) => ({
    message: `Delivery head is only ${f.ratio(v.ratio)} times the fall; the table "${v.tableLabel}" starts at ${f.ratio(v.tableStartRatio, 0)}, so its first efficiency is used rather than extrapolated.`,
  }),
  'drive-flow-below-class': (v, f) => ({
    message: `Each pump gets ${f.flow(v.flowM3s)}; a ${f.ram(v.drivePipeNominalMm)} ram needs at least ${f.flow(v.limitFlowM3s)}.`,
    fix: 'Choose a smaller size class or fewer pumps in parallel.',
  }),
  'drive-flow-above-class': (v, f) => ({
    message: `Each pump could have ${f.flow(v.flowM3s)} but a ${f.ram(v.drivePipeNominalMm)} ram uses at most ${f.flow(v.limitFlowM3s)}; the rest is not used.`,
    fix: 'Add a pump in parallel or choose the next size class.',
  }),
  'no-size-class': (v, f) => ({
    message:
      v.drivePipeNominalMm !== undefined
        ? `No size class chosen; ${f.flow(v.flowM3s)} per pump suits a ${f.ram(v.drivePipeNominalMm)} ram.`
        : `No size class chosen, and ${f.flow(v.flowM3s)} per pump is outside every class in the table.`,
  }),
  'supply-below-7x-delivered': (v, f) => ({
    message: `The source gives ${f.ratio(v.ratio)} times the delivered flow; plan on at least ${f.ratio(v.minRatio, 0)} times, so the delivered figure is optimistic.`,
    fix: 'Plan for less delivered water, or find more drive flow.',
  }),
  'drive-length-vs-fall': (v, f) => ({
    message: `Drive pipe is ${f.ratio(v.ratio)} times the fall; the usual range is ${f.ratio(v.minRatio, 0)} to ${f.ratio(v.maxRatio, 0)} (about 7).`,
    fix: v.tooLong
      ? STANDPIPE_FIX
      : 'Lengthen the drive pipe, or take the drive water from closer to the pump with less fall.',
  }),
  'drive-length-vs-diameter': (v, f) => ({
    message: `Drive pipe length is ${f.ratio(v.ratio, 0)} bores; the usual range is ${f.ratio(v.minRatio, 0)} to ${f.ratio(v.maxRatio, 0)}.`,
    fix: v.tooLong ? STANDPIPE_FIX : 'Lengthen the drive pipe or use a smaller bore.',
  }),
  'drive-pipe-not-rigid': () => ({
    message:
      'The drive pipe is not rigid: a flexible pipe swells with each beat, softens the surge and wastes the drive energy.',
    fix: 'Use rigid pipe (galvanised steel) for the drive pipe, firmly anchored and straight.',
  }),
  'fall-too-small': (v, f) => ({
    message: `The fall is ${f.head(v.headM)}; the pump must sit at least ${f.head(v.limitHeadM)} below the source.`,
    fix: 'Move the pump further downstream to gain fall.',
  }),
  'too-little-back-pressure': (v, f) => ({
    message: `The delivery line holds only ${f.head(v.headM)} of head above the pump; a ram needs about ${f.headPressure(v.limitHeadM)} of back-pressure to start and keep beating.`,
    fix: `Raise the delivery outlet (a riser or a higher tank) so the full delivery line stands at least ${f.head(v.limitHeadM)} above the pump.`,
  }),
  'delivery-rating-unknown': (v, f) => ({
    message: `The delivery pipe rating is not known; the pump can build about ${f.headPressure(v.headM)} against a shut delivery line.`,
    fix: 'Choose a catalogue pipe or enter its pressure rating.',
  }),
  'delivery-rating-below-working-head': (v, f) => ({
    message: `Working head at the pump is ${f.headPressure(v.headM)} but the delivery pipe is rated for ${f.headPressure(v.limitHeadM)}.`,
    fix: 'Use a higher pressure class for the delivery pipe, at least near the pump.',
  }),
  'surge-over-delivery-rating': (v, f) => ({
    message: `If the delivery line is shut while the ram runs, the pump can build about ${f.headPressure(v.headM)} (fall plus a·v/g of the drive column), above the delivery pipe's rating of ${f.headPressure(v.limitHeadM)}.`,
    fix: 'Never shut the delivery line while the ram runs (stop the ram first), fit a relief valve at the pump, or use a higher class near the pump.',
  }),
  'below-planned-efficiency': (v, f) => ({
    message: `Measured efficiency ${f.percent(v.efficiency)} is well below the planned ${f.percent(v.plannedEfficiency)}.`,
    fix: 'Look for air in the drive pipe, silt in the valves, a leaking delivery line, or a waste-valve stroke set too long or short.',
  }),
  'unusual-beat-rate': (v, f) => ({
    message: `${f.ratio(v.beatsPerMinute, 0)} beats a minute; an ordinary small ram beats about ${f.ratio(v.typicalBeatsPerMinute, 0)}.`,
    fix: 'Adjust the waste-valve stroke or weight and measure again.',
  }),
  'supply-below-demand': (v, f) => ({
    message: `The supply gives ${f.volume(v.supplyVolumeM3)} a day but the uses take ${f.volume(v.demandVolumeM3)}: the tank loses ${f.volume(v.volumeM3)} every day and no size of tank keeps up.`,
    fix: 'Increase the supply (longer hours, more drive flow, another source) or reduce the demand.',
  }),
  'no-reserve': () => ({
    message:
      'No reserve days are held: the tank only carries the daily cycle, so any stop in supply leaves the outlets dry within hours.',
    fix: 'Hold a reserve equal to the interval between checks of the system (3-4 days if checked every 3-4 days).',
  }),
  'tank-smaller-than-needed': (v, f) => ({
    message: `The tank holds less than the daily cycle plus the reserve wanted (${f.volume(v.volumeM3)}).`,
    fix: 'Fit a larger tank, add a second one, or hold fewer reserve days.',
  }),
  'tank-too-low': (v, f) => ({
    message: `At its lowest working level the tank is ${f.head(v.headM)} too low to give every outlet its residual head.`,
    fix: 'Set the tank higher, lower the residual head wanted, or use larger pipe to cut friction.',
  }),
  'design-yield-above-dry-season': (v, f) => ({
    message: `The chosen design yield (${f.flow(v.flowM3s)}) is above the lowest recent dry-season reading (${f.flow(v.limitFlowM3s)}).`,
    fix: 'Design on the dry-season figure unless storage carries the system through the dry season.',
  }),
  'no-dry-season-reading': () => ({
    message:
      'No recent dry-season reading: the lowest recent reading of any season is used, and the dry-season flow may be lower.',
    fix: 'Measure the source in the driest weeks of the year.',
  }),
  'draw-exceeds-yield': (v, f) => ({
    message: `The design draw (${f.flow(v.flowM3s)}) exceeds the design yield (${f.flow(v.limitFlowM3s)}): the intake will run dry and draw air.`,
    fix: 'Draw less (smaller ram, fewer pumps, shorter delivery hours) or add storage and another source.',
  }),
  'frost-date-unusual-for-hemisphere': (v) => ({
    message: `A first frost on ${v.monthDay} is unusual for the ${v.hemisphere}ern hemisphere; check the hemisphere and the date.`,
  }),
};

/** A lift, storage, source or season check worded in the project's units. */
export function planCheckText(check: Pick<PlanCheck, 'code' | 'values'>, system: UnitSystem): PlanCheckText {
  return WORDING[check.code](check.values, figures(system));
}
