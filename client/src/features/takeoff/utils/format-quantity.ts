import { toDisplay, type QuantityKind, type UnitSystem } from '@pondwright/shared/engine';

const numberFormat = new Intl.NumberFormat('en-US', { maximumFractionDigits: 3 });

export type DisplayQuantity = { value: number; unit: string };

/** "1,326 gal", "13.94 m²"; a count has no unit. */
export function formatQuantity({ value, unit }: DisplayQuantity): string {
  const number = numberFormat.format(value);
  return unit ? `${number} ${unit}` : number;
}

/** An engine figure (in its US unit) as shown in the chosen unit system, rounded for display. */
export function show(value: number, kind: QuantityKind, system: UnitSystem): string {
  return formatQuantity(toDisplay(value, kind, system));
}

export function formatNumber(value: number): string {
  return numberFormat.format(value);
}
