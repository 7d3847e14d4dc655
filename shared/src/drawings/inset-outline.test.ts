import { describe, expect, it } from 'vitest';
import { insetConvexPolygon } from '../engine/geometry/convex-inset';
import { signedAreaSqFt } from '../engine/geometry/polygon';
import { insetConvexPoints } from '../engine/geometry/convex-inset';
import { centroidOf, insetOutline } from './inset-outline';
import { outlinePoints } from './outline-points';

const rectangle = outlinePoints({ shape: 'rectangle', lengthFt: 15, widthFt: 10 });

describe('insetConvexPoints', () => {
  it('moves every side of a 15 × 10 ft rectangle 1 ft inward', () => {
    const inset = insetConvexPoints(rectangle, 1);
    const xs = inset.map((p) => p.xFt).sort((a, b) => a - b);
    const ys = inset.map((p) => p.yFt).sort((a, b) => a - b);
    expect(xs[0]).toBeCloseTo(1, 12);
    expect(xs[xs.length - 1]).toBeCloseTo(14, 12);
    expect(ys[0]).toBeCloseTo(1, 12);
    expect(ys[ys.length - 1]).toBeCloseTo(9, 12);
  });

  it('encloses the same area as the engine reports for an oval', () => {
    const oval = outlinePoints({ shape: 'oval', lengthFt: 12, widthFt: 8 });
    const drawn = Math.abs(signedAreaSqFt(insetConvexPoints(oval, 1.5)));
    expect(drawn).toBeCloseTo(insetConvexPolygon(oval, 1.5).areaSqFt, 9);
  });

  it('leaves nothing past the inradius', () => {
    expect(insetConvexPoints(rectangle, 5)).toEqual([]);
  });
});

describe('insetOutline', () => {
  const notch = [
    { xFt: 0, yFt: 0 },
    { xFt: 10, yFt: 0 },
    { xFt: 10, yFt: 10 },
    { xFt: 5, yFt: 4 },
    { xFt: 0, yFt: 10 },
  ];

  it('is exact for convex outlines', () => {
    expect(insetOutline(rectangle, 1).exact).toBe(true);
  });

  it('scales an outline that bends inward toward its centroid and says it is approximate', () => {
    const { pointsFt, exact } = insetOutline(notch, 1);
    expect(exact).toBe(false);
    const c = centroidOf(notch);
    // The 10 ft bounding width shrinks by 2 ft: every point moves to 80 % of its distance.
    expect(pointsFt[1]!.xFt - c.xFt).toBeCloseTo((10 - c.xFt) * 0.8, 12);
  });
});
