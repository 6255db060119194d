import 'server-only';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

/**
 * The worker thread runs plain JavaScript, so the TypeScript entry (and everything it imports) is
 * bundled once per process with esbuild into a private temp folder. Building at first use, not in
 * a build step, keeps `next start`, Vitest and the benchmarks on the same code with no stale file.
 */
let building: Promise<string> | undefined;

async function build(): Promise<string> {
  const given = process.env.RUNNEL_WORKER_BUNDLE;
  if (given && fs.existsSync(given)) return given;
  const { build: esbuild } = await import('esbuild');
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'runnel-workers-'));
  const outfile = path.join(dir, 'worker.mjs');
  await esbuild({
    entryPoints: [path.join(process.cwd(), 'lib', 'workers', 'worker-entry.ts')],
    outfile,
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    conditions: ['react-server'],
    logLevel: 'silent',
    // Bundled CommonJS packages call require() and read __dirname/__filename; give the ES module them.
    banner: {
      js:
        "import { createRequire as __runnelRequire } from 'node:module'; import { fileURLToPath as __runnelPath } from 'node:url'; " +
        'const require = __runnelRequire(import.meta.url); const __filename = __runnelPath(import.meta.url); const __dirname = __runnelPath(new URL(".", import.meta.url));',
    },
  });
  // The sizing optimiser (highs) loads its WebAssembly from beside the script that runs it.
  const wasm = path.join(process.cwd(), 'node_modules', 'highs', 'build', 'highs.wasm');
  if (fs.existsSync(wasm)) fs.copyFileSync(wasm, path.join(dir, 'highs.wasm'));
  return outfile;
}

/** Path of this process's worker bundle, built on first call. */
export function workerBundle(): Promise<string> {
  building ??= build().catch((error: unknown) => {
    building = undefined;
    throw error;
  });
  return building;
}
