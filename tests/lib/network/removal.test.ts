import { describe, expect, it } from 'vitest';
import { nodeRemoval } from '@/lib/network/removal';
import type { NetworkView } from '@/lib/network/view';

const node = (id: string, name: string) => ({ id, name });
const link = (id: string, name: string, kind: string, fromNodeId: string, toNodeId: string) => ({
  id,
  name,
  kind,
  fromNodeId,
  toNodeId,
});
const view = {
  records: {
    nodes: [node('s', 'Spring'), node('t', 'Tee'), node('a', 'Trough'), node('b', 'Tap')],
    links: [
      link('l', 'Spring line', 'line', 's', 'b'),
      link('p1', 'Orchard branch', 'pipe', 't', 'a'),
      link('v', 'Trough valve', 'valve', 'a', 'b'),
    ],
    demandUseTies: [{ demandUseId: 'u1', outletNodeId: 'a' }],
  },
  demandUses: [
    { id: 'u1', label: '12 cow-calf pairs' },
    { id: 'u2', label: 'Household of 4' },
  ],
} as unknown as Pick<NetworkView, 'records' | 'demandUses'>;

describe('what removing a part takes with it', () => {
  it('names every join ending at the part and the uses left untied', () => {
    expect(nodeRemoval(view, 'a')).toEqual({
      name: 'Trough',
      joins: ['Orchard branch', 'Trough valve'],
      untiedUses: ['12 cow-calf pairs'],
      lineEnd: null,
    });
  });
  it('a part with no joins takes nothing with it', () => {
    expect(nodeRemoval({ ...view, records: { ...view.records, links: [] } }, 't')).toEqual({
      name: 'Tee',
      joins: [],
      untiedUses: [],
      lineEnd: null,
    });
  });
  it("says when the part ends a line (the line's link is not one of its joins)", () => {
    expect(nodeRemoval(view, 'b')).toEqual({
      name: 'Tap',
      joins: ['Trough valve'],
      untiedUses: [],
      lineEnd: 'Spring line',
    });
  });
});
