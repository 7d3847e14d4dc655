import { describe, expect, it } from 'vitest';
import { toEngineInput } from './to-engine-input';

describe('toEngineInput', () => {
  it('turns cleared number fields into missing values, everywhere in the input', () => {
    expect(
      toEngineInput({ crew: { size: '', hoursPerDay: 8 }, lighting: [{ fixtureWatts: [20, ''] }] }),
    ).toEqual({
      crew: { size: undefined, hoursPerDay: 8 },
      lighting: [{ fixtureWatts: [20, undefined] }],
    });
  });

  it('leaves nulls, booleans and text alone', () => {
    expect(toEngineInput({ renovation: null, soil: 'loam', dug: false })).toEqual({
      renovation: null,
      soil: 'loam',
      dug: false,
    });
  });
});
