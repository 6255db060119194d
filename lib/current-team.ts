import 'server-only';
import { cookies } from 'next/headers';
import { listTeamsOf, type TeamSummary } from './data/teams';

export const TEAM_COOKIE = 'runnel-team';

/** The team the user is working in: the one they picked, if they still belong to it, else their first. */
export async function currentTeam(userId: string): Promise<{ team: TeamSummary | null; teams: TeamSummary[] }> {
  const teams = await listTeamsOf(userId);
  const picked = (await cookies()).get(TEAM_COOKIE)?.value;
  return { team: teams.find((t) => t.id === picked) ?? teams[0] ?? null, teams };
}
