import { z } from 'zod';

const positive = z.number().positive();
const nonNegative = z.number().nonnegative();
const fraction = z.number().min(0).max(1);

/** Soils the takeoff knows; each has a swell factor, a bank density and hand-digging rates. */
export const SOIL_TYPES = ['sand-gravel', 'loam', 'clay'] as const;
export const soilTypeSchema = z.enum(SOIL_TYPES, {
  error: `Choose one of: ${SOIL_TYPES.join(', ')}.`,
});
export type SoilType = z.infer<typeof soilTypeSchema>;

export const SHEET_STYLES = ['light', 'medium', 'heavy'] as const;
export const sheetStyleSchema = z.enum(SHEET_STYLES, {
  error: `Choose one of: ${SHEET_STYLES.join(', ')}.`,
});
export type SheetStyle = z.infer<typeof sheetStyleSchema>;

export const BOULDER_SIZES = ['small', 'medium', 'large'] as const;
export type BoulderSize = (typeof BOULDER_SIZES)[number];

export const FITTING_KINDS = ['elbow90', 'elbow45', 'tee', 'checkValve', 'valve'] as const;
export type FittingKind = (typeof FITTING_KINDS)[number];

const soilSchema = z.object({
  label: z.string(),
  swellFactor: z.number().min(1).max(2),
  bankDensityLbPerCuFt: positive,
  handDigLaborHoursPerBankCuYd: positive,
  handLoadLaborHoursPerBankCuYd: positive,
});

const pipeSchema = z.object({
  material: z.string().min(1),
  label: z.string(),
  nominalSizeIn: positive,
  insideDiameterIn: positive,
  hazenWilliamsC: positive,
});

const fittingRowSchema = z.object({
  nominalSizeIn: positive,
  elbow90: positive.nullable(),
  elbow45: positive.nullable(),
  tee: positive.nullable(),
  checkValve: positive.nullable(),
  valve: positive.nullable(),
});

const pumpPointSchema = z.object({
  flowGph: nonNegative,
  headFt: nonNegative,
  inputWatts: positive,
});

export const pumpSchema = z.object({
  id: z.string().min(1),
  label: z.string(),
  curve: z.array(pumpPointSchema).min(2),
});
export type PumpCandidate = z.infer<typeof pumpSchema>;

const haulVehicleSchema = z.object({
  id: z.string().min(1),
  label: z.string(),
  capacityLooseCuYd: positive,
  capacityShortTons: positive,
});

const slopeBandSchema = z.object({ upToPct: positive, factor: z.number().min(1) });

/** Every rate, density, catalogue and rule the engine uses. The price book supplies these later. */
export const engineParametersSchema = z.object({
  geometry: z.object({
    batterRunPerRise: z.number().positive().max(3),
    maxRockShareOfBasin: fraction,
    ovalPolygonSegments: z.number().int().min(16).max(1024),
  }),
  liner: z.object({
    overlapPerEdgeFt: nonNegative,
    sheetWidthsFt: z.array(positive).min(1),
    lengthStepFt: positive,
    seamOverlapFt: nonNegative,
    weightLbPerSqFt: positive.nullable(),
    streamAllowanceFt: nonNegative,
  }),
  rock: z.object({
    stoneDensityLbPerCuFt: positive,
    boulderShapeFactor: z.number().positive().max(1),
    boulderSizeIn: z.object({ small: positive, medium: positive, large: positive }),
    gravelBulkShortTonsPerCuYd: positive,
    streamEdgeBandFt: nonNegative,
    heavyStoneLb: positive,
  }),
  soils: z.object({ 'sand-gravel': soilSchema, loam: soilSchema, clay: soilSchema }),
  excavation: z.object({
    machineBankCuYdPerHour: positive,
    machineTrimLaborHoursPerBankCuYd: nonNegative,
    machineMinAccessWidthIn: positive,
    wheelbarrowLooseCuFtPerTrip: positive,
    wheelSpreadLaborHoursPerLooseCuYd: positive,
    wheelRateDistanceFt: positive,
    streamDigDepthIn: nonNegative,
    haulVehicles: z.array(haulVehicleSchema).min(1),
  }),
  hydraulics: z.object({
    hazenWilliamsConstant: positive,
    hazenWilliamsFlowExponent: positive,
    hazenWilliamsDiameterExponent: positive,
    fittingTableC: positive,
    maxPressureVelocityFtPerS: positive,
    maxSuctionVelocityFtPerS: positive,
    turnoversPerHour: positive,
    weirGphPerInch: z.object({ light: positive, medium: positive, heavy: positive }),
    pumpHoursPerYear: z.number().positive().max(8784),
    streamRunningDepthIn: nonNegative,
    reservoirSafetyFactor: z.number().min(1),
    storageBlockVoidFraction: fraction,
    pipes: z.array(pipeSchema).min(1),
    fittingEquivalentLengthsFt: z.array(fittingRowSchema).min(1),
    pumps: z.array(pumpSchema),
  }),
  lighting: z.object({
    secondaryVolts: positive,
    maxLoadFraction: z.number().positive().max(1),
    transformerSizesWatts: z.array(positive).min(1),
    minFixtureVolts: positive,
    maxCircuitAmps: positive,
    conductorOhmsPer1000Ft: z.record(z.string(), positive),
  }),
  labor: z.object({
    boulderHandLaborHoursPerShortTon: positive,
    boulderMachineLaborHoursPerShortTon: positive,
    gravelLaborHoursPerShortTon: positive,
    linerLaborHoursPer100SqFt: positive,
    seamLaborHoursPerFt: nonNegative,
    pipeLaborHoursPerFt: nonNegative,
    fittingLaborHoursEach: nonNegative,
    pumpSetLaborHours: nonNegative,
    fixtureLaborHoursEach: nonNegative,
    cableLaborHoursPerFt: nonNegative,
    transformerLaborHoursEach: nonNegative,
    cleanUpShareOfOtherHours: fraction,
    linerRemovalLaborHoursPer100SqFt: nonNegative,
    oldRockHandLaborHoursPerShortTon: nonNegative,
    oldRockMachineLaborHoursPerShortTon: nonNegative,
    carryFactorPer100FtBeyondBase: nonNegative,
    carryBaseFt: nonNegative,
    slopeBands: z.array(slopeBandSchema).min(1),
  }),
  cautions: z.object({
    barrierDepthIn: positive,
    protectiveSystemDepthFt: positive,
  }),
});

export type EngineParameters = z.infer<typeof engineParametersSchema>;
