import fs from 'node:fs';
import path from 'node:path';

const ROOT = path.resolve(import.meta.dirname, '../..');
const APP = path.join(ROOT, 'app');
const HTTP_METHODS = ['GET', 'HEAD', 'POST', 'PUT', 'PATCH', 'DELETE', 'OPTIONS'];

function walk(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(dir, entry.name);
    return entry.isDirectory() ? walk(full) : [full];
  });
}

/** Names a module exports: `export const X`, `export async function X`, `export { a as X }`. */
export function exportedNames(source: string): string[] {
  const names = new Set<string>();
  for (const m of source.matchAll(/export\s+(?:async\s+)?(?:const|let|function\*?|class)\s+([A-Za-z_$][\w$]*)/g))
    names.add(m[1]!);
  for (const m of source.matchAll(/export\s*\{([^}]*)\}/g)) {
    for (const part of m[1]!.split(',')) {
      const name = part
        .trim()
        .split(/\s+as\s+/)
        .pop()
        ?.trim();
      if (name) names.add(name);
    }
  }
  return [...names];
}

/**
 * Every method of every route handler the router serves: any `route.ts|js` under app/, keyed as
 * the authorisation tables name them (`<path under app/api>/route.ts METHOD`).
 */
export function discoverRouteHandlers(): string[] {
  return walk(APP)
    .filter((file) => /\/route\.(ts|js|tsx|mjs)$/.test(file))
    .flatMap((file) => {
      const rel = path.relative(path.join(APP, 'api'), file).split(path.sep).join('/');
      return exportedNames(fs.readFileSync(file, 'utf8'))
        .filter((name) => HTTP_METHODS.includes(name))
        .map((method) => `${rel} ${method}`);
    })
    .sort();
}

/** Every server action: the exports of every module that starts with 'use server' (`<file> <export>`). */
export function discoverServerActions(): string[] {
  const dirs = ['app', 'lib', 'components'].map((d) => path.join(ROOT, d)).filter((d) => fs.existsSync(d));
  return dirs
    .flatMap(walk)
    .filter((file) => /\.(ts|tsx)$/.test(file))
    .flatMap((file) => {
      const source = fs.readFileSync(file, 'utf8');
      if (!/^\s*(['"])use server\1/.test(source.replace(/^(\s*\/\/[^\n]*\n|\s*\/\*[\s\S]*?\*\/)*/, ''))) return [];
      const rel = path.relative(ROOT, file).split(path.sep).join('/');
      return exportedNames(source).map((name) => `${rel} ${name}`);
    })
    .sort();
}

/** The build's id for a server action (Next's server reference manifest), by file and export. */
export function serverActionId(file: string, exportName: string): string {
  const manifest = JSON.parse(
    fs.readFileSync(path.join(ROOT, '.next/server/server-reference-manifest.json'), 'utf8'),
  ) as {
    node: Record<string, { filename?: string; exportedName?: string }>;
  };
  const hit = Object.entries(manifest.node).find(([, v]) => v.filename === file && v.exportedName === exportName);
  if (!hit) throw new Error(`the build has no server action ${exportName} in ${file}`);
  return hit[0];
}
