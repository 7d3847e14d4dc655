import { describe, expect, it } from 'vitest';
import { depthExaggeration, projectDrawing } from './projection';

const bounds = { minXFt: 2, minYFt: -3, maxXFt: 12, maxYFt: 0 };

describe('projectDrawing', () => {
  it('puts the top-left corner at the origin, y down for plans and up for elevations', () => {
    const plan = projectDrawing(bounds, { perFt: 10, originX: 5, originY: 7, yUp: false });
    expect(plan.at({ xFt: 2, yFt: -3 })).toEqual({ x: 5, y: 7 });
    expect(plan.at({ xFt: 12, yFt: 0 })).toEqual({ x: 105, y: 37 });
    const section = projectDrawing(bounds, {
      perFt: 10,
      originX: 0,
      originY: 0,
      yUp: true,
      verticalScale: 2,
    });
    // The water surface (y = 0) is the top edge; 3 ft down is 3 × 10 × 2 units below it.
    expect(section.at({ xFt: 2, yFt: 0 })).toEqual({ x: 0, y: 0 });
    expect(section.at({ xFt: 2, yFt: -3 })).toEqual({ x: 0, y: 60 });
    expect(section.perFtY).toBe(20);
  });
});

describe('depthExaggeration', () => {
  it('stretches shallow sections towards half as tall as wide, in ½ steps, at most 3×', () => {
    // 10 ft wide, 3 ft deep: 0.5 × 10 / 3 = 1.67 → 1.5.
    expect(depthExaggeration(bounds)).toBe(1.5);
    // 40 ft wide, 2 ft deep: 10 → capped at 3.
    expect(depthExaggeration({ minXFt: 0, minYFt: -2, maxXFt: 40, maxYFt: 0 })).toBe(3);
    // Deeper than half the width: never squashed below 1.
    expect(depthExaggeration({ minXFt: 0, minYFt: -6, maxXFt: 8, maxYFt: 0 })).toBe(1);
  });
});
