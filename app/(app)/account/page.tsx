import { dehydrate, HydrationBoundary } from '@tanstack/react-query';
import type { Metadata } from 'next';
import { Suspense } from 'react';
import { NotificationSettings } from '@/components/account/notification-settings';
import { PasswordChangeForm } from '@/components/account/password-change-form';
import { Panel } from '@/components/ui/panel';
import { requireUser } from '@/lib/auth/current';
import { getNotificationPreferences } from '@/lib/notifications/preferences';
import { notificationKeys } from '@/lib/queries/accounts';
import { getQueryClient } from '@/lib/queries/query-client';
import { NotificationSettingsSkeleton } from '@/components/account/notification-settings';

export const metadata: Metadata = { title: 'Your account' };

export default async function AccountPage() {
  const user = await requireUser();
  const queryClient = getQueryClient();
  await queryClient.prefetchQuery({
    queryKey: notificationKeys.mine,
    queryFn: () => getNotificationPreferences(user.id),
  });
  return (
    <div className="max-w-2xl space-y-6">
      <div>
        <h1 className="text-2xl font-semibold text-creek-900">Your account</h1>
        <p className="text-sm text-creek-700">
          {user.name} · {user.email}
        </p>
      </div>
      <Panel title="Mail you get">
        <HydrationBoundary state={dehydrate(queryClient)}>
          <Suspense fallback={<NotificationSettingsSkeleton />}>
            <NotificationSettings />
          </Suspense>
        </HydrationBoundary>
      </Panel>
      <Panel title="Change your password">
        <PasswordChangeForm email={user.email} />
      </Panel>
    </div>
  );
}
