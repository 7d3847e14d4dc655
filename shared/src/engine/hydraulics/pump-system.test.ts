import { describe, expect, it } from 'vitest';
import { defaultEngineParameters } from '../parameters/defaults';
import type { PumpRunInput } from '../schemas/takeoff-input';
import { hydraulicWatts, pumpSystem } from './pump-system';

const run: PumpRunInput = {
  pipeMaterial: 'pvc-sch40',
  pressurePipeLengthFt: 40,
  pressurePipeSizeIn: 2,
  suctionPipeLengthFt: 0,
  suctionPipeSizeIn: 'auto',
  fittings: { elbow90: 3, elbow45: 0, tee: 0, checkValve: 1, valve: 0 },
  elevationFt: 6,
};

describe('pump system', () => {
  it('50 gpm through the REFERENCES 5.9 line needs 9.16 ft TDH', () => {
    // REFERENCES 5.9 / 4.5 worked example: 6 ft static + 3.16 ft friction = 9.16 ft (±0.02 for the
    // rounded 1.51 multiplier in the reference)
    const r = pumpSystem(run, 3000, defaultEngineParameters.hydraulics);
    if (!r.ok) throw new Error('expected a system');
    expect(r.system.totalDynamicHeadAt(3000)).toBeCloseTo(9.16, 1);
  });

  it('50 gpm at 9.16 ft is 0.1157 hp = 86.3 W of water power', () => {
    // REFERENCES 4.6 (standard, 3960 = 33,000 / 8.33): 50 × 9.16 / 3960 = 0.115657 hp; × 745.7 W/hp
    // = 86.245 W (the reference rounds the hp first: 0.1157 × 745.7 = 86.28 ≈ 86.3 W)
    expect(hydraulicWatts(3000, 9.16) / 745.6998715822702).toBeCloseTo(0.1157, 4);
    expect(Math.abs(hydraulicWatts(3000, 9.16) - 86.3)).toBeLessThan(0.1);
  });

  it('picks the lowest-power pump that reaches the flow, or none', () => {
    const r = pumpSystem(run, 3000, defaultEngineParameters.hydraulics);
    if (!r.ok) throw new Error('expected a system');
    const best = r.system.best!;
    expect(best.operating!.flowGph).toBeGreaterThanOrEqual(3000);
    for (const c of r.system.candidates.filter((x) => x.meetsFlow)) {
      expect(c.operating!.inputWatts).toBeGreaterThanOrEqual(best.operating!.inputWatts);
    }
    const tooHigh = pumpSystem(
      { ...run, elevationFt: 60 },
      3000,
      defaultEngineParameters.hydraulics,
    );
    expect(tooHigh.ok && tooHigh.system.best).toBeNull();
  });

  it('reports an unknown material or size as a field error', () => {
    const r = pumpSystem(
      { ...run, pipeMaterial: 'copper' },
      3000,
      defaultEngineParameters.hydraulics,
    );
    expect(r.ok ? [] : r.errors.map((e) => e.field)).toEqual(['pumpRun.pipeMaterial']);
    const s = pumpSystem(
      { ...run, pressurePipeSizeIn: 2.5 },
      3000,
      defaultEngineParameters.hydraulics,
    );
    expect(s.ok ? [] : s.errors.map((e) => e.field)).toEqual(['pumpRun.pressurePipeSizeIn']);
  });
});
