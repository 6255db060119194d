import { createElement, Fragment, memo, type ReactNode } from 'react';
import type { SvgNode } from '@/lib/chart/svg-node';

/** SVG attribute names as React props: `stroke-width` -> `strokeWidth`; data-/aria- stay. */
function propName(name: string): string {
  if (name.startsWith('data-') || name.startsWith('aria-')) return name;
  if (name === 'class') return 'className';
  return name.replace(/-([a-z])/g, (_, c: string) => c.toUpperCase());
}

function propsOf(node: SvgNode, key?: number): Record<string, unknown> {
  const props: Record<string, unknown> = key === undefined ? {} : { key };
  for (const [k, v] of Object.entries(node.attrs)) if (v !== undefined) props[propName(k)] = v;
  return props;
}

function render(node: SvgNode | string, key: number): ReactNode {
  if (typeof node === 'string') return node;
  return createElement(node.tag, propsOf(node, key), ...node.children.map(render));
}

/** The drawing itself, re-rendered only when the tree changes (not on every hover move). */
const SceneBody = memo(function SceneBody({ node }: { node: SvgNode }) {
  return createElement(Fragment, null, ...node.children.map(render));
});

/** Draws a pure SVG node tree (lib/chart) as React elements; `children` are drawn on top. */
export function SvgNodeView({ node, children }: { node: SvgNode; children?: ReactNode }) {
  return createElement('svg', propsOf(node), <SceneBody key="scene" node={node} />, children);
}

/** Draws nodes of a pure drawing inside an SVG that React draws (a layer added to a hand-made chart). */
export function SvgNodes({ nodes }: { nodes: readonly SvgNode[] }) {
  return createElement(Fragment, null, ...nodes.map(render));
}
