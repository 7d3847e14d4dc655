import { z } from 'zod';
import { BOULDER_SIZES, SHEET_STYLES, SOIL_TYPES } from '../parameters/parameters-schema';
import { UNIT_SYSTEMS } from '../units/display';
import {
  findSelfIntersection,
  minimumBoundingRectangle,
  signedAreaSqFt,
} from '../geometry/polygon';
import { choice, count, list, quantity, section } from './field-helpers';

/** Limits that catch typing mistakes (a 10,000 ft pond); generous for real residential work. */
export const INPUT_LIMITS = {
  outlineFt: 300,
  coordinateFt: 1000,
  outlinePoints: 1000,
  basinDepthFt: 15,
  shelves: 6,
  basins: 10,
} as const;

const pointSchema = section({
  xFt: quantity('ft', { min: -INPUT_LIMITS.coordinateFt, max: INPUT_LIMITS.coordinateFt }),
  yFt: quantity('ft', { min: -INPUT_LIMITS.coordinateFt, max: INPUT_LIMITS.coordinateFt }),
});

const planSize = {
  lengthFt: quantity('ft', { minExclusive: 0, max: INPUT_LIMITS.outlineFt }),
  widthFt: quantity('ft', { minExclusive: 0, max: INPUT_LIMITS.outlineFt }),
};

/** A basin's water-surface outline: a rectangle, an oval (ellipse) or a freeform polygon. */
export const outlineSchema = z.discriminatedUnion(
  'shape',
  [
    section({ shape: z.literal('rectangle'), ...planSize }),
    section({ shape: z.literal('oval'), ...planSize }),
    section({
      shape: z.literal('freeform'),
      pointsFt: list(pointSchema, INPUT_LIMITS.outlinePoints, 3),
    }),
  ],
  { error: 'Choose an outline shape: rectangle, oval or freeform.' },
);
export type OutlineInput = z.infer<typeof outlineSchema>;

/** A plant shelf: a step of `widthIn` at `depthIn` below the water surface. */
export const shelfSchema = section({
  widthIn: quantity('in', { minExclusive: 0, max: 60 }),
  depthIn: quantity('in', { minExclusive: 0, max: 120 }),
});

export const basinSchema = section({
  outline: outlineSchema,
  maxDepthFt: quantity('ft', { minExclusive: 0, max: INPUT_LIMITS.basinDepthFt }),
  wallStyle: choice(['vertical', 'battered'] as const),
  shelves: list(shelfSchema, INPUT_LIMITS.shelves),
});
export type BasinInput = z.infer<typeof basinSchema>;

export const streamSchema = section({
  lengthFt: quantity('ft', { minExclusive: 0, max: 500 }),
  widthFt: quantity('ft', { minExclusive: 0, max: 30 }),
  dropFt: quantity('ft', { min: 0, max: 50 }),
});

export const waterfallSchema = section({
  weirWidthIn: quantity('in', { minExclusive: 0, max: 240 }),
  sheet: choice(SHEET_STYLES),
});

/** A pond-free waterfall's basin: its reservoir is the voids of its fill. */
export const pondFreeBasinSchema = section({
  lengthFt: quantity('ft', { minExclusive: 0, max: 60 }),
  widthFt: quantity('ft', { minExclusive: 0, max: 60 }),
  depthFt: quantity('ft', { minExclusive: 0, max: 8 }),
  fill: choice(['rock-gravel', 'storage-blocks'] as const),
});

const pipeSize = z.union([z.literal('auto'), quantity('in', { minExclusive: 0, max: 12 })], {
  error: 'Give a nominal size in inches or "auto".',
});

export const pumpRunSchema = section({
  pipeMaterial: z.string({ error: 'Required.' }).min(1, { error: 'Required.' }),
  pressurePipeLengthFt: quantity('ft', { minExclusive: 0, max: 2000 }),
  pressurePipeSizeIn: pipeSize,
  suctionPipeLengthFt: quantity('ft', { min: 0, max: 500 }),
  suctionPipeSizeIn: pipeSize,
  fittings: section({
    elbow90: count(200),
    elbow45: count(200),
    tee: count(200),
    checkValve: count(50),
    valve: count(50),
  }),
  elevationFt: quantity('ft', { min: 0, max: 100 }),
});
export type PumpRunInput = z.infer<typeof pumpRunSchema>;

const percent = quantity('%', { min: 0, max: 100 });

export const rockSchema = section({
  boulderMixPct: section({ small: percent, medium: percent, large: percent }),
  wallCoveragePct: percent,
  shelfCoveragePct: percent,
  streamEdgeCoveragePct: percent,
  floorGravelDepthIn: quantity('in', { min: 0, max: 12 }),
  shelfGravelDepthIn: quantity('in', { min: 0, max: 12 }),
  streamGravelDepthIn: quantity('in', { min: 0, max: 12 }),
});

export const CABLE_GAUGES_AWG = ['18', '16', '14', '12', '10', '8', '6'] as const;

export const lightingRunSchema = section({
  cableLengthFt: quantity('ft', { minExclusive: 0, max: 1000 }),
  gaugeAwg: choice(CABLE_GAUGES_AWG),
  fixtureWatts: list(quantity('W', { minExclusive: 0, max: 300 }), 60, 1),
});

export const siteSchema = section({
  soil: choice(SOIL_TYPES),
  accessWidthIn: quantity('in', { minExclusive: 0, max: 1200 }),
  carryDistanceFt: quantity('ft', { min: 0, max: 2000 }),
  slopePct: quantity('%', { min: 0, max: 100 }),
  excavationMethod: choice(['auto', 'hand', 'machine'] as const),
  haulVehicleId: z.string({ error: 'Required.' }).min(1, { error: 'Required.' }),
  spoilHauledPct: percent,
});

export const renovationSchema = section({
  /** The basins exist already (liner replacement, clean-out): they are not dug again. */
  basinsAlreadyExcavated: z.boolean({ error: 'Required: true or false.' }),
  oldLinerAreaSqFt: quantity('ft²', { min: 0, max: 50000 }),
  oldRockShortTons: quantity('tons', { min: 0, max: 500 }),
  rockReusedPct: percent,
});

export const crewSchema = section({
  size: count(30, 1),
  hoursPerDay: quantity('h', { minExclusive: 0, max: 16 }),
});

const baseInputSchema = section({
  unitSystem: choice(UNIT_SYSTEMS),
  basins: list(basinSchema, INPUT_LIMITS.basins),
  streams: list(streamSchema, 20),
  waterfalls: list(waterfallSchema, 20),
  pondFreeBasin: pondFreeBasinSchema.nullable(),
  pumpRun: pumpRunSchema.nullable(),
  rock: rockSchema,
  lighting: list(lightingRunSchema, 50),
  site: siteSchema,
  renovation: renovationSchema.nullable(),
  crew: crewSchema,
});

type Issue = { path: (string | number)[]; message: string };

/** The narrowest plan dimension of an outline, ft, and its issues (self-intersection, zero area). */
export function outlineExtents(outline: OutlineInput): { lengthFt: number; widthFt: number } {
  if (outline.shape !== 'freeform') {
    return {
      lengthFt: Math.max(outline.lengthFt, outline.widthFt),
      widthFt: Math.min(outline.lengthFt, outline.widthFt),
    };
  }
  return minimumBoundingRectangle(outline.pointsFt);
}

function outlineIssues(outline: OutlineInput, path: (string | number)[]): Issue[] {
  if (outline.shape !== 'freeform') return [];
  const points = outline.pointsFt;
  const at = [...path, 'pointsFt'];
  for (let i = 0; i < points.length; i++) {
    const a = points[i]!;
    const b = points[(i + 1) % points.length]!;
    if (a.xFt === b.xFt && a.yFt === b.yFt) {
      return [
        {
          path: [...at, (i + 1) % points.length],
          message: 'Repeats the point before it; remove it.',
        },
      ];
    }
  }
  const crossing = findSelfIntersection(points);
  if (crossing) {
    return [
      {
        path: at,
        message: `The outline crosses itself: the edge from point ${crossing[0] + 1} crosses the edge from point ${crossing[1] + 1}.`,
      },
    ];
  }
  if (Math.abs(signedAreaSqFt(points)) < 1) {
    return [{ path: at, message: 'The outline encloses less than 1 ft².' }];
  }
  const { lengthFt } = minimumBoundingRectangle(points);
  if (lengthFt > INPUT_LIMITS.outlineFt) {
    return [
      {
        path: at,
        message: `The outline is ${Math.round(lengthFt)} ft long; at most ${INPUT_LIMITS.outlineFt} ft.`,
      },
    ];
  }
  return [];
}

function basinIssues(basin: BasinInput, path: (string | number)[]): Issue[] {
  const issues = outlineIssues(basin.outline, [...path, 'outline']);
  if (issues.length > 0) return issues;
  const { widthFt } = outlineExtents(basin.outline);
  if (basin.maxDepthFt > widthFt) {
    issues.push({
      path: [...path, 'maxDepthFt'],
      message: `Deeper (${basin.maxDepthFt} ft) than the basin is wide (${Math.round(widthFt * 100) / 100} ft).`,
    });
  }
  let previousIn = 0;
  basin.shelves.forEach((shelf, i) => {
    if (shelf.depthIn <= previousIn) {
      issues.push({
        path: [...path, 'shelves', i, 'depthIn'],
        message: `Each shelf must be deeper than the one above it (${previousIn} in).`,
      });
    } else if (shelf.depthIn >= basin.maxDepthFt * 12) {
      issues.push({
        path: [...path, 'shelves', i, 'depthIn'],
        message: `Must be shallower than the basin's maximum depth (${basin.maxDepthFt * 12} in).`,
      });
    }
    previousIn = shelf.depthIn;
  });
  return issues;
}

/**
 * The takeoff's input: one water feature made of several parts, in US customary units (names carry
 * the unit). `unitSystem` chooses how the figures are shown; a metric form converts its entries with
 * the exact factors in `units.ts` before validation.
 */
export const takeoffInputSchema = baseInputSchema.superRefine(
  (input, ctx) => {
    const add = (issue: Issue) => ctx.addIssue({ code: 'custom', ...issue });
    if (input.basins.length === 0 && input.streams.length === 0 && input.pondFreeBasin === null) {
      add({ path: ['basins'], message: 'Add at least one basin, stream or pond-free basin.' });
    }
    input.basins.forEach((basin, i) => basinIssues(basin, ['basins', i]).forEach(add));
    const mix = input.rock.boulderMixPct;
    const mixTotal = BOULDER_SIZES.reduce((sum, size) => sum + mix[size], 0);
    const anyBoulders =
      input.rock.wallCoveragePct > 0 ||
      input.rock.shelfCoveragePct > 0 ||
      input.rock.streamEdgeCoveragePct > 0;
    if (anyBoulders && Math.abs(mixTotal - 100) > 0.01) {
      add({
        path: ['rock', 'boulderMixPct'],
        message: `The boulder mix adds up to ${mixTotal} %; it must add up to 100 %.`,
      });
    }
    if (
      input.pondFreeBasin !== null &&
      input.pondFreeBasin.depthFt >
        Math.min(input.pondFreeBasin.lengthFt, input.pondFreeBasin.widthFt)
    ) {
      add({ path: ['pondFreeBasin', 'depthFt'], message: 'Deeper than the basin is wide.' });
    }
  },
  { when: (payload) => payload.issues.length === 0 },
);

export type TakeoffInput = z.infer<typeof takeoffInputSchema>;
