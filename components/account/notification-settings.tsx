'use client';

import { useQuery } from '@tanstack/react-query';
import { FormMessage } from '@/components/ui/form-message';
import { NOTIFICATION_KINDS, NOTIFICATION_LABELS } from '@/lib/notifications/kinds';
import { notificationPreferencesQuery, useSetNotificationPreferences } from '@/lib/queries/accounts';
import { ListSkeleton } from '@/components/ui/widget-skeletons';

/** One switch per kind of notification; each change is saved at once. */
export function NotificationSettings() {
  const { data: prefs } = useQuery(notificationPreferencesQuery());
  const save = useSetNotificationPreferences();
  if (!prefs) return <NotificationSettingsSkeleton />;
  return (
    <div className="space-y-3">
      <FormMessage message={save.error ? `Not saved: ${save.error.message}` : null} />
      <ul className="space-y-3">
        {NOTIFICATION_KINDS.map((kind) => (
          <li key={kind} className="flex items-start gap-3">
            <input
              id={`notify-${kind}`}
              type="checkbox"
              className="mt-1 h-4 w-4 accent-creek-700"
              checked={prefs?.[kind] ?? true}
              disabled={!prefs || save.isPending}
              onChange={(e) => save.mutate({ [kind]: e.target.checked })}
              aria-describedby={`notify-${kind}-hint`}
            />
            <label htmlFor={`notify-${kind}`} className="text-sm text-creek-900">
              {NOTIFICATION_LABELS[kind].label}
              <span id={`notify-${kind}-hint`} className="block text-xs text-creek-600">
                {NOTIFICATION_LABELS[kind].hint}
              </span>
            </label>
          </li>
        ))}
      </ul>
    </div>
  );
}

export function NotificationSettingsSkeleton() {
  return <ListSkeleton label="Loading notification settings" items={NOTIFICATION_KINDS.length} />;
}
