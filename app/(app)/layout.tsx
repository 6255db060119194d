import type { ReactNode } from 'react';
import { AppHeader } from '@/components/shell/app-header';
import { requireUser } from '@/lib/auth/current';
import { currentTeam } from '@/lib/current-team';

export default async function AppLayout({ children }: { children: ReactNode }) {
  const user = await requireUser();
  const { team, teams } = await currentTeam(user.id);
  return (
    <div className="min-h-screen">
      <AppHeader user={{ name: user.name, email: user.email }} team={team} teams={teams} />
      <main className="mx-auto w-full max-w-6xl px-4 py-6 sm:px-6">{children}</main>
    </div>
  );
}
