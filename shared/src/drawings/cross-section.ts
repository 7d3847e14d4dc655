import { defaultEngineParameters } from '../engine/parameters/defaults';
import { outlineExtents, type TakeoffInput } from '../engine/schemas/takeoff-input';
import type { Takeoff } from '../engine/schemas/takeoff-output';
import { inchesToFeet } from '../engine/units/units';
import { lengthLabel } from './length-label';
import { offsetPolylineRight } from './polyline-offset';
import { boundsOf, type BoundsFt, type DimensionLine, type PointFt } from './types';

/** How far under the liner the underlayment is drawn, ft: a drawing gap, not a thickness. */
export const UNDERLAYMENT_GAP_FT = 0.15;
/** Soil drawn beyond the liner's ends and below the floor, ft. */
const SOIL_MARGIN_FT = 1;
const LARGEST_ROCK_RADIUS_FT = 0.5;
const SMALLEST_ROCK_RADIUS_FT = 0.15;

export type SectionRock = { centerFt: PointFt; radiusFt: number; on: 'wall' | 'shelf' };

export type CrossSection = {
  basinIndex: number;
  lengthFt: number;
  maxDepthFt: number;
  overlapFt: number;
  shelves: Array<{ depthFt: number; widthFt: number }>;
  /** The dug profile from the left water edge (0, 0) down and back up to (length, 0). */
  profileFt: PointFt[];
  /** The liner: the profile plus the overlap laid flat beyond each edge. */
  linerFt: PointFt[];
  underlaymentFt: PointFt[];
  /** The soil around the hole, a closed polygon under the underlayment. */
  soilFt: PointFt[];
  gravelFt: PointFt[][];
  rocks: SectionRock[];
  dimensions: DimensionLine[];
  boundsFt: BoundsFt;
};

export type CrossSectionOptions = {
  basinIndex?: number;
  batterRunPerRise?: number;
  /** Used when the takeoff has no liner piece for the basin to read the overlap from. */
  overlapPerEdgeFt?: number;
};

/** The overlap the takeoff used: its rule size is length + 2 × max depth + 2 × overlap. */
function overlapFromTakeoff(
  takeoff: Takeoff | null,
  basinIndex: number,
  lengthFt: number,
  maxDepthFt: number,
): number | null {
  const piece = takeoff?.liner.pieces.find((p) => p.part === 'basin' && p.index === basinIndex);
  if (!piece || piece.ruleLengthFt === null) return null;
  const overlapFt = (piece.ruleLengthFt - lengthFt - 2 * maxDepthFt) / 2;
  return overlapFt >= 0 ? Math.round(overlapFt * 1e9) / 1e9 : null;
}

/**
 * A basin's cross-section along its length, ft, x from the left water edge and y up from the water
 * surface (so depths are negative). Walls step down shelf by shelf to the maximum depth, sloped by
 * `batterRunPerRise` (ft in per ft down) when battered; the liner follows the profile and runs flat
 * past each edge by the overlap the takeoff used; the underlayment lies `UNDERLAYMENT_GAP_FT` under it;
 * gravel covers the floor and shelves at the input's depths; rocks are drawn against the walls (as many
 * as the wall coverage fills) and on each shelf's lip. Where the shelves and batter use up the length,
 * the profile is clamped at the middle. Labels are in the input's unit system. Not rounded.
 */
export function crossSection(
  input: TakeoffInput,
  takeoff: Takeoff | null,
  options: CrossSectionOptions = {},
): CrossSection | null {
  const basinIndex = options.basinIndex ?? 0;
  const basin = input.basins[basinIndex];
  if (!basin) return null;
  const system = input.unitSystem;
  const { lengthFt } = outlineExtents(basin.outline);
  const maxDepthFt = basin.maxDepthFt;
  const overlapFt =
    overlapFromTakeoff(takeoff, basinIndex, lengthFt, maxDepthFt) ??
    options.overlapPerEdgeFt ??
    defaultEngineParameters.liner.overlapPerEdgeFt;
  const b =
    basin.wallStyle === 'battered'
      ? (options.batterRunPerRise ?? defaultEngineParameters.geometry.batterRunPerRise)
      : 0;
  const halfFt = lengthFt / 2;
  const clampX = (xFt: number) => Math.min(xFt, halfFt);

  const shelves = basin.shelves.map((s) => ({
    depthFt: inchesToFeet(s.depthIn),
    widthFt: inchesToFeet(s.widthIn),
  }));
  const left: PointFt[] = [{ xFt: 0, yFt: 0 }];
  const walls: Array<{ top: PointFt; bottom: PointFt }> = [];
  const treads: Array<{ fromXFt: number; toXFt: number; depthFt: number }> = [];
  let insetFt = 0;
  let topFt = 0;
  for (const step of [...shelves, { depthFt: maxDepthFt, widthFt: 0 }]) {
    const top = { xFt: clampX(insetFt), yFt: -topFt };
    insetFt += b * (step.depthFt - topFt);
    const bottom = { xFt: clampX(insetFt), yFt: -step.depthFt };
    walls.push({ top, bottom });
    left.push(bottom);
    if (step.widthFt > 0) {
      treads.push({
        fromXFt: bottom.xFt,
        toXFt: clampX(insetFt + step.widthFt),
        depthFt: step.depthFt,
      });
      insetFt += step.widthFt;
      left.push({ xFt: clampX(insetFt), yFt: -step.depthFt });
    }
    topFt = step.depthFt;
  }
  const mirror = (p: PointFt) => ({ xFt: lengthFt - p.xFt, yFt: p.yFt });
  const right = [...left].reverse().map(mirror);
  if (left[left.length - 1]!.xFt >= halfFt) right.shift();
  const profileFt = [...left, ...right];
  const linerFt = [
    { xFt: -overlapFt, yFt: 0 },
    ...profileFt,
    { xFt: lengthFt + overlapFt, yFt: 0 },
  ];
  const underlaymentFt = offsetPolylineRight(linerFt, UNDERLAYMENT_GAP_FT);
  const soilEdgeFt = overlapFt + SOIL_MARGIN_FT;
  const soilBottomFt = -maxDepthFt - SOIL_MARGIN_FT;
  const soilFt = [
    { xFt: -soilEdgeFt, yFt: -UNDERLAYMENT_GAP_FT },
    ...underlaymentFt,
    { xFt: lengthFt + soilEdgeFt, yFt: -UNDERLAYMENT_GAP_FT },
    { xFt: lengthFt + soilEdgeFt, yFt: soilBottomFt },
    { xFt: -soilEdgeFt, yFt: soilBottomFt },
  ];

  const band = (fromXFt: number, toXFt: number, atYFt: number, thicknessFt: number) => [
    { xFt: fromXFt, yFt: atYFt },
    { xFt: toXFt, yFt: atYFt },
    { xFt: toXFt, yFt: atYFt + thicknessFt },
    { xFt: fromXFt, yFt: atYFt + thicknessFt },
  ];
  const floorGravelFt = inchesToFeet(input.rock.floorGravelDepthIn);
  const shelfGravelFt = inchesToFeet(input.rock.shelfGravelDepthIn);
  const floorFromXFt = left[left.length - 1]!.xFt;
  const gravelFt: PointFt[][] = [];
  if (floorGravelFt > 0 && floorFromXFt < halfFt) {
    gravelFt.push(band(floorFromXFt, lengthFt - floorFromXFt, -maxDepthFt, floorGravelFt));
  }
  if (shelfGravelFt > 0) {
    for (const tread of treads) {
      gravelFt.push(band(tread.fromXFt, tread.toXFt, -tread.depthFt, shelfGravelFt));
      gravelFt.push(
        band(lengthFt - tread.toXFt, lengthFt - tread.fromXFt, -tread.depthFt, shelfGravelFt),
      );
    }
  }

  const rocks: SectionRock[] = [];
  const wallCover = input.rock.wallCoveragePct / 100;
  walls.forEach(({ top, bottom }, k) => {
    const heightFt = top.yFt - bottom.yFt;
    if (wallCover <= 0 || heightFt <= 0) return;
    const baseFt = k === walls.length - 1 ? floorGravelFt : shelfGravelFt;
    const radiusFt = Math.max(
      SMALLEST_ROCK_RADIUS_FT,
      Math.min(LARGEST_ROCK_RADIUS_FT, heightFt / 2.5),
    );
    const count = Math.max(1, Math.round((heightFt * wallCover) / (2 * radiusFt)));
    for (let i = 0; i < count; i++) {
      const yFt = bottom.yFt + baseFt + radiusFt * (2 * i + 1);
      if (yFt > top.yFt) break;
      const t = (yFt - bottom.yFt) / heightFt;
      const wallXFt = bottom.xFt + t * (top.xFt - bottom.xFt);
      const center = { xFt: wallXFt + radiusFt, yFt };
      rocks.push(
        { centerFt: center, radiusFt, on: 'wall' },
        {
          centerFt: mirror(center),
          radiusFt,
          on: 'wall',
        },
      );
    }
  });
  if (input.rock.shelfCoveragePct > 0) {
    for (const tread of treads) {
      const radiusFt = Math.min(LARGEST_ROCK_RADIUS_FT * 0.7, (tread.toXFt - tread.fromXFt) / 3);
      if (radiusFt < SMALLEST_ROCK_RADIUS_FT) continue;
      const center = {
        xFt: tread.toXFt - radiusFt,
        yFt: -tread.depthFt + shelfGravelFt + radiusFt,
      };
      rocks.push(
        { centerFt: center, radiusFt, on: 'shelf' },
        {
          centerFt: mirror(center),
          radiusFt,
          on: 'shelf',
        },
      );
    }
  }

  const rightDimXFt = lengthFt + overlapFt + 0.8;
  const dimensions: DimensionLine[] = [
    {
      kind: 'length',
      fromFt: { xFt: 0, yFt: 1.1 },
      toFt: { xFt: lengthFt, yFt: 1.1 },
      label: lengthLabel(lengthFt, 'ft', system),
    },
    {
      kind: 'overlap',
      fromFt: { xFt: lengthFt, yFt: 0.45 },
      toFt: { xFt: lengthFt + overlapFt, yFt: 0.45 },
      label: `${lengthLabel(overlapFt, 'ft', system)} overlap`,
    },
    ...basin.shelves.map((shelf, k) => ({
      kind: 'shelf-depth',
      fromFt: { xFt: rightDimXFt + 0.9 * k, yFt: 0 },
      toFt: { xFt: rightDimXFt + 0.9 * k, yFt: -inchesToFeet(shelf.depthIn) },
      label: lengthLabel(shelf.depthIn, 'in', system),
    })),
    {
      kind: 'max-depth',
      fromFt: { xFt: halfFt, yFt: 0 },
      toFt: { xFt: halfFt, yFt: -maxDepthFt },
      label: `max ${lengthLabel(maxDepthFt, 'ft', system)}`,
    },
  ];
  const box = boundsOf([...soilFt, ...dimensions.flatMap((d) => [d.fromFt, d.toFt])]);
  return {
    basinIndex,
    lengthFt,
    maxDepthFt,
    overlapFt,
    shelves,
    profileFt,
    linerFt,
    underlaymentFt,
    soilFt,
    gravelFt,
    rocks,
    dimensions,
    boundsFt: {
      minXFt: box.minXFt - 0.3,
      minYFt: box.minYFt - 0.3,
      maxXFt: box.maxXFt + 0.5,
      maxYFt: box.maxYFt + 0.5,
    },
  };
}
