'use client';

import { useRouter } from 'next/navigation';
import type { FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';
import { useForm } from '@/lib/forms/use-form';
import { useCreateProject } from '@/lib/queries/projects';
import { CreateProjectSchema } from '@/lib/validations/projects';

export function NewProjectForm({ teamId }: { teamId: string }) {
  const router = useRouter();
  const create = useCreateProject(teamId);
  const { fields, message, check, fail } = useForm();

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const formElement = event.currentTarget;
    const form = new FormData(formElement);
    const input = check(CreateProjectSchema, {
      name: form.get('name'),
      description: form.get('description'),
      unitSystem: form.get('unitSystem'),
    });
    if (!input) return;
    try {
      const project = await create.mutateAsync(input);
      formElement.reset();
      router.push(`/projects/${project.id}`);
    } catch (error) {
      fail(error, 'The project could not be saved. Try again.');
    }
  }

  return (
    <form onSubmit={onSubmit} className="grid gap-4 sm:grid-cols-[2fr_3fr_1fr_auto] sm:items-end" noValidate>
      <TextField id="name" label="Name" placeholder="e.g. Upper spring line" errors={fields.name} required />
      <TextField
        id="description"
        label="Description"
        placeholder="What this system supplies"
        errors={fields.description}
      />
      <SelectField id="unitSystem" label="Units" defaultValue="metric" errors={fields.unitSystem}>
        <option value="metric">Metric</option>
        <option value="us">US customary</option>
      </SelectField>
      <Button type="submit" disabled={create.isPending}>
        {create.isPending ? 'Creating…' : 'Create project'}
      </Button>
      <div className="sm:col-span-4">
        <FormMessage message={message} />
      </div>
    </form>
  );
}
