import type { PointFt } from './types';

/**
 * A polyline moved `offsetFt` to the right of its direction of travel (y up), with mitred corners:
 * the underlayment drawn a constant distance outside the liner. Repeated points are dropped first.
 * ft; not rounded.
 */
export function offsetPolylineRight(points: readonly PointFt[], offsetFt: number): PointFt[] {
  const ring = points.filter(
    (p, i) => i === 0 || p.xFt !== points[i - 1]!.xFt || p.yFt !== points[i - 1]!.yFt,
  );
  const normals = ring.slice(1).map((b, i) => {
    const a = ring[i]!;
    const length = Math.hypot(b.xFt - a.xFt, b.yFt - a.yFt);
    return { xFt: (b.yFt - a.yFt) / length, yFt: -(b.xFt - a.xFt) / length };
  });
  if (normals.length === 0) return ring.map((p) => ({ ...p }));
  return ring.map((p, i) => {
    const before = normals[Math.max(0, i - 1)]!;
    const after = normals[Math.min(normals.length - 1, i)]!;
    const mx = before.xFt + after.xFt;
    const my = before.yFt + after.yFt;
    const length = Math.hypot(mx, my);
    // Opposite normals (a hairpin) have no mitre; fall back to the incoming normal.
    const unit = length < 1e-9 ? before : { xFt: mx / length, yFt: my / length };
    const scale = offsetFt / (unit.xFt * before.xFt + unit.yFt * before.yFt);
    return { xFt: p.xFt + unit.xFt * scale, yFt: p.yFt + unit.yFt * scale };
  });
}
