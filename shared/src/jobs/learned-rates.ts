import type { LaborTask } from '../engine/labor/labor-hours';
import type { ProductionRates } from '../pricing/price-book-schema';
import type { JobBudget } from './job-schemas';

/** How a production rate moves when the crew needs more hours than quoted for its task. */
type RateDirection = 'hours-per-unit' | 'units-per-hour';

type RateSpec = {
  parameter: keyof ProductionRates;
  task: LaborTask;
  label: string;
  unit: string;
  direction: RateDirection;
  /** Jobs whose digging or stone work matches the rate (machine or hand), or every job. */
  applies: 'machine' | 'hand' | 'any';
};

/** Each price-book production rate and the labor task whose hours it sets (see `laborHours`). */
export const LEARNABLE_RATES: ReadonlyArray<RateSpec> = [
  {
    parameter: 'machineBankCuYdPerHour',
    task: 'excavation',
    label: 'Machine digging',
    unit: 'bank yd³ per hour',
    direction: 'units-per-hour',
    applies: 'machine',
  },
  {
    parameter: 'boulderMachineLaborHoursPerShortTon',
    task: 'rockPlacing',
    label: 'Boulders placed with a machine',
    unit: 'labor-hours per ton',
    direction: 'hours-per-unit',
    applies: 'machine',
  },
  {
    parameter: 'boulderHandLaborHoursPerShortTon',
    task: 'rockPlacing',
    label: 'Boulders placed by hand',
    unit: 'labor-hours per ton',
    direction: 'hours-per-unit',
    applies: 'hand',
  },
  {
    parameter: 'gravelLaborHoursPerShortTon',
    task: 'rockPlacing',
    label: 'Gravel spread',
    unit: 'labor-hours per ton',
    direction: 'hours-per-unit',
    applies: 'any',
  },
  {
    parameter: 'linerLaborHoursPer100SqFt',
    task: 'linerUnderlayment',
    label: 'Liner and underlayment laid',
    unit: 'labor-hours per 100 ft²',
    direction: 'hours-per-unit',
    applies: 'any',
  },
  {
    parameter: 'pipeLaborHoursPerFt',
    task: 'plumbingEquipment',
    label: 'Pipe run',
    unit: 'labor-hours per ft',
    direction: 'hours-per-unit',
    applies: 'any',
  },
  {
    parameter: 'fittingLaborHoursEach',
    task: 'plumbingEquipment',
    label: 'Fittings made up',
    unit: 'labor-hours each',
    direction: 'hours-per-unit',
    applies: 'any',
  },
  {
    parameter: 'pumpSetLaborHours',
    task: 'plumbingEquipment',
    label: 'Pump set',
    unit: 'labor-hours each',
    direction: 'hours-per-unit',
    applies: 'any',
  },
  {
    parameter: 'fixtureLaborHoursEach',
    task: 'electricalLighting',
    label: 'Light fixtures fitted',
    unit: 'labor-hours each',
    direction: 'hours-per-unit',
    applies: 'any',
  },
  {
    parameter: 'cableLaborHoursPerFt',
    task: 'electricalLighting',
    label: 'Low-voltage cable run',
    unit: 'labor-hours per ft',
    direction: 'hours-per-unit',
    applies: 'any',
  },
];

export type ClosedJobHours = {
  budget: JobBudget;
  /** Hours logged per task on the job. */
  actualHoursByTask: Partial<Record<LaborTask, number>>;
};

export type LearnedRate = {
  parameter: keyof ProductionRates;
  label: string;
  unit: string;
  task: LaborTask;
  bookValue: number;
  /** Null until at least one closed job quoted hours for the task. */
  learnedValue: number | null;
  /** Closed jobs behind the figure. */
  jobs: number;
  estimatedHours: number;
  actualHours: number;
  /** Σ actual hours ÷ Σ quoted hours over those jobs; 1 means the book was right. */
  hoursRatio: number | null;
};

/**
 * The crew's real production rates from closed jobs, beside the price book's. For each rate, over the
 * closed jobs that quoted hours for its task (machine-dug jobs for machine rates, hand-dug for hand
 * rates), the hours ratio r = Σ hours logged ÷ Σ hours quoted. Quoted hours were the book's rates ×
 * the job's quantities, so the rate the crew achieved is book × r for labor-hours per unit, and
 * book ÷ r for units per hour. Every rate of a task shares its ratio: the daily log records hours by
 * task, not by item. Learned values keep 3 significant figures. // common practice, no source
 */
export function learnedRates(
  book: ProductionRates,
  jobs: ReadonlyArray<ClosedJobHours>,
): LearnedRate[] {
  return LEARNABLE_RATES.map((spec) => {
    const relevant = jobs.filter(
      (job) =>
        spec.applies === 'any' || (machineDug(job.budget) ? 'machine' : 'hand') === spec.applies,
    );
    let estimatedHours = 0;
    let actualHours = 0;
    let count = 0;
    for (const job of relevant) {
      const quoted = job.budget.lines
        .filter((line) => line.category === 'labor' && line.task === spec.task)
        .reduce((sum, line) => sum + Number(line.quantity), 0);
      if (quoted <= 0) continue;
      count += 1;
      estimatedHours += quoted;
      actualHours += job.actualHoursByTask[spec.task] ?? 0;
    }
    const bookValue = book[spec.parameter];
    const ratio = count > 0 && actualHours > 0 ? actualHours / estimatedHours : null;
    const learned =
      ratio === null
        ? null
        : significant(spec.direction === 'hours-per-unit' ? bookValue * ratio : bookValue / ratio);
    return {
      parameter: spec.parameter,
      label: spec.label,
      unit: spec.unit,
      task: spec.task,
      bookValue,
      learnedValue: learned,
      jobs: count,
      estimatedHours: round(estimatedHours, 2),
      actualHours: round(actualHours, 2),
      hoursRatio: ratio === null ? null : round(ratio, 3),
    };
  });
}

/** A job was dug by machine when its budget rents the digging machine. */
function machineDug(budget: JobBudget): boolean {
  return budget.lines.some((line) => line.source === 'equipment:excavation');
}

function significant(value: number): number {
  return Number(value.toPrecision(3));
}

function round(value: number, decimals: number): number {
  const factor = 10 ** decimals;
  return Math.round(value * factor) / factor;
}
