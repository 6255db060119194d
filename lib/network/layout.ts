import type { NetworkView } from './view';

/** Where the schematic draws each node and each link's course, in metres east/north of the first surveyed point. */
export interface NetworkLayout {
  nodes: Record<string, { x: number; y: number; from: 'placed' | 'route' | 'automatic' }>;
  /** Link id -> its course (a line follows its route; other links run straight). */
  courses: Record<string, { x: number; y: number }[]>;
}

const EARTH_RADIUS_M = 6371008.8;
/** Spacing of the automatic layout, m (a schematic distance, not a survey one). */
const AUTO_STEP_M = 100;

type PlanPoint = NetworkView['lines'][number]['plan'][number];

function projector(view: NetworkView) {
  const first = view.lines.flatMap((l) => l.plan).find((p) => p.latitudeDeg !== null && p.longitudeDeg !== null);
  if (!first) return null;
  const lat0 = (first.latitudeDeg! * Math.PI) / 180;
  return (p: PlanPoint) =>
    p.latitudeDeg === null || p.longitudeDeg === null
      ? null
      : {
          x: (((p.longitudeDeg - first.longitudeDeg!) * Math.PI) / 180) * EARTH_RADIUS_M * Math.cos(lat0),
          y: (((p.latitudeDeg - first.latitudeDeg!) * Math.PI) / 180) * EARTH_RADIUS_M,
        };
}

function pointAt(points: { chainageM: number; x: number; y: number }[], chainageM: number) {
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1];
    const b = points[i];
    if (chainageM <= b.chainageM) {
      const t = b.chainageM === a.chainageM ? 0 : Math.max(0, (chainageM - a.chainageM) / (b.chainageM - a.chainageM));
      return { x: a.x + t * (b.x - a.x), y: a.y + t * (b.y - a.y) };
    }
  }
  return points[points.length - 1];
}

/**
 * Positions from the survey where there are any (a node placed by hand, a line's ends and its
 * take-offs on its route); every other node is laid out automatically by its distance in links
 * from a water source, beside what is already placed.
 */
export function layoutNetwork(view: NetworkView): NetworkLayout {
  const { nodes, links } = view.records;
  const project = projector(view);
  const layout: NetworkLayout = { nodes: {}, courses: {} };
  const routeOf = new Map<string, { chainageM: number; x: number; y: number }[]>();
  for (const line of view.lines) {
    const points = project
      ? line.plan.flatMap((p) => {
          const xy = project(p);
          return xy ? [{ chainageM: p.chainageM, ...xy }] : [];
        })
      : [];
    if (points.length >= 2) routeOf.set(line.id, points);
  }
  for (const node of nodes)
    if (node.eastM !== null && node.northM !== null)
      layout.nodes[node.id] = { x: node.eastM, y: node.northM, from: 'placed' };
  for (const link of links) {
    const route = link.lineId ? routeOf.get(link.lineId) : undefined;
    if (!route) continue;
    layout.nodes[link.fromNodeId] ??= { ...route[0], from: 'route' };
    layout.nodes[link.toNodeId] ??= { ...route[route.length - 1], from: 'route' };
  }
  for (const node of nodes) {
    const route = node.lineId ? routeOf.get(node.lineId) : undefined;
    if (route && node.chainageM !== null)
      layout.nodes[node.id] ??= { ...pointAt(route, node.chainageM), from: 'route' };
  }

  // Automatic: breadth-first from the water sources (or the first node), one column per step.
  const neighbours = new Map<string, string[]>();
  for (const link of links) {
    neighbours.set(link.fromNodeId, [...(neighbours.get(link.fromNodeId) ?? []), link.toNodeId]);
    neighbours.set(link.toNodeId, [...(neighbours.get(link.toNodeId) ?? []), link.fromNodeId]);
  }
  const placed = Object.values(layout.nodes);
  const left = placed.length ? Math.min(...placed.map((p) => p.x)) : 0;
  const bottom = placed.length ? Math.min(...placed.map((p) => p.y)) - AUTO_STEP_M : 0;
  const depth = new Map<string, number>();
  const roots = nodes.filter((n) => n.kind === 'source' || n.kind === 'ram-outlet');
  const queue = (roots.length ? roots : nodes.slice(0, 1)).map((n) => n.id);
  queue.forEach((id) => depth.set(id, 0));
  while (queue.length) {
    const id = queue.shift()!;
    for (const next of neighbours.get(id) ?? [])
      if (!depth.has(next)) {
        depth.set(next, depth.get(id)! + 1);
        queue.push(next);
      }
  }
  const rows = new Map<number, number>();
  for (const node of nodes) {
    if (layout.nodes[node.id]) continue;
    const neighbour = (neighbours.get(node.id) ?? []).map((id) => layout.nodes[id]).find(Boolean);
    const column = depth.get(node.id) ?? 0;
    const row = rows.get(column) ?? 0;
    rows.set(column, row + 1);
    layout.nodes[node.id] = neighbour
      ? {
          x: neighbour.x + AUTO_STEP_M * 0.6 * (row + 1),
          y: neighbour.y - AUTO_STEP_M * 0.6 * (row + 1),
          from: 'automatic',
        }
      : { x: left + column * AUTO_STEP_M, y: bottom - row * AUTO_STEP_M, from: 'automatic' };
  }
  for (const link of links) {
    const route = link.lineId ? routeOf.get(link.lineId) : undefined;
    layout.courses[link.id] = route
      ? route.map(({ x, y }) => ({ x, y }))
      : [layout.nodes[link.fromNodeId], layout.nodes[link.toNodeId]].filter(Boolean).map(({ x, y }) => ({ x, y }));
  }
  return layout;
}
