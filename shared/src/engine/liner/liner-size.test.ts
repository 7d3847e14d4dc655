import { describe, expect, it } from 'vitest';
import { basinProfile } from '../basin/basin-profile';
import { planShape } from '../geometry/plan-shape';
import type { BasinInput } from '../schemas/takeoff-input';
import { basinLinerSize, boxLinerSize, streamLinerSize } from './liner-size';

const linerOf = (basin: BasinInput, overlap = 1) =>
  basinLinerSize(basinProfile(basin, planShape(basin.outline, 128), 0.25), overlap);

describe('liner size', () => {
  it('15 × 10 × 2 ft with 1 ft overlap needs 21 × 16 ft = 336 ft²', () => {
    // Common practice, no source (REFERENCES 3.1): L + 2·D + 2·overlap = 15 + 4 + 2 = 21; 10 + 4 + 2 = 16
    const size = linerOf({
      outline: { shape: 'rectangle', lengthFt: 15, widthFt: 10 },
      maxDepthFt: 2,
      wallStyle: 'vertical',
      shelves: [],
    });
    expect(size.neededLengthFt).toBe(21);
    expect(size.neededWidthFt).toBe(16);
    expect(size.neededLengthFt * size.neededWidthFt).toBe(336);
    expect([size.ruleLengthFt, size.ruleWidthFt]).toEqual([21, 16]);
  });

  it('the overlap is a parameter: 1.5 ft per edge adds 3 ft', () => {
    // REFERENCES 3.1: some sources use 1.5 ft per edge ("+3 ft") → 15 + 4 + 3 = 22
    expect(
      linerOf(
        {
          outline: { shape: 'rectangle', lengthFt: 15, widthFt: 10 },
          maxDepthFt: 2,
          wallStyle: 'vertical',
          shelves: [],
        },
        1.5,
      ).neededLengthFt,
    ).toBe(22);
  });

  it('with vertical walls, shelves do not change the unfolded length', () => {
    // Unfolding the stepped section: L − 2·(shelf widths) + 2·(wall heights + shelf widths) = L + 2D
    const size = linerOf({
      outline: { shape: 'rectangle', lengthFt: 15, widthFt: 10 },
      maxDepthFt: 2,
      wallStyle: 'vertical',
      shelves: [{ widthIn: 12, depthIn: 10 }],
    });
    expect(size.neededLengthFt).toBeCloseTo(21, 9);
  });

  it('battered walls need less than the rule', () => {
    // b = 0.25: needed = L + 2·D·(√(1 + b²) − b) + 2 = 15 + 4 × (1.030776 − 0.25) + 2 = 20.123106 ft (hand)
    const size = linerOf({
      outline: { shape: 'rectangle', lengthFt: 15, widthFt: 10 },
      maxDepthFt: 2,
      wallStyle: 'battered',
      shelves: [],
    });
    expect(size.neededLengthFt).toBeCloseTo(20.123106, 6);
    expect(size.ruleLengthFt).toBe(21);
  });

  it('a 9 ft stream, 4 ft wide with 2.5 ft of drop needs 19 × 14 ft', () => {
    // Trade rule, common practice, no source (REFERENCES 3.6): 9 + 5 + 5 = 19; 4 + 5 + 5 = 14
    expect(streamLinerSize({ lengthFt: 9, widthFt: 4, dropFt: 2.5 }, 5)).toEqual({
      neededLengthFt: 19,
      neededWidthFt: 14,
    });
  });

  it('a pond-free basin of 6 × 4 × 2 ft needs 12 × 10 ft', () => {
    // Same rule as 3.1 (common practice): 6 + 4 + 2 = 12; 4 + 4 + 2 = 10
    expect(boxLinerSize({ lengthFt: 6, widthFt: 4, depthFt: 2 }, 1)).toEqual({
      neededLengthFt: 12,
      neededWidthFt: 10,
    });
  });
});
