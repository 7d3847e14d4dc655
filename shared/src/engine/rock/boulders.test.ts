import { describe, expect, it } from 'vitest';
import { defaultEngineParameters } from '../parameters/defaults';
import { boulderLayer, stoneWeightLb } from './boulders';

const rules = defaultEngineParameters.rock;

describe('boulders', () => {
  it('a 1.5-ft stone weighs about 290 lb', () => {
    // Hand, with the default shape factor 0.52 and 165 lb/ft³ (ASCE 7 Table C3-2, from memory):
    // 1.5³ × 0.52 × 165 = 3.375 × 85.8 = 289.575 lb
    expect(stoneWeightLb(18, rules)).toBeCloseTo(289.575, 3);
    // REFERENCES 9.7 (derived) gives 291.6 lb, which is the ellipsoid factor π/6 = 0.5236:
    // 3.375 × 0.5236 × 165 = 291.6
    expect(stoneWeightLb(18, { ...rules, boulderShapeFactor: Math.PI / 6 })).toBeCloseTo(291.6, 1);
  });

  it('100 ft² of walls covered with a 50/35/15 mix weighs 4.61 tons', () => {
    // Hand: layer thickness × shape factor × density / 2000 per ft²:
    // small 0.75 × 0.52 × 165 = 64.35 lb/ft² × 50 ft² = 3217.5 lb
    // medium 1.25 × 0.52 × 165 = 107.25 lb/ft² × 35 ft² = 3753.75 lb
    // large 1.75 × 0.52 × 165 = 150.15 lb/ft² × 15 ft² = 2252.25 lb
    // total 9223.5 lb = 4.61175 tons; solid volume 9223.5 / 165 = 55.9 ft³
    const layer = boulderLayer(100, { small: 50, medium: 35, large: 15 }, rules);
    expect(layer.shortTons.small).toBeCloseTo(1.60875, 9);
    expect(layer.shortTons.medium).toBeCloseTo(1.876875, 9);
    expect(layer.shortTons.large).toBeCloseTo(1.126125, 9);
    expect(layer.totalShortTons).toBeCloseTo(4.61175, 9);
    expect(layer.solidCuFt).toBeCloseTo(55.9, 9);
  });
});
