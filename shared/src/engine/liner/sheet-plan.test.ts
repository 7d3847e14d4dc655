import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { planSheets } from './sheet-plan';

const WIDTHS = [10, 15, 20, 25, 30, 35, 40, 45, 50];

describe('ordering liner sheets', () => {
  it('16 × 21 ft rounds up to a 20 × 25 ft sheet (500 ft²)', () => {
    // Stock rounding in 5-ft steps, common practice (REFERENCES 3.3)
    const plan = planSheets(21, 16, WIDTHS, 5, 0.5);
    expect(plan.orderedAreaSqFt).toBe(500);
    expect(plan.seamCount).toBe(0);
  });

  it('a stream liner of 19 × 14 ft is ordered 15 × 20 ft', () => {
    // REFERENCES 3.6 worked example, common practice
    const plan = planSheets(19, 14, WIDTHS, 5, 0.5);
    expect(plan.panelWidthsFt).toEqual([15]);
    expect(plan.panelLengthFt).toBe(20);
  });

  it('plans seams when both dimensions are wider than the widest sheet', () => {
    // Hand: needed 80 × 62 ft, widest sheet 50 ft, 0.5 ft seam overlap. Across 62: 50 + last panel
    // ≥ 62 − 50 + 0.5 = 12.5 → 15 ft; 65 ft wide × 80 ft long = 5200 ft². Across 80: 50 + ≥ 30.5 → 35;
    // 85 × 65 (62 → 65) = 5525 ft². The first wins: panels 50 + 15, one seam of 80 ft.
    const plan = planSheets(80, 62, WIDTHS, 5, 0.5);
    expect(plan.panelWidthsFt).toEqual([50, 15]);
    expect(plan.panelLengthFt).toBe(80);
    expect(plan.seamCount).toBe(1);
    expect(plan.seamLengthFt).toBe(80);
    expect(plan.orderedAreaSqFt).toBe(5200);
  });

  it('never orders less than needed, and more need never orders less (property)', () => {
    const dim = fc.double({ min: 1, max: 200, noNaN: true });
    fc.assert(
      fc.property(
        dim,
        dim,
        fc.double({ min: 0, max: 20, noNaN: true }),
        fc.double({ min: 0, max: 20, noNaN: true }),
        (l, w, dl, dw) => {
          const a = planSheets(l, w, WIDTHS, 5, 0.5);
          const b = planSheets(l + dl, w + dw, WIDTHS, 5, 0.5);
          const covered = a.panelWidthsFt.reduce((s, x) => s + x, 0) - a.seamCount * 0.5;
          const fits =
            (covered >= w - 1e-9 && a.panelLengthFt >= l - 1e-9) ||
            (covered >= l - 1e-9 && a.panelLengthFt >= w - 1e-9);
          return fits && b.orderedAreaSqFt >= a.orderedAreaSqFt - 1e-9;
        },
      ),
    );
  });
});
