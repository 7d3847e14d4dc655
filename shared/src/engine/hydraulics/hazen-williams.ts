/** Hazen–Williams constants: h[ft/100 ft] = k · (Q[gpm] / C)^m / d[in]^n. */
export type HazenWilliamsConstants = {
  constant: number;
  flowExponent: number;
  diameterExponent: number;
};

/**
 * Friction loss in ft of head per 100 ft of pipe by Hazen–Williams, NFPA 13 form:
 * h = 1044 · (Q/C)^1.852 / d^4.8655, with Q in US gpm, C the roughness coefficient and d the INSIDE
 * diameter in inches. Not rounded. Source: NFPA 13 / pump-handbook appendix (REFERENCES 5.1).
 */
export function frictionFtPer100Ft(
  flowGpm: number,
  insideDiameterIn: number,
  c: number,
  k: HazenWilliamsConstants,
): number {
  if (flowGpm <= 0) return 0;
  return (k.constant * (flowGpm / c) ** k.flowExponent) / insideDiameterIn ** k.diameterExponent;
}

/**
 * Mean velocity in a full pipe, ft/s: V = 0.4085 · Q[gpm] / d[in]², i.e. Q / (π d²/4) with
 * 1 gal = 231 in³. Not rounded. DERIVED (REFERENCES 5.6).
 */
export function velocityFtPerS(flowGpm: number, insideDiameterIn: number): number {
  const cubicInchesPerSecond = (flowGpm * 231) / 60;
  const areaSqIn = (Math.PI * insideDiameterIn ** 2) / 4;
  return cubicInchesPerSecond / areaSqIn / 12;
}

/**
 * Multiplier that converts an equivalent length from a table made for pipe of roughness `tableC` to
 * pipe of roughness `pipeC`: (pipeC / tableC)^1.852. For PVC (150) with the NFPA 13 steel table (120)
 * this is 1.51. DERIVED (REFERENCES 5.9).
 */
export function equivalentLengthMultiplier(
  pipeC: number,
  tableC: number,
  flowExponent: number,
): number {
  return (pipeC / tableC) ** flowExponent;
}
