import { describe, expect, it } from 'vitest';
import type { PumpCandidate } from '../parameters/parameters-schema';
import { operatingPoint, pumpAt } from './pump-curve';

// Made-up test curve (not a product): a straight line from 20 ft at 0 gph to 0 ft at 4000 gph.
const line: PumpCandidate = {
  id: 'test',
  label: 'Test pump',
  curve: [
    { flowGph: 0, headFt: 20, inputWatts: 300 },
    { flowGph: 4000, headFt: 0, inputWatts: 200 },
  ],
};

describe('pump curve', () => {
  it('interpolates head and power linearly between points', () => {
    // Hand: at 1000 gph, head 20 − 20 × 1000/4000 = 15 ft; power 300 − 100 × 0.25 = 275 W
    expect(pumpAt(line, 1000)).toEqual({ headFt: 15, inputWatts: 275 });
    expect(pumpAt(line, 5000)).toBeNull();
  });

  it('meets a linear system curve where the two lines cross', () => {
    // System H = 4 + 0.002·Q. Pump H = 20 − 0.005·Q. 20 − 0.005Q = 4 + 0.002Q → Q = 16/0.007 = 2285.71
    // gph, H = 8.571 ft; power 300 − 100 × 2285.71/4000 = 242.86 W (hand)
    const op = operatingPoint(line, (q) => 4 + 0.002 * q)!;
    expect(op.flowGph).toBeCloseTo(2285.71, 1);
    expect(op.headFt).toBeCloseTo(8.571, 2);
    expect(op.inputWatts).toBeCloseTo(242.86, 1);
  });

  it('has no operating point when static lift exceeds the shut-off head', () => {
    expect(operatingPoint(line, (q) => 21 + 0.001 * q)).toBeNull();
  });
});
