import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { analyzeLine, FOOT_M } from '../../../hydraulics/index';
import { stationColumns, stationRows, stretchColumns, tableCsv } from '../../../lib/lines/results-table';
import { displayUnits } from '../../../lib/units/index';
import { referenceLine } from '../../lines/reference-line';

describe('results tables and their CSV files', () => {
  const analysis = analyzeLine(referenceLine());

  it('writes one row per analysed point with head and pressure side by side, and reads back the same numbers', () => {
    const rows = stationRows(analysis);
    const csv = tableCsv(stationColumns(displayUnits('metric'), 20), rows);
    const parsed = Papa.parse<string[]>(csv.trim());
    expect(parsed.errors).toEqual([]);
    const [header, ...body] = parsed.data;
    expect(header).toEqual([
      'Chainage (m)',
      'Ground (m)',
      'Pipe (m)',
      'Static head (m)',
      'Hydraulic grade (m)',
      'Static pressure head (m)',
      'Static pressure (kPa)',
      'Flowing pressure head (m)',
      'Flowing pressure (kPa)',
      'Velocity (m/s)',
      'Stretch',
    ]);
    expect(body).toHaveLength(analysis.points.chainageM.length);
    const sag = body.find((r) => r[0] === '650.0')!;
    // Static pressure head 112.75 m (412 m over the pipe at 300 - 0.75 m), shown as every head is: to the tenth.
    expect(sag[5]).toBe('112.8');
    expect(Number(sag[4])).toBeCloseTo(analysis.points.hydraulicGradeM[rows.findIndex((r) => r.chainageM === 650)], 2);
  });

  it('states the stretch table in feet for a US project', () => {
    const csv = tableCsv(stretchColumns(displayUnits('us'), 20), analysis.stretches);
    const [header, first] = Papa.parse<string[]>(csv.trim()).data;
    expect(header.slice(0, 4)).toEqual(['Stretch', 'From (ft)', 'To (ft)', 'Pipe length (ft)']);
    // 300 m = 984.3 ft (1 ft = 0.3048 m exactly); US chainages to the whole foot.
    expect(first[2]).toBe(String(Math.round(300 / FOOT_M)));
    expect(first[4]).toBe('40 mm PE80 SDR 17 (PN 8)');
  });
});

describe('results CSV and formula injection', () => {
  it('writes user text that starts like a formula as text, and negative numbers as numbers', async () => {
    const { tableCsv } = await import('@/lib/lines/results-table');
    const columns = [
      { key: 'pipe', heading: 'Pipe', value: (r: { label: string; head: number }) => r.label },
      { key: 'head', heading: 'Head (m)', value: (r: { label: string; head: number }) => r.head, decimals: 2 },
    ];
    const rows = ['=HYPERLINK("http://x.test","y")', '+1+1', '-2+3', '@SUM(A1)', '\tTAB', 'PE 32 PN 8'].map(
      (label, i) => ({ label, head: -1.5 * i }),
    );
    const parsed = (await import('papaparse')).default.parse<string[]>(tableCsv(columns, rows)).data.slice(1);
    expect(parsed.map((r) => r[0])).toEqual([
      '\'=HYPERLINK("http://x.test","y")',
      "'+1+1",
      "'-2+3",
      "'@SUM(A1)",
      "'\tTAB",
      'PE 32 PN 8',
    ]);
    expect(parsed.map((r) => r[1])).toEqual(['0.00', '-1.50', '-3.00', '-4.50', '-6.00', '-7.50']);
  });
});

describe('stations in the 12+50 form for US projects (common practice, no source)', () => {
  it('formats hundreds of feet, a plus and two digits of feet', async () => {
    const { formatStation } = await import('../../../lib/units');
    const { placeWords } = await import('../../../lib/lines/warning-words');
    expect(formatStation(1250 * 0.3048, 'us')).toBe('12+50');
    expect(formatStation(1234.6 * 0.3048, 'us')).toBe('12+35');
    expect(formatStation(5 * 0.3048, 'us')).toBe('0+05');
    expect(formatStation(100, 'metric')).toBeNull();
    expect(placeWords({ chainageM: 600 }, displayUnits('us'))).toBe('ch. 1,969 ft (sta. 19+69)');
    expect(placeWords({ chainageM: 600 }, displayUnits('metric'))).toBe('ch. 600.0 m');
    expect(stationColumns(displayUnits('us'), 20)[0].heading).toBe('Station');
    expect(stationColumns(displayUnits('metric'), 20)[0].key).toBe('chainage');
  });
});
