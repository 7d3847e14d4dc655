// The takeoff engine: pure functions from a water feature's dimensions to quantities.
export { computeTakeoff } from './takeoff/compute-takeoff';
export { validateInput, toFieldErrors, type EngineGeometry } from './takeoff/validate-input';
export { needsPolygonLibrary, type PolygonInset } from './geometry/plan-shape';
export {
  takeoffInputSchema,
  outlineSchema,
  basinSchema,
  shelfSchema,
  streamSchema,
  waterfallSchema,
  pondFreeBasinSchema,
  pumpRunSchema,
  rockSchema,
  lightingRunSchema,
  siteSchema,
  renovationSchema,
  crewSchema,
  CABLE_GAUGES_AWG,
  INPUT_LIMITS,
  type TakeoffInput,
  type BasinInput,
  type OutlineInput,
  type PumpRunInput,
} from './schemas/takeoff-input';
export {
  takeoffSchema,
  basinTakeoffSchema,
  linerPieceSchema,
  cautionSchema,
  type Takeoff,
  type TakeoffResult,
  type FieldError,
  type Caution,
} from './schemas/takeoff-output';
export { explanationSchema, type Explanation } from './explain/explanation';
export {
  engineParametersSchema,
  pumpSchema,
  SOIL_TYPES,
  SHEET_STYLES,
  BOULDER_SIZES,
  FITTING_KINDS,
  type EngineParameters,
  type SoilType,
  type SheetStyle,
  type BoulderSize,
  type PumpCandidate,
} from './parameters/parameters-schema';
export { defaultEngineParameters } from './parameters/defaults';
export * from './units/units';
export { roundTo, ceilToStep, ceilCount } from './units/rounding';
export {
  toDisplay,
  UNIT_SYSTEMS,
  QUANTITY_KINDS,
  type UnitSystem,
  type QuantityKind,
} from './units/display';
export { LABOR_TASKS, type LaborTask } from './labor/labor-hours';
/** A typical naturally balanced pond (15 × 10 ft, one shelf, a waterfall and a short stream) to start from. */
export { typicalPond as examplePondInput } from './fixtures/sample-inputs';
