// `npm run bench [name...]`: bundles bench/ once with esbuild and runs it under plain Node, so the
// figures measure the code and not a TypeScript loader's hooks (seen to add 30-100 % here).
import { build } from 'esbuild';
import { spawnSync } from 'node:child_process';
import { mkdirSync } from 'node:fs';

mkdirSync('.runtime', { recursive: true });
await build({
  entryPoints: ['bench/run.ts'],
  bundle: true,
  platform: 'node',
  format: 'cjs',
  outfile: '.runtime/bench.cjs',
  logLevel: 'warning',
  // Database drivers and the S3 client load at run time, as the app loads them.
  packages: 'external',
});
// react-server: the server-only data modules refuse to load under the default condition.
const result = spawnSync(
  process.execPath,
  ['--conditions=react-server', '.runtime/bench.cjs', ...process.argv.slice(2)],
  { stdio: 'inherit' },
);
process.exit(result.status ?? 1);
