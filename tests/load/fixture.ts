import { randomUUID } from 'node:crypto';
import { encode } from 'next-auth/jwt';
import pg from 'pg';

/** What a load run works on: an owner's session, a team with a realistic list of projects, one water source. */
export interface LoadFixture {
  teamId: string;
  projectId: string;
  sourceId: string;
  /** `Cookie` header value of a signed-in owner. */
  cookie: string;
  /** Marks every yield reading the run writes, so the lost-write check counts only its own. */
  notePrefix: string;
  /** Yield readings in the database whose note starts with `notePrefix`. */
  countWrites: () => Promise<number>;
  /** Removes the team (and with it the projects, source and readings) and the user. */
  remove: () => Promise<void>;
}

const PROJECTS_IN_LIST = 25;
// Not a usable password hash: the load user signs in only through the minted session cookie.
const NO_LOGIN = 'load-fixture-no-password-login';

/** Makes the fixture straight in the database named by `databaseUrl`, with plain SQL. */
export async function createLoadFixture(
  databaseUrl: string,
  sessionSecret: string,
  label: string,
): Promise<LoadFixture> {
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  const run = `${label}-${randomUUID().slice(0, 8)}`;
  const one = async (sql: string, values: unknown[]) =>
    (await client.query(sql, values)).rows[0] as Record<string, string>;
  const user = await one(
    'INSERT INTO users (email, name, password_hash) VALUES ($1, $2, $3) RETURNING id, email, name, session_version',
    [`${run}@load.test`, 'Load runner', NO_LOGIN],
  );
  const team = await one('INSERT INTO teams (name) VALUES ($1) RETURNING id', [`Load team ${run}`]);
  await client.query(`INSERT INTO memberships (team_id, user_id, role) VALUES ($1, $2, 'owner')`, [team.id, user.id]);
  let projectId = '';
  for (let i = 0; i < PROJECTS_IN_LIST; i++) {
    const project = await one(
      `INSERT INTO projects (team_id, name, description, site_notes, unit_system) VALUES ($1, $2, '', '', 'metric') RETURNING id`,
      [team.id, `Load project ${i + 1}`],
    );
    projectId ||= project.id;
  }
  const source = await one(
    `INSERT INTO water_sources (project_id, name) VALUES ($1, 'Load test spring') RETURNING id`,
    [projectId],
  );
  await client.end();

  const token = await encode({
    token: { sub: user.id, email: user.email, name: user.name, sv: user.session_version },
    secret: sessionSecret,
  });
  const withClient = async <T>(fn: (c: pg.Client) => Promise<T>): Promise<T> => {
    const c = new pg.Client({ connectionString: databaseUrl });
    await c.connect();
    try {
      return await fn(c);
    } finally {
      await c.end();
    }
  };
  return {
    teamId: team.id,
    projectId,
    sourceId: source.id,
    cookie: `next-auth.session-token=${token}`,
    notePrefix: run,
    countWrites: () =>
      withClient(async (c) =>
        Number(
          (
            await c.query('SELECT count(*) AS n FROM yield_readings WHERE source_id = $1 AND note LIKE $2', [
              source.id,
              `${run}%`,
            ])
          ).rows[0].n,
        ),
      ),
    remove: () =>
      withClient(async (c) => {
        await c.query('DELETE FROM teams WHERE id = $1', [team.id]);
        await c.query('DELETE FROM users WHERE id = $1', [user.id]);
      }),
  };
}
