import type { PumpCandidate } from '../parameters/parameters-schema';

/** A system curve: head needed (ft) at a flow (gph). Must rise with flow. */
export type SystemCurve = (flowGph: number) => number;

export type OperatingPoint = { flowGph: number; headFt: number; inputWatts: number };

function sortedCurve(pump: PumpCandidate) {
  return [...pump.curve].sort((a, b) => a.flowGph - b.flowGph);
}

/**
 * Pump head (ft) and input power (W) at a flow (gph), linearly interpolated between catalogue
 * points; null beyond the last point. Not rounded.
 */
export function pumpAt(
  pump: PumpCandidate,
  flowGph: number,
): { headFt: number; inputWatts: number } | null {
  const curve = sortedCurve(pump);
  const first = curve[0]!;
  if (flowGph <= first.flowGph) return { headFt: first.headFt, inputWatts: first.inputWatts };
  for (let i = 1; i < curve.length; i++) {
    const a = curve[i - 1]!;
    const b = curve[i]!;
    if (flowGph <= b.flowGph) {
      const f = b.flowGph === a.flowGph ? 1 : (flowGph - a.flowGph) / (b.flowGph - a.flowGph);
      return {
        headFt: a.headFt + f * (b.headFt - a.headFt),
        inputWatts: a.inputWatts + f * (b.inputWatts - a.inputWatts),
      };
    }
  }
  return null;
}

/**
 * Where the pump's curve (interpolated from catalogue points) meets the system curve: the flow at
 * which pump head = system head, found by bisection to 0.01 gph. Null when the pump cannot lift the
 * water at all (its shut-off head is at or below the system head at zero flow). gph, ft, W; not
 * rounded.
 */
export function operatingPoint(pump: PumpCandidate, system: SystemCurve): OperatingPoint | null {
  const curve = sortedCurve(pump);
  const maxFlow = curve[curve.length - 1]!.flowGph;
  const gap = (q: number) => (pumpAt(pump, q)?.headFt ?? 0) - system(q);
  if (gap(0) <= 0) return null;
  if (gap(maxFlow) >= 0) {
    const end = pumpAt(pump, maxFlow)!;
    return { flowGph: maxFlow, headFt: end.headFt, inputWatts: end.inputWatts };
  }
  let lo = 0;
  let hi = maxFlow;
  while (hi - lo > 0.01) {
    const mid = (lo + hi) / 2;
    if (gap(mid) > 0) lo = mid;
    else hi = mid;
  }
  const flowGph = (lo + hi) / 2;
  const at = pumpAt(pump, flowGph)!;
  return { flowGph, headFt: system(flowGph), inputWatts: at.inputWatts };
}
