import { scaleLinear } from 'd3-scale';
import { line as d3line } from 'd3-shape';
import type { NetworkLayout } from '../network/layout';
import type { NodeResult, SolveRunResult } from '../network/run-result';
import type { NetworkView } from '../network/view';
import type { NetworkPin } from '../review/threads';
import { formatQuantity, type UnitSystem } from '../units';
import { PROFILE_COLOURS } from './profile-palette';
import { PIN_COLOURS, pinFlag } from './profile-review';
import { el, type SvgNode } from './svg-node';

/**
 * The network schematic as a plain SVG node tree (drawn by React on screen and into the PDF, like
 * the long profile). Every node and link carries its name in words beside its shape, and results
 * are written out (size, flow with an arrow for its direction, pressure), so it reads in black and
 * white. Layers: links, link labels, nodes, node labels, legend.
 */

export interface NetworkSceneOptions {
  view: NetworkView;
  layout: NetworkLayout;
  solve: SolveRunResult | null;
  units: UnitSystem;
  width: number;
  height: number;
  selectedId?: string | null;
  /** Review comments pinned to nodes and links (a layer above the nodes). */
  pins?: readonly NetworkPin[];
}

const KIND_WORDS: Record<string, string> = {
  source: 'Source',
  'ram-outlet': 'Ram outlet',
  tank: 'Tank',
  'break-pressure-tank': 'Break-pressure tank',
  junction: 'Take-off',
  outlet: 'Outlet',
};
const LINK_STROKE = { line: '#2d7590', pipe: '#5c8a3a', valve: '#a5700c' } as const;
const MARGIN = 48;

function nodeShape(kind: string, x: number, y: number, colour: string): SvgNode {
  const common = { fill: colour, stroke: PROFILE_COLOURS.ink, 'stroke-width': 1.5 };
  switch (kind) {
    case 'source':
      return el('path', { ...common, d: `M${x},${y - 9} L${x + 9},${y + 7} L${x - 9},${y + 7} Z` });
    case 'tank':
      return el('rect', { ...common, x: x - 10, y: y - 8, width: 20, height: 16 });
    case 'break-pressure-tank':
      return el('rect', { ...common, x: x - 7, y: y - 7, width: 14, height: 14, 'stroke-dasharray': '3 2' });
    case 'ram-outlet':
      return el('path', { ...common, d: `M${x},${y - 10} L${x + 10},${y} L${x},${y + 10} L${x - 10},${y} Z` });
    case 'junction':
      return el('circle', { ...common, cx: x, cy: y, r: 5 });
    default:
      return el(
        'g',
        {},
        el('circle', { ...common, cx: x, cy: y, r: 8, fill: '#fff' }),
        el('circle', { cx: x, cy: y, r: 3, fill: PROFILE_COLOURS.ink }),
      );
  }
}

const NODE_FILL: Record<string, string> = {
  source: '#78b4c7',
  tank: '#b9dbe6',
  'break-pressure-tank': '#d5e9ef',
  'ram-outlet': '#e7c877',
  junction: '#183d4d',
  outlet: '#fff',
};

function pressureWords(result: NodeResult | undefined, units: UnitSystem): string | null {
  if (!result || result.pressureHeadM === null) return null;
  const short = result.minPressureHeadM !== null && result.pressureHeadM < result.minPressureHeadM - 1e-6;
  return `${formatQuantity('head', result.pressureHeadM, units)} head${short ? ' (short)' : ''}`;
}

/** The middle of a course by its points: halfway along a straight link, the middle point of a line's route. */
function midCourse(course: readonly { x: number; y: number }[]): { x: number; y: number } {
  const half = course.length / 2;
  if (Number.isInteger(half))
    return { x: (course[half - 1].x + course[half].x) / 2, y: (course[half - 1].y + course[half].y) / 2 };
  return course[Math.floor(half)];
}

/** Label text lines are this far apart, px; labels closer than a box of this size would overlap. */
const LABEL_LINE_PX = 12;
const LABEL_WIDTH_PX = 140;

/**
 * Where along its course a link's label goes: the middle, unless another label is already there (two
 * lines on one route share a course), then a third or two thirds along, and failing that stacked
 * below the labels in the way. Records the place taken.
 */
function labelIndex(
  course: readonly { x: number; y: number }[],
  placed: { x: number; y: number; lines: number }[],
  lines: number,
): { index: number; dy: number } {
  const clash = (p: { x: number; y: number }, dy: number) =>
    placed.find(
      (q) =>
        Math.abs(q.x - p.x) < LABEL_WIDTH_PX &&
        p.y + dy < q.y + q.lines * LABEL_LINE_PX &&
        q.y < p.y + dy + lines * LABEL_LINE_PX,
    );
  const last = course.length - 1;
  const candidates = [0.5, 1 / 3, 2 / 3, 0.2, 0.8].map((f) => Math.round(last * f));
  for (const index of candidates) {
    if (!clash(course[index], 0)) {
      placed.push({ ...course[index], lines });
      return { index, dy: 0 };
    }
  }
  const index = candidates[0];
  let dy = 0;
  for (let other = clash(course[index], dy); other; other = clash(course[index], dy))
    dy = other.y + other.lines * LABEL_LINE_PX + 2 - course[index].y;
  placed.push({ x: course[index].x, y: course[index].y + dy, lines });
  return { index, dy };
}

export function buildNetworkScene({
  view,
  layout,
  solve,
  units,
  width,
  height,
  selectedId,
  pins = [],
}: NetworkSceneOptions): SvgNode {
  const points = Object.values(layout.nodes).concat(
    Object.values(layout.courses)
      .flat()
      .map((p) => ({ ...p, from: 'route' as const })),
  );
  const xs = points.map((p) => p.x);
  const ys = points.map((p) => p.y);
  const [x0, x1] = xs.length ? [Math.min(...xs), Math.max(...xs)] : [0, 1];
  const [y0, y1] = ys.length ? [Math.min(...ys), Math.max(...ys)] : [0, 1];
  // One scale for both axes so the plan is not distorted.
  const span = Math.max(x1 - x0, y1 - y0, 1);
  const pixels = Math.min(width, height) - 2 * MARGIN;
  const cx = (x0 + x1) / 2;
  const cy = (y0 + y1) / 2;
  const xOf = scaleLinear()
    .domain([cx - span / 2, cx + span / 2])
    .range([width / 2 - pixels / 2, width / 2 + pixels / 2]);
  const yOf = scaleLinear()
    .domain([cy - span / 2, cy + span / 2])
    .range([height / 2 + pixels / 2, height / 2 - pixels / 2]);
  const path = d3line<{ x: number; y: number }>()
    .x((p) => xOf(p.x))
    .y((p) => yOf(p.y));
  const linkResult = new Map((solve?.links ?? []).map((l) => [l.linkId, l]));
  const nodeResult = new Map((solve?.nodes ?? []).map((n) => [n.nodeId, n]));

  const linkLayer: SvgNode[] = [];
  const linkLabels: SvgNode[] = [];
  const placedLabels: { x: number; y: number; lines: number }[] = [];
  for (const link of view.records.links) {
    const course = layout.courses[link.id] ?? [];
    if (course.length < 2) continue;
    const result = linkResult.get(link.id);
    const widest = result ? Math.max(...result.pieces.map((p) => p.insideDiameterM || 0)) : 0;
    const strokeWidth = result && widest > 0 ? Math.min(9, 1.5 + widest * 60) : 2.5;
    const selected = selectedId === link.id;
    linkLayer.push(
      el('path', {
        d: path(course) ?? '',
        fill: 'none',
        stroke: LINK_STROKE[link.kind],
        'stroke-width': selected ? strokeWidth + 2 : strokeWidth,
        'stroke-dasharray': link.kind === 'valve' ? '6 3' : undefined,
        'data-link-id': link.id,
        'data-kind': link.kind,
      }),
    );
    const words = [link.name];
    if (result) words.push('', '');
    // A straight link has only its two ends: give it points a third, half and two thirds along, so its
    // label can sit halfway (or step aside for another label) rather than on an end node.
    const along =
      course.length === 2
        ? [0, 1 / 3, 1 / 2, 2 / 3, 1].map((f) => ({
            x: course[0].x + f * (course[1].x - course[0].x),
            y: course[0].y + f * (course[1].y - course[0].y),
          }))
        : course;
    const at = labelIndex(
      along.map((p) => ({ x: xOf(p.x), y: yOf(p.y) })),
      placedLabels,
      words.length,
    );
    const mid = along[at.index];
    const before = along[Math.max(0, at.index - 1)];
    const after = along[Math.min(along.length - 1, at.index + 1)];
    const forward = !result || result.flowM3s >= 0;
    const angle =
      (Math.atan2(yOf(after.y) - yOf(before.y), xOf(after.x) - xOf(before.x)) * 180) / Math.PI + (forward ? 0 : 180);
    if (result) {
      const sizes = [...new Set(result.pieces.map((p) => p.pipeLabel))];
      words[1] = sizes.join(' / ');
      words[2] = `${formatQuantity('designFlow', Math.abs(result.flowM3s), units)} ${forward ? '→' : '←'}`;
    }
    linkLabels.push(
      el(
        'g',
        { 'data-link-label': link.id },
        result
          ? el('path', {
              d: 'M-6,-4 L6,0 L-6,4 Z',
              fill: PROFILE_COLOURS.ink,
              transform: `translate(${xOf(mid.x)},${yOf(mid.y)}) rotate(${angle})`,
            })
          : null,
        ...words.map((w, i) =>
          el(
            'text',
            {
              x: xOf(mid.x) + 8,
              y: yOf(mid.y) - 6 + at.dy + i * 12,
              'font-size': 10,
              fill: PROFILE_COLOURS.ink,
              'paint-order': 'stroke',
              stroke: '#fbfaf6',
              'stroke-width': 3,
            },
            w,
          ),
        ),
      ),
    );
  }

  const nodeLayer: SvgNode[] = [];
  const nodeLabels: SvgNode[] = [];
  for (const node of view.records.nodes) {
    const p = layout.nodes[node.id];
    if (!p) continue;
    const px = xOf(p.x);
    const py = yOf(p.y);
    nodeLayer.push(
      el(
        'g',
        { 'data-node-id': node.id, 'data-kind': node.kind },
        selectedId === node.id
          ? el('circle', { cx: px, cy: py, r: 15, fill: 'none', stroke: '#c98d12', 'stroke-width': 2 })
          : null,
        nodeShape(node.kind, px, py, NODE_FILL[node.kind] ?? '#fff'),
      ),
    );
    const pressure = pressureWords(nodeResult.get(node.id), units);
    // Two nodes at one place (two lines from one spring box) stack their labels rather than print over each other.
    const { dy } = labelIndex([{ x: px, y: py + 4 }], placedLabels, 2);
    nodeLabels.push(
      el(
        'g',
        { 'data-node-label': node.id, transform: dy ? `translate(0, ${dy})` : undefined },
        el(
          'text',
          {
            x: px + 12,
            y: py + 14,
            'font-size': 11,
            'font-weight': 600,
            fill: PROFILE_COLOURS.ink,
            'paint-order': 'stroke',
            stroke: '#fbfaf6',
            'stroke-width': 3,
          },
          `${node.name}`,
        ),
        el(
          'text',
          {
            x: px + 12,
            y: py + 26,
            'font-size': 10,
            fill: '#4b5a60',
            'paint-order': 'stroke',
            stroke: '#fbfaf6',
            'stroke-width': 3,
          },
          [KIND_WORDS[node.kind], pressure].filter(Boolean).join(' · '),
        ),
      ),
    );
  }

  // A pin stands above its node, or on the middle of its link's course; several on one part stand side by side.
  const pinsByPart = new Map<string, NetworkPin[]>();
  for (const pin of pins) pinsByPart.set(pin.partId, [...(pinsByPart.get(pin.partId) ?? []), pin]);
  const pinLayer: SvgNode[] = [];
  for (const [partId, partPins] of pinsByPart) {
    const course = layout.courses[partId];
    const at =
      partPins[0].part === 'node' ? layout.nodes[partId] : course && course.length > 0 ? midCourse(course) : undefined;
    if (!at) continue;
    partPins.forEach((pin, i) => {
      const x = xOf(at.x) + i * 17;
      const tipY = yOf(at.y) - (pin.part === 'node' ? 10 : 2);
      const colour = pin.selected ? PIN_COLOURS.selected : pin.resolved ? PIN_COLOURS.resolved : PIN_COLOURS.open;
      pinLayer.push(
        el(
          'g',
          { 'data-comment-id': pin.id, 'data-part-id': partId, 'data-resolved': pin.resolved ? 'yes' : 'no' },
          el('title', {}, `Comment ${pin.label}${pin.resolved ? ' (resolved)' : ''}`),
          ...pinFlag(x, tipY, pin.label, colour),
        ),
      );
    });
  }

  const legend = el(
    'g',
    { 'data-layer': 'legend', transform: `translate(12, ${height - 24})` },
    ...(['source', 'tank', 'junction', 'outlet'] as const).flatMap((kind, i) => [
      nodeShape(kind, 10 + i * 110, 0, NODE_FILL[kind]),
      el('text', { x: 24 + i * 110, y: 4, 'font-size': 10, fill: PROFILE_COLOURS.ink }, KIND_WORDS[kind]),
    ]),
    el(
      'text',
      { x: 460, y: 4, 'font-size': 10, fill: PROFILE_COLOURS.ink },
      solve ? 'Line width grows with pipe size; arrows show flow direction' : 'Solve to see sizes, flows and pressures',
    ),
  );

  return el(
    'svg',
    {
      viewBox: `0 0 ${width} ${height}`,
      width: '100%',
      role: 'img',
      'aria-label': 'Network schematic',
      'data-scene': 'network',
    },
    el('rect', { x: 0, y: 0, width, height, fill: PROFILE_COLOURS.paper }),
    el('g', { 'data-layer': 'links' }, ...linkLayer),
    el('g', { 'data-layer': 'link-labels' }, ...linkLabels),
    el('g', { 'data-layer': 'nodes' }, ...nodeLayer),
    el('g', { 'data-layer': 'node-labels' }, ...nodeLabels),
    pinLayer.length ? el('g', { 'data-layer': 'comment-pins' }, ...pinLayer) : null,
    legend,
  );
}
