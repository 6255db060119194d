'use client';

import { useState, type FormEvent } from 'react';
import type { LineRecord } from '@/lib/data/lines';
import type { FieldErrors } from '@/lib/errors';
import { ApiError } from '@/lib/queries/fetch-json';
import { useUpdateLine } from '@/lib/queries/lines';
import { fieldErrorsOf } from '@/lib/validations/common';
import { LINE_STATUS_LABELS, LINE_STATUSES, UpdateLineSchema } from '@/lib/validations/lines';
import { Button } from '@/components/ui/button';
import { SelectField, TextAreaField, TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';

/** Name, status, checker and notes: the title block of the report. */
export function LineDetailsForm({ line, baseRevision, onSaved }: { line: LineRecord; baseRevision: () => number; onSaved: (revision: number) => void }) {
  const update = useUpdateLine(line.id);
  const [fields, setFields] = useState<FieldErrors>({});
  const [message, setMessage] = useState<{ text: string; tone: 'ok' | 'error' } | null>(null);

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const f = new FormData(event.currentTarget);
    const parsed = UpdateLineSchema.safeParse({ name: f.get('name'), status: f.get('status'), checkedBy: f.get('checkedBy'), notes: f.get('notes'), baseRevision: baseRevision() });
    if (!parsed.success) return setFields(fieldErrorsOf(parsed.error));
    setFields({});
    try {
      const saved = await update.mutateAsync(parsed.data);
      onSaved(saved.revision);
      setMessage({ text: `Saved as revision ${saved.revision}.`, tone: 'ok' });
    } catch (error) {
      if (error instanceof ApiError) setFields(error.fields ?? {});
      setMessage({ text: error instanceof Error ? error.message : 'Not saved.', tone: 'error' });
    }
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
