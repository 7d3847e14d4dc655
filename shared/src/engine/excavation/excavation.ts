import { ceilCount } from '../units/rounding';
import { CUBIC_FEET_PER_CUBIC_YARD, POUNDS_PER_SHORT_TON } from '../units/units';

export type ExcavationResult = {
  bankCuYd: number;
  looseCuYd: number;
  /** Weight of the spoil at its bank density, short tons. */
  massShortTons: number;
  hauledLooseCuYd: number;
  hauledShortTons: number;
  /** Loads for the chosen vehicle: the larger of the volume and the weight limits. */
  haulLoads: number;
  /** Wheelbarrow trips to carry all loose spoil out by hand; null when a machine can reach. */
  wheelbarrowTrips: number | null;
};

/**
 * Excavation quantities. Loose = bank × swell; weight = bank ft³ × bank density; haul loads =
 * max(⌈hauled loose yd³ / vehicle yd³⌉, ⌈hauled tons / vehicle tons⌉); wheelbarrow trips =
 * ⌈loose ft³ / ft³ per trip⌉ when the spoil has to be carried by hand. Inputs ft³, lb/ft³, %;
 * loads and trips rounded up, the rest not rounded. Sources: swell FM 5-434 Table 1-2 (REFERENCES
 * 6.5); densities REFERENCES 6.4; vehicle and wheelbarrow sizes common practice.
 */
export function excavationQuantities(args: {
  bankCuFt: number;
  swellFactor: number;
  bankDensityLbPerCuFt: number;
  spoilHauledPct: number;
  vehicle: { capacityLooseCuYd: number; capacityShortTons: number };
  handCarry: boolean;
  wheelbarrowLooseCuFtPerTrip: number;
}): ExcavationResult {
  const bankCuYd = args.bankCuFt / CUBIC_FEET_PER_CUBIC_YARD;
  const looseCuYd = bankCuYd * args.swellFactor;
  const massShortTons = (args.bankCuFt * args.bankDensityLbPerCuFt) / POUNDS_PER_SHORT_TON;
  const share = args.spoilHauledPct / 100;
  const hauledLooseCuYd = looseCuYd * share;
  const hauledShortTons = massShortTons * share;
  const haulLoads = Math.max(
    ceilCount(hauledLooseCuYd / args.vehicle.capacityLooseCuYd),
    ceilCount(hauledShortTons / args.vehicle.capacityShortTons),
  );
  const wheelbarrowTrips = args.handCarry
    ? ceilCount((looseCuYd * CUBIC_FEET_PER_CUBIC_YARD) / args.wheelbarrowLooseCuFtPerTrip)
    : null;
  return {
    bankCuYd,
    looseCuYd,
    massShortTons,
    hauledLooseCuYd,
    hauledShortTons,
    haulLoads,
    wheelbarrowTrips,
  };
}
