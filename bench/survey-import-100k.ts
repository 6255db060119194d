import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import Papa from 'papaparse';
import S3rver from 's3rver';
import type { Benchmark } from './harness';

/** How the walk of `walkCsv` is read (a phone app's export). */
export const WALK_OPTIONS = {
  format: 'gps-csv' as const,
  name: 'Benchmark walk',
  elevationUnit: 'm' as const,
  heightSource: 'gps' as const,
  mapping: { latitude: 0, longitude: 1, elevation: 2, time: 3, name: 4, accuracy: 5 },
};

/**
 * A fake S3 on a free port and a team, user and project of their own in the database named by
 * DATABASE_URL, for the benchmarks that store routes; `teardown` removes them all.
 */
export async function benchSite(name: string) {
  if (!process.env.DATABASE_URL)
    throw new Error(`${name} needs DATABASE_URL (a migrated Runnel database, e.g. the test cluster)`);
  const dir = mkdtempSync(path.join(os.tmpdir(), 'runnel-bench-s3-'));
  const s3 = new S3rver({
    address: '127.0.0.1',
    port: 0,
    silent: true,
    directory: dir,
    configureBuckets: [{ name: 'runnel-bench', configs: [] }],
  });
  const { port } = await s3.run();
  process.env.RUNNEL_S3_ENDPOINT = `http://127.0.0.1:${port}`;
  process.env.RUNNEL_S3_BUCKET = 'runnel-bench';
  // Sessions are not used here; the environment check only needs one to be present.
  process.env.NEXTAUTH_SECRET ??= 'bench-only-secret-not-used-for-any-session-0000';
  const { models } = await import('../models');
  const { Team, Project, User } = models();
  const team = await Team.create({ name: 'Benchmark team' });
  const user = await User.create({
    email: `bench-${Date.now()}@bench.test`,
    name: 'Benchmark',
    passwordHash: 'not-a-login',
  });
  const project = await Project.create({
    teamId: team.id,
    name: 'Benchmark project',
    description: '',
    siteNotes: '',
    unitSystem: 'metric',
  });
  return {
    project,
    user,
    teardown: async () => {
      await project.destroy();
      await team.destroy();
      await user.destroy();
      await models().sequelize.close();
      await s3.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

const POINTS = 100_000;

/** Deterministic pseudo-random numbers in [0, 1) (a 32-bit LCG, Numerical Recipes constants). */
function lcg(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
}

/** An invented 100 000-fix phone walk (≈ 300 km of 3 m steps) as a phone app would export it. */
export function walkCsv(points = POINTS): string {
  const random = lcg(20260418);
  const rows = ['latitude,longitude,altitude,time,name,horizontal_accuracy'];
  let lat = 54.2;
  let lon = -2.9;
  const start = Date.UTC(2026, 3, 18, 6);
  for (let i = 0; i < points; i++) {
    lat += 0.000027 * (0.6 + random());
    lon += 0.00002 * (random() - 0.3);
    const ele = 400 + 60 * Math.sin(i / 4000) - i * 0.001 + (random() - 0.5) * 2;
    rows.push(
      `${lat.toFixed(7)},${lon.toFixed(7)},${ele.toFixed(2)},${new Date(start + i * 3000).toISOString()},${i % 5000 === 0 ? `mark ${i}` : ''},${(3 + random() * 2).toFixed(1)}`,
    );
  }
  return `${rows.join('\n')}\n`;
}

/**
 * End-to-end import of a 100 000-point CSV through the same function the upload handler calls:
 * the original stored through lib/storage.ts in a local fake S3 (started here on a free port),
 * then sniffed, parsed, validated, chainage on the WGS84 ellipsoid, and stored in one transaction
 * in the database named by DATABASE_URL. The bench makes its own team and project and removes them.
 * The floor is papaparse parsing the same text alone.
 */
export async function surveyImport100k(): Promise<Benchmark> {
  const site = await benchSite('survey-import-100k');
  const { importSurvey } = await import('../lib/data/route-import');
  const text = walkCsv();
  const bytes = new TextEncoder().encode(text);
  const { project, user } = site;
  return {
    name: 'survey-import-100k',
    runs: 5,
    warmUps: 1,
    run: async () => {
      const r = await importSurvey({
        projectId: project.id,
        userId: user.id,
        fileName: 'walk-100k.csv',
        contentType: 'text/csv',
        bytes,
        options: WALK_OPTIONS,
      });
      if (r.route.pointCount !== POINTS) throw new Error(`imported ${r.route.pointCount} points, expected ${POINTS}`);
      return r.route.lengthM;
    },
    floor: () => Papa.parse<string[]>(text, { skipEmptyLines: true }).data.length,
    teardown: site.teardown,
  };
}
