'use client';

import { useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useTransition } from 'react';
import { selectTeam } from '@/app/actions/select-team';
import type { TeamSummary } from '@/lib/data/teams';

export function TeamSwitcher({ current, teams }: { current: TeamSummary; teams: TeamSummary[] }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [pending, startTransition] = useTransition();

  return (
    <label className="flex items-center gap-2 text-sm">
      <span className="sr-only sm:not-sr-only sm:text-creek-200">Team</span>
      <select
        aria-label="Team"
        className="max-w-44 rounded-md border border-creek-600 bg-creek-800 px-2 py-1 text-sm text-white"
        value={current.id}
        disabled={pending}
        onChange={(e) => {
          const teamId = e.target.value;
          startTransition(async () => {
            const result = await selectTeam({ teamId });
            if (result.ok) {
              queryClient.clear();
              router.refresh();
            }
          });
        }}
      >
        {teams.map((t) => (
          <option key={t.id} value={t.id}>
            {t.name}
          </option>
        ))}
      </select>
    </label>
  );
}
