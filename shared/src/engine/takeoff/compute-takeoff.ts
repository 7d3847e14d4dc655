import { Explainer, fmt } from '../explain/explanation';
import { SRC } from '../explain/sources';
import { basinLinerSize, boxLinerSize, streamLinerSize } from '../liner/liner-size';
import { planSheets } from '../liner/sheet-plan';
import { boulderLayer, stoneWeightLb } from '../rock/boulders';
import { gravelLayer, gravelVoidFraction } from '../rock/gravel';
import { excavationQuantities } from '../excavation/excavation';
import { drainBackGallons, reservoirCapacityGallons } from '../reservoir/reservoir';
import { requiredFlow } from '../hydraulics/required-flow';
import { hydraulicWatts, lineVelocity, pumpSystem } from '../hydraulics/pump-system';
import { frictionFtPer100Ft } from '../hydraulics/hazen-williams';
import { lightingRun } from '../lighting/voltage-drop';
import { chooseTransformer } from '../lighting/transformer';
import { crewDays, laborHours } from '../labor/labor-hours';
import { carryFactor, slopeFactor } from '../labor/site-factors';
import { defaultEngineParameters } from '../parameters/defaults';
import type { EngineParameters } from '../parameters/parameters-schema';
import type { Caution, Takeoff, TakeoffResult } from '../schemas/takeoff-output';
import { roundTo } from '../units/rounding';
import {
  cubicFeetToGallons,
  CUBIC_FEET_PER_CUBIC_YARD,
  gphToGpm,
  inchesToFeet,
  US_GALLONS_PER_CUBIC_FOOT,
} from '../units/units';
import { buildCautions } from '../cautions/cautions';
import { validateInput, type EngineGeometry } from './validate-input';

const r1 = (v: number) => roundTo(v, 1);
const r2 = (v: number) => roundTo(v, 2);
const r0 = (v: number) => roundTo(v, 0);

/**
 * The takeoff for one water feature: validates the input (every problem as a field message) and
 * computes surface, volume, liner, excavation, rock, hydraulics, lighting, labor, cautions and an
 * explanation of each figure. Pure: no I/O, same output for the same input. Quantities are computed in
 * US customary units at full precision and rounded once, as each explanation states; money is not
 * computed here (pricing multiplies these quantities later).
 *
 * @param input  anything; validated against `takeoffInputSchema`.
 * @param params rates, densities and catalogues (`defaultEngineParameters` unless the price book
 *               supplies its own; validated when not the defaults).
 * @param geometry the general polygon offset (`insetPolygon` from
 *               `@pondwright/shared/engine/polygon-inset`), needed only for freeform outlines that bend
 *               inward; without it such an outline is reported as a field message, never thrown.
 */
export function computeTakeoff(
  input: unknown,
  params: EngineParameters = defaultEngineParameters,
  geometry: EngineGeometry = {},
): TakeoffResult {
  const validated = validateInput(input, params, geometry);
  if (!validated.ok) return validated;
  const { input: data, params: p, profiles, method } = validated.prepared;
  const ex = new Explainer(data.unitSystem);
  const handWork = method === 'hand';

  // Rock and gravel in each basin (they displace water).
  const voids = gravelVoidFraction(p.rock.gravelBulkShortTonsPerCuYd, p.rock.stoneDensityLbPerCuFt);
  const boulderRules = p.rock;
  const perBasin = profiles.map((profile) => {
    const coveredSqFt =
      profile.wallAreaSqFt * (data.rock.wallCoveragePct / 100) +
      profile.shelfAreaSqFt * (data.rock.shelfCoveragePct / 100);
    const boulders = boulderLayer(coveredSqFt, data.rock.boulderMixPct, boulderRules);
    const floorGravel = gravelLayer(
      profile.floorAreaSqFt,
      data.rock.floorGravelDepthIn,
      p.rock.gravelBulkShortTonsPerCuYd,
    );
    const shelfGravel = gravelLayer(
      profile.shelfAreaSqFt,
      data.rock.shelfGravelDepthIn,
      p.rock.gravelBulkShortTonsPerCuYd,
    );
    const gravelBulkCuYd = floorGravel.bulkCuYd + shelfGravel.bulkCuYd;
    const gravelSolidCuFt = gravelBulkCuYd * CUBIC_FEET_PER_CUBIC_YARD * (1 - voids);
    const waterCuFt = profile.holeVolumeCuFt - boulders.solidCuFt - gravelSolidCuFt;
    return {
      profile,
      coveredSqFt,
      boulders,
      gravelBulkCuYd,
      gravelShortTons: floorGravel.shortTons + shelfGravel.shortTons,
      gravelSolidCuFt,
      waterCuFt,
    };
  });
  const tooMuchRock = perBasin.findIndex(
    (b) =>
      b.boulders.solidCuFt + b.gravelSolidCuFt >
      p.geometry.maxRockShareOfBasin * b.profile.holeVolumeCuFt,
  );
  if (tooMuchRock >= 0) {
    return {
      ok: false,
      errors: [
        {
          field: 'rock.wallCoveragePct',
          message: `Rock and gravel would fill more than ${fmt(p.geometry.maxRockShareOfBasin * 100)} % of basin ${tooMuchRock + 1}: lower the coverage, the stone sizes or the gravel depth.`,
        },
      ],
    };
  }

  // Water surface and volume.
  const surfaceSqFt = profiles.reduce((s, b) => s + b.surfaceAreaSqFt, 0);
  const holeCuFt = profiles.reduce((s, b) => s + b.holeVolumeCuFt, 0);
  const rockSolidCuFt = perBasin.reduce((s, b) => s + b.boulders.solidCuFt, 0);
  const gravelSolidCuFt = perBasin.reduce((s, b) => s + b.gravelSolidCuFt, 0);
  const waterCuFt = holeCuFt - rockSolidCuFt - gravelSolidCuFt;
  const waterGallons = cubicFeetToGallons(waterCuFt);
  profiles.forEach((b, i) => {
    const shape = data.basins[i]!.outline.shape;
    ex.add({
      figure: `basins.${i}.surfaceAreaSqFt`,
      label: `Basin ${i + 1} surface area`,
      value: b.surfaceAreaSqFt,
      decimals: 1,
      kind: 'sqFt',
      formula:
        shape === 'rectangle'
          ? 'A = L × W'
          : shape === 'oval'
            ? 'A = π × (L/2) × (W/2)'
            : 'A = ½ |Σ (xᵢ·yᵢ₊₁ − xᵢ₊₁·yᵢ)| (shoelace)',
      workings: `${fmt(b.lengthFt)} ft × ${fmt(b.widthFt)} ft plan → ${fmt(b.surfaceAreaSqFt)} ft²`,
      rounding: 'nearest 0.1 ft²',
    });
    ex.add({
      figure: `basins.${i}.holeVolumeCuFt`,
      label: `Basin ${i + 1} volume (liner surface)`,
      value: b.holeVolumeCuFt,
      decimals: 1,
      kind: 'cuFt',
      formula:
        b.batterRunPerRise === 0
          ? 'V = Σ tiers h × A (vertical walls); each shelf insets the plan by its width'
          : 'V = Σ tiers h/2 × (A_top + A_bot) + b × h²/12 × (P_bot − P_top) (prismoidal, battered walls); each shelf insets the plan by its width',
      workings:
        b.tiers
          .map((t) => {
            const h = fmt(t.bottomDepthFt - t.topDepthFt, 3);
            return b.batterRunPerRise === 0
              ? `${h} × ${fmt(t.topAreaSqFt)}`
              : `${h}/2 × (${fmt(t.topAreaSqFt)} + ${fmt(t.bottomAreaSqFt)}) + ${fmt(b.batterRunPerRise)} × ${h}²/12 × (${fmt(t.bottomPerimeterFt)} − ${fmt(t.topPerimeterFt)})`;
          })
          .join(' + ') + ` = ${fmt(b.holeVolumeCuFt)} ft³`,
      rounding: 'nearest 0.1 ft³',
      sources: [SRC.prismoidal],
    });
  });
  ex.add({
    figure: 'water.surfaceAreaSqFt',
    label: 'Water surface area',
    value: surfaceSqFt,
    decimals: 1,
    kind: 'sqFt',
    formula: 'Σ basin surface areas',
    workings: `${profiles.map((b) => fmt(b.surfaceAreaSqFt)).join(' + ') || '0'} = ${fmt(surfaceSqFt)} ft²`,
    rounding: 'nearest 0.1 ft²',
  });
  ex.add({
    figure: 'water.volumeGallons',
    label: 'Water volume',
    value: waterGallons,
    decimals: 0,
    kind: 'gal',
    formula: 'gal = (basin volume − solid boulder volume − solid gravel volume) × 1728/231',
    workings: `(${fmt(holeCuFt)} − ${fmt(rockSolidCuFt)} − ${fmt(gravelSolidCuFt)}) ft³ × ${fmt(US_GALLONS_PER_CUBIC_FOOT, 6)} = ${fmt(waterGallons, 1)} gal`,
    rounding: 'nearest gallon',
    sources: [SRC.galPerCuFt, SRC.stoneDensity, SRC.shapeFactor, SRC.gravelVoids],
    note: `Gravel voids ${fmt(voids * 100, 1)} % (water fills them); boulders and gravel taken as fully under water.`,
  });

  // Liner and underlayment.
  const pieces: Takeoff['liner']['pieces'] = [];
  const addPiece = (
    part: 'basin' | 'stream' | 'pond-free-basin',
    index: number,
    size: {
      neededLengthFt: number;
      neededWidthFt: number;
      ruleLengthFt?: number;
      ruleWidthFt?: number;
    },
    formula: string,
    workings: string,
    sources: (typeof SRC.linerRule)[],
  ) => {
    const plan = planSheets(
      size.neededLengthFt,
      size.neededWidthFt,
      p.liner.sheetWidthsFt,
      p.liner.lengthStepFt,
      p.liner.seamOverlapFt,
    );
    pieces.push({
      part,
      index,
      neededLengthFt: r2(size.neededLengthFt),
      neededWidthFt: r2(size.neededWidthFt),
      ruleLengthFt: size.ruleLengthFt === undefined ? null : r2(size.ruleLengthFt),
      ruleWidthFt: size.ruleWidthFt === undefined ? null : r2(size.ruleWidthFt),
      panelWidthsFt: plan.panelWidthsFt,
      panelLengthFt: plan.panelLengthFt,
      seamCount: plan.seamCount,
      seamLengthFt: plan.seamLengthFt,
      orderedAreaSqFt: plan.orderedAreaSqFt,
    });
    const label =
      part === 'basin'
        ? `Basin ${index + 1}`
        : part === 'stream'
          ? `Stream ${index + 1}`
          : 'Pond-free basin';
    const panels = plan.panelWidthsFt.map((w) => `${fmt(w)} ft`).join(' + ');
    ex.add({
      figure: `liner.pieces.${pieces.length - 1}.orderedAreaSqFt`,
      label: `${label} liner`,
      value: plan.orderedAreaSqFt,
      kind: 'sqFt',
      formula,
      workings: `${workings}; ordered ${panels} wide × ${fmt(plan.panelLengthFt)} ft long${plan.seamCount > 0 ? `, ${plan.seamCount} seam(s) of ${fmt(plan.panelLengthFt)} ft overlapped ${fmt(p.liner.seamOverlapFt)} ft` : ''}`,
      rounding: `each dimension up to stock: widths ${p.liner.sheetWidthsFt.join('/')} ft, lengths in ${fmt(p.liner.lengthStepFt)}-ft steps`,
      sources: [...sources, SRC.stock],
      note:
        size.ruleLengthFt !== undefined && size.ruleWidthFt !== undefined
          ? `Common rule, length + 2 × max depth + 2 × overlap: ${fmt(size.ruleLengthFt)} × ${fmt(size.ruleWidthFt)} ft.`
          : undefined,
    });
  };
  profiles.forEach((b, i) => {
    const size = basinLinerSize(b, p.liner.overlapPerEdgeFt);
    const floorInset = b.tiers[b.tiers.length - 1]!.bottomInsetFt;
    addPiece(
      'basin',
      i,
      size,
      'needed = plan dimension − 2 × floor inset + 2 × (wall slope lengths + shelf widths) + 2 × overlap',
      `${fmt(b.lengthFt)} − 2 × ${fmt(floorInset, 3)} + 2 × ${fmt(b.drapeOneSideFt, 3)} + 2 × ${fmt(p.liner.overlapPerEdgeFt)} = ${fmt(size.neededLengthFt)} ft by ${fmt(b.widthFt)} → ${fmt(size.neededWidthFt)} ft`,
      [SRC.linerRule],
    );
  });
  data.streams.forEach((s, i) => {
    const size = streamLinerSize(s, p.liner.streamAllowanceFt);
    addPiece(
      'stream',
      i,
      size,
      'needed = dimension + 2 × drop + allowance',
      `${fmt(s.lengthFt)} + 2 × ${fmt(s.dropFt)} + ${fmt(p.liner.streamAllowanceFt)} = ${fmt(size.neededLengthFt)} ft by ${fmt(s.widthFt)} + 2 × ${fmt(s.dropFt)} + ${fmt(p.liner.streamAllowanceFt)} = ${fmt(size.neededWidthFt)} ft`,
      [SRC.streamLinerRule],
    );
  });
  if (data.pondFreeBasin) {
    const box = data.pondFreeBasin;
    const size = boxLinerSize(box, p.liner.overlapPerEdgeFt);
    addPiece(
      'pond-free-basin',
      0,
      size,
      'needed = dimension + 2 × depth + 2 × overlap',
      `${fmt(box.lengthFt)} + 2 × ${fmt(box.depthFt)} + 2 × ${fmt(p.liner.overlapPerEdgeFt)} = ${fmt(size.neededLengthFt)} ft by ${fmt(size.neededWidthFt)} ft`,
      [SRC.linerRule],
    );
  }
  const linerSqFt = pieces.reduce((s, x) => s + x.orderedAreaSqFt, 0);
  const seamFt = pieces.reduce((s, x) => s + x.seamLengthFt, 0);
  const linerWeightLb =
    p.liner.weightLbPerSqFt === null ? null : r0(linerSqFt * p.liner.weightLbPerSqFt);
  ex.add({
    figure: 'liner.underlaymentAreaSqFt',
    label: 'Underlayment',
    value: linerSqFt,
    kind: 'sqFt',
    formula: 'same area as the ordered liner',
    workings: `${fmt(linerSqFt)} ft²`,
    rounding: 'as ordered',
    sources: [SRC.underlayment],
  });
  if (linerWeightLb !== null) {
    ex.add({
      figure: 'liner.weightLb',
      label: 'Liner weight',
      value: linerWeightLb,
      kind: 'lb',
      formula: 'ordered ft² × weight per ft²',
      workings: `${fmt(linerSqFt)} × ${fmt(p.liner.weightLbPerSqFt!, 3)} = ${fmt(linerSqFt * p.liner.weightLbPerSqFt!)} lb`,
      rounding: 'nearest lb',
      sources: [SRC.linerWeight],
    });
  }

  // Excavation.
  const soil = p.soils[data.site.soil];
  const digBasins = !(data.renovation?.basinsAlreadyExcavated ?? false);
  const streamDigCuFt = data.streams.reduce(
    (s, x) => s + x.lengthFt * x.widthFt * inchesToFeet(p.excavation.streamDigDepthIn),
    0,
  );
  const reservoirDigCuFt = data.pondFreeBasin
    ? data.pondFreeBasin.lengthFt * data.pondFreeBasin.widthFt * data.pondFreeBasin.depthFt
    : 0;
  const bankCuFt = (digBasins ? holeCuFt : 0) + streamDigCuFt + reservoirDigCuFt;
  const vehicle = p.excavation.haulVehicles.find((v) => v.id === data.site.haulVehicleId)!;
  const dig = excavationQuantities({
    bankCuFt,
    swellFactor: soil.swellFactor,
    bankDensityLbPerCuFt: soil.bankDensityLbPerCuFt,
    spoilHauledPct: data.site.spoilHauledPct,
    vehicle,
    handCarry: handWork,
    wheelbarrowLooseCuFtPerTrip: p.excavation.wheelbarrowLooseCuFtPerTrip,
  });
  ex.add({
    figure: 'excavation.bankCuYd',
    label: 'Excavation, bank volume',
    value: dig.bankCuYd,
    decimals: 2,
    kind: 'cuYd',
    formula: 'bank yd³ = (basins + streams × dig depth + pond-free basin) ft³ / 27',
    workings: `(${fmt(digBasins ? holeCuFt : 0)} + ${fmt(streamDigCuFt)} + ${fmt(reservoirDigCuFt)}) / 27 = ${fmt(dig.bankCuYd, 3)} yd³`,
    rounding: 'nearest 0.01 yd³',
    sources: [SRC.cuFtPerCuYd],
    note: digBasins ? undefined : 'The basins exist already, so they are not dug again.',
  });
  ex.add({
    figure: 'excavation.looseCuYd',
    label: 'Excavation, loose volume',
    value: dig.looseCuYd,
    decimals: 2,
    kind: 'cuYd',
    formula: 'loose yd³ = bank yd³ × swell factor',
    workings: `${fmt(dig.bankCuYd, 3)} × ${fmt(soil.swellFactor)} (${soil.label}) = ${fmt(dig.looseCuYd, 3)} yd³`,
    rounding: 'nearest 0.01 yd³',
    sources: [SRC.swell],
  });
  ex.add({
    figure: 'excavation.haulLoads',
    label: `Haul loads (${vehicle.label})`,
    value: dig.haulLoads,
    kind: 'count',
    formula:
      'max(⌈hauled loose yd³ / vehicle yd³⌉, ⌈hauled tons / vehicle tons⌉); tons = bank ft³ × bank density / 2000',
    workings: `max(⌈${fmt(dig.hauledLooseCuYd)} / ${fmt(vehicle.capacityLooseCuYd)}⌉, ⌈${fmt(dig.hauledShortTons)} / ${fmt(vehicle.capacityShortTons)}⌉) = ${dig.haulLoads}`,
    rounding: 'whole loads, up',
    sources: [SRC.bankDensity, SRC.lbPerTon],
  });
  if (dig.wheelbarrowTrips !== null) {
    ex.add({
      figure: 'excavation.wheelbarrowTrips',
      label: 'Wheelbarrow trips',
      value: dig.wheelbarrowTrips,
      kind: 'count',
      formula: '⌈loose ft³ / ft³ per trip⌉ (access too narrow for a machine)',
      workings: `⌈${fmt(dig.looseCuYd * CUBIC_FEET_PER_CUBIC_YARD)} / ${fmt(p.excavation.wheelbarrowLooseCuFtPerTrip)}⌉ = ${dig.wheelbarrowTrips}`,
      rounding: 'whole trips, up',
    });
  }

  // Rock and gravel.
  const streamEdgeSqFt =
    data.streams.reduce((s, x) => s + 2 * x.lengthFt * p.rock.streamEdgeBandFt, 0) *
    (data.rock.streamEdgeCoveragePct / 100);
  const streamBoulders = boulderLayer(streamEdgeSqFt, data.rock.boulderMixPct, boulderRules);
  const streamGravel = data.streams.reduce(
    (acc, x) => {
      const g = gravelLayer(
        x.lengthFt * x.widthFt,
        data.rock.streamGravelDepthIn,
        p.rock.gravelBulkShortTonsPerCuYd,
      );
      return { bulkCuYd: acc.bulkCuYd + g.bulkCuYd, shortTons: acc.shortTons + g.shortTons };
    },
    { bulkCuYd: 0, shortTons: 0 },
  );
  const boulderTons = {
    small: streamBoulders.shortTons.small,
    medium: streamBoulders.shortTons.medium,
    large: streamBoulders.shortTons.large,
  };
  for (const b of perBasin) {
    boulderTons.small += b.boulders.shortTons.small;
    boulderTons.medium += b.boulders.shortTons.medium;
    boulderTons.large += b.boulders.shortTons.large;
  }
  const boulderTotal = boulderTons.small + boulderTons.medium + boulderTons.large;
  const coveredSqFt = perBasin.reduce((s, b) => s + b.coveredSqFt, 0) + streamEdgeSqFt;
  const gravelBulkCuYd = perBasin.reduce((s, b) => s + b.gravelBulkCuYd, 0) + streamGravel.bulkCuYd;
  const gravelTons = perBasin.reduce((s, b) => s + b.gravelShortTons, 0) + streamGravel.shortTons;
  const reusedTons = data.renovation
    ? Math.min(
        boulderTotal,
        (data.renovation.oldRockShortTons * data.renovation.rockReusedPct) / 100,
      )
    : 0;
  const reservoirFillTons =
    data.pondFreeBasin?.fill === 'rock-gravel'
      ? (reservoirDigCuFt / CUBIC_FEET_PER_CUBIC_YARD) * p.rock.gravelBulkShortTonsPerCuYd
      : 0;
  for (const size of ['small', 'medium', 'large'] as const) {
    const sizeFt = inchesToFeet(p.rock.boulderSizeIn[size]);
    ex.add({
      figure: `rock.bouldersShortTons.${size}`,
      label: `Boulders, ${size} (${fmt(p.rock.boulderSizeIn[size])} in)`,
      value: boulderTons[size],
      decimals: 2,
      kind: 'shortTon',
      formula:
        'tons = covered ft² × share of mix × stone size ft × shape factor × density / 2000; covered = walls × wall cover + shelves × shelf cover + stream edges',
      workings: `${fmt(coveredSqFt)} × ${fmt(data.rock.boulderMixPct[size] / 100, 3)} × ${fmt(sizeFt, 3)} × ${fmt(p.rock.boulderShapeFactor)} × ${fmt(p.rock.stoneDensityLbPerCuFt)} / 2000 = ${fmt(boulderTons[size], 3)} tons`,
      rounding: 'nearest 0.01 ton',
      sources: [SRC.stoneDensity, SRC.shapeFactor, SRC.boulderSizes, SRC.lbPerTon],
    });
  }
  ex.add({
    figure: 'rock.gravelShortTons',
    label: 'Gravel',
    value: gravelTons,
    decimals: 2,
    kind: 'shortTon',
    formula:
      'tons = (floor ft² × floor depth + shelf ft² × shelf depth + stream ft² × stream depth) / 27 × tons per yd³',
    workings: `${fmt(gravelBulkCuYd, 3)} yd³ × ${fmt(p.rock.gravelBulkShortTonsPerCuYd)} = ${fmt(gravelTons, 3)} tons`,
    rounding: 'nearest 0.01 ton',
    sources: [SRC.gravelBulk, SRC.cuFtPerCuYd],
  });

  // Pond-free basin reservoir.
  const hasCheckValve = (data.pumpRun?.fittings.checkValve ?? 0) > 0;
  let reservoir: Takeoff['reservoir'] = null;

  // Hydraulics.
  const flow = requiredFlow({
    pondGallons: waterGallons,
    turnoversPerHour: p.hydraulics.turnoversPerHour,
    waterfalls: data.waterfalls,
    weirGphPerInch: p.hydraulics.weirGphPerInch,
  });
  let hydraulics: Takeoff['hydraulics'] = null;
  let pressureInsideDiameterIn: number | null = null;
  const velocityWarnings: Array<{ side: 'pressure' | 'suction'; velocity: number; limit: number }> =
    [];
  if (data.pumpRun) {
    const run = data.pumpRun;
    const result = pumpSystem(run, flow.requiredGph, p.hydraulics);
    if (!result.ok) return result;
    const sys = result.system;
    const q = flow.requiredGph;
    const hwConstants = {
      constant: p.hydraulics.hazenWilliamsConstant,
      flowExponent: p.hydraulics.hazenWilliamsFlowExponent,
      diameterExponent: p.hydraulics.hazenWilliamsDiameterExponent,
    };
    ex.add({
      figure: 'hydraulics.requiredFlowGph',
      label: 'Required flow',
      value: q,
      decimals: 0,
      kind: 'gph',
      formula: 'max(pond gal × turnovers per hour, Σ weir width in × gph per inch for the sheet)',
      workings: `max(${fmt(waterGallons, 0)} × ${fmt(p.hydraulics.turnoversPerHour)}, ${data.waterfalls.map((w) => `${fmt(w.weirWidthIn)} × ${p.hydraulics.weirGphPerInch[w.sheet]}`).join(' + ') || '0'}) = max(${fmt(flow.turnoverGph, 0)}, ${fmt(flow.weirGph, 0)}) = ${fmt(q, 0)} gph`,
      rounding: 'nearest gph',
      sources: [SRC.turnover, SRC.weir],
    });
    const lines = sys.lines.map((line, i) => {
      const velocity = lineVelocity(line, q);
      const friction =
        (frictionFtPer100Ft(
          gphToGpm(q),
          line.pipe.insideDiameterIn,
          line.pipe.hazenWilliamsC,
          hwConstants,
        ) *
          line.equivalentLengthFt) /
        100;
      ex.add({
        figure: `hydraulics.lines.${i}.nominalSizeIn`,
        label: `${line.side === 'pressure' ? 'Pressure' : 'Suction'} pipe size`,
        value: line.pipe.nominalSizeIn,
        kind: 'in',
        formula:
          line.chosen === 'auto'
            ? 'smallest size with V = 0.4085 × Q[gpm] / d² within the velocity limit'
            : 'as given',
        workings: `${fmt(gphToGpm(q))} gpm in ${fmt(line.pipe.nominalSizeIn)} in ${line.pipe.label} (ID ${fmt(line.pipe.insideDiameterIn, 3)} in): V = ${fmt(velocity)} ft/s (limit ${fmt(line.side === 'pressure' ? p.hydraulics.maxPressureVelocityFtPerS : p.hydraulics.maxSuctionVelocityFtPerS)} ft/s)`,
        rounding: 'catalogue size',
        sources: [SRC.velocity, SRC.pipeId, SRC.velocityLimit],
      });
      const fittingText = line.fittings
        ? ` + fittings ${fmt(line.fittings.equivalentLengthFt)} ft (NFPA 13 steel lengths × ${fmt(line.fittings.multiplier, 3)})`
        : '';
      ex.add({
        figure: `hydraulics.lines.${i}.frictionHeadAtRequiredFt`,
        label: `${line.side === 'pressure' ? 'Pressure' : 'Suction'} line friction`,
        value: friction,
        decimals: 2,
        kind: 'headFt',
        formula: 'h = 1044 × (Q/C)^1.852 / d^4.8655 per 100 ft × equivalent length / 100',
        workings: `1044 × (${fmt(gphToGpm(q))}/${fmt(line.pipe.hazenWilliamsC)})^1.852 / ${fmt(line.pipe.insideDiameterIn, 3)}^4.8655 × (${fmt(line.lengthFt)} ft pipe${fittingText}) / 100 = ${fmt(friction, 3)} ft`,
        rounding: 'nearest 0.01 ft',
        sources: [
          SRC.hazenWilliams,
          SRC.cPvc,
          SRC.pipeId,
          ...(line.fittings ? [SRC.fittings] : []),
        ],
      });
      return {
        side: line.side,
        material: line.pipe.material,
        nominalSizeIn: line.pipe.nominalSizeIn,
        insideDiameterIn: line.pipe.insideDiameterIn,
        chosen: line.chosen,
        lengthFt: line.lengthFt,
        equivalentLengthFt: r2(line.equivalentLengthFt),
        velocityAtRequiredFtPerS: r2(velocity),
        frictionHeadAtRequiredFt: r2(friction),
      };
    });
    const tdh = sys.totalDynamicHeadAt(q);
    ex.add({
      figure: 'hydraulics.totalDynamicHeadAtRequiredFt',
      label: 'Total dynamic head at the required flow',
      value: tdh,
      decimals: 2,
      kind: 'headFt',
      formula: 'TDH = static lift (water surface to highest weir) + friction in pipe and fittings',
      workings: `${fmt(sys.staticHeadFt)} + ${fmt(sys.frictionAt(q), 3)} = ${fmt(tdh, 3)} ft`,
      rounding: 'nearest 0.01 ft',
      sources: [SRC.hazenWilliams],
    });
    const best = sys.best;
    let bestOut: NonNullable<Takeoff['hydraulics']>['best'] = null;
    if (best?.operating) {
      const op = best.operating;
      const kwh = (op.inputWatts * p.hydraulics.pumpHoursPerYear) / 1000;
      const hyd = hydraulicWatts(op.flowGph, op.headFt);
      bestOut = {
        pumpId: best.pump.id,
        label: best.pump.label,
        flowGph: r0(op.flowGph),
        headFt: r2(op.headFt),
        inputWatts: r1(op.inputWatts),
        hydraulicWatts: r1(hyd),
        yearlyEnergyKwh: r0(kwh),
      };
      ex.add({
        figure: 'hydraulics.best.flowGph',
        label: `Operating point, ${best.pump.label}`,
        value: op.flowGph,
        decimals: 0,
        kind: 'gph',
        formula:
          'flow where the pump curve (interpolated between catalogue points) meets the system curve TDH(Q)',
        workings: `${fmt(op.flowGph, 0)} gph at ${fmt(op.headFt)} ft (needs ${fmt(q, 0)} gph); water power ${fmt(gphToGpm(op.flowGph))} gpm × ${fmt(op.headFt)} ft / 3960 = ${fmt(hyd, 1)} W of ${fmt(op.inputWatts, 1)} W drawn`,
        rounding: 'nearest gph',
        sources: [SRC.pumpCurves, SRC.whp],
        note: 'Of the pumps that reach the required flow, the one drawing the least power.',
      });
      ex.add({
        figure: 'hydraulics.best.yearlyEnergyKwh',
        label: 'Pump energy per year',
        value: kwh,
        decimals: 0,
        kind: 'kwh',
        formula: 'kWh = input W at the operating point × hours per year / 1000',
        workings: `${fmt(op.inputWatts, 1)} × ${fmt(p.hydraulics.pumpHoursPerYear)} / 1000 = ${fmt(kwh, 1)} kWh`,
        rounding: 'nearest kWh',
        note: 'Running cost = kWh × your tariff; money is computed by the pricing step, not here.',
      });
    }
    const checkFlow = best?.operating?.flowGph ?? q;
    sys.lines.forEach((line) => {
      const v = lineVelocity(line, checkFlow);
      const limit =
        line.side === 'pressure'
          ? p.hydraulics.maxPressureVelocityFtPerS
          : p.hydraulics.maxSuctionVelocityFtPerS;
      if (v > limit + 1e-9) velocityWarnings.push({ side: line.side, velocity: v, limit });
    });
    pressureInsideDiameterIn = sys.lines[0]!.pipe.insideDiameterIn;
    hydraulics = {
      turnoverFlowGph: r0(flow.turnoverGph),
      weirFlowGph: r0(flow.weirGph),
      requiredFlowGph: r0(q),
      staticHeadFt: sys.staticHeadFt,
      lines,
      totalDynamicHeadAtRequiredFt: r2(tdh),
      candidates: sys.candidates.map((c) => ({
        pumpId: c.pump.id,
        label: c.pump.label,
        operating: c.operating
          ? {
              flowGph: r0(c.operating.flowGph),
              headFt: r2(c.operating.headFt),
              inputWatts: r1(c.operating.inputWatts),
            }
          : null,
        meetsFlow: c.meetsFlow,
      })),
      best: bestOut,
    };
  }

  if (data.pondFreeBasin) {
    const box = data.pondFreeBasin;
    const voidFraction = box.fill === 'rock-gravel' ? voids : p.hydraulics.storageBlockVoidFraction;
    const capacity = reservoirCapacityGallons(box, voidFraction);
    const drain = drainBackGallons({
      streams: data.streams,
      streamRunningDepthIn: p.hydraulics.streamRunningDepthIn,
      pressurePipe:
        data.pumpRun && pressureInsideDiameterIn !== null
          ? {
              insideDiameterIn: pressureInsideDiameterIn,
              lengthFt: data.pumpRun.pressurePipeLengthFt,
            }
          : null,
      hasCheckValve,
    });
    const required = drain.totalGallons * p.hydraulics.reservoirSafetyFactor;
    reservoir = {
      fill: box.fill,
      voidFraction: roundTo(voidFraction, 3),
      capacityGallons: r0(capacity),
      drainBackGallons: r0(drain.totalGallons),
      requiredGallons: r0(required),
      adequate: capacity >= required,
      storageBlockVolumeCuFt: box.fill === 'storage-blocks' ? r1(reservoirDigCuFt) : null,
    };
    ex.add({
      figure: 'reservoir.capacityGallons',
      label: 'Pond-free basin, water held',
      value: capacity,
      decimals: 0,
      kind: 'gal',
      formula: 'gal = L × W × D × void fraction of the fill × 7.4805',
      workings: `${fmt(box.lengthFt)} × ${fmt(box.widthFt)} × ${fmt(box.depthFt)} × ${fmt(voidFraction, 3)} × ${fmt(US_GALLONS_PER_CUBIC_FOOT, 4)} = ${fmt(capacity, 0)} gal`,
      rounding: 'nearest gallon',
      sources: [box.fill === 'rock-gravel' ? SRC.gravelVoids : SRC.blockVoids, SRC.galPerCuFt],
    });
    ex.add({
      figure: 'reservoir.requiredGallons',
      label: 'Pond-free basin, water it must hold',
      value: required,
      decimals: 0,
      kind: 'gal',
      formula:
        'required = (stream length × width × running depth + pipe contents without a check valve) × safety factor',
      workings: `(${fmt(drain.streamGallons, 0)} + ${fmt(drain.pipeGallons, 0)}) × ${fmt(p.hydraulics.reservoirSafetyFactor)} = ${fmt(required, 0)} gal`,
      rounding: 'nearest gallon',
      sources: [SRC.drainBack, SRC.reservoirFactor],
    });
  }

  // Lighting.
  let lighting: Takeoff['lighting'] = null;
  const lowVoltageRuns: Array<{ index: number; volts: number }> = [];
  const overCurrentRuns: Array<{ index: number; amps: number }> = [];
  if (data.lighting.length > 0) {
    const L = p.lighting;
    const runs = data.lighting.map((run, i) => {
      const ohms = L.conductorOhmsPer1000Ft[run.gaugeAwg]!;
      const res = lightingRun(run, L.secondaryVolts, ohms);
      if (res.voltageAtLastFixtureV < L.minFixtureVolts)
        lowVoltageRuns.push({ index: i, volts: res.voltageAtLastFixtureV });
      if (res.currentAmps > L.maxCircuitAmps)
        overCurrentRuns.push({ index: i, amps: res.currentAmps });
      ex.add({
        figure: `lighting.runs.${i}.voltageAtLastFixtureV`,
        label: `Lighting run ${i + 1}, voltage at the last fixture`,
        value: res.voltageAtLastFixtureV,
        decimals: 2,
        kind: 'volt',
        formula: `V_last = V − Σ segments 2 × (L/n) × I_beyond × R / 1000; fixtures evenly spaced, I = W / ${fmt(L.secondaryVolts)} V`,
        workings: `${fmt(L.secondaryVolts)} − ${fmt(res.voltageDropV, 3)} (${run.fixtureWatts.length} fixtures, ${fmt(res.totalWatts)} W, ${fmt(run.cableLengthFt)} ft of ${run.gaugeAwg} AWG at ${fmt(ohms, 3)} Ω/1000 ft) = ${fmt(res.voltageAtLastFixtureV, 3)} V`,
        rounding: 'nearest 0.01 V',
        sources: [SRC.necTable8, SRC.voltageDrop],
        note: `All load at the end would give ${fmt(L.secondaryVolts - (2 * run.cableLengthFt * res.currentAmps * ohms) / 1000, 2)} V.`,
      });
      return {
        currentAmps: r2(res.currentAmps),
        voltageDropV: r2(res.voltageDropV),
        voltageAtLastFixtureV: r2(res.voltageAtLastFixtureV),
        dropPercent: r1(res.dropPercent),
      };
    });
    const totalWatts = data.lighting.reduce(
      (s, run) => s + run.fixtureWatts.reduce((a, w) => a + w, 0),
      0,
    );
    const tx = chooseTransformer(totalWatts, L.transformerSizesWatts, L.maxLoadFraction);
    lighting = {
      totalWatts: r1(totalWatts),
      transformerSizeWatts: tx.sizeWatts,
      transformerCount: tx.count,
      loadPercent: r1(tx.loadPercent),
      runs,
    };
    ex.add({
      figure: 'lighting.transformerSizeWatts',
      label: 'Transformer size',
      value: tx.sizeWatts,
      kind: 'watt',
      formula: `smallest rating with load ≤ ${fmt(L.maxLoadFraction * 100)} % of rating`,
      workings: `${fmt(totalWatts)} W load → ${tx.count} × ${fmt(tx.sizeWatts)} W, loaded ${fmt(tx.loadPercent, 1)} %`,
      rounding: 'catalogue size',
      sources: [SRC.transformerLoad],
    });
  }

  // Labor.
  const sFactor = slopeFactor(data.site.slopePct, p.labor.slopeBands);
  const cFactor = carryFactor(data.site.carryDistanceFt, handWork, p.labor);
  const fittingCount = data.pumpRun
    ? Object.values(data.pumpRun.fittings).reduce((s, c) => s + c, 0)
    : 0;
  const lines = laborHours(
    {
      soil: data.site.soil,
      handWork,
      bankCuYd: dig.bankCuYd,
      looseCuYd: dig.looseCuYd,
      carryDistanceFt: data.site.carryDistanceFt,
      slopeFactor: sFactor,
      carryFactor: cFactor,
      boulderShortTons: boulderTotal,
      gravelShortTons: gravelTons + reservoirFillTons,
      linerOrderedSqFt: linerSqFt,
      seamLengthFt: seamFt,
      pipeLengthFt: data.pumpRun
        ? data.pumpRun.pressurePipeLengthFt + data.pumpRun.suctionPipeLengthFt
        : 0,
      fittingCount,
      pumpSets: data.pumpRun ? 1 : 0,
      fixtureCount: data.lighting.reduce((s, run) => s + run.fixtureWatts.length, 0),
      cableLengthFt: data.lighting.reduce((s, run) => s + run.cableLengthFt, 0),
      transformerCount: lighting?.transformerCount ?? 0,
      oldLinerSqFt: data.renovation?.oldLinerAreaSqFt ?? 0,
      oldRockShortTons: data.renovation?.oldRockShortTons ?? 0,
    },
    p,
  );
  const totalHours = lines.reduce((s, line) => s + line.laborHours, 0);
  lines.forEach((line, i) => {
    ex.add({
      figure: `labor.tasks.${i}.laborHours`,
      label: `Labor, ${line.task}`,
      value: line.laborHours,
      decimals: 1,
      kind: 'hour',
      formula: line.formula,
      workings: line.workings,
      rounding: 'nearest 0.1 h',
      sources:
        line.task === 'excavation'
          ? handWork
            ? [SRC.handDig, SRC.handLoad, SRC.siteFactors]
            : [SRC.machineDig, SRC.siteFactors]
          : line.task === 'rockPlacing'
            ? [SRC.boulderRate, SRC.gravelRate, SRC.siteFactors]
            : [SRC.workingDefault],
    });
  });
  const days = crewDays(totalHours, data.crew.size, data.crew.hoursPerDay);
  ex.add({
    figure: 'labor.crewDays',
    label: 'Crew-days',
    value: days,
    decimals: 2,
    kind: 'day',
    formula: 'crew-days = total labor-hours / (crew size × hours per day)',
    workings: `${fmt(totalHours, 1)} / (${data.crew.size} × ${fmt(data.crew.hoursPerDay)}) = ${fmt(days, 3)}`,
    rounding: 'nearest 0.01 day',
  });

  const cautions: Caution[] = buildCautions({
    input: data,
    params: p,
    bankCuYd: dig.bankCuYd,
    handWork,
    heavyStone: (['small', 'medium', 'large'] as const).some(
      (s) =>
        boulderTons[s] > 0 && stoneWeightLb(p.rock.boulderSizeIn[s], p.rock) > p.rock.heavyStoneLb,
    ),
    velocityWarnings,
    noPump: data.pumpRun !== null && hydraulics?.best === null,
    requiredFlowGph: flow.requiredGph,
    tdhFt: hydraulics?.totalDynamicHeadAtRequiredFt ?? 0,
    lowVoltageRuns,
    overCurrentRuns,
    transformerCount: lighting?.transformerCount ?? 0,
    reservoir,
    seamCount: pieces.reduce((s, x) => s + x.seamCount, 0),
  });

  const takeoff: Takeoff = {
    unitSystem: data.unitSystem,
    basins: perBasin.map((b) => ({
      surfaceAreaSqFt: r1(b.profile.surfaceAreaSqFt),
      perimeterFt: r1(b.profile.perimeterFt),
      holeVolumeCuFt: r1(b.profile.holeVolumeCuFt),
      waterVolumeGallons: r0(cubicFeetToGallons(b.waterCuFt)),
      floorAreaSqFt: r1(b.profile.floorAreaSqFt),
      shelfAreaSqFt: r1(b.profile.shelfAreaSqFt),
      wallAreaSqFt: r1(b.profile.wallAreaSqFt),
      maxDepthFt: b.profile.maxDepthFt,
    })),
    water: {
      surfaceAreaSqFt: r1(surfaceSqFt),
      holeVolumeCuFt: r1(holeCuFt),
      rockSolidCuFt: r1(rockSolidCuFt),
      gravelSolidCuFt: r1(gravelSolidCuFt),
      volumeCuFt: r1(waterCuFt),
      volumeGallons: r0(waterGallons),
    },
    liner: {
      pieces,
      orderedAreaSqFt: linerSqFt,
      underlaymentAreaSqFt: linerSqFt,
      weightLb: linerWeightLb,
    },
    excavation: {
      method,
      bankCuYd: r2(dig.bankCuYd),
      swellFactor: soil.swellFactor,
      looseCuYd: r2(dig.looseCuYd),
      massShortTons: r2(dig.massShortTons),
      haulVehicleId: vehicle.id,
      hauledLooseCuYd: r2(dig.hauledLooseCuYd),
      haulLoads: dig.haulLoads,
      wheelbarrowTrips: dig.wheelbarrowTrips,
    },
    rock: {
      bouldersShortTons: {
        small: r2(boulderTons.small),
        medium: r2(boulderTons.medium),
        large: r2(boulderTons.large),
        total: r2(boulderTotal),
      },
      reusedShortTons: r2(reusedTons),
      bouldersToBuyShortTons: r2(Math.max(0, boulderTotal - reusedTons)),
      gravelBulkCuYd: r2(gravelBulkCuYd),
      gravelShortTons: r2(gravelTons),
      reservoirFillShortTons: r2(reservoirFillTons),
    },
    reservoir,
    hydraulics,
    lighting,
    labor: {
      tasks: lines.map((line) => ({ task: line.task, laborHours: r1(line.laborHours) })),
      totalLaborHours: r1(totalHours),
      crewSize: data.crew.size,
      hoursPerDay: data.crew.hoursPerDay,
      crewDays: r2(days),
    },
    cautions,
    explanations: ex.items,
  };
  return { ok: true, takeoff };
}
