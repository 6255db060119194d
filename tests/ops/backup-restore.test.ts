import '../support/env';
import { execFile } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

const run = promisify(execFile);
const testUrl = new URL(process.env.DATABASE_URL!);
const scratchName = `runnel_backup_check_${randomUUID().slice(0, 8)}`;
const scratchUrl = Object.assign(new URL(testUrl.href), { pathname: `/${scratchName}` }).href;
const scratchBucket = `runnel-backup-check-${randomUUID().slice(0, 8)}`;
const work = fs.mkdtempSync(path.join(os.tmpdir(), 'runnel-backup-test-'));

/** Runs `npm run backup` / `npm run restore`'s script against the scratch database and bucket. */
async function script(name: 'backup' | 'restore', folder: string, databaseUrl = scratchUrl, bucket = scratchBucket): Promise<string> {
  const { stdout } = await run('bash', [`scripts/${name}.sh`, folder], { env: { ...process.env, DATABASE_URL: databaseUrl, RUNNEL_S3_BUCKET: bucket }, timeout: 120_000 });
  return stdout;
}

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

describe('npm run backup / npm run restore', () => {
  beforeAll(async () => {
    await query(testUrl.href, `CREATE DATABASE ${scratchName}`);
  });
  afterAll(async () => {
    const { listKeys, deleteObject } = await storage();
    for (const key of await listKeys('')) await deleteObject(key);
    await query(testUrl.href, `DROP DATABASE IF EXISTS ${scratchName} WITH (FORCE)`);
    fs.rmSync(work, { recursive: true, force: true });
  });

  it('brings back rows and stored files changed after the backup, and removes what was added', async () => {
    // The seeded test database, restored into an empty one: a backup restores onto a fresh server.
    // Its storage half reads the empty scratch bucket, so what other test files stored never matters.
    await script('backup', path.join(work, 'seeded'), testUrl.href, scratchBucket);
    await script('restore', path.join(work, 'seeded'));
    const [seeded] = await query<{ n: string }>(scratchUrl, `SELECT count(*) AS n FROM users WHERE email LIKE '%@example.test'`);
    expect(Number(seeded.n)).toBe(5);

    const { putObject, getObject, deleteObject, listKeys } = await storage();
    const photo = new TextEncoder().encode('spring box, before the silt clean-out');
    await putObject('attachments/check/spring-box.txt', photo, 'text/plain');
    const [team] = await query<{ id: string }>(scratchUrl, `INSERT INTO teams (name) VALUES ('Backup check team') RETURNING id`);
    const [project] = await query<{ id: string; name: string }>(scratchUrl, 'SELECT id, name FROM projects ORDER BY id LIMIT 1');
    const out = await script('backup', path.join(work, 'after-changes'));
    expect(out).toContain('backup complete');

    // Everything changes after the backup: a row deleted, one renamed, one added; a file replaced by another.
    await query(scratchUrl, 'DELETE FROM teams WHERE id = $1', [team.id]);
    await query(scratchUrl, `UPDATE projects SET name = 'Renamed after the backup' WHERE id = $1`, [project.id]);
    await query(scratchUrl, `INSERT INTO teams (name) VALUES ('Made after the backup')`);
    await deleteObject('attachments/check/spring-box.txt');
    await putObject('attachments/check/later.txt', new TextEncoder().encode('later'), 'text/plain');

    await script('restore', path.join(work, 'after-changes'));

    expect(await query(scratchUrl, 'SELECT name FROM teams WHERE id = $1', [team.id])).toEqual([{ name: 'Backup check team' }]);
    expect(await query(scratchUrl, 'SELECT name FROM projects WHERE id = $1', [project.id])).toEqual([{ name: project.name }]);
    expect(await query(scratchUrl, `SELECT id FROM teams WHERE name = 'Made after the backup'`)).toEqual([]);
    const restored = await getObject('attachments/check/spring-box.txt');
    expect(restored && new TextDecoder().decode(restored.bytes)).toBe('spring box, before the silt clean-out');
    expect(restored?.contentType).toBe('text/plain');
    expect(await listKeys('attachments/check/')).toEqual(['attachments/check/spring-box.txt']);
  }, 240_000);

  it('refuses a folder that is not a complete backup and changes nothing', async () => {
    const empty = fs.mkdtempSync(path.join(work, 'empty-'));
    await expect(script('restore', empty)).rejects.toMatchObject({ stderr: expect.stringContaining('not a complete Runnel backup') });
  });
});
