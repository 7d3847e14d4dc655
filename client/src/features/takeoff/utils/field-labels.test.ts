import { describe, expect, it } from 'vitest';
import { describeField } from './field-labels';

describe('describeField', () => {
  it('names list items by their number, counting from one', () => {
    expect(describeField('basins.0.shelves.1.depthIn')).toBe(
      'Basin 1 › Shelf 2 › Depth below water',
    );
    expect(describeField('lighting.2.fixtureWatts.0')).toBe('Lighting run 3 › Fixture 1');
  });

  it('names sections and groups in words', () => {
    expect(describeField('rock.boulderMixPct')).toBe('Rock and gravel › Boulder mix');
    expect(describeField('pumpRun.fittings.elbow90')).toBe('Pump run › Fittings › 90° elbows');
    expect(describeField('basins')).toBe('Basins');
  });
});
