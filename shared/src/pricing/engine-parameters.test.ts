import { describe, expect, it } from 'vitest';
import { engineParametersSchema } from '../engine/parameters/parameters-schema';
import { defaultEngineParameters } from '../engine/parameters/defaults';
import { demoPriceBook } from './demo-price-book';
import { engineParametersFromPriceBook } from './engine-parameters';

describe('engineParametersFromPriceBook', () => {
  it('takes the book production rates and leaves everything else as it was', () => {
    const book = demoPriceBook();
    book.productionRates = {
      ...book.productionRates,
      machineBankCuYdPerHour: 12,
      linerLaborHoursPer100SqFt: 2,
      cableLaborHoursPerFt: 0.03,
    };
    const params = engineParametersFromPriceBook(book);
    expect(params.excavation.machineBankCuYdPerHour).toBe(12);
    expect(params.labor.linerLaborHoursPer100SqFt).toBe(2);
    expect(params.labor.cableLaborHoursPerFt).toBe(0.03);
    // Not production rates in the book: kept from the base.
    expect(params.labor.seamLaborHoursPerFt).toBe(
      defaultEngineParameters.labor.seamLaborHoursPerFt,
    );
    expect(params.soils).toEqual(defaultEngineParameters.soils);
    expect(params.hydraulics.pipes).toEqual(defaultEngineParameters.hydraulics.pipes);
    expect(engineParametersSchema.safeParse(params).success).toBe(true);
    // The base is not changed.
    expect(defaultEngineParameters.excavation.machineBankCuYdPerHour).toBe(20);
  });

  it('makes the book pumps the candidates: id = code, label = name, the same curve', () => {
    const book = demoPriceBook();
    const params = engineParametersFromPriceBook(book);
    const pumps = book.materials.filter((material) => material.kind === 'pump');
    expect(params.hydraulics.pumps.map((pump) => pump.id)).toEqual(pumps.map((pump) => pump.code));
    expect(params.hydraulics.pumps[0]!.label).toBe(pumps[0]!.name);
    expect(params.hydraulics.pumps[0]!.curve).toEqual(pumps[0]!.pumpCurve);
  });

  it('the demo book gives the engine its own default rates', () => {
    const params = engineParametersFromPriceBook(demoPriceBook());
    expect(params.labor).toEqual(defaultEngineParameters.labor);
    expect(params.excavation).toEqual(defaultEngineParameters.excavation);
  });

  it('keeps the base pumps when the book has none', () => {
    const book = demoPriceBook();
    book.materials = book.materials.filter((material) => material.kind !== 'pump');
    const params = engineParametersFromPriceBook(book);
    expect(params.hydraulics.pumps).toEqual(defaultEngineParameters.hydraulics.pumps);
  });
});
