import { describe, expect, it } from 'vitest';
import { typicalPond } from '../fixtures/sample-inputs';
import { takeoffSchema, type Takeoff } from '../schemas/takeoff-output';
import type { TakeoffInput } from '../schemas/takeoff-input';
import { computeFullTakeoff as computeTakeoff } from '../testing/full-engine';
import { computeTakeoff as bareComputeTakeoff } from './compute-takeoff';
import { defaultEngineParameters } from '../parameters/defaults';
import type { EngineParameters } from '../parameters/parameters-schema';

const noRock = {
  boulderMixPct: { small: 100, medium: 0, large: 0 },
  wallCoveragePct: 0,
  shelfCoveragePct: 0,
  streamEdgeCoveragePct: 0,
  floorGravelDepthIn: 0,
  shelfGravelDepthIn: 0,
  streamGravelDepthIn: 0,
};

/** The REFERENCES box pond: 15 × 10 × 2 ft, no shelves, no rock, a 24-in medium fall, 40 ft of 2-in pipe. */
function boxPond(overrides: Partial<TakeoffInput> = {}): TakeoffInput {
  return typicalPond({
    basins: [
      {
        outline: { shape: 'rectangle', lengthFt: 15, widthFt: 10 },
        maxDepthFt: 2,
        wallStyle: 'vertical',
        shelves: [],
      },
    ],
    streams: [],
    rock: noRock,
    pumpRun: { ...typicalPond().pumpRun!, pressurePipeSizeIn: 2, elevationFt: 6 },
    lighting: [{ cableLengthFt: 50, gaugeAwg: '10', fixtureWatts: [120] }],
    ...overrides,
  });
}

function takeoffOf(input: TakeoffInput): Takeoff {
  const r = computeTakeoff(input);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.takeoff;
}

describe('a worked example, figure by figure', () => {
  const t = takeoffOf(boxPond());

  it('surface and volume: 150 ft², 300 ft³ = 2244 gal', () => {
    // REFERENCES 2.1: 15 × 10 × 2 = 300 ft³ × 7.480519 = 2244.16 → 2244 gal (nearest gallon)
    expect(t.water.surfaceAreaSqFt).toBe(150);
    expect(t.water.volumeCuFt).toBe(300);
    expect(t.water.volumeGallons).toBe(2244);
  });

  it('liner 21 × 16 ft needed, 20 × 25 ft ordered; underlayment the same; 135 lb', () => {
    // REFERENCES 3.1 (common practice): 21 × 16; 3.3: stock 20 × 25 = 500 ft²; 3.2: underlayment the same;
    // 3.5 (derived): 500 × 0.27 = 135 lb
    expect(t.liner.pieces[0]).toMatchObject({
      neededLengthFt: 21,
      neededWidthFt: 16,
      ruleLengthFt: 21,
      ruleWidthFt: 16,
      orderedAreaSqFt: 500,
      seamCount: 0,
    });
    expect(t.liner.underlaymentAreaSqFt).toBe(500);
    expect(t.liner.weightLb).toBe(135);
  });

  it('excavation: 11.11 bank yd³ → 13.89 loose yd³ of loam, 2 truckloads', () => {
    // FM 5-434 swell 1.25 (REFERENCES 6.5): 300/27 = 11.111 × 1.25 = 13.889; ⌈13.889/10⌉ = 2;
    // weight 300 × 96 / 2000 = 14.4 tons (REFERENCES 6.4), ⌈14.4/13⌉ = 2
    expect(t.excavation).toMatchObject({
      method: 'machine',
      bankCuYd: 11.11,
      looseCuYd: 13.89,
      massShortTons: 14.4,
      haulLoads: 2,
      wheelbarrowTrips: null,
    });
  });

  it('flow, pipe and head: 2400 gph, 2-in pipe, TDH 8.09 ft', () => {
    // Weir 24 in × 100 gph/in = 2400 > turnover 2244 (REFERENCES 4.1, 4.2, common practice).
    // 40 gpm: 1044 × (40/150)^1.852 / 2.067^4.8655 = 1044 × 0.086464 / 34.223 = 2.6377 ft/100 ft;
    // L_eq = 40 + (3 × 5 + 11) × 1.5119 = 79.31 ft → 2.092 ft; TDH = 6 + 2.092 = 8.09 ft (hand)
    const h = t.hydraulics!;
    expect(h.requiredFlowGph).toBe(2400);
    expect(h.lines[0]).toMatchObject({
      nominalSizeIn: 2,
      insideDiameterIn: 2.067,
      equivalentLengthFt: 79.31,
      frictionHeadAtRequiredFt: 2.09,
    });
    // 0.4085 × 40 / 2.067² = 3.82 ft/s (REFERENCES 5.6)
    expect(h.lines[0]!.velocityAtRequiredFtPerS).toBe(3.82);
    expect(h.totalDynamicHeadAtRequiredFt).toBe(8.09);
    expect(h.best!.flowGph).toBeGreaterThanOrEqual(2400);
    // yearly energy = W × 8760 / 1000
    expect(h.best!.yearlyEnergyKwh).toBe(Math.round((h.best!.inputWatts * 8760) / 1000));
  });

  it('lighting: 120 W on 50 ft of 10 AWG leaves 10.76 V; a 150 W transformer at 80 %', () => {
    // REFERENCES 7.2 (b): drop 1.24 V; 7.3: 120 W ≤ 0.8 × 150 W
    expect(t.lighting).toMatchObject({
      totalWatts: 120,
      transformerSizeWatts: 150,
      transformerCount: 1,
      loadPercent: 80,
    });
    expect(t.lighting!.runs[0]).toMatchObject({
      voltageDropV: 1.24,
      voltageAtLastFixtureV: 10.76,
      currentAmps: 10,
    });
  });

  it('labor: machine digging 11.11 yd³ takes 1.5 h', () => {
    // REFERENCES 8.3: 11.111 / 20 + 11.111 / 12 = 0.556 + 0.926 = 1.48 → 1.5 h
    expect(t.labor.tasks.find((x) => x.task === 'excavation')!.laborHours).toBe(1.5);
    // total = sum of the tasks; crew-days = total / 24
    const sum = t.labor.tasks.reduce((s, x) => s + x.laborHours, 0);
    expect(Math.abs(t.labor.totalLaborHours - sum)).toBeLessThan(0.1);
    expect(t.labor.crewDays).toBeCloseTo(t.labor.totalLaborHours / 24, 1);
  });

  it('explains every headline figure with its formula, workings and sources', () => {
    const figures = t.explanations.map((e) => e.figure);
    for (const f of [
      'water.volumeGallons',
      'water.surfaceAreaSqFt',
      'excavation.bankCuYd',
      'excavation.looseCuYd',
      'excavation.haulLoads',
      'rock.gravelShortTons',
      'hydraulics.requiredFlowGph',
      'hydraulics.totalDynamicHeadAtRequiredFt',
      'hydraulics.best.yearlyEnergyKwh',
      'lighting.transformerSizeWatts',
      'labor.crewDays',
      'liner.underlaymentAreaSqFt',
    ]) {
      expect(figures).toContain(f);
    }
    const volume = t.explanations.find((e) => e.figure === 'water.volumeGallons')!;
    expect(volume.workings).toContain('(300 − 0 − 0) ft³ × 7.480519');
    expect(volume.sources.map((s) => s.source).join(' ')).toContain('NIST Handbook 44');
    const liner = t.explanations.find((e) => e.figure === 'liner.pieces.0.orderedAreaSqFt')!;
    expect(liner.note).toContain('21 × 16 ft');
  });

  it('matches the output schema', () => {
    expect(takeoffSchema.safeParse(t).success).toBe(true);
  });
});

describe('other parts of a feature', () => {
  it('shows figures in metric when the estimate is metric', () => {
    const t = takeoffOf(boxPond({ unitSystem: 'metric' }));
    const volume = t.explanations.find((e) => e.figure === 'water.volumeGallons')!;
    // 2244 gal × 3.785411784 = 8494.5 → 8495 L (NIST SP 811)
    expect(volume.display).toEqual({ value: 8495, unit: 'L' });
    expect(t.water.volumeGallons).toBe(2244);
  });

  it('a pond-free waterfall: reservoir in the gravel voids must hold the stream drain-back', () => {
    // Hand: 6 × 4 × 2 = 48 ft³ × 0.37149 × 7.4805 = 133 gal. Stream 20 × 3 ft × 1.5 in = 7.5 ft³ = 56.1
    // gal; with a check valve no pipe drains; × 1.5 = 84 gal required → adequate. Fill: 48/27 × 1.4 = 2.49 t
    const t = takeoffOf(
      typicalPond({
        basins: [],
        streams: [{ lengthFt: 20, widthFt: 3, dropFt: 2 }],
        pondFreeBasin: { lengthFt: 6, widthFt: 4, depthFt: 2, fill: 'rock-gravel' },
      }),
    );
    expect(t.reservoir).toMatchObject({
      capacityGallons: 133,
      drainBackGallons: 56,
      requiredGallons: 84,
      adequate: true,
    });
    expect(t.rock.reservoirFillShortTons).toBe(2.49);
    // no open water: no turnover flow and no barrier caution
    expect(t.hydraulics!.turnoverFlowGph).toBe(0);
    expect(t.cautions.map((c) => c.code)).not.toContain('barrier-depth');
  });

  it('a too-small reservoir is a warning', () => {
    const t = takeoffOf(
      typicalPond({
        basins: [],
        streams: [{ lengthFt: 100, widthFt: 4, dropFt: 4 }],
        pondFreeBasin: { lengthFt: 3, widthFt: 3, depthFt: 1, fill: 'rock-gravel' },
      }),
    );
    expect(t.reservoir!.adequate).toBe(false);
    expect(t.cautions.map((c) => c.code)).toContain('reservoir-too-small');
  });

  it('a renovation: existing basins are not dug; reused rock lowers what is bought', () => {
    // Hand: boulders needed 5.65 t (typical pond); 4 t removed × 50 % reused = 2 t → buy 3.65 t
    const t = takeoffOf(
      typicalPond({
        renovation: {
          basinsAlreadyExcavated: true,
          oldLinerAreaSqFt: 400,
          oldRockShortTons: 4,
          rockReusedPct: 50,
        },
      }),
    );
    expect(t.rock.reusedShortTons).toBe(2);
    expect(t.rock.bouldersToBuyShortTons).toBeCloseTo(t.rock.bouldersShortTons.total - 2, 2);
    // only the stream is dug: 9 × 4 × 8/12 = 24 ft³ = 0.89 yd³
    expect(t.excavation.bankCuYd).toBe(0.89);
    // tear-out by machine access: 400/100 × 1 + 4 × 0.75 = 7 h
    expect(t.labor.tasks.find((x) => x.task === 'renovationTearOut')!.laborHours).toBe(7);
  });

  it('narrow access forces hand digging and wheelbarrow trips', () => {
    const pond = typicalPond();
    const t = takeoffOf({ ...pond, site: { ...pond.site, accessWidthIn: 30 } });
    expect(t.excavation.method).toBe('hand');
    // ⌈12.515 yd³ × 27 / 4⌉ = ⌈84.48⌉ = 85 trips (hand, from the smoke figures: 10.012 × 1.25 = 12.515)
    expect(t.excavation.wheelbarrowTrips).toBe(85);
    expect(t.cautions.map((c) => c.code)).toContain('hand-dig');
  });

  it('uses parameters from a price book, validating them', () => {
    const r = computeTakeoff(boxPond(), {
      ...typicalParams(),
      liner: { ...typicalParams().liner, overlapPerEdgeFt: -1 },
    });
    expect(r.ok ? [] : r.errors.map((e) => e.field)).toEqual(['parameters.liner.overlapPerEdgeFt']);
    const wider = computeTakeoff(boxPond(), {
      ...typicalParams(),
      liner: { ...typicalParams().liner, overlapPerEdgeFt: 1.5 },
    });
    // 15 + 4 + 3 = 22 (REFERENCES 3.1 with 1.5 ft per edge)
    expect(wider.ok && wider.takeoff.liner.pieces[0]!.neededLengthFt).toBe(22);
  });
});

function typicalParams(): EngineParameters {
  return JSON.parse(JSON.stringify(defaultEngineParameters)) as EngineParameters;
}

describe('outlines and the polygon-offset module', () => {
  const lShape = {
    shape: 'freeform' as const,
    pointsFt: [
      { xFt: 0, yFt: 0 },
      { xFt: 14, yFt: 0 },
      { xFt: 14, yFt: 6 },
      { xFt: 6, yFt: 6 },
      { xFt: 6, yFt: 12 },
      { xFt: 0, yFt: 12 },
    ],
  };
  const withOutline = (outline: typeof lShape) => {
    const input = typicalPond();
    input.basins[0]!.outline = outline;
    return input;
  };

  it('measures a convex freeform outline without the module, exactly as with it', () => {
    const hexagon = {
      shape: 'freeform' as const,
      pointsFt: Array.from({ length: 6 }, (_, i) => ({
        xFt: 8 * Math.cos((Math.PI * i) / 3),
        yFt: 8 * Math.sin((Math.PI * i) / 3),
      })),
    };
    const bare = bareComputeTakeoff(withOutline(hexagon));
    const full = computeTakeoff(withOutline(hexagon));
    if (!bare.ok || !full.ok) throw new Error('expected both to compute');
    expect(bare.takeoff.water.volumeGallons).toBeCloseTo(full.takeoff.water.volumeGallons, 6);
  });

  it('reports an outline that bends inward as a field message when the module is not given', () => {
    const bare = bareComputeTakeoff(withOutline(lShape));
    expect(bare).toEqual({
      ok: false,
      errors: [
        { field: 'basins.0.outline', message: expect.stringMatching(/polygon-offset module/) },
      ],
    });
    expect(computeTakeoff(withOutline(lShape)).ok).toBe(true);
  });
});
