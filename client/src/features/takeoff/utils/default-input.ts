import type { TakeoffInput } from '@pondwright/shared/engine';

/**
 * A 15 × 10 ft pond with one plant shelf, a waterfall and a short stream, so the screen shows a
 * result before anything is typed. Same values as the engine's sample typical pond.
 */
export const DEFAULT_TAKEOFF_INPUT: TakeoffInput = {
  unitSystem: 'us',
  basins: [
    {
      outline: { shape: 'rectangle', lengthFt: 15, widthFt: 10 },
      maxDepthFt: 2,
      wallStyle: 'vertical',
      shelves: [{ widthIn: 12, depthIn: 10 }],
    },
  ],
  streams: [{ lengthFt: 9, widthFt: 4, dropFt: 2.5 }],
  waterfalls: [{ weirWidthIn: 24, sheet: 'medium' }],
  pondFreeBasin: null,
  pumpRun: {
    pipeMaterial: 'pvc-sch40',
    pressurePipeLengthFt: 40,
    pressurePipeSizeIn: 'auto',
    suctionPipeLengthFt: 0,
    suctionPipeSizeIn: 'auto',
    fittings: { elbow90: 3, elbow45: 0, tee: 0, checkValve: 1, valve: 0 },
    elevationFt: 3,
  },
  rock: {
    boulderMixPct: { small: 50, medium: 35, large: 15 },
    wallCoveragePct: 80,
    shelfCoveragePct: 50,
    streamEdgeCoveragePct: 100,
    floorGravelDepthIn: 2,
    shelfGravelDepthIn: 2,
    streamGravelDepthIn: 2,
  },
  lighting: [{ cableLengthFt: 50, gaugeAwg: '12', fixtureWatts: [20, 20, 20] }],
  site: {
    soil: 'loam',
    accessWidthIn: 48,
    carryDistanceFt: 60,
    slopePct: 3,
    excavationMethod: 'auto',
    haulVehicleId: 'dump-truck',
    spoilHauledPct: 100,
  },
  renovation: null,
  crew: { size: 3, hoursPerDay: 8 },
};

/** Parts added with the "add" buttons and switches start from these. */
export const NEW_PART = {
  basin: (): TakeoffInput['basins'][number] => ({
    outline: { shape: 'rectangle', lengthFt: 8, widthFt: 6 },
    maxDepthFt: 1.5,
    wallStyle: 'vertical',
    shelves: [],
  }),
  shelf: (previousDepthIn = 0) => ({ widthIn: 12, depthIn: previousDepthIn + 10 }),
  stream: (): TakeoffInput['streams'][number] => ({ lengthFt: 10, widthFt: 3, dropFt: 1 }),
  waterfall: (): TakeoffInput['waterfalls'][number] => ({ weirWidthIn: 18, sheet: 'medium' }),
  pondFreeBasin: (): NonNullable<TakeoffInput['pondFreeBasin']> => ({
    lengthFt: 6,
    widthFt: 5,
    depthFt: 2,
    fill: 'rock-gravel',
  }),
  pumpRun: (): NonNullable<TakeoffInput['pumpRun']> => ({ ...DEFAULT_TAKEOFF_INPUT.pumpRun! }),
  lightingRun: (): TakeoffInput['lighting'][number] => ({
    cableLengthFt: 40,
    gaugeAwg: '12',
    fixtureWatts: [20],
  }),
  renovation: (): NonNullable<TakeoffInput['renovation']> => ({
    basinsAlreadyExcavated: true,
    oldLinerAreaSqFt: 300,
    oldRockShortTons: 2,
    rockReusedPct: 50,
  }),
};
