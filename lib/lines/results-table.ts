import Papa from 'papaparse';
import { profileRows, type LineProfile, type StretchResult } from '../../hydraulics/index';
import { formatStation, pressureOfHead, toDisplay, type DisplayUnits } from '../units/index';

/** One column of a results table: heading with its unit and the value in display units. */
export interface ResultColumn<R> {
  key: string;
  heading: string;
  value: (row: R) => number | string;
  digits?: number;
}

type Row = ReturnType<typeof profileRows>[number];

/** Columns of the per-station table (head and pressure side by side). */
export function stationColumns(u: DisplayUnits, temperatureC: number): ResultColumn<Row>[] {
  const L = (m: number) => toDisplay('length', m, u.system);
  const P = (m: number) => pressureOfHead(m, u.system, temperatureC);
  // US projects read stations in the 12+50 form beside the chainage.
  const station: ResultColumn<Row>[] = u.system === 'us' ? [{ key: 'station', heading: 'Station', value: (r) => formatStation(r.chainageM, u.system) ?? '' }] : [];
  return [
    ...station,
    { key: 'chainage', heading: `Chainage (${u.length})`, value: (r) => L(r.chainageM), digits: 1 },
    { key: 'ground', heading: `Ground (${u.length})`, value: (r) => L(r.groundElevationM), digits: 2 },
    { key: 'pipe', heading: `Pipe (${u.length})`, value: (r) => L(r.pipeElevationM), digits: 2 },
    { key: 'static', heading: `Static head (${u.length})`, value: (r) => L(r.staticHeadM), digits: 2 },
    { key: 'grade', heading: `Hydraulic grade (${u.length})`, value: (r) => L(r.hydraulicGradeM), digits: 2 },
    { key: 'staticHead', heading: `Static pressure head (${u.head})`, value: (r) => toDisplay('head', r.staticPressureHeadM, u.system), digits: 2 },
    { key: 'staticPressure', heading: `Static pressure (${u.pressure})`, value: (r) => P(r.staticPressureHeadM), digits: 1 },
    { key: 'flowingHead', heading: `Flowing pressure head (${u.head})`, value: (r) => toDisplay('head', r.pressureHeadM, u.system), digits: 2 },
    { key: 'flowingPressure', heading: `Flowing pressure (${u.pressure})`, value: (r) => P(r.pressureHeadM), digits: 1 },
    { key: 'velocity', heading: `Velocity (${u.velocity})`, value: (r) => toDisplay('velocity', r.velocityMs, u.system), digits: 3 },
    { key: 'stretch', heading: 'Stretch', value: (r) => r.stretchIndex + 1 },
  ];
}

/** Columns of the per-stretch table. */
export function stretchColumns(u: DisplayUnits, temperatureC: number): ResultColumn<StretchResult>[] {
  const L = (m: number) => toDisplay('length', m, u.system);
  return [
    { key: 'stretch', heading: 'Stretch', value: (s) => s.index + 1 },
    { key: 'from', heading: `From (${u.length})`, value: (s) => L(s.fromM), digits: 1 },
    { key: 'to', heading: `To (${u.length})`, value: (s) => L(s.toM), digits: 1 },
    { key: 'length', heading: `Pipe length (${u.length})`, value: (s) => L(s.slopeLengthM), digits: 1 },
    { key: 'pipe', heading: 'Pipe', value: (s) => s.pipe.label },
    { key: 'velocity', heading: `Velocity (${u.velocity})`, value: (s) => toDisplay('velocity', s.velocityMs, u.system), digits: 3 },
    { key: 'friction', heading: `Friction loss (${u.head})`, value: (s) => toDisplay('head', s.frictionLossM, u.system), digits: 2 },
    { key: 'maxStatic', heading: `Highest static head (${u.head})`, value: (s) => toDisplay('head', s.maxStaticPressureHeadM, u.system), digits: 1 },
    { key: 'allowable', heading: `Allowed head (${u.head})`, value: (s) => toDisplay('head', s.allowableHeadM, u.system), digits: 1 },
    { key: 'allowablePressure', heading: `Allowed pressure (${u.pressure})`, value: (s) => pressureOfHead(s.allowableHeadM, u.system, temperatureC), digits: 0 },
    { key: 'surge', heading: `Sudden-stop surge (${u.head})`, value: (s) => toDisplay('head', s.surgeHeadM, u.system), digits: 1 },
  ];
}

/** A value as the table and the CSV show it. */
export function cellText<R>(column: ResultColumn<R>, row: R): string {
  const v = column.value(row);
  return typeof v === 'number' && column.digits !== undefined ? v.toFixed(column.digits) : String(v);
}

/**
 * Text a spreadsheet would run as a formula (=, +, -, @, tab, carriage return first) gets a leading
 * apostrophe, so a pipe named "=HYPERLINK(…)" stays text (OWASP, "CSV Injection"). Numbers are
 * written as they are: a negative pressure must stay a number.
 */
export function csvSafeText(text: string): string {
  return /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
}

/** Rows as CSV text (papaparse), headings with units; user text escaped against formula injection. */
export function tableCsv<R>(columns: readonly ResultColumn<R>[], rows: readonly R[]): string {
  const cell = (c: ResultColumn<R>, r: R) => (typeof c.value(r) === 'string' ? csvSafeText(cellText(c, r)) : cellText(c, r));
  return Papa.unparse({ fields: columns.map((c) => csvSafeText(c.heading)), data: rows.map((r) => columns.map((c) => cell(c, r))) });
}

/** Station rows of an analysis (every profile point, inserted ones included). */
export function stationRows(profile: LineProfile): Row[] {
  return profileRows(profile);
}
