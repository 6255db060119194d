'use client';

import type { FormEvent } from 'react';
import type { LineRecord } from '@/lib/data/lines';
import { useForm } from '@/lib/forms/use-form';
import { useUpdateLine } from '@/lib/queries/lines';
import { UpdateLineSchema } from '@/lib/validations/lines';
import { Button } from '@/components/ui/button';
import { TextAreaField, TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';

/** Name and notes of the line; who checked and approved it is recorded on a revision, never typed here. */
export function LineDetailsForm({
  line,
  baseRevision,
  onSaved,
}: {
  line: LineRecord;
  baseRevision: () => number;
  onSaved: (revision: number) => void;
}) {
  const update = useUpdateLine(line.id);
  const form = useForm({
    schema: UpdateLineSchema,
    save: async (input) => {
      const saved = await update.mutateAsync(input);
      onSaved(saved.revision);
      return saved;
    },
    savedText: () => 'Saved.',
  });
  const { fields, note: message } = form;

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const f = new FormData(event.currentTarget);
    await form.submit({ name: f.get('name'), notes: f.get('notes'), baseRevision: baseRevision() });
  }

  return (
    <form onSubmit={onSubmit} className="grid gap-3 sm:grid-cols-3" noValidate>
      <TextField id="name" label="Line name" defaultValue={line.name} errors={fields.name} required />
      <div className="sm:col-span-3">
        <TextAreaField id="notes" label="Notes" rows={3} defaultValue={line.notes} errors={fields.notes} />
      </div>
      <div className="flex items-center gap-3 sm:col-span-3">
        <Button type="submit" disabled={update.isPending}>
          {update.isPending ? 'Saving…' : 'Save details'}
        </Button>
        <FormMessage message={message?.text} tone={message?.tone} />
      </div>
    </form>
  );
}
