import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { CompareProfile } from '@/components/reviews/compare-profile';
import { CompareTable } from '@/components/reviews/compare-table';
import { Panel } from '@/components/ui/panel';
import { requireProjectPage } from '@/lib/auth/project-page';
import { getRevision } from '@/lib/data/revisions';
import { AppError } from '@/lib/errors';
import { compareSnapshots } from '@/lib/review/compare';
import { uuid } from '@/lib/validations/common';

export const metadata: Metadata = { title: 'Compare revisions' };

const Query = z.object({ a: uuid('Revision'), b: uuid('Revision') });

export default async function ComparePage({
  params,
  searchParams,
}: {
  params: Promise<{ projectId: string }>;
  searchParams: Promise<Record<string, string | undefined>>;
}) {
  const { project, role } = await requireProjectPage(params);
  const query = Query.safeParse(await searchParams);
  if (!query.success || query.data.a === query.data.b) notFound();
  const load = (id: string) =>
    getRevision(id, role).catch((error) => {
      if (error instanceof AppError && error.code === 'not_found') notFound();
      throw error;
    });
  const [x, y] = await Promise.all([load(query.data.a), load(query.data.b)]);
  if (x.projectId !== project.id || y.projectId !== project.id) notFound();
  const [before, after] = x.number < y.number ? [x, y] : [y, x];
  const comparison = compareSnapshots(before.snapshot, after.snapshot);
  const beforeLabel = `Revision ${before.number}`;
  const afterLabel = `Revision ${after.number}`;
  const system = after.snapshot.project.unitSystem;

  return (
    <div className="space-y-5">
      <div>
        <Link href={`/projects/${project.id}/reviews`} className="text-sm text-creek-600 underline">
          ← All revisions
        </Link>
        <h1 className="text-2xl font-semibold text-creek-900">
          {beforeLabel} compared with {afterLabel}
        </h1>
      </div>
      <CompareTable comparison={comparison} system={system} beforeLabel={beforeLabel} afterLabel={afterLabel} />
      {after.snapshot.lines.map((line) => (
        <Panel key={line.id} title={`${line.name}: ${afterLabel} with the grade line of ${beforeLabel}`}>
          <CompareProfile
            before={before.snapshot.lines.find((l) => l.id === line.id) ?? null}
            after={line}
            system={system}
            beforeLabel={beforeLabel}
          />
        </Panel>
      ))}
    </div>
  );
}
