import type { Material, MaterialAttributes, MaterialKind } from './price-book-schema';
import { toDecimal } from './money';

/** The cheapest material of a list by unit cost; ties go to the one listed first. Undefined when empty. */
export function cheapestMaterial(materials: ReadonlyArray<Material>): Material | undefined {
  let best: Material | undefined;
  for (const material of materials) {
    if (best === undefined || toDecimal(material.unitCost).lessThan(toDecimal(best.unitCost))) {
      best = material;
    }
  }
  return best;
}

type NumericAttribute = {
  [K in keyof MaterialAttributes]-?: NonNullable<MaterialAttributes[K]> extends number ? K : never;
}[keyof MaterialAttributes];

/**
 * Of the materials of `kind`, those whose numeric `attribute` is at least `need` (rated flow ≥ the
 * required flow, lamp watts ≥ the fixture's, transformer rating ≥ the size the engine chose); of
 * those, the smallest rating, and of equal ratings the cheapest (then the first listed). Undefined
 * when nothing is large enough.
 */
export function smallestMaterialAtLeast(
  materials: ReadonlyArray<Material>,
  kind: MaterialKind,
  attribute: NumericAttribute,
  need: number,
): Material | undefined {
  const large = materials.filter(
    (material) =>
      material.kind === kind && material[attribute] !== undefined && material[attribute] >= need,
  );
  if (large.length === 0) return undefined;
  const smallest = Math.min(...large.map((material) => material[attribute] as number));
  return cheapestMaterial(large.filter((material) => material[attribute] === smallest));
}
