import type { Role } from './roles';

/**
 * What each role may do on its team's resources. The one table every handler and action consults
 * (through lib/api/route.ts and lib/api/action.ts); the UI reads it only to hide controls.
 */
const ALL: readonly Role[] = ['owner', 'designer', 'surveyor', 'reviewer', 'viewer'];

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
  'review.comment': ['owner', 'reviewer'],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof PERMISSIONS;

export function can(role: Role | null | undefined, permission: Permission): boolean {
  return role != null && (PERMISSIONS[permission] as readonly Role[]).includes(role);
}
