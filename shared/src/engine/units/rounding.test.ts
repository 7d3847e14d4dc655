import { describe, expect, it } from 'vitest';
import { ceilCount, ceilToStep, roundTo } from './rounding';

describe('rounding policy', () => {
  it('rounds half away from zero, including values stored just below the half', () => {
    expect(roundTo(1.005, 2)).toBe(1.01);
    expect(roundTo(2.5, 0)).toBe(3);
    expect(roundTo(-2.5, 0)).toBe(-3);
    expect(roundTo(1325.7, 0)).toBe(1326);
  });

  it('rounds up to a step without letting floating-point noise add a step', () => {
    expect(ceilToStep(21, 5)).toBe(25);
    expect(ceilToStep(20, 5)).toBe(20);
    expect(ceilToStep(20.000000000004, 5)).toBe(20);
    expect(ceilToStep(20.01, 5)).toBe(25);
  });

  it('counts up to whole loads and trips', () => {
    expect(ceilCount(1.398)).toBe(2);
    expect(ceilCount(2)).toBe(2);
    expect(ceilCount(0)).toBe(0);
  });
});
