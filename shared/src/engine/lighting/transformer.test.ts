import { describe, expect, it } from 'vitest';
import { chooseTransformer } from './transformer';

const SIZES = [150, 300, 600, 900, 1200];

describe('transformer size', () => {
  it('a 300 W transformer carries at most 240 W (12 × 20 W fixtures)', () => {
    // Common practice, no source (REFERENCES 7.3): load ≤ 80 % of rating
    expect(chooseTransformer(240, SIZES, 0.8)).toEqual({
      sizeWatts: 300,
      count: 1,
      loadPercent: 80,
    });
    expect(chooseTransformer(241, SIZES, 0.8).sizeWatts).toBe(600);
  });

  it('splits a load too big for the largest over several', () => {
    // Hand: 2000 W / (1200 × 0.8 = 960 W) = 2.08 → 3 × 1200 W, loaded 2000 / 3600 = 55.6 %
    const t = chooseTransformer(2000, SIZES, 0.8);
    expect(t.count).toBe(3);
    expect(t.sizeWatts).toBe(1200);
    expect(t.loadPercent).toBeCloseTo(55.56, 2);
  });
});
