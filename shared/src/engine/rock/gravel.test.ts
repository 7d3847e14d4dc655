import { describe, expect, it } from 'vitest';
import { gravelLayer, gravelVoidFraction } from './gravel';

describe('gravel', () => {
  it('2 in over 176 ft² is 1.086 yd³ = 1.52 tons at 1.4 t/yd³', () => {
    // Quarry weights table, 1.4 t/yd³ trade default (REFERENCES 6.3, confirmed secondary):
    // 176 × 2/12 = 29.33 ft³ = 1.086 yd³ × 1.4 = 1.52 tons
    const g = gravelLayer(176, 2, 1.4);
    expect(g.bulkCuYd).toBeCloseTo(1.086, 3);
    expect(g.shortTons).toBeCloseTo(1.52, 2);
  });

  it('1 ton covers 115.7 ft² at 2 in and 77.1 ft² at 3 in', () => {
    // REFERENCES 6.3 coverage check (a supplier chart says 77–86 ft² at 3 in)
    expect(gravelLayer(115.7, 2, 1.4).shortTons).toBeCloseTo(1, 3);
    expect(gravelLayer(77.1, 3, 1.4).shortTons).toBeCloseTo(1, 2);
  });

  it('loose gravel is about 37 % voids', () => {
    // DERIVED from REFERENCES 6.2 and 6.3: 1 − 2800 / (165 × 27) = 1 − 2800/4455 = 0.37149
    expect(gravelVoidFraction(1.4, 165)).toBeCloseTo(0.37149, 5);
  });
});
