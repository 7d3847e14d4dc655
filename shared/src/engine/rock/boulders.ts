import { BOULDER_SIZES, type BoulderSize } from '../parameters/parameters-schema';
import { inchesToFeet, POUNDS_PER_SHORT_TON } from '../units/units';

export type BoulderRules = {
  stoneDensityLbPerCuFt: number;
  boulderShapeFactor: number;
  boulderSizeIn: Record<BoulderSize, number>;
};

export type BoulderLayer = {
  /** Short tons by size class. */
  shortTons: Record<BoulderSize, number>;
  totalShortTons: number;
  /** Solid stone volume, ft³ (what it displaces under water). */
  solidCuFt: number;
};

/**
 * Boulders covering `coveredAreaSqFt` as one layer, split by the size mix (percent by covered area).
 * Each class forms a layer as thick as its nominal size s; stone fills `shapeFactor` of that layer:
 * tons = area × share × s × shapeFactor × density / 2000. ft², in, lb/ft³ in; short tons and ft³ out;
 * not rounded. Sources: density ASCE 7 Table C3-2 (REFERENCES 6.2, from memory); shape factor 0.52
 * derived (REFERENCES 9.7); size classes common practice.
 */
export function boulderLayer(
  coveredAreaSqFt: number,
  mixPct: Record<BoulderSize, number>,
  rules: BoulderRules,
): BoulderLayer {
  const shortTons = { small: 0, medium: 0, large: 0 } as Record<BoulderSize, number>;
  let solidCuFt = 0;
  for (const size of BOULDER_SIZES) {
    const solid =
      coveredAreaSqFt *
      (mixPct[size] / 100) *
      inchesToFeet(rules.boulderSizeIn[size]) *
      rules.boulderShapeFactor;
    solidCuFt += solid;
    shortTons[size] = (solid * rules.stoneDensityLbPerCuFt) / POUNDS_PER_SHORT_TON;
  }
  return {
    shortTons,
    totalShortTons: shortTons.small + shortTons.medium + shortTons.large,
    solidCuFt,
  };
}

/** Weight of one stone of nominal size s (in): s³ × shape factor × density, lb. REFERENCES 6.2, 9.7. */
export function stoneWeightLb(
  sizeIn: number,
  rules: Pick<BoulderRules, 'stoneDensityLbPerCuFt' | 'boulderShapeFactor'>,
): number {
  return inchesToFeet(sizeIn) ** 3 * rules.boulderShapeFactor * rules.stoneDensityLbPerCuFt;
}
