import {
  cubicFeetToCubicMeters,
  cubicYardsToCubicMeters,
  feetToMeters,
  gallonsToLiters,
  gphToLitersPerMinute,
  inchesToCentimeters,
  poundsToKilograms,
  shortTonsToTonnes,
  squareFeetToSquareMeters,
} from './units';
import { roundTo } from './rounding';

/** The two unit systems a company or an estimate can choose for display. */
export const UNIT_SYSTEMS = ['us', 'metric'] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

type KindSpec = {
  us: string;
  metric: string;
  toMetric: (value: number) => number;
  usDecimals: number;
  metricDecimals: number;
};

const identity = (value: number): number => value;

/**
 * Every kind of quantity the takeoff reports, keyed by the unit the engine uses internally, with the
 * unit shown in each system and the decimals used for display.
 */
export const QUANTITY_KINDS = {
  ft: { us: 'ft', metric: 'm', toMetric: feetToMeters, usDecimals: 1, metricDecimals: 2 },
  in: { us: 'in', metric: 'cm', toMetric: inchesToCentimeters, usDecimals: 1, metricDecimals: 1 },
  sqFt: {
    us: 'ft²',
    metric: 'm²',
    toMetric: squareFeetToSquareMeters,
    usDecimals: 1,
    metricDecimals: 2,
  },
  cuFt: {
    us: 'ft³',
    metric: 'm³',
    toMetric: cubicFeetToCubicMeters,
    usDecimals: 1,
    metricDecimals: 3,
  },
  cuYd: {
    us: 'yd³',
    metric: 'm³',
    toMetric: cubicYardsToCubicMeters,
    usDecimals: 2,
    metricDecimals: 2,
  },
  gal: { us: 'gal', metric: 'L', toMetric: gallonsToLiters, usDecimals: 0, metricDecimals: 0 },
  lb: { us: 'lb', metric: 'kg', toMetric: poundsToKilograms, usDecimals: 0, metricDecimals: 0 },
  shortTon: {
    us: 'tons',
    metric: 't',
    toMetric: shortTonsToTonnes,
    usDecimals: 2,
    metricDecimals: 2,
  },
  gph: {
    us: 'gph',
    metric: 'L/min',
    toMetric: gphToLitersPerMinute,
    usDecimals: 0,
    metricDecimals: 1,
  },
  headFt: {
    us: 'ft of head',
    metric: 'm of head',
    toMetric: feetToMeters,
    usDecimals: 2,
    metricDecimals: 2,
  },
  ftPerS: { us: 'ft/s', metric: 'm/s', toMetric: feetToMeters, usDecimals: 2, metricDecimals: 2 },
  watt: { us: 'W', metric: 'W', toMetric: identity, usDecimals: 0, metricDecimals: 0 },
  kwh: { us: 'kWh', metric: 'kWh', toMetric: identity, usDecimals: 0, metricDecimals: 0 },
  volt: { us: 'V', metric: 'V', toMetric: identity, usDecimals: 2, metricDecimals: 2 },
  amp: { us: 'A', metric: 'A', toMetric: identity, usDecimals: 2, metricDecimals: 2 },
  hour: { us: 'h', metric: 'h', toMetric: identity, usDecimals: 1, metricDecimals: 1 },
  day: {
    us: 'crew-days',
    metric: 'crew-days',
    toMetric: identity,
    usDecimals: 1,
    metricDecimals: 1,
  },
  count: { us: '', metric: '', toMetric: identity, usDecimals: 0, metricDecimals: 0 },
  percent: { us: '%', metric: '%', toMetric: identity, usDecimals: 1, metricDecimals: 1 },
  ratio: { us: '', metric: '', toMetric: identity, usDecimals: 3, metricDecimals: 3 },
} as const satisfies Record<string, KindSpec>;

export type QuantityKind = keyof typeof QUANTITY_KINDS;
export const QUANTITY_KIND_NAMES = Object.keys(QUANTITY_KINDS) as [QuantityKind, ...QuantityKind[]];

export type DisplayQuantity = { value: number; unit: string };

/**
 * Converts an engine quantity (in its US customary unit) to the chosen display system and rounds it to
 * the display decimals of its kind. Conversion uses the exact factors of `units.ts`.
 */
export function toDisplay(value: number, kind: QuantityKind, system: UnitSystem): DisplayQuantity {
  const spec: KindSpec = QUANTITY_KINDS[kind];
  if (system === 'us') return { value: roundTo(value, spec.usDecimals), unit: spec.us };
  return { value: roundTo(spec.toMetric(value), spec.metricDecimals), unit: spec.metric };
}
