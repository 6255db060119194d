import { HydraulicsInputError, reduceInclinometerLeg, type VerticalAngleUnit } from '../../hydraulics/index';
import { buildParsedSurvey, type DraftPoint } from './build-survey';
import { readNumberCell, toMetres, type LengthUnit } from './cells';
import { normaliseHeader } from './column-mapping';
import { detectCsvDialect } from './csv-dialect';
import { openCsvTable } from './csv-rows';
import { SurveyImportError } from './errors';
import type { ParsedSurvey } from './parsed-survey';

export interface InclinometerCsvOptions {
  /** Height of the first mark, metres (a benchmark, or an assumed datum such as 100). */
  startElevationM: number;
  startLabel?: string;
  /** @default guessed from the angle header (“%”, “percent”, “grade” → percent), else degrees */
  angleUnit?: VerticalAngleUnit;
  /** @default 'm' */
  distanceUnit?: LengthUnit;
  onProgress?: (fraction: number) => void;
}

const DISTANCE = ['slopedistance', 'sd', 'distance', 'tape', 'slope', 'length', 'dist', 'slopelength'];
const ANGLE = [
  'verticalangle',
  'va',
  'angle',
  'vangle',
  'inclination',
  'grade',
  'percent',
  'gradient',
  'clinometer',
  'abney',
];
const LABEL = ['to', 'station', 'name', 'label', 'point', 'remarks', 'note'];

function findColumn(headers: readonly string[], names: readonly string[], skip: number[] = []): number | null {
  const n = headers.map(normaliseHeader);
  const i = n.findIndex((h, k) => !skip.includes(k) && names.includes(h));
  return i < 0 ? null : i;
}

/**
 * Parses a clinometer (Abney-type) traverse: one leg per row, slope distance and vertical angle
 * (degrees or percent, positive uphill), reduced to chainage and height from the first mark.
 */
export function parseInclinometerCsv(text: string, options: InclinometerCsvOptions): ParsedSurvey {
  if (!Number.isFinite(options.startElevationM)) {
    throw new SurveyImportError('missing-value', 'give the height of the first mark (start elevation)', {
      field: 'startElevationM',
    });
  }
  const dialect = detectCsvDialect(text);
  const table = openCsvTable(text, dialect);
  const distanceCol = findColumn(table.headers, DISTANCE);
  const angleCol = findColumn(table.headers, ANGLE, distanceCol === null ? [] : [distanceCol]);
  const labelCol = findColumn(table.headers, LABEL);
  if (distanceCol === null)
    throw new SurveyImportError('missing-column', 'no slope-distance column found (e.g. “slope_distance”)', {
      field: 'slopeDistance',
    });
  if (angleCol === null)
    throw new SurveyImportError(
      'missing-column',
      'no vertical-angle column found (e.g. “vertical_angle” or “grade_%”)',
      { field: 'verticalAngle' },
    );
  const angleHeader = table.headers[angleCol];
  const angleUnit: VerticalAngleUnit =
    options.angleUnit ?? (/%|percent|grade|gradient/i.test(angleHeader) ? 'percent' : 'degrees');
  const drafts: DraftPoint[] = [
    { line: undefined, chainageM: 0, elevationM: options.startElevationM, label: options.startLabel },
  ];
  const rowsRead = table.forEachRow(
    (cells, line) => {
      const slope = toMetres(
        readNumberCell(cells[distanceCol], dialect.decimalComma, {
          line,
          column: table.headers[distanceCol],
          field: 'slope distance',
        }),
        options.distanceUnit ?? 'm',
      );
      const angle = readNumberCell(cells[angleCol], dialect.decimalComma, {
        line,
        column: angleHeader,
        field: 'vertical angle',
      });
      let leg;
      try {
        leg = reduceInclinometerLeg({ slopeDistanceM: slope, verticalAngle: angle, angleUnit });
      } catch (e) {
        if (!(e instanceof HydraulicsInputError)) throw e;
        const isAngle = e.field === 'verticalAngle';
        const msg = e.message.replace(/^[^:]*: /, '');
        throw new SurveyImportError(isAngle ? 'angle-out-of-range' : 'bad-reading', msg, {
          line,
          column: isAngle ? angleHeader : table.headers[distanceCol],
          field: isAngle ? 'vertical angle' : 'slope distance',
        });
      }
      const prev = drafts[drafts.length - 1];
      drafts.push({
        line,
        chainageM: (prev.chainageM as number) + leg.horizontalDistanceM,
        elevationM: prev.elevationM + leg.heightDifferenceM,
        label: labelCol === null ? undefined : (cells[labelCol] ?? '').trim() || undefined,
      });
    },
    { onProgress: options.onProgress },
  );
  if (rowsRead === 0)
    throw new SurveyImportError('no-data-rows', 'the field book has a header row but no legs', { line: 2 });
  return buildParsedSurvey({ format: 'inclinometer-csv', drafts, heightSource: 'inclinometer', rowsRead });
}
