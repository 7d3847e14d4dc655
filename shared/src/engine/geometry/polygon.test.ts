import { describe, expect, it } from 'vitest';
import {
  convexHull,
  findSelfIntersection,
  minimumBoundingRectangle,
  perimeterFt,
  signedAreaSqFt,
} from './polygon';

const pts = (...xy: number[]) => {
  const out = [];
  for (let i = 0; i < xy.length; i += 2) out.push({ xFt: xy[i]!, yFt: xy[i + 1]! });
  return out;
};

describe('polygon measures', () => {
  it('a triangle of base 300 ft and height 150 ft covers 22,500 ft²', () => {
    // Nebraska Pond Management App. C / Ohio A-FACT-0002 worked example (REFERENCES 2.8, confirmed)
    expect(Math.abs(signedAreaSqFt(pts(0, 0, 300, 0, 150, 150)))).toBe(22500);
  });

  it('is positive counter-clockwise and negative clockwise; a 15 × 10 rectangle has a 50 ft perimeter', () => {
    const ccw = pts(0, 0, 15, 0, 15, 10, 0, 10);
    expect(signedAreaSqFt(ccw)).toBe(150);
    expect(signedAreaSqFt([...ccw].reverse())).toBe(-150);
    expect(perimeterFt(ccw)).toBe(50);
  });
});

describe('self-intersection', () => {
  it('finds the crossing of a bow-tie', () => {
    expect(findSelfIntersection(pts(0, 0, 10, 10, 10, 0, 0, 10))).toEqual([0, 2]);
  });

  it('finds a spike that folds back on its neighbour', () => {
    expect(findSelfIntersection(pts(0, 0, 10, 0, 5, 0, 5, 5))).not.toBeNull();
  });

  it('accepts a simple concave outline', () => {
    expect(findSelfIntersection(pts(0, 0, 10, 0, 10, 10, 5, 4, 0, 10))).toBeNull();
  });
});

describe('minimum bounding rectangle', () => {
  it('finds a rotated 15 × 10 rectangle (hand: rotate by 30°)', () => {
    const a = Math.PI / 6;
    const rot = (x: number, y: number) => ({
      xFt: x * Math.cos(a) - y * Math.sin(a),
      yFt: x * Math.sin(a) + y * Math.cos(a),
    });
    const box = minimumBoundingRectangle([
      rot(0, 0),
      rot(15, 0),
      rot(15, 10),
      rot(0, 10),
      rot(7, 5),
    ]);
    expect(box.lengthFt).toBeCloseTo(15, 9);
    expect(box.widthFt).toBeCloseTo(10, 9);
  });

  it('hull drops interior points', () => {
    expect(convexHull(pts(0, 0, 4, 0, 4, 4, 0, 4, 2, 2))).toHaveLength(4);
  });
});
