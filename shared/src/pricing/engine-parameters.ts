import { defaultEngineParameters } from '../engine/parameters/defaults';
import type { EngineParameters, PumpCandidate } from '../engine/parameters/parameters-schema';
import type { PriceBook } from './price-book-schema';

/**
 * The takeoff engine's parameters for a price book: the book's crew production rates replace the
 * engine's excavation and labor rates, and the book's pumps become the engine's pump candidates
 * (id = material code, label = material name, curve = the material's pump curve), so the takeoff's
 * best pump is always something the book can price. A book with no pumps keeps `base`'s candidates:
 * the takeoff still sizes a pump, and pricing reports the pump as missing from the book.
 * Every other parameter comes from `base`. Pure; no rounding.
 *
 * @param book a validated price book (`priceBookSchema`).
 * @param base the parameters to start from, `defaultEngineParameters` unless given.
 */
export function engineParametersFromPriceBook(
  book: PriceBook,
  base: EngineParameters = defaultEngineParameters,
): EngineParameters {
  const rates = book.productionRates;
  const pumps: PumpCandidate[] = book.materials
    .filter((material) => material.kind === 'pump' && material.pumpCurve !== undefined)
    .map((material) => ({
      id: material.code,
      label: material.name,
      curve: material.pumpCurve!.map((point) => ({ ...point })),
    }));
  return {
    ...base,
    excavation: { ...base.excavation, machineBankCuYdPerHour: rates.machineBankCuYdPerHour },
    hydraulics: { ...base.hydraulics, pumps: pumps.length > 0 ? pumps : base.hydraulics.pumps },
    labor: {
      ...base.labor,
      boulderHandLaborHoursPerShortTon: rates.boulderHandLaborHoursPerShortTon,
      boulderMachineLaborHoursPerShortTon: rates.boulderMachineLaborHoursPerShortTon,
      gravelLaborHoursPerShortTon: rates.gravelLaborHoursPerShortTon,
      linerLaborHoursPer100SqFt: rates.linerLaborHoursPer100SqFt,
      pipeLaborHoursPerFt: rates.pipeLaborHoursPerFt,
      fittingLaborHoursEach: rates.fittingLaborHoursEach,
      pumpSetLaborHours: rates.pumpSetLaborHours,
      fixtureLaborHoursEach: rates.fixtureLaborHoursEach,
      cableLaborHoursPerFt: rates.cableLaborHoursPerFt,
    },
  };
}
