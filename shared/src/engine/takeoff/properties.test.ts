import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { typicalPond, wobblyOutline } from '../fixtures/sample-inputs';
import type { BasinInput, OutlineInput, TakeoffInput } from '../schemas/takeoff-input';
import { computeFullTakeoff as computeTakeoff } from '../testing/full-engine';

type Plan = {
  shape: 'rectangle' | 'oval' | 'freeform';
  lengthFt: number;
  widthFt: number;
  phase: number;
};

const outlineOf = (plan: Plan, scale: number): OutlineInput =>
  plan.shape === 'freeform'
    ? {
        shape: 'freeform',
        pointsFt: wobblyOutline(48, plan.lengthFt * scale, plan.widthFt * scale, plan.phase),
      }
    : { shape: plan.shape, lengthFt: plan.lengthFt * scale, widthFt: plan.widthFt * scale };

const planArb = fc
  .record({
    shape: fc.constantFrom('rectangle' as const, 'oval' as const, 'freeform' as const),
    lengthFt: fc.double({ min: 8, max: 60, noNaN: true }),
    aspect: fc.double({ min: 0.5, max: 1, noNaN: true }),
    phase: fc.double({ min: 0, max: 6, noNaN: true }),
  })
  .map(({ shape, lengthFt, aspect, phase }): Plan => ({
    shape,
    lengthFt,
    widthFt: lengthFt * aspect,
    phase,
  }));

const featureArb = fc.record({
  plan: planArb,
  depthFt: fc.double({ min: 1.5, max: 3.5, noNaN: true }),
  wallStyle: fc.constantFrom('vertical' as const, 'battered' as const),
  shelves: fc.integer({ min: 0, max: 2 }),
  wallCoveragePct: fc.integer({ min: 0, max: 100 }),
  shelfCoveragePct: fc.integer({ min: 0, max: 100 }),
  mix: fc.constantFrom([60, 30, 10], [34, 33, 33], [100, 0, 0], [20, 40, 40]),
  gravelIn: fc.integer({ min: 0, max: 3 }),
  accessWidthIn: fc.constantFrom(30, 48),
  soil: fc.constantFrom('sand-gravel' as const, 'loam' as const, 'clay' as const),
  scale: fc.double({ min: 1, max: 2, noNaN: true }),
});

type Feature = typeof featureArb extends fc.Arbitrary<infer T> ? T : never;

function inputOf(f: Feature, scale: number): TakeoffInput {
  const shelves: BasinInput['shelves'] = [
    { widthIn: 12, depthIn: 9 },
    { widthIn: 10, depthIn: 16 },
  ].slice(0, f.shelves);
  const pond = typicalPond();
  return {
    ...pond,
    basins: [
      { outline: outlineOf(f.plan, scale), maxDepthFt: f.depthFt, wallStyle: f.wallStyle, shelves },
    ],
    rock: {
      ...pond.rock,
      boulderMixPct: { small: f.mix[0]!, medium: f.mix[1]!, large: f.mix[2]! },
      wallCoveragePct: f.wallCoveragePct,
      shelfCoveragePct: f.shelfCoveragePct,
      floorGravelDepthIn: f.gravelIn,
      shelfGravelDepthIn: Math.min(f.gravelIn, 3),
    },
    site: { ...pond.site, accessWidthIn: f.accessWidthIn, soil: f.soil },
  };
}

const headline = (t: Extract<ReturnType<typeof computeTakeoff>, { ok: true }>['takeoff']) => ({
  liner: t.liner.orderedAreaSqFt,
  volume: t.water.volumeGallons,
  rock: t.rock.bouldersShortTons.total + t.rock.gravelShortTons,
  flow: t.hydraulics!.requiredFlowGph,
  labor: t.labor.totalLaborHours,
  excavation: t.excavation.bankCuYd,
});

describe('properties', () => {
  it('a larger feature never needs less liner, volume, rock, flow, excavation or labor', () => {
    fc.assert(
      fc.property(featureArb, (f) => {
        const small = computeTakeoff(inputOf(f, 1));
        fc.pre(small.ok);
        const large = computeTakeoff(inputOf(f, f.scale));
        expect(large.ok).toBe(true);
        if (!small.ok || !large.ok) return;
        const a = headline(small.takeoff);
        const b = headline(large.takeoff);
        for (const key of Object.keys(a) as Array<keyof typeof a>) {
          // Equal quantities may differ by one step of their rounding (labor hours, the coarsest, to
          // 0.1 h), and freeform insets by clipper-lib's 0.01 ft grid, which can shift a barely larger
          // outline's area by a few parts in 100,000.
          expect(b[key]).toBeGreaterThanOrEqual(a[key] * (1 - 1e-4) - 0.1);
        }
      }),
      { numRuns: 150 },
    );
  });

  it('a deeper basin never needs less liner, excavation or flow', () => {
    fc.assert(
      fc.property(featureArb, fc.double({ min: 0, max: 1.5, noNaN: true }), (f, extraFt) => {
        const shallow = computeTakeoff(inputOf(f, 1));
        fc.pre(shallow.ok);
        const deeper = computeTakeoff(inputOf({ ...f, depthFt: f.depthFt + extraFt }, 1));
        fc.pre(deeper.ok);
        if (!shallow.ok || !deeper.ok) return;
        expect(deeper.takeoff.liner.orderedAreaSqFt).toBeGreaterThanOrEqual(
          shallow.takeoff.liner.orderedAreaSqFt,
        );
        expect(deeper.takeoff.excavation.bankCuYd).toBeGreaterThanOrEqual(
          shallow.takeoff.excavation.bankCuYd,
        );
        expect(deeper.takeoff.water.holeVolumeCuFt).toBeGreaterThanOrEqual(
          shallow.takeoff.water.holeVolumeCuFt,
        );
      }),
      { numRuns: 80 },
    );
  });

  it('well-formed inputs never throw; they give a takeoff or only cross-field messages', () => {
    // Every field of these inputs is in range; what can still fail is how the parts fit together
    // (shelves or gravel filling a small basin, too much rock), reported on the field to change.
    const crossField =
      /^(rock\.(wallCoveragePct|floorGravelDepthIn|shelfGravelDepthIn)|basins\.0\.(maxDepthFt|wallStyle|shelves\.\d\.widthIn))$/;
    let ok = 0;
    let runs = 0;
    fc.assert(
      fc.property(featureArb, (f) => {
        const r = computeTakeoff(inputOf(f, f.scale));
        runs += 1;
        if (r.ok) ok += 1;
        else for (const e of r.errors) expect(e.field).toMatch(crossField);
      }),
      { numRuns: 200 },
    );
    expect(ok / runs).toBeGreaterThan(0.5);
  });

  it('invalid inputs never throw and always give field messages', () => {
    const junk = fc.oneof(
      fc.constant(undefined),
      fc.constant(null),
      fc.constant(Number.NaN),
      fc.constant(-1),
      fc.constant(1e9),
      fc.string(),
      fc.constant({}),
      fc.constant([]),
    );
    const pond = typicalPond();
    const paths: string[][] = [
      ['basins', '0', 'maxDepthFt'],
      ['basins', '0', 'outline', 'lengthFt'],
      ['basins', '0', 'shelves', '0', 'depthIn'],
      ['basins', '0', 'wallStyle'],
      ['streams', '0', 'widthFt'],
      ['waterfalls', '0', 'sheet'],
      ['pumpRun', 'fittings', 'elbow90'],
      ['pumpRun', 'pressurePipeSizeIn'],
      ['rock', 'boulderMixPct', 'small'],
      ['lighting', '0', 'gaugeAwg'],
      ['lighting', '0', 'fixtureWatts'],
      ['site', 'soil'],
      ['crew', 'size'],
      ['unitSystem'],
    ];
    fc.assert(
      fc.property(fc.constantFrom(...paths), junk, (path, value) => {
        const input = JSON.parse(JSON.stringify(pond)) as Record<string, unknown>;
        let node = input;
        for (const key of path.slice(0, -1)) node = node[key] as Record<string, unknown>;
        node[path[path.length - 1]!] = value;
        const r = computeTakeoff(input);
        expect(r.ok).toBe(false);
        if (r.ok) return;
        expect(r.errors.length).toBeGreaterThan(0);
        for (const e of r.errors) {
          expect(e.field.length).toBeGreaterThan(0);
          expect(e.message.length).toBeGreaterThan(0);
        }
        expect(
          r.errors.some(
            (e) => e.field.startsWith(path.slice(0, 2).join('.')) || e.field === path.join('.'),
          ),
        ).toBe(true);
      }),
      { numRuns: 300 },
    );
    fc.assert(fc.property(fc.anything(), (value) => computeTakeoff(value).ok === false));
  });
});
