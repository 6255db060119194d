import Link from 'next/link';
import type { TeamSummary } from '@/lib/data/teams';
import { TeamSwitcher } from './team-switcher';
import { UserMenu } from './user-menu';
import { Wordmark } from './wordmark';

interface AppHeaderProps {
  user: { name: string; email: string };
  team: TeamSummary | null;
  teams: TeamSummary[];
}

export function AppHeader({ user, team, teams }: AppHeaderProps) {
  return (
    <header className="bg-creek-900 text-creek-50">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3 sm:px-6">
        <Link href="/projects" aria-label="Runnel home">
          <Wordmark light />
        </Link>
        <nav aria-label="Main" className="flex gap-4 text-sm">
          <Link className="hover:text-white" href="/projects">
            Projects
          </Link>
          <Link className="hover:text-white" href="/team">
            Team
          </Link>
        </nav>
        <div className="ml-auto flex items-center gap-3">
          {team && <TeamSwitcher current={team} teams={teams} />}
          <UserMenu name={user.name} email={user.email} />
        </div>
      </div>
    </header>
  );
}
