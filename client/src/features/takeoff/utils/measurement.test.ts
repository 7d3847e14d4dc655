import { describe, expect, it } from 'vitest';
import { formatMeasurement, toShownValue, toUsValue, withUnit } from './measurement';

describe('measurement conversions', () => {
  it('shows a stored US value in metric, rounded for display only', () => {
    expect(toShownValue(15, 'ft', 'metric')).toBe(4.57);
    expect(toShownValue(12, 'in', 'metric')).toBe(30.5);
    expect(toShownValue(300, 'sqFt', 'metric')).toBe(27.87);
    expect(toShownValue(2, 'shortTon', 'metric')).toBe(1.81);
    expect(toShownValue(6.561679790026247, 'ft', 'us')).toBe(6.56);
  });

  it('converts a metric entry with the exact factors, unrounded', () => {
    expect(toUsValue(4.572, 'ft', 'metric')).toBeCloseTo(15, 12);
    expect(toUsValue(2.54, 'in', 'metric')).toBeCloseTo(1, 12);
    expect(toUsValue(0.9071847, 'shortTon', 'metric')).toBeCloseTo(1, 6);
    expect(toUsValue(15, 'ft', 'us')).toBe(15);
  });

  it('leaves cleared and half-typed entries as they are', () => {
    expect(toShownValue('', 'ft', 'metric')).toBe('');
    expect(toShownValue(undefined, 'ft', 'metric')).toBe('');
    expect(toUsValue('-', 'in', 'metric')).toBe('-');
  });

  it('labels and formats in the system’s unit', () => {
    expect(withUnit('Max depth (ft)', 'ft', 'metric')).toBe('Max depth (m)');
    expect(withUnit('Old liner to remove (ft²)', 'sqFt', 'metric')).toBe(
      'Old liner to remove (m²)',
    );
    expect(formatMeasurement(48, 'in', 'metric')).toBe('121.9 cm');
    expect(formatMeasurement(48, 'in', 'us')).toBe('48 in');
  });
});
