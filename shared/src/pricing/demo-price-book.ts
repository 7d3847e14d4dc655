import { FITTING_KINDS, type FittingKind } from '../engine/parameters/parameters-schema';
import { defaultEngineParameters } from '../engine/parameters/defaults';
import { CABLE_GAUGES_AWG } from '../engine/schemas/takeoff-input';
import type { Material, PriceBook } from './price-book-schema';

// DEMO DATA. Every price, wage, fee and item name below is invented for demonstrations and tests; none
// is a quote, a survey or a catalogue. A company replaces this book with its own before pricing work.

/** Nominal pipe sizes in the engine's default pipe catalogue (Sch 40 PVC), in. */
const PIPE_SIZES_IN = [1, 1.25, 1.5, 2, 3, 4] as const;

/** Invented cost per ft of Sch 40 PVC by nominal size. */
const PIPE_COST_PER_FT: Record<(typeof PIPE_SIZES_IN)[number], string> = {
  1: '1.15',
  1.25: '1.45',
  1.5: '1.75',
  2: '2.40',
  3: '4.60',
  4: '6.80',
};

/** Invented cost of each fitting at 2 in; other sizes scale with the size (see `fittingCost`). */
const FITTING_COST_AT_2_IN: Record<FittingKind, number> = {
  elbow90: 3.2,
  elbow45: 3,
  tee: 4.1,
  checkValve: 38,
  valve: 24,
};

const FITTING_NAMES: Record<FittingKind, string> = {
  elbow90: '90° elbow',
  elbow45: '45° elbow',
  tee: 'Tee',
  checkValve: 'Check valve',
  valve: 'Ball valve',
};

const sizeCode = (sizeIn: number) => String(sizeIn);

function fittingCost(kind: FittingKind, sizeIn: number): string {
  // Invented: cost grows a little faster than the size.
  return (FITTING_COST_AT_2_IN[kind] * Math.pow(sizeIn / 2, 1.3)).toFixed(2);
}

const pipes: Material[] = PIPE_SIZES_IN.map((sizeIn) => ({
  code: `PIPE-PVC40-${sizeCode(sizeIn)}`,
  name: `Sch 40 PVC pipe, ${sizeIn} in`,
  kind: 'pipe',
  unit: 'ft',
  unitCost: PIPE_COST_PER_FT[sizeIn],
  taxable: true,
  pipeMaterial: 'pvc-sch40',
  nominalSizeIn: sizeIn,
}));

const fittings: Material[] = PIPE_SIZES_IN.flatMap((sizeIn) =>
  FITTING_KINDS.map((kind): Material => ({
    code: `FIT-${kind.toUpperCase()}-${sizeCode(sizeIn)}`,
    name: `${FITTING_NAMES[kind]}, ${sizeIn} in PVC`,
    kind: 'fitting',
    unit: 'each',
    unitCost: fittingCost(kind, sizeIn),
    taxable: true,
    fittingKind: kind,
    nominalSizeIn: sizeIn,
  })),
);

/** Invented pump costs, by the engine's demo pump ids. */
const PUMP_COSTS: Record<string, string> = {
  'demo-low-2000': '289.00',
  'demo-mid-3000': '379.00',
  'demo-mid-4500': '469.00',
  'demo-high-6500': '619.00',
  'demo-head-4000': '559.00',
};

// The engine's five demo pumps with their curves; material code = engine pump id, so the takeoff's
// best pump is always priced. The book lists curve points by rising flow (the engine sorts them itself).
const pumps: Material[] = defaultEngineParameters.hydraulics.pumps.map((pump) => ({
  code: pump.id,
  name: pump.label.replace('(demo data)', '(demo)'),
  kind: 'pump',
  unit: 'each',
  unitCost: PUMP_COSTS[pump.id] ?? '400.00',
  taxable: true,
  pumpCurve: [...pump.curve].sort((a, b) => a.flowGph - b.flowGph).map((point) => ({ ...point })),
}));

const transformers: Material[] = defaultEngineParameters.lighting.transformerSizesWatts.map(
  (watts) => ({
    code: `XFMR-${watts}`,
    name: `Low-voltage transformer, ${watts} W`,
    kind: 'transformer',
    unit: 'each',
    unitCost: (95 + watts * 0.32).toFixed(2),
    taxable: true,
    ratingWatts: watts,
  }),
);

/** Invented cost per ft of direct-burial low-voltage cable by gauge (AWG). */
const CABLE_COST_PER_FT: Record<(typeof CABLE_GAUGES_AWG)[number], string> = {
  '18': '0.32',
  '16': '0.42',
  '14': '0.55',
  '12': '0.78',
  '10': '1.12',
  '8': '1.65',
  '6': '2.45',
};

const cables: Material[] = CABLE_GAUGES_AWG.map((gauge) => ({
  code: `CABLE-${gauge}`,
  name: `Low-voltage cable, ${gauge}/2 AWG, direct burial`,
  kind: 'cable',
  unit: 'ft',
  unitCost: CABLE_COST_PER_FT[gauge],
  taxable: true,
  cableGaugeAwg: gauge,
}));

/**
 * A complete, plausible price book of invented prices (DEMO DATA), consistent with the engine's
 * defaults: the five demo pumps with their curves (material code = engine pump id), Sch 40 PVC pipe and
 * every fitting kind in each size of the engine's pipe catalogue, every cable gauge the engine knows,
 * transformers in the engine's ratings, and production rates equal to the engine's default rates. It
 * prices `examplePondInput()` with nothing missing. A new object on every call.
 */
export function demoPriceBook(): PriceBook {
  const labor = defaultEngineParameters.labor;
  return {
    currency: 'USD',
    materials: [
      {
        code: 'LINER-EPDM-45',
        name: 'EPDM pond liner, 45 mil',
        kind: 'liner',
        unit: 'sq ft',
        unitCost: '0.89',
        taxable: true,
        linerThicknessMil: 45,
        linerWeightLbPerSqFt: 0.27,
      },
      {
        code: 'LINER-EPDM-60',
        name: 'EPDM pond liner, 60 mil',
        kind: 'liner',
        unit: 'sq ft',
        unitCost: '1.19',
        taxable: true,
        linerThicknessMil: 60,
        linerWeightLbPerSqFt: 0.36,
      },
      {
        code: 'UNDERLAY-8OZ',
        name: 'Nonwoven underlayment, 8 oz',
        kind: 'underlayment',
        unit: 'sq ft',
        unitCost: '0.32',
        taxable: true,
      },
      {
        code: 'BOULDER-S',
        name: 'Fieldstone boulders, small (6–12 in)',
        kind: 'boulder',
        unit: 'short ton',
        unitCost: '165.00',
        taxable: true,
        boulderSize: 'small',
      },
      {
        code: 'BOULDER-M',
        name: 'Fieldstone boulders, medium (12–18 in)',
        kind: 'boulder',
        unit: 'short ton',
        unitCost: '175.00',
        taxable: true,
        boulderSize: 'medium',
      },
      {
        code: 'BOULDER-L',
        name: 'Fieldstone boulders, large (18–24 in)',
        kind: 'boulder',
        unit: 'short ton',
        unitCost: '190.00',
        taxable: true,
        boulderSize: 'large',
      },
      {
        code: 'GRAVEL-RIVER-MIX',
        name: 'Washed river gravel, mixed ¾–2 in',
        kind: 'gravel',
        unit: 'short ton',
        unitCost: '62.00',
        taxable: true,
      },
      ...pipes,
      ...fittings,
      {
        code: 'SKIM-MID',
        name: 'Pond skimmer, mid-size',
        kind: 'skimmer',
        unit: 'each',
        unitCost: '415.00',
        taxable: true,
        ratedFlowGph: 4000,
      },
      {
        code: 'SKIM-LARGE',
        name: 'Pond skimmer, large',
        kind: 'skimmer',
        unit: 'each',
        unitCost: '545.00',
        taxable: true,
        ratedFlowGph: 9000,
      },
      {
        code: 'FBOX-MID',
        name: 'Waterfall filter box, 17 in weir',
        kind: 'filter-box',
        unit: 'each',
        unitCost: '435.00',
        taxable: true,
        ratedFlowGph: 4500,
      },
      {
        code: 'FBOX-LARGE',
        name: 'Waterfall filter box, 26 in weir',
        kind: 'filter-box',
        unit: 'each',
        unitCost: '589.00',
        taxable: true,
        ratedFlowGph: 9000,
      },
      ...pumps,
      {
        code: 'LIGHT-LED-10',
        name: 'Underwater LED light, 10 W',
        kind: 'light',
        unit: 'each',
        unitCost: '49.00',
        taxable: true,
        watts: 10,
      },
      {
        code: 'LIGHT-LED-20',
        name: 'Underwater LED light, 20 W',
        kind: 'light',
        unit: 'each',
        unitCost: '64.00',
        taxable: true,
        watts: 20,
      },
      {
        code: 'LIGHT-LED-35',
        name: 'Underwater LED spotlight, 35 W',
        kind: 'light',
        unit: 'each',
        unitCost: '89.00',
        taxable: true,
        watts: 35,
      },
      ...transformers,
      ...cables,
      {
        code: 'BLOCK-STORAGE',
        name: 'Water storage blocks',
        kind: 'storage-block',
        unit: 'cu ft',
        unitCost: '9.75',
        taxable: true,
      },
      {
        code: 'PLANT-MARGINAL',
        name: 'Marginal plant, 1 gal pot',
        kind: 'plant',
        unit: 'each',
        unitCost: '14.50',
        taxable: true,
      },
      {
        code: 'PLANT-LILY',
        name: 'Hardy water lily',
        kind: 'plant',
        unit: 'each',
        unitCost: '42.00',
        taxable: true,
      },
      {
        code: 'AUTOFILL-KIT',
        name: 'Auto-fill valve kit',
        kind: 'extra',
        unit: 'each',
        unitCost: '118.00',
        taxable: true,
      },
      {
        code: 'BACTERIA-START',
        name: 'Start-up beneficial bacteria',
        kind: 'extra',
        unit: 'each',
        unitCost: '36.00',
        taxable: true,
      },
    ],
    laborRoles: [
      { code: 'LEAD', name: 'Crew lead', wagePerHour: '32.00', burdenPct: '28' },
      { code: 'INSTALLER', name: 'Installer', wagePerHour: '23.50', burdenPct: '28' },
      { code: 'LV-TECH', name: 'Low-voltage technician', wagePerHour: '30.00', burdenPct: '30' },
    ],
    equipment: [
      {
        code: 'MTL-36',
        name: 'Mini track loader, 36 in tracks',
        use: 'excavation',
        dailyRate: '285.00',
        minimumDays: 1,
        deliveryFee: '150.00',
        widthIn: 36,
      },
      {
        code: 'MINI-EX-55',
        name: 'Mini excavator, 55 in',
        use: 'excavation',
        dailyRate: '345.00',
        minimumDays: 1,
        deliveryFee: '175.00',
        widthIn: 55,
      },
      {
        code: 'STONE-GRAB',
        name: 'Stone grab attachment',
        use: 'rock',
        dailyRate: '95.00',
        minimumDays: 1,
        deliveryFee: '0.00',
        widthIn: 36,
      },
    ],
    disposal: [
      {
        code: 'HAUL-YD',
        name: 'Spoil haul-off and tipping, per loose yd³',
        basis: 'per-loose-cu-yd',
        unitCost: '38.00',
      },
      {
        code: 'HAUL-TON',
        name: 'Spoil tipping, per ton',
        basis: 'per-short-ton',
        unitCost: '46.00',
      },
    ],
    productionRates: {
      machineBankCuYdPerHour: defaultEngineParameters.excavation.machineBankCuYdPerHour,
      boulderHandLaborHoursPerShortTon: labor.boulderHandLaborHoursPerShortTon,
      boulderMachineLaborHoursPerShortTon: labor.boulderMachineLaborHoursPerShortTon,
      gravelLaborHoursPerShortTon: labor.gravelLaborHoursPerShortTon,
      linerLaborHoursPer100SqFt: labor.linerLaborHoursPer100SqFt,
      pipeLaborHoursPerFt: labor.pipeLaborHoursPerFt,
      fittingLaborHoursEach: labor.fittingLaborHoursEach,
      pumpSetLaborHours: labor.pumpSetLaborHours,
      fixtureLaborHoursEach: labor.fixtureLaborHoursEach,
      cableLaborHoursPerFt: labor.cableLaborHoursPerFt,
    },
    settings: {
      mobilizationCost: '350.00',
      minimumJobPrice: '2500.00',
      contingencyPct: '5',
      salesTaxPct: '7.25',
      depositPct: '30',
      taskRoles: {
        excavation: 'INSTALLER',
        rockPlacing: 'LEAD',
        linerUnderlayment: 'INSTALLER',
        plumbingEquipment: 'LEAD',
        electricalLighting: 'LV-TECH',
        renovationTearOut: 'INSTALLER',
        cleanUp: 'INSTALLER',
      },
      defaultLinerCode: 'LINER-EPDM-45',
      defaultUnderlaymentCode: 'UNDERLAY-8OZ',
      defaultGravelCode: 'GRAVEL-RIVER-MIX',
      defaultDisposalCode: 'HAUL-YD',
    },
    policy: {
      markupPct: { materials: '45', labor: '55', equipment: '25', disposal: '20', other: '20' },
      marginFloorPct: '25',
      discountCeilingPct: '10',
    },
  };
}
