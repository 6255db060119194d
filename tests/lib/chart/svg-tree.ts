import { XMLParser } from 'fast-xml-parser';

/** One element of a parsed SVG: tag, attributes, children (text children dropped). */
export interface XmlElement {
  tag: string;
  attrs: Record<string, string>;
  children: XmlElement[];
}

type Ordered = Record<string, unknown> & { ':@'?: Record<string, string> };

function convert(nodes: Ordered[]): XmlElement[] {
  return nodes.flatMap((node) => {
    const tag = Object.keys(node).find((k) => k !== ':@');
    if (!tag || tag === '#text' || tag === '?xml') return [];
    return [{ tag, attrs: node[':@'] ?? {}, children: convert(node[tag] as Ordered[]) }];
  });
}

/** Parses SVG text into a plain element tree (fast-xml-parser, document order kept). */
export function parseSvg(text: string): XmlElement {
  const parser = new XMLParser({
    preserveOrder: true,
    ignoreAttributes: false,
    attributeNamePrefix: '',
    parseAttributeValue: false,
  });
  const roots = convert(parser.parse(text) as Ordered[]);
  const svg = roots.find((r) => r.tag === 'svg');
  if (!svg) throw new Error('no <svg> root');
  return svg;
}

/** Every element below `root` (depth first) matching `test`. */
export function findAll(root: XmlElement, test: (e: XmlElement) => boolean): XmlElement[] {
  const out: XmlElement[] = [];
  const walk = (e: XmlElement) => {
    if (test(e)) out.push(e);
    e.children.forEach(walk);
  };
  walk(root);
  return out;
}

export const layer = (root: XmlElement, name: string): XmlElement => {
  const found = findAll(root, (e) => e.attrs['data-layer'] === name);
  if (found.length !== 1) throw new Error(`expected one layer "${name}", found ${found.length}`);
  return found[0];
};

/** Vertices of a path made of M/L commands (what d3's line and the chart's own paths write). */
export function pathPoints(d: string): [number, number][] {
  return [...d.matchAll(/[ML]\s*(-?[\d.]+)[ ,](-?[\d.]+)/g)].map((m) => [Number(m[1]), Number(m[2])]);
}
