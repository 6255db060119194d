import { describe, expect, it } from 'vitest';
import {
  DEFAULT_PROJECT_TABLE,
  projectTableParams,
  projectTableStateFromParams,
  sortedBy,
} from '../../lib/projects-table';

const read = (query: string) => projectTableStateFromParams(new URLSearchParams(query));

describe('projects table state in the address', () => {
  it('reads the default from an empty address and writes nothing for it', () => {
    expect(read('')).toEqual(DEFAULT_PROJECT_TABLE);
    expect(projectTableParams(DEFAULT_PROJECT_TABLE)).toBe('');
  });

  it('round-trips search, order and the archive choice', () => {
    const state = { search: 'Tarn Rigg & sons', sort: 'name' as const, descending: true, showArchived: true };
    const query = projectTableParams(state);
    expect(query).toContain('sort=name');
    expect(query).toContain('dir=desc');
    expect(query).toContain('archived=1');
    expect(read(query)).toEqual(state);
  });

  it('names only what differs from a column’s natural order', () => {
    // Names sort A to Z unless asked otherwise: no dir in the address.
    expect(projectTableParams(sortedBy(DEFAULT_PROJECT_TABLE, 'name'))).toBe('sort=name');
    // The date column clicked again turns to oldest first.
    expect(projectTableParams(sortedBy(DEFAULT_PROJECT_TABLE, 'updatedAt'))).toBe('dir=asc');
  });

  it('falls back to the default for anything a hand-edited address gets wrong', () => {
    expect(read('sort=drop%20table&dir=sideways&archived=yes')).toEqual(DEFAULT_PROJECT_TABLE);
    expect(read(`q=${'x'.repeat(500)}`).search).toBe('');
  });
});
