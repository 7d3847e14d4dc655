import { examplePondInput, type TakeoffInput } from '@pondwright/shared/engine';

/**
 * A 15 × 10 ft pond with one plant shelf, a waterfall and a short stream, so the screen shows a
 * result before anything is typed: the engine's own example pond.
 */
export const DEFAULT_TAKEOFF_INPUT: TakeoffInput = examplePondInput();

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
