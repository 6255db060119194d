import type { GpsHeightWarning, HeightSource, ProposedChange } from '../../hydraulics/index';
import type { SurveyFeature, SurveyImportWarning } from '../survey/parsed-survey';
import type { RouteSourceFormat } from '../../models/route';

/** One station of a route as the screens and the API see it (SI units). */
export interface RoutePointView {
  /** Position along the route, 0-based; also the index clean-up proposals refer to. */
  seq: number;
  latitude: number | null;
  longitude: number | null;
  chainageM: number;
  slopeChainageM: number | null;
  /** The cleaned height the design uses, metres. */
  elevationM: number;
  /** The height as surveyed, metres; never changed by clean-up or edits. */
  rawElevationM: number;
  label: string | null;
  heightSource: HeightSource;
  /** Vertical uncertainty, metres. */
  confidenceM: number | null;
  recordedAt: string | null;
  /** Left out of the cleaned profile by an accepted clean-up. */
  excluded: boolean;
  dismissedChecks: string[];
}

/**
 * What the clean-up checks, the consumer-GPS warning and the route view read of a point: a stored
 * point (`RoutePointView`) is one; the view's fast read builds these from columns, with the time
 * already in seconds.
 */
export type CheckedPoint = Pick<
  RoutePointView,
  | 'seq'
  | 'latitude'
  | 'longitude'
  | 'chainageM'
  | 'elevationM'
  | 'rawElevationM'
  | 'heightSource'
  | 'confidenceM'
  | 'excluded'
  | 'dismissedChecks'
> & {
  /** When the point was recorded, seconds since 1970 (a stored point gives `recordedAt` instead). */
  timeS?: number | null;
  recordedAt?: string | null;
  label?: string | null;
};

export interface RouteSourceFile {
  fileName: string;
  contentType: string;
  sizeBytes: number;
}

export interface RouteSummary {
  id: string;
  projectId: string;
  name: string;
  notes: string;
  sourceFormat: RouteSourceFormat | null;
  pointCount: number;
  /** Horizontal length of the cleaned route, metres. */
  lengthM: number;
  /** 3-D length of the cleaned route, metres. */
  slopeLengthM: number;
  sourceFile: RouteSourceFile | null;
  createdAt: string;
  updatedAt: string;
}

/** A proposal from the clean-up checks; `index` is the point's `seq`. */
export type RouteProposal = ProposedChange;

export interface RouteDetail {
  route: RouteSummary & {
    features: SurveyFeature[];
    importNotes: SurveyImportWarning[];
    closureErrorM: number | null;
  };
  points: RoutePointView[];
  /** What the automatic checks found in the cleaned profile and the user has not yet decided. */
  proposals: RouteProposal[];
  gpsWarning: GpsHeightWarning | null;
}

/** Where a clean-up proposal sits on the profile (aligned with the proposals it accompanies). */
export interface ProposalPlace {
  chainageM: number;
  rawElevationM: number;
}

/** A station of the route's plan (a kept point with a position). */
export interface RoutePlanStation {
  chainageM: number;
  latitudeDeg: number;
  longitudeDeg: number;
}

/**
 * What the route page draws above its table, never the points themselves: the header, the profile
 * thinned on the server by the one profile thinning, the plan at the same kept points, and what the
 * checks propose. A 100,000-point route answers with a few thousand points.
 */
export interface RouteView {
  route: RouteDetail['route'];
  /** Lowest and highest kept (cleaned) height, m; null without kept points. */
  heightRangeM: { lowM: number; highM: number } | null;
  /** Every stored point has a position (chainage is then measured from them on save). */
  positioned: boolean;
  profile: { raw: { chainageM: number; elevationM: number }[]; cleaned: { chainageM: number; elevationM: number }[] };
  plan: RoutePlanStation[];
  proposals: RouteProposal[];
  proposalPlaces: ProposalPlace[];
  gpsWarning: GpsHeightWarning | null;
}

/** One page of the route's rows, by position (`seq`) along the route. */
export interface RoutePointsPage {
  /** Points on the route. */
  total: number;
  /** `seq` of the first row. */
  offset: number;
  /** The route's `updatedAt` the rows were read at: the version an edit of them starts from. */
  updatedAt: string;
  points: RoutePointView[];
}

/** Proposals asked for on the route page (smoothing, a benchmark), with their places. */
export interface RouteProposalsAnswer {
  proposals: RouteProposal[];
  places: ProposalPlace[];
}
