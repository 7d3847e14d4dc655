import { describe, expect, it } from 'vitest';
import { defaultEngineParameters } from '../parameters/defaults';
import { equivalentLengthMultiplier, frictionFtPer100Ft, velocityFtPerS } from './hazen-williams';

const h = defaultEngineParameters.hydraulics;
const k = {
  constant: h.hazenWilliamsConstant,
  flowExponent: h.hazenWilliamsFlowExponent,
  diameterExponent: h.hazenWilliamsDiameterExponent,
};
// ASTM D1785 Sch 40 inside diameters, OD − 2 × min wall (REFERENCES 5.5)
const ID: Record<string, number> = {
  '1': 1.049,
  '1.25': 1.38,
  '1.5': 1.61,
  '2': 2.067,
  '3': 3.068,
  '4': 4.026,
};

describe('Hazen–Williams friction loss, Sch 40 PVC, C = 150', () => {
  it('50 gpm in 2-in pipe loses 3.99 ft per 100 ft (NFPA 13 form)', () => {
    // REFERENCES 5.1 worked example: 1044 form gives 3.988 (table 3.98)
    expect(frictionFtPer100Ft(50, ID['2']!, 150, k)).toBeCloseTo(3.988, 2);
  });

  // Illinois Administrative Code, Title 77, Part 906, Appendix A, Exhibit I "Friction Loss in
  // Schedule 40 Plastic Pipe, C = 150 (ft/100 ft)" (REFERENCES 5.4, confirmed). Tolerance ±2 %
  // (REFERENCES suggests ±2 %; the 1044 form is within 1.1 % of every row).
  const table: Array<[gpm: number, size: string, ftPer100: number]> = [
    [10, '1', 5.5],
    [10, '1.25', 1.46],
    [20, '1.5', 2.46],
    [20, '2', 0.74],
    [30, '2', 1.54],
    [50, '2', 3.98],
    [50, '3', 0.58],
    [100, '3', 2.09],
    [4, '1', 1.01],
  ];
  // Two rows printed with two significant figures sit a little farther off (REFERENCES 5.4 lists the
  // 1044-form value 0.562 against the printed 0.55, which is 2.2 %, not 1.1 % as its note says):
  // 10 gpm in 1½-in: 0.717 vs 0.70; 100 gpm in 4-in: 0.561 vs 0.55. Checked within 2.5 %.
  it('rows printed with two significant figures agree within 2.5 %', () => {
    expect(Math.abs(frictionFtPer100Ft(10, ID['1.5']!, 150, k) / 0.7 - 1)).toBeLessThan(0.025);
    expect(Math.abs(frictionFtPer100Ft(100, ID['4']!, 150, k) / 0.55 - 1)).toBeLessThan(0.025);
  });

  for (const [gpm, size, expected] of table) {
    it(`${gpm} gpm in ${size}-in pipe: ${expected} ft/100 ft within 2 %`, () => {
      const actual = frictionFtPer100Ft(gpm, ID[size]!, 150, k);
      expect(Math.abs(actual / expected - 1)).toBeLessThan(0.02);
    });
  }
});

describe('velocity and equivalent-length multiplier', () => {
  it('50 gpm in 2.067-in pipe runs 4.78 ft/s; 20 gpm in 1.610-in runs 3.15 ft/s', () => {
    // REFERENCES 5.6 (derived): V = 0.4085 · Q / d²
    expect(velocityFtPerS(50, 2.067)).toBeCloseTo(4.78, 2);
    expect(velocityFtPerS(20, 1.61)).toBeCloseTo(3.15, 2);
  });

  it('the NFPA 13 steel table (C = 120) scales by 1.51 for C = 150', () => {
    // REFERENCES 5.9: (150/120)^1.852 = 1.51; C = 140 → 1.33; C = 100 → 0.713
    expect(equivalentLengthMultiplier(150, 120, 1.852)).toBeCloseTo(1.51, 2);
    expect(equivalentLengthMultiplier(140, 120, 1.852)).toBeCloseTo(1.33, 2);
    expect(equivalentLengthMultiplier(100, 120, 1.852)).toBeCloseTo(0.713, 3);
  });
});
