import fc from 'fast-check';
import type { NetworkInput, NetworkLink, NetworkNode } from '../../../hydraulics/index';

/** A random connected network: a random tree plus extra links that close loops, one or two sources. */
export interface RandomNetwork {
  input: NetworkInput;
  /** Indices (into `input.links`) of the links added on top of the tree, each closing one loop. */
  loopLinks: number[];
}

export const randomNetwork = (maxNodes = 30): fc.Arbitrary<RandomNetwork> =>
  fc
    .record({
      size: fc.integer({ min: 3, max: maxNodes }),
      seed: fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: maxNodes * 8, maxLength: maxNodes * 8 }),
      extra: fc.integer({ min: 0, max: 8 }),
      twoSources: fc.boolean(),
    })
    .map(({ size, seed, extra, twoSources }) => {
      let cursor = 0;
      // Values in [0, 1): a seed value of exactly 1 would index one past the end.
      const next = (): number => Math.min(seed[cursor++ % seed.length], 0.999999);
      const nodes: NetworkNode[] = [{ id: 'n0', kind: 'source', elevationM: 200, waterLevelM: 200 }];
      for (let i = 1; i < size; i++) {
        const isSource = twoSources && i === size - 1;
        nodes.push(
          isSource
            ? { id: `n${i}`, kind: 'tank', elevationM: 150 + 40 * next(), waterLevelM: 195 }
            : {
                id: `n${i}`,
                kind: 'junction',
                elevationM: 50 + 100 * next(),
                demandM3s: next() < 0.3 ? 0 : 0.002 * next(),
              },
        );
      }
      const pipe = (): NetworkLink['pipe'] => ({
        id: 'p',
        insideDiameterM: 0.025 + 0.2 * next(),
        hazenWilliamsC: 100 + 50 * next(),
      });
      const links: NetworkLink[] = [];
      for (let i = 1; i < size; i++) {
        const parent = Math.floor(next() * i);
        const forward = next() < 0.7;
        links.push({
          id: `t${i}`,
          from: forward ? `n${parent}` : `n${i}`,
          to: forward ? `n${i}` : `n${parent}`,
          lengthM: 10 + 990 * next(),
          pipe: pipe(),
        });
      }
      const loopLinks: number[] = [];
      for (let e = 0; e < extra; e++) {
        const a = Math.floor(next() * size);
        const b = Math.floor(next() * size);
        if (a === b) continue;
        loopLinks.push(links.length);
        links.push({
          id: `x${e}`,
          from: `n${a}`,
          to: `n${b}`,
          lengthM: 10 + 990 * next(),
          pipe: pipe(),
          minorK: 5 * next(),
        });
      }
      return { input: { nodes, links, settings: { frictionMethod: 'hazen-williams' } }, loopLinks };
    });
