import { describe, expect, it } from 'vitest';
import { buildNetworkScene } from '@/lib/chart/network-scene';
import type { SvgNode } from '@/lib/chart/svg-node';
import type { NetworkLayout } from '@/lib/network/layout';
import type { NetworkView } from '@/lib/network/view';

/** Every text element under a group carrying `attribute`, with the group's id and its text's y positions. */
function labels(root: SvgNode, attribute: string): { id: string; x: number; ys: number[] }[] {
  const found: { id: string; x: number; ys: number[] }[] = [];
  const walk = (node: SvgNode | string | null | undefined, shift: number) => {
    if (!node || typeof node === 'string') return;
    const translate = /translate\(0, ([-\d.]+)\)/.exec(String(node.attrs?.transform ?? ''));
    const dy = shift + (translate ? Number(translate[1]) : 0);
    if (node.attrs?.[attribute] !== undefined) {
      const texts = (node.children ?? []).filter(
        (c): c is SvgNode => typeof c === 'object' && c !== null && c.tag === 'text',
      );
      found.push({
        id: String(node.attrs[attribute]),
        x: Number(texts[0].attrs!.x),
        ys: texts.map((t) => Number(t.attrs!.y) + dy),
      });
      return;
    }
    for (const child of node.children ?? []) walk(child as SvgNode, dy);
  };
  walk(root, 0);
  return found;
}

const overlaps = (a: { x: number; ys: number[] }, b: { x: number; ys: number[] }) =>
  Math.abs(a.x - b.x) < 100 &&
  Math.min(...a.ys) <= Math.max(...b.ys) + 10 &&
  Math.min(...b.ys) <= Math.max(...a.ys) + 10;

describe('network schematic labels', () => {
  // Invented: two lines on one route from one spring box to one house (a design and its option).
  const course = [
    { x: 0, y: 0 },
    { x: 100, y: 40 },
    { x: 200, y: 60 },
    { x: 300, y: 120 },
    { x: 400, y: 140 },
  ];
  const view = {
    records: {
      nodes: [
        { id: 'a', name: 'Spring box', kind: 'source' },
        { id: 'b', name: 'Spring box (option)', kind: 'source' },
        { id: 'c', name: 'House', kind: 'outlet' },
        { id: 'd', name: 'House (option)', kind: 'outlet' },
      ],
      links: [
        { id: 'l1', name: 'Spring box to house', kind: 'line' },
        { id: 'l2', name: 'PN 16 option', kind: 'line' },
      ],
    },
  } as unknown as NetworkView;
  const layout: NetworkLayout = {
    nodes: {
      a: { x: 0, y: 0, from: 'route' },
      b: { x: 0, y: 0, from: 'route' },
      c: { x: 400, y: 140, from: 'route' },
      d: { x: 400, y: 140, from: 'route' },
    },
    courses: { l1: course, l2: course },
  };

  it('two lines on one route get their labels in different places, and so do two nodes at one point', () => {
    const scene = buildNetworkScene({ view, layout, solve: null, units: 'metric', width: 960, height: 540 });
    const links = labels(scene, 'data-link-label');
    expect(links).toHaveLength(2);
    expect(overlaps(links[0], links[1])).toBe(false);
    const nodes = labels(scene, 'data-node-label');
    const spring = nodes.filter((n) => n.id === 'a' || n.id === 'b');
    expect(overlaps(spring[0], spring[1])).toBe(false);
  });
});
