import 'server-only';
import type { Transaction } from 'sequelize';
import { models } from '../../models';
import { enqueueJob } from '../jobs/enqueue';

export interface OutgoingMail {
  /** What the message is about (`invitation`, `sign-up`, a notification kind...), for the log. */
  kind: string;
  to: string;
  subject: string;
  text: string;
}

/** Writes the message and its delivery job in the caller's transaction; nothing is sent here. */
export async function queueMail(transaction: Transaction, mail: OutgoingMail): Promise<string> {
  const row = await models().MailOutbox.create(
    { kind: mail.kind, toAddress: mail.to, subject: mail.subject, textBody: mail.text },
    { transaction },
  );
  await enqueueJob(transaction, 'send-mail', { outboxId: row.id });
  return row.id;
}
