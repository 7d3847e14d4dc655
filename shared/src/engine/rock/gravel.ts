import { CUBIC_FEET_PER_CUBIC_YARD, inchesToFeet, POUNDS_PER_SHORT_TON } from '../units/units';

/**
 * Gravel for a layer `depthIn` thick over `areaSqFt`: bulk yd³ = area × depth / 27, short tons = bulk
 * yd³ × bulk density (t/yd³, voids included). Not rounded. Source: REFERENCES 6.3 (1.4 t/yd³ default).
 */
export function gravelLayer(
  areaSqFt: number,
  depthIn: number,
  bulkShortTonsPerCuYd: number,
): { bulkCuYd: number; shortTons: number } {
  const bulkCuYd = (areaSqFt * inchesToFeet(depthIn)) / CUBIC_FEET_PER_CUBIC_YARD;
  return { bulkCuYd, shortTons: bulkCuYd * bulkShortTonsPerCuYd };
}

/**
 * Share of a loose gravel layer that is voids: 1 − bulk density / solid density. With 1.4 t/yd³
 * (2800 lb/yd³) and 165 lb/ft³ stone (4455 lb/yd³): 1 − 2800/4455 = 0.371. DERIVED from REFERENCES
 * 6.2 and 6.3.
 */
export function gravelVoidFraction(
  bulkShortTonsPerCuYd: number,
  stoneDensityLbPerCuFt: number,
): number {
  const bulkLbPerCuFt = (bulkShortTonsPerCuYd * POUNDS_PER_SHORT_TON) / CUBIC_FEET_PER_CUBIC_YARD;
  return Math.min(1, Math.max(0, 1 - bulkLbPerCuFt / stoneDensityLbPerCuFt));
}
