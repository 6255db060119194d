import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

const root = path.resolve(__dirname, '../..');

function pageFolders(dir: string): string[] {
  const found: string[] = [];
  for (const entry of readdirSync(dir)) {
    const full = path.join(dir, entry);
    if (statSync(full).isDirectory()) found.push(...pageFolders(full));
  }
  if (existsSync(path.join(dir, 'page.tsx'))) found.push(dir);
  return found;
}

/** Each data segment answers its own load failure with a retry, not the whole app shell. */
function hasOwnErrorBoundary(dir: string): boolean {
  return existsSync(path.join(dir, 'error.tsx'));
}

describe('the framework conventions every signed-in page follows', () => {
  const appPages = pageFolders(path.join(root, 'app/(app)'));

  it('finds the signed-in pages', () => {
    expect(appPages.length).toBeGreaterThan(5);
  });

  it.each(appPages.map((dir) => [path.relative(root, dir)]))('%s has its own error boundary with a retry', (rel) => {
    const dir = path.join(root, rel);
    expect(hasOwnErrorBoundary(dir)).toBe(true);
    const source = readFileSync(path.join(dir, 'error.tsx'), 'utf8');
    expect(source).toMatch(/reset/);
  });

  // A widget that reads its own data (react-query, the comment threads, the route's photos) sits in a
  // <Suspense> whose fallback is a skeleton of its shape, as the projects table does.
  const SELF_FETCHING = /\buse(Query|Queries|SuspenseQuery|CommentThreads|RoutePhotos)\(/;
  const widgetsOf = (page: string) =>
    [...readFileSync(page, 'utf8').matchAll(/import \{ ([\w, ]+) \} from '@\/components\/([\w/-]+)'/g)].flatMap(
      ([, names, file]) => {
        const source = path.join(root, 'components', `${file}.tsx`);
        if (!existsSync(source) || !SELF_FETCHING.test(readFileSync(source, 'utf8'))) return [];
        return names
          .split(',')
          .map((n) => n.trim())
          .filter(
            (n) =>
              /^[A-Z]/.test(n) &&
              !n.endsWith('Skeleton') &&
              new RegExp(`export function ${n}\\b`).test(readFileSync(source, 'utf8')),
          );
      },
    );
  const rendered = appPages.flatMap((dir) =>
    widgetsOf(path.join(dir, 'page.tsx')).map((name) => [path.relative(root, dir), name]),
  );

  it('finds the self-fetching widgets the pages render', () => {
    expect(rendered.map(([, name]) => name)).toEqual(
      expect.arrayContaining([
        'ProjectsTable',
        'RouteEditor',
        'RoutePhotos',
        'LineEditor',
        'NetworkWorkspace',
        'LiftWorkspace',
        'MembersTable',
      ]),
    );
  });

  it.each(rendered)('%s wraps %s in <Suspense> with a skeleton of its shape', (rel, name) => {
    const page = readFileSync(path.join(root, rel, 'page.tsx'), 'utf8');
    expect(page).toMatch(new RegExp(`<Suspense fallback=\\{<\\w+Skeleton />\\}>\\s*<${name}\\b`));
  });

  it('serves a web app manifest whose icon exists in public/', () => {
    const manifest = JSON.parse(readFileSync(path.join(root, 'public/manifest.webmanifest'), 'utf8'));
    expect(manifest.name).toBe('Runnel');
    expect(manifest.icons.length).toBeGreaterThan(0);
    for (const icon of manifest.icons) expect(existsSync(path.join(root, 'public', icon.src))).toBe(true);
  });

  it('tells crawlers to stay out of private team designs', () => {
    expect(readFileSync(path.join(root, 'public/robots.txt'), 'utf8')).toMatch(/Disallow: \/\s*$/m);
  });
});
