import { userRoute } from '@/lib/api/route';
import { getNotificationPreferences, setNotificationPreferences } from '@/lib/notifications/preferences';
import { NotificationPreferencesSchema } from '@/lib/validations/notifications';

export const GET = userRoute({}, async ({ user }) => ({ preferences: await getNotificationPreferences(user.id) }));

export const PUT = userRoute({ body: NotificationPreferencesSchema }, async ({ user, body }) => ({
  preferences: await setNotificationPreferences(user.id, body),
}));
