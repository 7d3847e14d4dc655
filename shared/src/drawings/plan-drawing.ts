import { defaultEngineParameters } from '../engine/parameters/defaults';
import type { TakeoffInput } from '../engine/schemas/takeoff-input';
import { inchesToFeet } from '../engine/units/units';
import { insetOutline } from './inset-outline';
import { lengthLabel } from './length-label';
import { outlinePoints } from './outline-points';
import { boundsOf, type BoundsFt, type DimensionLine, type PointFt } from './types';

/** Space between basins drawn side by side, and between an outline and its dimension lines, ft. */
const BASIN_GAP_FT = 3;
const DIMENSION_OFFSET_FT = 1.5;
const MARGIN_FT = 1;

export type PlanShelf = {
  depthFt: number;
  /** Distance of the shelf's lip (where it drops to the next wall) inside the outline, ft. */
  edgeInsetFt: number;
  /** The lip's outline; empty when the shelves have used up the plan. */
  edgeFt: PointFt[];
  /** False where the outline bends inward and the lip is approximated (see `insetOutline`). */
  exact: boolean;
};

export type PlanBasin = {
  index: number;
  outlineFt: PointFt[];
  shelves: PlanShelf[];
  /** The floor's outline when it differs from the last shelf's lip (battered walls), else null. */
  floor: { insetFt: number; outlineFt: PointFt[]; exact: boolean } | null;
  lengthLabel: string;
  widthLabel: string;
};

export type PlanStream = {
  index: number;
  /** The band's four corners, ft. */
  bandFt: PointFt[];
  lengthFt: number;
  widthFt: number;
  label: string;
};

export type PlanWeir = { index: number; fromFt: PointFt; toFt: PointFt; label: string };

export type PlanDrawing = {
  basins: PlanBasin[];
  streams: PlanStream[];
  weirs: PlanWeir[];
  dimensions: DimensionLine[];
  boundsFt: BoundsFt;
};

/**
 * The plan (top) view of a water feature, ft, with y increasing down the page as on screen and paper.
 * Basins are drawn side by side from left to right, each with its shelves' lips and overall length and
 * width dimensions. The input gives no positions for streams and waterfalls, so the drawing is
 * schematic there: the streams run end to end to the right from the last basin's right-most point,
 * and the waterfalls' weirs are spaced along them, the first at the stream's mouth. Shelf lips are
 * inset by the shelf widths above them plus the batter of the walls above (`batterRunPerRise`, ft per
 * ft). Labels are in the input's unit system. Not rounded.
 */
export function planDrawing(
  input: TakeoffInput,
  batterRunPerRise: number = defaultEngineParameters.geometry.batterRunPerRise,
): PlanDrawing {
  const system = input.unitSystem;
  const basins: PlanBasin[] = [];
  const dimensions: DimensionLine[] = [];
  let cursorXFt = 0;
  let mouth: PointFt = { xFt: 0, yFt: 0 };

  input.basins.forEach((basin, index) => {
    const raw = outlinePoints(basin.outline);
    const rawBounds = boundsOf(raw);
    const dx = cursorXFt - rawBounds.minXFt;
    const dy = -rawBounds.minYFt;
    const outlineFt = raw.map((p) => ({ xFt: p.xFt + dx, yFt: p.yFt + dy }));
    const b = basin.wallStyle === 'battered' ? batterRunPerRise : 0;
    let widthsFt = 0;
    const shelves = basin.shelves.map((shelf) => {
      const depthFt = inchesToFeet(shelf.depthIn);
      widthsFt += inchesToFeet(shelf.widthIn);
      const edgeInsetFt = widthsFt + b * depthFt;
      const inset = insetOutline(outlineFt, edgeInsetFt);
      return { depthFt, edgeInsetFt, edgeFt: inset.pointsFt, exact: inset.exact };
    });
    const floorInsetFt = widthsFt + b * basin.maxDepthFt;
    const lastLip = shelves.length > 0 ? shelves[shelves.length - 1]!.edgeInsetFt : 0;
    const floorInset = floorInsetFt > lastLip + 1e-9 ? insetOutline(outlineFt, floorInsetFt) : null;

    const box = boundsOf(outlineFt);
    const lengthFt = box.maxXFt - box.minXFt;
    const widthFt = box.maxYFt - box.minYFt;
    const lengthText = lengthLabel(lengthFt, 'ft', system);
    const widthText = lengthLabel(widthFt, 'ft', system);
    dimensions.push(
      {
        kind: 'length',
        fromFt: { xFt: box.minXFt, yFt: box.maxYFt + DIMENSION_OFFSET_FT },
        toFt: { xFt: box.maxXFt, yFt: box.maxYFt + DIMENSION_OFFSET_FT },
        label: lengthText,
      },
      {
        kind: 'width',
        fromFt: { xFt: box.minXFt - DIMENSION_OFFSET_FT, yFt: box.minYFt },
        toFt: { xFt: box.minXFt - DIMENSION_OFFSET_FT, yFt: box.maxYFt },
        label: widthText,
      },
    );
    basins.push({
      index,
      outlineFt,
      shelves,
      floor: floorInset
        ? { insetFt: floorInsetFt, outlineFt: floorInset.pointsFt, exact: floorInset.exact }
        : null,
      lengthLabel: lengthText,
      widthLabel: widthText,
    });
    const rightmost = outlineFt.filter((p) => p.xFt >= box.maxXFt - 1e-9).map((p) => p.yFt);
    mouth = { xFt: box.maxXFt, yFt: (Math.min(...rightmost) + Math.max(...rightmost)) / 2 };
    cursorXFt = box.maxXFt + BASIN_GAP_FT;
  });

  const streams: PlanStream[] = [];
  let startXFt = mouth.xFt;
  input.streams.forEach((stream, index) => {
    const half = stream.widthFt / 2;
    const endXFt = startXFt + stream.lengthFt;
    streams.push({
      index,
      bandFt: [
        { xFt: startXFt, yFt: mouth.yFt - half },
        { xFt: endXFt, yFt: mouth.yFt - half },
        { xFt: endXFt, yFt: mouth.yFt + half },
        { xFt: startXFt, yFt: mouth.yFt + half },
      ],
      lengthFt: stream.lengthFt,
      widthFt: stream.widthFt,
      label: `${lengthLabel(stream.lengthFt, 'ft', system)} × ${lengthLabel(stream.widthFt, 'ft', system)}`,
    });
    dimensions.push({
      kind: 'stream-length',
      fromFt: { xFt: startXFt, yFt: mouth.yFt - half - DIMENSION_OFFSET_FT },
      toFt: { xFt: endXFt, yFt: mouth.yFt - half - DIMENSION_OFFSET_FT },
      label: lengthLabel(stream.lengthFt, 'ft', system),
    });
    startXFt = endXFt;
  });

  const streamRunFt = startXFt - mouth.xFt;
  const count = input.waterfalls.length;
  const weirs = input.waterfalls.map((fall, index) => {
    const half = inchesToFeet(fall.weirWidthIn) / 2;
    const xFt = mouth.xFt + (streamRunFt * index) / count;
    // Without a stream the weirs stand side by side at the basin's edge.
    const yFt =
      streamRunFt > 0 ? mouth.yFt : mouth.yFt + (index - (count - 1) / 2) * (2 * half + 0.5);
    return {
      index,
      fromFt: { xFt, yFt: yFt - half },
      toFt: { xFt, yFt: yFt + half },
      label: `weir ${lengthLabel(fall.weirWidthIn, 'in', system)}`,
    };
  });

  const everything = [
    ...basins.flatMap((b) => b.outlineFt),
    ...streams.flatMap((s) => s.bandFt),
    ...weirs.flatMap((w) => [w.fromFt, w.toFt]),
    ...dimensions.flatMap((d) => [d.fromFt, d.toFt]),
  ];
  const box = boundsOf(everything);
  return {
    basins,
    streams,
    weirs,
    dimensions,
    boundsFt: {
      minXFt: box.minXFt - MARGIN_FT,
      minYFt: box.minYFt - MARGIN_FT,
      maxXFt: box.maxXFt + MARGIN_FT,
      maxYFt: box.maxYFt + MARGIN_FT,
    },
  };
}
