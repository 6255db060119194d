import 'server-only';
import nodemailer, { type Transporter } from 'nodemailer';
import { env } from '../env';

let transport: Transporter | undefined;

/** One SMTP transport per process, from the environment (the local fake unless configured). */
export function mailTransport(): Transporter {
  const e = env();
  transport ??= nodemailer.createTransport({
    host: e.RUNNEL_SMTP_HOST,
    port: e.RUNNEL_SMTP_PORT,
    secure: e.RUNNEL_SMTP_SECURE,
    auth: e.RUNNEL_SMTP_USER ? { user: e.RUNNEL_SMTP_USER, pass: e.RUNNEL_SMTP_PASSWORD ?? '' } : undefined,
    // A server that is down should fail the job quickly; the queue retries it later.
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 30_000,
  });
  return transport;
}

/** For tests that move the mail server: forget the cached transport. */
export function resetMailTransport(): void {
  transport?.close();
  transport = undefined;
}
