import { z } from 'zod';
import { NOTIFICATION_KINDS } from '../notifications/kinds';

/** Which kinds to turn on or off; kinds not named keep their setting. */
export const NotificationPreferencesSchema = z.strictObject(
  Object.fromEntries(
    NOTIFICATION_KINDS.map((k) => [k, z.boolean({ error: 'On or off (true or false)' }).optional()]),
  ) as Record<(typeof NOTIFICATION_KINDS)[number], z.ZodOptional<z.ZodBoolean>>,
);
