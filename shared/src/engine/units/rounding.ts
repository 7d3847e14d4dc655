/**
 * Rounding policy for the takeoff. The engine keeps full precision in every intermediate step and
 * rounds only where a figure leaves the engine, with the rule stated in that figure's explanation.
 */

// Floating-point noise (e.g. 20.000000000000004) must not push a figure up to the next step.
const NOISE = 1e-9;

/** Rounds half away from zero to `decimals` places (0–6). */
export function roundTo(value: number, decimals: number): number {
  const factor = 10 ** decimals;
  const scaled = Math.abs(value) * factor;
  const rounded = Math.round(scaled + scaled * Number.EPSILON) / factor;
  return value < 0 ? -rounded : rounded;
}

/** Rounds up to the next multiple of `step` (> 0), ignoring floating-point noise below 1e-9 of a step. */
export function ceilToStep(value: number, step: number): number {
  return Math.ceil(value / step - NOISE) * step;
}

/** Whole count, rounded up (trips, loads, sheets), ignoring floating-point noise. */
export function ceilCount(value: number): number {
  return Math.max(0, Math.ceil(value - NOISE));
}
