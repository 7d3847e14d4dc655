import { cubicYardsToCubicMeters } from '../units/units';
import type { EngineParameters } from './parameters-schema';

/** 0.764 554 857 984 m³ per yd³ (exact), for rates published per m³. */
const CUBIC_METERS_PER_CUBIC_YARD = cubicYardsToCubicMeters(1);

/**
 * The defaults the engine uses until a company's price book supplies its own values. Each one is marked
 * with its source, or as common practice with no source. "REFERENCES x.y" points to the row in
 * docs/references.md that records the source and how well it is confirmed.
 */
export const defaultEngineParameters: EngineParameters = {
  geometry: {
    // Battered walls slope 1 ft in per 4 ft down. Common practice, no source.
    batterRunPerRise: 0.25,
    // Rock and gravel may take at most half the basin's volume; above that the input is rejected as a
    // likely mistake (stones larger than the pond can hold). Pondwright rule, no source.
    maxRockShareOfBasin: 0.5,
    // Ovals are drawn as a 128-sided polygon only when an inset goes past the ellipse's smallest
    // radius of curvature (b²/a); otherwise insets are analytic. Pondwright rule.
    ovalPolygonSegments: 128,
  },
  liner: {
    // 1 ft overlap on each edge. Common practice, no source (REFERENCES 3.1).
    overlapPerEdgeFt: 1,
    // Pond EPDM stock widths in 5-ft steps, 10–50 ft. Common practice / from memory (REFERENCES 3.3).
    sheetWidthsFt: [10, 15, 20, 25, 30, 35, 40, 45, 50],
    // Lengths are cut from rolls and ordered in 5-ft steps. Common practice (REFERENCES 3.3).
    lengthStepFt: 5,
    // Panels overlap 6 in at a taped seam. Common practice, no source.
    seamOverlapFt: 0.5,
    // 45-mil EPDM ≈ 0.27 lb/ft². DERIVED (REFERENCES 3.5; the specific gravity 1.15 is from memory).
    weightLbPerSqFt: 0.27,
    // Stream liner: length (or width) + 2 × drop + 5 ft. Common practice, no source (REFERENCES 3.6).
    streamAllowanceFt: 5,
  },
  rock: {
    // Granite, solid: 165 lb/ft³. ASCE 7 commentary Table C3-2, from memory (REFERENCES 6.2).
    stoneDensityLbPerCuFt: 165,
    // A boulder fills about 0.52 of its bounding cube (π/6 for an ellipsoid). DERIVED (REFERENCES 9.7, 6.2).
    boulderShapeFactor: 0.52,
    // Nominal stone sizes: small 6–12 in, medium 12–18 in, large 18–24 in (mid-points). Common practice,
    // no source.
    boulderSizeIn: { small: 9, medium: 15, large: 21 },
    // Gravel, loose bulk: 1.4 short tons per yd³. Quarry weights table (REFERENCES 6.3, secondary).
    gravelBulkShortTonsPerCuYd: 1.4,
    // Boulders line a 1.5-ft band along each stream edge. Common practice, no source.
    streamEdgeBandFt: 1.5,
    // Stones over about 50 lb need help or a machine. TRADE.md cautions; common practice, no source.
    heavyStoneLb: 50,
  },
  soils: {
    'sand-gravel': {
      label: 'Sand or gravel',
      // FM 5-434 Table 1-2: sand 100 bank → 111 loose (REFERENCES 6.5, confirmed secondary).
      swellFactor: 1.11,
      // ASCE 7 Table C3-2 sand and gravel, dry packed 110 lb/ft³. From memory (REFERENCES 6.3).
      bankDensityLbPerCuFt: 110,
      // 1.20 h/m³ hand excavation in sand (labour-factor directory, REFERENCES 8.1, secondary).
      handDigLaborHoursPerBankCuYd: 1.2 * CUBIC_METERS_PER_CUBIC_YARD,
      // 1.0 h/m³ hand loading, sand (REFERENCES 8.2, secondary).
      handLoadLaborHoursPerBankCuYd: 1.0 * CUBIC_METERS_PER_CUBIC_YARD,
    },
    loam: {
      label: 'Loam or common earth',
      // FM 5-434 Table 1-2: loam 1.25. From memory (REFERENCES 6.5).
      swellFactor: 1.25,
      // Earth, damp packed 2592 lb/yd³ = 96 lb/ft³ (quarry table, REFERENCES 6.4, secondary).
      bankDensityLbPerCuFt: 96,
      // 2.20 h/m³, medium soil (REFERENCES 8.1).
      handDigLaborHoursPerBankCuYd: 2.2 * CUBIC_METERS_PER_CUBIC_YARD,
      // 1.3 h/m³, medium soil (REFERENCES 8.2).
      handLoadLaborHoursPerBankCuYd: 1.3 * CUBIC_METERS_PER_CUBIC_YARD,
    },
    clay: {
      label: 'Clay',
      // FM 5-434 Table 1-2: clay 1.43. From memory (REFERENCES 6.5).
      swellFactor: 1.43,
      // ASCE 7 Table C3-2 clay, damp 110 lb/ft³. From memory (REFERENCES 6.4).
      bankDensityLbPerCuFt: 110,
      // 3.30 h/m³, heavy soil (REFERENCES 8.1).
      handDigLaborHoursPerBankCuYd: 3.3 * CUBIC_METERS_PER_CUBIC_YARD,
      // 1.9 h/m³, heavy soil (REFERENCES 8.2).
      handLoadLaborHoursPerBankCuYd: 1.9 * CUBIC_METERS_PER_CUBIC_YARD,
    },
  },
  excavation: {
    // Mini excavator ≈ 20 bank yd³/h. Trenching cost guide, secondary; common practice (REFERENCES 8.3).
    machineBankCuYdPerHour: 20,
    // About 1 labor-hour of hand trimming per 12 bank yd³ dug by machine (REFERENCES 8.3).
    machineTrimLaborHoursPerBankCuYd: 1 / 12,
    // A mini track loader or mini excavator needs about 36 in of clear access. Common practice, no source.
    machineMinAccessWidthIn: 36,
    // A contractor wheelbarrow carries about 4 ft³ of loose soil per trip. Common practice, no source.
    wheelbarrowLooseCuFtPerTrip: 4,
    // Wheel, spread and level: 1.25 h/m³ for up to 50 m (REFERENCES 8.2, secondary).
    wheelSpreadLaborHoursPerLooseCuYd: 1.25 * CUBIC_METERS_PER_CUBIC_YARD,
    // …that rate holds to 50 m = 164.04 ft; farther carries scale it in proportion (Pondwright rule).
    wheelRateDistanceFt: 50 / 0.3048,
    // Streams are dug about 8 in deep for liner, underlayment and gravel. Common practice, no source.
    streamDigDepthIn: 8,
    // Vehicle capacities: set these from your own trucks and trailers. Common practice, no source.
    haulVehicles: [
      {
        id: 'dump-truck',
        label: 'Dump truck, 10 yd³',
        capacityLooseCuYd: 10,
        capacityShortTons: 13,
      },
      {
        id: 'dump-trailer',
        label: 'Dump trailer, 5 yd³',
        capacityLooseCuYd: 5,
        capacityShortTons: 6,
      },
      {
        id: 'pickup',
        label: 'Pickup truck, 1.5 yd³',
        capacityLooseCuYd: 1.5,
        capacityShortTons: 1,
      },
    ],
  },
  hydraulics: {
    // Hazen–Williams, ft of head per 100 ft = 1044 × (Q/C)^1.852 / d^4.8655 (Q gpm, d inside in).
    // NFPA 13 form as printed in a pump-handbook appendix (REFERENCES 5.1, confirmed secondary).
    hazenWilliamsConstant: 1044,
    hazenWilliamsFlowExponent: 1.852,
    hazenWilliamsDiameterExponent: 4.8655,
    // The fitting equivalent lengths below are for Sch 40 steel at C = 120 (NFPA 13, REFERENCES 5.9).
    fittingTableC: 120,
    // Pressure (discharge) side ≤ 5 ft/s: thermoplastic pipe guidance and pond trade practice
    // (REFERENCES 5.7).
    maxPressureVelocityFtPerS: 5,
    // Suction side ≤ 4 ft/s: pond trade practice 3–4 ft/s; pool codes allow 6 (REFERENCES 5.8).
    maxSuctionVelocityFtPerS: 4,
    // One turnover of the pond volume per hour. Common practice, no source (REFERENCES 4.1).
    turnoversPerHour: 1,
    // Waterfall flow per inch of weir: light 50, medium 100, heavy 200 gph/in. Trade publication tech
    // tip; common practice (REFERENCES 4.2).
    weirGphPerInch: { light: 50, medium: 100, heavy: 200 },
    // Pond pumps run all year round: 365 × 24 h. Common practice, no source.
    pumpHoursPerYear: 8760,
    // A running stream carries about 1.5 in of moving water that drains back when the pump stops.
    // Common practice, no source; low confidence.
    streamRunningDepthIn: 1.5,
    // A pond-free waterfall's reservoir holds 1.5 × the drain-back. Common practice, no source.
    reservoirSafetyFactor: 1.5,
    // Water storage blocks are about 95 % open. Common practice, no source.
    storageBlockVoidFraction: 0.95,
    // Sch 40 PVC inside diameters = OD − 2 × minimum wall, ASTM D1785 (REFERENCES 5.5); C = 150 for
    // plastic pipe, NFPA 13 (REFERENCES 5.3).
    pipes: [
      {
        material: 'pvc-sch40',
        label: 'PVC Schedule 40',
        nominalSizeIn: 1,
        insideDiameterIn: 1.049,
        hazenWilliamsC: 150,
      },
      {
        material: 'pvc-sch40',
        label: 'PVC Schedule 40',
        nominalSizeIn: 1.25,
        insideDiameterIn: 1.38,
        hazenWilliamsC: 150,
      },
      {
        material: 'pvc-sch40',
        label: 'PVC Schedule 40',
        nominalSizeIn: 1.5,
        insideDiameterIn: 1.61,
        hazenWilliamsC: 150,
      },
      {
        material: 'pvc-sch40',
        label: 'PVC Schedule 40',
        nominalSizeIn: 2,
        insideDiameterIn: 2.067,
        hazenWilliamsC: 150,
      },
      {
        material: 'pvc-sch40',
        label: 'PVC Schedule 40',
        nominalSizeIn: 3,
        insideDiameterIn: 3.068,
        hazenWilliamsC: 150,
      },
      {
        material: 'pvc-sch40',
        label: 'PVC Schedule 40',
        nominalSizeIn: 4,
        insideDiameterIn: 4.026,
        hazenWilliamsC: 150,
      },
    ],
    // NFPA 13 equivalent Sch 40 steel pipe lengths, ft (REFERENCES 5.9). "valve" is a gate valve.
    // null = not in the table; the engine then uses the next larger size's value (conservative).
    fittingEquivalentLengthsFt: [
      { nominalSizeIn: 1, elbow90: 2, elbow45: 1, tee: 5, checkValve: 5, valve: null },
      { nominalSizeIn: 1.25, elbow90: 3, elbow45: null, tee: 6, checkValve: 7, valve: null },
      { nominalSizeIn: 1.5, elbow90: 4, elbow45: 2, tee: 8, checkValve: 9, valve: null },
      { nominalSizeIn: 2, elbow90: 5, elbow45: 2, tee: 10, checkValve: 11, valve: 1 },
      { nominalSizeIn: 3, elbow90: 7, elbow45: 3, tee: 15, checkValve: 16, valve: 1 },
      { nominalSizeIn: 4, elbow90: 10, elbow45: 4, tee: 20, checkValve: 22, valve: 2 },
    ],
    // DEMO DATA: invented pumps with invented but plausible curves. Replace with real catalogue data.
    pumps: [
      {
        id: 'demo-low-2000',
        label: 'Low-flow pump 2,000 (demo data)',
        curve: [
          { flowGph: 2000, headFt: 0, inputWatts: 150 },
          { flowGph: 1650, headFt: 4, inputWatts: 155 },
          { flowGph: 1200, headFt: 8, inputWatts: 160 },
          { flowGph: 500, headFt: 12, inputWatts: 165 },
          { flowGph: 0, headFt: 14, inputWatts: 165 },
        ],
      },
      {
        id: 'demo-mid-3000',
        label: 'Mid-flow pump 3,000 (demo data)',
        curve: [
          { flowGph: 3000, headFt: 0, inputWatts: 230 },
          { flowGph: 2500, headFt: 5, inputWatts: 240 },
          { flowGph: 1800, headFt: 10, inputWatts: 250 },
          { flowGph: 900, headFt: 15, inputWatts: 255 },
          { flowGph: 0, headFt: 19, inputWatts: 255 },
        ],
      },
      {
        id: 'demo-mid-4500',
        label: 'Mid-flow pump 4,500 (demo data)',
        curve: [
          { flowGph: 4500, headFt: 0, inputWatts: 330 },
          { flowGph: 3900, headFt: 5, inputWatts: 345 },
          { flowGph: 3100, headFt: 10, inputWatts: 360 },
          { flowGph: 2000, headFt: 15, inputWatts: 370 },
          { flowGph: 700, headFt: 20, inputWatts: 375 },
          { flowGph: 0, headFt: 22, inputWatts: 375 },
        ],
      },
      {
        id: 'demo-high-6500',
        label: 'High-flow pump 6,500 (demo data)',
        curve: [
          { flowGph: 6500, headFt: 0, inputWatts: 450 },
          { flowGph: 5800, headFt: 5, inputWatts: 470 },
          { flowGph: 4900, headFt: 10, inputWatts: 490 },
          { flowGph: 3800, headFt: 15, inputWatts: 505 },
          { flowGph: 2400, headFt: 20, inputWatts: 515 },
          { flowGph: 700, headFt: 25, inputWatts: 520 },
          { flowGph: 0, headFt: 27, inputWatts: 520 },
        ],
      },
      {
        id: 'demo-head-4000',
        label: 'High-head pump 4,000 (demo data)',
        curve: [
          { flowGph: 4000, headFt: 0, inputWatts: 480 },
          { flowGph: 3500, headFt: 10, inputWatts: 520 },
          { flowGph: 2700, headFt: 20, inputWatts: 560 },
          { flowGph: 1500, headFt: 30, inputWatts: 590 },
          { flowGph: 0, headFt: 38, inputWatts: 600 },
        ],
      },
    ],
  },
  lighting: {
    // Low-voltage landscape lighting runs at 12 V nominal. Common practice, no source.
    secondaryVolts: 12,
    // Load at most 80 % of the transformer rating. Common practice (REFERENCES 7.3).
    maxLoadFraction: 0.8,
    // Transformer ratings on offer. Common practice, no source.
    transformerSizesWatts: [150, 300, 600, 900, 1200],
    // Fixtures want at least 10.5 V at the lamp. Common practice, no source.
    minFixtureVolts: 10.5,
    // Each low-voltage secondary circuit ≤ 25 A. NEC 411.2 (REFERENCES 7.4, secondary).
    maxCircuitAmps: 25,
    // Uncoated stranded copper at 75 °C, Ω per 1000 ft. NFPA 70 Chapter 9 Table 8 (REFERENCES 7.1).
    conductorOhmsPer1000Ft: {
      '18': 7.95,
      '16': 4.99,
      '14': 3.14,
      '12': 1.98,
      '10': 1.24,
      '8': 0.778,
      '6': 0.491,
    },
  },
  labor: {
    // Boulder placing by hand ≈ 0.33 t per person-hour (range 0.25–0.5). From memory / common practice,
    // low confidence (REFERENCES 8.4).
    boulderHandLaborHoursPerShortTon: 3,
    // With a small machine ≈ 2 t per crew-hour for a crew of 3 (range 1–3 t). Low confidence (REFERENCES 8.4).
    boulderMachineLaborHoursPerShortTon: 1.5,
    // Gravel hand-spreading ≈ 0.3 t per person-hour including haul. Anecdote, low confidence (REFERENCES 8.5).
    gravelLaborHoursPerShortTon: 1 / 0.3,
    // Pondwright working defaults with no published source; calibrate from job history:
    linerLaborHoursPer100SqFt: 1.5, // liner + underlayment placed, folded and trimmed
    seamLaborHoursPerFt: 0.1, // taped seam
    pipeLaborHoursPerFt: 0.05, // pipe laid in a trench dug with the pond
    fittingLaborHoursEach: 0.25,
    pumpSetLaborHours: 4, // pump, skimmer and waterfall filter box set and connected
    fixtureLaborHoursEach: 0.5,
    cableLaborHoursPerFt: 0.02,
    transformerLaborHoursEach: 1,
    cleanUpShareOfOtherHours: 0.1,
    linerRemovalLaborHoursPer100SqFt: 1,
    oldRockHandLaborHoursPerShortTon: 2,
    oldRockMachineLaborHoursPerShortTon: 0.75,
    // Hand carries longer than 50 ft add 25 % per extra 100 ft to material handling. Common practice,
    // no source.
    carryFactorPer100FtBeyondBase: 0.25,
    carryBaseFt: 50,
    // Site slope factors on digging and material handling. Common practice, no source.
    slopeBands: [
      { upToPct: 5, factor: 1 },
      { upToPct: 15, factor: 1.15 },
      { upToPct: 100, factor: 1.3 },
    ],
  },
  cautions: {
    // Barrier and permit thresholds vary (18, 24 or 36 in, or none); flag from the lowest common one.
    // TRADE.md; defer to local code.
    barrierDepthIn: 18,
    // US excavations 5 ft and deeper need a protective system. TRADE.md (OSHA rule, from memory).
    protectiveSystemDepthFt: 5,
  },
};
