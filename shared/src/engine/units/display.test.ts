import { describe, expect, it } from 'vitest';
import { toDisplay } from './display';

describe('display in the chosen unit system', () => {
  it('shows gallons as litres in metric', () => {
    // NIST SP 811: 2244.16 gal × 3.785411784 = 8495.1 L
    expect(toDisplay(2244.16, 'gal', 'metric')).toEqual({ value: 8495, unit: 'L' });
    expect(toDisplay(2244.16, 'gal', 'us')).toEqual({ value: 2244, unit: 'gal' });
  });

  it('shows short tons as tonnes and feet of head as metres of head', () => {
    // 1.52 short tons × 0.90718474 = 1.379 t; 9.16 ft × 0.3048 = 2.79 m
    expect(toDisplay(1.52, 'shortTon', 'metric')).toEqual({ value: 1.38, unit: 't' });
    expect(toDisplay(9.16, 'headFt', 'metric')).toEqual({ value: 2.79, unit: 'm of head' });
  });

  it('shows gph as litres per minute', () => {
    // 2400 gph × 3.785411784 / 60 = 151.4 L/min
    expect(toDisplay(2400, 'gph', 'metric')).toEqual({ value: 151.4, unit: 'L/min' });
  });
});
