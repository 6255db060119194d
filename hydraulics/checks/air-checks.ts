import { valueAtChainage } from '../profile/grid';
import type { LineProfile } from '../profile/result-types';
import { highLowToleranceM } from '../profile/settings';
import type { LineDevice, LineDeviceKind } from '../profile/types';
import { findTurningPoints } from './air-points';
import type { LineWarning } from './types';
import { chainage, chainageRange, metres } from './wording';

interface Neighbourhood {
  point: number;
  /** Chainages of the turning points (or line ends) on either side. */
  beforeM: number;
  afterM: number;
}

/** Each turning point with the chainages of the turning points (or line ends) either side. */
function neighbourhoods(
  points: readonly number[],
  others: readonly number[],
  chainageM: Float64Array,
): Neighbourhood[] {
  const all = [...points, ...others].sort((a, b) => a - b);
  const lastM = chainageM[chainageM.length - 1];
  const rank = new Map(all.map((point, i) => [point, i]));
  return points.map((point) => {
    const i = rank.get(point) ?? 0;
    return {
      point,
      beforeM: i > 0 ? chainageM[all[i - 1]] : chainageM[0],
      afterM: i < all.length - 1 ? chainageM[all[i + 1]] : lastM,
    };
  });
}

/**
 * A device covers a turning point when it lies between the neighbouring turning points and its
 * pipe elevation is within the tolerance of the point's (so a valve a little off the exact summit
 * on a flat top, or anywhere within the survey's scatter of it, still counts).
 */
function isCovered(
  spot: Neighbourhood,
  devices: readonly LineDevice[],
  kinds: readonly LineDeviceKind[],
  profile: LineProfile,
  summit: boolean,
  toleranceM: number,
): boolean {
  const { chainageM, pipeElevationM } = profile.points;
  const z = pipeElevationM[spot.point];
  return devices.some((device) => {
    if (!kinds.includes(device.kind) || device.chainageM <= spot.beforeM || device.chainageM >= spot.afterM)
      return false;
    const zDevice = valueAtChainage(chainageM, pipeElevationM, device.chainageM);
    return summit ? zDevice >= z - toleranceM : zDevice <= z + toleranceM;
  });
}

/** The small turning points (base tolerance) inside a real one's neighbourhood, as chainages. */
function membersOf(spot: Neighbourhood, small: readonly number[], chainageM: Float64Array): number[] {
  return small.map((i) => chainageM[i]).filter((c) => c > spot.beforeM && c < spot.afterM);
}

function groupWords(kind: 'highs' | 'lows', members: readonly number[], scatterM: number): string {
  if (members.length < 2) return '';
  return (
    `${members.length} small ${kind} between ${chainageRange(members[0], members[members.length - 1])} lie within ` +
    `the survey's height scatter of ${metres(scatterM)}; `
  );
}

/**
 * Air-release valves at summits and washouts at sags of the PIPE profile (Missouri NRCS,
 * *Watering Systems for Serious Graziers* p.29 [R10]; air pockets cost head and can stop a
 * gravity line, Wikipedia "Air lock" [R7]). Points already served by a device are skipped.
 * A point counts only where it stands out by more than `highLowToleranceM` (the survey's height
 * scatter on a walked route); the smaller wiggles around it become members of its one item (profile-and-checks.md
 * §1.2).
 */
export function airAndSedimentWarnings(profile: LineProfile, devices: readonly LineDevice[]): LineWarning[] {
  const { chainageM, pipeElevationM, pressureHeadM } = profile.points;
  const toleranceM = highLowToleranceM(profile.settings);
  const scatterM = profile.settings.heightScatterM;
  const { highs, lows } = findTurningPoints(pipeElevationM, toleranceM);
  const small =
    toleranceM > profile.settings.airPointToleranceM
      ? findTurningPoints(pipeElevationM, profile.settings.airPointToleranceM)
      : { highs, lows };
  const warnings: LineWarning[] = [];
  for (const spot of neighbourhoods(highs, lows, chainageM)) {
    if (isCovered(spot, devices, ['air-release-valve', 'break-pressure-tank'], profile, true, toleranceM)) continue;
    const c = chainageM[spot.point];
    const z = pipeElevationM[spot.point];
    const members = membersOf(spot, small.highs, chainageM);
    const group = groupWords('highs', members, scatterM);
    const suction = pressureHeadM[spot.point] < 0 && profile.flowM3s > 0;
    const summit = group
      ? `the real summit is at ${chainage(c)} (${metres(z)})`
      : `The pipe has a summit at ${chainage(c)} (${metres(z)})`;
    warnings.push({
      code: 'air-release-needed',
      severity: 'warning',
      at: { chainageM: c },
      values: {
        chainageM: c,
        elevationM: z,
        underSuction: suction,
        scatterM,
        memberCount: members.length,
        ...(members.length > 1 ? { fromM: members[0], toM: members[members.length - 1] } : {}),
      },
      ...(members.length > 1 ? { memberChainagesM: members } : {}),
      message: suction
        ? `${group}${summit} where the pressure is below ` +
          'atmospheric while flowing: air gathers there, but an automatic air valve would let air IN and break the flow.'
        : `${group}${summit}: air gathers at high points, ` +
          'narrows the pipe and can stop a gravity line altogether.',
      suggestedFix: suction
        ? 'Lower the pipe at this summit so the grade line stays above it, then fit an air-release valve; until then use a manual vent that only releases air.'
        : `Fit an air-release valve at ${chainage(c)}.`,
      fixes: suction ? [] : [{ kind: 'add-device', device: 'air-release-valve', chainageM: c }],
    });
  }
  for (const spot of neighbourhoods(lows, highs, chainageM)) {
    if (isCovered(spot, devices, ['washout'], profile, false, toleranceM)) continue;
    const c = chainageM[spot.point];
    const z = pipeElevationM[spot.point];
    const members = membersOf(spot, small.lows, chainageM);
    const group = groupWords('lows', members, scatterM);
    warnings.push({
      code: 'washout-needed',
      severity: 'info',
      at: { chainageM: c },
      values: {
        chainageM: c,
        elevationM: z,
        scatterM,
        memberCount: members.length,
        ...(members.length > 1 ? { fromM: members[0], toM: members[members.length - 1] } : {}),
      },
      ...(members.length > 1 ? { memberChainagesM: members } : {}),
      message:
        `${group}${group ? `the real sag is at ${chainage(c)} (${metres(z)})` : `The pipe has a sag at ${chainage(c)} (${metres(z)})`}: ` +
        'silt and sand settle at low points, and the line cannot be drained there for frost or repairs.',
      suggestedFix: `Fit a washout (drain valve) at ${chainage(c)}.`,
      fixes: [{ kind: 'add-device', device: 'washout', chainageM: c }],
    });
  }
  return [
    ...warnings,
    ...misplacedDevices(
      profile,
      devices,
      neighbourhoods(highs, lows, chainageM),
      neighbourhoods(lows, highs, chainageM),
      toleranceM,
    ),
  ];
}

/**
 * An air-release valve standing at a low point vents no air (air rises to the summits) and a
 * washout at a high point drains nothing: both are placed where the other belongs
 * (profile-and-checks.md §1.2, [R10]). Found with the same rule that decides where each is needed.
 */
function misplacedDevices(
  profile: LineProfile,
  devices: readonly LineDevice[],
  highSpots: readonly Neighbourhood[],
  lowSpots: readonly Neighbourhood[],
  toleranceM: number,
): LineWarning[] {
  const { chainageM, pipeElevationM } = profile.points;
  const out: LineWarning[] = [];
  for (const device of devices) {
    const atLow =
      device.kind === 'air-release-valve' &&
      lowSpots.find((spot) => isCovered(spot, [device], ['air-release-valve'], profile, false, toleranceM));
    const atHigh =
      device.kind === 'washout' &&
      highSpots.find((spot) => isCovered(spot, [device], ['washout'], profile, true, toleranceM));
    const spot = atLow || atHigh;
    if (!spot) continue;
    const c = device.chainageM;
    const z = valueAtChainage(chainageM, pipeElevationM, c);
    const right = chainageM[spot.point];
    out.push({
      code: 'device-misplaced',
      severity: 'warning',
      at: { chainageM: c },
      values: { chainageM: c, elevationM: z, otherChainageM: right, deviceKind: device.kind },
      message: atLow
        ? `The air-release valve at ${chainage(c)} (${metres(z)}) stands at a low point of the pipe: air rises to the summits, so it vents nothing, and it may draw dirty water or air in.`
        : `The washout at ${chainage(c)} (${metres(z)}) stands at a high point of the pipe: silt settles at the sags, so it drains and flushes nothing.`,
      suggestedFix: atLow
        ? `Move it to a summit; fit a washout here at ${chainage(right)} instead.`
        : `Move it to a sag; fit an air-release valve here at ${chainage(right)} instead.`,
      fixes: [],
    });
  }
  return out;
}
