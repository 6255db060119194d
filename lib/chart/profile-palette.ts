import type { LineDeviceKind, WarningSeverity } from '../../hydraulics/index';
import { DEVICE_KIND_NAMES } from '../validations/line-design';

/**
 * Runnel's colours for the long profile, from the app palette (tailwind.config.ts): earth for the
 * ground, creek blues for water lines, ochre and clay for cautions and dangers, and a set of
 * distinct hues for pipe classes.
 */
export const PROFILE_COLOURS = {
  paper: '#fbfaf6',
  ink: '#183d4d',
  gridline: '#d5e9ef',
  groundLine: '#7d5410',
  groundFill: '#f3ead6',
  staticLine: '#4892ab',
  gradeLine: '#1c4b5f',
  flowingPressure: '#1c4b5f',
  staticPressure: '#4892ab',
  allowable: '#b9462f',
  siphonLimit: '#a5700c',
  zero: '#8a8f91',
  highlight: '#122e3a',
} as const;

/** Shading of warning ranges by severity (info ranges are not shaded). */
export const ZONE_FILLS: Record<WarningSeverity, { fill: string; edge: string } | null> = {
  danger: { fill: '#f5d6cf', edge: '#b9462f' },
  warning: { fill: '#f9eac1', edge: '#c98d12' },
  info: null,
};

/** Pipe strokes, one per pressure class met on the line, lowest rating first. */
export const PIPE_CLASS_COLOURS = [
  '#5c8a3a',
  '#2d7590',
  '#a5700c',
  '#385722',
  '#0b1d25',
  '#78b4c7',
  '#7d5410',
] as const;

/** How each device is drawn: colour and the words of its legend entry. */
export const DEVICE_STYLE: Record<LineDeviceKind, { colour: string; label: string }> = {
  'break-pressure-tank': { colour: '#1c4b5f', label: DEVICE_KIND_NAMES['break-pressure-tank'] },
  'air-release-valve': { colour: '#48702b', label: DEVICE_KIND_NAMES['air-release-valve'] },
  washout: { colour: '#7d5410', label: DEVICE_KIND_NAMES.washout },
  'isolation-valve': { colour: '#122e3a', label: DEVICE_KIND_NAMES['isolation-valve'] },
};

export const FONT_FAMILY = 'Inter, Helvetica, Arial, sans-serif';
