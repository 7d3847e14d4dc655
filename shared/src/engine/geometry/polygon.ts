/** A point in plan, in feet. */
export type PointFt = { xFt: number; yFt: number };

/** Signed area by the shoelace formula, ft²; positive when the points run counter-clockwise. */
export function signedAreaSqFt(points: readonly PointFt[]): number {
  let twice = 0;
  for (let i = 0; i < points.length; i++) {
    const a = points[i]!;
    const b = points[(i + 1) % points.length]!;
    twice += a.xFt * b.yFt - b.xFt * a.yFt;
  }
  return twice / 2;
}

/** Length of the closed outline through the points, ft. */
export function perimeterFt(points: readonly PointFt[]): number {
  let total = 0;
  for (let i = 0; i < points.length; i++) {
    const a = points[i]!;
    const b = points[(i + 1) % points.length]!;
    total += Math.hypot(b.xFt - a.xFt, b.yFt - a.yFt);
  }
  return total;
}

const cross = (o: PointFt, a: PointFt, b: PointFt): number =>
  (a.xFt - o.xFt) * (b.yFt - o.yFt) - (a.yFt - o.yFt) * (b.xFt - o.xFt);

function onSegment(p: PointFt, q: PointFt, r: PointFt): boolean {
  return (
    Math.min(p.xFt, r.xFt) <= q.xFt &&
    q.xFt <= Math.max(p.xFt, r.xFt) &&
    Math.min(p.yFt, r.yFt) <= q.yFt &&
    q.yFt <= Math.max(p.yFt, r.yFt)
  );
}

function segmentsTouch(p1: PointFt, p2: PointFt, p3: PointFt, p4: PointFt): boolean {
  const d1 = cross(p3, p4, p1);
  const d2 = cross(p3, p4, p2);
  const d3 = cross(p1, p2, p3);
  const d4 = cross(p1, p2, p4);
  if (((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0))) {
    return true;
  }
  return (
    (d1 === 0 && onSegment(p3, p1, p4)) ||
    (d2 === 0 && onSegment(p3, p2, p4)) ||
    (d3 === 0 && onSegment(p1, p3, p2)) ||
    (d4 === 0 && onSegment(p1, p4, p2))
  );
}

/**
 * The first pair of edges (by index of their start points) that cross or touch, other than neighbours
 * sharing a corner; null when the outline is simple. Edge i runs from point i to point i + 1.
 * O(n²), which is fast enough for outlines of a few hundred points.
 */
export function findSelfIntersection(points: readonly PointFt[]): [number, number] | null {
  const n = points.length;
  for (let i = 0; i < n; i++) {
    const a1 = points[i]!;
    const a2 = points[(i + 1) % n]!;
    for (let j = i + 1; j < n; j++) {
      const adjacent = j === i + 1 || (i === 0 && j === n - 1);
      const b1 = points[j]!;
      const b2 = points[(j + 1) % n]!;
      if (adjacent) {
        // Neighbours share one corner; they still overlap if they fold back along each other.
        const shared = j === i + 1 ? a2 : a1;
        const otherA = j === i + 1 ? a1 : a2;
        const otherB = j === i + 1 ? b2 : b1;
        if (cross(shared, otherA, otherB) === 0 && onSegment(shared, otherB, otherA)) return [i, j];
        if (cross(shared, otherA, otherB) === 0 && onSegment(shared, otherA, otherB)) return [i, j];
        continue;
      }
      if (segmentsTouch(a1, a2, b1, b2)) return [i, j];
    }
  }
  return null;
}

/** Convex hull (Andrew's monotone chain), counter-clockwise, without repeated end point. */
export function convexHull(points: readonly PointFt[]): PointFt[] {
  const sorted = [...points].sort((a, b) => a.xFt - b.xFt || a.yFt - b.yFt);
  if (sorted.length < 3) return sorted;
  const lower: PointFt[] = [];
  for (const p of sorted) {
    while (lower.length >= 2 && cross(lower[lower.length - 2]!, lower[lower.length - 1]!, p) <= 0) {
      lower.pop();
    }
    lower.push(p);
  }
  const upper: PointFt[] = [];
  for (let i = sorted.length - 1; i >= 0; i--) {
    const p = sorted[i]!;
    while (upper.length >= 2 && cross(upper[upper.length - 2]!, upper[upper.length - 1]!, p) <= 0) {
      upper.pop();
    }
    upper.push(p);
  }
  lower.pop();
  upper.pop();
  return lower.concat(upper);
}

/**
 * The smallest-area rectangle around the points (its sides follow one hull edge; rotating calipers
 * done by brute force over hull edges), as length ≥ width in ft. A liner is a rectangular sheet, so
 * this is the plan size it has to cover.
 */
export function minimumBoundingRectangle(points: readonly PointFt[]): {
  lengthFt: number;
  widthFt: number;
} {
  const hull = convexHull(points);
  let best = { area: Infinity, lengthFt: 0, widthFt: 0 };
  for (let i = 0; i < hull.length; i++) {
    const a = hull[i]!;
    const b = hull[(i + 1) % hull.length]!;
    const len = Math.hypot(b.xFt - a.xFt, b.yFt - a.yFt);
    if (len === 0) continue;
    const ux = (b.xFt - a.xFt) / len;
    const uy = (b.yFt - a.yFt) / len;
    let minU = Infinity;
    let maxU = -Infinity;
    let minV = Infinity;
    let maxV = -Infinity;
    for (const p of hull) {
      const u = p.xFt * ux + p.yFt * uy;
      const v = -p.xFt * uy + p.yFt * ux;
      minU = Math.min(minU, u);
      maxU = Math.max(maxU, u);
      minV = Math.min(minV, v);
      maxV = Math.max(maxV, v);
    }
    const extentU = maxU - minU;
    const extentV = maxV - minV;
    const area = extentU * extentV;
    if (area < best.area - 1e-12) {
      best = { area, lengthFt: Math.max(extentU, extentV), widthFt: Math.min(extentU, extentV) };
    }
  }
  return { lengthFt: best.lengthFt, widthFt: best.widthFt };
}
