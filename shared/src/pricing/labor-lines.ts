import type { LaborTask } from '../engine/labor/labor-hours';
import type { Takeoff } from '../engine/schemas/takeoff-output';
import { percentToFraction, roundUnitCost, toDecimal } from './money';
import type { LaborRole, PriceBook } from './price-book-schema';
import type { MissingItem } from './priced-estimate-schema';
import { roundQuantity, type LineDraft } from './price-line';

export const LABOR_TASK_LABELS: Record<LaborTask, string> = {
  excavation: 'Excavation',
  rockPlacing: 'Boulder and gravel placing',
  linerUnderlayment: 'Underlayment and liner',
  plumbingEquipment: 'Plumbing, pump, skimmer and filter box',
  electricalLighting: 'Low-voltage lighting',
  renovationTearOut: 'Tear-out of the old pond',
  cleanUp: 'Clean-up',
};

/**
 * A labor role's burdened rate per hour: wage × (1 + burden %), rounded half up to 4 decimals (the
 * unit cost shown on the line). E.g. 23.50 × 1.28 = 30.08.
 */
export function burdenedRate(role: LaborRole) {
  return roundUnitCost(
    toDecimal(role.wagePerHour).times(percentToFraction(role.burdenPct).plus(1)),
  );
}

/**
 * One labor line per task with hours: the takeoff's hours (0.1 h, as the engine rounds them) × the
 * burdened rate of the role the book's settings assign to the task. Labor is not taxable. The lighting
 * task goes to the option `lightingOptionId` when given.
 */
export function laborLines(args: {
  takeoff: Takeoff;
  book: PriceBook;
  lightingOptionId: string | null;
}): { drafts: LineDraft[]; missing: MissingItem[] } {
  const { takeoff, book, lightingOptionId } = args;
  const drafts: LineDraft[] = [];
  const missing: MissingItem[] = [];
  for (const { task, laborHours } of takeoff.labor.tasks) {
    const hours = roundQuantity(laborHours, 1);
    if (hours.isZero()) continue;
    const optionId = task === 'electricalLighting' ? lightingOptionId : null;
    const roleCode = book.settings.taskRoles[task];
    const role = book.laborRoles.find((item) => item.code === roleCode);
    const source = `labor:${task}`;
    if (!role) {
      missing.push({
        kind: 'labor-role',
        source,
        need: `the labor role ${roleCode}`,
        message: `Add the labor role ${roleCode} to your price book, or assign ${LABOR_TASK_LABELS[task].toLowerCase()} to another role.`,
        optionId,
      });
      continue;
    }
    drafts.push({
      id: `${optionId === null ? '' : `${optionId}:`}${source}`,
      category: 'labor',
      description: `${LABOR_TASK_LABELS[task]} (${role.name})`,
      code: role.code,
      quantity: hours,
      unit: 'h',
      unitCost: burdenedRate(role),
      taxable: false,
      source,
      kind: optionId === null ? 'base' : 'add-on',
      optionId,
    });
  }
  return { drafts, missing };
}
