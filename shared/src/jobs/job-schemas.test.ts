import { describe, expect, it } from 'vitest';
import { quantityEntrySchema } from './job-schemas';
import { quantityEntry } from './testing/job-fixtures';

const loads = (size: unknown, overrides: Record<string, unknown> = {}) => ({
  ...quantityEntry('disposal', null, 'HAUL-YD', 'Haul-off', '3', 'load', null),
  loadVolumeLooseCubicYards: size,
  ...overrides,
});

const messages = (value: unknown) =>
  quantityEntrySchema
    .safeParse(value)
    .error?.issues.map((issue) => [issue.path.join('.'), issue.message]) ?? [];

describe('a disposal entry’s load size', () => {
  it('takes the size of a truck or container in loose yd³', () => {
    for (const size of ['10', '6', '0.5', '12.75', '40']) {
      expect(messages(loads(size)), size).toEqual([]);
    }
  });

  it('may be left out, as in logs written before it existed', () => {
    expect(
      messages(quantityEntry('disposal', null, 'HAUL-YD', 'Haul-off', '3', 'load', null)),
    ).toEqual([]);
  });

  it('refuses an empty load, more than a 40 yd³ roll-off, and text that is not a size', () => {
    expect(messages(loads('0'))).toEqual([
      ['loadVolumeLooseCubicYards', 'A load holds more than 0 yd³'],
    ]);
    expect(messages(loads('40.5'))).toEqual([
      ['loadVolumeLooseCubicYards', 'At most 40 yd³ a load (the largest roll-off container)'],
    ]);
    expect(messages(loads('ten'))[0]).toEqual([
      'loadVolumeLooseCubicYards',
      'Enter the load size in loose yd³, such as 10',
    ]);
    expect(messages(loads('10.125'))[0]?.[1]).toBe('Enter the load size in loose yd³, such as 10');
  });

  it('belongs to disposal counted in loads only', () => {
    const only = [['loadVolumeLooseCubicYards', 'Only disposal counted in loads has a load size']];
    expect(messages(loads('10', { unit: 'cu yd' }))).toEqual(only);
    expect(messages(loads('10', { kind: 'equipment', unit: 'load' }))).toEqual(only);
    expect(messages(loads('10', { unit: 'Loads' }))).toEqual([]);
  });
});
