import { describe, expect, it } from 'vitest';
import { isLoadUnit, isLooseCubicYardUnit } from './disposal-loads';

describe('disposal units', () => {
  it('recognises loads however the crew writes them', () => {
    for (const unit of ['load', 'Loads', ' truck load ', 'truckloads', 'Dumpster load']) {
      expect(isLoadUnit(unit), unit).toBe(true);
    }
    for (const unit of ['cu yd', 'day', 'loader', 'short ton', '']) {
      expect(isLoadUnit(unit), unit).toBe(false);
    }
  });

  it('recognises loose cubic yards, but not bank cubic yards', () => {
    for (const unit of [
      'cu yd',
      'Cu. Yds',
      'yd³',
      'yd3',
      'CY',
      'cubic yards',
      'loose yd³',
      'LCY',
    ]) {
      expect(isLooseCubicYardUnit(unit), unit).toBe(true);
    }
    for (const unit of ['bcy', 'bank cu yd', 'cu ft', 'yd', 'load', 'short ton']) {
      expect(isLooseCubicYardUnit(unit), unit).toBe(false);
    }
  });
});
