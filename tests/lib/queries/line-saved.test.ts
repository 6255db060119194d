import { QueryClient } from '@tanstack/react-query';
import { describe, expect, it } from 'vitest';
import type { LineRecord } from '@/lib/data/lines';
import { afterLineSaved, lineKeys } from '@/lib/queries/lines';
import { networkKeys } from '@/lib/queries/network';

describe('after a line is saved (autosave)', () => {
  it("marks the line's network flows, the line list and the network view stale, and keeps the saved line", async () => {
    const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    const line = { id: 'line-1', projectId: 'project-1', revision: 4 } as unknown as LineRecord;
    const cached = [
      lineKeys.siteContext('line-1'),
      lineKeys.project('project-1'),
      networkKeys.view('project-1'),
      lineKeys.stations('line-1'),
    ];
    for (const key of cached) client.setQueryData(key, { cached: true });
    await afterLineSaved(client, line);
    expect(client.getQueryState(lineKeys.siteContext('line-1'))?.isInvalidated).toBe(true);
    expect(client.getQueryState(lineKeys.project('project-1'))?.isInvalidated).toBe(true);
    expect(client.getQueryState(networkKeys.view('project-1'))?.isInvalidated).toBe(true);
    // The route's stations do not change with a save.
    expect(client.getQueryState(lineKeys.stations('line-1'))?.isInvalidated).toBe(false);
    expect(client.getQueryData(lineKeys.one('line-1'))).toBe(line);
  });
});
