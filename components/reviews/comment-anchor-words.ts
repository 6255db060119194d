import type { CommentAnchor } from '@/lib/review/anchors';
import { formatQuantity, type UnitSystem } from '@/lib/units';
import { WARNING_TITLES } from '@/lib/lines/warning-words';

/** Where a comment is pinned, in words, in the project's units; `names` gives lines, routes and network parts by id. */
export function anchorWords(anchor: CommentAnchor, system: UnitSystem, names: ReadonlyMap<string, string>): string {
  switch (anchor.kind) {
    case 'project':
      return 'Whole project';
    case 'line-chainage':
      return `${names.get(anchor.lineId) ?? 'A line'}, ch. ${formatQuantity('chainage', anchor.chainageM, system)}`;
    case 'warning':
      return `${WARNING_TITLES[anchor.code as keyof typeof WARNING_TITLES] ?? anchor.code} on ${names.get(anchor.lineId) ?? 'a line'}, ch. ${formatQuantity('chainage', anchor.chainageM, system)}`;
    case 'route-chainage':
      return `${names.get(anchor.routeId) ?? 'Route'}, ch. ${formatQuantity('chainage', anchor.chainageM, system)}`;
    case 'network':
      return `${names.get(anchor.partId) ?? `A network ${anchor.part}`} (network ${anchor.part})`;
  }
}
