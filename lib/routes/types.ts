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
