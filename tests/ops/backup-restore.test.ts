import '../support/env';
import { execFile } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fingerprint } from '../server/fingerprint';

const run = promisify(execFile);
const testUrl = new URL(process.env.DATABASE_URL!);
const scratchName = `runnel_backup_check_${randomUUID().slice(0, 8)}`;
const scratchUrl = Object.assign(new URL(testUrl.href), { pathname: `/${scratchName}` }).href;
const scratchBucket = `runnel-backup-check-${randomUUID().slice(0, 8)}`;
const work = fs.mkdtempSync(path.join(os.tmpdir(), 'runnel-backup-test-'));

/** Runs `npm run backup` / `npm run restore`'s script against the scratch database and bucket. */
async function script(
  name: 'backup' | 'restore',
  folder: string,
  databaseUrl = scratchUrl,
  bucket = scratchBucket,
  extraEnv: Record<string, string> = {},
): Promise<string> {
  const { stdout } = await run('bash', [`scripts/${name}.sh`, folder], {
    env: { ...process.env, DATABASE_URL: databaseUrl, RUNNEL_S3_BUCKET: bucket, ...extraEnv },
    timeout: 120_000,
  });
  return stdout;
}

/** The same, expected to fail: its error output (the scripts' own words, colour codes removed). */
async function failing(
  name: 'backup' | 'restore',
  folder: string,
  extraEnv: Record<string, string> = {},
): Promise<string> {
  try {
    await script(name, folder, scratchUrl, scratchBucket, extraEnv);
  } catch (error) {
    return String((error as { stderr?: string }).stderr ?? error).replace(/\x1b\[[0-9;]*m/g, '');
  }
  throw new Error(`npm run ${name} succeeded where it should have failed`);
}

/** A storage fault for the scripts' processes (lib/storage-faults.ts: only with RUNNEL_ENV=test). */
function storageFault(plan: {
  match: string;
  op: 'put' | 'get' | 'delete' | 'list';
  nth: number;
}): Record<string, string> {
  const file = path.join(work, `fault-${randomUUID().slice(0, 8)}.json`);
  fs.writeFileSync(file, JSON.stringify(plan));
  return { RUNNEL_ENV: 'test', RUNNEL_STORAGE_FAULTS: file };
}

/** A port on loopback where nothing listens: object storage that is down. */
const STORAGE_DOWN = { RUNNEL_S3_ENDPOINT: 'http://127.0.0.1:9' };

async function query<T extends pg.QueryResultRow>(url: string, sql: string, values: unknown[] = []): Promise<T[]> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    return (await client.query<T>(sql, values)).rows;
  } finally {
    await client.end();
  }
}

async function storage() {
  process.env.RUNNEL_S3_BUCKET = scratchBucket;
  return import('@/lib/storage');
}

// One scratch database and bucket for the whole file: the fault cases start from what the round trip left.
beforeAll(async () => {
  await query(testUrl.href, `CREATE DATABASE ${scratchName}`);
});
afterAll(async () => {
  const { listKeys, deleteObject } = await storage();
  for (const key of await listKeys('')) await deleteObject(key);
  await query(testUrl.href, `DROP DATABASE IF EXISTS ${scratchName} WITH (FORCE)`);
  fs.rmSync(work, { recursive: true, force: true });
});

describe('npm run backup / npm run restore', () => {
  it('brings back rows and stored files changed after the backup, and removes what was added', async () => {
    // The seeded test database, restored into an empty one: a backup restores onto a fresh server.
    // Its storage half reads the empty scratch bucket, so what other test files stored never matters.
    await script('backup', path.join(work, 'seeded'), testUrl.href, scratchBucket);
    await script('restore', path.join(work, 'seeded'));
    const [seeded] = await query<{ n: string }>(
      scratchUrl,
      `SELECT count(*) AS n FROM users WHERE email LIKE '%@example.test'`,
    );
    expect(Number(seeded.n)).toBe(5);

    const { putObject, getObject, deleteObject, listKeys } = await storage();
    const photo = new TextEncoder().encode('spring box, before the silt clean-out');
    await putObject('attachments/check/spring-box.txt', photo, 'text/plain');
    const [team] = await query<{ id: string }>(
      scratchUrl,
      `INSERT INTO teams (name) VALUES ('Backup check team') RETURNING id`,
    );
    const [project] = await query<{ id: string; name: string }>(
      scratchUrl,
      'SELECT id, name FROM projects ORDER BY id LIMIT 1',
    );
    const out = await script('backup', path.join(work, 'after-changes'));
    expect(out).toContain('backup complete');

    // Everything changes after the backup: a row deleted, one renamed, one added; a file replaced by another.
    await query(scratchUrl, 'DELETE FROM teams WHERE id = $1', [team.id]);
    await query(scratchUrl, `UPDATE projects SET name = 'Renamed after the backup' WHERE id = $1`, [project.id]);
    await query(scratchUrl, `INSERT INTO teams (name) VALUES ('Made after the backup')`);
    await deleteObject('attachments/check/spring-box.txt');
    await putObject('attachments/check/later.txt', new TextEncoder().encode('later'), 'text/plain');

    await script('restore', path.join(work, 'after-changes'));

    expect(await query(scratchUrl, 'SELECT name FROM teams WHERE id = $1', [team.id])).toEqual([
      { name: 'Backup check team' },
    ]);
    expect(await query(scratchUrl, 'SELECT name FROM projects WHERE id = $1', [project.id])).toEqual([
      { name: project.name },
    ]);
    expect(await query(scratchUrl, `SELECT id FROM teams WHERE name = 'Made after the backup'`)).toEqual([]);
    const restored = await getObject('attachments/check/spring-box.txt');
    expect(restored && new TextDecoder().decode(restored.bytes)).toBe('spring box, before the silt clean-out');
    expect(restored?.contentType).toBe('text/plain');
    expect(await listKeys('attachments/check/')).toEqual(['attachments/check/spring-box.txt']);
  }, 240_000);

  it('backs up a bucket of more than one listing page (1,000 keys) in full', async () => {
    const { putObject, deleteObject, listKeys } = await storage();
    const keys = Array.from({ length: 1005 }, (_, i) => `attachments/pages/reading-${String(i).padStart(4, '0')}.txt`);
    for (let i = 0; i < keys.length; i += 50)
      await Promise.all(
        keys.slice(i, i + 50).map((key) => putObject(key, new TextEncoder().encode(key), 'text/plain')),
      );
    try {
      const folder = path.join(work, 'many-objects');
      await script('backup', folder);
      const saved = (JSON.parse(fs.readFileSync(path.join(folder, 'objects.json'), 'utf8')) as { key: string }[]).map(
        (e) => e.key,
      );
      expect(saved.filter((key) => key.startsWith('attachments/pages/')).sort()).toEqual(keys);
    } finally {
      for (let i = 0; i < keys.length; i += 50)
        await Promise.all(keys.slice(i, i + 50).map((key) => deleteObject(key)));
    }
    expect(await listKeys('attachments/pages/')).toEqual([]);
  }, 240_000);

  it('refuses a folder that is not a complete backup and changes nothing', async () => {
    const empty = fs.mkdtempSync(path.join(work, 'empty-'));
    await expect(script('restore', empty)).rejects.toMatchObject({
      stderr: expect.stringContaining('not a complete Runnel backup'),
    });
  });
});

describe('npm run backup / npm run restore when object storage or the database fails part way', () => {
  const base = path.join(work, 'fault-base');
  /** The state every failed run must leave as it found it: rows and every stored object with its bytes. */
  let rowsBefore: Record<string, string>;
  let objectsBefore: Record<string, string>;

  async function objectsNow(): Promise<Record<string, string>> {
    const { listKeys, getObject } = await storage();
    const out: Record<string, string> = {};
    for (const key of (await listKeys('')).sort()) {
      const o = await getObject(key);
      out[key] = `${o?.contentType} ${o && new TextDecoder().decode(o.bytes)}`;
    }
    return out;
  }
  const rowsNow = () => fingerprint((sql) => query(scratchUrl, sql));
  const unchanged = async () => {
    expect(await rowsNow()).toEqual(rowsBefore);
    expect(await objectsNow()).toEqual(objectsBefore);
  };

  beforeAll(async () => {
    // A backup with four objects, then changes after it: rows, a replaced object, a removed one and a new one.
    const { putObject, deleteObject, listKeys } = await storage();
    for (const key of await listKeys('')) await deleteObject(key);
    const text = (t: string) => new TextEncoder().encode(t);
    for (const name of ['intake', 'break-tank', 'trough', 'washout'])
      await putObject(`attachments/fault/${name}.txt`, text(`${name} as backed up`), 'text/plain');
    await script('backup', base);
    await query(scratchUrl, `INSERT INTO teams (name) VALUES ('Made after the fault backup')`);
    await putObject('attachments/fault/intake.txt', text('intake after a new screen'), 'text/plain');
    await deleteObject('attachments/fault/trough.txt');
    await putObject('attachments/fault/air-valve.txt', text('air valve, added later'), 'text/plain');
    rowsBefore = await rowsNow();
    objectsBefore = await objectsNow();
  }, 120_000);

  it('a write refused part way through the restore: names the object, puts the bucket back, leaves the database', async () => {
    const err = await failing('restore', base, storageFault({ match: 'attachments/fault/', op: 'put', nth: 2 }));
    expect(err).toMatch(
      /writing object attachments\/fault\/[a-z-]+\.txt in the bucket runnel-backup-check-\w+ at http:\/\/127\.0\.0\.1:\d+ failed: injected storage fault/,
    );
    expect(err).toContain('the bucket was put back as it was');
    expect(err).toContain('the database was not touched');
    await unchanged();
  }, 120_000);

  it('object storage down: says which store could not be listed and changes nothing', async () => {
    const err = await failing('restore', base, STORAGE_DOWN);
    expect(err).toMatch(
      /listing the bucket in the bucket runnel-backup-check-\w+ at http:\/\/127\.0\.0\.1:9 failed: .*ECONNREFUSED/,
    );
    await unchanged();
  }, 120_000);

  it('an object missing from the backup folder: names the file and the object before changing anything', async () => {
    const damaged = path.join(work, 'fault-missing-object');
    fs.cpSync(base, damaged, { recursive: true });
    const manifest = JSON.parse(fs.readFileSync(path.join(damaged, 'objects.json'), 'utf8')) as {
      key: string;
      file: string;
    }[];
    const gone = manifest.find((e) => e.key.endsWith('washout.txt'))!;
    fs.rmSync(path.join(damaged, 'objects', gone.file));
    const err = await failing('restore', damaged);
    expect(err).toContain(`objects/${gone.file} (object attachments/fault/washout.txt) is missing`);
    await unchanged();
  }, 120_000);

  it('the database half fails after the objects were restored: the bucket is put back and the database left as it was', async () => {
    // A view outside the app's schema on one of its tables: pg_restore --clean cannot drop the table.
    await query(
      scratchUrl,
      'CREATE SCHEMA restore_blocker; CREATE VIEW restore_blocker.team_names AS SELECT name FROM public.teams',
    );
    try {
      const err = await failing('restore', base);
      expect(err).toContain('pg_restore failed');
      expect(err).toContain('the database was left as it was and object storage was put back as it was');
      await unchanged();
    } finally {
      await query(scratchUrl, 'DROP SCHEMA restore_blocker CASCADE');
    }
  }, 120_000);

  it('when the bucket cannot be put back either, keeps the objects as they were and says where and how to put them back', async () => {
    // The database half fails, then putting back the one object the restore removed is refused too.
    await query(
      scratchUrl,
      'CREATE SCHEMA restore_blocker; CREATE VIEW restore_blocker.team_names AS SELECT name FROM public.teams',
    );
    const journals = fs.mkdtempSync(path.join(work, 'journals-'));
    try {
      const err = await failing('restore', base, {
        ...storageFault({ match: 'attachments/fault/air-valve.txt', op: 'put', nth: 1 }),
        TMPDIR: journals,
      });
      const journal = /the objects as they were are in (\S+);/.exec(err)?.[1];
      expect(err).toMatch(
        /putting object attachments\/fault\/air-valve\.txt back in the bucket runnel-backup-check-\w+ at \S+ failed: injected storage fault/,
      );
      expect(journal && path.dirname(journal)).toBe(journals);
      expect(await rowsNow()).toEqual(rowsBefore);
      expect((await objectsNow())['attachments/fault/air-valve.txt']).toBeUndefined();
      // The command the message gives, once storage answers again, puts the bucket back as it was.
      await run('node', ['--import', 'tsx', 'scripts/backup-objects.ts', 'undo', journal!], {
        env: { ...process.env, RUNNEL_S3_BUCKET: scratchBucket },
        timeout: 60_000,
      });
      await unchanged();
    } finally {
      await query(scratchUrl, 'DROP SCHEMA restore_blocker CASCADE');
    }
  }, 120_000);

  it('a backup whose storage half fails names the step and leaves no folder behind', async () => {
    const down = path.join(work, 'backup-storage-down');
    expect(await failing('backup', down, STORAGE_DOWN)).toMatch(
      /listing the bucket in the bucket runnel-backup-check-\w+ at http:\/\/127\.0\.0\.1:9 failed.*no backup was written/s,
    );
    const refused = path.join(work, 'backup-read-refused');
    const err = await failing(
      'backup',
      refused,
      storageFault({ match: 'attachments/fault/break-tank.txt', op: 'get', nth: 1 }),
    );
    expect(err).toMatch(
      /reading object attachments\/fault\/break-tank\.txt from the bucket runnel-backup-check-\w+ at http:\/\/127\.0\.0\.1:\d+ failed: injected storage fault/,
    );
    expect(fs.readdirSync(work).filter((name) => name.startsWith('backup-'))).toEqual([]);
    await unchanged();
  }, 120_000);

  it('after the failures, the same backup restores in full', async () => {
    await script('restore', base);
    expect(await query(scratchUrl, `SELECT id FROM teams WHERE name = 'Made after the fault backup'`)).toEqual([]);
    expect(await objectsNow()).toEqual(
      Object.fromEntries(
        ['break-tank', 'intake', 'trough', 'washout'].map((n) => [
          `attachments/fault/${n}.txt`,
          `text/plain ${n} as backed up`,
        ]),
      ),
    );
  }, 120_000);
});
