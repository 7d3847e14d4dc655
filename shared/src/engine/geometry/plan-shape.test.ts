import { describe, expect, it } from 'vitest';
import { ellipsePerimeterFt, planShape } from './plan-shape';
import { insetPolygon } from './polygon-inset';

describe('plan shapes', () => {
  it('an oval 12 × 8 ft covers 75.398 ft²', () => {
    // Geometry A = π·(L/2)·(W/2) (REFERENCES 2.2): 12 × 8 → 75.398 ft²
    expect(planShape({ shape: 'oval', lengthFt: 12, widthFt: 8 }, 128).areaAt(0)).toBeCloseTo(
      75.398,
      3,
    );
  });

  it('a 16 × 11 ft ellipse has a 42.78 ft perimeter', () => {
    // Ramanujan's approximation, worked example in REFERENCES 9.7 (derived): P = 42.78 ft
    expect(ellipsePerimeterFt(8, 5.5)).toBeCloseTo(42.78, 2);
    // a circle of radius 5: 2π·5 = 31.4159 (geometry)
    expect(ellipsePerimeterFt(5, 5)).toBeCloseTo(31.4159, 4);
  });

  it('a 16 × 11 rectangle inset 1 ft is 14 × 9', () => {
    // Geometry, REFERENCES 2.4: the deep zone of a 16 × 11 pond with a 1-ft shelf is 14 × 9 = 126 ft²
    const rect = planShape({ shape: 'rectangle', lengthFt: 16, widthFt: 11 }, 128);
    expect(rect.areaAt(1)).toBe(126);
    expect(rect.perimeterAt(1)).toBe(46);
  });

  it('polygon offsetting of a rectangle matches the exact inset', () => {
    // Clipper offset of 16 × 11 by 1 ft: 14 × 9 = 126 ft², perimeter 46 ft (hand geometry)
    const r = insetPolygon(
      [
        { xFt: 0, yFt: 0 },
        { xFt: 16, yFt: 0 },
        { xFt: 16, yFt: 11 },
        { xFt: 0, yFt: 11 },
      ],
      1,
    );
    expect(r.areaSqFt).toBeCloseTo(126, 3);
    expect(r.perimeterFt).toBeCloseTo(46, 3);
    expect(r.pieces).toBe(1);
  });

  it('an oval inset analytically agrees with its polygon within 0.1 %', () => {
    // Steiner: A(t) = πab − P·t + πt² for t ≤ b²/a = 3.78 ft. 16 × 11 oval at t = 1, by hand:
    // πab = 138.2301; Ramanujan P: h = (2.5/13.5)² = 0.034294, P = 13.5π(1 + 3h/(10 + √(4 − 3h)))
    // = 42.4115 × 1.008592 = 42.7759; A = 138.2301 − 42.7759 + 3.1416 = 98.5958 ft²
    const oval = planShape({ shape: 'oval', lengthFt: 16, widthFt: 11 }, 128);
    expect(oval.areaAt(1)).toBeCloseTo(98.596, 3);
    const pts = Array.from({ length: 720 }, (_, i) => ({
      xFt: 8 * Math.cos((i * Math.PI) / 360),
      yFt: 5.5 * Math.sin((i * Math.PI) / 360),
    }));
    expect(Math.abs(insetPolygon(pts, 1).areaSqFt / oval.areaAt(1) - 1)).toBeLessThan(1e-3);
  });

  it('a concave outline can split in two when inset', () => {
    // A dumbbell: two 10 × 10 squares joined by a 2-ft-wide neck; inset 1.5 ft removes the neck.
    const dumbbell = [
      { xFt: 0, yFt: 0 },
      { xFt: 10, yFt: 0 },
      { xFt: 10, yFt: 4 },
      { xFt: 14, yFt: 4 },
      { xFt: 14, yFt: 0 },
      { xFt: 24, yFt: 0 },
      { xFt: 24, yFt: 10 },
      { xFt: 14, yFt: 10 },
      { xFt: 14, yFt: 6 },
      { xFt: 10, yFt: 6 },
      { xFt: 10, yFt: 10 },
      { xFt: 0, yFt: 10 },
    ];
    const r = insetPolygon(dumbbell, 1.5);
    expect(r.pieces).toBe(2);
    // By hand: each square keeps 7 × 7 = 49 ft², plus a sliver where the neck opens: the two reflex
    // corners are rounded with r = 1.5, adding 2 × (1.5 − ∫₀¹ √(2.25 − d²) dd) = 2 × (1.5 − 1.3800)
    // = 0.240 ft² per square → 2 × 49.24 = 98.48 ft². Clipper draws arcs to 0.005 ft.
    expect(r.areaSqFt).toBeGreaterThan(98.44);
    expect(r.areaSqFt).toBeLessThan(98.52);
  });

  it('a shape inset past its half-width vanishes', () => {
    expect(planShape({ shape: 'rectangle', lengthFt: 10, widthFt: 4 }, 128).areaAt(2)).toBe(0);
    expect(planShape({ shape: 'oval', lengthFt: 10, widthFt: 4 }, 128).areaAt(2)).toBe(0);
  });
});
