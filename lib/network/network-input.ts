import {
  DEFAULT_LINE_SETTINGS,
  HydraulicsInputError,
  MATERIAL_GRADES,
  dailyDemand,
  drawPatternWithPeak,
  type NetworkInput,
  type NetworkLink,
  type NetworkLinkStatus,
  type NetworkNode,
  type NetworkPipe,
  type PipeSpec,
} from '../../hydraulics/index';
import { toWaterUse } from '../lift/demand';
import type { LineRouteStation } from '../lines/route-stations';
import type { NetworkContext, NetworkLineContext } from './context';
import type { NetworkLinkRecord, NetworkNodeRecord } from './records';

/**
 * The stored network as the core's input. A line link becomes a chain of core links: cut at every
 * take-off on it (the flow drops there) and at every change of pipe, each piece as long as the
 * route's slope length between its ends. Nodes read what their records hold (a tank's floor and
 * levels, a ram's delivered flow, a source's design yield, the demand of the uses tied to an outlet).
 */

/** Outlets draw their peak (steady solve, sizing) or their mean flow with its hourly pattern (day run). */
export type DemandMode = 'peak' | 'day';

/** Where a core link came from: a record link, and for a line the chainage window of the piece. */
export interface CorePiece {
  linkId: string;
  fromChainageM: number | null;
  toChainageM: number | null;
  pipeId: string;
  pipeLabel: string;
}

export interface BuiltNetwork {
  input: NetworkInput;
  /** Core link id -> the record link and piece it stands for. */
  pieces: Record<string, CorePiece>;
  /** Core node ids that are record nodes (the rest are pipe changes inside a line). */
  recordNodeIds: string[];
  /** Names of the record nodes and links by id, and of each line piece by its core id (for wording findings). */
  names: Record<string, string>;
  /** Findings made while building (assumed figures), on the record that caused them. */
  notes: { nodeId?: string; linkId?: string; message: string }[];
}

/**
 * A tank without an overflow level is taken as 2 m deep above its lowest working level (common practice, no source).
 */
const ASSUMED_TANK_DEPTH_M = 2;
/**
 * Smooth plastic's roughness for the bores that carry only a Hazen-Williams C (a ram plan's pipe, a
 * valve body), so the default Darcy-Weisbach can solve them: the catalogue's PE/PVC value.
 */
const PLASTIC_ROUGHNESS_M = MATERIAL_GRADES.pvc.roughnessM;
/** A valve is a short link of its own body: 1 m with the given bore, C = 140 (common practice, no source). */
const VALVE_LENGTH_M = 1;
const VALVE_BODY: NetworkPipe = {
  id: 'valve-body',
  insideDiameterM: 0.05,
  hazenWilliamsC: 140,
  roughnessM: PLASTIC_ROUGHNESS_M,
  label: 'valve',
};

/** Fails on a node or link by its record id, so the API names the element. */
export function elementError(
  kind: 'nodes' | 'links',
  record: { id: string; name: string },
  field: string,
  message: string,
): HydraulicsInputError {
  return new HydraulicsInputError(`${kind}.${record.id}.${field}`, `"${record.name}": ${message}`);
}

function groundAt(stations: readonly LineRouteStation[], chainageM: number): number {
  if (chainageM <= stations[0].chainageM) return stations[0].groundElevationM;
  for (let i = 1; i < stations.length; i++) {
    const a = stations[i - 1];
    const b = stations[i];
    if (chainageM <= b.chainageM) {
      const t = b.chainageM === a.chainageM ? 0 : (chainageM - a.chainageM) / (b.chainageM - a.chainageM);
      return a.groundElevationM + t * (b.groundElevationM - a.groundElevationM);
    }
  }
  return stations[stations.length - 1].groundElevationM;
}

/** Length along the ground between two chainages (slope length), m. */
function slopeLength(stations: readonly LineRouteStation[], fromM: number, toM: number): number {
  const points: [number, number][] = [[fromM, groundAt(stations, fromM)]];
  for (const s of stations)
    if (s.chainageM > fromM && s.chainageM < toM) points.push([s.chainageM, s.groundElevationM]);
  points.push([toM, groundAt(stations, toM)]);
  let length = 0;
  for (let i = 1; i < points.length; i++)
    length += Math.hypot(points[i][0] - points[i - 1][0], points[i][1] - points[i - 1][1]);
  return length;
}

function pipeOfLine(
  line: NetworkLineContext,
  chainageM: number,
): { pipe: string | NetworkPipe; id: string; label: string } {
  const stretch =
    line.design.stretches.find((s) => chainageM >= s.fromM && chainageM <= s.toM) ??
    line.design.stretches[line.design.stretches.length - 1];
  const chosen = stretch.pipe;
  if (typeof chosen !== 'string') return { pipe: chosen, id: chosen.id, label: chosen.label };
  const custom = line.design.pipes.find((p: PipeSpec) => p.id === chosen);
  return custom ? { pipe: custom, id: custom.id, label: custom.label } : { pipe: chosen, id: chosen, label: chosen };
}

function linkPipe(link: NetworkLinkRecord): { pipe: string | NetworkPipe; id: string; label: string } {
  const given = link.data.pipe;
  if (typeof given === 'string') return { pipe: given, id: given, label: given };
  if (given) return { pipe: given, id: given.id, label: given.label };
  if (link.data.insideDiameterM && link.data.hazenC) {
    const id = `${link.id}-bore`;
    const pipe = {
      id,
      insideDiameterM: link.data.insideDiameterM,
      hazenWilliamsC: link.data.hazenC,
      roughnessM: PLASTIC_ROUGHNESS_M,
      label: 'pipe of the ram plan',
    };
    return { pipe, id, label: 'pipe of the ram plan' };
  }
  if (link.kind === 'valve') return { pipe: VALVE_BODY, id: VALVE_BODY.id, label: 'valve' };
  throw elementError('links', link, 'data.pipe', 'pick a pipe');
}

function valveStatus(link: NetworkLinkRecord): { status: NetworkLinkStatus; setPressureHeadM?: number } {
  switch (link.data.valveKind) {
    case 'isolation':
      return { status: link.data.open === false ? 'closed' : 'open' };
    case 'check':
      return { status: 'check-valve' };
    case 'pressure-reducing':
      return { status: 'prv', setPressureHeadM: link.data.setHeadM };
    case 'float':
      return { status: 'float-valve' };
    default:
      return { status: 'open' };
  }
}

/** The line whose link ends at a node, for an outlet that draws "the line's flow". */
function lineEndingAt(context: NetworkContext, nodeId: string): NetworkLineContext | undefined {
  const link = context.records.links.find((l) => l.kind === 'line' && l.toNodeId === nodeId);
  return link ? context.lines.find((line) => line.id === link.lineId) : undefined;
}

function lineStartingAt(context: NetworkContext, nodeId: string): NetworkLineContext | undefined {
  const link = context.records.links.find((l) => l.kind === 'line' && l.fromNodeId === nodeId);
  return link ? context.lines.find((line) => line.id === link.lineId) : undefined;
}

/**
 * The day of the uses tied to an outlet, or null when none is tied; a use that cannot be computed fails on the outlet.
 */
function tiedUsesDay(node: NetworkNodeRecord, context: NetworkContext): ReturnType<typeof dailyDemand> | null {
  const tied = new Set(
    context.records.demandUseTies.filter((t) => t.outletNodeId === node.id).map((t) => t.demandUseId),
  );
  const uses = context.demandUses.filter((use) => tied.has(use.id));
  if (uses.length === 0) return null;
  try {
    return dailyDemand({ uses: uses.map(toWaterUse) });
  } catch (error) {
    if (error instanceof HydraulicsInputError)
      throw elementError(
        'nodes',
        node,
        'demandUses',
        `a demand use tied here cannot be computed (${error.message}); fix it on the Lift & storage page`,
      );
    throw error;
  }
}

/**
 * A peak figure (a fixed draw, or the design flow of the line that ends here) in the day run: the
 * busiest hour of the tied uses draws it and the other hours follow their shape; with no uses tied
 * there is no shape to follow, so it draws all day and a note says so.
 */
function peakDraw(
  node: NetworkNodeRecord,
  peakM3s: number,
  day: ReturnType<typeof dailyDemand> | null,
  mode: DemandMode,
  notes: BuiltNetwork['notes'],
): { demandM3s: number; hourlyFractions?: number[] } {
  if (mode === 'peak' || peakM3s <= 0) return { demandM3s: peakM3s };
  if (!day || day.dailyVolumeM3 <= 0) {
    notes.push({
      nodeId: node.id,
      message: `"${node.name}" has a fixed draw and no demand uses to give its hours; it draws that flow all day`,
    });
    return { demandM3s: peakM3s };
  }
  const draw = drawPatternWithPeak(peakM3s, day.hourlyVolumeM3);
  return { demandM3s: draw.meanFlowM3s, hourlyFractions: draw.hourlyFractions };
}

function outletDemand(
  node: NetworkNodeRecord,
  context: NetworkContext,
  mode: DemandMode,
  notes: BuiltNetwork['notes'],
): { demandM3s: number; hourlyFractions?: number[] } {
  const day = tiedUsesDay(node, context);
  const from = node.data.demandFrom ?? (day ? 'uses' : 'fixed');
  if (from === 'fixed') return peakDraw(node, node.data.fixedDemandM3s ?? 0, day, mode, notes);
  if (from === 'line') {
    const flow = lineEndingAt(context, node.id)?.design.flow;
    return peakDraw(node, flow?.kind === 'design' ? flow.flowM3s : 0, day, mode, notes);
  }
  if (!day) return { demandM3s: 0 };
  const total = day.dailyVolumeM3;
  // The steady solve draws the peak; the day run draws the mean flow shaped by the uses' hours.
  if (mode === 'peak' || total <= 0) return { demandM3s: day.peakFlowM3s };
  return { demandM3s: total / 86_400, hourlyFractions: day.hourlyVolumeM3.map((v) => v / total) };
}

function coreNode(
  node: NetworkNodeRecord,
  context: NetworkContext,
  notes: BuiltNetwork['notes'],
  mode: DemandMode,
): NetworkNode {
  const needElevation = (fallback: number | null | undefined): number => {
    const value = node.elevationM ?? fallback;
    if (value === null || value === undefined)
      throw elementError('nodes', node, 'elevationM', 'has no elevation; enter one');
    return value;
  };
  switch (node.kind) {
    case 'source': {
      const level = node.data.waterLevelM;
      if (level === null || level === undefined)
        throw elementError('nodes', node, 'data.waterLevelM', 'enter the water level of the source');
      const yieldM3s = node.waterSourceId ? context.sourceYieldsM3s[node.waterSourceId] : null;
      return {
        id: node.id,
        kind: 'source',
        elevationM: needElevation(level),
        waterLevelM: level,
        ...(yieldM3s != null ? { yieldM3s } : {}),
      };
    }
    case 'tank': {
      const tank = context.tanks.find((t) => t.id === node.tankId);
      if (!tank) throw elementError('nodes', node, 'tankId', 'pick the tank record');
      const floor = tank.baseElevationM ?? node.elevationM;
      if (floor === null)
        throw elementError(
          'nodes',
          node,
          'tankId',
          `the tank "${tank.name}" has no floor elevation; enter it on the Lift & storage page`,
        );
      let overflowDepth = tank.overflowLevelM;
      if (overflowDepth === null) {
        overflowDepth = tank.lowLevelM + ASSUMED_TANK_DEPTH_M;
        notes.push({
          nodeId: node.id,
          message: `"${tank.name}" has no overflow level; taken as ${ASSUMED_TANK_DEPTH_M} m above its lowest working level`,
        });
      }
      // The peak-hour solve holds the tank at its lowest working level (the outlets' worst case); the
      // day starts half full between that level and the overflow (common practice, no source).
      const level = mode === 'day' ? floor + (tank.lowLevelM + overflowDepth) / 2 : floor + tank.lowLevelM;
      return {
        id: node.id,
        kind: 'tank',
        elevationM: floor,
        waterLevelM: level,
        tank: { overflowLevelM: floor + overflowDepth, volumeM3: tank.volumeM3 },
      };
    }
    case 'ram-outlet': {
      const outlet = context.ramOutlets.find((o) => o.ramSiteId === node.ramSiteId);
      if (!outlet)
        throw elementError(
          'nodes',
          node,
          'ramSiteId',
          'the ram site is gone or has no workable plan; fix it on the Lift & storage page',
        );
      const line = lineStartingAt(context, node.id);
      return {
        id: node.id,
        kind: 'ram-outlet',
        elevationM: needElevation(outlet.pumpElevationM ?? line?.stations[0]?.groundElevationM),
        inflowM3s: outlet.deliveredFlowM3s,
      };
    }
    case 'break-pressure-tank': {
      const level = node.data.waterLevelM ?? node.elevationM;
      return {
        id: node.id,
        kind: 'break-pressure-tank',
        elevationM: needElevation(level),
        waterLevelM: level ?? undefined,
      };
    }
    case 'junction': {
      const line = context.lines.find((l) => l.id === node.lineId);
      if (!line || node.chainageM === null)
        throw elementError('nodes', node, 'lineId', 'the take-off is not on a line of the network');
      return { id: node.id, kind: 'junction', elevationM: needElevation(groundAt(line.stations, node.chainageM)) };
    }
    case 'outlet': {
      const line = lineEndingAt(context, node.id);
      const lastGround = line ? line.stations[line.stations.length - 1]?.groundElevationM : undefined;
      const residual =
        node.data.residualHeadM ??
        (node.data.outletKind === 'tank-inlet' || node.data.outletKind === 'free'
          ? 0
          : (line?.design.settings.minResidualHeadM ?? DEFAULT_LINE_SETTINGS.minResidualHeadM));
      const demand = outletDemand(node, context, mode, notes);
      return {
        id: node.id,
        kind: 'outlet',
        elevationM: needElevation(lastGround),
        minPressureHeadM: residual,
        ...demand,
      };
    }
  }
}

function lineLinks(
  link: NetworkLinkRecord,
  line: NetworkLineContext,
  takeOffs: NetworkNodeRecord[],
  extraNodes: NetworkNode[],
  pieces: BuiltNetwork['pieces'],
): NetworkLink[] {
  const start = line.stations[0].chainageM;
  const end = line.stations[line.stations.length - 1].chainageM;
  const cuts = new Map<number, string>([
    [start, link.fromNodeId],
    [end, link.toNodeId],
  ]);
  for (const takeOff of takeOffs)
    if (takeOff.chainageM! > start && takeOff.chainageM! < end) cuts.set(takeOff.chainageM!, takeOff.id);
  for (const stretch of line.design.stretches) {
    for (const at of [stretch.fromM, stretch.toM]) {
      if (at > start && at < end && !cuts.has(at)) {
        const id = `${link.id}@${at}`;
        cuts.set(at, id);
        extraNodes.push({ id, kind: 'junction', elevationM: groundAt(line.stations, at) });
      }
    }
  }
  const chainages = [...cuts.keys()].sort((a, b) => a - b);
  const result: NetworkLink[] = [];
  for (let k = 1; k < chainages.length; k++) {
    const fromM = chainages[k - 1];
    const toM = chainages[k];
    const pipe = pipeOfLine(line, (fromM + toM) / 2);
    const id = `${link.id}#${k}`;
    pieces[id] = { linkId: link.id, fromChainageM: fromM, toChainageM: toM, pipeId: pipe.id, pipeLabel: pipe.label };
    result.push({
      id,
      from: cuts.get(fromM)!,
      to: cuts.get(toM)!,
      lengthM: Math.max(slopeLength(line.stations, fromM, toM), 0.01),
      pipe: pipe.pipe,
    });
  }
  return result;
}

/** The network's core input from its records and what they read. Throws `HydraulicsInputError` naming the record. */
export function buildNetworkInput(context: NetworkContext, mode: DemandMode = 'peak'): BuiltNetwork {
  const { records } = context;
  const notes: BuiltNetwork['notes'] = [];
  const pieces: BuiltNetwork['pieces'] = {};
  const extraNodes: NetworkNode[] = [];
  const nodes = records.nodes.map((node) => coreNode(node, context, notes, mode));
  const tankWithFloat = new Set(
    records.nodes.filter((n) => n.kind === 'tank' && n.data.inletFloatValve !== false).map((n) => n.id),
  );
  const links: NetworkLink[] = [];
  for (const link of records.links) {
    if (link.kind === 'line') {
      const line = context.lines.find((l) => l.id === link.lineId);
      if (!line || line.stations.length < 2)
        throw elementError('links', link, 'lineId', 'the line has no route to follow; pick a route on the line page');
      const takeOffs = records.nodes.filter((n) => n.kind === 'junction' && n.lineId === line.id);
      const chain = lineLinks(link, line, takeOffs, extraNodes, pieces);
      if (tankWithFloat.has(link.toNodeId)) chain[chain.length - 1].status = 'float-valve';
      links.push(...chain);
      continue;
    }
    const pipe = linkPipe(link);
    const valve =
      link.kind === 'valve'
        ? valveStatus(link)
        : { status: (tankWithFloat.has(link.toNodeId) ? 'float-valve' : 'open') as NetworkLinkStatus };
    const lengthM = link.kind === 'valve' ? (link.data.lengthM ?? VALVE_LENGTH_M) : link.data.lengthM;
    if (!lengthM) throw elementError('links', link, 'data.lengthM', 'enter the pipe length');
    pieces[link.id] = {
      linkId: link.id,
      fromChainageM: null,
      toChainageM: null,
      pipeId: pipe.id,
      pipeLabel: pipe.label,
    };
    links.push({
      id: link.id,
      from: link.fromNodeId,
      to: link.toNodeId,
      lengthM,
      pipe: pipe.pipe,
      minorK: link.data.minorK ?? 0,
      ...valve,
    });
  }
  const names: Record<string, string> = {};
  for (const record of [...records.nodes, ...records.links]) names[record.id] = record.name;
  for (const [coreId, piece] of Object.entries(pieces)) names[coreId] ??= names[piece.linkId];
  return {
    input: { nodes: [...nodes, ...extraNodes], links },
    pieces,
    recordNodeIds: records.nodes.map((n) => n.id),
    names,
    notes,
  };
}
