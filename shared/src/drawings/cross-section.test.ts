import { describe, expect, it } from 'vitest';
import { computeTakeoff } from '../engine/takeoff/compute-takeoff';
import { defaultEngineParameters } from '../engine/parameters/defaults';
import { typicalPond } from '../engine/fixtures/sample-inputs';
import { crossSection, UNDERLAYMENT_GAP_FT } from './cross-section';

const pond = typicalPond();
const result = computeTakeoff(pond, defaultEngineParameters);
const takeoff = result.ok ? result.takeoff : null;
const shelfFt = -10 / 12;

describe('crossSection of the 15 × 10 ft pond with one 12 in × 10 in shelf', () => {
  const section = crossSection(pond, takeoff)!;

  it('steps down the vertical walls to the shelf and to the floor at −2 ft', () => {
    expect(section.profileFt).toEqual([
      { xFt: 0, yFt: 0 },
      { xFt: 0, yFt: shelfFt },
      { xFt: 1, yFt: shelfFt },
      { xFt: 1, yFt: -2 },
      { xFt: 14, yFt: -2 },
      { xFt: 14, yFt: shelfFt },
      { xFt: 15, yFt: shelfFt },
      { xFt: 15, yFt: 0 },
    ]);
  });

  it('ends the liner 1 ft (the takeoff’s overlap) beyond each edge', () => {
    expect(takeoff).not.toBeNull();
    expect(section.overlapFt).toBe(1);
    expect(section.linerFt[0]).toEqual({ xFt: -1, yFt: 0 });
    expect(section.linerFt[section.linerFt.length - 1]).toEqual({ xFt: 16, yFt: 0 });
  });

  it('lays the underlayment just under the liner', () => {
    const floor = section.underlaymentFt.filter(
      (p) => Math.abs(p.yFt + 2 + UNDERLAYMENT_GAP_FT) < 1e-9,
    );
    expect(floor.map((p) => p.xFt)).toEqual([1 - UNDERLAYMENT_GAP_FT, 14 + UNDERLAYMENT_GAP_FT]);
  });

  it('covers the floor with 2 in of gravel between the shelf walls', () => {
    expect(section.gravelFt[0]).toEqual([
      { xFt: 1, yFt: -2 },
      { xFt: 14, yFt: -2 },
      { xFt: 14, yFt: -2 + 2 / 12 },
      { xFt: 1, yFt: -2 + 2 / 12 },
    ]);
    expect(section.gravelFt).toHaveLength(3);
  });

  it('sets rocks against both walls and on both shelf lips', () => {
    expect(section.rocks.filter((r) => r.on === 'shelf')).toHaveLength(2);
    expect(section.rocks.filter((r) => r.on === 'wall').length).toBeGreaterThanOrEqual(4);
    for (const rock of section.rocks) {
      expect(rock.centerFt.yFt + rock.radiusFt).toBeLessThanOrEqual(1e-9);
    }
  });

  it('labels the shelf depth, the maximum depth and the overlap', () => {
    const labels = Object.fromEntries(section.dimensions.map((d) => [d.kind, d.label]));
    expect(labels).toEqual({
      length: '15 ft',
      overlap: '1 ft overlap',
      'shelf-depth': '10 in',
      'max-depth': 'max 2 ft',
    });
  });
});

describe('crossSection of other basins', () => {
  it('slopes battered walls by the batter', () => {
    const section = crossSection(
      typicalPond({ basins: [{ ...pond.basins[0]!, wallStyle: 'battered' }] }),
      null,
      { batterRunPerRise: 0.25 },
    )!;
    expect(section.profileFt[1]!.xFt).toBeCloseTo(0.25 * (10 / 12), 12);
    expect(section.profileFt[3]).toEqual({ xFt: 1.5, yFt: -2 });
  });

  it('falls back to the given overlap without a takeoff, and is null for a missing basin', () => {
    expect(crossSection(pond, null, { overlapPerEdgeFt: 1.5 })!.overlapFt).toBe(1.5);
    expect(crossSection(pond, takeoff, { basinIndex: 3 })).toBeNull();
  });
});
