import { describe, expect, it } from 'vitest';
import { computeTakeoff, examplePondInput, type TakeoffInput } from '../engine';
import { engineParametersFromPriceBook } from './engine-parameters';
import type { PriceBook } from './price-book-schema';
import { priceTakeoff, type PriceTakeoffArgs } from './price-takeoff';
import { pricedEstimateSchema } from './priced-estimate-schema';
import { roundPriceBook } from './testing/round-price-book';

function price(
  input: TakeoffInput,
  book: PriceBook = roundPriceBook(),
  extra: Partial<PriceTakeoffArgs> = {},
) {
  const result = computeTakeoff(input, engineParametersFromPriceBook(book));
  if (!result.ok) throw new Error(JSON.stringify(result.errors));
  const estimate = priceTakeoff({ input, takeoff: result.takeoff, book, ...extra });
  expect(pricedEstimateSchema.parse(estimate)).toEqual(estimate);
  return { estimate, takeoff: result.takeoff };
}

const byId = (lines: Array<{ id: string }>) => new Map(lines.map((line) => [line.id, line]));

describe('priceTakeoff on the example pond with the round book', () => {
  const { estimate, takeoff } = price(examplePondInput());
  const lines = byId(estimate.lines);

  it('reads its quantities from the takeoff', () => {
    // The engine's figures this example rests on (see docs/engine.md for how they are computed).
    expect(takeoff.liner.orderedAreaSqFt).toBe(800);
    expect(takeoff.rock.bouldersShortTons).toEqual({
      small: 1.97,
      medium: 2.3,
      large: 1.38,
      total: 5.65,
    });
    expect(takeoff.rock.gravelShortTons).toBe(1.61);
    expect(takeoff.excavation).toMatchObject({
      method: 'machine',
      bankCuYd: 10.01,
      hauledLooseCuYd: 12.52,
    });
    expect(takeoff.hydraulics!.best!.pumpId).toBe('demo-mid-3000');
    expect(takeoff.labor.tasks).toEqual([
      { task: 'excavation', laborHours: 1.3 },
      { task: 'rockPlacing', laborHours: 13.8 },
      { task: 'linerUnderlayment', laborHours: 12 },
      { task: 'plumbingEquipment', laborHours: 7 },
      { task: 'electricalLighting', laborHours: 3.5 },
      { task: 'renovationTearOut', laborHours: 0 },
      { task: 'cleanUp', laborHours: 3.8 },
    ]);
  });

  it('prices each material line: quantity × unit cost, × 1.5 markup', () => {
    const expected: Record<string, [string, string, string]> = {
      // id: [quantity, extended cost, price]
      'liner:LINER-EPDM-45': ['800', '800.00', '1200.00'], // 800 ft² × 1.00
      'underlayment:UNDERLAY-8OZ': ['800', '400.00', '600.00'], // 800 ft² × 0.50
      'boulders:small:BOULDER-S': ['1.97', '197.00', '295.50'], // 1.97 t × 100.00
      'boulders:medium:BOULDER-M': ['2.3', '230.00', '345.00'],
      'boulders:large:BOULDER-L': ['1.38', '138.00', '207.00'],
      'gravel:GRAVEL-RIVER-MIX': ['1.61', '80.50', '120.75'], // 1.61 t × 50.00
      'pipe:pressure:PIPE-PVC40-2': ['40', '80.00', '120.00'], // 40 ft of 2 in × 2.00
      'fitting:elbow90:FIT-ELBOW90-2': ['3', '15.00', '22.50'], // 3 × 5.00
      'fitting:checkValve:FIT-CHECKVALVE-2': ['1', '40.00', '60.00'],
      'pump:demo-mid-3000': ['1', '400.00', '600.00'],
      'skimmer:SKIM-MID': ['1', '500.00', '750.00'], // rated 4000 ≥ 2400 gph required
      'filter-box:FBOX-MID': ['1', '500.00', '750.00'], // rated 4500 ≥ 2400 gph
      'light:LIGHT-LED-20': ['3', '150.00', '225.00'], // three 20 W fixtures → the 20 W light
      'transformer:XFMR-150': ['1', '150.00', '225.00'],
      'cable:12:CABLE-12': ['50', '50.00', '75.00'], // 50 ft of 12 AWG × 1.00
    };
    const materials = estimate.lines.filter((line) => line.category === 'materials');
    expect(
      Object.fromEntries(
        materials.map((line) => [line.id, [line.quantity, line.extendedCost, line.price]]),
      ),
    ).toEqual(expected);
    // Σ cost = 3730.50; Σ price = 5595.75.
    expect(estimate.categories[0]).toEqual({
      category: 'materials',
      cost: '3730.50',
      price: '5595.75',
    });
  });

  it('prices labor at the burdened rate of each task role', () => {
    // Burdened rates: installer 20.00 × 1.25 = 25.00, lead 32.00 × 1.25 = 40.00, LV tech 24 × 1.25 = 30.00.
    // excavation 1.3 h × 25 = 32.50; rock 13.8 × 40 = 552.00; liner 12 × 25 = 300.00;
    // plumbing 7 × 40 = 280.00; lighting 3.5 × 30 = 105.00; clean-up 3.8 × 25 = 95.00 → 1364.50
    // prices × 1.5: 48.75 + 828.00 + 450.00 + 420.00 + 157.50 + 142.50 = 2046.75
    expect(lines.get('labor:rockPlacing')).toMatchObject({
      unitCost: '40.00',
      extendedCost: '552.00',
      price: '828.00',
      taxable: false,
    });
    expect(lines.has('labor:renovationTearOut')).toBe(false);
    expect(estimate.categories[1]).toEqual({
      category: 'labor',
      cost: '1364.50',
      price: '2046.75',
    });
  });

  it('rents the machine that fits the access, for whole days', () => {
    // 10.01 bank yd³ / 20 yd³ per h = 0.5 h → ⌈0.5 / 8⌉ = 1 day (the minimum). The 55 in excavator does
    // not fit the 48 in access; the 36 in loader does: 1 × 300.00 + delivery 100.00 = 400.00 → × 1.2 = 480.00.
    expect(lines.get('equipment:excavation:MTL-36')).toMatchObject({
      quantity: '1',
      unit: 'day',
      price: '360.00',
    });
    expect(lines.get('equipment:delivery:MTL-36')).toMatchObject({ price: '120.00' });
    expect(estimate.categories[2]).toEqual({
      category: 'equipment',
      cost: '400.00',
      price: '480.00',
    });
  });

  it('disposes of the hauled spoil and adds mobilization and contingency', () => {
    // 12.52 loose yd³ × 40.00 = 500.80 → × 1.1 = 550.88.
    expect(lines.get('disposal:HAUL-YD')).toMatchObject({
      quantity: '12.52',
      extendedCost: '500.80',
      price: '550.88',
    });
    // Direct cost 3730.50 + 1364.50 + 400.00 + 500.80 = 5995.80; contingency 10 % = 599.58.
    expect(lines.get('other:contingency')).toMatchObject({
      extendedCost: '599.58',
      price: '599.58',
    });
    expect(lines.get('other:mobilization')).toMatchObject({
      extendedCost: '200.00',
      price: '200.00',
    });
  });

  it('totals the estimate', () => {
    // cost 5995.80 + 799.58 = 6795.38; price 5595.75 + 2046.75 + 480.00 + 550.88 + 799.58 = 9472.96
    // tax 10 % × 5595.75 (materials only) = 559.575 → 559.58 (half up)
    // total 9472.96 + 559.58 = 10032.54; deposit 50 % = 5016.27
    // gross profit 9472.96 − 6795.38 = 2677.58; margin 2677.58 / 9472.96 = 28.2655…% → 28.27
    expect(estimate.totals).toEqual({
      subtotalCost: '6795.38',
      subtotalPrice: '9472.96',
      discountPct: '0.00',
      discount: '0.00',
      minimumJobCharge: '0.00',
      taxableAmount: '5595.75',
      salesTaxPct: '10.00',
      tax: '559.58',
      total: '10032.54',
      depositPct: '50.00',
      deposit: '5016.27',
      grossProfit: '2677.58',
      grossMarginPct: '28.27',
    });
    expect(estimate.approval).toEqual({ needsApproval: false, reasons: [] });
    expect(estimate.complete).toBe(true);
  });

  it('lists lines grouped by category', () => {
    const order = estimate.lines.map((line) => line.category);
    expect(order).toEqual(
      [...order].sort(
        (a, b) =>
          ['materials', 'labor', 'equipment', 'disposal', 'other'].indexOf(a) -
          ['materials', 'labor', 'equipment', 'disposal', 'other'].indexOf(b),
      ),
    );
  });
});

describe('priceTakeoff, other cases', () => {
  it('a discount is shared over the lines and taxed only on taxable ones', () => {
    const { estimate } = price(examplePondInput(), roundPriceBook(), { discountPct: '10' });
    // 10 % × 9472.96 = 947.296 → 947.30; the materials' share is about 5595.75 / 9472.96 of it.
    expect(estimate.totals.discount).toBe('947.30');
    const taxable = Number(estimate.totals.taxableAmount);
    expect(Math.abs(taxable - 5595.75 * 0.9)).toBeLessThan(0.05);
    expect(estimate.totals.tax).toBe((Math.round(taxable * 10) / 100).toFixed(2));
  });

  it('reports what the book lacks instead of throwing', () => {
    const book = roundPriceBook();
    book.materials = book.materials.filter(
      (material) => material.code !== 'PIPE-PVC40-2' && material.kind !== 'skimmer',
    );
    const { estimate } = price(examplePondInput(), book);
    expect(estimate.complete).toBe(false);
    expect(estimate.missing).toEqual([
      expect.objectContaining({
        kind: 'pipe',
        source: 'pipe:pressure',
        message: 'Add a 2 in pvc-sch40 pipe to your price book.',
      }),
      expect.objectContaining({ kind: 'skimmer', need: 'a skimmer rated for at least 2400 gph' }),
    ]);
    expect(estimate.lines.some((line) => line.source === 'pipe:pressure')).toBe(false);
  });

  it('names the excavation machine it needs when none fits the access', () => {
    const book = roundPriceBook();
    book.equipment = book.equipment.filter((item) => item.code !== 'MTL-36');
    const { estimate } = price(examplePondInput(), book);
    expect(estimate.missing).toEqual([
      expect.objectContaining({
        kind: 'equipment',
        need: 'an excavation machine no wider than 48 in',
      }),
    ]);
  });

  it('digs by hand with no equipment, and prices disposal by the ton when the book says so', () => {
    const input = examplePondInput();
    input.site = { ...input.site, excavationMethod: 'hand', spoilHauledPct: 50 };
    const book = roundPriceBook();
    book.settings.defaultDisposalCode = 'HAUL-TON';
    const { estimate, takeoff } = price(input, book);
    expect(estimate.lines.some((line) => line.category === 'equipment')).toBe(false);
    // Half the spoil's weight is hauled, at 46.00 a ton.
    const tons = (Math.round(takeoff.excavation.massShortTons * 50) / 100).toFixed(2);
    expect(byId(estimate.lines).get('disposal:HAUL-TON')).toMatchObject({
      quantity: String(Number(tons)),
      unit: 'short ton',
    });
  });

  it('shares the boulders to buy over the sizes after reusing old rock', () => {
    const input = examplePondInput({
      renovation: {
        basinsAlreadyExcavated: false,
        oldLinerAreaSqFt: 0,
        oldRockShortTons: 2.5,
        rockReusedPct: 66,
      },
    });
    const { estimate, takeoff } = price(input);
    // 2.5 × 66 % = 1.65 t reused; 5.65 − 1.65 = 4.00 t to buy, shared 1.39 / 1.63 / 0.98
    // (largest remainders; see allocate.test.ts).
    expect(takeoff.rock.bouldersToBuyShortTons).toBe(4);
    const boulders = estimate.lines.filter((line) => line.source.startsWith('boulders:'));
    expect(boulders.map((line) => line.quantity)).toEqual(['1.39', '1.63', '0.98']);
  });

  it('prices water storage blocks in a pond-free basin, with no skimmer', () => {
    const input = examplePondInput({
      basins: [],
      pondFreeBasin: { lengthFt: 6, widthFt: 4, depthFt: 2, fill: 'storage-blocks' },
    });
    const { estimate } = price(input);
    const lines = byId(estimate.lines);
    // 6 × 4 × 2 = 48 ft³ × 9.75.
    expect(lines.get('storage-blocks:BLOCK-STORAGE')).toMatchObject({
      quantity: '48',
      extendedCost: '468.00',
    });
    expect(estimate.lines.some((line) => line.source === 'skimmer')).toBe(false);
    expect(estimate.lines.some((line) => line.source === 'filter-box')).toBe(true);
  });

  it('offers lighting as an add-on outside the base totals', () => {
    const base = price(examplePondInput()).estimate;
    const { estimate } = price(examplePondInput(), roundPriceBook(), { lighting: 'add-on' });
    expect(
      estimate.lines.some((line) =>
        ['light', 'transformer', 'cable:12', 'labor:electricalLighting'].includes(line.source),
      ),
    ).toBe(false);
    const lighting = estimate.options.find((option) => option.id === 'lighting')!;
    // Lights 225.00 + transformer 225.00 + cable 75.00 + labor 157.50 = 682.50 (cost 455.00);
    // tax if accepted: 10 % × 525.00 of taxable materials = 52.50.
    expect(lighting).toMatchObject({
      kind: 'add-on',
      cost: '455.00',
      price: '682.50',
      tax: '52.50',
    });
    expect(
      lighting.lines.every((line) => line.kind === 'add-on' && line.optionId === 'lighting'),
    ).toBe(true);
    // The base lost the lighting and its share of the contingency (10 % of 455.00 = 45.50).
    expect(Number(base.totals.subtotalPrice) - Number(estimate.totals.subtotalPrice)).toBeCloseTo(
      682.5 + 45.5,
      2,
    );
  });

  it('prices add-ons and alternates from the book, apart from the base', () => {
    const addOns = [
      {
        id: 'plants',
        label: 'Plant package',
        kind: 'add-on' as const,
        items: [
          { materialCode: 'PLANT-MARGINAL', quantity: '6' },
          { materialCode: 'PLANT-LILY', quantity: '2' },
          { materialCode: 'NO-SUCH', quantity: '1' },
        ],
      },
      {
        id: 'liner-60',
        label: '60 mil liner instead',
        kind: 'alternate' as const,
        items: [{ materialCode: 'LINER-EPDM-60', quantity: '800' }],
      },
    ];
    const base = price(examplePondInput()).estimate;
    const { estimate } = price(examplePondInput(), roundPriceBook(), { addOns });
    expect(estimate.totals).toEqual(base.totals);
    const plants = estimate.options.find((option) => option.id === 'plants')!;
    // 6 × 14.50 = 87.00 and 2 × 42.00 = 84.00 → cost 171.00, price × 1.5 = 130.50 + 126.00 = 256.50.
    expect(plants).toMatchObject({ cost: '171.00', price: '256.50', tax: '25.65' });
    expect(estimate.missing).toEqual([
      expect.objectContaining({ optionId: 'plants', need: 'the material NO-SUCH' }),
    ]);
    expect(estimate.options.find((option) => option.id === 'liner-60')!.lines[0]).toMatchObject({
      kind: 'alternate',
      extendedCost: '952.00',
    });
  });

  it('refuses a discount that is not a percentage, and option ids used twice', () => {
    const input = examplePondInput();
    const book = roundPriceBook();
    const result = computeTakeoff(input, engineParametersFromPriceBook(book));
    if (!result.ok) throw new Error('takeoff');
    expect(() =>
      priceTakeoff({ input, takeoff: result.takeoff, book, discountPct: '120' }),
    ).toThrow(RangeError);
    expect(() =>
      priceTakeoff({
        input,
        takeoff: result.takeoff,
        book,
        lighting: 'add-on',
        addOns: [{ id: 'lighting', label: 'x', kind: 'add-on', items: [] }],
      }),
    ).toThrow(RangeError);
  });
});
