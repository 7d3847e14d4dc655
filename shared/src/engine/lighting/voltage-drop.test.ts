import { describe, expect, it } from 'vitest';
import { defaultEngineParameters } from '../parameters/defaults';
import { lightingRun, twoWireVoltageDrop } from './voltage-drop';

const ohms = defaultEngineParameters.lighting.conductorOhmsPer1000Ft;

describe('conductor resistance', () => {
  it('holds NEC Chapter 9 Table 8 values for stranded copper', () => {
    // NFPA 70 (NEC) Chapter 9, Table 8, uncoated copper at 75 °C, stranded (REFERENCES 7.1, confirmed)
    expect(ohms).toMatchObject({
      '16': 4.99,
      '14': 3.14,
      '12': 1.98,
      '10': 1.24,
      '8': 0.778,
      '6': 0.491,
      '18': 7.95,
    });
  });
});

describe('two-wire voltage drop', () => {
  it('120 V pump, 8 A, 100 ft of 12 AWG stranded drops 3.17 V (2.64 %)', () => {
    // REFERENCES 7.2 (a): 2 · 100 · 8 · 1.98 / 1000 = 3.168 V
    const vd = twoWireVoltageDrop(100, 8, ohms['12']!);
    expect(vd).toBeCloseTo(3.17, 2);
    expect((vd / 120) * 100).toBeCloseTo(2.64, 2);
  });

  it('12 V run, one 120 W load at the end of 50 ft of 10 AWG drops 1.24 V (10.3 %)', () => {
    // REFERENCES 7.2 (b): 2 · 50 · 10 · 1.24 / 1000 = 1.24 V
    const run = lightingRun({ cableLengthFt: 50, fixtureWatts: [120] }, 12, ohms['10']!);
    expect(run.voltageDropV).toBeCloseTo(1.24, 9);
    expect(run.dropPercent).toBeCloseTo(10.33, 2);
    expect(run.voltageAtLastFixtureV).toBeCloseTo(10.76, 9);
  });

  it('evenly spaced fixtures: three 20 W on 60 ft of 12 AWG', () => {
    // Hand: segments of 20 ft carry 60, 40, 20 W → 5, 3.333, 1.667 A at 12 V;
    // VD = 2 · 20 · 1.98 / 1000 × (5 + 3.333 + 1.667) = 0.0792 × 10 = 0.792 V → 11.208 V at the last
    const run = lightingRun({ cableLengthFt: 60, fixtureWatts: [20, 20, 20] }, 12, ohms['12']!);
    expect(run.voltageDropV).toBeCloseTo(0.792, 9);
    expect(run.currentAmps).toBe(5);
  });
});
