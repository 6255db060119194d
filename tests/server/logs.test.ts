import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { db } from '@/lib/db';
import { env } from '@/lib/env';
import { KNOWN_PASSWORD } from '../support/account-fixtures';
import { createCast } from './cast';
import { live, signIn } from './live';

/**
 * Runs last (tests/server/sequencer.ts): after every other file has driven the app through
 * sign-ins, refusals, injected faults and a database outage, the server's log holds none of the
 * planted secrets: the database password, the session secret, users' passwords, session cookies
 * and a value that only ever travelled as a bind parameter of a failed statement.
 */

const LOG = path.resolve(import.meta.dirname, '../../.runtime/test/server.log');

describe('the server log after the run', () => {
  it('holds none of the planted secrets', async () => {
    const cast = await createCast();
    const planted = `planted-bind-${Date.now().toString(36)}`;
    // A failed write whose statement carries the planted value as a bind parameter, and a
    // failed sign-in whose form carries a password: both are logged, neither value may be.
    await db().query(
      `CREATE OR REPLACE FUNCTION runnel_test_fault() RETURNS trigger LANGUAGE plpgsql AS $$ BEGIN RAISE EXCEPTION 'injected fault on %', TG_TABLE_NAME; END $$`,
    );
    await db().query(
      `CREATE TRIGGER runnel_test_trigger BEFORE INSERT ON projects FOR EACH STATEMENT EXECUTE FUNCTION runnel_test_fault()`,
    );
    let failed;
    try {
      failed = await live(`/api/teams/${cast.a.teamId}/projects`, {
        method: 'POST',
        headers: { cookie: cast.cookies.designer!, 'content-type': 'application/json' },
        body: JSON.stringify({ name: planted }),
      });
    } finally {
      await db().query(`DROP TRIGGER IF EXISTS runnel_test_trigger ON projects`);
    }
    expect(failed.status).toBe(500);
    expect(failed.text).not.toContain(planted);
    await signIn(cast.a.users.owner.email, 'a wrong password typed in the log test');
    await new Promise((r) => setTimeout(r, 500));

    const log = fs.readFileSync(LOG, 'utf8');
    expect(log).toContain('unexpected error in a request handler');
    const dbPassword = decodeURIComponent(new URL(process.env.DATABASE_URL!).password);
    const cookieValues = Object.values(cast.cookies)
      .filter(Boolean)
      .map((c) => c!.slice(c!.indexOf('=') + 1));
    const secrets: Record<string, string> = {
      'database password': dbPassword,
      'session secret': env().NEXTAUTH_SECRET,
      "a user's password": KNOWN_PASSWORD,
      'a wrong password': 'a wrong password typed in the log test',
      'a bind parameter': planted,
      ...Object.fromEntries(cookieValues.map((c, i) => [`session cookie ${i}`, c])),
    };
    for (const [name, value] of Object.entries(secrets)) expect(value.length, name).toBeGreaterThanOrEqual(8);
    const found = Object.entries(secrets)
      .filter(([, value]) => log.includes(value))
      .map(([name]) => name);
    expect(found).toEqual([]);
  }, 120_000);
});
