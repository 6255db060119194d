'use client';

import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { selectTeam } from '@/app/actions/select-team';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';
import { ApiError } from '@/lib/queries/fetch-json';
import { useCreateTeam, useRenameTeam } from '@/lib/queries/teams';

function fieldErrorOf(error: unknown): string[] | undefined {
  return error instanceof ApiError ? error.fields?.name : undefined;
}

/** Rename the current team (owners) and start another team (anyone; they become its owner). */
export function TeamSettings({
  teamId,
  teamName,
  canRename,
}: {
  teamId: string;
  teamName: string;
  canRename: boolean;
}) {
  const router = useRouter();
  const rename = useRenameTeam(teamId);
  const create = useCreateTeam();
  const [status, setStatus] = useState<string | null>(null);

  async function onRename(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const name = String(new FormData(event.currentTarget).get('teamName') ?? '');
    await rename
      .mutateAsync(name)
      .then(() => {
        setStatus('Team renamed.');
        router.refresh();
      })
      .catch(() => undefined);
  }

  async function onCreate(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const name = String(new FormData(event.currentTarget).get('newTeamName') ?? '');
    const team = await create.mutateAsync(name).catch(() => null);
    if (!team) return;
    await selectTeam({ teamId: team.id });
    router.refresh();
  }

  return (
    <div className="grid gap-6 sm:grid-cols-2">
      {canRename && (
        <form onSubmit={onRename} className="space-y-3" noValidate>
          <TextField
            id="teamName"
            label="Team name"
            defaultValue={teamName}
            errors={fieldErrorOf(rename.error)}
            required
          />
          <Button type="submit" tone="quiet" disabled={rename.isPending}>
            Rename team
          </Button>
          <FormMessage message={status} tone="ok" />
        </form>
      )}
      <form onSubmit={onCreate} className="space-y-3" noValidate>
        <TextField
          id="newTeamName"
          label="Start another team"
          placeholder="e.g. Valley water co-op"
          errors={fieldErrorOf(create.error)}
          required
        />
        <Button type="submit" tone="quiet" disabled={create.isPending}>
          Create team and switch to it
        </Button>
      </form>
    </div>
  );
}
