import 'server-only';
import { cookies } from 'next/headers';
import { notFound, redirect } from 'next/navigation';
import { roleOnTeam } from '../api/membership';
import { can, type Permission } from '../permissions';
import type { Role } from '../roles';
import { userFromCookies } from './session';
import type { SessionUser } from './users';

/** The signed-in user for a server component or action (re-read from the database). */
export async function currentUser(): Promise<SessionUser | null> {
  const store = await cookies();
  return userFromCookies(Object.fromEntries(store.getAll().map((c) => [c.name, c.value])));
}

/** Pages under the signed-in area: anonymous visitors go to sign-in. */
export async function requireUser(): Promise<SessionUser> {
  const user = await currentUser();
  if (!user) redirect('/sign-in');
  return user;
}

/** A page on a team's resource: non-members get the not-found page, as the API answers 404. */
export async function requireTeamRole(user: SessionUser, teamId: string | null, permission: Permission): Promise<Role> {
  const role = teamId ? await roleOnTeam(user.id, teamId) : null;
  if (!role || !can(role, permission)) notFound();
  return role;
}
