import type { BasinInput } from '../schemas/takeoff-input';
import { inchesToFeet } from '../units/units';
import type { PlanShape } from '../geometry/plan-shape';

/** A plan smaller than this (ft²) counts as vanished: the shelves or the batter leave no floor. */
const MIN_PLAN_AREA_SQFT = 0.5;

/** One band of the basin between two depths, with the wall that bounds it. */
export type BasinTier = {
  topDepthFt: number;
  bottomDepthFt: number;
  /** Distance in from the water's edge of the tier's plan at its top and bottom, ft. */
  topInsetFt: number;
  bottomInsetFt: number;
  topAreaSqFt: number;
  bottomAreaSqFt: number;
  topPerimeterFt: number;
  bottomPerimeterFt: number;
  volumeCuFt: number;
  wallAreaSqFt: number;
};

export type BasinProfile = {
  surfaceAreaSqFt: number;
  perimeterFt: number;
  lengthFt: number;
  widthFt: number;
  maxDepthFt: number;
  batterRunPerRise: number;
  tiers: BasinTier[];
  /** The horizontal ring of each shelf, ft², in the order of the input shelves. */
  shelfAreasSqFt: number[];
  floorAreaSqFt: number;
  holeVolumeCuFt: number;
  wallAreaSqFt: number;
  shelfAreaSqFt: number;
  /** Slope length of all walls plus all shelf widths, one side, ft: the liner's drape past the floor. */
  drapeOneSideFt: number;
  /** Where the plan vanished, if it did: at a shelf (index) or at the floor. */
  collapse: null | { at: 'shelf'; shelfIndex: number } | { at: 'floor' };
};

/**
 * Cross-section of a basin: tiers from the water surface down, each ending on a shelf (inset by the
 * shelf's width) or on the floor. Walls are vertical or battered at b = `batterRunPerRise` ft in per
 * ft down.
 *
 * Volume of a tier of height h: vertical walls h·A_top; battered walls
 * V = h/2 · (A_top + A_bot) + b·h²/12 · (P_bot − P_top). This is the prismoidal formula
 * h/6 · (A_top + 4·A_mid + A_bot) rewritten with the fact that an eroded plan loses area at the rate of
 * its perimeter (dA/dt = −P), so it needs no mid-depth plan; it is exact whenever the plan area is
 * quadratic in the inset (rectangles, ellipses within their curvature limit, convex polygons).
 * Wall area: vertical P·h; battered √(1 + b²)/b · (A_top − A_bot) (the integral of the perimeter).
 * All ft; not rounded. Source: geometry; prismoidal formula REFERENCES 2.5.
 */
export function basinProfile(
  basin: BasinInput,
  shape: PlanShape,
  batterRunPerRise: number,
): BasinProfile {
  const b = basin.wallStyle === 'battered' ? batterRunPerRise : 0;
  const slope = Math.sqrt(1 + b * b);
  const breaks = basin.shelves.map((s) => inchesToFeet(s.depthIn));
  breaks.push(basin.maxDepthFt);
  const tiers: BasinTier[] = [];
  const shelfAreasSqFt: number[] = [];
  let collapse: BasinProfile['collapse'] = null;
  let topDepth = 0;
  let topInset = 0;
  let drape = 0;
  for (let k = 0; k < breaks.length; k++) {
    const bottomDepth = breaks[k]!;
    const h = bottomDepth - topDepth;
    const bottomInset = topInset + b * h;
    const topArea = shape.areaAt(topInset);
    const bottomArea = shape.areaAt(bottomInset);
    const topPerimeter = shape.perimeterAt(topInset);
    const bottomPerimeter = shape.perimeterAt(bottomInset);
    tiers.push({
      topDepthFt: topDepth,
      bottomDepthFt: bottomDepth,
      topInsetFt: topInset,
      bottomInsetFt: bottomInset,
      topAreaSqFt: topArea,
      bottomAreaSqFt: bottomArea,
      topPerimeterFt: topPerimeter,
      bottomPerimeterFt: bottomPerimeter,
      volumeCuFt:
        b === 0
          ? h * topArea
          : (h / 2) * (topArea + bottomArea) +
            ((b * h * h) / 12) * (bottomPerimeter - topPerimeter),
      wallAreaSqFt: b === 0 ? h * topPerimeter : (slope / b) * Math.max(0, topArea - bottomArea),
    });
    drape += h * slope;
    if (bottomArea < MIN_PLAN_AREA_SQFT && collapse === null) collapse = { at: 'floor' };
    const shelf = basin.shelves[k];
    if (shelf) {
      const nextInset = bottomInset + inchesToFeet(shelf.widthIn);
      const nextArea = shape.areaAt(nextInset);
      if (nextArea < MIN_PLAN_AREA_SQFT && collapse === null)
        collapse = { at: 'shelf', shelfIndex: k };
      shelfAreasSqFt.push(Math.max(0, bottomArea - nextArea));
      drape += inchesToFeet(shelf.widthIn);
      topInset = nextInset;
    }
    topDepth = bottomDepth;
  }
  const last = tiers[tiers.length - 1]!;
  return {
    surfaceAreaSqFt: shape.areaAt(0),
    perimeterFt: shape.perimeterAt(0),
    lengthFt: shape.lengthFt,
    widthFt: shape.widthFt,
    maxDepthFt: basin.maxDepthFt,
    batterRunPerRise: b,
    tiers,
    shelfAreasSqFt,
    floorAreaSqFt: last.bottomAreaSqFt,
    holeVolumeCuFt: tiers.reduce((sum, t) => sum + t.volumeCuFt, 0),
    wallAreaSqFt: tiers.reduce((sum, t) => sum + t.wallAreaSqFt, 0),
    shelfAreaSqFt: shelfAreasSqFt.reduce((sum, a) => sum + a, 0),
    drapeOneSideFt: drape,
    collapse,
  };
}
