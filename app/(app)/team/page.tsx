import { dehydrate, HydrationBoundary } from '@tanstack/react-query';
import type { Metadata } from 'next';
import { Suspense } from 'react';
import Link from 'next/link';
import { MembersTable } from '@/components/team/members-table';
import { InvitationsTable } from '@/components/team/invitations-table';
import { InviteForm } from '@/components/team/invite-form';
import { TeamSettings } from '@/components/team/team-settings';
import { Panel } from '@/components/ui/panel';
import { requireTeamRole, requireUser } from '@/lib/auth/current';
import { currentTeam } from '@/lib/current-team';
import { listOpenInvitations } from '@/lib/data/invitations';
import { listMembers } from '@/lib/data/teams';
import { can } from '@/lib/permissions';
import { invitationKeys } from '@/lib/queries/invitations';
import { memberKeys } from '@/lib/queries/members';
import { getQueryClient } from '@/lib/queries/query-client';
import { InvitationsTableSkeleton } from '@/components/team/invitations-table';
import { MembersTableSkeleton } from '@/components/team/members-table';

export const metadata: Metadata = { title: 'Team' };

export default async function TeamPage() {
  const user = await requireUser();
  const { team } = await currentTeam(user.id);
  if (!team) return <p>You do not belong to a team yet.</p>;
  const role = await requireTeamRole(user, team.id, 'team.view');
  const manage = can(role, 'team.manage');

  const queryClient = getQueryClient();
  await queryClient.prefetchQuery({
    queryKey: memberKeys.team(team.id),
    queryFn: () => listMembers(team.id, { userId: user.id, role }),
  });
  if (manage)
    await queryClient.prefetchQuery({
      queryKey: invitationKeys.team(team.id),
      queryFn: () => listOpenInvitations(team.id),
    });

  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold text-creek-900">{team.name}</h1>
        <p className="text-sm text-creek-700">Who works on this team&apos;s projects, and in which role.</p>
      </div>
      <HydrationBoundary state={dehydrate(queryClient)}>
        {manage && (
          <Panel title="Invite someone">
            <p className="mb-3 text-sm text-creek-700">
              People join only through an invitation: we mail them a link that works once, for 7 days.
            </p>
            <InviteForm teamId={team.id} />
            <h3 className="mb-2 mt-5 text-sm font-semibold text-creek-900">Waiting for an answer</h3>
            <Suspense fallback={<InvitationsTableSkeleton />}>
              <InvitationsTable teamId={team.id} />
            </Suspense>
          </Panel>
        )}
        <Suspense fallback={<MembersTableSkeleton />}>
          <MembersTable teamId={team.id} manage={manage} selfId={user.id} />
        </Suspense>
      </HydrationBoundary>
      <Panel title="Pipe prices">
        <p className="text-sm text-creek-700">
          Least-cost sizing chooses among the pipes the team has priced.{' '}
          <Link className="underline" href="/team/prices">
            Edit the price list
          </Link>
        </p>
      </Panel>
      <Panel title="Teams">
        <TeamSettings teamId={team.id} teamName={team.name} canRename={manage} />
      </Panel>
      <RoleGuide />
    </div>
  );
}

function RoleGuide() {
  return (
    <Panel title="What each role can do">
      <ul className="grid gap-2 text-sm text-creek-800 sm:grid-cols-2">
        <li>
          <strong>Owner</strong>: everything, including members, roles and deleting projects.
        </li>
        <li>
          <strong>Designer</strong>: creates and edits projects, lines, pipes and demands; runs analyses; exports.
        </li>
        <li>
          <strong>Surveyor</strong>: creates and edits survey routes and points; uploads files and photos; views
          designs.
        </li>
        <li>
          <strong>Reviewer</strong>: views everything; comments; approves or asks for changes on a revision.
        </li>
        <li>
          <strong>Viewer (client)</strong>: views and exports approved designs.
        </li>
      </ul>
    </Panel>
  );
}
