import {
  centimetersToInches,
  feetToMeters,
  inchesToCentimeters,
  metersToFeet,
  roundTo,
  shortTonsToTonnes,
  squareFeetToSquareMeters,
  squareMetersToSquareFeet,
  tonnesToShortTons,
  type UnitSystem,
} from '@pondwright/shared/engine';
import { formatNumber } from './format-quantity';

type MeasurementSpec = {
  us: string;
  metric: string;
  toMetric: (value: number) => number;
  fromMetric: (value: number) => number;
  /** Decimals shown when a stored value is put back into an input, e.g. after a switch of system. */
  usDecimals: number;
  metricDecimals: number;
};

/**
 * The measurements the takeoff form takes, keyed by the US unit of the engine's field, with the exact
 * conversions of the shared engine. Counts, percentages, watts, hours, AWG gauges and nominal pipe
 * sizes are the same in both systems and are not listed.
 */
export const MEASUREMENTS = {
  ft: {
    us: 'ft',
    metric: 'm',
    toMetric: feetToMeters,
    fromMetric: metersToFeet,
    usDecimals: 2,
    metricDecimals: 2,
  },
  in: {
    us: 'in',
    metric: 'cm',
    toMetric: inchesToCentimeters,
    fromMetric: centimetersToInches,
    usDecimals: 2,
    metricDecimals: 1,
  },
  sqFt: {
    us: 'ft²',
    metric: 'm²',
    toMetric: squareFeetToSquareMeters,
    fromMetric: squareMetersToSquareFeet,
    usDecimals: 1,
    metricDecimals: 2,
  },
  shortTon: {
    us: 'tons',
    metric: 't',
    toMetric: shortTonsToTonnes,
    fromMetric: tonnesToShortTons,
    usDecimals: 2,
    metricDecimals: 2,
  },
} as const satisfies Record<string, MeasurementSpec>;

export type MeasurementKind = keyof typeof MEASUREMENTS;

export function measurementUnit(kind: MeasurementKind, system: UnitSystem): string {
  return MEASUREMENTS[kind][system];
}

/** "Length (ft)" → "Length (m)": a label's trailing unit replaced by the system's. */
export function withUnit(label: string, kind: MeasurementKind, system: UnitSystem): string {
  return `${label.replace(/ \([^)]*\)$/, '')} (${measurementUnit(kind, system)})`;
}

const isNumber = (value: unknown): value is number =>
  typeof value === 'number' && Number.isFinite(value);

/**
 * A stored US value as an input shows it in `system`, rounded to the kind's display decimals. A
 * cleared or half-typed entry ('', '-') is shown as it is.
 */
export function toShownValue(
  usValue: unknown,
  kind: MeasurementKind,
  system: UnitSystem,
): number | string {
  if (!isNumber(usValue)) return typeof usValue === 'string' ? usValue : '';
  const spec: MeasurementSpec = MEASUREMENTS[kind];
  return system === 'us'
    ? roundTo(usValue, spec.usDecimals)
    : roundTo(spec.toMetric(usValue), spec.metricDecimals);
}

/** A typed entry in the engine's US unit, converted exactly and not rounded. */
export function toUsValue(
  shown: number | string,
  kind: MeasurementKind,
  system: UnitSystem,
): number | string {
  if (system === 'us' || !isNumber(shown)) return shown;
  return MEASUREMENTS[kind].fromMetric(shown);
}

/** A stored US value's number as shown in `system`, e.g. "4.57" for 15 ft in metric. */
export function formatShownNumber(usValue: unknown, kind: MeasurementKind, system: UnitSystem) {
  const shown = toShownValue(usValue, kind, system);
  return isNumber(shown) ? formatNumber(shown) : String(shown);
}

/** "4.57 m" for a stored 15 ft. */
export function formatMeasurement(usValue: unknown, kind: MeasurementKind, system: UnitSystem) {
  return `${formatShownNumber(usValue, kind, system)} ${measurementUnit(kind, system)}`;
}
