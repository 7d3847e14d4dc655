import type { ChangeOrderLine, ChangeOrderView } from '@pondwright/shared';

/** A change that takes off more than it adds: its total (tax included) is below zero. */
export function isCredit(order: Pick<ChangeOrderView, 'total'>): boolean {
  // Only the sign is read; the figure itself comes from the server.
  return Number(order.total) < 0;
}

/** "12 ft" added; "13.8 → 9.8 h" for work taken off (to 0 when the line is removed). */
export function lineQuantityText(line: ChangeOrderLine): string {
  return line.change === 'added'
    ? `${line.quantity} ${line.unit}`
    : `${line.fromQuantity ?? ''} → ${line.toQuantity ?? ''} ${line.unit}`;
}

/** One line in a sentence: "Boulders (2 ton)", "Rock placing (13.8 → 9.8 h)", "Lights (removed)". */
export function lineSummaryText(line: ChangeOrderLine): string {
  if (line.change === 'removed') return `${line.description} (removed)`;
  return `${line.description} (${lineQuantityText(line)})`;
}
