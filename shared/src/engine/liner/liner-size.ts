import type { BasinProfile } from '../basin/basin-profile';

export type LinerSize = {
  /** From the unfolded cross-section plus the overlap on each side, ft. */
  neededLengthFt: number;
  neededWidthFt: number;
  /** The common rule "dimension + 2 × max depth + 2 × overlap", ft, shown beside it. */
  ruleLengthFt: number;
  ruleWidthFt: number;
};

/**
 * Liner size of a basin from its unfolded cross-section: across the basin the liner runs up the walls
 * (slope length), over each shelf and across the floor, so needed = L − 2 × (floor inset) + 2 × (wall
 * slope lengths + shelf widths) + 2 × overlap. With vertical walls this equals the common rule
 * L + 2·D + 2·overlap; battered walls need a little less. ft; not rounded (stock rounding is separate).
 * Source: geometry; the rule is common practice, no source (REFERENCES 3.1).
 */
export function basinLinerSize(profile: BasinProfile, overlapPerEdgeFt: number): LinerSize {
  const floorInset = profile.tiers[profile.tiers.length - 1]!.bottomInsetFt;
  const extra = 2 * (profile.drapeOneSideFt - floorInset) + 2 * overlapPerEdgeFt;
  const rule = 2 * profile.maxDepthFt + 2 * overlapPerEdgeFt;
  return {
    neededLengthFt: profile.lengthFt + extra,
    neededWidthFt: profile.widthFt + extra,
    ruleLengthFt: profile.lengthFt + rule,
    ruleWidthFt: profile.widthFt + rule,
  };
}

/**
 * Stream liner by the trade rule: (length + 2 × drop + allowance) × (width + 2 × drop + allowance), ft.
 * Common practice, no source (REFERENCES 3.6); the allowance (default 5 ft) is a parameter.
 */
export function streamLinerSize(
  stream: { lengthFt: number; widthFt: number; dropFt: number },
  allowanceFt: number,
): { neededLengthFt: number; neededWidthFt: number } {
  return {
    neededLengthFt: stream.lengthFt + 2 * stream.dropFt + allowanceFt,
    neededWidthFt: stream.widthFt + 2 * stream.dropFt + allowanceFt,
  };
}

/** Liner of a plain box (a pond-free waterfall's basin): L + 2·D + 2·overlap by W + 2·D + 2·overlap, ft. */
export function boxLinerSize(
  box: { lengthFt: number; widthFt: number; depthFt: number },
  overlapPerEdgeFt: number,
): { neededLengthFt: number; neededWidthFt: number } {
  const extra = 2 * box.depthFt + 2 * overlapPerEdgeFt;
  return { neededLengthFt: box.lengthFt + extra, neededWidthFt: box.widthFt + extra };
}
