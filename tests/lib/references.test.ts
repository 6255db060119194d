import { execFileSync } from 'node:child_process';
import { existsSync, readFileSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

/**
 * Every source the code and tests cite lives in docs/references/ (see its README): these checks
 * keep it that way as files and keys are added.
 */

const ROOT = path.resolve(__dirname, '../..');
const REFERENCES_DIR = path.join(ROOT, 'docs/references');
const TEXT_FILE = /\.(ts|tsx|mts|cts|js|mjs|cjs|md|json|css|sh|yml|yaml|sql|txt|csv|gpx|example)$/;

function trackedTextFiles(): string[] {
  const listed = execFileSync('git', ['ls-files', '-z'], { cwd: ROOT, encoding: 'utf8' }).split('\0');
  return listed.filter(
    (file) => file && TEXT_FILE.test(file) && file !== 'package-lock.json' && existsSync(path.join(ROOT, file)),
  );
}

const referenceFiles = readdirSync(REFERENCES_DIR).filter((name) => name.endsWith('.md'));
const referenceText = new Map(
  referenceFiles.map((name) => [name, readFileSync(path.join(REFERENCES_DIR, name), 'utf8')]),
);

function definedKeys(): Map<string, string[]> {
  const keys = new Map<string, string[]>();
  for (const [name, text] of referenceText) {
    for (const match of text.matchAll(/^- \*\*\[(R\d+)\]\*\*/gm))
      keys.set(match[1], [...(keys.get(match[1]) ?? []), name]);
  }
  return keys;
}

function sectionAnchors(text: string): Set<string> {
  return new Set([...text.matchAll(/^#{2,4} (\d+(?:\.\d+)*)\.?\s/gm)].map((match) => match[1]));
}

interface Finding {
  file: string;
  line: number;
  text: string;
}

function findAll(pattern: RegExp, accept: (match: RegExpMatchArray) => boolean): Finding[] {
  const findings: Finding[] = [];
  for (const file of trackedTextFiles()) {
    const lines = readFileSync(path.join(ROOT, file), 'utf8').split('\n');
    lines.forEach((content, index) => {
      for (const match of content.matchAll(pattern)) {
        if (!accept(match)) findings.push({ file, line: index + 1, text: match[0] });
      }
    });
  }
  return findings;
}

describe('sources live in the repository (docs/references)', () => {
  it('has the index and the core area file, and the index lists every area file', () => {
    expect(referenceFiles).toContain('README.md');
    expect(referenceFiles).toContain('core.md');
    const index = referenceText.get('README.md') ?? '';
    for (const name of referenceFiles.filter((file) => file !== 'README.md')) expect(index).toContain(`(${name})`);
  });

  it('defines each source key once', () => {
    const duplicated = [...definedKeys()].filter(([, files]) => files.length > 1);
    expect(duplicated).toEqual([]);
  });

  it('no tracked file points to a reference document outside the repository', () => {
    // Built from parts so this file does not match itself.
    const outside = new RegExp(
      ['REFERENCES\\.md', 'REFERENCES' + ' §', '\\.\\./shared/', '/work/' + 'shared'].join('|'),
      'g',
    );
    expect(findAll(outside, () => false)).toEqual([]);
  });

  it('every cited key [Rn] is defined in docs/references', () => {
    const keys = definedKeys();
    expect(keys.size).toBeGreaterThan(25);
    expect(findAll(/\[(R\d+)\]/g, (match) => keys.has(match[1]))).toEqual([]);
  });

  it('every cited docs/references file and section exists', () => {
    const anchors = new Map([...referenceText].map(([name, text]) => [name, sectionAnchors(text)]));
    const names = referenceFiles.map((name) => name.replace('.', '\\.')).join('|');
    const sectionCite = new RegExp(`\\b(${names}) §(\\d+(?:\\.\\d+)*)`, 'g');
    expect(findAll(sectionCite, (match) => anchors.get(match[1])?.has(match[2]) ?? false)).toEqual([]);
    const fileCite = /docs\/references\/([\w-]+\.md)/g;
    expect(findAll(fileCite, (match) => referenceText.has(match[1]))).toEqual([]);
  });

  it('fails on a made-up key, section or file (the checks can fail)', () => {
    const keys = definedKeys();
    expect(keys.has('R999')).toBe(false);
    expect(sectionAnchors(referenceText.get('core.md') ?? '').has('99.9')).toBe(false);
    expect(sectionAnchors('### 4.4 Drive velocity\n').has('4.4')).toBe(true);
  });
});
