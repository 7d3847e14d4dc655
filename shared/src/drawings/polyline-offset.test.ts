import { describe, expect, it } from 'vitest';
import { offsetPolylineRight } from './polyline-offset';

describe('offsetPolylineRight', () => {
  it('moves a step (across, then down) outward with a mitred corner', () => {
    const step = [
      { xFt: -1, yFt: 0 },
      { xFt: 0, yFt: 0 },
      { xFt: 0, yFt: -2 },
    ];
    const out = offsetPolylineRight(step, 0.1);
    expect(out[0]!.xFt).toBeCloseTo(-1, 12);
    expect(out[0]!.yFt).toBeCloseTo(-0.1, 12);
    expect(out[1]!.xFt).toBeCloseTo(-0.1, 12);
    expect(out[1]!.yFt).toBeCloseTo(-0.1, 12);
    expect(out[2]!.xFt).toBeCloseTo(-0.1, 12);
    expect(out[2]!.yFt).toBeCloseTo(-2, 12);
  });

  it('drops repeated points', () => {
    const line = [
      { xFt: 0, yFt: 0 },
      { xFt: 0, yFt: 0 },
      { xFt: 2, yFt: 0 },
    ];
    expect(offsetPolylineRight(line, 0.5)).toHaveLength(2);
  });
});
