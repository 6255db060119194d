/** Attribute values of a drawn element; undefined ones are left out. */
export type SvgAttrs = Record<string, string | number | undefined>;

/**
 * One SVG element as plain data. The chart is built as such a tree by pure functions, then drawn by
 * React in the browser (components/lines/svg-node-view.tsx) or written out as a standalone file
 * and into the PDF report (`svgToString`), so all three show exactly the same drawing.
 */
export interface SvgNode {
  tag: string;
  attrs: SvgAttrs;
  children: (SvgNode | string)[];
}

/** Builds a node; falsy children are skipped so callers can write `cond && el(...)`. */
export function el(
  tag: string,
  attrs: SvgAttrs = {},
  ...children: (SvgNode | string | false | null | undefined)[]
): SvgNode {
  return {
    tag,
    attrs,
    children: children.filter((c): c is SvgNode | string => c !== false && c !== null && c !== undefined && c !== ''),
  };
}

const ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' };

function escapeXml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ESCAPES[c]);
}

function attrsToString(attrs: SvgAttrs): string {
  return Object.entries(attrs)
    .filter(([, v]) => v !== undefined)
    .map(([k, v]) => ` ${k}="${escapeXml(String(v))}"`)
    .join('');
}

/** Serialises a node tree as XML text. */
export function svgToString(node: SvgNode | string): string {
  if (typeof node === 'string') return escapeXml(node);
  const inner = node.children.map(svgToString).join('');
  return inner === ''
    ? `<${node.tag}${attrsToString(node.attrs)}/>`
    : `<${node.tag}${attrsToString(node.attrs)}>${inner}</${node.tag}>`;
}

/** A standalone SVG document (XML declaration, namespace) for saving to a file. */
export function standaloneSvg(root: SvgNode): string {
  const withNamespace: SvgNode = { ...root, attrs: { xmlns: 'http://www.w3.org/2000/svg', ...root.attrs } };
  return `<?xml version="1.0" encoding="UTF-8"?>\n${svgToString(withNamespace)}\n`;
}
