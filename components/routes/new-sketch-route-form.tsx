'use client';

import { useRouter } from 'next/navigation';
import type { FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';
import { useForm } from '@/lib/forms/use-form';
import { useCreateRoute } from '@/lib/queries/routes';
import { CreateRouteSchema } from '@/lib/validations/routes';

/** Starts an empty route to sketch on the profile or type in, for when no survey exists yet. */
export function NewSketchRouteForm({ projectId }: { projectId: string }) {
  const router = useRouter();
  const create = useCreateRoute(projectId);
  const { fields, message, check, fail } = useForm();

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const input = check(CreateRouteSchema, { name: new FormData(event.currentTarget).get('sketch-name') });
    if (!input) return;
    try {
      const route = await create.mutateAsync(input);
      router.push(`/projects/${projectId}/routes/${route.id}`);
    } catch (error) {
      fail(error, 'Not created.');
    }
  }

  return (
    <form onSubmit={onSubmit} className="flex flex-wrap items-end gap-3" noValidate>
      <div className="w-72 max-w-full">
        <TextField
          id="sketch-name"
          label="Name of the new route"
          placeholder="e.g. Tank to lower trough"
          errors={fields.name}
        />
      </div>
      <Button type="submit" tone="quiet" disabled={create.isPending}>
        {create.isPending ? 'Creating…' : 'Start an empty route'}
      </Button>
      <FormMessage message={message} />
    </form>
  );
}
