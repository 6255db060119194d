'use client';

import type { FormEvent } from 'react';
import type { LineRecord } from '@/lib/data/lines';
import { useSaveForm } from '@/lib/forms/use-save-form';
import { useUpdateLine } from '@/lib/queries/lines';
import { LINE_STATUS_LABELS, LINE_STATUSES, UpdateLineSchema } from '@/lib/validations/lines';
import { Button } from '@/components/ui/button';
import { SelectField, TextAreaField, TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';

/** Name, status, checker and notes: the title block of the report. */
export function LineDetailsForm({ line, baseRevision, onSaved }: { line: LineRecord; baseRevision: () => number; onSaved: (revision: number) => void }) {
  const update = useUpdateLine(line.id);
  const form = useSaveForm(UpdateLineSchema, async (input) => {
    const saved = await update.mutateAsync(input);
    onSaved(saved.revision);
    return saved;
  }, (saved) => `Saved as revision ${saved.revision}.`);
  const { fields, note: message } = form;

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const f = new FormData(event.currentTarget);
    await form.submit({ name: f.get('name'), status: f.get('status'), checkedBy: f.get('checkedBy'), notes: f.get('notes'), baseRevision: baseRevision() });
  }

  return (
    <form onSubmit={onSubmit} className="grid gap-3 sm:grid-cols-3" noValidate>
      <TextField id="name" label="Line name" defaultValue={line.name} errors={fields.name} required />
      <SelectField id="status" label="Status" defaultValue={line.status} errors={fields.status}>
        {LINE_STATUSES.map((s) => <option key={s} value={s}>{LINE_STATUS_LABELS[s]}</option>)}
      </SelectField>
      <TextField id="checkedBy" label="Checked by" defaultValue={line.checkedBy} errors={fields.checkedBy} hint="The competent person who checked the design" />
      <div className="sm:col-span-3"><TextAreaField id="notes" label="Notes" rows={3} defaultValue={line.notes} errors={fields.notes} /></div>
      <div className="flex items-center gap-3 sm:col-span-3">
        <Button type="submit" disabled={update.isPending}>{update.isPending ? 'Saving…' : 'Save details'}</Button>
        <FormMessage message={message?.text} tone={message?.tone} />
      </div>
    </form>
  );
}
