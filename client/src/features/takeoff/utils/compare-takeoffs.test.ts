import { computeTakeoff, type Takeoff } from '@pondwright/shared/engine';
import { describe, expect, it } from 'vitest';
import { compareTakeoffs } from './compare-takeoffs';
import { DEFAULT_TAKEOFF_INPUT } from './default-input';

function takeoff(): Takeoff {
  const result = computeTakeoff(DEFAULT_TAKEOFF_INPUT);
  if (!result.ok) throw new Error('The default pond should compute');
  return result.takeoff;
}

describe('compareTakeoffs', () => {
  it('finds no differences between two runs of the same input', () => {
    const { compared, differences } = compareTakeoffs(takeoff(), takeoff());
    expect(compared).toBeGreaterThan(20);
    expect(differences).toEqual([]);
  });

  it('lists a changed figure and one the other side does not have', () => {
    const browser = takeoff();
    const server: Takeoff = {
      ...browser,
      explanations: browser.explanations
        .filter((e) => e.figure !== 'liner.weightLb')
        .map((e) =>
          e.figure === 'labor.crewDays'
            ? { ...e, value: 2, display: { value: 2, unit: 'crew-days' } }
            : e,
        ),
    };
    const { differences } = compareTakeoffs(browser, server);
    expect(differences.map((d) => [d.figure, d.server])).toEqual([
      ['liner.weightLb', null],
      ['labor.crewDays', { value: 2, unit: 'crew-days' }],
    ]);
  });
});
