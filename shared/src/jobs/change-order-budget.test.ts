import { describe, expect, it } from 'vitest';
import { budgetAfterChangeOrder, type AcceptedChange } from './change-order-budget';
import type { BudgetLine } from './job-schemas';
import { fixtureBudget } from './testing/job-fixtures';

const step: BudgetLine = {
  id: 'manual:co1-1',
  category: 'materials',
  description: 'Flagstone step',
  code: null,
  source: 'manual',
  task: null,
  quantity: '1',
  unit: 'ea',
  unitCost: '80.00',
  extendedCost: '80.00',
  price: '116.00',
};

/**
 * On the fixture budget (cost 4286.98, 37.6 labor hours, total 6161.95): the medium boulders come off
 * (1.6 t, cost 280.00, price 406.00), rock placing goes from 13.8 h to 9.8 h (9.8 × 40.96 = 401.408
 * → 401.41 cost; × 1.55 = 622.1855 → 622.19 price) and a flagstone step is added (cost 80.00).
 */
function credit(overrides: Partial<AcceptedChange> = {}): AcceptedChange {
  return {
    versionNumber: 3,
    contentSha256: 'b'.repeat(64),
    added: [step],
    reductions: [
      {
        id: 'boulders:medium:BOULDER-M',
        quantity: '0',
        extendedCost: '0.00',
        price: '0.00',
        previous: { quantity: '1.6', extendedCost: '280.00', price: '406.00' },
      },
      {
        id: 'labor:rockPlacing',
        quantity: '9.8',
        extendedCost: '401.41',
        price: '622.19',
        previous: { quantity: '13.8', extendedCost: '565.25', price: '876.14' },
      },
    ],
    priceBeforeTax: '-544.09',
    tax: '-21.02',
    total: '-565.11',
    ...overrides,
  };
}

describe('budgetAfterChangeOrder', () => {
  it('takes a credit’s work off the lines and shrinks cost, hours and totals', () => {
    const before = fixtureBudget();
    const after = budgetAfterChangeOrder(before, credit());

    expect(after.lines.map((line) => line.id)).not.toContain('boulders:medium:BOULDER-M');
    expect(after.lines.find((line) => line.id === 'labor:rockPlacing')).toMatchObject({
      quantity: '9.8',
      extendedCost: '401.41',
      price: '622.19',
      unitCost: '40.96',
      task: 'rockPlacing',
    });
    expect(after.lines.at(-1)).toEqual(step);
    expect(after.lines).toHaveLength(before.lines.length);
    // 4286.98 − 280.00 − (565.25 − 401.41) + 80.00 = 3923.14.
    expect(after.cost).toBe('3923.14');
    // 37.6 h − 4 h.
    expect(after.laborHours).toBe('33.60');
    // 6004.12 − 544.09; 157.83 − 21.02; 6161.95 − 565.11.
    expect(after).toMatchObject({
      priceBeforeTax: '5460.03',
      tax: '136.81',
      total: '5596.84',
      versionNumber: 3,
      contentSha256: 'b'.repeat(64),
      crewDays: before.crewDays,
    });
  });

  it('adds new work as before', () => {
    const after = budgetAfterChangeOrder(fixtureBudget(), {
      ...credit(),
      reductions: [],
      priceBeforeTax: '116.00',
      tax: '8.41',
      total: '124.41',
    });
    // 4286.98 + 80.00; 6161.95 + 124.41.
    expect(after.cost).toBe('4366.98');
    expect(after.total).toBe('6286.36');
    expect(after.laborHours).toBe('37.60');
  });

  it('refuses a reduction of a line the budget lacks or holds with other figures', () => {
    expect(() =>
      budgetAfterChangeOrder(
        fixtureBudget(),
        credit({
          reductions: [
            {
              id: 'labor:plumbing',
              quantity: '0',
              extendedCost: '0.00',
              price: '0.00',
              previous: { quantity: '2', extendedCost: '60.16', price: '93.25' },
            },
          ],
        }),
      ),
    ).toThrow(RangeError);
    // Another change already took the medium boulders down to 1 t.
    const taken = fixtureBudget();
    taken.lines = taken.lines.map((line) =>
      line.id === 'boulders:medium:BOULDER-M'
        ? { ...line, quantity: '1', extendedCost: '175.00', price: '253.75' }
        : line,
    );
    expect(() => budgetAfterChangeOrder(taken, credit())).toThrow(RangeError);
  });
});
