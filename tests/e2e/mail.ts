import pg from 'pg';

/** The fake mail server's reading page (scripts/fakes/mail.mjs, maildev's REST list). */
const MAIL_API = `http://127.0.0.1:${process.env.RUNNEL_MAIL_WEB_PORT ?? 1081}/api/email`;

interface FakeMail {
  id: string;
  subject: string;
  text: string;
  to: { address: string }[];
  time: string;
}

async function mailTo(address: string): Promise<FakeMail[]> {
  const res = await fetch(MAIL_API);
  if (!res.ok) throw new Error(`fake mail server answered ${res.status}`);
  const all = (await res.json()) as FakeMail[];
  return all.filter((m) => m.to.some((t) => t.address.toLowerCase() === address.toLowerCase()));
}

/**
 * Waits for the `nth` message (1-based) to `address` whose subject matches, as the job queue
 * delivers it, and returns it with the first token link in its text and all its links.
 */
export async function waitForMail(
  address: string,
  subject: RegExp,
  nth = 1,
  timeoutMs = 20_000,
): Promise<{ subject: string; text: string; link: string; links: string[] }> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const found = (await mailTo(address)).filter((m) => subject.test(m.subject));
    if (found.length >= nth) {
      const mail = found[nth - 1]!;
      const link = /https?:\/\/\S+token=[A-Za-z0-9_-]+/.exec(mail.text)?.[0];
      // The path and query of the mailed link (the test's own server answers it), or '' when none.
      // Every link in the text as a path and query, in order (a notification's "Open it" link first).
      const links = [...mail.text.matchAll(/https?:\/\/\S+/g)].map(
        ([url]) => new URL(url).pathname + new URL(url).search,
      );
      return {
        subject: mail.subject,
        text: mail.text,
        link: link ? new URL(link).pathname + new URL(link).search : '',
        links,
      };
    }
    if (Date.now() > until) throw new Error(`no mail "${subject}" #${nth} to ${address} after ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 250));
  }
}

export async function countMail(address: string, subject: RegExp): Promise<number> {
  return (await mailTo(address)).filter((m) => subject.test(m.subject)).length;
}

/** Moves an invitation's expiry into the past, as time would (the test database `npm test` runs). */
export async function expireInvitation(email: string): Promise<void> {
  const client = new pg.Client({ connectionString: process.env.DATABASE_URL });
  await client.connect();
  try {
    await client.query("UPDATE invitations SET expires_at = now() - interval '1 hour' WHERE email = $1", [email]);
  } finally {
    await client.end();
  }
}
