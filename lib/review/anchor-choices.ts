import type { LineWarning } from '../../hydraulics/index';
import { WARNING_TITLES } from '../lines/warning-words';
import { formatQuantity, type UnitSystem } from '../units/index';
import type { CommentAnchor } from './anchors';

/** One place a new comment can be pinned, as the comment form offers it. */
export interface AnchorChoice {
  key: string;
  label: string;
  anchor: CommentAnchor;
}

/** Chainages are kept to the centimetre: a pin picked with the pointer has no more accuracy than that. */
const toCm = (m: number) => Math.round(m * 100) / 100;

export const PROJECT_CHOICE: AnchorChoice = { key: 'project', label: 'Whole project', anchor: { kind: 'project' } };

/**
 * Where a comment on a line can go: the chainage picked on its profile (first), the whole project, or one of its
 * warnings.
 */
export function lineAnchorChoices(
  line: { id: string; name: string } | null,
  pickedM: number | null,
  warnings: readonly LineWarning[],
  system: UnitSystem,
): AnchorChoice[] {
  if (!line) return [PROJECT_CHOICE];
  return [
    ...(pickedM !== null
      ? [
          {
            key: 'picked',
            label: `${line.name}, ch. ${formatQuantity('chainage', pickedM, system)} (picked on the profile)`,
            anchor: { kind: 'line-chainage' as const, lineId: line.id, chainageM: toCm(pickedM) },
          },
        ]
      : []),
    PROJECT_CHOICE,
    ...warnings.map((w, i) => {
      const at = 'chainageM' in w.at ? w.at.chainageM : w.at.fromM;
      return {
        key: `warning-${i}`,
        label: `${WARNING_TITLES[w.code]}, ch. ${formatQuantity('chainage', at, system)}`,
        anchor: { kind: 'warning' as const, lineId: line.id, code: w.code, chainageM: at },
      };
    }),
  ];
}

/**
 * Where a comment on a survey route can go: the chainage picked on its ground profile. Surveyors may pin only these.
 */
export function routeAnchorChoices(
  route: { id: string; name: string },
  pickedM: number | null,
  system: UnitSystem,
  withProject: boolean,
): AnchorChoice[] {
  return [
    ...(pickedM !== null
      ? [
          {
            key: 'picked',
            label: `${route.name}, ch. ${formatQuantity('chainage', pickedM, system)} (picked on the profile)`,
            anchor: { kind: 'route-chainage' as const, routeId: route.id, chainageM: toCm(pickedM) },
          },
        ]
      : []),
    ...(withProject ? [PROJECT_CHOICE] : []),
  ];
}

/**
 * Where a comment on the network can go: the part picked on the schematic or in the tables (first), or the whole
 * project.
 */
export function networkAnchorChoices(
  picked: { part: 'node' | 'link'; id: string; name: string } | null,
): AnchorChoice[] {
  return [
    ...(picked
      ? [
          {
            key: `${picked.part}-${picked.id}`,
            label: `${picked.name} (picked on the schematic)`,
            anchor: { kind: 'network' as const, part: picked.part, partId: picked.id },
          },
        ]
      : []),
    PROJECT_CHOICE,
  ];
}
