import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { numberFrom, numberOrNull } from '@/components/lift/typed-number';
import { currentDecimalMark, setProjectDecimalMark, typedNumber } from '@/lib/units/decimal-mark-store';

afterEach(() => setProjectDecimalMark(null));

describe('every number box reads with the project decimal mark', () => {
  it('lift forms: "1,5" is 1.5 in a comma project and refused (NaN, the schema names the field) in a point project, never 15', () => {
    setProjectDecimalMark(',');
    expect(numberFrom('1,5')).toBe(1.5);
    expect(numberOrNull('2.500,75')).toBe(2500.75);
    setProjectDecimalMark('.');
    expect(numberFrom('1,5')).toBeNaN();
    expect(numberFrom('1,500')).toBe(1500);
    expect(numberOrNull('  ')).toBeNull();
  });

  it('without a project setting the browser language decides (Node here: no navigator, so a point)', () => {
    expect(currentDecimalMark()).toBe('.');
    expect(typedNumber('3.25')).toBe(3.25);
  });

  it('no component or helper reads typed numbers its own way (one parser: lib/units/typed-number.ts)', () => {
    const root = path.resolve(__dirname, '../../..');
    const files = execFileSync('git', ['ls-files', 'components', 'app', 'lib'], { cwd: root, encoding: 'utf8' })
      .split('\n')
      .filter((file) => /\.tsx?$/.test(file));
    // Survey files have their own per-file decimal-comma dialect (lib/survey); display formatting strips grouping
    // commas.
    const allowed = new Set(['lib/units/typed-number.ts', 'lib/survey/cells.ts', 'lib/units/number.ts']);
    const adHoc = files.filter(
      (file) =>
        !allowed.has(file) && /replace\((',', '\.'|\/,\/g, '')\)/.test(readFileSync(path.join(root, file), 'utf8')),
    );
    expect(adHoc).toEqual([]);
  });
});
