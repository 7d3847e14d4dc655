import { describe, expect, it } from 'vitest';
import { lengthLabel } from './length-label';

describe('lengthLabel', () => {
  it('shows feet and inches as entered in US units', () => {
    expect(lengthLabel(15, 'ft', 'us')).toBe('15 ft');
    expect(lengthLabel(10, 'in', 'us')).toBe('10 in');
  });

  it('converts to metres and centimetres in metric units', () => {
    expect(lengthLabel(15, 'ft', 'metric')).toBe('4.57 m');
    expect(lengthLabel(10, 'in', 'metric')).toBe('25.4 cm');
  });
});
