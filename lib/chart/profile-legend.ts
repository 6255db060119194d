import type { LineDeviceKind } from '../../hydraulics/index';
import { PHOTO_MARK_COLOUR } from './photo-marks';
import { DEVICE_STYLE, FONT_FAMILY, PROFILE_COLOURS, ZONE_FILLS } from './profile-palette';
import { pipeStyles } from './profile-series';
import { deviceSymbol } from './profile-symbols';
import type { ProfileChartData, ProfileChartOptions } from './profile-types';
import { el, type SvgNode } from './svg-node';

type Swatch =
  | { kind: 'line'; colour: string; width: number; dash?: string }
  | { kind: 'box'; colour: string }
  | { kind: 'device'; device: LineDeviceKind }
  | { kind: 'photo' };
interface LegendItem {
  label: string;
  swatch: Swatch;
  key: string;
}

const ROW_HEIGHT = 18;
const CHAR_PX = 6.1;

function legendItems(data: ProfileChartData, options: ProfileChartOptions): LegendItem[] {
  const styles = pipeStyles(data);
  const pipes = new Map<string, LegendItem>();
  data.stretches.forEach((s, k) => {
    if (!pipes.has(s.pipe.id))
      pipes.set(s.pipe.id, {
        key: `pipe:${s.pipe.id}`,
        label: s.pipe.label,
        swatch: { kind: 'line', colour: styles[k].colour, width: styles[k].width },
      });
  });
  const kinds = [...new Set(options.devices.map((d) => d.kind))];
  const severities = new Set(data.warnings.filter((w) => !('chainageM' in w.at)).map((w) => w.severity));
  return [
    { key: 'ground', label: 'Ground', swatch: { kind: 'line', colour: PROFILE_COLOURS.groundLine, width: 1.5 } },
    ...((data.settings.heightScatterM ?? 0) > 0.1
      ? [
          {
            key: 'ground-band',
            label: 'Survey height scatter (±)',
            swatch: { kind: 'box' as const, colour: '#e5d7bb' },
          },
        ]
      : []),
    ...pipes.values(),
    {
      key: 'static',
      label: 'Static head (line shut)',
      swatch: { kind: 'line', colour: PROFILE_COLOURS.staticLine, width: 1.5, dash: '7 4' },
    },
    {
      key: 'grade',
      label: 'Hydraulic grade (flowing)',
      swatch: { kind: 'line', colour: PROFILE_COLOURS.gradeLine, width: 2 },
    },
    {
      key: 'allowable',
      label: 'Allowed pressure head',
      swatch: { kind: 'line', colour: PROFILE_COLOURS.allowable, width: 1.5, dash: '2 3' },
    },
    ...(severities.has('danger')
      ? [{ key: 'danger', label: 'Danger range', swatch: { kind: 'box' as const, colour: ZONE_FILLS.danger!.fill } }]
      : []),
    ...(severities.has('warning')
      ? [{ key: 'warning', label: 'Warning range', swatch: { kind: 'box' as const, colour: ZONE_FILLS.warning!.fill } }]
      : []),
    ...kinds.map((kind) => ({
      key: `device:${kind}`,
      label: DEVICE_STYLE[kind].label,
      swatch: { kind: 'device' as const, device: kind },
    })),
    ...((options.photos?.length ?? 0) > 0
      ? [{ key: 'photos', label: 'Site photo (numbered)', swatch: { kind: 'photo' as const } }]
      : []),
  ];
}

function swatchNode(s: Swatch, x: number, y: number): SvgNode {
  if (s.kind === 'line')
    return el('path', {
      d: `M${x},${y}L${x + 22},${y}`,
      stroke: s.colour,
      'stroke-width': s.width,
      'stroke-dasharray': s.dash,
      fill: 'none',
    });
  if (s.kind === 'photo')
    return el('rect', { x: x + 4, y: y - 6, width: 14, height: 11, rx: 3, fill: PHOTO_MARK_COLOUR });
  if (s.kind === 'box') return el('rect', { x, y: y - 6, width: 22, height: 12, fill: s.colour, stroke: 'none' });
  return deviceSymbol(
    s.device,
    x + 11,
    y +
      (s.device === 'washout' ? -6 : s.device === 'air-release-valve' ? 7 : s.device === 'break-pressure-tank' ? 4 : 0),
  );
}

/** The legend laid out in rows across the width; returns the node and its height. */
export function legendLayer(
  data: ProfileChartData,
  options: ProfileChartOptions,
  width: number,
  left: number,
  top: number,
): { node: SvgNode; height: number } {
  const items = legendItems(data, options);
  const right = width - 20;
  let x = left;
  let row = 0;
  const placed = items.map((item) => {
    const itemWidth = 30 + item.label.length * CHAR_PX + 18;
    if (x + itemWidth > right && x > left) {
      x = left;
      row += 1;
    }
    const at = { x, y: top + row * ROW_HEIGHT + 9 };
    x += itemWidth;
    return el(
      'g',
      { 'data-legend': item.key },
      swatchNode(item.swatch, at.x, at.y),
      el('text', { x: at.x + 28, y: at.y + 4, 'font-size': 11, fill: PROFILE_COLOURS.ink }, item.label),
    );
  });
  return {
    node: el('g', { 'data-layer': 'legend', 'font-family': FONT_FAMILY }, ...placed),
    height: (row + 1) * ROW_HEIGHT + 8,
  };
}
