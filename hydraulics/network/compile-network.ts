import { waterKinematicViscosityM2s } from '../water';
import { pipeAreaM2 } from '../friction/pipe-flow';
import { LINEAR_BELOW_VELOCITY_MS, minorLossCoefficient, type LinkLaw } from './link-loss';
import { resolveNetworkSettings, type ResolvedNetworkSettings } from './settings';
import type { NetworkInput, NetworkLinkStatus, NetworkNode, NetworkPipe } from './types';
import { assertNetworkInput, hasFixedHead, resolveNetworkPipe } from './validate-network';

/**
 * The network as flat arrays for the solver. A break-pressure tank becomes two nodes: a hidden
 * inlet that takes every pipe arriving at the tank, and the tank itself, joined by a hidden
 * float valve that behaves like a pressure-reducing valve holding the tank's water level (the
 * float shuts as far as needed to pass only what the outlet side draws).
 */
export interface CompiledNetwork {
  settings: ResolvedNetworkSettings;
  nodes: readonly NetworkNode[];
  /** Node count including the hidden inlets (visible nodes come first, in input order). */
  nodeCount: number;
  nodeIds: string[];
  nodeIndex: ReadonlyMap<string, number>;
  elevationM: Float64Array;
  /** Demand minus fixed inflow, m³/s. */
  netDemandM3s: Float64Array;
  /** Water level of sources and tanks; NaN for nodes whose head is solved for. */
  fixedHeadM: Float64Array;
  /** Link count including hidden float valves (visible links first, in input order). */
  linkCount: number;
  visibleLinkCount: number;
  linkIds: string[];
  from: Int32Array;
  to: Int32Array;
  laws: LinkLaw[];
  /** Minor-loss coefficient m of m·Q|Q|, m per (m³/s)². */
  minor: Float64Array;
  /** Total K of each link behind `minor`: its fittings plus the free-surface entrance (for a pipe of another bore). */
  minorK: Float64Array;
  diameterM: Float64Array;
  /** Length of each link, m (0 for the hidden float valves). */
  lengthM: Float64Array;
  /** Flow below which the link's loss is linear (see `LINEAR_BELOW_VELOCITY_MS`), m³/s. */
  linearBelowM3s: Float64Array;
  pipes: NetworkPipe[];
  status: NetworkLinkStatus[];
  /** Hydraulic grade a PRV holds at its `to` node, m; NaN for other links. */
  setHeadM: Float64Array;
  /** Float valves shut because their tank is full. */
  shutByFullTank: Uint8Array;
}

function lawFor(pipe: NetworkPipe, lengthM: number, settings: ResolvedNetworkSettings, viscosity: number): LinkLaw {
  if (settings.frictionMethod === 'darcy-weisbach') {
    return {
      kind: 'darcy-weisbach',
      lengthM,
      diameterM: pipe.insideDiameterM,
      relativeRoughness: (pipe.roughnessM ?? 0) / pipe.insideDiameterM,
      kinematicViscosityM2s: viscosity,
    };
  }
  const a = settings.hazenWilliamsFlowExponent;
  const resistance =
    (settings.hazenWilliamsConstant * lengthM) /
    ((pipe.hazenWilliamsC as number) ** a * pipe.insideDiameterM ** settings.hazenWilliamsDiameterExponent);
  return { kind: 'hazen-williams', resistance, exponent: a };
}

/** Validates and flattens a network input. Throws `HydraulicsInputError` for bad input. */
export function compileNetwork(input: NetworkInput): CompiledNetwork {
  assertNetworkInput(input);
  const settings = resolveNetworkSettings(input.settings);
  const viscosity = waterKinematicViscosityM2s(settings.waterTemperatureC);
  // Line analysis, analyze-profile.ts: the grade one velocity head plus the entrance loss below a free surface.
  const freeSurfaceK = (node: NetworkNode): number =>
    settings.freeSurfaceLosses && (hasFixedHead(node.kind) || node.kind === 'break-pressure-tank')
      ? 1 + settings.entranceLossK
      : 0;
  const hiddenInlets = input.nodes.filter((node) => node.kind === 'break-pressure-tank');
  const nodeCount = input.nodes.length + hiddenInlets.length;
  const nodeIds = [...input.nodes.map((node) => node.id), ...hiddenInlets.map((node) => `${node.id}#inlet`)];
  const nodeIndex = new Map<string, number>(input.nodes.map((node, index) => [node.id, index]));
  const elevationM = new Float64Array(nodeCount);
  const netDemandM3s = new Float64Array(nodeCount);
  const fixedHeadM = new Float64Array(nodeCount).fill(Number.NaN);
  input.nodes.forEach((node, index) => {
    elevationM[index] = node.elevationM;
    netDemandM3s[index] = (node.demandM3s ?? 0) - (node.inflowM3s ?? 0);
    if (hasFixedHead(node.kind)) fixedHeadM[index] = node.waterLevelM ?? node.elevationM;
  });
  const inletOf = new Map<number, number>();
  hiddenInlets.forEach((node, k) => {
    const inlet = input.nodes.length + k;
    inletOf.set(nodeIndex.get(node.id) as number, inlet);
    elevationM[inlet] = node.waterLevelM ?? node.elevationM;
  });
  const linkCount = input.links.length + hiddenInlets.length;
  const from = new Int32Array(linkCount);
  const to = new Int32Array(linkCount);
  const minor = new Float64Array(linkCount);
  const minorK = new Float64Array(linkCount);
  const diameterM = new Float64Array(linkCount);
  const lengthM = new Float64Array(linkCount);
  const setHeadM = new Float64Array(linkCount).fill(Number.NaN);
  const shutByFullTank = new Uint8Array(linkCount);
  const laws: LinkLaw[] = [];
  const pipes: NetworkPipe[] = [];
  const status: NetworkLinkStatus[] = [];
  const linkIds: string[] = [];
  input.links.forEach((link, index) => {
    const pipe = resolveNetworkPipe(link.pipe, settings.frictionMethod, index);
    const toIndex = nodeIndex.get(link.to) as number;
    from[index] = nodeIndex.get(link.from) as number;
    to[index] = inletOf.get(toIndex) ?? toIndex;
    laws.push(lawFor(pipe, link.lengthM, settings, viscosity));
    minorK[index] = (link.minorK ?? 0) + freeSurfaceK(input.nodes[from[index]]);
    minor[index] = minorLossCoefficient(minorK[index], pipe.insideDiameterM);
    diameterM[index] = pipe.insideDiameterM;
    lengthM[index] = link.lengthM;
    pipes.push(pipe);
    linkIds.push(link.id);
    const linkStatus = link.status ?? 'open';
    status.push(linkStatus);
    if (linkStatus === 'prv') setHeadM[index] = input.nodes[toIndex].elevationM + (link.setPressureHeadM as number);
    const tank = input.nodes[toIndex];
    if (linkStatus === 'float-valve' && tank.tank && (tank.waterLevelM ?? tank.elevationM) >= tank.tank.overflowLevelM)
      shutByFullTank[index] = 1;
  });
  hiddenInlets.forEach((node, k) => {
    const link = input.links.length + k;
    const tankIndex = nodeIndex.get(node.id) as number;
    from[link] = input.nodes.length + k;
    to[link] = tankIndex;
    laws.push({ kind: 'hazen-williams', resistance: 0, exponent: settings.hazenWilliamsFlowExponent });
    diameterM[link] = 1;
    pipes.push({ id: 'float-valve', insideDiameterM: 1 });
    linkIds.push(`${node.id}#float-valve`);
    status.push('prv');
    setHeadM[link] = node.waterLevelM ?? node.elevationM;
  });
  return {
    settings,
    nodes: input.nodes,
    nodeCount,
    nodeIds,
    nodeIndex,
    elevationM,
    netDemandM3s,
    fixedHeadM,
    linkCount,
    visibleLinkCount: input.links.length,
    linkIds,
    from,
    to,
    laws,
    minor,
    minorK,
    diameterM,
    lengthM,
    linearBelowM3s: Float64Array.from(diameterM, (d) => LINEAR_BELOW_VELOCITY_MS * pipeAreaM2(d)),
    pipes,
    status,
    setHeadM,
    shutByFullTank,
  };
}
