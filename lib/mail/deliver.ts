import 'server-only';
import { models } from '../../models';
import { env } from '../env';
import { mailTransport } from './transport';

export type DeliveryResult = 'sent' | 'already-sent' | 'missing';

/**
 * Sends one outbox message. The row is locked while sending, so two workers cannot send it at
 * once, and a message already marked sent is skipped, so a retried job never sends it again.
 * A send that fails throws (the queue retries later) and notes the attempt and the error.
 */
export async function deliverOutboxMessage(outboxId: string): Promise<DeliveryResult> {
  const { MailOutbox, sequelize } = models();
  try {
    return await sequelize.transaction(async (transaction) => {
      const row = await MailOutbox.findByPk(outboxId, { transaction, lock: transaction.LOCK.UPDATE });
      if (!row) return 'missing';
      if (row.sentAt) return 'already-sent';
      await mailTransport().sendMail({
        from: env().RUNNEL_MAIL_FROM,
        to: row.toAddress,
        subject: row.subject,
        text: row.textBody,
        // The same id on every attempt: a receiving server can drop a copy it has already seen.
        messageId: `<${row.id}@runnel.mail>`,
      });
      row.sentAt = new Date();
      row.attempts += 1;
      await row.save({ transaction });
      return 'sent';
    });
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    await MailOutbox.update(
      { attempts: sequelize.literal('attempts + 1') as unknown as number, lastError: message.slice(0, 2000) },
      { where: { id: outboxId, sentAt: null } },
    );
    throw error;
  }
}
