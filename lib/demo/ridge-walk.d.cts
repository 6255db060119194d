/** One fix of the invented phone-GPS walk (see ridge-walk.cjs). */
export interface WalkFix {
  seq: number;
  chainageM: number;
  /** The smooth ground the walk was made from, m. */
  groundM: number;
  /** The height the phone logged, m (scatter and, at one fix, a spike). */
  elevationM: number;
}
export function ridgeWalk(): WalkFix[];
export function smoothGroundAt(chainageM: number): number;
export const CONTROL: readonly (readonly [number, number])[];
export const SPIKE: { seq: number; offsetM: number };
export const SPACING_M: number;
export const LENGTH_M: number;
export const STATED_ACCURACY_M: number;
export const WALK_LINE: {
  start: { kind: 'water-level'; levelM: number };
  end: { kind: 'tank-inlet'; elevationM: number };
  flow: { kind: 'design'; flowM3s: number };
  stretches: { fromM: number; toM: number; pipe: string }[];
  settings: { defaultCoverM: number };
};
