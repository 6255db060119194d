import Papa from 'papaparse';
import {
  findPipe,
  type GpsHeightWarning,
  type LineFix,
  type LineWarning,
  PRESSURE_CAUTION,
  type WarningCode,
  type WarningSeverity,
  type WarningValues,
} from '../../hydraulics/index';
import {
  formatHeadPressure,
  formatNumber,
  formatQuantity,
  formatStation,
  type DisplayUnits,
  type UnitSystem,
} from '../units/index';

/** Runnel's short titles for the core's warning codes. */
export const WARNING_TITLES: Record<WarningCode, string> = {
  'static-over-rating': 'Over-pressure with the line shut',
  'surge-over-rating': 'Surge could pass the pipe rating',
  'negative-pressure': 'Suction while flowing (siphon stretch)',
  'true-siphon': 'True siphon: pipe above the water that feeds it',
  'siphon-limit': 'Beyond the practical siphon limit',
  'vapour-limit': 'Water would boil in the pipe',
  'residual-below-target': 'Too little pressure at the end',
  'no-gravity-flow': 'No flow by gravity',
  'tank-not-reached': 'Break-pressure tank cannot fill',
  'air-release-needed': 'Air trap at a summit',
  'washout-needed': 'Silt trap at a sag',
  'velocity-low': 'Slow water',
  'velocity-high': 'Fast water',
  'site-altitude-assumed': 'Site altitude not known',
  'winter-frost': 'Shallower than frost',
  'winter-cover-contradiction': 'Buried below frost, yet no cover',
  'drain-down-overdue': 'Drain-down overdue',
  'device-misplaced': 'Device at the wrong kind of point',
};

export const SEVERITY_WORDS: Record<WarningSeverity, string> = { danger: 'Danger', warning: 'Warning', info: 'Advice' };

const DEVICE_WORDS = {
  'break-pressure-tank': 'a break-pressure tank',
  'air-release-valve': 'an air-release valve',
  washout: 'a washout',
  'isolation-valve': 'an isolation valve',
} as const;

/** Words for a one-click fix button, e.g. `Add a break-pressure tank at ch. 537.6 m`. */
export function fixWords(fixes: readonly LineFix[], u: DisplayUnits): string {
  return fixes
    .map((fix) =>
      fix.kind === 'add-device'
        ? `Add ${DEVICE_WORDS[fix.device]} at ch. ${formatQuantity('chainage', fix.chainageM, u.system)}`
        : `Use ${findPipe(fix.pipeId)?.label ?? fix.pipeId} on stretch ${fix.stretchIndex + 1}`,
    )
    .join('; ');
}

/** Where a warning applies, in the project's units. */
export function placeWords(at: { chainageM: number } | { fromM: number; toM: number }, u: DisplayUnits): string {
  // US projects also read the place as stations (12+50).
  const sta = (c: number) => (u.system === 'us' ? ` (sta. ${formatStation(c, u.system)})` : '');
  return 'chainageM' in at
    ? `ch. ${formatQuantity('chainage', at.chainageM, u.system)}${sta(at.chainageM)}`
    : `ch. ${formatQuantity('chainage', at.fromM, u.system)} to ${formatQuantity('chainage', at.toM, u.system)}${u.system === 'us' ? ` (sta. ${formatStation(at.fromM, u.system)} to ${formatStation(at.toM, u.system)})` : ''}`;
}

/** A warning worded for a person in the project's units: title, what and why, and the fix. */
export interface WarningText {
  title: string;
  message: string;
  fix: string;
}

/** The formatters one warning's sentences need, bound to the project's units. */
function figures(u: DisplayUnits) {
  const s = u.system;
  const n = (v: number | undefined) => v ?? Number.NaN;
  return {
    ch: (c: number | undefined) => `ch. ${formatQuantity('chainage', n(c), s)}`,
    range: (a: number | undefined, b: number | undefined) =>
      `ch. ${formatQuantity('chainage', n(a), s)} to ${formatQuantity('chainage', n(b), s)}`,
    head: (h: number | undefined) => formatHeadPressure(n(h), s),
    length: (h: number | undefined) => formatQuantity('head', n(h), s),
    depth: (d: number | undefined) => formatQuantity('depth', n(d), s),
    temperature: (c: number | undefined) => formatQuantity('temperature', n(c), s),
    level: (z: number | undefined) => formatQuantity('elevation', n(z), s),
    flow: (q: number | undefined) => formatQuantity('designFlow', n(q), s),
    speed: (v: number | undefined) => formatQuantity('velocity', n(v), s),
    seconds: (t: number | undefined) => `${formatNumber(n(t), 1)} s`,
  };
}

/** "The worst figure lies within the survey's scatter" in the project's units, or ''. */
function scatterSentence(v: WarningValues, f: ReturnType<typeof figures>): string {
  return v.withinScatter
    ? ` The worst figure lies within the survey's height scatter of ${f.depth(v.scatterM)} of the limit: it may or may not be passed; check the heights here with a level before deciding.`
    : '';
}

function groupStart(kind: 'highs' | 'lows', v: WarningValues, f: ReturnType<typeof figures>): string {
  return (v.memberCount ?? 0) > 1
    ? `${v.memberCount} small ${kind} between ${f.range(v.fromM, v.toM)} lie within the survey's height scatter of ${f.depth(v.scatterM)}; the real ${kind === 'highs' ? 'summit' : 'sag'} is at`
    : `The pipe has a ${kind === 'highs' ? 'summit' : 'sag'} at`;
}

type Wording = (v: WarningValues, f: ReturnType<typeof figures>, w: LineWarning) => [message: string, fix: string];

const WORDING: Record<WarningCode, Wording> = {
  'negative-pressure': (v, f) => [
    `While flowing, the pressure falls below atmospheric from ${f.range(v.fromM, v.toM)} (down to ${f.length(v.headM)} at ${f.ch(v.worstChainageM)}): the pipe runs above the hydraulic grade line. Suction can draw dirty water in at joints and lets air come out of the water and block the line.${scatterSentence(v, f)}`,
    'Lay the pipe lower through this range or route it below the grade line; or use a larger pipe upstream so less head is lost before it.',
  ],
  'true-siphon': (v, f) => [
    `From ${f.range(v.fromM, v.toM)} the pipe rises above the water level that feeds it (up to ${f.length(v.headM)} above it at ${f.ch(v.worstChainageM)}): this is a true siphon. It will not fill or start by itself, must be primed, and loses its prime as air gathers at the summit; an automatic air valve there would let air in and stop it.${scatterSentence(v, f)}`,
    'Route the pipe below the source level, or lower the summit by trenching; if a siphon cannot be avoided, fit a priming point and a manual air release at the summit and plan to re-prime it.',
  ],
  'siphon-limit': (v, f) => [
    `Suction passes the practical siphon limit of ${f.length(v.limitHeadM)} from ${f.range(v.fromM, v.toM)} (down to ${f.length(v.headM)} at ${f.ch(v.worstChainageM)}): water may start to vaporise there and the flow can break.${scatterSentence(v, f)}`,
    'Lower the pipe through this range or choose a route that stays below the grade line.',
  ],
  'vapour-limit': (v, f) => [
    `Suction would pass the vapour limit of ${f.length(v.limitHeadM)} (atmospheric head ${f.length(v.atmosphericHeadM)} at ${f.level(v.siteAltitudeM)} altitude less the vapour head) from ${f.range(v.fromM, v.toM)}: the water boils, the column breaks and the computed flow cannot happen.${scatterSentence(v, f)}`,
    'Lower the pipe through this range, route around the rise, or pump instead of siphoning.',
  ],
  'static-over-rating': (v, f) => [
    `With the line shut, static pressure from ${f.range(v.fromM, v.toM)} rises above the ${f.head(v.limitHeadM)} allowed for ${v.pipeLabel} (rating derated for ${f.temperature(v.waterTemperatureC)} water, divided by the safety factor ${v.safetyFactor}), up to ${f.head(v.headM)} at ${f.ch(v.worstChainageM)}. A pipe over its rating can burst.${scatterSentence(v, f)}`,
    (v.tankChainagesM ?? []).length > 0
      ? `Add a break-pressure tank at ${(v.tankChainagesM ?? []).map((c) => f.ch(c)).join(', ')} (the fewest that keep every pipe within its rating), or use a higher pressure class here.`
      : `Use a higher pressure class through this range${v.problem ? `: ${v.problem}` : ''}.`,
  ],
  'surge-over-rating': (v, f) => [
    `If the flow of ${f.speed(v.velocityMs)} in ${v.pipeLabel} stops suddenly (a valve or float shut in less than 2L/a = ${f.seconds(v.closureTimeS)}), the pressure wave adds about ${f.length(v.otherHeadM)} (Joukowsky) to the static pressure, up to ${f.head(v.headM)} against the ${f.head(v.limitHeadM)} allowed from ${f.range(v.fromM, v.toM)}.${scatterSentence(v, f)}`,
    `Close valves slowly (much longer than ${f.seconds(v.closureTimeS)}), use slow-closing float valves, or use a higher pressure class through this range.`,
  ],
  'residual-below-target': (v, f) => [
    `At the design flow of ${f.flow(v.flowM3s)} the outlet has ${f.head(v.headM)} of pressure, below the ${f.head(v.limitHeadM)} it needs: friction and fittings use up too much of the available head.`,
    v.toPipeLabel
      ? `Change stretch ${(v.stretchIndex ?? 0) + 1} (${f.range(v.fromM, v.toM)}) from ${v.pipeLabel} to ${v.toPipeLabel}: the outlet then has ${f.head(v.fixedHeadM)}${
          (v.alsoClears ?? []).length > 0
            ? `, and the ${(v.alsoClears ?? []).map((c) => WARNING_TITLES[c].toLowerCase()).join(', ')} this flow causes clear with it`
            : ''
        }.`
      : `No single pipe change is enough: use larger pipe over several stretches, lower the design flow (the line carries ${f.flow(v.capacityM3s)} by gravity to this outlet), or set the outlet lower.`,
  ],
  'no-gravity-flow': (v, f) => [
    `From ${f.range(v.fromM, v.toM)} the water starts at ${f.level(v.otherHeadM)} but must arrive at ${f.level(v.limitHeadM)} or more: there is no head left to drive a flow by gravity.`,
    'Raise the source or tank, lower the outlet or tank, or ask for less residual pressure.',
  ],
  'tank-not-reached': (v, f) => [
    `At ${f.flow(v.flowM3s)} the grade reaches the break-pressure tank at ${f.ch(v.chainageM)} at ${f.level(v.headM)}, below its water level of ${f.level(v.limitHeadM)}: the tank cannot fill and will run dry (the line above it carries ${f.flow(v.capacityM3s)}).`,
    'Use larger pipe above the tank, set the tank lower, or lower the design flow.',
  ],
  'air-release-needed': (v, f) => [
    v.underSuction
      ? `${groupStart('highs', v, f)} ${f.ch(v.chainageM)} (${f.level(v.elevationM)}) where the pressure is below atmospheric while flowing: air gathers there, but an automatic air valve would let air IN and break the flow.`
      : `${groupStart('highs', v, f)} ${f.ch(v.chainageM)} (${f.level(v.elevationM)}): air gathers at high points, narrows the pipe and can stop a gravity line altogether.`,
    v.underSuction
      ? 'Lower the pipe at this summit so the grade line stays above it, then fit an air-release valve; until then use a manual vent that only releases air.'
      : `Fit an air-release valve at ${f.ch(v.chainageM)}${(v.memberCount ?? 0) > 1 ? ' (the real summit), not at each small high' : ''}.`,
  ],
  'washout-needed': (v, f) => [
    `${groupStart('lows', v, f)} ${f.ch(v.chainageM)} (${f.level(v.elevationM)}): silt and sand settle at low points, and the line cannot be drained there for frost or repairs.`,
    `Fit a washout (drain valve) at ${f.ch(v.chainageM)}.`,
  ],
  'velocity-low': (v, f) => [
    `Water moves at ${f.speed(v.velocityMs)} in ${v.pipeLabel} from ${f.range(v.fromM, v.toM)}, below the self-cleaning ${f.speed(v.limitVelocityMs)}: silt settles and air bubbles are not carried through.`,
    'Use a smaller pipe if the head allows it, and fit washouts at the low points of this stretch.',
  ],
  'winter-frost': (v, f) => [
    `The pipe lies ${f.depth(v.coverM)} deep at ${f.ch(v.chainageM)}, no deeper than the site's frost depth of ${f.depth(v.frostDepthM)}, and the line is not drained: water left in it can freeze and split the pipe or its fittings.`,
    'Drain the line for winter, or lay it deeper (see Winter below).',
  ],
  'winter-cover-contradiction': (v, f) => [
    `The line is taken as buried below frost depth, but the pipe lies on the surface (cover ${f.depth(v.coverM)}) at ${f.ch(v.chainageM)}: both cannot be true.`,
    'Give the survey stations their cover, or choose to drain the line for winter (see Winter below).',
  ],
  'drain-down-overdue': (v) => [
    `The drain-down task due on ${v.dueOn} is not done, and this line needs draining before frost: water left in it can freeze.`,
    'Open the drains at the low points, then tick the task done on the lift page.',
  ],
  'device-misplaced': (v, f) =>
    v.deviceKind === 'air-release-valve'
      ? [
          `The air-release valve at ${f.ch(v.chainageM)} (${f.level(v.elevationM)}) stands at a low point of the pipe: air rises to the summits, so it vents nothing, and it may draw dirty water or air in.`,
          `Move it to a summit; fit a washout here at ${f.ch(v.otherChainageM)} instead.`,
        ]
      : [
          `The washout at ${f.ch(v.chainageM)} (${f.level(v.elevationM)}) stands at a high point of the pipe: silt settles at the sags, so it drains and flushes nothing.`,
          `Move it to a sag; fit an air-release valve here at ${f.ch(v.otherChainageM)} instead.`,
        ],
  'site-altitude-assumed': (v, f) => [
    `The heights of this route are on an assumed datum (a level book or hose level hung on a chosen start height), so the site altitude of ${f.level(v.siteAltitudeM)} taken from its highest ground is a guess, and the siphon and vapour limits that depend on it may be wrong${
      v.headM !== undefined ? ` where the line has suction (down to ${f.length(v.headM)} at ${f.ch(v.chainageM)})` : ''
    }.`,
    "Enter the site's altitude above sea level (from a map or a phone) under Settings, Site altitude.",
  ],
  'velocity-high': (v, f) => [
    `Water moves at ${f.speed(v.velocityMs)} in ${v.pipeLabel} from ${f.range(v.fromM, v.toM)}, above ${f.speed(v.limitVelocityMs)}: suspended sand wears the pipe and fittings, and a sudden stop gives a larger pressure surge.`,
    v.toPipeLabel ? `Use the next size up, ${v.toPipeLabel}.` : 'Use a larger pipe for this stretch.',
  ],
};

const PRESSURE_CODES: ReadonlySet<WarningCode> = new Set<WarningCode>([
  'negative-pressure',
  'true-siphon',
  'siphon-limit',
  'vapour-limit',
  'static-over-rating',
  'surge-over-rating',
  'residual-below-target',
]);

/**
 * The one wording of a line warning, from its code and typed values, in the project's units with
 * thousands separators. Screens, the PDF and the CSV all call it; pressure findings carry the caution.
 */
export function warningText(w: LineWarning, u: DisplayUnits): WarningText {
  const [message, fix] = WORDING[w.code](w.values, figures(u), w);
  return {
    title: WARNING_TITLES[w.code],
    message: PRESSURE_CODES.has(w.code) ? `${message} ${PRESSURE_CAUTION}` : message,
    fix,
  };
}

/** Every warning as CSV rows (papaparse), worded as on screen, with the place in the project's units. */
export function warningsCsv(warnings: readonly LineWarning[], u: DisplayUnits): string {
  return Papa.unparse({
    fields: ['Severity', 'Code', 'What', 'Where', 'Why', 'Fix'],
    data: warnings.map((w) => {
      const text = warningText(w, u);
      return [SEVERITY_WORDS[w.severity], w.code, text.title, placeWords(w.at, u), text.message, text.fix];
    }),
  });
}

/**
 * The consumer-GPS height warning worded from its figures (the vertical error and each decision's
 * height difference) in the project's units.
 */
export function gpsWarningText(warning: GpsHeightWarning, system: UnitSystem): string {
  const list = warning.affected
    .map(
      (a) =>
        `${a.label} (${formatQuantity('length', a.elevationDifferenceM, system)}${a.withinGpsErrorBand ? ', smaller than the GPS error itself' : ''})`,
    )
    .join('; ');
  return (
    `Heights from a consumer GPS can be wrong by ${formatQuantity('length', warning.verticalErrorM, system, 0)} or more, and these decisions depend on them: ${list}. ` +
    'Check the heights with a level, hose level, clinometer traverse or survey-grade GNSS before choosing pipe pressure class, ' +
    'break-pressure tanks or pump lift, and follow local codes and licensed practice.'
  );
}
