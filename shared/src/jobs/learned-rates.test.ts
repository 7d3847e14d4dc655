import { describe, expect, it } from 'vitest';
import { demoPriceBook } from '../pricing/demo-price-book';
import { learnedRates } from './learned-rates';
import { fixtureBudget } from './testing/job-fixtures';
import type { JobBudget } from './job-schemas';

const book = demoPriceBook().productionRates;

/** The fixture job dug by hand: the same budget without the digging machine. */
function handDug(): JobBudget {
  const budget = fixtureBudget();
  return { ...budget, lines: budget.lines.filter((line) => line.category !== 'equipment') };
}

const quoted = (budget: JobBudget, task: string) =>
  budget.lines
    .filter((line) => line.task === task)
    .reduce((sum, line) => sum + Number(line.quantity), 0);

describe('learnedRates', () => {
  it('scales each rate by the hours the crew needed against the hours quoted', () => {
    const budget = fixtureBudget();
    const rockQuoted = quoted(budget, 'rockPlacing');
    const digQuoted = quoted(budget, 'excavation');
    // Two machine-dug jobs: rock placing took 1.25× and 1.5× its quoted hours → ratio (1.25q + 1.5q) / 2q = 1.375.
    const rates = learnedRates(book, [
      {
        budget,
        actualHoursByTask: { rockPlacing: rockQuoted * 1.25, excavation: digQuoted * 0.8 },
      },
      { budget, actualHoursByTask: { rockPlacing: rockQuoted * 1.5, excavation: digQuoted * 0.8 } },
    ]);
    const byName = Object.fromEntries(rates.map((rate) => [rate.parameter, rate]));

    expect(byName.boulderMachineLaborHoursPerShortTon).toMatchObject({
      jobs: 2,
      hoursRatio: 1.375,
      learnedValue: Number((book.boulderMachineLaborHoursPerShortTon * 1.375).toPrecision(3)),
    });
    // Hours per unit grow with the ratio; units per hour shrink: digging took 0.8× the hours, so the
    // machine moved 1 / 0.8 = 1.25× the book's yd³ per hour.
    expect(byName.machineBankCuYdPerHour!.learnedValue).toBe(
      Number((book.machineBankCuYdPerHour / 0.8).toPrecision(3)),
    );
    // Hand rates need hand-dug jobs; a task never logged teaches nothing.
    expect(byName.boulderHandLaborHoursPerShortTon).toMatchObject({ jobs: 0, learnedValue: null });
    expect(byName.linerLaborHoursPer100SqFt!.learnedValue).toBeNull();
    expect(byName.linerLaborHoursPer100SqFt!.bookValue).toBe(book.linerLaborHoursPer100SqFt);
  });

  it('keeps machine and hand jobs apart', () => {
    const rockQuoted = quoted(handDug(), 'rockPlacing');
    const rates = learnedRates(book, [
      { budget: handDug(), actualHoursByTask: { rockPlacing: rockQuoted * 2 } },
    ]);
    const hand = rates.find((rate) => rate.parameter === 'boulderHandLaborHoursPerShortTon')!;
    const machine = rates.find((rate) => rate.parameter === 'boulderMachineLaborHoursPerShortTon')!;
    expect(hand).toMatchObject({ jobs: 1, hoursRatio: 2 });
    expect(hand.learnedValue).toBe(
      Number((book.boulderHandLaborHoursPerShortTon * 2).toPrecision(3)),
    );
    expect(machine.jobs).toBe(0);
    expect(rates.find((rate) => rate.parameter === 'machineBankCuYdPerHour')!.jobs).toBe(0);
  });

  it('learns nothing from no jobs', () => {
    expect(
      learnedRates(book, []).every((rate) => rate.learnedValue === null && rate.jobs === 0),
    ).toBe(true);
  });
});
