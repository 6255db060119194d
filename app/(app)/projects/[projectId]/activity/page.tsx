import type { Metadata } from 'next';
import Link from 'next/link';
import { Panel } from '@/components/ui/panel';
import { ACTIVITY_KIND_LABELS, ACTIVITY_KINDS, type ActivityKind } from '@/lib/activity/kinds';
import { requireProjectPage } from '@/lib/auth/project-page';
import { listActivity } from '@/lib/data/activity';
import { listMembers } from '@/lib/data/teams';
import { ActivityQuerySchema } from '@/lib/validations/activity';

export const metadata: Metadata = { title: 'Activity' };

/** Who did what and when, newest first, filtered by kind and person through the address (a plain GET form). */
export default async function ActivityPage({
  params,
  searchParams,
}: {
  params: Promise<{ projectId: string }>;
  searchParams: Promise<Record<string, string | undefined>>;
}) {
  const { project, role, user } = await requireProjectPage(params, 'design.view');
  const raw = await searchParams;
  const query = ActivityQuerySchema.safeParse({
    kinds: raw.kinds || undefined,
    actor: raw.actor || undefined,
    before: raw.before || undefined,
  });
  const filters = query.success ? query.data : { kinds: [] as ActivityKind[], actor: undefined, before: undefined };
  const { items, nextBefore } = await listActivity(project.id, filters);
  const members = await listMembers(project.teamId, { userId: user.id, role });
  const older = nextBefore
    ? `?${new URLSearchParams({ ...(raw.kinds ? { kinds: raw.kinds } : {}), ...(raw.actor ? { actor: raw.actor } : {}), before: nextBefore })}`
    : null;

  return (
    <div className="space-y-5">
      <div>
        <h1 className="text-2xl font-semibold text-creek-900">Activity</h1>
        <p className="text-sm text-creek-700">
          Imports, clean-ups, line edits, revisions, review decisions and comments on this project, newest first.
        </p>
      </div>
      <form method="get" className="flex flex-wrap items-end gap-3 text-sm" aria-label="Filter the activity">
        <label className="block">
          What
          <select
            name="kinds"
            defaultValue={raw.kinds ?? ''}
            className="mt-1 block rounded-md border border-creek-200 bg-white px-2 py-1"
          >
            <option value="">Everything</option>
            <option value="revision.created,revision.submitted,revision.changes-requested,revision.approved,revision.issued,revision.superseded">
              Revisions and decisions
            </option>
            {ACTIVITY_KINDS.map((k) => (
              <option key={k} value={k}>
                {ACTIVITY_KIND_LABELS[k]}
              </option>
            ))}
          </select>
        </label>
        <label className="block">
          Who
          <select
            name="actor"
            defaultValue={raw.actor ?? ''}
            className="mt-1 block rounded-md border border-creek-200 bg-white px-2 py-1"
          >
            <option value="">Anyone</option>
            {members.map((m) => (
              <option key={m.userId} value={m.userId}>
                {m.name}
              </option>
            ))}
          </select>
        </label>
        <button type="submit" className="rounded-md bg-creek-700 px-3 py-1.5 font-medium text-white">
          Show
        </button>
        {!query.success && (
          <p role="alert" className="text-clay-700">
            Those filters are not valid; showing everything.
          </p>
        )}
      </form>
      <Panel>
        <ol className="divide-y divide-creek-50" data-testid="activity-feed">
          {items.map((item) => (
            <li
              key={item.id}
              className="flex flex-wrap items-baseline justify-between gap-2 py-2 text-sm"
              data-kind={item.kind}
            >
              <span className="text-creek-900">
                {item.summary}
                {item.kind === 'line.edited' && Number(item.data.saves) > 1 ? ` (${item.data.saves} saves)` : ''}
              </span>
              <span className="text-xs text-creek-600">
                {item.actor?.name ?? 'Runnel'} · {ACTIVITY_KIND_LABELS[item.kind] ?? item.kind} ·{' '}
                {item.createdAt.slice(0, 16).replace('T', ' ')} UTC
              </span>
            </li>
          ))}
          {items.length === 0 && (
            <li className="py-4 text-center text-sm text-creek-600">Nothing recorded for these filters.</li>
          )}
        </ol>
        {older && (
          <Link href={older} className="mt-3 inline-block text-sm text-creek-700 underline">
            Older
          </Link>
        )}
      </Panel>
    </div>
  );
}
