import net from 'node:net';
import { SMTPServer } from 'smtp-server';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

// The mail server this file talks to: a port nobody listens on until the test starts one.
async function freePort(): Promise<number> {
  const server = net.createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as net.AddressInfo;
  await new Promise((resolve) => server.close(resolve));
  return port;
}
const port = await freePort();
process.env.RUNNEL_SMTP_PORT = String(port);
process.env.RUNNEL_SMTP_HOST = '127.0.0.1';

const { models } = await import('@/models');
const { queueMail } = await import('@/lib/mail/outbox');
const { deliverOutboxMessage } = await import('@/lib/mail/deliver');
const { runDueJobs } = await import('@/lib/jobs/worker');
const { resetMailTransport } = await import('@/lib/mail/transport');

/** A local SMTP server that keeps what it receives: the stand-in for the real one coming back. */
function startSmtp(received: { to: string; raw: string }[]): Promise<SMTPServer> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    onData(stream, session, callback) {
      let raw = '';
      stream.on('data', (c: Buffer) => (raw += c.toString('utf8')));
      stream.on('end', () => {
        for (const r of session.envelope.rcptTo) received.push({ to: r.address, raw });
        callback();
      });
    },
  });
  return new Promise((resolve) => server.listen(port, '127.0.0.1', () => resolve(server)));
}

async function jobFor(outboxId: string) {
  const [rows] = await models().sequelize.query(
    "SELECT id, attempts, last_error, run_at FROM graphile_worker._private_jobs WHERE payload->>'outboxId' = :outboxId",
    { replacements: { outboxId } },
  );
  return rows as { id: string; attempts: number; last_error: string | null; run_at: Date }[];
}

describe('mail through the job queue', () => {
  let smtp: SMTPServer | undefined;
  const received: { to: string; raw: string }[] = [];
  beforeAll(() => resetMailTransport());
  afterAll(async () => {
    await new Promise<void>((resolve) => (smtp ? smtp.close(() => resolve()) : resolve()));
    resetMailTransport();
  });

  it('a change rolled back leaves neither the message nor its job', async () => {
    const to = `rolled-back-${Date.now()}@fixture.test`;
    const jobCount = async () =>
      (
        (await models().sequelize.query('SELECT count(*)::int AS n FROM graphile_worker._private_jobs'))[0] as {
          n: number;
        }[]
      )[0].n;
    const jobsBefore = await jobCount();
    await expect(
      models().sequelize.transaction(async (transaction) => {
        await queueMail(transaction, { kind: 'test', to, subject: 'Never sent', text: 'x' });
        throw new Error('the change failed');
      }),
    ).rejects.toThrow('the change failed');
    expect(await models().MailOutbox.count({ where: { toAddress: to } })).toBe(0);
    expect(await jobCount()).toBe(jobsBefore);
  });

  it('with the mail server down the job waits with a back-off; when it returns the message is delivered once', async () => {
    const to = `waiting-${Date.now()}@fixture.test`;
    const outboxId = await models().sequelize.transaction((transaction) =>
      queueMail(transaction, {
        kind: 'test',
        to,
        subject: 'Spring box inspection',
        text: 'The intake screen needs clearing.',
      }),
    );

    // Server down: the attempt fails, nothing is lost, the job is kept for later.
    await runDueJobs({ quiet: true });
    let row = await models().MailOutbox.findByPk(outboxId);
    expect(row!.sentAt).toBeNull();
    expect(row!.attempts).toBe(1);
    expect(row!.lastError).toMatch(/ECONNREFUSED|connect/i);
    let [job] = await jobFor(outboxId);
    expect(job.attempts).toBe(1);
    // graphile-worker's back-off: the next try is e^attempts seconds after the failure (its own SQL, sql/000003.sql).
    const [[{ waitS }]] = (await models().sequelize.query(
      'SELECT extract(epoch FROM run_at - updated_at)::float AS "waitS" FROM graphile_worker._private_jobs WHERE id = :id',
      { replacements: { id: job.id } },
    )) as [{ waitS: number }[], unknown];
    expect(waitS).toBeGreaterThan(2);

    // Server back, but the job's time has not come (held 10 minutes ahead, as a longer back-off would): nothing is
    // sent.
    smtp = await startSmtp(received);
    await models().sequelize.query(
      "UPDATE graphile_worker._private_jobs SET run_at = now() + interval '10 minutes' WHERE id = :id",
      { replacements: { id: job.id } },
    );
    await runDueJobs({ quiet: true });
    expect(received.filter((r) => r.to === to)).toHaveLength(0);

    // The back-off passes (moved forward rather than waited for): delivered, once.
    await models().sequelize.query('UPDATE graphile_worker._private_jobs SET run_at = now() WHERE id = :id', {
      replacements: { id: job.id },
    });
    await runDueJobs({ quiet: true });
    expect(received.filter((r) => r.to === to)).toHaveLength(1);
    expect(received.find((r) => r.to === to)!.raw).toContain('Spring box inspection');
    row = await models().MailOutbox.findByPk(outboxId);
    expect(row!.sentAt).not.toBeNull();
    expect(await jobFor(outboxId)).toHaveLength(0);

    // Run again, and even hand the same message to the sender again: still one copy.
    await runDueJobs({ quiet: true });
    expect(await deliverOutboxMessage(outboxId)).toBe('already-sent');
    expect(received.filter((r) => r.to === to)).toHaveLength(1);
    [job] = await jobFor(outboxId);
    expect(job).toBeUndefined();
  });
});
