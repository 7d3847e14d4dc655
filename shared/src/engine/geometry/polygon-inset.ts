import * as ClipperLib from 'clipper-lib';
import type { PointFt } from './polygon';

/** Clipper works on integers: 1 unit = 0.01 ft (3 mm), finer than any pond is dug. */
const SCALE = 100;
/** Round joins are drawn to within 0.01 ft (3 mm) of the true arc. */
const ARC_TOLERANCE_FT = 0.01;

export type InsetResult = { areaSqFt: number; perimeterFt: number; pieces: number };

/**
 * Insets (erodes) a simple polygon by `insetFt` ≥ 0 with round joins, which is the set of points at
 * least `insetFt` inside the outline: the plan of a shelf or floor `insetFt` in from the edge. An
 * outline may split into several pieces or vanish. Uses the Clipper library's polygon offsetting
 * (Vatti clipping + offsetting, clipper-lib 6.4.2). Inputs in ft; area in ft², perimeter in ft; not
 * rounded.
 */
export function insetPolygon(points: readonly PointFt[], insetFt: number): InsetResult {
  const path: ClipperLib.Path = points.map((p) => ({
    X: Math.round(p.xFt * SCALE),
    Y: Math.round(p.yFt * SCALE),
  }));
  if (!ClipperLib.Clipper.Orientation(path)) path.reverse();
  let paths: ClipperLib.Paths = [path];
  if (insetFt > 0) {
    const offset = new ClipperLib.ClipperOffset(2, ARC_TOLERANCE_FT * SCALE);
    offset.AddPath(path, ClipperLib.JoinType.jtRound, ClipperLib.EndType.etClosedPolygon);
    paths = [];
    offset.Execute(paths, -insetFt * SCALE);
  }
  let area = 0;
  let perimeter = 0;
  for (const ring of paths) {
    area += ClipperLib.Clipper.Area(ring);
    for (let i = 0; i < ring.length; i++) {
      const a = ring[i]!;
      const b = ring[(i + 1) % ring.length]!;
      perimeter += Math.hypot(b.X - a.X, b.Y - a.Y);
    }
  }
  return {
    areaSqFt: Math.max(0, area / (SCALE * SCALE)),
    perimeterFt: perimeter / SCALE,
    pieces: paths.length,
  };
}
