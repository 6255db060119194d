'use client';

import { useState, type FormEvent } from 'react';
import { ApiError } from '@/lib/queries/fetch-json';
import { useCreateRevision } from '@/lib/queries/reviews';
import { Button } from '@/components/ui/button';
import { TextAreaField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';

/** Freezes the working copy as the next revision, with a note; optionally straight to review. */
export function NewRevisionForm({ projectId }: { projectId: string }) {
  const create = useCreateRevision(projectId);
  const [message, setMessage] = useState<{ text: string; tone: 'ok' | 'error' } | null>(null);
  const [fields, setFields] = useState<Record<string, string[]>>({});

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = event.currentTarget;
    const data = new FormData(form);
    setMessage(null);
    try {
      const made = await create.mutateAsync({
        note: String(data.get('note') ?? ''),
        submit: data.get('submit') === 'on',
      });
      setFields({});
      setMessage({
        text: `Revision ${made.number} made${made.status === 'submitted' ? ' and submitted for review' : ''}.`,
        tone: 'ok',
      });
      form.reset();
    } catch (error) {
      setFields(error instanceof ApiError ? (error.fields ?? {}) : {});
      setMessage({ text: error instanceof Error ? error.message : 'Could not make the revision', tone: 'error' });
    }
  }

  return (
    <form onSubmit={onSubmit} className="space-y-3" noValidate>
      <TextAreaField id="note" name="note" label="What changed (note for the reviewer)" rows={2} errors={fields.note} />
      <label className="flex items-center gap-2 text-sm text-creek-800">
        <input type="checkbox" name="submit" defaultChecked /> Submit for review at once
      </label>
      <div className="flex items-center gap-3">
        <Button type="submit" disabled={create.isPending}>
          {create.isPending ? 'Freezing the design…' : 'Make a revision'}
        </Button>
        <FormMessage message={message?.text} tone={message?.tone} />
      </div>
      <p className="text-xs text-creek-700">
        A revision freezes every line (with its route&apos;s cleaned stations), the ram sites, tanks, sources and demand
        as they are now. Later edits change only the working copy.
      </p>
    </form>
  );
}
