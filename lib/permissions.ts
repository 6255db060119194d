import type { Role } from './roles';

/**
 * What each role may do on its team's resources. The one table every handler and action consults
 * (through lib/api/route.ts and lib/api/action.ts); the UI reads it only to hide controls.
 */
const ALL: readonly Role[] = ['owner', 'designer', 'surveyor', 'reviewer', 'viewer'];
// Everyone but the client: the working copy, drafts, raw survey files and members' e-mail addresses.
const TEAM_WORKERS: readonly Role[] = ['owner', 'designer', 'surveyor', 'reviewer'];

export const PERMISSIONS = {
  'team.view': ALL,
  'team.manage': ['owner'],
  'project.view': ALL,
  'project.create': ['owner', 'designer'],
  'project.edit': ['owner', 'designer'],
  'project.delete': ['owner'],
  'survey.edit': ['owner', 'designer', 'surveyor'],
  'design.edit': ['owner', 'designer'],
  // Source yield readings are field measurements: surveyors log them as well as designers.
  'yield.log': ['owner', 'designer', 'surveyor'],
  'analysis.run': ALL,
  // The working copy (lines, routes, lift), unreviewed revisions, raw survey files, the activity feed.
  'design.view': TEAM_WORKERS,
  'members.contact': TEAM_WORKERS,
  // Comments anywhere in the design; surveyors comment on routes only (comment.route).
  'review.comment': ['owner', 'designer', 'reviewer'],
  'comment.route': TEAM_WORKERS,
  // Approve a revision or send it back; never one's own (lib/data/revision-transitions.ts).
  'review.decide': ['owner', 'reviewer'],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof PERMISSIONS;

export function can(role: Role | null | undefined, permission: Permission): boolean {
  return role != null && (PERMISSIONS[permission] as readonly Role[]).includes(role);
}
