import { describe, expect, it } from 'vitest';
import { defaultEngineParameters } from '../parameters/defaults';
import { requiredFlow } from './required-flow';

const rates = defaultEngineParameters.hydraulics.weirGphPerInch;

describe('required flow', () => {
  it('a 24-in weir needs 1200 / 2400 / 4800 gph for a light / medium / heavy sheet', () => {
    // Trade publication tech tip, common practice (REFERENCES 4.2): 50 / 100 / 200 gph per inch
    for (const [sheet, gph] of [
      ['light', 1200],
      ['medium', 2400],
      ['heavy', 4800],
    ] as const) {
      expect(
        requiredFlow({
          pondGallons: 0,
          turnoversPerHour: 1,
          waterfalls: [{ weirWidthIn: 24, sheet }],
          weirGphPerInch: rates,
        }).requiredGph,
      ).toBe(gph);
    }
  });

  it('a 2244-gal pond needs at least 2244 gph for one turnover an hour', () => {
    // Common practice, no source (REFERENCES 4.1)
    const f = requiredFlow({
      pondGallons: 2244,
      turnoversPerHour: 1,
      waterfalls: [{ weirWidthIn: 12, sheet: 'medium' }],
      weirGphPerInch: rates,
    });
    expect(f).toEqual({ turnoverGph: 2244, weirGph: 1200, requiredGph: 2244 });
  });

  it('two falls fed side by side add up', () => {
    // Hand: 24 × 100 + 12 × 50 = 3000 gph
    expect(
      requiredFlow({
        pondGallons: 500,
        turnoversPerHour: 1,
        waterfalls: [
          { weirWidthIn: 24, sheet: 'medium' },
          { weirWidthIn: 12, sheet: 'light' },
        ],
        weirGphPerInch: rates,
      }).requiredGph,
    ).toBe(3000);
  });
});
