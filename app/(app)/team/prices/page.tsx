import { dehydrate, HydrationBoundary } from '@tanstack/react-query';
import type { Metadata } from 'next';
import { Suspense } from 'react';
import Link from 'next/link';
import { PriceListEditor } from '@/components/prices/price-list-editor';
import { Panel } from '@/components/ui/panel';
import { requireTeamRole, requireUser } from '@/lib/auth/current';
import { currentTeam } from '@/lib/current-team';
import { readPriceList } from '@/lib/data/price-list';
import { can } from '@/lib/permissions';
import { priceListKeys } from '@/lib/queries/price-list';
import { getQueryClient } from '@/lib/queries/query-client';
import { PriceListSkeleton } from '@/components/prices/price-list-editor';

export const metadata: Metadata = { title: 'Pipe prices' };

export default async function PricesPage() {
  const user = await requireUser();
  const { team } = await currentTeam(user.id);
  if (!team) return <p>You do not belong to a team yet.</p>;
  const role = await requireTeamRole(user, team.id, 'team.view');
  const queryClient = getQueryClient();
  await queryClient.prefetchQuery({ queryKey: priceListKeys.team(team.id), queryFn: () => readPriceList(team.id) });
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold text-creek-900">Pipe prices</h1>
        <p className="text-sm text-creek-700">
          What {team.name} pays per metre of each pipe. Least-cost sizing on a project&apos;s{' '}
          <Link className="underline" href="/projects">
            network
          </Link>{' '}
          chooses only among the pipes priced here. Back to the{' '}
          <Link className="underline" href="/team">
            team
          </Link>
          .
        </p>
      </div>
      <Panel title="Price list">
        <HydrationBoundary state={dehydrate(queryClient)}>
          <Suspense fallback={<PriceListSkeleton />}>
            <PriceListEditor teamId={team.id} canEdit={can(role, 'design.edit')} />
          </Suspense>
        </HydrationBoundary>
      </Panel>
    </div>
  );
}
