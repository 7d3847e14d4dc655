import { describe, expect, it } from 'vitest';
import { defaultEngineParameters } from '../parameters/defaults';
import { choosePipe } from './pipe-choice';

const pipes = defaultEngineParameters.hydraulics.pipes;

describe('pipe catalogue and choice', () => {
  it('holds the ASTM D1785 Sch 40 inside diameters', () => {
    // ASTM D1785 Tables 1–2, OD − 2 × min wall (REFERENCES 5.5, confirmed secondary):
    // 1": 1.315 − 0.266 = 1.049; 1½": 1.900 − 0.290 = 1.610; 2": 2.375 − 0.308 = 2.067;
    // 3": 3.500 − 0.432 = 3.068; 4": 4.500 − 0.474 = 4.026; 1¼": 1.660 − 0.280 = 1.380
    const id = (size: number) => pipes.find((p) => p.nominalSizeIn === size)?.insideDiameterIn;
    expect(id(1)).toBe(1.049);
    expect(id(1.25)).toBe(1.38);
    expect(id(1.5)).toBe(1.61);
    expect(id(2)).toBe(2.067);
    expect(id(3)).toBe(3.068);
    expect(id(4)).toBe(4.026);
  });

  it('"auto" takes the smallest size within the velocity limit', () => {
    // 40 gpm: 1½-in → 0.4085 × 40 / 1.61² = 6.30 ft/s > 5; 2-in → 3.82 ft/s ≤ 5 → 2 in (hand)
    expect(choosePipe('pvc-sch40', 'auto', 40, 5, pipes)?.nominalSizeIn).toBe(2);
    // 10 gpm: 1-in → 0.4085 × 10 / 1.049² = 3.71 ft/s ≤ 5 → 1 in; at a 3 ft/s limit → 1¼ in (2.14 ft/s)
    expect(choosePipe('pvc-sch40', 'auto', 10, 5, pipes)?.nominalSizeIn).toBe(1);
    expect(choosePipe('pvc-sch40', 'auto', 10, 3, pipes)?.nominalSizeIn).toBe(1.25);
  });

  it('a given size not in the catalogue, or an unknown material, gives null', () => {
    expect(choosePipe('pvc-sch40', 2.5, 10, 5, pipes)).toBeNull();
    expect(choosePipe('copper', 'auto', 10, 5, pipes)).toBeNull();
  });
});
