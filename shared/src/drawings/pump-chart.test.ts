import { describe, expect, it } from 'vitest';
import { typicalPond } from '../engine/fixtures/sample-inputs';
import { defaultEngineParameters } from '../engine/parameters/defaults';
import { computeTakeoff } from '../engine/takeoff/compute-takeoff';
import { niceStep, pumpChartData } from './pump-chart';

const result = computeTakeoff(typicalPond(), defaultEngineParameters);
if (!result.ok) throw new Error('the typical pond computes');
const takeoff = result.takeoff;

describe('pumpChartData', () => {
  const chart = pumpChartData(takeoff)!;
  const h = takeoff.hydraulics!;

  it('has one curve per candidate and marks the best', () => {
    expect(chart.candidates.map((c) => c.pumpId)).toEqual(h.candidates.map((c) => c.pumpId));
    expect(chart.candidates.filter((c) => c.best).map((c) => c.pumpId)).toEqual([h.best!.pumpId]);
  });

  it('starts the system curve at the static head and passes through the head at the required flow', () => {
    expect(chart.system[0]).toEqual({ flowGph: 0, headFt: h.staticHeadFt });
    const exponent = defaultEngineParameters.hydraulics.hazenWilliamsFlowExponent;
    const atRequired =
      h.staticHeadFt +
      (h.totalDynamicHeadAtRequiredFt - h.staticHeadFt) *
        (h.requiredFlowGph / h.requiredFlowGph) ** exponent;
    expect(atRequired).toBeCloseTo(h.totalDynamicHeadAtRequiredFt, 9);
  });

  it('puts every operating point on the chart', () => {
    for (const c of chart.candidates) {
      if (!c.operating) continue;
      expect(c.operating.flowGph).toBeLessThanOrEqual(chart.maxFlowGph);
      expect(c.operating.headFt).toBeLessThanOrEqual(chart.maxHeadFt);
    }
  });

  it('is null without a pump run', () => {
    expect(pumpChartData({ ...takeoff, hydraulics: null })).toBeNull();
  });
});

describe('niceStep', () => {
  it('rounds a step up to 1, 2, 2.5 or 5 × 10ⁿ', () => {
    expect(niceStep(3000, 5)).toBe(1000);
    expect(niceStep(17, 4)).toBe(5);
    expect(niceStep(0, 4)).toBe(1);
  });
});
