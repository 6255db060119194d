import { findPipe } from '../catalogue/index';
import { HydraulicsInputError } from '../errors';
import { assertFiniteNumber, assertNonNegative, assertPositive } from '../input-guards';
import { DEFAULT_NETWORK_SETTINGS } from './settings';
import type { NetworkInput, NetworkLink, NetworkNode, NetworkNodeKind, NetworkPipe, NetworkLinkStatus } from './types';

const NODE_KINDS: readonly NetworkNodeKind[] = [
  'source',
  'tank',
  'junction',
  'outlet',
  'ram-outlet',
  'break-pressure-tank',
];
const LINK_STATUSES: readonly NetworkLinkStatus[] = ['open', 'closed', 'check-valve', 'prv', 'float-valve'];
/** Same ceiling as `assertPipeSpec`: no water pipe has a Hazen-Williams C above ~160. */
const MAX_HAZEN_WILLIAMS_C = 200;

/** Kinds whose head is fixed by a free water surface. */
export function hasFixedHead(kind: NetworkNodeKind): boolean {
  return kind === 'source' || kind === 'tank';
}

function assertId(value: unknown, field: string, index: number): asserts value is string {
  if (typeof value !== 'string' || value.trim() === '')
    throw new HydraulicsInputError(field, 'must be a non-empty string', index);
}

function assertNode(node: NetworkNode, index: number): void {
  if (typeof node !== 'object' || node === null) throw new HydraulicsInputError('nodes', 'must be an object', index);
  assertId(node.id, 'nodes.id', index);
  if (!NODE_KINDS.includes(node.kind)) {
    throw new HydraulicsInputError(
      'nodes.kind',
      `"${String(node.kind)}" is not one of ${NODE_KINDS.join(', ')}`,
      index,
    );
  }
  assertFiniteNumber(node.elevationM, 'nodes.elevationM', index);
  if (node.waterLevelM !== undefined) assertFiniteNumber(node.waterLevelM, 'nodes.waterLevelM', index);
  if (node.demandM3s !== undefined) assertNonNegative(node.demandM3s, 'nodes.demandM3s', index);
  if (node.minPressureHeadM !== undefined) assertFiniteNumber(node.minPressureHeadM, 'nodes.minPressureHeadM', index);
  if (node.yieldM3s !== undefined) assertNonNegative(node.yieldM3s, 'nodes.yieldM3s', index);
  if (node.kind === 'ram-outlet') assertNonNegative(node.inflowM3s, 'nodes.inflowM3s', index);
  else if (node.inflowM3s !== undefined)
    throw new HydraulicsInputError('nodes.inflowM3s', 'only a ram-outlet node has a fixed inflow', index);
  if (node.tank !== undefined) {
    assertFiniteNumber(node.tank.overflowLevelM, 'nodes.tank.overflowLevelM', index);
    if (node.tank.overflowLevelM <= node.elevationM) {
      throw new HydraulicsInputError(
        'nodes.tank.overflowLevelM',
        `must be above the tank floor (${node.elevationM} m)`,
        index,
      );
    }
    if (node.tank.areaM2 !== undefined) assertPositive(node.tank.areaM2, 'nodes.tank.areaM2', index);
    else assertPositive(node.tank.volumeM3, 'nodes.tank.volumeM3', index);
  }
}

/** The link's pipe as data: a catalogue id looked up, a spec checked for what the law needs. */
export function resolveNetworkPipe(pipe: string | NetworkPipe, method: string, index: number): NetworkPipe {
  const spec: NetworkPipe | undefined = typeof pipe === 'string' ? findPipe(pipe) : pipe;
  if (spec === undefined) throw new HydraulicsInputError('links.pipe', `no catalogue pipe "${String(pipe)}"`, index);
  if (typeof spec !== 'object' || spec === null)
    throw new HydraulicsInputError('links.pipe', 'must be a pipe id or a pipe spec', index);
  assertPositive(spec.insideDiameterM, 'links.pipe.insideDiameterM', index);
  if (method === 'hazen-williams') {
    assertPositive(spec.hazenWilliamsC, 'links.pipe.hazenWilliamsC', index);
    if (spec.hazenWilliamsC > MAX_HAZEN_WILLIAMS_C)
      throw new HydraulicsInputError('links.pipe.hazenWilliamsC', `must be at most ${MAX_HAZEN_WILLIAMS_C}`, index);
  } else {
    assertNonNegative(spec.roughnessM, 'links.pipe.roughnessM', index);
    if (spec.roughnessM > 0.1 * spec.insideDiameterM)
      throw new HydraulicsInputError('links.pipe.roughnessM', 'must be at most 0.1 × insideDiameterM', index);
  }
  if (spec.pressureRatingPa !== undefined) assertPositive(spec.pressureRatingPa, 'links.pipe.pressureRatingPa', index);
  return spec;
}

function assertLink(link: NetworkLink, index: number, nodes: ReadonlyMap<string, NetworkNode>, method: string): void {
  if (typeof link !== 'object' || link === null) throw new HydraulicsInputError('links', 'must be an object', index);
  assertId(link.id, 'links.id', index);
  for (const end of ['from', 'to'] as const) {
    assertId(link[end], `links.${end}`, index);
    if (!nodes.has(link[end]))
      throw new HydraulicsInputError(`links.${end}`, `link "${link.id}" names no node "${link[end]}"`, index);
  }
  if (link.from === link.to)
    throw new HydraulicsInputError('links.to', `link "${link.id}" starts and ends at "${link.from}"`, index);
  assertNonNegative(link.lengthM, 'links.lengthM', index);
  resolveNetworkPipe(link.pipe, method, index);
  if (link.minorK !== undefined) assertNonNegative(link.minorK, 'links.minorK', index);
  const status = link.status ?? 'open';
  if (!LINK_STATUSES.includes(status)) {
    throw new HydraulicsInputError(
      'links.status',
      `"${String(status)}" is not one of ${LINK_STATUSES.join(', ')}`,
      index,
    );
  }
  const to = nodes.get(link.to) as NetworkNode;
  if (status === 'prv') {
    assertFiniteNumber(link.setPressureHeadM, 'links.setPressureHeadM', index);
    if (hasFixedHead(to.kind) || to.kind === 'break-pressure-tank') {
      throw new HydraulicsInputError(
        'links.to',
        `the pressure-reducing valve "${link.id}" cannot feed the ${to.kind} "${to.id}" directly`,
        index,
      );
    }
  }
  if (status === 'float-valve' && to.kind !== 'tank') {
    throw new HydraulicsInputError(
      'links.status',
      `a float valve sits at a tank inlet, but "${link.to}" is a ${to.kind}`,
      index,
    );
  }
  if (link.maxRouteStaticPressureHeadM !== undefined)
    assertFiniteNumber(link.maxRouteStaticPressureHeadM, 'links.maxRouteStaticPressureHeadM', index);
}

/** Checks a network input field by field; throws `HydraulicsInputError` naming the first bad one. */
export function assertNetworkInput(input: NetworkInput): void {
  if (typeof input !== 'object' || input === null) throw new HydraulicsInputError('network', 'must be an object');
  if (!Array.isArray(input.nodes) || input.nodes.length === 0)
    throw new HydraulicsInputError('nodes', 'needs at least one node');
  if (!Array.isArray(input.links)) throw new HydraulicsInputError('links', 'must be a list');
  const nodes = new Map<string, NetworkNode>();
  input.nodes.forEach((node, index) => {
    assertNode(node, index);
    if (nodes.has(node.id)) throw new HydraulicsInputError('nodes.id', `"${node.id}" is used twice`, index);
    nodes.set(node.id, node);
  });
  const method = input.settings?.frictionMethod ?? DEFAULT_NETWORK_SETTINGS.frictionMethod;
  if (method !== 'hazen-williams' && method !== 'darcy-weisbach') {
    throw new HydraulicsInputError(
      'settings.frictionMethod',
      `must be 'hazen-williams' or 'darcy-weisbach', got ${String(method)}`,
    );
  }
  for (const key of [
    'hazenWilliamsConstant',
    'hazenWilliamsFlowExponent',
    'hazenWilliamsDiameterExponent',
    'flowTolerance',
    'headTolerance',
    'maxIterations',
  ] as const) {
    const value = input.settings?.[key];
    if (value !== undefined) assertPositive(value, `settings.${key}`);
  }
  if (input.settings?.entranceLossK !== undefined)
    assertNonNegative(input.settings.entranceLossK, 'settings.entranceLossK');
  const freeSurface = input.settings?.freeSurfaceLosses;
  if (freeSurface !== undefined && typeof freeSurface !== 'boolean')
    throw new HydraulicsInputError('settings.freeSurfaceLosses', 'must be true or false');
  const linkIds = new Set<string>();
  const prvTargets = new Map<string, string>();
  input.links.forEach((link, index) => {
    assertLink(link, index, nodes, method);
    if (linkIds.has(link.id)) throw new HydraulicsInputError('links.id', `"${link.id}" is used twice`, index);
    linkIds.add(link.id);
    if (link.status === 'prv') {
      const other = prvTargets.get(link.to);
      if (other !== undefined)
        throw new HydraulicsInputError(
          'links.to',
          `node "${link.to}" is fed by two pressure-reducing valves ("${other}", "${link.id}")`,
          index,
        );
      prvTargets.set(link.to, link.id);
    }
  });
}
