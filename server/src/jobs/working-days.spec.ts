import { describe, expect, it } from 'vitest';
import { plannedEnd } from './working-days';

describe('plannedEnd', () => {
  it('counts working days Monday to Friday, part days as whole ones', () => {
    // 2026-12-07 is a Monday (ISO 8601 calendar).
    expect(plannedEnd('2026-12-07', 1)).toBe('2026-12-07');
    expect(plannedEnd('2026-12-07', 2.5)).toBe('2026-12-09');
    expect(plannedEnd('2026-12-10', 3)).toBe('2026-12-14'); // Thu, Fri, (weekend), Mon
    expect(plannedEnd('2026-12-12', 1)).toBe('2026-12-14'); // a Saturday start moves to Monday
    expect(plannedEnd('2026-12-07', 0)).toBe('2026-12-07');
  });
});
