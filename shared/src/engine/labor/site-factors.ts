import type { EngineParameters } from '../parameters/parameters-schema';

/** Slope factor from the price book's bands: the first band whose upper limit covers the slope. */
export function slopeFactor(
  slopePct: number,
  bands: EngineParameters['labor']['slopeBands'],
): number {
  const sorted = [...bands].sort((a, b) => a.upToPct - b.upToPct);
  return (sorted.find((band) => slopePct <= band.upToPct) ?? sorted[sorted.length - 1]!).factor;
}

/**
 * Hand-carry factor on material handling: 1 + per-100-ft factor × (carry − base) / 100 beyond the base
 * distance; 1 when a machine carries. Common practice, no source.
 */
export function carryFactor(
  carryDistanceFt: number,
  handCarry: boolean,
  labor: EngineParameters['labor'],
): number {
  if (!handCarry) return 1;
  return (
    1 +
    (labor.carryFactorPer100FtBeyondBase * Math.max(0, carryDistanceFt - labor.carryBaseFt)) / 100
  );
}
