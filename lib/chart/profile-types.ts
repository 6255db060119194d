import type {
  FrictionMethod,
  LineDevice,
  LineWarning,
  ProfilePoints,
  ReachResult,
  StretchResult,
} from '../../hydraulics/index';
import type { ReviewStamp } from '../review/stamp';
import type { ChartPhoto } from './photo-marks';
import type { DisplayUnits } from '../units/index';

/** What the profile drawing needs from a line analysis (typed arrays or plain arrays both do). */
export interface ProfileChartData {
  points: { [K in keyof ProfilePoints]: ArrayLike<number> };
  stretches: readonly StretchResult[];
  reaches: readonly ReachResult[];
  tanks: readonly { chainageM: number; waterLevelM: number }[];
  warnings: readonly LineWarning[];
  /** `heightScatterM`: the survey's height scatter, m; the ground is drawn with a band of ± that. */
  settings: { waterTemperatureC: number; heightScatterM?: number; frictionMethod?: FrictionMethod };
  limits: { siphonLimitHeadM: number };
  flowM3s: number;
}

export interface ProfileChartOptions {
  units: DisplayUnits;
  /** Devices of the line (the analysis carries only its tanks). */
  devices: readonly LineDevice[];
  /** Drawing width, px. @default 960 */
  width?: number;
  /** Chainage window to show, m. @default the whole line */
  view?: { fromM: number; toM: number } | null;
  /** Vertical exaggeration of the elevation panel, or `auto` to fit the ground and lines. @default 'auto' */
  exaggeration?: number | 'auto';
  /** A chainage range to outline (the warning picked in the list). */
  highlight?: { fromM: number; toM: number } | null;
  /** Title drawn at the top (exports carry it; the screen has its own heading). */
  title?: string;
  /** Review words under the title and the "not for construction" mark (exports of a revision or the working copy). */
  stamp?: ReviewStamp;
  /** Review comments pinned at chainages. */
  pins?: readonly ProfilePin[];
  /** Site photos placed along the route, marked at their chainages. */
  photos?: readonly ChartPhoto[];
  /** The hydraulic grade line of an earlier revision, drawn dashed beside this one. */
  earlierGrade?: { label: string; chainageM: ArrayLike<number>; gradeM: ArrayLike<number> } | null;
}

export interface ProfilePin {
  id: string;
  chainageM: number;
  /** Short label drawn in the pin (its number in the list). */
  label: string;
  resolved: boolean;
  selected?: boolean;
}

/** Where everything sits on the drawing; the interactive layer uses it to map pointer to chainage. */
export interface ProfileFrame {
  width: number;
  height: number;
  plotLeft: number;
  plotRight: number;
  elevationTop: number;
  elevationBottom: number;
  pressureTop: number;
  pressureBottom: number;
  fromM: number;
  toM: number;
  /** Elevation and pressure-head domains shown, m. */
  elevationDomainM: [number, number];
  pressureDomainM: [number, number];
  /** Vertical exaggeration in use (vertical px per m over horizontal px per m). */
  exaggeration: number;
  /** First and last profile point inside (or just outside) the view. */
  firstIndex: number;
  lastIndex: number;
  x: (chainageM: number) => number;
  chainageAt: (px: number) => number;
  yElevation: (elevationM: number) => number;
  yPressure: (headM: number) => number;
  units: DisplayUnits;
}
