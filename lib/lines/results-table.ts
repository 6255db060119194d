import Papa from 'papaparse';
import { profileRows, type LineProfile, type StretchResult } from '../../hydraulics/index';
import {
  formatNumber,
  formatStation,
  pressureOfHead,
  toDisplay,
  unitDef,
  type Decimals,
  type DisplayUnits,
  type Quantity,
} from '../units/index';

/**
 * One column of a results table: heading with its unit, the value in display units and the decimals it
 * is shown with, taken from the quantity table (lib/units), so the table, its CSV, the PDF and every
 * other screen round the same figure the same way.
 */
export interface ResultColumn<R> {
  key: string;
  heading: string;
  value: (row: R) => number | string;
  decimals?: Decimals;
}

type Row = ReturnType<typeof profileRows>[number];

/** Columns of the per-station table (head and pressure side by side). */
export function stationColumns(u: DisplayUnits, temperatureC: number): ResultColumn<Row>[] {
  const E = (m: number) => toDisplay('elevation', m, u.system);
  const P = (m: number) => pressureOfHead(m, u.system, temperatureC);
  const d = (quantity: Quantity) => unitDef(quantity, u.system).decimals;
  // US projects read stations in the 12+50 form beside the chainage.
  const station: ResultColumn<Row>[] =
    u.system === 'us'
      ? [{ key: 'station', heading: 'Station', value: (r) => formatStation(r.chainageM, u.system) ?? '' }]
      : [];
  return [
    ...station,
    {
      key: 'chainage',
      heading: `Chainage (${u.length})`,
      value: (r) => toDisplay('chainage', r.chainageM, u.system),
      decimals: d('chainage'),
    },
    { key: 'ground', heading: `Ground (${u.length})`, value: (r) => E(r.groundElevationM), decimals: d('elevation') },
    { key: 'pipe', heading: `Pipe (${u.length})`, value: (r) => E(r.pipeElevationM), decimals: d('elevation') },
    { key: 'static', heading: `Static head (${u.length})`, value: (r) => E(r.staticHeadM), decimals: d('elevation') },
    {
      key: 'grade',
      heading: `Hydraulic grade (${u.length})`,
      value: (r) => E(r.hydraulicGradeM),
      decimals: d('elevation'),
    },
    {
      key: 'staticHead',
      heading: `Static pressure head (${u.head})`,
      value: (r) => toDisplay('head', r.staticPressureHeadM, u.system),
      decimals: d('head'),
    },
    {
      key: 'staticPressure',
      heading: `Static pressure (${u.pressure})`,
      value: (r) => P(r.staticPressureHeadM),
      decimals: d('pressure'),
    },
    {
      key: 'flowingHead',
      heading: `Flowing pressure head (${u.head})`,
      value: (r) => toDisplay('head', r.pressureHeadM, u.system),
      decimals: d('head'),
    },
    {
      key: 'flowingPressure',
      heading: `Flowing pressure (${u.pressure})`,
      value: (r) => P(r.pressureHeadM),
      decimals: d('pressure'),
    },
    {
      key: 'velocity',
      heading: `Velocity (${u.velocity})`,
      value: (r) => toDisplay('velocity', r.velocityMs, u.system),
      decimals: d('velocity'),
    },
    { key: 'stretch', heading: 'Stretch', value: (r) => r.stretchIndex + 1, decimals: 0 },
  ];
}

/** Columns of the per-stretch table. */
export function stretchColumns(u: DisplayUnits, temperatureC: number): ResultColumn<StretchResult>[] {
  const d = (quantity: Quantity) => unitDef(quantity, u.system).decimals;
  const H = (m: number) => toDisplay('head', m, u.system);
  return [
    { key: 'stretch', heading: 'Stretch', value: (s) => s.index + 1, decimals: 0 },
    {
      key: 'from',
      heading: `From (${u.length})`,
      value: (s) => toDisplay('chainage', s.fromM, u.system),
      decimals: d('chainage'),
    },
    {
      key: 'to',
      heading: `To (${u.length})`,
      value: (s) => toDisplay('chainage', s.toM, u.system),
      decimals: d('chainage'),
    },
    {
      key: 'length',
      heading: `Pipe length (${u.length})`,
      value: (s) => toDisplay('length', s.slopeLengthM, u.system),
      decimals: d('length'),
    },
    { key: 'pipe', heading: 'Pipe', value: (s) => s.pipe.label },
    {
      key: 'velocity',
      heading: `Velocity (${u.velocity})`,
      value: (s) => toDisplay('velocity', s.velocityMs, u.system),
      decimals: d('velocity'),
    },
    {
      key: 'friction',
      heading: `Friction loss (${u.head})`,
      value: (s) => toDisplay('headLoss', s.frictionLossM, u.system),
      decimals: d('headLoss'),
    },
    {
      key: 'maxStatic',
      heading: `Highest static head (${u.head})`,
      value: (s) => H(s.maxStaticPressureHeadM),
      decimals: d('head'),
    },
    { key: 'allowable', heading: `Allowed head (${u.head})`, value: (s) => H(s.allowableHeadM), decimals: d('head') },
    {
      key: 'allowablePressure',
      heading: `Allowed pressure (${u.pressure})`,
      value: (s) => pressureOfHead(s.allowableHeadM, u.system, temperatureC),
      decimals: d('pressure'),
    },
    { key: 'surge', heading: `Sudden-stop surge (${u.head})`, value: (s) => H(s.surgeHeadM), decimals: d('head') },
  ];
}

/**
 * A value as the table and the CSV show it: the one number rule (formatNumber: thousands grouped, the quantity's
 * decimals).
 */
export function cellText<R>(column: ResultColumn<R>, row: R): string {
  const v = column.value(row);
  return typeof v === 'number' ? formatNumber(v, column.decimals ?? 'auto') : String(v);
}

/**
 * Text a spreadsheet would run as a formula (=, +, -, @, tab, carriage return first) gets a leading
 * apostrophe, so a pipe named "=HYPERLINK(…)" stays text (OWASP, "CSV Injection"). Numbers are
 * written as the screen shows them (a grouped one is quoted by papaparse): a negative pressure must
 * stay a number.
 */
export function csvSafeText(text: string): string {
  return /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
}

/** Rows as CSV text (papaparse), headings with units; user text escaped against formula injection. */
export function tableCsv<R>(columns: readonly ResultColumn<R>[], rows: readonly R[]): string {
  const cell = (c: ResultColumn<R>, r: R) =>
    typeof c.value(r) === 'string' ? csvSafeText(cellText(c, r)) : cellText(c, r);
  return Papa.unparse({
    fields: columns.map((c) => csvSafeText(c.heading)),
    data: rows.map((r) => columns.map((c) => cell(c, r))),
  });
}

/** Station rows of an analysis (every profile point, inserted ones included). */
export function stationRows(profile: LineProfile): Row[] {
  return profileRows(profile);
}
