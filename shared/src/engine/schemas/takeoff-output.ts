import { z } from 'zod';
import { explanationSchema } from '../explain/explanation';
import { UNIT_SYSTEMS } from '../units/display';
import { LABOR_TASKS } from '../labor/labor-hours';

const n = z.number();

export const basinTakeoffSchema = z.object({
  surfaceAreaSqFt: n,
  perimeterFt: n,
  holeVolumeCuFt: n,
  waterVolumeGallons: n,
  floorAreaSqFt: n,
  shelfAreaSqFt: n,
  wallAreaSqFt: n,
  maxDepthFt: n,
});

export const linerPieceSchema = z.object({
  part: z.enum(['basin', 'stream', 'pond-free-basin']),
  index: z.number().int(),
  neededLengthFt: n,
  neededWidthFt: n,
  /** The common rule "dimension + 2 × max depth + overlap" (null where it does not apply). */
  ruleLengthFt: n.nullable(),
  ruleWidthFt: n.nullable(),
  panelWidthsFt: z.array(n),
  panelLengthFt: n,
  seamCount: z.number().int(),
  seamLengthFt: n,
  orderedAreaSqFt: n,
});

export const cautionSchema = z.object({
  code: z.string(),
  severity: z.enum(['warning', 'caution']),
  message: z.string(),
  /** Input field the caution is about, as a dotted path, when there is one. */
  field: z.string().nullable(),
});
export type Caution = z.infer<typeof cautionSchema>;

const operatingSchema = z.object({ flowGph: n, headFt: n, inputWatts: n });

export const takeoffSchema = z.object({
  unitSystem: z.enum(UNIT_SYSTEMS),
  basins: z.array(basinTakeoffSchema),
  water: z.object({
    surfaceAreaSqFt: n,
    holeVolumeCuFt: n,
    rockSolidCuFt: n,
    gravelSolidCuFt: n,
    volumeCuFt: n,
    volumeGallons: n,
  }),
  liner: z.object({
    pieces: z.array(linerPieceSchema),
    orderedAreaSqFt: n,
    underlaymentAreaSqFt: n,
    weightLb: n.nullable(),
  }),
  excavation: z.object({
    method: z.enum(['hand', 'machine']),
    bankCuYd: n,
    swellFactor: n,
    looseCuYd: n,
    massShortTons: n,
    haulVehicleId: z.string(),
    hauledLooseCuYd: n,
    haulLoads: z.number().int(),
    wheelbarrowTrips: z.number().int().nullable(),
  }),
  rock: z.object({
    bouldersShortTons: z.object({ small: n, medium: n, large: n, total: n }),
    reusedShortTons: n,
    bouldersToBuyShortTons: n,
    gravelBulkCuYd: n,
    gravelShortTons: n,
    reservoirFillShortTons: n,
  }),
  reservoir: z
    .object({
      fill: z.enum(['rock-gravel', 'storage-blocks']),
      voidFraction: n,
      capacityGallons: n,
      drainBackGallons: n,
      requiredGallons: n,
      adequate: z.boolean(),
      storageBlockVolumeCuFt: n.nullable(),
    })
    .nullable(),
  hydraulics: z
    .object({
      turnoverFlowGph: n,
      weirFlowGph: n,
      requiredFlowGph: n,
      staticHeadFt: n,
      lines: z.array(
        z.object({
          side: z.enum(['pressure', 'suction']),
          material: z.string(),
          nominalSizeIn: n,
          insideDiameterIn: n,
          chosen: z.enum(['auto', 'given']),
          lengthFt: n,
          equivalentLengthFt: n,
          velocityAtRequiredFtPerS: n,
          frictionHeadAtRequiredFt: n,
        }),
      ),
      totalDynamicHeadAtRequiredFt: n,
      candidates: z.array(
        z.object({
          pumpId: z.string(),
          label: z.string(),
          operating: operatingSchema.nullable(),
          meetsFlow: z.boolean(),
        }),
      ),
      best: z
        .object({
          pumpId: z.string(),
          label: z.string(),
          flowGph: n,
          headFt: n,
          inputWatts: n,
          hydraulicWatts: n,
          yearlyEnergyKwh: n,
        })
        .nullable(),
    })
    .nullable(),
  lighting: z
    .object({
      totalWatts: n,
      transformerSizeWatts: n,
      transformerCount: z.number().int(),
      loadPercent: n,
      runs: z.array(
        z.object({ currentAmps: n, voltageDropV: n, voltageAtLastFixtureV: n, dropPercent: n }),
      ),
    })
    .nullable(),
  labor: z.object({
    tasks: z.array(z.object({ task: z.enum(LABOR_TASKS), laborHours: n })),
    totalLaborHours: n,
    crewSize: z.number().int(),
    hoursPerDay: n,
    crewDays: n,
  }),
  cautions: z.array(cautionSchema),
  explanations: z.array(explanationSchema),
});

/** The takeoff: quantities with units in their names, cautions and "how it was computed". */
export type Takeoff = z.infer<typeof takeoffSchema>;

export type FieldError = { field: string; message: string };
export type TakeoffResult = { ok: true; takeoff: Takeoff } | { ok: false; errors: FieldError[] };
