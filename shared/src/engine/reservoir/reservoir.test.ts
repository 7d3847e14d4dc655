import { describe, expect, it } from 'vitest';
import { drainBackGallons, reservoirCapacityGallons } from './reservoir';

describe('pond-free waterfall reservoir', () => {
  it('a 6 × 4 × 2 ft gravel-filled basin holds 133.4 gal', () => {
    // Hand: 48 ft³ × 0.37149 voids (derived from REFERENCES 6.2, 6.3) × 7.480519 = 133.39 gal
    expect(reservoirCapacityGallons({ lengthFt: 6, widthFt: 4, depthFt: 2 }, 0.37149)).toBeCloseTo(
      133.39,
      1,
    );
  });

  it('drain-back: 20 × 3 ft stream at 1.5 in plus 30 ft of 2-in pipe without a check valve', () => {
    // Hand: stream 20 × 3 × 0.125 = 7.5 ft³ = 56.10 gal; pipe π/4 × (2.067/12)² × 30 = 0.6991 ft³ = 5.23 gal
    const d = drainBackGallons({
      streams: [{ lengthFt: 20, widthFt: 3 }],
      streamRunningDepthIn: 1.5,
      pressurePipe: { insideDiameterIn: 2.067, lengthFt: 30 },
      hasCheckValve: false,
    });
    expect(d.streamGallons).toBeCloseTo(56.1, 1);
    expect(d.pipeGallons).toBeCloseTo(5.23, 2);
    const withCheck = drainBackGallons({
      streams: [{ lengthFt: 20, widthFt: 3 }],
      streamRunningDepthIn: 1.5,
      pressurePipe: { insideDiameterIn: 2.067, lengthFt: 30 },
      hasCheckValve: true,
    });
    expect(withCheck.pipeGallons).toBe(0);
  });
});
