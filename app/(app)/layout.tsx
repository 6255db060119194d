import type { ReactNode } from 'react';
import { AppHeader } from '@/components/shell/app-header';
import { requireUser } from '@/lib/auth/current';
import { currentTeam } from '@/lib/current-team';

export default async function AppLayout({ children }: { children: ReactNode }) {
  const user = await requireUser();
  const { team, teams } = await currentTeam(user.id);
  return (
    <div className="min-h-screen">
      <a
        href="#content"
        className="sr-only focus:not-sr-only focus:fixed focus:left-3 focus:top-3 focus:z-50 focus:rounded-md focus:bg-white focus:px-3 focus:py-2 focus:text-sm focus:font-medium focus:text-creek-900 focus:shadow"
      >
        Skip to content
      </a>
      <AppHeader user={{ name: user.name, email: user.email }} team={team} teams={teams} />
      <main id="content" tabIndex={-1} className="mx-auto w-full max-w-6xl px-4 py-6 outline-none sm:px-6">
        {children}
      </main>
    </div>
  );
}
