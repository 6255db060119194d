import 'server-only';
import type { Transaction } from 'sequelize';
import { Op } from 'sequelize';
import { models } from '../../models';
import { NOTIFICATION_KINDS, type NotificationKind, type NotificationPreferences } from './kinds';

export async function getNotificationPreferences(userId: string): Promise<NotificationPreferences> {
  const rows = await models().NotificationPreference.findAll({ where: { userId } });
  const prefs = Object.fromEntries(NOTIFICATION_KINDS.map((k) => [k, true])) as NotificationPreferences;
  for (const row of rows)
    if ((NOTIFICATION_KINDS as readonly string[]).includes(row.kind)) prefs[row.kind as NotificationKind] = row.enabled;
  return prefs;
}

export async function setNotificationPreferences(
  userId: string,
  changes: Partial<NotificationPreferences>,
): Promise<NotificationPreferences> {
  const { NotificationPreference, sequelize } = models();
  await sequelize.transaction(async (transaction) => {
    for (const [kind, enabled] of Object.entries(changes)) {
      await NotificationPreference.upsert({ userId, kind, enabled: Boolean(enabled) }, { transaction });
    }
  });
  return getNotificationPreferences(userId);
}

/** Of these people, the ones who have turned the kind off. */
export async function optedOut(
  transaction: Transaction,
  userIds: string[],
  kind: NotificationKind,
): Promise<Set<string>> {
  if (userIds.length === 0) return new Set();
  const rows = await models().NotificationPreference.findAll({
    where: { userId: { [Op.in]: userIds }, kind, enabled: false },
    transaction,
  });
  return new Set(rows.map((r) => r.userId));
}
