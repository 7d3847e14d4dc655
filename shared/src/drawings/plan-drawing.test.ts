import { describe, expect, it } from 'vitest';
import { typicalPond } from '../engine/fixtures/sample-inputs';
import { planDrawing } from './plan-drawing';

const pond = typicalPond();

describe('planDrawing of the 15 × 10 ft pond with one 12 in × 10 in shelf', () => {
  const plan = planDrawing(pond);
  const basin = plan.basins[0]!;

  it('draws the outline from (0, 0) to (15, 10) ft', () => {
    expect(basin.outlineFt).toEqual([
      { xFt: 0, yFt: 0 },
      { xFt: 15, yFt: 0 },
      { xFt: 15, yFt: 10 },
      { xFt: 0, yFt: 10 },
    ]);
  });

  it('puts the shelf lip 1 ft inside the outline, exactly', () => {
    const lip = basin.shelves[0]!;
    expect(lip.edgeInsetFt).toBe(1);
    expect(lip.exact).toBe(true);
    const xs = lip.edgeFt.map((p) => p.xFt);
    const ys = lip.edgeFt.map((p) => p.yFt);
    expect(Math.min(...xs)).toBeCloseTo(1, 12);
    expect(Math.max(...xs)).toBeCloseTo(14, 12);
    expect(Math.min(...ys)).toBeCloseTo(1, 12);
    expect(Math.max(...ys)).toBeCloseTo(9, 12);
  });

  it('draws no separate floor line when the walls are vertical', () => {
    expect(basin.floor).toBeNull();
  });

  it('dimensions the length and width in feet', () => {
    const length = plan.dimensions.find((d) => d.kind === 'length')!;
    const width = plan.dimensions.find((d) => d.kind === 'width')!;
    expect(length).toEqual({
      kind: 'length',
      fromFt: { xFt: 0, yFt: 11.5 },
      toFt: { xFt: 15, yFt: 11.5 },
      label: '15 ft',
    });
    expect(width.label).toBe('10 ft');
    expect(width.fromFt).toEqual({ xFt: -1.5, yFt: 0 });
    expect(width.toFt).toEqual({ xFt: -1.5, yFt: 10 });
  });

  it('runs the 9 × 4 ft stream from the middle of the right side, with the weir at its mouth', () => {
    expect(plan.streams[0]!.bandFt).toEqual([
      { xFt: 15, yFt: 3 },
      { xFt: 24, yFt: 3 },
      { xFt: 24, yFt: 7 },
      { xFt: 15, yFt: 7 },
    ]);
    expect(plan.streams[0]!.label).toBe('9 ft × 4 ft');
    expect(plan.weirs[0]).toMatchObject({
      fromFt: { xFt: 15, yFt: 4 },
      toFt: { xFt: 15, yFt: 6 },
      label: 'weir 24 in',
    });
  });

  it('frames everything with a 1 ft margin', () => {
    expect(plan.boundsFt).toEqual({ minXFt: -2.5, minYFt: -1, maxXFt: 25, maxYFt: 12.5 });
  });
});

describe('planDrawing of other outlines', () => {
  it('insets the shelf of a battered basin by the batter of the wall above it too', () => {
    const plan = planDrawing(
      typicalPond({
        basins: [{ ...pond.basins[0]!, wallStyle: 'battered' }],
      }),
      0.25,
    );
    // 1 ft shelf + 0.25 × 10/12 ft of batter; the floor 1 ft + 0.25 × 2 ft in.
    expect(plan.basins[0]!.shelves[0]!.edgeInsetFt).toBeCloseTo(1 + 0.25 * (10 / 12), 12);
    expect(plan.basins[0]!.floor!.insetFt).toBeCloseTo(1.5, 12);
  });

  it('approximates the shelf of an outline that bends inward and labels in metric', () => {
    const plan = planDrawing(
      typicalPond({
        unitSystem: 'metric',
        basins: [
          {
            ...pond.basins[0]!,
            outline: {
              shape: 'freeform',
              pointsFt: [
                { xFt: 0, yFt: 0 },
                { xFt: 12, yFt: 0 },
                { xFt: 12, yFt: 10 },
                { xFt: 6, yFt: 5 },
                { xFt: 0, yFt: 10 },
              ],
            },
          },
        ],
      }),
    );
    expect(plan.basins[0]!.shelves[0]!.exact).toBe(false);
    expect(plan.basins[0]!.lengthLabel).toBe('3.66 m');
    expect(plan.basins[0]!.widthLabel).toBe('3.05 m');
  });

  it('draws an oval as a closed polygon inside its length and width', () => {
    const plan = planDrawing(
      typicalPond({
        basins: [{ ...pond.basins[0]!, outline: { shape: 'oval', lengthFt: 12, widthFt: 8 } }],
      }),
    );
    const xs = plan.basins[0]!.outlineFt.map((p) => p.xFt);
    expect(Math.min(...xs)).toBeCloseTo(0, 12);
    expect(Math.max(...xs)).toBeCloseTo(12, 12);
    expect(plan.basins[0]!.shelves[0]!.exact).toBe(true);
  });
});
