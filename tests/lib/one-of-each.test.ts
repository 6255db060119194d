import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

const root = path.resolve(__dirname, '../..');

function sourceFiles(dir: string): string[] {
  const found: string[] = [];
  for (const entry of readdirSync(dir)) {
    const full = path.join(dir, entry);
    if (statSync(full).isDirectory()) found.push(...sourceFiles(full));
    else if (/\.(ts|tsx)$/.test(entry)) found.push(full);
  }
  return found;
}

const screens = [...sourceFiles(path.join(root, 'components')), ...sourceFiles(path.join(root, 'app'))].map((file) => ({
  rel: path.relative(root, file),
  text: readFileSync(file, 'utf8'),
}));

/** One way to do each of these jobs: a second copy, written by hand, is the start of two that drift. */
describe('one of each, on the screens', () => {
  it('finds the screens', () => {
    expect(screens.length).toBeGreaterThan(50);
  });

  it('says a failed load only through LoadError (or a segment error boundary)', () => {
    const own = screens.filter(
      (f) =>
        /could not be loaded/.test(f.text) &&
        !['components/ui/load-error.tsx', 'components/ui/segment-error.tsx'].includes(f.rel),
    );
    expect(own.map((f) => f.rel)).toEqual([]);
  });

  it('runs every form the browser checks through the one form hook, useForm', () => {
    const clientForms = screens.filter((f) => /^'use client'/m.test(f.text) && /<form\b/.test(f.text));
    expect(clientForms.length).toBeGreaterThan(10);
    const other = clientForms.filter(
      (f) => /\bfieldErrorsOf\b|\.safeParse\(|useState<FieldErrors>/.test(f.text) && !/\buseForm\(/.test(f.text),
    );
    expect(other.map((f) => f.rel)).toEqual([]);
  });
});

describe('one of each, in the route handlers', () => {
  const handlers = screens.filter((f) => f.rel.startsWith('app/api/') && f.rel.endsWith('route.ts'));

  it('finds the handlers that read their address options', () => {
    expect(handlers.filter((f) => /\bparseQuery\(/.test(f.text)).length).toBeGreaterThanOrEqual(7);
  });

  it('reads a query string only through parseQuery, so every option is checked and refused the same way', () => {
    const own = handlers.filter((f) => /searchParams/.test(f.text));
    expect(own.map((f) => f.rel)).toEqual([]);
  });
});
