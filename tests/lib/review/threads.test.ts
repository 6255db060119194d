import { describe, expect, it } from 'vitest';
import { buildNetworkScene } from '../../../lib/chart/network-scene';
import { svgToString } from '../../../lib/chart/svg-node';
import { layoutNetwork } from '../../../lib/network/layout';
import type { NetworkView } from '../../../lib/network/view';
import type { CommentAnchor } from '../../../lib/review/anchors';
import type { CommentRecord } from '../../../lib/review/comment-types';
import { commentPlaceHref } from '../../../lib/review/comment-place';
import { networkPinsOf, pinChainage, pinsOf, routePinChainage, threadsOf } from '../../../lib/review/threads';
import { NetworkLinkSchema, NetworkNodeSchema } from '../../../lib/validations/network';
import { outletNodeBody, pipeLinkBody, sourceNodeBody } from '../../support/network-fixtures';
import { findAll, parseSvg } from '../chart/svg-tree';

const LINE = '00000000-0000-4000-8000-00000000a001';
const OTHER_LINE = '00000000-0000-4000-8000-00000000a002';
const ROUTE = '00000000-0000-4000-8000-00000000b001';
const SOURCE = '00000000-0000-4000-8000-00000000c001';
const OUTLET = '00000000-0000-4000-8000-00000000c002';
const PIPE = '00000000-0000-4000-8000-00000000c003';

let n = 0;
function comment(anchor: CommentAnchor, extra: Partial<CommentRecord> = {}): CommentRecord {
  n += 1;
  return {
    id: `c${n}`,
    projectId: 'p',
    revisionId: null,
    revisionNumber: null,
    parentId: null,
    author: { id: 'u', name: 'Dara Okafor' },
    body: `comment ${n}`,
    anchor,
    anchorNow: { state: 'present', words: '' },
    mentions: [],
    resolved: false,
    resolvedBy: null,
    resolvedAt: null,
    createdAt: `2026-12-02T10:0${n}:00.000Z`,
    ...extra,
  };
}

const onLine = comment({ kind: 'line-chainage', lineId: LINE, chainageM: 420 });
const onOtherLine = comment({ kind: 'line-chainage', lineId: OTHER_LINE, chainageM: 10 });
const onWarning = comment({ kind: 'warning', lineId: LINE, code: 'siphon', chainageM: 650 }, { resolved: true });
const onProject = comment({ kind: 'project' });
const onRoute = comment({ kind: 'route-chainage', routeId: ROUTE, chainageM: 35 });
const onOutlet = comment({ kind: 'network', part: 'node', partId: OUTLET });
const onPipe = comment({ kind: 'network', part: 'link', partId: PIPE });
const reply = comment({ kind: 'project' }, { parentId: onLine.id });
const onRevision = comment(
  { kind: 'line-chainage', lineId: LINE, chainageM: 5 },
  { revisionId: 'r1', revisionNumber: 1 },
);
const all = [onLine, onOtherLine, onWarning, onProject, onRoute, onOutlet, onPipe, reply, onRevision];

describe('comment threads by where they are pinned', () => {
  it("a line page lists only that line's threads of the working copy, numbered in order, replies under their thread", () => {
    const threads = threadsOf(all, null, [{ kind: 'line', lineId: LINE }]);
    expect(threads.map((t) => [t.thread.id, t.pin])).toEqual([
      [onLine.id, '1'],
      [onWarning.id, '2'],
    ]);
    expect(threads[0].replies.map((r) => r.id)).toEqual([reply.id]);
    const pins = pinsOf(threads, (c) => pinChainage(c, LINE), onWarning.id);
    expect(pins).toEqual([
      { id: onLine.id, chainageM: 420, label: '1', resolved: false, selected: false },
      { id: onWarning.id, chainageM: 650, label: '2', resolved: true, selected: true },
    ]);
    // With the project asked for too, project-wide threads are listed, without a pin number.
    const withProject = threadsOf(all, null, [{ kind: 'line', lineId: LINE }, { kind: 'project' }]);
    expect(withProject.map((t) => [t.thread.id, t.pin])).toEqual([
      [onLine.id, '1'],
      [onWarning.id, '2'],
      [onProject.id, null],
    ]);
  });

  it('a revision page lists every thread of that revision but numbers only those pinned on the line shown', () => {
    const threads = threadsOf(all, 'r1', [{ kind: 'line', lineId: LINE }], true);
    expect(threads.map((t) => [t.thread.id, t.pin])).toEqual([[onRevision.id, '1']]);
    const working = threadsOf(all, null, [{ kind: 'line', lineId: LINE }], true);
    expect(working.map((t) => t.pin)).toEqual(['1', null, '2', null, null, null, null]);
  });

  it('a route page pins route comments; the network page pins node and link comments', () => {
    const route = threadsOf(all, null, [{ kind: 'route', routeId: ROUTE }]);
    expect(pinsOf(route, (c) => routePinChainage(c, ROUTE), null)).toEqual([
      { id: onRoute.id, chainageM: 35, label: '1', resolved: false, selected: false },
    ]);
    const network = threadsOf(all, null, [{ kind: 'network' }]);
    expect(networkPinsOf(network, onPipe.id)).toEqual([
      { id: onOutlet.id, part: 'node', partId: OUTLET, label: '1', resolved: false, selected: false },
      { id: onPipe.id, part: 'link', partId: PIPE, label: '2', resolved: false, selected: true },
    ]);
  });
});

describe('comment pins on the network schematic', () => {
  // Two placed nodes 300 m apart east-west and a straight pipe between them.
  const view = {
    projectId: 'p',
    unitSystem: 'metric',
    lines: [],
    tanks: [],
    ramSites: [],
    waterSources: [],
    demandUses: [],
    runs: { solve: null, day: null, size: null },
    records: {
      projectId: 'p',
      nodes: [
        { id: SOURCE, ...NetworkNodeSchema.parse({ ...sourceNodeBody(), eastM: 0, northM: 0 }) },
        { id: OUTLET, ...NetworkNodeSchema.parse({ ...outletNodeBody(), eastM: 300, northM: 0 }) },
      ],
      links: [{ id: PIPE, ...NetworkLinkSchema.parse(pipeLinkBody(SOURCE, OUTLET)) }],
      demandUseTies: [],
    },
  } as NetworkView;
  const layout = layoutNetwork(view);

  it('stands a node pin above its node and a link pin on its link, and draws none without comments', () => {
    const pins = networkPinsOf(threadsOf(all, null, [{ kind: 'network' }]), null);
    const svg = parseSvg(
      svgToString(buildNetworkScene({ view, layout, solve: null, units: 'metric', width: 960, height: 540, pins })),
    );
    const layer = findAll(svg, (e) => e.attrs['data-layer'] === 'comment-pins');
    expect(layer).toHaveLength(1);
    const marks = findAll(layer[0], (e) => e.attrs['data-comment-id'] !== undefined);
    expect(marks.map((m) => [m.attrs['data-comment-id'], m.attrs['data-part-id']])).toEqual([
      [onOutlet.id, OUTLET],
      [onPipe.id, PIPE],
    ]);
    // The outlet sits at the right-hand end, the pipe's pin halfway: the node pin is further east.
    const nodeShape = findAll(svg, (e) => e.attrs['data-node-id'] === OUTLET)[0];
    const outletX = Number(findAll(nodeShape, (e) => e.tag === 'circle').at(-1)!.attrs.cx);
    const tipX = (mark: (typeof marks)[number]) =>
      Number(/^M([\d.]+),/.exec(findAll(mark, (e) => e.tag === 'path')[0].attrs.d)![1]);
    expect(tipX(marks[0])).toBeCloseTo(outletX, 1);
    expect(tipX(marks[1])).toBeLessThan(outletX - 100);
    const bare = svgToString(
      buildNetworkScene({ view, layout, solve: null, units: 'metric', width: 960, height: 540 }),
    );
    expect(bare).not.toContain('comment-pins');
  });
});

describe('where the list of all comments sends you', () => {
  it('links a thread to the page its pin is on, with the thread picked; none for the whole project or a gone anchor', () => {
    expect(commentPlaceHref('p', onWarning)).toBe(`/projects/p/lines/${LINE}?comment=${onWarning.id}`);
    expect(commentPlaceHref('p', onRoute)).toBe(`/projects/p/routes/${ROUTE}?comment=${onRoute.id}`);
    expect(commentPlaceHref('p', onPipe)).toBe(`/projects/p/network?comment=${onPipe.id}`);
    expect(commentPlaceHref('p', onProject)).toBeNull();
    expect(
      commentPlaceHref('p', {
        ...onLine,
        anchorNow: { state: 'gone', words: 'the line is no longer in the working copy' },
      }),
    ).toBeNull();
  });
});
