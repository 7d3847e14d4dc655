import type Decimal from 'decimal.js';
import { LABOR_TASKS, type LaborTask } from '../engine/labor/labor-hours';
import { LABOR_TASK_LABELS } from '../pricing/labor-lines';
import {
  formatMoney,
  formatPercent,
  formatUnitCost,
  PricingDecimal,
  roundMoney,
  roundUnitCost,
  sumDecimals,
  toDecimal,
} from '../pricing/money';
import { PRICE_CATEGORIES, type PriceCategory } from '../pricing/price-book-schema';
import { isLoadUnit, isLooseCubicYardUnit } from './disposal-loads';
import type { BudgetLine, JobBudget, LogEntry, QuantityEntry } from './job-schemas';

/** Where a labor row's hourly rate comes from: its own budget lines, the budget's average, or nowhere. */
export type LaborRateBasis = 'task' | 'average' | 'none';

/** One labor task: quoted hours and cost against the hours logged, costed at the quoted rate. */
export type LaborCostRow = {
  /** Null only for a budget labor line that names no task (its hours cannot be logged). */
  task: LaborTask | null;
  label: string;
  estimatedHours: string;
  actualHours: string;
  /** The hourly rate the actual hours are costed at (2 to 4 decimals); "0.00" when basis is none. */
  rate: string;
  rateBasis: LaborRateBasis;
  estimatedCost: string;
  actualCost: string;
  variance: string;
  /** Hours logged on the task by each person, in the order they first appear. */
  people: Array<{ person: string; hours: string }>;
};

/** Everyone who logged hours: their total, the days they worked and their hours by task. */
export type PersonHours = {
  person: string;
  hours: string;
  daysWorked: string;
  tasks: Array<{ task: LaborTask; hours: string }>;
};

/** One material: a budget code (its lines together), or an unbudgeted item the crew logged. */
export type MaterialCostRow = {
  /** `code:<code>` for a budget code, `line:<id>` for a budget line without a code, `extra:…` otherwise. */
  key: string;
  code: string | null;
  description: string;
  unit: string;
  budgeted: boolean;
  estimatedQuantity: string;
  deliveredQuantity: string;
  usedQuantity: string;
  returnedQuantity: string;
  /** Delivered − returned: what the job paid for. */
  actualQuantity: string;
  /** Delivered − used − returned; negative when material came from stock. */
  onHandQuantity: string;
  /** The budget's unit cost; null for an unbudgeted item. */
  budgetUnitCost: string | null;
  /** Σ (delivered quantity × unit cost) ÷ Σ delivered quantity; null when nothing was delivered. */
  averageDeliveredUnitCost: string | null;
  estimatedCost: string;
  deliveredCost: string;
  returnedCredit: string;
  actualCost: string;
  variance: string;
};

/** One piece of equipment or disposal: a budget code in one unit, or an unbudgeted item. */
export type QuantityCostRow = {
  /** `code:<code>|<unit>` for a budget code, `line:<id>` for a budget line without a code, `extra:…` otherwise. */
  key: string;
  code: string | null;
  description: string;
  unit: string;
  budgeted: boolean;
  estimatedQuantity: string;
  /** In `unit`; disposal logged in loads with a load size is counted here as loads × size. */
  actualQuantity: string;
  /**
   * Disposal only: the loads logged with a load size and converted to `unit` (loose yd³) at their
   * nominal capacity, as the crew counted them; null when no loads were converted.
   */
  loggedLoads: string | null;
  budgetUnitCost: string | null;
  estimatedCost: string;
  actualCost: string;
  variance: string;
};

/** Mobilization, contingency and any other `other` budget line. */
export type OtherCostRow = {
  key: string;
  source: string;
  description: string;
  estimatedCost: string;
  actualCost: string;
  variance: string;
};

export type CategoryCostRow = {
  category: PriceCategory;
  estimatedCost: string;
  actualCost: string;
  variance: string;
  /** Variance ÷ estimated cost × 100; null when nothing was estimated. */
  variancePct: string | null;
};

export type JobCostSchedule = {
  plannedStart: string | null;
  plannedCrewDays: string;
  /** Distinct log dates with hours logged (more than 0). */
  actualCrewDays: string;
  /** Actual − planned crew days. */
  crewDaysVariance: string;
  firstWorkedDate: string | null;
  lastWorkedDate: string | null;
  hoursPerCrewDay: string;
};

export type JobCostTotals = {
  quotedPriceBeforeTax: string;
  estimatedCost: string;
  actualCost: string;
  variance: string;
  variancePct: string | null;
  quotedGrossProfit: string;
  actualGrossProfit: string;
  /** Gross profit ÷ price × 100; null when the price is 0. */
  quotedMarginPct: string | null;
  actualMarginPct: string | null;
};

/** `GET /api/jobs/:id/report`: the job's budget set against its daily logs. */
export type JobCostReport = {
  currency: string;
  budgetVersion: number;
  labor: LaborCostRow[];
  people: PersonHours[];
  materials: MaterialCostRow[];
  equipment: QuantityCostRow[];
  disposal: QuantityCostRow[];
  other: OtherCostRow[];
  categories: CategoryCostRow[];
  schedule: JobCostSchedule;
  totals: JobCostTotals;
  /** How figures were arrived at where a reader might ask (allowances, assumed costs). */
  notes: string[];
  /** Figures that could not be costed as logged, or logs that disagree with the budget. */
  warnings: string[];
};

export type JobCostReportArgs = {
  budget: JobBudget;
  logs: ReadonlyArray<{ logDate: string; entries: ReadonlyArray<LogEntry> }>;
  plannedStart: string | null;
  plannedCrewDays: string;
  /** Default '8'. Echoed in the schedule; no figure depends on it. */
  hoursPerCrewDay?: string;
};

const ZERO = new PricingDecimal(0);

/** A quantity as a plain decimal string without trailing zeros: "17.5", "0", "-0.3". */
function formatQuantity(value: Decimal): string {
  return value.isZero() ? '0' : value.toString();
}

function variancePct(variance: Decimal, estimated: Decimal): string | null {
  return estimated.isZero() ? null : formatPercent(variance.dividedBy(estimated).times(100));
}

const codeKey = (code: string) => code.trim().toLowerCase();
const textKey = (text: string) => text.trim().toLowerCase().replace(/\s+/g, ' ');
/** Units compared loosely: case, spacing and a plural s ("Days" = "day", "cu yds" = "cu yd"). */
const unitKey = (unit: string) => textKey(unit).replace(/^(.{2,})s$/, '$1');

function sumOf(lines: ReadonlyArray<BudgetLine>, field: 'quantity' | 'extendedCost'): Decimal {
  return sumDecimals(lines.map((line) => toDecimal(line[field])));
}

/** What a logged quantity row collects before it is formatted. */
type QuantityTally = {
  key: string;
  code: string | null;
  description: string;
  unit: string;
  lines: BudgetLine[];
  budgetUnitCost: Decimal | null;
  /** Equipment delivery lines: incurred with the machine (see `jobCostReport`). */
  delivery: boolean;
  entries: number;
  delivered: Decimal;
  deliveredValue: Decimal;
  deliveredCost: Decimal;
  used: Decimal;
  returned: Decimal[];
  actual: Decimal;
  actualCost: Decimal;
  /** Disposal loads converted to loose yd³, by load size (loose yd³, as logged). */
  loads: Map<string, Decimal>;
};

function tally(
  key: string,
  lines: BudgetLine[],
  first: { code: string | null; description: string; unit: string },
): QuantityTally {
  return {
    key,
    code: first.code,
    description: first.description,
    unit: first.unit,
    lines,
    budgetUnitCost: lines[0] ? toDecimal(lines[0].unitCost) : null,
    delivery: lines.length > 0 && lines.every((line) => line.source === 'equipment:delivery'),
    entries: 0,
    delivered: ZERO,
    deliveredValue: ZERO,
    deliveredCost: ZERO,
    used: ZERO,
    returned: [],
    actual: ZERO,
    actualCost: ZERO,
    loads: new Map<string, Decimal>(),
  };
}

/**
 * A disposal entry counted in loads, with its load size, against a row counted in loose yd³: the
 * loads × the load's nominal capacity, in loose yd³. Null when the entry is not converted.
 */
function loadsAsLooseCubicYards(
  entry: QuantityEntry,
  quantity: Decimal,
  rowUnit: string,
): Decimal | null {
  if (entry.kind !== 'disposal' || entry.loadVolumeLooseCubicYards === undefined) return null;
  if (!isLoadUnit(entry.unit) || !isLooseCubicYardUnit(rowUnit)) return null;
  return quantity.times(toDecimal(entry.loadVolumeLooseCubicYards));
}

/**
 * The job cost report: the budget (what the job was sold for and expected to cost) set against the
 * daily logs (what really happened). Pure; every money figure is a string with exactly 2 decimals,
 * percentages have 2 decimals, quantities are plain decimal strings. Logs are read in date order;
 * an entry of 0 hours or 0 quantity changes nothing.
 *
 * Labor, per task (in `LABOR_TASKS` order: tasks with a budget line or hours logged):
 * - estimated hours and cost = Σ quantity and Σ extended cost of the budget's labor lines for the task;
 * - actual hours = Σ hours logged on the task;
 * - actual cost = actual hours × the task's quoted rate, rounded to cents once per task. The quoted rate
 *   is the budget's unit cost for the task (weighted by hours if it has several lines). A task without
 *   a budget line is costed at the budget's average labor rate, Σ labor cost ÷ Σ labor hours rounded
 *   to 4 decimals like any unit cost, and says so in `notes`; when the budget has no labor at all its
 *   hours cost 0 and `warnings` says so. Labor is costed at quoted (burdened) rates, not payroll.
 * - hours per person, per task and overall (`people`, with the distinct days each worked).
 *
 * Materials, one row per budget code (lines of one code, e.g. gravel and reservoir fill, together;
 * their unit cost is the first line's), then one row per unbudgeted item:
 * - entries match a row by code (case-insensitive); an entry whose code is not in the budget, or has
 *   none, goes to an extra row keyed by its code (or, without one, its description) and unit;
 * - delivered, used and returned quantities are summed by movement; on hand = delivered − used −
 *   returned (negative when material came from stock, which is not costed: `notes` says so);
 * - actual cost = Σ delivered (quantity × its unit cost, or the budget unit cost when it has none)
 *   − Σ returned (quantity × the average delivered unit cost of the row, weighted by quantity and
 *   rounded to 4 decimals; the budget unit cost when nothing was delivered), each entry rounded to
 *   cents. An unbudgeted delivery without a unit cost, or return with nothing delivered, counts 0 and
 *   is warned about.
 *
 * Equipment and disposal, one row per budget code and unit (a machine's days apart from its
 * delivery), then unbudgeted items:
 * - entries match by code, and by unit when the code has several rows (else its first row that is not
 *   a delivery); a unit that differs from the budget's is warned about and counted in the budget's;
 * - except disposal logged in loads with a load size against a row in loose yd³: converted, without a
 *   warning, to loads × the load's nominal capacity (yd³); the loads are kept in `loggedLoads` and a
 *   note says the figure assumes full loads. Loads without a size are warned about as above;
 * - actual quantity = Σ quantity (converted); actual cost = Σ quantity × (entry unit cost ?? budget
 *   unit cost), each entry rounded to cents; an entry's own unit cost is per its unit (per load for
 *   converted loads), the budget's per the row's unit (per yd³ of the converted figure);
 * - an equipment delivery line (`equipment:delivery`) nothing was logged against is incurred as
 *   quoted once its machine (same code) has any quantity logged, and 0 otherwise.
 *
 * Other: mobilization (and any other `other` line) was incurred, so actual = estimate; contingency is
 * an allowance, not a cost, so its actual is 0 (both said in `notes`).
 *
 * Categories (materials, labor, equipment, disposal, other): estimated cost = Σ the budget lines'
 * extended cost; actual cost = Σ the rows' actual cost; variance = actual − estimated; variance % =
 * variance ÷ estimated × 100 (null when estimated is 0).
 *
 * Schedule: planned crew days as given; actual crew days = distinct log dates with hours logged (a day
 * worked); first and last worked date. `hoursPerCrewDay` (default 8) is echoed, nothing is derived
 * from it.
 *
 * Totals: quoted price before tax and estimated cost from the budget; actual cost = Σ category actual
 * costs; gross profit = price − cost; margin % = profit ÷ price × 100 (null when the price is 0).
 */
export function jobCostReport(args: JobCostReportArgs): JobCostReport {
  const { budget } = args;
  const notes: string[] = [];
  const warnings: string[] = [];
  const hoursPerCrewDay = toDecimal(args.hoursPerCrewDay ?? '8');
  if (!hoursPerCrewDay.greaterThan(0)) {
    throw new RangeError(`Hours per crew day must be more than 0, got ${args.hoursPerCrewDay}`);
  }
  const plannedCrewDays = toDecimal(args.plannedCrewDays);
  const logs = [...args.logs].sort((a, b) =>
    a.logDate < b.logDate ? -1 : a.logDate > b.logDate ? 1 : 0,
  );
  const linesOf = (category: PriceCategory) =>
    budget.lines.filter((line) => line.category === category);

  // Labor.
  const laborLines = linesOf('labor');
  const laborHoursTotal = sumOf(laborLines, 'quantity');
  const averageRate = laborHoursTotal.isZero()
    ? null
    : roundUnitCost(sumOf(laborLines, 'extendedCost').dividedBy(laborHoursTotal));
  const taskHours = new Map<LaborTask, Decimal>();
  const taskPeople = new Map<LaborTask, Map<string, { person: string; hours: Decimal }>>();
  const people = new Map<
    string,
    { person: string; hours: Decimal; days: Set<string>; tasks: Map<LaborTask, Decimal> }
  >();
  const workedDates = new Set<string>();
  for (const log of logs) {
    for (const entry of log.entries) {
      if (entry.kind !== 'hours') continue;
      const hours = toDecimal(entry.hours);
      if (hours.isZero()) continue;
      workedDates.add(log.logDate);
      taskHours.set(entry.task, (taskHours.get(entry.task) ?? ZERO).plus(hours));
      const key = textKey(entry.person);
      const onTask =
        taskPeople.get(entry.task) ?? new Map<string, { person: string; hours: Decimal }>();
      taskPeople.set(entry.task, onTask);
      const personOnTask = onTask.get(key) ?? { person: entry.person.trim(), hours: ZERO };
      onTask.set(key, { ...personOnTask, hours: personOnTask.hours.plus(hours) });
      const person = people.get(key) ?? {
        person: entry.person.trim(),
        hours: ZERO,
        days: new Set<string>(),
        tasks: new Map<LaborTask, Decimal>(),
      };
      person.hours = person.hours.plus(hours);
      person.days.add(log.logDate);
      person.tasks.set(entry.task, (person.tasks.get(entry.task) ?? ZERO).plus(hours));
      people.set(key, person);
    }
  }
  const labor: LaborCostRow[] = [];
  for (const task of LABOR_TASKS) {
    const lines = laborLines.filter((line) => line.task === task);
    const actualHours = taskHours.get(task) ?? ZERO;
    if (lines.length === 0 && actualHours.isZero()) continue;
    const estimatedHours = sumOf(lines, 'quantity');
    const estimatedCost = sumOf(lines, 'extendedCost');
    let rate: Decimal;
    let rateBasis: LaborRateBasis;
    if (!estimatedHours.isZero()) {
      rate = sumDecimals(
        lines.map((line) => toDecimal(line.quantity).times(toDecimal(line.unitCost))),
      ).dividedBy(estimatedHours);
      rateBasis = 'task';
    } else if (averageRate !== null) {
      rate = averageRate;
      rateBasis = 'average';
      notes.push(
        `${LABOR_TASK_LABELS[task]} has no budget line: its ${formatQuantity(actualHours)} h are costed at the budget's average labor rate ${formatUnitCost(averageRate)} per hour.`,
      );
    } else {
      rate = ZERO;
      rateBasis = 'none';
      warnings.push(
        `The budget has no labor, so the ${formatQuantity(actualHours)} h of ${LABOR_TASK_LABELS[task].toLowerCase()} logged cost 0.`,
      );
    }
    const actualCost = roundMoney(actualHours.times(rate));
    labor.push({
      task,
      label: LABOR_TASK_LABELS[task],
      estimatedHours: formatQuantity(estimatedHours),
      actualHours: formatQuantity(actualHours),
      rate: formatUnitCost(rate),
      rateBasis,
      estimatedCost: formatMoney(estimatedCost),
      actualCost: formatMoney(actualCost),
      variance: formatMoney(actualCost.minus(estimatedCost)),
      people: [...(taskPeople.get(task)?.values() ?? [])].map((p) => ({
        person: p.person,
        hours: formatQuantity(p.hours),
      })),
    });
  }
  for (const line of laborLines.filter((l) => l.task === null)) {
    warnings.push(
      `The labor line "${line.description}" names no task, so no hours can be logged on it.`,
    );
    labor.push({
      task: null,
      label: line.description,
      estimatedHours: formatQuantity(toDecimal(line.quantity)),
      actualHours: '0',
      rate: formatUnitCost(toDecimal(line.unitCost)),
      rateBasis: 'task',
      estimatedCost: formatMoney(toDecimal(line.extendedCost)),
      actualCost: '0.00',
      variance: formatMoney(toDecimal(line.extendedCost).negated()),
      people: [],
    });
  }
  if (labor.some((row) => !toDecimal(row.actualHours).isZero())) {
    notes.push(
      "Labor is costed at the budget's hourly rates (quoted burdened rates), not payroll.",
    );
  }

  // Materials, equipment and disposal: budget rows, then entries matched to them or to extra rows.
  const budgetTallies = (category: PriceCategory, byUnit: boolean): QuantityTally[] => {
    const groups = new Map<string, BudgetLine[]>();
    for (const line of linesOf(category)) {
      const key =
        line.code === null
          ? `line:${line.id}`
          : `code:${codeKey(line.code)}${byUnit ? `|${unitKey(line.unit)}` : ''}`;
      groups.set(key, [...(groups.get(key) ?? []), line]);
    }
    return [...groups].map(([key, lines]) => tally(key, lines, lines[0]!));
  };
  const placeEntries = (
    kind: QuantityEntry['kind'],
    rows: QuantityTally[],
    add: (
      row: QuantityTally,
      entry: QuantityEntry,
      quantity: Decimal,
      /** Loads converted to the row's loose yd³ (see `loadsAsLooseCubicYards`), else null. */
      looseCubicYards: Decimal | null,
    ) => void,
  ) => {
    const extras = new Map<string, QuantityTally>();
    for (const log of logs) {
      for (const entry of log.entries) {
        if (entry.kind !== kind) continue;
        if (kind === 'material' && entry.movement === null) {
          warnings.push(
            `${log.logDate}: ${entry.description} does not say whether it was delivered, used or returned; left out.`,
          );
          continue;
        }
        const quantity = toDecimal(entry.quantity);
        if (quantity.isZero()) continue;
        const candidates =
          entry.code === null
            ? []
            : rows.filter((row) => row.code !== null && codeKey(row.code) === codeKey(entry.code!));
        let row =
          candidates.length <= 1
            ? candidates[0]
            : (candidates.find((c) => unitKey(c.unit) === unitKey(entry.unit)) ??
              candidates.find((c) => loadsAsLooseCubicYards(entry, quantity, c.unit) !== null) ??
              candidates.find((c) => !c.delivery) ??
              candidates[0]);
        const looseCubicYards = row ? loadsAsLooseCubicYards(entry, quantity, row.unit) : null;
        if (row && looseCubicYards === null && unitKey(row.unit) !== unitKey(entry.unit)) {
          const sizeMissing =
            kind === 'disposal' && isLoadUnit(entry.unit) && isLooseCubicYardUnit(row.unit);
          warnings.push(
            sizeMissing
              ? `${log.logDate}: ${entry.description} was logged in ${entry.unit} without a load size, so it cannot be converted to the budget's ${row.unit} for ${row.code}; counted as ${formatQuantity(quantity)} ${row.unit}.`
              : `${log.logDate}: ${entry.description} was logged in ${entry.unit}, but the budget counts ${row.code} in ${row.unit}; counted as ${formatQuantity(quantity)} ${row.unit}.`,
          );
        }
        if (!row) {
          const key = `extra:${entry.code === null ? `description:${textKey(entry.description)}` : `code:${codeKey(entry.code)}`}|${unitKey(entry.unit)}`;
          row =
            extras.get(key) ?? tally(key, [], { ...entry, description: entry.description.trim() });
          extras.set(key, row);
        }
        row.entries += 1;
        add(row, entry, quantity, looseCubicYards);
      }
    }
    return [...rows, ...extras.values()];
  };
  const unpriced = (row: QuantityTally, what: string) =>
    warnings.push(
      `${row.description} is not in the budget and ${what} without a unit cost: costed 0.`,
    );

  const materialRows = placeEntries(
    'material',
    budgetTallies('materials', false),
    (row, entry, q) => {
      if (entry.movement === 'delivered') {
        const unitCost =
          entry.unitCost !== null ? toDecimal(entry.unitCost) : (row.budgetUnitCost ?? ZERO);
        if (entry.unitCost === null && row.budgetUnitCost === null) unpriced(row, 'was delivered');
        row.delivered = row.delivered.plus(q);
        row.deliveredValue = row.deliveredValue.plus(q.times(unitCost));
        row.deliveredCost = row.deliveredCost.plus(roundMoney(q.times(unitCost)));
      } else if (entry.movement === 'used') {
        row.used = row.used.plus(q);
      } else {
        row.returned.push(q);
      }
    },
  );
  const materials = materialRows.map((row): MaterialCostRow => {
    const averageDelivered = row.delivered.isZero()
      ? null
      : roundUnitCost(row.deliveredValue.dividedBy(row.delivered));
    const returnUnitCost = averageDelivered ?? row.budgetUnitCost;
    const returned = sumDecimals(row.returned);
    if (returnUnitCost === null && !returned.isZero()) unpriced(row, 'was returned undelivered');
    const returnedCredit = sumDecimals(
      row.returned.map((q) => roundMoney(q.times(returnUnitCost ?? ZERO))),
    );
    const onHand = row.delivered.minus(row.used).minus(returned);
    if (onHand.isNegative()) {
      notes.push(
        `${row.description}: ${formatQuantity(onHand.negated())} ${row.unit} more used or returned than delivered, taken from stock; stock is not costed to the job.`,
      );
    }
    const estimatedCost = sumOf(row.lines, 'extendedCost');
    const actualCost = row.deliveredCost.minus(returnedCredit);
    return {
      key: row.key,
      code: row.code,
      description: row.description,
      unit: row.unit,
      budgeted: row.lines.length > 0,
      estimatedQuantity: formatQuantity(sumOf(row.lines, 'quantity')),
      deliveredQuantity: formatQuantity(row.delivered),
      usedQuantity: formatQuantity(row.used),
      returnedQuantity: formatQuantity(returned),
      actualQuantity: formatQuantity(row.delivered.minus(returned)),
      onHandQuantity: formatQuantity(onHand),
      budgetUnitCost: row.budgetUnitCost === null ? null : formatUnitCost(row.budgetUnitCost),
      averageDeliveredUnitCost: averageDelivered === null ? null : formatUnitCost(averageDelivered),
      estimatedCost: formatMoney(estimatedCost),
      deliveredCost: formatMoney(row.deliveredCost),
      returnedCredit: formatMoney(returnedCredit),
      actualCost: formatMoney(actualCost),
      variance: formatMoney(actualCost.minus(estimatedCost)),
    };
  });

  const quantityRows = (category: 'equipment' | 'disposal'): QuantityCostRow[] => {
    const rows = placeEntries(category, budgetTallies(category, true), (row, entry, q, yd3) => {
      const inRowUnit = yd3 ?? q;
      // The entry's own unit cost is per its own unit (per load); the budget's per the row's (per yd³).
      const cost =
        entry.unitCost !== null
          ? q.times(toDecimal(entry.unitCost))
          : inRowUnit.times(row.budgetUnitCost ?? ZERO);
      if (entry.unitCost === null && row.budgetUnitCost === null) unpriced(row, 'was logged');
      row.actual = row.actual.plus(inRowUnit);
      row.actualCost = row.actualCost.plus(roundMoney(cost));
      if (yd3 !== null) {
        const size = toDecimal(entry.loadVolumeLooseCubicYards!).toString();
        row.loads.set(size, (row.loads.get(size) ?? ZERO).plus(q));
      }
    });
    for (const row of rows) {
      if (!row.delivery || row.entries > 0 || row.code === null) continue;
      const code = codeKey(row.code);
      const machineUsed = rows.some(
        (other) =>
          !other.delivery &&
          other.lines.length > 0 &&
          other.code !== null &&
          codeKey(other.code) === code &&
          !other.actual.isZero(),
      );
      if (!machineUsed) continue;
      row.actual = sumOf(row.lines, 'quantity');
      row.actualCost = sumOf(row.lines, 'extendedCost');
      notes.push(`${row.description}: incurred as quoted, since the machine was logged.`);
    }
    for (const row of rows) {
      if (row.loads.size === 0) continue;
      const sizes = [...row.loads]
        .map(([size, loads]) => `${formatQuantity(loads)} × ${size} yd³`)
        .join(' + ');
      const converted = sumDecimals(
        [...row.loads].map(([size, loads]) => loads.times(toDecimal(size))),
      );
      const loads = sumDecimals([...row.loads.values()]);
      const counted = loads.equals(1) ? 'load logged counts' : 'loads logged count';
      notes.push(
        `${row.description}: ${formatQuantity(loads)} ${counted} as ${formatQuantity(converted)} ${row.unit} (${sizes}), at each truck's or container's nominal capacity; a load is rarely filled exactly, so this can overstate what was hauled.`,
      );
    }
    return rows.map((row): QuantityCostRow => {
      const estimatedCost = sumOf(row.lines, 'extendedCost');
      return {
        key: row.key,
        code: row.code,
        description: row.description,
        unit: row.unit,
        budgeted: row.lines.length > 0,
        estimatedQuantity: formatQuantity(sumOf(row.lines, 'quantity')),
        actualQuantity: formatQuantity(row.actual),
        loggedLoads:
          row.loads.size === 0 ? null : formatQuantity(sumDecimals([...row.loads.values()])),
        budgetUnitCost: row.budgetUnitCost === null ? null : formatUnitCost(row.budgetUnitCost),
        estimatedCost: formatMoney(estimatedCost),
        actualCost: formatMoney(row.actualCost),
        variance: formatMoney(row.actualCost.minus(estimatedCost)),
      };
    });
  };
  const equipment = quantityRows('equipment');
  const disposal = quantityRows('disposal');

  // Other: mobilization was incurred; contingency is an allowance.
  const other = linesOf('other').map((line): OtherCostRow => {
    const estimatedCost = toDecimal(line.extendedCost);
    const contingency = line.source === 'contingency';
    notes.push(
      contingency
        ? `${line.description}: an allowance, not a cost; its actual is 0.`
        : `${line.description}: incurred as quoted.`,
    );
    const actualCost = contingency ? ZERO : estimatedCost;
    return {
      key: line.id,
      source: line.source,
      description: line.description,
      estimatedCost: formatMoney(estimatedCost),
      actualCost: formatMoney(actualCost),
      variance: formatMoney(actualCost.minus(estimatedCost)),
    };
  });

  // Categories and totals.
  const actualByCategory: Record<PriceCategory, ReadonlyArray<{ actualCost: string }>> = {
    materials,
    labor,
    equipment,
    disposal,
    other,
  };
  const categoryFigures = PRICE_CATEGORIES.map((category) => ({
    category,
    estimated: sumOf(linesOf(category), 'extendedCost'),
    actual: sumDecimals(actualByCategory[category].map((row) => toDecimal(row.actualCost))),
  }));
  const categories = categoryFigures.map(({ category, estimated, actual }): CategoryCostRow => ({
    category,
    estimatedCost: formatMoney(estimated),
    actualCost: formatMoney(actual),
    variance: formatMoney(actual.minus(estimated)),
    variancePct: variancePct(actual.minus(estimated), estimated),
  }));
  const price = toDecimal(budget.priceBeforeTax);
  const estimatedCost = toDecimal(budget.cost);
  const linesCost = sumDecimals(categoryFigures.map((figure) => figure.estimated));
  if (!linesCost.equals(estimatedCost)) {
    warnings.push(
      `The budget's lines cost ${formatMoney(linesCost)} but its cost is ${formatMoney(estimatedCost)}.`,
    );
  }
  const actualCost = sumDecimals(categoryFigures.map((figure) => figure.actual));
  const margin = (cost: Decimal) =>
    price.isZero() ? null : formatPercent(price.minus(cost).dividedBy(price).times(100));

  const dates = [...workedDates].sort();
  const actualCrewDays = new PricingDecimal(dates.length);
  return {
    currency: budget.currency,
    budgetVersion: budget.versionNumber,
    labor,
    people: [...people.values()].map((person) => ({
      person: person.person,
      hours: formatQuantity(person.hours),
      daysWorked: String(person.days.size),
      tasks: LABOR_TASKS.filter((task) => person.tasks.has(task)).map((task) => ({
        task,
        hours: formatQuantity(person.tasks.get(task)!),
      })),
    })),
    materials,
    equipment,
    disposal,
    other,
    categories,
    schedule: {
      plannedStart: args.plannedStart,
      plannedCrewDays: formatQuantity(plannedCrewDays),
      actualCrewDays: formatQuantity(actualCrewDays),
      crewDaysVariance: formatQuantity(actualCrewDays.minus(plannedCrewDays)),
      firstWorkedDate: dates[0] ?? null,
      lastWorkedDate: dates[dates.length - 1] ?? null,
      hoursPerCrewDay: formatQuantity(hoursPerCrewDay),
    },
    totals: {
      quotedPriceBeforeTax: formatMoney(price),
      estimatedCost: formatMoney(estimatedCost),
      actualCost: formatMoney(actualCost),
      variance: formatMoney(actualCost.minus(estimatedCost)),
      variancePct: variancePct(actualCost.minus(estimatedCost), estimatedCost),
      quotedGrossProfit: formatMoney(price.minus(estimatedCost)),
      actualGrossProfit: formatMoney(price.minus(actualCost)),
      quotedMarginPct: margin(estimatedCost),
      actualMarginPct: margin(actualCost),
    },
    notes,
    warnings,
  };
}
