import type { OutlineInput } from '../schemas/takeoff-input';
import { insetConvexPolygon, isConvex } from './convex-inset';
import type { InsetResult } from './polygon-inset';
import { minimumBoundingRectangle, perimeterFt, signedAreaSqFt, type PointFt } from './polygon';

/**
 * A basin outline that can report the area and perimeter of its inset (eroded) plan at any distance
 * from the water's edge. Insets are cumulative from the outline: eroding by s then by t equals eroding
 * by s + t, so every shelf and floor is measured from the original outline.
 */
export type PlanShape = {
  shape: OutlineInput['shape'];
  /** Plan length and width of the smallest enclosing rectangle, ft (length ≥ width). */
  lengthFt: number;
  widthFt: number;
  areaAt(insetFt: number): number;
  perimeterAt(insetFt: number): number;
  /** A short statement of how insets of this shape are computed, for explanations. */
  method: string;
};

/**
 * Insets any simple polygon (convex or not) by a distance in ft. The engine computes convex outlines
 * itself; outlines with inward bends need a general polygon-offset library, which the caller supplies
 * (`insetPolygon` from `@pondwright/shared/engine/polygon-inset`) so that browsers load it only when an
 * outline needs it.
 */
export type PolygonInset = (
  points: readonly { xFt: number; yFt: number }[],
  insetFt: number,
) => InsetResult;

/** True when this outline's shelves can only be measured with a general polygon-offset library. */
export function needsPolygonLibrary(outline: OutlineInput): boolean {
  return outline.shape === 'freeform' && !isConvex(outline.pointsFt);
}

/**
 * Ramanujan's second approximation of an ellipse's perimeter with semi-axes a, b (ft). Its relative
 * error is below 1e-9 for the aspect ratios of garden ponds.
 */
export function ellipsePerimeterFt(a: number, b: number): number {
  const h = ((a - b) / (a + b)) ** 2;
  return Math.PI * (a + b) * (1 + (3 * h) / (10 + Math.sqrt(4 - 3 * h)));
}

function polygonShape(
  points: readonly PointFt[],
  shape: OutlineInput['shape'],
  method: string,
  inset: PolygonInset,
): PlanShape {
  const cache = new Map<number, { areaSqFt: number; perimeterFt: number }>();
  const at = (insetFt: number) => {
    const key = Math.round(insetFt * 1e6);
    let hit = cache.get(key);
    if (!hit) {
      hit =
        insetFt <= 0
          ? { areaSqFt: Math.abs(signedAreaSqFt(points)), perimeterFt: perimeterFt(points) }
          : inset(points, insetFt);
      cache.set(key, hit);
    }
    return hit;
  };
  const { lengthFt, widthFt } = minimumBoundingRectangle(points);
  return {
    shape,
    lengthFt,
    widthFt,
    areaAt: (t) => at(t).areaSqFt,
    perimeterAt: (t) => at(t).perimeterFt,
    method,
  };
}

function ellipsePoints(a: number, b: number, segments: number): PointFt[] {
  const points: PointFt[] = [];
  for (let i = 0; i < segments; i++) {
    const angle = (2 * Math.PI * i) / segments;
    points.push({ xFt: a * Math.cos(angle), yFt: b * Math.sin(angle) });
  }
  return points;
}

/**
 * Builds the plan shape of an outline (all in ft).
 * - Rectangle L × W inset by t: (L − 2t) × (W − 2t), exact.
 * - Oval (ellipse, semi-axes a ≥ b) inset by t ≤ b²/a (its smallest radius of curvature): the inner
 *   parallel body has area πab − P·t + πt² and perimeter P − 2πt (Steiner's formula), P by Ramanujan.
 *   Deeper insets use a polygon of `ovalSegments` sides and polygon offsetting.
 * - Freeform polygon: a convex outline is inset edge by edge (exact); one with inward bends is offset
 *   with round joins by `insetNonConvex`, which must then be given.
 */
export function planShape(
  outline: OutlineInput,
  ovalSegments: number,
  insetNonConvex?: PolygonInset,
): PlanShape {
  if (outline.shape === 'rectangle') {
    const L = outline.lengthFt;
    const W = outline.widthFt;
    return {
      shape: 'rectangle',
      lengthFt: Math.max(L, W),
      widthFt: Math.min(L, W),
      areaAt: (t) => Math.max(0, L - 2 * t) * Math.max(0, W - 2 * t),
      perimeterAt: (t) => (L - 2 * t > 0 && W - 2 * t > 0 ? 2 * (L + W) - 8 * t : 0),
      method: 'rectangle inset by t: (L − 2t) × (W − 2t)',
    };
  }
  if (outline.shape === 'oval') {
    const a = Math.max(outline.lengthFt, outline.widthFt) / 2;
    const b = Math.min(outline.lengthFt, outline.widthFt) / 2;
    const perimeter = ellipsePerimeterFt(a, b);
    const smoothLimit = (b * b) / a;
    let polygon: PlanShape | null = null;
    const fallback = () =>
      (polygon ??= polygonShape(ellipsePoints(a, b, ovalSegments), 'oval', '', insetConvexPolygon));
    return {
      shape: 'oval',
      lengthFt: 2 * a,
      widthFt: 2 * b,
      areaAt: (t) => {
        if (t <= 0) return Math.PI * a * b;
        if (t >= b) return 0;
        if (t <= smoothLimit) return Math.PI * a * b - perimeter * t + Math.PI * t * t;
        return fallback().areaAt(t);
      },
      perimeterAt: (t) => {
        if (t <= 0) return perimeter;
        if (t >= b) return 0;
        if (t <= smoothLimit) return perimeter - 2 * Math.PI * t;
        return fallback().perimeterAt(t);
      },
      method: `ellipse inset by t: πab − P·t + πt² (Steiner) while t ≤ b²/a = ${smoothLimit.toFixed(2)} ft, else a ${ovalSegments}-sided polygon inset edge by edge`,
    };
  }
  if (isConvex(outline.pointsFt)) {
    return polygonShape(
      outline.pointsFt,
      'freeform',
      'convex outline inset edge by edge (exact)',
      insetConvexPolygon,
    );
  }
  if (!insetNonConvex) {
    throw new Error(
      'An outline with inward bends needs a polygon-offset function (validation checks this first)',
    );
  }
  return polygonShape(
    outline.pointsFt,
    'freeform',
    'polygon offset with round joins (Clipper)',
    insetNonConvex,
  );
}
