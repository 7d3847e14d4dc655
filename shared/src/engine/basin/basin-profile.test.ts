import { describe, expect, it } from 'vitest';
import { planShape } from '../geometry/plan-shape';
import type { BasinInput } from '../schemas/takeoff-input';
import { cubicFeetToGallons } from '../units/units';
import { basinProfile } from './basin-profile';

const profileOf = (basin: BasinInput, batter = 0.25) =>
  basinProfile(basin, planShape(basin.outline, 128), batter);

describe('basin profile', () => {
  it('a 15 × 10 × 2 ft box holds 300 ft³ = 2244.16 gal', () => {
    // Geometry V = L·W·D (REFERENCES 2.1, confirmed): 300 ft³ × 7.4805 = 2244.16 gal
    const p = profileOf({
      outline: { shape: 'rectangle', lengthFt: 15, widthFt: 10 },
      maxDepthFt: 2,
      wallStyle: 'vertical',
      shelves: [],
    });
    expect(p.holeVolumeCuFt).toBe(300);
    expect(cubicFeetToGallons(p.holeVolumeCuFt)).toBeCloseTo(2244.16, 2);
    // walls: perimeter 50 × 2 = 100 ft²; floor 150 ft²
    expect(p.wallAreaSqFt).toBeCloseTo(100, 9);
    expect(p.floorAreaSqFt).toBe(150);
  });

  it('a shelved 16 × 11 pond: 176 + 126 = 302 ft³ = 2259.1 gal', () => {
    // REFERENCES 2.4 (derived): 16 × 11 to 1 ft (shelf level), then 14 × 9 deep zone for another 1 ft.
    // A 12-in shelf at 12 in insets the plan by 1 ft on each side.
    const p = profileOf({
      outline: { shape: 'rectangle', lengthFt: 16, widthFt: 11 },
      maxDepthFt: 2,
      wallStyle: 'vertical',
      shelves: [{ widthIn: 12, depthIn: 12 }],
    });
    expect(p.holeVolumeCuFt).toBeCloseTo(302, 9);
    expect(cubicFeetToGallons(p.holeVolumeCuFt)).toBeCloseTo(2259.1, 1);
    // shelf ring = 176 − 126 = 50 ft²; floor = 126 ft²
    expect(p.shelfAreaSqFt).toBeCloseTo(50, 9);
    expect(p.floorAreaSqFt).toBeCloseTo(126, 9);
  });

  it('a 20 × 14 top, 14 × 8 bottom, 3 ft deep basin with 1:1 slopes holds 570 ft³ = 4263.9 gal', () => {
    // Prismoidal formula (REFERENCES 2.5, derived): A_mid = 17 × 11 = 187; V = 3/6 × (280 + 748 + 112) = 570
    const p = profileOf(
      {
        outline: { shape: 'rectangle', lengthFt: 20, widthFt: 14 },
        maxDepthFt: 3,
        wallStyle: 'battered',
        shelves: [],
      },
      1,
    );
    expect(p.holeVolumeCuFt).toBeCloseTo(570, 9);
    expect(cubicFeetToGallons(p.holeVolumeCuFt)).toBeCloseTo(4263.9, 1);
    expect(p.floorAreaSqFt).toBeCloseTo(112, 9);
  });

  it('an oval 12 × 8 ft, 2 ft deep, vertical walls holds 1128.04 gal', () => {
    // REFERENCES 2.2: A = 75.398 ft², V = 150.80 ft³ = 1128.04 gal (shortcut 12·8·2·5.875 = 1128.0)
    const p = profileOf({
      outline: { shape: 'oval', lengthFt: 12, widthFt: 8 },
      maxDepthFt: 2,
      wallStyle: 'vertical',
      shelves: [],
    });
    expect(cubicFeetToGallons(p.holeVolumeCuFt)).toBeCloseTo(1128.04, 2);
  });

  it('reports the shelf that leaves no floor', () => {
    // 6 ft wide basin: two 36-in shelves inset 3 + 3 = 6 ft ≥ half-width twice over → collapses at shelf 0
    const p = profileOf({
      outline: { shape: 'rectangle', lengthFt: 10, widthFt: 6 },
      maxDepthFt: 2,
      wallStyle: 'vertical',
      shelves: [{ widthIn: 36, depthIn: 10 }],
    });
    expect(p.collapse).toEqual({ at: 'shelf', shelfIndex: 0 });
  });

  it('the drape of the liner past the floor is the wall slope lengths plus the shelf widths', () => {
    // Battered 0.25: slope factor √(1 + 0.0625) = 1.030776; walls 1 ft + 1 ft deep; one 1-ft shelf
    // drape = 2 × 1.030776 + 1 = 3.061553 ft (hand)
    const p = profileOf({
      outline: { shape: 'rectangle', lengthFt: 16, widthFt: 11 },
      maxDepthFt: 2,
      wallStyle: 'battered',
      shelves: [{ widthIn: 12, depthIn: 12 }],
    });
    expect(p.drapeOneSideFt).toBeCloseTo(3.061553, 6);
  });
});
