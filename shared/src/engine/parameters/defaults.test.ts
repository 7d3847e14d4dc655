import { describe, expect, it } from 'vitest';
import { defaultEngineParameters as P } from './defaults';
import { engineParametersSchema } from './parameters-schema';

describe('default parameters', () => {
  it('satisfy their own schema', () => {
    expect(engineParametersSchema.safeParse(P).success).toBe(true);
  });

  it('carry the published swell factors and densities', () => {
    // US Army FM 5-434, Table 1-2 (REFERENCES 6.5): sand 1.11 (confirmed secondary), loam 1.25, clay 1.43
    // (from memory)
    expect([
      P.soils['sand-gravel'].swellFactor,
      P.soils.loam.swellFactor,
      P.soils.clay.swellFactor,
    ]).toEqual([1.11, 1.25, 1.43]);
    // Quarry table, earth damp packed 2592 lb/yd³ = 96 lb/ft³ (REFERENCES 6.4, confirmed secondary)
    expect(P.soils.loam.bankDensityLbPerCuFt).toBe(2592 / 27);
    // ASCE 7 Table C3-2, granite 165 lb/ft³ (REFERENCES 6.2, from memory); gravel 1.4 t/yd³ (6.3)
    expect(P.rock.stoneDensityLbPerCuFt).toBe(165);
    expect(P.rock.gravelBulkShortTonsPerCuYd).toBe(1.4);
  });

  it('convert the per-m³ labour factors exactly', () => {
    // Labour-factor directory (REFERENCES 8.1): 1.20 / 2.20 / 3.30 h/m³ → 0.92 / 1.68 / 2.52 LH/yd³
    expect(P.soils['sand-gravel'].handDigLaborHoursPerBankCuYd).toBeCloseTo(0.92, 2);
    expect(P.soils.loam.handDigLaborHoursPerBankCuYd).toBeCloseTo(1.68, 2);
    expect(P.soils.clay.handDigLaborHoursPerBankCuYd).toBeCloseTo(2.52, 2);
  });

  it('mark the demo pumps as demo data', () => {
    for (const pump of P.hydraulics.pumps) expect(pump.label).toContain('(demo data)');
  });
});
