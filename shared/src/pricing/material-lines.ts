import type { TakeoffInput } from '../engine/schemas/takeoff-input';
import type { Takeoff } from '../engine/schemas/takeoff-output';
import {
  BOULDER_SIZES,
  FITTING_KINDS,
  type FittingKind,
} from '../engine/parameters/parameters-schema';
import { allocate } from './allocate';
import { cheapestMaterial, smallestMaterialAtLeast } from './choose-material';
import { toDecimal } from './money';
import type { Material, MaterialKind, PriceBook } from './price-book-schema';
import type { MissingItem } from './priced-estimate-schema';
import { roundQuantity, type LineDraft } from './price-line';

const FITTING_LABELS: Record<FittingKind, string> = {
  elbow90: '90° elbow',
  elbow45: '45° elbow',
  tee: 'tee',
  checkValve: 'check valve',
  valve: 'valve',
};

export type MaterialLinesResult = { drafts: LineDraft[]; missing: MissingItem[] };

/**
 * The material lines of a takeoff and what the book lacks to price them. Quantities and the item each
 * is priced with (rounding half up):
 * - liner: ordered ft² (whole, stock sizes) × the book's default liner; underlayment: its ft² × the
 *   default underlayment;
 * - boulders by size: the tons to buy (takeoff, 0.01 t) shared over the sizes in proportion to the
 *   takeoff's tons by size, in 0.01 t so the parts add up to the tons to buy; the cheapest boulder of
 *   each size;
 * - gravel: tons (0.01 t) × the default gravel, and the pond-free reservoir's gravel fill as its own line;
 * - pipe: each line's length (0.1 ft) × the cheapest pipe of the same material and nominal size;
 * - fittings: the input's count of each kind at the pressure pipe's size (the engine puts fittings on
 *   the pressure line) × the cheapest fitting of that kind and size;
 * - the takeoff's best pump (material code = engine pump id); a skimmer when there is a basin and a
 *   waterfall filter box when there is a waterfall or stream, each the smallest rated ≥ the required flow;
 * - lights: one per fixture, the light with the smallest watts ≥ the fixture's, counted per light;
 *   transformers: the engine's count × the smallest rating ≥ the engine's size; cable: ft per gauge (0.1 ft);
 * - storage blocks: the pond-free basin's ft³ (0.1 ft³) when it is filled with them.
 * When several items fit equally, the cheapest wins (then the first listed). Lighting lines go to the
 * option `lightingOptionId` when given, else to the base.
 */
export function materialLines(args: {
  input: TakeoffInput;
  takeoff: Takeoff;
  book: PriceBook;
  lightingOptionId: string | null;
}): MaterialLinesResult {
  const { input, takeoff, book, lightingOptionId } = args;
  const drafts: LineDraft[] = [];
  const missing: MissingItem[] = [];
  const ofKind = (kind: MaterialKind) => book.materials.filter((item) => item.kind === kind);
  const byCode = (code: string, kind: MaterialKind) =>
    book.materials.find((item) => item.code === code && item.kind === kind);

  const add = (
    source: string,
    material: Material,
    quantity: ReturnType<typeof roundQuantity>,
    description = material.name,
    optionId: string | null = null,
  ) => {
    if (quantity.isZero()) return;
    drafts.push({
      id: `${optionId === null ? '' : `${optionId}:`}${source}:${material.code}`,
      category: 'materials',
      description,
      code: material.code,
      quantity,
      unit: material.unit,
      unitCost: toDecimal(material.unitCost),
      taxable: material.taxable,
      source,
      kind: optionId === null ? 'base' : 'add-on',
      optionId,
    });
  };
  const lack = (kind: MaterialKind, source: string, need: string, optionId: string | null = null) =>
    missing.push({
      kind,
      source,
      need,
      message: `Add ${need} to your price book.`,
      optionId,
    });

  // Liner and underlayment.
  if (takeoff.liner.orderedAreaSqFt > 0) {
    const area = roundQuantity(takeoff.liner.orderedAreaSqFt, 1);
    const liner = byCode(book.settings.defaultLinerCode, 'liner');
    if (liner) add('liner', liner, area);
    else lack('liner', 'liner', `the default liner (${book.settings.defaultLinerCode})`);
    const under = byCode(book.settings.defaultUnderlaymentCode, 'underlayment');
    const underArea = roundQuantity(takeoff.liner.underlaymentAreaSqFt, 1);
    if (under) add('underlayment', under, underArea);
    else
      lack(
        'underlayment',
        'underlayment',
        `the default underlayment (${book.settings.defaultUnderlaymentCode})`,
      );
  }

  // Boulders to buy, by size.
  const toBuy = roundQuantity(takeoff.rock.bouldersToBuyShortTons, 2);
  if (!toBuy.isZero()) {
    const tons = takeoff.rock.bouldersShortTons;
    const shares = allocate(
      toBuy,
      BOULDER_SIZES.map((size) => toDecimal(tons[size])),
      2,
    );
    BOULDER_SIZES.forEach((size, index) => {
      const quantity = shares[index]!;
      if (quantity.isZero()) return;
      const boulder = cheapestMaterial(
        ofKind('boulder').filter((item) => item.boulderSize === size),
      );
      if (boulder) add(`boulders:${size}`, boulder, quantity);
      else lack('boulder', `boulders:${size}`, `a ${size} boulder`);
    });
  }

  // Gravel and the pond-free reservoir's gravel fill.
  const gravel = byCode(book.settings.defaultGravelCode, 'gravel');
  for (const [source, tons, label] of [
    ['gravel', takeoff.rock.gravelShortTons, null],
    ['reservoir-fill', takeoff.rock.reservoirFillShortTons, 'reservoir fill'],
  ] as const) {
    const quantity = roundQuantity(tons, 2);
    if (quantity.isZero()) continue;
    if (gravel) add(source, gravel, quantity, label ? `${gravel.name}, ${label}` : gravel.name);
    else lack('gravel', source, `the default gravel (${book.settings.defaultGravelCode})`);
  }

  // Pump run: pipe, fittings, pump, skimmer, waterfall filter box.
  const hydraulics = takeoff.hydraulics;
  if (input.pumpRun && hydraulics) {
    for (const line of hydraulics.lines) {
      const source = `pipe:${line.side}`;
      const pipe = cheapestMaterial(
        ofKind('pipe').filter(
          (item) =>
            item.pipeMaterial === line.material && item.nominalSizeIn === line.nominalSizeIn,
        ),
      );
      const length = roundQuantity(line.lengthFt, 1);
      if (length.isZero()) continue;
      if (pipe) add(source, pipe, length, `${pipe.name} (${line.side} side)`);
      else lack('pipe', source, `a ${line.nominalSizeIn} in ${line.material} pipe`);
    }
    const pressure = hydraulics.lines.find((line) => line.side === 'pressure');
    if (pressure) {
      for (const kind of FITTING_KINDS) {
        const count = input.pumpRun.fittings[kind];
        if (count <= 0) continue;
        const source = `fitting:${kind}`;
        const fitting = cheapestMaterial(
          ofKind('fitting').filter(
            (item) => item.fittingKind === kind && item.nominalSizeIn === pressure.nominalSizeIn,
          ),
        );
        if (fitting) add(source, fitting, roundQuantity(count, 0));
        else lack('fitting', source, `a ${pressure.nominalSizeIn} in ${FITTING_LABELS[kind]}`);
      }
    }
    const best = hydraulics.best;
    const pump = best ? byCode(best.pumpId, 'pump') : undefined;
    if (pump) add('pump', pump, roundQuantity(1, 0));
    else
      lack(
        'pump',
        'pump',
        best
          ? `the pump ${best.label} (code ${best.pumpId})`
          : `a pump that moves ${hydraulics.requiredFlowGph} gph at ${hydraulics.totalDynamicHeadAtRequiredFt} ft of head`,
      );
    const flow = hydraulics.requiredFlowGph;
    const wants: Array<[MaterialKind, boolean, string]> = [
      ['skimmer', input.basins.length > 0, 'a skimmer'],
      [
        'filter-box',
        input.waterfalls.length > 0 || input.streams.length > 0,
        'a waterfall filter box',
      ],
    ];
    for (const [kind, wanted, label] of wants) {
      if (!wanted) continue;
      const item = smallestMaterialAtLeast(book.materials, kind, 'ratedFlowGph', flow);
      if (item) add(kind, item, roundQuantity(1, 0));
      else lack(kind, kind, `${label} rated for at least ${flow} gph`);
    }
  }

  // Lighting: lights per fixture, transformers, cable by gauge.
  const lighting = takeoff.lighting;
  if (input.lighting.length > 0 && lighting) {
    const lights = new Map<string, { material: Material; count: number }>();
    for (const watts of input.lighting.flatMap((run) => run.fixtureWatts)) {
      const light = smallestMaterialAtLeast(book.materials, 'light', 'watts', watts);
      if (!light) {
        if (!missing.some((item) => item.source === `light:${watts}`))
          lack('light', `light:${watts}`, `a light of at least ${watts} W`, lightingOptionId);
        continue;
      }
      const entry = lights.get(light.code) ?? { material: light, count: 0 };
      entry.count += 1;
      lights.set(light.code, entry);
    }
    for (const { material, count } of lights.values()) {
      add('light', material, roundQuantity(count, 0), material.name, lightingOptionId);
    }
    const transformer = smallestMaterialAtLeast(
      book.materials,
      'transformer',
      'ratingWatts',
      lighting.transformerSizeWatts,
    );
    if (transformer)
      add(
        'transformer',
        transformer,
        roundQuantity(lighting.transformerCount, 0),
        transformer.name,
        lightingOptionId,
      );
    else
      lack(
        'transformer',
        'transformer',
        `a transformer rated at least ${lighting.transformerSizeWatts} W`,
        lightingOptionId,
      );
    const feetByGauge = new Map<string, number>();
    for (const run of input.lighting) {
      feetByGauge.set(run.gaugeAwg, (feetByGauge.get(run.gaugeAwg) ?? 0) + run.cableLengthFt);
    }
    for (const [gauge, feet] of feetByGauge) {
      const source = `cable:${gauge}`;
      const cable = cheapestMaterial(
        ofKind('cable').filter((item) => item.cableGaugeAwg === gauge),
      );
      if (cable) add(source, cable, roundQuantity(feet, 1), cable.name, lightingOptionId);
      else lack('cable', source, `${gauge} AWG low-voltage cable`, lightingOptionId);
    }
  }

  // Water storage blocks in a pond-free basin.
  const blockCuFt = takeoff.reservoir?.storageBlockVolumeCuFt ?? null;
  if (blockCuFt !== null && blockCuFt > 0) {
    const blocks = cheapestMaterial(ofKind('storage-block'));
    if (blocks) add('storage-blocks', blocks, roundQuantity(blockCuFt, 1));
    else lack('storage-block', 'storage-blocks', 'water storage blocks (priced per ft³)');
  }

  return { drafts, missing };
}
