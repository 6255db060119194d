import 'server-only';
import { notFound } from 'next/navigation';
import { getProject, type ProjectSummary } from '../data/projects';
import type { Permission } from '../permissions';
import type { Role } from '../roles';
import { ProjectParams } from '../validations/projects';
import { requireTeamRole, requireUser } from './current';
import type { SessionUser } from './users';

export interface ProjectPageAccess {
  user: SessionUser;
  project: ProjectSummary;
  role: Role;
}

/**
 * The checks every page of one project starts with: a malformed id, a project that does not exist
 * and a visitor who is not on its team all get the not-found page (as the API answers 404);
 * anonymous visitors go to sign-in.
 */
export async function requireProjectPage(
  params: Promise<{ projectId: string }>,
  permission: Permission = 'project.view',
): Promise<ProjectPageAccess> {
  const parsed = ProjectParams.safeParse(await params);
  if (!parsed.success) notFound();
  const user = await requireUser();
  const project = await getProject(parsed.data.projectId);
  const role = await requireTeamRole(user, project?.teamId ?? null, permission);
  if (!project) notFound();
  return { user, project, role };
}
