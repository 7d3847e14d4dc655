import { defaultEngineParameters } from '../engine/parameters/defaults';
import type { PumpCandidate } from '../engine/parameters/parameters-schema';
import type { Takeoff } from '../engine/schemas/takeoff-output';

export type FlowHeadPoint = { flowGph: number; headFt: number };

export type PumpChartSeries = {
  pumpId: string;
  label: string;
  best: boolean;
  meetsFlow: boolean;
  curve: FlowHeadPoint[];
  operating: FlowHeadPoint | null;
};

export type PumpChartData = {
  candidates: PumpChartSeries[];
  /** The system curve sampled from zero flow to `maxFlowGph`, cut where it leaves the chart. */
  system: FlowHeadPoint[];
  requiredFlowGph: number;
  maxFlowGph: number;
  maxHeadFt: number;
  flowTicksGph: number[];
  headTicksFt: number[];
};

/** A round step (1, 2, 2.5 or 5 × 10ⁿ) giving about `ticks` divisions of `range`. */
export function niceStep(range: number, ticks: number): number {
  if (!(range > 0)) return 1;
  const raw = range / ticks;
  const power = 10 ** Math.floor(Math.log10(raw));
  return ([1, 2, 2.5, 5, 10].find((s) => s * power >= raw) ?? 10) * power;
}

/**
 * The pump chart of a takeoff: each candidate's catalogue curve, the system curve, the required flow
 * and the operating points, gph and ft of head. The takeoff keeps only the system's static head and
 * its total head at the required flow, so the curve is rebuilt as static + friction × (Q / Q_req)^n
 * with n the Hazen–Williams flow exponent (friction scales so exactly). Curves come from `pumps` (the
 * catalogue the takeoff used); candidates not in it are left out. Null without hydraulics.
 */
export function pumpChartData(
  takeoff: Takeoff,
  pumps: readonly PumpCandidate[] = defaultEngineParameters.hydraulics.pumps,
  flowExponent: number = defaultEngineParameters.hydraulics.hazenWilliamsFlowExponent,
  samples = 40,
): PumpChartData | null {
  const h = takeoff.hydraulics;
  if (!h) return null;
  const candidates = h.candidates.flatMap((c) => {
    const pump = pumps.find((p) => p.id === c.pumpId);
    if (!pump || pump.curve.length < 2) return [];
    const curve = [...pump.curve]
      .sort((a, b) => a.flowGph - b.flowGph)
      .map((p) => ({ flowGph: p.flowGph, headFt: p.headFt }));
    return [
      {
        pumpId: c.pumpId,
        label: c.label,
        best: c.pumpId === h.best?.pumpId,
        meetsFlow: c.meetsFlow,
        curve,
        operating: c.operating
          ? { flowGph: c.operating.flowGph, headFt: c.operating.headFt }
          : null,
      },
    ];
  });
  const maxFlowGph = Math.max(
    h.requiredFlowGph,
    ...candidates.flatMap((c) => c.curve.map((p) => p.flowGph)),
  );
  const flowStep = niceStep(maxFlowGph, 5);
  const chartFlowGph = Math.ceil(maxFlowGph / flowStep) * flowStep;
  const topHeadFt =
    Math.max(
      h.totalDynamicHeadAtRequiredFt,
      ...candidates.flatMap((c) => c.curve.map((p) => p.headFt)),
    ) * 1.05;
  const headStep = niceStep(topHeadFt, 4);
  const maxHeadFt = Math.ceil(topHeadFt / headStep) * headStep;
  const frictionFt = h.totalDynamicHeadAtRequiredFt - h.staticHeadFt;
  const systemHead = (q: number) =>
    h.staticHeadFt +
    (h.requiredFlowGph > 0 ? frictionFt * (q / h.requiredFlowGph) ** flowExponent : 0);
  const system = Array.from({ length: samples + 1 }, (_, i) => (chartFlowGph * i) / samples)
    .map((flowGph) => ({ flowGph, headFt: systemHead(flowGph) }))
    .filter((p) => p.headFt <= maxHeadFt);
  const ticks = (max: number, step: number) =>
    Array.from({ length: Math.round(max / step) + 1 }, (_, i) => Math.round(i * step * 1e9) / 1e9);
  return {
    candidates,
    system,
    requiredFlowGph: h.requiredFlowGph,
    maxFlowGph: chartFlowGph,
    maxHeadFt,
    flowTicksGph: ticks(chartFlowGph, flowStep),
    headTicksFt: ticks(maxHeadFt, headStep),
  };
}
