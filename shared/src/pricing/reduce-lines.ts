import { toDecimal } from './money';
import type { PricedLine } from './priced-estimate-schema';
import { priceLine } from './price-line';

/**
 * Work a change order takes off a priced line: the quantity the line keeps, in the line's unit
 * ("0" takes the whole line off).
 */
export type LineReduction = { lineId: string; newQuantity: string };

/**
 * Takes work off priced lines (a credit). A reduced line is priced again at the quantity it keeps with
 * its own unit cost and markup (`priceLine`: extended cost = quantity × unit cost, price = extended
 * cost × (1 + markup %), each rounded half up to cents), so what comes off is priced at the rates the
 * line was sold at. A line that keeps 0 is left out. Other lines come through unchanged, in order.
 *
 * @returns the lines, and the ids of reductions that name none of them.
 * @throws RangeError when a kept quantity is not a number, is negative or is more than the line's
 *         quantity, or when two reductions name the same line.
 */
export function reducePricedLines(
  lines: ReadonlyArray<PricedLine>,
  reductions: ReadonlyArray<LineReduction>,
): { lines: PricedLine[]; unknownLineIds: string[] } {
  const byId = new Map(reductions.map((reduction) => [reduction.lineId, reduction]));
  if (byId.size !== reductions.length) {
    throw new RangeError('Each line can be reduced once');
  }
  const result: PricedLine[] = [];
  for (const line of lines) {
    const reduction = byId.get(line.id);
    if (!reduction) {
      result.push(line);
      continue;
    }
    byId.delete(line.id);
    const kept = toDecimal(reduction.newQuantity);
    if (kept.isNegative()) {
      throw new RangeError(`A line cannot keep a negative quantity: ${line.id}`);
    }
    if (kept.greaterThan(toDecimal(line.quantity))) {
      throw new RangeError(
        `A reduction cannot add to a line: ${line.id} has ${line.quantity}, not ${reduction.newQuantity}`,
      );
    }
    if (kept.isZero()) continue;
    result.push(
      priceLine(
        {
          id: line.id,
          category: line.category,
          description: line.description,
          code: line.code,
          quantity: kept,
          unit: line.unit,
          unitCost: toDecimal(line.unitCost),
          taxable: line.taxable,
          source: line.source,
          kind: line.kind,
          optionId: line.optionId,
        },
        line.markupPct,
      ),
    );
  }
  return { lines: result, unknownLineIds: [...byId.keys()] };
}
