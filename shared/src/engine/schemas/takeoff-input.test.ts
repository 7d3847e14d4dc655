import { describe, expect, it } from 'vitest';
import { computeFullTakeoff as computeTakeoff } from '../testing/full-engine';
import { typicalPond } from '../fixtures/sample-inputs';
import type { TakeoffInput } from './takeoff-input';

const errorsOf = (input: unknown) => {
  const r = computeTakeoff(input);
  return r.ok ? [] : r.errors;
};
const fieldsOf = (input: unknown) => errorsOf(input).map((e) => e.field);
const withBasin = (patch: Partial<TakeoffInput['basins'][number]>) => {
  const pond = typicalPond();
  return { ...pond, basins: [{ ...pond.basins[0]!, ...patch }] };
};

describe('invalid input gives a message per field', () => {
  it('rejects negative and zero sizes', () => {
    const errs = errorsOf(withBasin({ outline: { shape: 'rectangle', lengthFt: -3, widthFt: 0 } }));
    expect(errs).toEqual([
      { field: 'basins.0.outline.lengthFt', message: 'Must be more than 0 ft.' },
      { field: 'basins.0.outline.widthFt', message: 'Must be more than 0 ft.' },
    ]);
  });

  it('rejects a depth greater than the width', () => {
    expect(
      errorsOf(
        withBasin({
          outline: { shape: 'rectangle', lengthFt: 6, widthFt: 3 },
          maxDepthFt: 4,
          shelves: [],
        }),
      ),
    ).toEqual([
      { field: 'basins.0.maxDepthFt', message: 'Deeper (4 ft) than the basin is wide (3 ft).' },
    ]);
  });

  it('rejects absurd sizes such as a 10,000 ft pond', () => {
    expect(
      errorsOf(withBasin({ outline: { shape: 'oval', lengthFt: 10000, widthFt: 20 } })),
    ).toEqual([{ field: 'basins.0.outline.lengthFt', message: 'Must be at most 300 ft.' }]);
  });

  it('rejects NaN and infinity', () => {
    expect(fieldsOf(withBasin({ maxDepthFt: Number.NaN }))).toEqual(['basins.0.maxDepthFt']);
    expect(errorsOf({ ...typicalPond(), crew: { size: 3, hoursPerDay: Infinity } })).toEqual([
      { field: 'crew.hoursPerDay', message: 'Must be a finite number.' },
    ]);
  });

  it('rejects missing fields, naming each', () => {
    const { site: _site, ...noSite } = typicalPond();
    expect(errorsOf(noSite)).toEqual([{ field: 'site', message: 'Required.' }]);
    const pond = typicalPond();
    const { depthIn: _depth, ...shelf } = pond.basins[0]!.shelves[0]!;
    expect(errorsOf(withBasin({ shelves: [shelf as never] }))).toEqual([
      { field: 'basins.0.shelves.0.depthIn', message: 'Required.' },
    ]);
    expect(fieldsOf(undefined)).toEqual(['input']);
  });

  it('rejects a self-intersecting outline', () => {
    const bowTie = [
      { xFt: 0, yFt: 0 },
      { xFt: 10, yFt: 10 },
      { xFt: 10, yFt: 0 },
      { xFt: 0, yFt: 10 },
    ];
    expect(
      errorsOf(withBasin({ outline: { shape: 'freeform', pointsFt: bowTie }, shelves: [] })),
    ).toEqual([
      {
        field: 'basins.0.outline.pointsFt',
        message: 'The outline crosses itself: the edge from point 1 crosses the edge from point 3.',
      },
    ]);
  });

  it('rejects shelves out of order, shelves too wide and gravel deeper than a step', () => {
    expect(
      fieldsOf(
        withBasin({
          shelves: [
            { widthIn: 12, depthIn: 12 },
            { widthIn: 12, depthIn: 10 },
          ],
        }),
      ),
    ).toEqual(['basins.0.shelves.1.depthIn']);
    expect(fieldsOf(withBasin({ shelves: [{ widthIn: 60, depthIn: 10 }] }))).toEqual([
      'basins.0.shelves.0.widthIn',
    ]);
    // shelf at 10 in: 11 in of gravel fills the step; floor step 14 in: 12 in of gravel is allowed, 14 is not
    expect(
      fieldsOf({ ...typicalPond(), rock: { ...typicalPond().rock, shelfGravelDepthIn: 11 } }),
    ).toEqual(['rock.shelfGravelDepthIn']);
    expect(
      fieldsOf(withBasin({ shelves: [{ widthIn: 12, depthIn: 10 }], maxDepthFt: 1.5 })),
    ).toEqual([]);
    expect(
      fieldsOf({
        ...withBasin({ maxDepthFt: 1.5 }),
        rock: { ...typicalPond().rock, floorGravelDepthIn: 8 },
      }),
    ).toEqual(['rock.floorGravelDepthIn']);
  });

  it('rejects a boulder mix that does not add up to 100 %', () => {
    const pond = typicalPond();
    expect(
      errorsOf({
        ...pond,
        rock: { ...pond.rock, boulderMixPct: { small: 50, medium: 30, large: 10 } },
      }),
    ).toEqual([
      {
        field: 'rock.boulderMixPct',
        message: 'The boulder mix adds up to 90 %; it must add up to 100 %.',
      },
    ]);
  });

  it('rejects catalogue ids the price book does not know', () => {
    const pond = typicalPond();
    expect(fieldsOf({ ...pond, site: { ...pond.site, haulVehicleId: 'rocket' } })).toEqual([
      'site.haulVehicleId',
    ]);
    expect(fieldsOf({ ...pond, pumpRun: { ...pond.pumpRun!, pipeMaterial: 'bamboo' } })).toEqual([
      'pumpRun.pipeMaterial',
    ]);
    expect(
      fieldsOf({ ...pond, site: { ...pond.site, excavationMethod: 'machine', accessWidthIn: 30 } }),
    ).toEqual(['site.excavationMethod']);
  });

  it('rejects a feature with nothing to build', () => {
    expect(fieldsOf({ ...typicalPond(), basins: [], streams: [] })).toEqual(['basins']);
  });

  it('rejects rock that would fill most of the basin', () => {
    const pond = typicalPond({ streams: [], waterfalls: [] });
    const tiny = {
      ...pond,
      basins: [
        {
          outline: { shape: 'rectangle' as const, lengthFt: 3, widthFt: 3 },
          maxDepthFt: 2,
          wallStyle: 'vertical' as const,
          shelves: [],
        },
      ],
    };
    expect(
      fieldsOf({
        ...tiny,
        rock: {
          ...pond.rock,
          boulderMixPct: { small: 0, medium: 0, large: 100 },
          wallCoveragePct: 100,
        },
      }),
    ).toEqual(['rock.wallCoveragePct']);
  });
});
