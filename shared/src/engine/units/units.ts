/**
 * Unit conversions with exact defined factors. The engine computes internally in US customary units
 * (ft, ft², ft³, US gal, gpm/gph, lb, short tons, ft of head) and converts only at the edges with the
 * factors below. Every factor here is exact by definition, so conversions round-trip to floating-point
 * precision.
 */

/** 1 ft = 0.3048 m exactly (international foot, 1959). NIST SP 811 App. B. */
export const METERS_PER_FOOT = 0.3048;
/** 1 ft = 12 in exactly. NIST Handbook 44, App. C. */
export const INCHES_PER_FOOT = 12;
/** 1 in = 2.54 cm exactly. NIST SP 811 App. B. */
export const CENTIMETERS_PER_INCH = 2.54;
/** 1 US gal = 231 in³ exactly. NIST Handbook 44, App. C. */
export const CUBIC_INCHES_PER_US_GALLON = 231;
/** 1 ft³ = 1728 in³ exactly. */
export const CUBIC_INCHES_PER_CUBIC_FOOT = 1728;
/** 1728 / 231 = 7.480 519 48… US gal per ft³ (derived from the two exact definitions above). */
export const US_GALLONS_PER_CUBIC_FOOT = CUBIC_INCHES_PER_CUBIC_FOOT / CUBIC_INCHES_PER_US_GALLON;
/** 1 US gal = 231 × 2.54³ / 1000 L = 3.785 411 784 L exactly. NIST SP 811 App. B.8. */
export const LITERS_PER_US_GALLON = 3.785411784;
/** 1 yd³ = 27 ft³ exactly. NIST Handbook 44, App. C. */
export const CUBIC_FEET_PER_CUBIC_YARD = 27;
/** 1 short ton = 2000 lb exactly. NIST Handbook 44, App. C (avoirdupois). */
export const POUNDS_PER_SHORT_TON = 2000;
/** 1 lb = 0.453 592 37 kg exactly (international pound, 1959). NIST SP 811 App. B. */
export const KILOGRAMS_PER_POUND = 0.45359237;
/** 1 short ton = 907.184 74 kg = 0.907 184 74 t exactly (derived). */
export const TONNES_PER_SHORT_TON = (POUNDS_PER_SHORT_TON * KILOGRAMS_PER_POUND) / 1000;
/** 1 hp (550 ft·lbf/s) = 745.699 871 6… W. NIST SP 811 App. B (from memory; rounds to 745.7). */
export const WATTS_PER_HORSEPOWER = 745.6998715822702;
/** Minutes per hour, for gph ↔ gpm. */
export const MINUTES_PER_HOUR = 60;

export const feetToMeters = (feet: number): number => feet * METERS_PER_FOOT;
export const metersToFeet = (meters: number): number => meters / METERS_PER_FOOT;
export const inchesToFeet = (inches: number): number => inches / INCHES_PER_FOOT;
export const feetToInches = (feet: number): number => feet * INCHES_PER_FOOT;
export const inchesToCentimeters = (inches: number): number => inches * CENTIMETERS_PER_INCH;
export const centimetersToInches = (centimeters: number): number =>
  centimeters / CENTIMETERS_PER_INCH;
export const squareFeetToSquareMeters = (sqFt: number): number => sqFt * METERS_PER_FOOT ** 2;
export const squareMetersToSquareFeet = (sqM: number): number => sqM / METERS_PER_FOOT ** 2;
export const cubicFeetToCubicMeters = (cuFt: number): number => cuFt * METERS_PER_FOOT ** 3;
export const cubicMetersToCubicFeet = (cuM: number): number => cuM / METERS_PER_FOOT ** 3;
export const cubicFeetToGallons = (cuFt: number): number => cuFt * US_GALLONS_PER_CUBIC_FOOT;
export const gallonsToCubicFeet = (gallons: number): number => gallons / US_GALLONS_PER_CUBIC_FOOT;
export const gallonsToLiters = (gallons: number): number => gallons * LITERS_PER_US_GALLON;
export const litersToGallons = (liters: number): number => liters / LITERS_PER_US_GALLON;
export const cubicFeetToCubicYards = (cuFt: number): number => cuFt / CUBIC_FEET_PER_CUBIC_YARD;
export const cubicYardsToCubicFeet = (cuYd: number): number => cuYd * CUBIC_FEET_PER_CUBIC_YARD;
export const cubicYardsToCubicMeters = (cuYd: number): number =>
  cubicFeetToCubicMeters(cubicYardsToCubicFeet(cuYd));
export const poundsToKilograms = (pounds: number): number => pounds * KILOGRAMS_PER_POUND;
export const kilogramsToPounds = (kilograms: number): number => kilograms / KILOGRAMS_PER_POUND;
export const poundsToShortTons = (pounds: number): number => pounds / POUNDS_PER_SHORT_TON;
export const shortTonsToPounds = (shortTons: number): number => shortTons * POUNDS_PER_SHORT_TON;
export const shortTonsToTonnes = (shortTons: number): number => shortTons * TONNES_PER_SHORT_TON;
export const tonnesToShortTons = (tonnes: number): number => tonnes / TONNES_PER_SHORT_TON;
export const gphToGpm = (gph: number): number => gph / MINUTES_PER_HOUR;
export const gpmToGph = (gpm: number): number => gpm * MINUTES_PER_HOUR;
export const gphToLitersPerMinute = (gph: number): number =>
  (gph * LITERS_PER_US_GALLON) / MINUTES_PER_HOUR;
export const litersPerMinuteToGph = (lpm: number): number =>
  (lpm * MINUTES_PER_HOUR) / LITERS_PER_US_GALLON;
