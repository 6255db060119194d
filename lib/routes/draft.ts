import type { HeightSource } from '../../hydraulics/index';
import type { RoutePointInput } from '../validations/routes';
import type { RoutePointView } from './types';

/** A point being edited on the route page. `key` is stable across edits; `sourceSeq` ties it to a stored point. */
export interface DraftPoint {
  key: string;
  sourceSeq: number | null;
  latitude: number | null;
  longitude: number | null;
  chainageM: number | null;
  elevationM: number;
  /** The surveyed height (shown beside the cleaned one); null for points added here. */
  rawElevationM: number | null;
  label: string | null;
  heightSource: HeightSource;
  confidenceM: number | null;
  excluded: boolean;
}

export interface DraftState {
  points: DraftPoint[];
  /** Earlier versions of `points`, newest last, for undo. */
  past: DraftPoint[][];
  dirty: boolean;
  nextKey: number;
  /** Set when undo history was cut at UNDO_LIMIT, so undoing everything no longer reaches the saved route. */
  historyCut: boolean;
}

export type DraftAction =
  | { type: 'reset'; points: readonly RoutePointView[] }
  | { type: 'edit'; key: string; patch: Partial<Omit<DraftPoint, 'key' | 'sourceSeq' | 'rawElevationM'>> }
  | { type: 'delete'; key: string }
  | { type: 'move'; key: string; by: -1 | 1 }
  | { type: 'insert'; at: number; point: Omit<DraftPoint, 'key' | 'sourceSeq' | 'rawElevationM'> }
  | { type: 'sketch'; chainageM: number; elevationM: number; heightSource: HeightSource }
  | { type: 'undo' };

/** Undo reaches this many steps back. */
export const UNDO_LIMIT = 50;

export function draftFromPoints(points: readonly RoutePointView[]): DraftState {
  return {
    points: points.map((p) => ({
      key: `s${p.seq}`,
      sourceSeq: p.seq,
      latitude: p.latitude,
      longitude: p.longitude,
      chainageM: p.chainageM,
      elevationM: p.elevationM,
      rawElevationM: p.rawElevationM,
      label: p.label,
      heightSource: p.heightSource,
      confidenceM: p.confidenceM,
      excluded: p.excluded,
    })),
    past: [],
    dirty: false,
    nextKey: 0,
    historyCut: false,
  };
}

function commit(state: DraftState, points: DraftPoint[], nextKey = state.nextKey): DraftState {
  const past = [...state.past, state.points];
  const historyCut = state.historyCut || past.length > UNDO_LIMIT;
  return { points, past: past.slice(-UNDO_LIMIT), dirty: true, nextKey, historyCut };
}

/** The points table's edits as a pure reducer: every change is one undo step. */
export function draftReducer(state: DraftState, action: DraftAction): DraftState {
  switch (action.type) {
    case 'reset':
      return draftFromPoints(action.points);
    case 'edit':
      return commit(
        state,
        state.points.map((p) => (p.key === action.key ? { ...p, ...action.patch } : p)),
      );
    case 'delete':
      return commit(
        state,
        state.points.filter((p) => p.key !== action.key),
      );
    case 'move': {
      const i = state.points.findIndex((p) => p.key === action.key);
      const j = i + action.by;
      if (i < 0 || j < 0 || j >= state.points.length) return state;
      const points = [...state.points];
      [points[i], points[j]] = [points[j], points[i]];
      return commit(state, points);
    }
    case 'insert': {
      const at = Math.max(0, Math.min(action.at, state.points.length));
      const point: DraftPoint = { ...action.point, key: `n${state.nextKey}`, sourceSeq: null, rawElevationM: null };
      return commit(state, [...state.points.slice(0, at), point, ...state.points.slice(at)], state.nextKey + 1);
    }
    case 'sketch': {
      // A sketched station goes where its chainage puts it, so clicks in any order make a profile.
      const at = state.points.findIndex((p) => (p.chainageM ?? 0) > action.chainageM);
      return draftReducer(state, {
        type: 'insert',
        at: at < 0 ? state.points.length : at,
        point: {
          latitude: null,
          longitude: null,
          chainageM: action.chainageM,
          elevationM: action.elevationM,
          label: null,
          heightSource: action.heightSource,
          confidenceM: null,
          excluded: false,
        },
      });
    }
    case 'undo': {
      if (state.past.length === 0) return state;
      return {
        ...state,
        points: state.past[state.past.length - 1],
        past: state.past.slice(0, -1),
        dirty: state.past.length > 1 || state.historyCut,
      };
    }
  }
}

/** The draft as the whole-route save expects it. */
export function draftToSaveInput(points: readonly DraftPoint[]): RoutePointInput[] {
  return points.map((p) => ({
    sourceSeq: p.sourceSeq,
    latitude: p.latitude,
    longitude: p.longitude,
    chainageM: p.chainageM,
    elevationM: p.elevationM,
    label: p.label,
    heightSource: p.heightSource,
    confidenceM: p.confidenceM,
    excluded: p.excluded,
  }));
}
