import { describe, expect, it } from 'vitest';
import { insetConvexPolygon, isConvex } from './convex-inset';
import { insetPolygon } from './polygon-inset';

const square = (side: number) => [
  { xFt: 0, yFt: 0 },
  { xFt: side, yFt: 0 },
  { xFt: side, yFt: side },
  { xFt: 0, yFt: side },
];

describe('isConvex', () => {
  it('tells a rectangle from an L-shape', () => {
    expect(isConvex(square(4))).toBe(true);
    expect(isConvex([...square(4)].reverse())).toBe(true);
    const lShape = [
      { xFt: 0, yFt: 0 },
      { xFt: 6, yFt: 0 },
      { xFt: 6, yFt: 2 },
      { xFt: 2, yFt: 2 },
      { xFt: 2, yFt: 6 },
      { xFt: 0, yFt: 6 },
    ];
    expect(isConvex(lShape)).toBe(false);
  });
});

describe('insetConvexPolygon', () => {
  it('insets a 10 ft square by 1 ft to an 8 ft square', () => {
    // Worked by hand: (10 − 2·1)² = 64 ft², perimeter 4 × 8 = 32 ft.
    const inset = insetConvexPolygon(square(10), 1);
    expect(inset.areaSqFt).toBeCloseTo(64, 9);
    expect(inset.perimeterFt).toBeCloseTo(32, 9);
  });

  it('insets a 3-4-5 right triangle by its inradius to nothing, and by half of it to a similar triangle', () => {
    // Inradius r = (a + b − c) / 2 = (3 + 4 − 5) / 2 = 1 ft. Insetting a triangle by t shrinks it about
    // its incentre by the factor (r − t) / r, so t = 0.5 ft gives area 6 × 0.25 = 1.5 ft², perimeter 6 ft.
    const triangle = [
      { xFt: 0, yFt: 0 },
      { xFt: 4, yFt: 0 },
      { xFt: 0, yFt: 3 },
    ];
    const half = insetConvexPolygon(triangle, 0.5);
    expect(half.areaSqFt).toBeCloseTo(1.5, 9);
    expect(half.perimeterFt).toBeCloseTo(6, 9);
    expect(insetConvexPolygon(triangle, 1.0001)).toEqual({
      areaSqFt: 0,
      perimeterFt: 0,
      pieces: 0,
    });
  });

  it('agrees with the general polygon offset (clipper-lib) on a convex 64-gon', () => {
    const polygon = Array.from({ length: 64 }, (_, i) => ({
      xFt: 9 * Math.cos((2 * Math.PI * i) / 64),
      yFt: 5 * Math.sin((2 * Math.PI * i) / 64),
    }));
    for (const inset of [0.5, 1.5, 3]) {
      const exact = insetConvexPolygon(polygon, inset);
      const general = insetPolygon(polygon, inset);
      // clipper-lib rounds every vertex to a 0.01 ft integer grid; on this outline's ~0.7 ft edges that
      // moves the area by up to about perimeter × 0.005 ft ≈ 0.2 %, so agreement is asked to 0.5 %.
      expect(Math.abs(exact.areaSqFt - general.areaSqFt) / general.areaSqFt).toBeLessThan(5e-3);
      expect(Math.abs(exact.perimeterFt - general.perimeterFt) / general.perimeterFt).toBeLessThan(
        5e-3,
      );
    }
  });
});
