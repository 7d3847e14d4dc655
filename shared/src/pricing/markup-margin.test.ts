import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { marginPercentSchema, marginToMarkupPct, markupToMarginPct } from './markup-margin';

// Arithmetic (TRADE.md, "Markup is not margin"): margin = markup ÷ (1 + markup) and
// markup = margin ÷ (1 − margin). Common practice for contractors' pricing; no other source needed.
describe('markup and margin', () => {
  it('turns markup into margin', () => {
    // 25 / 125 = 0.20; 50 / 150 = 0.3333…; 100 / 200 = 0.50.
    expect(markupToMarginPct('25')).toBe('20.00');
    expect(markupToMarginPct('50')).toBe('33.33');
    expect(markupToMarginPct('100')).toBe('50.00');
    expect(markupToMarginPct('0')).toBe('0.00');
    // 150 / 250 = 0.60 (a markup above 100 % is fine).
    expect(markupToMarginPct('150')).toBe('60.00');
    // 42.5 / 142.5 = 0.298245… → 29.82.
    expect(markupToMarginPct('42.5')).toBe('29.82');
  });

  it('turns margin into markup', () => {
    // 20 / 80 = 0.25; 33.33 / 66.67 = 0.49992… → 49.99; 50 / 50 = 1.
    expect(marginToMarkupPct('20')).toBe('25.00');
    expect(marginToMarkupPct('33.33')).toBe('49.99');
    expect(marginToMarkupPct('50')).toBe('100.00');
    expect(marginToMarkupPct('0')).toBe('0.00');
    // 90 / 10 = 9 → 900 %.
    expect(marginToMarkupPct('90')).toBe('900.00');
  });

  it('refuses a 100 % margin: no markup reaches it', () => {
    expect(marginPercentSchema.safeParse('100').success).toBe(false);
    expect(marginPercentSchema.safeParse('99.99').success).toBe(true);
    expect(() => marginToMarkupPct('100')).toThrow(RangeError);
    expect(() => marginToMarkupPct('-5')).toThrow(RangeError);
    expect(() => markupToMarginPct('abc')).toThrow(RangeError);
  });

  it('a margin is always below 100 % and below the markup it comes from', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 100_000 }), (hundredths) => {
        const markup = (hundredths / 100).toFixed(2);
        const margin = Number(markupToMarginPct(markup));
        expect(margin).toBeLessThan(100);
        expect(margin).toBeLessThanOrEqual(Number(markup));
      }),
    );
  });

  it('whole-number markups come back within a cent of a percent after a round trip', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 400 }), (markup) => {
        const back = Number(marginToMarkupPct(markupToMarginPct(String(markup))));
        // The margin is rounded to 0.01 %; at 400 % markup d(markup)/d(margin) = 25, so the error
        // can reach 0.005 × 25 = 0.125 points.
        expect(Math.abs(back - markup)).toBeLessThanOrEqual(0.13);
      }),
    );
  });
});
