import { describe, expect, it } from 'vitest';
import { computeTakeoff, examplePondInput } from '../engine';
import { CABLE_GAUGES_AWG } from '../engine/schemas/takeoff-input';
import { defaultEngineParameters } from '../engine/parameters/defaults';
import { FITTING_KINDS } from '../engine/parameters/parameters-schema';
import { demoPriceBook } from './demo-price-book';
import { engineParametersFromPriceBook } from './engine-parameters';
import { priceBookSchema } from './price-book-schema';
import { priceTakeoff } from './price-takeoff';
import { pricedEstimateSchema } from './priced-estimate-schema';

describe('demoPriceBook', () => {
  it('is a valid price book, new on every call', () => {
    const book = demoPriceBook();
    expect(priceBookSchema.parse(book)).toEqual(book);
    book.materials.pop();
    expect(demoPriceBook().materials.length).toBe(book.materials.length + 1);
  });

  it('matches the engine: its five pumps, every pipe size, fitting and cable gauge', () => {
    const book = demoPriceBook();
    const codes = new Set(book.materials.map((material) => material.code));
    for (const pump of defaultEngineParameters.hydraulics.pumps)
      expect(codes.has(pump.id)).toBe(true);
    for (const pipe of defaultEngineParameters.hydraulics.pipes) {
      const has = (kind: string, extra: (m: (typeof book.materials)[number]) => boolean) =>
        book.materials.some(
          (m) => m.kind === kind && m.nominalSizeIn === pipe.nominalSizeIn && extra(m),
        );
      expect(has('pipe', (m) => m.pipeMaterial === pipe.material)).toBe(true);
      for (const kind of FITTING_KINDS)
        expect(has('fitting', (m) => m.fittingKind === kind)).toBe(true);
    }
    for (const gauge of CABLE_GAUGES_AWG) {
      expect(book.materials.some((m) => m.kind === 'cable' && m.cableGaugeAwg === gauge)).toBe(
        true,
      );
    }
    for (const watts of defaultEngineParameters.lighting.transformerSizesWatts) {
      expect(book.materials.some((m) => m.kind === 'transformer' && m.ratingWatts === watts)).toBe(
        true,
      );
    }
  });

  it('prices the example pond with nothing missing and a margin above its floor', () => {
    const book = demoPriceBook();
    const input = examplePondInput();
    const result = computeTakeoff(input, engineParametersFromPriceBook(book));
    if (!result.ok) throw new Error(JSON.stringify(result.errors));
    const estimate = priceTakeoff({ input, takeoff: result.takeoff, book });
    expect(estimate.missing).toEqual([]);
    expect(estimate.complete).toBe(true);
    expect(pricedEstimateSchema.parse(estimate)).toEqual(estimate);
    expect(estimate.approval.needsApproval).toBe(false);
    expect(Number(estimate.totals.grossMarginPct)).toBeGreaterThan(
      Number(book.policy.marginFloorPct),
    );
    const sources = estimate.lines.map((line) => line.source);
    for (const source of [
      'liner',
      'underlayment',
      'pump',
      'skimmer',
      'filter-box',
      'light',
      'transformer',
    ]) {
      expect(sources).toContain(source);
    }
  });
});
