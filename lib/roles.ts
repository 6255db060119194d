/** Team roles, most to least powerful. What each may do is in lib/permissions.ts. */
export const ROLES = ['owner', 'designer', 'surveyor', 'reviewer', 'viewer'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  owner: 'Owner',
  designer: 'Designer',
  surveyor: 'Surveyor',
  reviewer: 'Reviewer',
  viewer: 'Viewer (client)',
};
