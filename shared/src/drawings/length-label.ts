import { toDisplay, type QuantityKind, type UnitSystem } from '../engine/units/display';

/**
 * A drawing label for a length in the estimate's unit system, e.g. "15 ft" or "4.57 m". `kind` is the
 * engine unit the value is in ('ft' or 'in'); rounded to that kind's display decimals.
 */
export function lengthLabel(value: number, kind: QuantityKind, system: UnitSystem): string {
  const shown = toDisplay(value, kind, system);
  return `${shown.value} ${shown.unit}`;
}
