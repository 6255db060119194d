'use client';

import { useState, type FormEvent } from 'react';
import { useCreateComment, useResolveComment } from '@/lib/queries/reviews';
import type { AnchorChoice } from '@/lib/review/anchor-choices';
import type { CommentRecord } from '@/lib/review/comment-types';
import type { UnitSystem } from '@/lib/units';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';
import { anchorWords } from './comment-anchor-words';

export interface CommentsPanelProps {
  projectId: string;
  /** Null: comments on the working copy. */
  revisionId: string | null;
  /** Threads (first comments) in pin order, with their replies. */
  threads: { thread: CommentRecord; replies: CommentRecord[]; pin: string | null }[];
  canComment: boolean;
  members: { id: string; name: string }[];
  /**
   * Where a new comment can be pinned; the first is the default (a chainage picked on the profile comes first). None:
   * no new comment until a place is picked.
   */
  anchors: AnchorChoice[];
  /** Names of the lines, routes and network parts anchors point at, by id. */
  partNames: ReadonlyMap<string, string>;
  unitSystem: UnitSystem;
  selectedId: string | null;
  onJump: (comment: CommentRecord) => void;
}

/** Threads with replies, resolve and reopen, and the form for a new comment with its pin and mentions. */
export function CommentsPanel({
  projectId,
  revisionId,
  threads,
  canComment,
  members,
  anchors,
  partNames,
  unitSystem,
  selectedId,
  onJump,
}: CommentsPanelProps) {
  const create = useCreateComment(projectId);
  const resolve = useResolveComment(projectId);
  const [anchorKey, setAnchorKey] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const anchor: AnchorChoice | undefined = anchors.find((a) => a.key === anchorKey) ?? anchors[0];

  async function submit(event: FormEvent<HTMLFormElement>, parentId: string | null) {
    event.preventDefault();
    const form = event.currentTarget;
    const data = new FormData(form);
    setError(null);
    try {
      await create.mutateAsync({
        body: String(data.get('body') ?? ''),
        revisionId,
        parentId,
        ...(parentId || !anchor ? {} : { anchor: anchor.anchor }),
        mentions: data.getAll('mentions').map(String),
      });
      form.reset();
      setAnchorKey(null);
    } catch (e) {
      setError(e instanceof Error ? e.message : 'The comment was not saved');
    }
  }

  return (
    <div className="space-y-4" data-testid="comments-panel">
      {canComment && anchor && (
        <form
          onSubmit={(e) => void submit(e, null)}
          className="space-y-2 rounded-md border border-creek-100 bg-creek-50/40 p-3"
          aria-label="New comment"
        >
          <label className="block text-sm font-medium text-creek-900">
            Pin to
            <select
              aria-label="Pin the comment to"
              value={anchor.key}
              onChange={(e) => setAnchorKey(e.target.value)}
              className="mt-1 block w-full rounded-md border border-creek-200 bg-white px-2 py-1 text-sm"
            >
              {anchors.map((a) => (
                <option key={a.key} value={a.key}>
                  {a.label}
                </option>
              ))}
            </select>
          </label>
          <label className="block text-sm font-medium text-creek-900">
            Comment
            <textarea
              name="body"
              required
              rows={3}
              className="mt-1 block w-full rounded-md border border-creek-200 px-2 py-1 text-sm"
            />
          </label>
          {members.length > 0 && (
            <fieldset className="text-sm text-creek-800">
              <legend className="font-medium text-creek-900">Mention</legend>
              <div className="flex flex-wrap gap-x-3">
                {members.map((m) => (
                  <label key={m.id} className="flex items-center gap-1">
                    <input type="checkbox" name="mentions" value={m.id} /> {m.name}
                  </label>
                ))}
              </div>
            </fieldset>
          )}
          <Button type="submit" disabled={create.isPending}>
            Post comment
          </Button>
          <FormMessage message={error} />
        </form>
      )}
      {threads.length === 0 && <p className="text-sm text-creek-700">No comments here yet.</p>}
      <ol className="space-y-3">
        {threads.map(({ thread, replies, pin }) => (
          <li
            key={thread.id}
            data-testid="comment-thread"
            data-comment-id={thread.id}
            data-resolved={thread.resolved ? 'yes' : 'no'}
            className={`rounded-md border p-3 text-sm ${thread.id === selectedId ? 'border-creek-700 ring-1 ring-creek-700' : 'border-creek-100'} ${thread.resolved ? 'bg-stone-50' : 'bg-white'}`}
          >
            <div className="flex flex-wrap items-center justify-between gap-2">
              <button
                type="button"
                onClick={() => onJump(thread)}
                className="text-left font-medium text-creek-700 underline-offset-2 hover:underline"
              >
                {pin && (
                  <span className="mr-1 inline-block rounded-full bg-clay-600 px-1.5 text-xs text-white">{pin}</span>
                )}
                {anchorWords(thread.anchor, unitSystem, partNames)}
              </button>
              <span className="text-xs text-creek-600">
                {thread.author?.name ?? 'a former member'} · {thread.createdAt.slice(0, 16).replace('T', ' ')}
                {thread.revisionNumber
                  ? ` · on revision ${thread.revisionNumber}`
                  : revisionId
                    ? ''
                    : ' · on the working copy'}
              </span>
            </div>
            <p className="mt-1 whitespace-pre-wrap text-creek-900">{thread.body}</p>
            {thread.mentions.length > 0 && (
              <p className="text-xs text-creek-600">Mentions: {thread.mentions.map((m) => m.name).join(', ')}</p>
            )}
            {thread.anchorNow.state === 'gone' && (
              <p className="text-xs font-medium text-clay-700">In the working copy now: {thread.anchorNow.words}.</p>
            )}
            {replies.map((r) => (
              <div key={r.id} className="mt-2 border-l-2 border-creek-100 pl-3" data-testid="comment-reply">
                <span className="text-xs text-creek-600">
                  {r.author?.name ?? 'a former member'} · {r.createdAt.slice(0, 16).replace('T', ' ')}
                </span>
                <p className="whitespace-pre-wrap text-creek-900">{r.body}</p>
              </div>
            ))}
            <div className="mt-2 flex flex-wrap items-start gap-2">
              {canComment && (
                <form
                  onSubmit={(e) => void submit(e, thread.id)}
                  className="flex flex-1 gap-2"
                  aria-label={`Reply to ${thread.author?.name ?? 'comment'}`}
                >
                  <input
                    name="body"
                    placeholder="Reply"
                    aria-label="Reply"
                    className="min-w-0 flex-1 rounded-md border border-creek-200 px-2 py-1 text-sm"
                  />
                  <Button type="submit" tone="quiet" className="py-1 text-xs">
                    Reply
                  </Button>
                </form>
              )}
              {canComment && (
                <Button
                  tone="quiet"
                  className="py-1 text-xs"
                  onClick={() => resolve.mutate({ commentId: thread.id, resolved: !thread.resolved })}
                >
                  {thread.resolved ? 'Reopen' : 'Resolve'}
                </Button>
              )}
              {thread.resolved && (
                <span className="text-xs text-moss-700">Resolved by {thread.resolvedBy?.name ?? 'someone'}</span>
              )}
            </div>
          </li>
        ))}
      </ol>
    </div>
  );
}
