import { describe, expect, it } from 'vitest';
import { FRICTION_WORDS } from '@/lib/lines/answers';
import { networkFrictionWords } from '@/lib/network/friction-words';

describe('which friction law a network run used', () => {
  it("reads as a line's page does for the default law", () => {
    expect(networkFrictionWords({ method: 'darcy-weisbach', freeSurfaceLosses: true })).toBe(
      FRICTION_WORDS['darcy-weisbach'],
    );
  });
  it('names Hazen-Williams and says when no entrance loss was taken', () => {
    const words = networkFrictionWords({ method: 'hazen-williams', freeSurfaceLosses: false });
    expect(words).toMatch(/^Friction by Hazen-Williams/);
    expect(words).toMatch(/no entrance loss at free surfaces\.$/);
  });
  it('says so when an old run did not record it', () => {
    expect(networkFrictionWords(undefined)).toMatch(/not recorded/);
  });
});
