import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { LABOR_TASKS } from '../engine/labor/labor-hours';
import { sumDecimals, toDecimal } from '../pricing/money';
import { jobCostReport, type JobCostReport, type JobCostReportArgs } from './job-cost-report';
import { saveDailyLogRequestSchema, type JobBudget, type LogEntry } from './job-schemas';
import { fixtureBudget, fixtureLogs, hoursEntry, quantityEntry } from './testing/job-fixtures';

const report = (overrides: Partial<JobCostReportArgs> = {}) =>
  jobCostReport({
    budget: fixtureBudget(),
    logs: fixtureLogs(),
    plannedStart: '2025-05-12',
    plannedCrewDays: '3.0',
    ...overrides,
  });

const byTask = (r: JobCostReport, task: string) => r.labor.find((row) => row.task === task)!;
const material = (r: JobCostReport, code: string) => r.materials.find((row) => row.code === code)!;

/** The fixture budget without its labor lines (cost 4286.98 − 1281.16 = 3005.82). */
function budgetWithoutLabor(): JobBudget {
  const budget = fixtureBudget();
  return {
    ...budget,
    lines: budget.lines.filter((line) => line.category !== 'labor'),
    cost: '3005.82',
    laborHours: '0.00',
  };
}

/** Disposal counted in loads of a given size (loose yd³), priced by the budget. */
function loadsEntry(code: string | null, description: string, loads: string, size: string) {
  return {
    ...quantityEntry('disposal', null, code, description, loads, 'load', null),
    loadVolumeLooseCubicYards: size,
  };
}

describe('job cost report fixtures', () => {
  it('are logs the API would accept', () => {
    for (const log of fixtureLogs()) {
      const parsed = saveDailyLogRequestSchema.safeParse({ ...log, notes: '', baseRevision: 0 });
      expect(parsed.success, JSON.stringify(parsed.error?.issues)).toBe(true);
    }
  });
});

describe('jobCostReport: labor', () => {
  it('costs logged hours at each task’s quoted rate, rounded once per task', () => {
    const r = report();
    // excavation: 14.6 h quoted at 30.08 = 439.17; logged 8 + 7.5 + 1.5 = 17 h → 17 × 30.08 = 511.36
    expect(byTask(r, 'excavation')).toMatchObject({
      estimatedHours: '14.6',
      actualHours: '17',
      rate: '30.08',
      rateBasis: 'task',
      estimatedCost: '439.17',
      actualCost: '511.36',
      variance: '72.19', // 511.36 − 439.17
    });
    // rockPlacing: 13.8 h quoted at 40.96 = 565.25; logged 6 + 7.5 + 4 = 17.5 h → 17.5 × 40.96 = 716.80
    expect(byTask(r, 'rockPlacing')).toMatchObject({
      estimatedHours: '13.8',
      actualHours: '17.5',
      estimatedCost: '565.25',
      actualCost: '716.80',
      variance: '151.55', // 716.80 − 565.25
    });
    // linerUnderlayment: 6.2 h quoted at 30.08 = 186.50; logged 4 + 4 = 8 h → 8 × 30.08 = 240.64
    expect(byTask(r, 'linerUnderlayment')).toMatchObject({
      actualHours: '8',
      actualCost: '240.64',
      variance: '54.14', // 240.64 − 186.50
    });
    // cleanUp: 3 h quoted at 30.08 = 90.24; logged 3 + 2.5 = 5.5 h → 5.5 × 30.08 = 165.44
    expect(byTask(r, 'cleanUp')).toMatchObject({
      actualCost: '165.44',
      variance: '75.20', // 165.44 − 90.24
    });
    // Only tasks with a budget line or hours appear, in LABOR_TASKS order.
    expect(r.labor.map((row) => row.task)).toEqual([
      'excavation',
      'rockPlacing',
      'linerUnderlayment',
      'plumbingEquipment',
      'cleanUp',
    ]);
  });

  it('costs a task with no budget line at the budget’s average labor rate', () => {
    const r = report();
    // Σ labor cost 439.17 + 565.25 + 186.50 + 90.24 = 1281.16; Σ hours 14.6 + 13.8 + 6.2 + 3 = 37.6
    // average 1281.16 ÷ 37.6 = 34.073404… → 34.0734; 2.5 h × 34.0734 = 85.1835 → 85.18
    expect(byTask(r, 'plumbingEquipment')).toEqual({
      task: 'plumbingEquipment',
      label: 'Plumbing, pump, skimmer and filter box',
      estimatedHours: '0',
      actualHours: '2.5',
      rate: '34.0734',
      rateBasis: 'average',
      estimatedCost: '0.00',
      actualCost: '85.18',
      variance: '85.18',
      people: [{ person: 'Lee Park', hours: '2.5' }],
    });
    expect(r.notes).toContain(
      "Plumbing, pump, skimmer and filter box has no budget line: its 2.5 h are costed at the budget's average labor rate 34.0734 per hour.",
    );
    expect(r.warnings).toEqual([]);
  });

  it('costs hours at 0 and warns when the budget has no labor at all', () => {
    const r = report({ budget: budgetWithoutLabor() });
    // Only the tasks with hours logged.
    expect(r.labor.map((row) => row.task)).toEqual([
      'excavation',
      'rockPlacing',
      'linerUnderlayment',
      'plumbingEquipment',
      'cleanUp',
    ]);
    expect(r.labor.every((row) => row.rateBasis === 'none' && row.actualCost === '0.00')).toBe(
      true,
    );
    expect(r.warnings).toContain(
      'The budget has no labor, so the 17 h of excavation logged cost 0.',
    );
    expect(r.categories.find((c) => c.category === 'labor')).toEqual({
      category: 'labor',
      estimatedCost: '0.00',
      actualCost: '0.00',
      variance: '0.00',
      variancePct: null, // nothing estimated
    });
  });

  it('adds up hours per person, per task and days worked', () => {
    expect(report().people).toEqual([
      {
        // 8 excavation + 4 liner (13th) + 4 rock + 3 clean-up (15th) = 19 h on 3 days
        person: 'Sam Okafor',
        hours: '19',
        daysWorked: '3',
        tasks: [
          { task: 'excavation', hours: '8' },
          { task: 'rockPlacing', hours: '4' },
          { task: 'linerUnderlayment', hours: '4' },
          { task: 'cleanUp', hours: '3' },
        ],
      },
      {
        // 7.5 + 4 + 2.5 + 2.5 = 16.5 h on 3 days
        person: 'Lee Park',
        hours: '16.5',
        daysWorked: '3',
        tasks: [
          { task: 'excavation', hours: '7.5' },
          { task: 'linerUnderlayment', hours: '4' },
          { task: 'plumbingEquipment', hours: '2.5' },
          { task: 'cleanUp', hours: '2.5' },
        ],
      },
      {
        // 1.5 + 6 (12th) + 7.5 (13th) = 15 h on 2 days
        person: 'Dana Ruiz',
        hours: '15',
        daysWorked: '2',
        tasks: [
          { task: 'excavation', hours: '1.5' },
          { task: 'rockPlacing', hours: '13.5' },
        ],
      },
    ]);
    // rock placing by person: Dana 6 + 7.5 = 13.5, Sam 4
    expect(byTask(report(), 'rockPlacing').people).toEqual([
      { person: 'Dana Ruiz', hours: '13.5' },
      { person: 'Sam Okafor', hours: '4' },
    ]);
  });

  it('counts one person however the name is spaced or capitalised', () => {
    const logs = [
      {
        logDate: '2025-05-12',
        entries: [
          hoursEntry('Sam Okafor', 'excavation', '4'),
          hoursEntry(' sam  okafor', 'excavation', '3'),
        ],
      },
    ];
    expect(report({ logs }).people).toEqual([
      {
        person: 'Sam Okafor',
        hours: '7', // 4 + 3
        daysWorked: '1',
        tasks: [{ task: 'excavation', hours: '7' }],
      },
    ]);
  });
});

describe('jobCostReport: materials', () => {
  it('credits a return at its delivered price', () => {
    // liner: 600 sq ft delivered at 0.85 = 510.00; 40 returned at 0.85 = 34.00; 510.00 − 34.00 = 476.00
    expect(material(report(), 'LINER-EPDM-45')).toEqual({
      key: 'code:liner-epdm-45',
      code: 'LINER-EPDM-45',
      description: 'EPDM liner, 45 mil',
      unit: 'sq ft',
      budgeted: true,
      estimatedQuantity: '560',
      deliveredQuantity: '600',
      usedQuantity: '560',
      returnedQuantity: '40',
      actualQuantity: '560', // 600 − 40
      onHandQuantity: '0', // 600 − 560 − 40
      budgetUnitCost: '0.89',
      averageDeliveredUnitCost: '0.85',
      estimatedCost: '498.40', // 560 × 0.89
      deliveredCost: '510.00',
      returnedCredit: '34.00',
      actualCost: '476.00',
      variance: '-22.40', // 476.00 − 498.40
    });
  });

  it('credits a return at the average delivered price, weighted by quantity', () => {
    // small boulders: 2 t at 168.50 = 337.00; 0.6 t with no unit cost at the budget's 165.00 = 99.00
    // average (337.00 + 99.00) ÷ 2.6 = 167.692307… → 167.6923; 0.2 t returned × 167.6923 = 33.538… → 33.54
    // actual 436.00 − 33.54 = 402.46; estimated 2.4 × 165.00 = 396.00; variance 6.46
    expect(material(report(), 'BOULDER-S')).toMatchObject({
      deliveredQuantity: '2.6',
      usedQuantity: '2.4',
      returnedQuantity: '0.2',
      onHandQuantity: '0', // 2.6 − 2.4 − 0.2
      averageDeliveredUnitCost: '167.6923',
      deliveredCost: '436.00',
      returnedCredit: '33.54',
      actualCost: '402.46',
      variance: '6.46',
    });
  });

  it('prices a delivery with no unit cost at the budget’s', () => {
    // underlayment: 640 sq ft with no unit cost × 0.32 = 204.80; 620 used, 20 on hand
    expect(material(report(), 'UNDERLAY-8OZ')).toMatchObject({
      deliveredCost: '204.80',
      actualCost: '204.80',
      onHandQuantity: '20',
      variance: '0.00',
    });
    // medium boulders: 1.6 t × 175.00 = 280.00
    expect(material(report(), 'BOULDER-M')).toMatchObject({ actualCost: '280.00' });
    // gravel: 2.5 t at 60.00 = 150.00 against 1.97 × 62.00 = 122.14; 2.1 used → 0.4 on hand
    expect(material(report(), 'GRAVEL-RIVER-MIX')).toMatchObject({
      actualCost: '150.00',
      variance: '27.86',
      onHandQuantity: '0.4',
    });
  });

  it('puts an unbudgeted material in its own row', () => {
    const r = report();
    // foam: 2 cans at 14.25 = 28.50, none budgeted
    expect(r.materials.at(-1)).toEqual({
      key: 'extra:description:foam sealant, black, 12 oz can|each',
      code: null,
      description: 'Foam sealant, black, 12 oz can',
      unit: 'each',
      budgeted: false,
      estimatedQuantity: '0',
      deliveredQuantity: '2',
      usedQuantity: '2',
      returnedQuantity: '0',
      actualQuantity: '2',
      onHandQuantity: '0',
      budgetUnitCost: null,
      averageDeliveredUnitCost: '14.25',
      estimatedCost: '0.00',
      deliveredCost: '28.50',
      returnedCredit: '0.00',
      actualCost: '28.50',
      variance: '28.50',
    });
    expect(r.materials).toHaveLength(6); // five budget codes and the foam
  });

  it('keeps an unknown code apart, matches known codes in any case, and warns on unpriced items', () => {
    const logs = [
      {
        logDate: '2025-05-12',
        entries: [
          quantityEntry('material', 'delivered', 'liner-epdm-45', 'Liner', '100', 'sq ft', null),
          quantityEntry('material', 'delivered', 'PUMP-X', 'Pump, 3000 gph', '1', 'each', null),
          quantityEntry('material', 'returned', 'PUMP-X', 'Pump, 3000 gph', '1', 'each', null),
        ],
      },
    ];
    const r = report({ logs });
    // liner: 100 sq ft × the budget's 0.89 = 89.00
    expect(material(r, 'LINER-EPDM-45')).toMatchObject({ deliveredCost: '89.00' });
    expect(material(r, 'PUMP-X')).toMatchObject({
      key: 'extra:code:pump-x|each',
      budgeted: false,
      deliveredCost: '0.00',
      returnedCredit: '0.00',
      actualCost: '0.00',
      onHandQuantity: '0',
    });
    expect(r.warnings).toEqual([
      'Pump, 3000 gph is not in the budget and was delivered without a unit cost: costed 0.',
    ]);
  });

  it('credits a return with nothing delivered at the budget price, and notes stock used', () => {
    const logs = [
      {
        logDate: '2025-05-12',
        entries: [
          quantityEntry('material', 'used', 'GRAVEL-RIVER-MIX', 'Gravel', '0.5', 'short ton', null),
          quantityEntry(
            'material',
            'returned',
            'GRAVEL-RIVER-MIX',
            'Gravel',
            '0.25',
            'short ton',
            null,
          ),
        ],
      },
    ];
    const r = report({ logs });
    // 0.25 t × 62.00 = 15.50 credited; nothing delivered → actual 0 − 15.50
    expect(material(r, 'GRAVEL-RIVER-MIX')).toMatchObject({
      returnedCredit: '15.50',
      actualCost: '-15.50',
      onHandQuantity: '-0.75', // 0 − 0.5 − 0.25
      averageDeliveredUnitCost: null,
    });
    expect(r.notes).toContain(
      'River gravel mix: 0.75 short ton more used or returned than delivered, taken from stock; stock is not costed to the job.',
    );
  });

  it('warns when an entry’s unit is not the budget’s', () => {
    const logs = [
      {
        logDate: '2025-05-12',
        entries: [
          quantityEntry('material', 'delivered', 'GRAVEL-RIVER-MIX', 'Gravel', '1', 'yd', '60.00'),
          quantityEntry('equipment', null, 'MTL-36', 'Loader', '1', 'Days', null),
        ],
      },
    ];
    const r = report({ logs });
    // "Days" is "day"; "yd" is not "short ton"
    expect(r.warnings).toEqual([
      '2025-05-12: Gravel was logged in yd, but the budget counts GRAVEL-RIVER-MIX in short ton; counted as 1 short ton.',
    ]);
    expect(r.equipment[0]).toMatchObject({ actualQuantity: '1', actualCost: '285.00' });
  });
});

describe('jobCostReport: equipment, disposal and other', () => {
  it('prices equipment and disposal at the entry’s unit cost, or the budget’s', () => {
    const r = report();
    // loader: 1 day at the budget's 285.00 + 1 day at 310.00 = 595.00 against 2 × 285.00 = 570.00
    expect(r.equipment[0]).toMatchObject({
      code: 'MTL-36',
      unit: 'day',
      estimatedQuantity: '2',
      actualQuantity: '2',
      estimatedCost: '570.00',
      actualCost: '595.00',
      variance: '25.00',
    });
    // delivery: not logged, but the machine was → incurred as quoted, 150.00
    expect(r.equipment[1]).toMatchObject({
      unit: 'each',
      actualQuantity: '1',
      actualCost: '150.00',
      variance: '0.00',
    });
    // haul-off: 4 cu yd at 40.00 = 160.00 + 3 at the budget's 38.00 = 114.00 → 274.00 against 247.00
    expect(r.disposal).toEqual([
      {
        key: 'code:haul-yd|cu yd',
        code: 'HAUL-YD',
        description: 'Spoil haul-off and tipping, per loose yd³',
        unit: 'cu yd',
        budgeted: true,
        estimatedQuantity: '6.5',
        actualQuantity: '7',
        loggedLoads: null,
        budgetUnitCost: '38.00',
        estimatedCost: '247.00',
        actualCost: '274.00',
        variance: '27.00',
      },
    ]);
  });

  it('converts loads to loose yd³ at the load size to compare with the budget', () => {
    const logs = [
      {
        logDate: '2025-05-12',
        entries: [
          loadsEntry('HAUL-YD', 'Tri-axle loads', '3', '10'),
          quantityEntry('disposal', null, 'HAUL-YD', 'Haul-off', '0', 'load', null),
        ],
      },
    ];
    const r = report({ logs });
    // 3 loads × 10 yd³ = 30 yd³ against a budget of 6.5 yd³ → 23.5 yd³ over;
    // cost 30 × the budget's 38.00 = 1140.00 against 6.5 × 38.00 = 247.00 → +893.00
    expect(r.disposal).toEqual([
      {
        key: 'code:haul-yd|cu yd',
        code: 'HAUL-YD',
        description: 'Spoil haul-off and tipping, per loose yd³',
        unit: 'cu yd',
        budgeted: true,
        estimatedQuantity: '6.5',
        actualQuantity: '30',
        loggedLoads: '3',
        budgetUnitCost: '38.00',
        estimatedCost: '247.00',
        actualCost: '1140.00',
        variance: '893.00',
      },
    ]);
    expect(r.warnings).toEqual([]);
    expect(r.notes).toContain(
      "Spoil haul-off and tipping, per loose yd³: 3 loads logged count as 30 cu yd (3 × 10 yd³), at each truck's or container's nominal capacity; a load is rarely filled exactly, so this can overstate what was hauled.",
    );
    expect(r.categories.find((c) => c.category === 'disposal')).toMatchObject({
      estimatedCost: '247.00',
      actualCost: '1140.00',
      variance: '893.00',
    });
  });

  it('sets 3 loads of 10 yd³ against a budget of 27 yd³: 3 yd³ over, at the budget’s unit cost', () => {
    const budget = fixtureBudget();
    const haul = budget.lines.find((line) => line.code === 'HAUL-YD')!;
    // 27 yd³ × 38.00 = 1026.00; the budget's cost moves from 247.00 to 1026.00: 4286.98 + 779.00
    Object.assign(haul, { quantity: '27', extendedCost: '1026.00' });
    budget.cost = '5065.98';
    const logs = [
      { logDate: '2025-05-12', entries: [loadsEntry('HAUL-YD', 'Haul-off', '3', '10')] },
    ];
    const r = report({ budget, logs });
    // 3 × 10 = 30 yd³ − 27 yd³ = 3 yd³ over; 30 × 38.00 = 1140.00 − 1026.00 = 114.00 = 3 × 38.00
    expect(r.disposal[0]).toMatchObject({
      estimatedQuantity: '27',
      actualQuantity: '30',
      loggedLoads: '3',
      estimatedCost: '1026.00',
      actualCost: '1140.00',
      variance: '114.00',
    });
    expect(r.warnings).toEqual([]);
  });

  it('adds up loads of different sizes, and prices a load’s own unit cost per load', () => {
    const logs = [
      { logDate: '2025-05-12', entries: [loadsEntry('HAUL-YD', 'Tandem', '2', '10')] },
      {
        logDate: '2025-05-13',
        entries: [
          loadsEntry('HAUL-YD', 'Skid-steer trailer', '1.5', '6.25'),
          { ...loadsEntry('HAUL-YD', 'Roll-off, ticket 881', '1', '20'), unitCost: '455.00' },
        ],
      },
    ];
    const r = report({ logs });
    // yd³: 2 × 10 + 1.5 × 6.25 + 1 × 20 = 20 + 9.375 + 20 = 49.375; loads 2 + 1.5 + 1 = 4.5
    // cost: 20 × 38.00 = 760.00; 9.375 × 38.00 = 356.25; the roll-off at its ticket's 455.00 a load
    //       → 760.00 + 356.25 + 455.00 = 1571.25 against 247.00 → +1324.25
    expect(r.disposal[0]).toMatchObject({
      actualQuantity: '49.375',
      loggedLoads: '4.5',
      actualCost: '1571.25',
      variance: '1324.25',
    });
    expect(r.notes).toContain(
      "Spoil haul-off and tipping, per loose yd³: 4.5 loads logged count as 49.375 cu yd (2 × 10 yd³ + 1.5 × 6.25 yd³ + 1 × 20 yd³), at each truck's or container's nominal capacity; a load is rarely filled exactly, so this can overstate what was hauled.",
    );
  });

  it('still warns for loads without a load size, and for loads against a budget in tons', () => {
    const budget = fixtureBudget();
    // A second disposal priced by weight: 4 t × 45.00 = 180.00 (cost 4286.98 + 180.00 = 4466.98)
    budget.lines.push({
      ...budget.lines.find((line) => line.code === 'HAUL-YD')!,
      id: 'disposal:TIP-TON',
      code: 'TIP-TON',
      description: 'Tipping by weight',
      quantity: '4',
      unit: 'short ton',
      unitCost: '45.00',
      extendedCost: '180.00',
    });
    budget.cost = '4466.98';
    const logs = [
      {
        logDate: '2025-05-12',
        entries: [
          quantityEntry('disposal', null, 'HAUL-YD', 'Old log loads', '2', 'load', null),
          loadsEntry('TIP-TON', 'Loads to the tip', '2', '10'),
        ],
      },
    ];
    const r = report({ budget, logs });
    expect(r.warnings).toEqual([
      "2025-05-12: Old log loads was logged in load without a load size, so it cannot be converted to the budget's cu yd for HAUL-YD; counted as 2 cu yd.",
      '2025-05-12: Loads to the tip was logged in load, but the budget counts TIP-TON in short ton; counted as 2 short ton.',
    ]);
    // counted as logged, as before: 2 × 38.00 = 76.00 and 2 × 45.00 = 90.00; nothing converted
    expect(r.disposal.map((row) => [row.actualQuantity, row.loggedLoads, row.actualCost])).toEqual([
      ['2', null, '76.00'],
      ['2', null, '90.00'],
    ]);
  });

  it('keeps loads as loads when the budget counts loads, and an unbudgeted haul in its own unit', () => {
    const budget = fixtureBudget();
    const haul = budget.lines.find((line) => line.code === 'HAUL-YD')!;
    // 2 loads × 150.00 = 300.00 (cost 4286.98 − 247.00 + 300.00 = 4339.98)
    Object.assign(haul, {
      quantity: '2',
      unit: 'load',
      unitCost: '150.00',
      extendedCost: '300.00',
    });
    budget.cost = '4339.98';
    const logs = [
      {
        logDate: '2025-05-12',
        entries: [
          loadsEntry('HAUL-YD', 'Haul-off', '3', '10'),
          { ...loadsEntry(null, 'Concrete chunks', '1', '6'), unitCost: '95.00' },
        ],
      },
    ];
    const r = report({ budget, logs });
    // 3 loads × 150.00 = 450.00 against 300.00; the chunks: 1 load at its 95.00
    expect(
      r.disposal.map((row) => [row.unit, row.actualQuantity, row.loggedLoads, row.actualCost]),
    ).toEqual([
      ['load', '3', null, '450.00'],
      ['load', '1', null, '95.00'],
    ]);
    expect(r.warnings).toEqual([]);
  });

  it('counts mobilization as incurred and contingency as 0', () => {
    const r = report();
    expect(
      r.other.map(({ source, actualCost, variance }) => ({ source, actualCost, variance })),
    ).toEqual([
      { source: 'mobilization', actualCost: '350.00', variance: '0.00' },
      { source: 'contingency', actualCost: '0.00', variance: '-187.48' },
    ]);
    expect(r.notes).toEqual(
      expect.arrayContaining([
        'Mobilization: travel, loading and set-up: incurred as quoted.',
        'Contingency, 5 % of direct cost 3749.50: an allowance, not a cost; its actual is 0.',
      ]),
    );
  });
});

describe('jobCostReport: categories, schedule and totals', () => {
  it('sets each category and the job against the budget', () => {
    const r = report();
    expect(r.categories).toEqual([
      // 476.00 + 204.80 + 402.46 + 280.00 + 150.00 + 28.50 = 1541.76; 40.42 ÷ 1501.34 = 2.692 %
      {
        category: 'materials',
        estimatedCost: '1501.34',
        actualCost: '1541.76',
        variance: '40.42',
        variancePct: '2.69',
      },
      // 511.36 + 716.80 + 240.64 + 85.18 + 165.44 = 1719.42; 438.26 ÷ 1281.16 = 34.208 %
      {
        category: 'labor',
        estimatedCost: '1281.16',
        actualCost: '1719.42',
        variance: '438.26',
        variancePct: '34.21',
      },
      // 595.00 + 150.00 = 745.00; 25.00 ÷ 720.00 = 3.472 %
      {
        category: 'equipment',
        estimatedCost: '720.00',
        actualCost: '745.00',
        variance: '25.00',
        variancePct: '3.47',
      },
      // 27.00 ÷ 247.00 = 10.931 %
      {
        category: 'disposal',
        estimatedCost: '247.00',
        actualCost: '274.00',
        variance: '27.00',
        variancePct: '10.93',
      },
      // 350.00 + 0.00 against 350.00 + 187.48 = 537.48; −187.48 ÷ 537.48 = −34.881 %
      {
        category: 'other',
        estimatedCost: '537.48',
        actualCost: '350.00',
        variance: '-187.48',
        variancePct: '-34.88',
      },
    ]);
    expect(r.totals).toEqual({
      quotedPriceBeforeTax: '6004.12',
      estimatedCost: '4286.98',
      // 1541.76 + 1719.42 + 745.00 + 274.00 + 350.00 = 4630.18
      actualCost: '4630.18',
      variance: '343.20', // 4630.18 − 4286.98
      variancePct: '8.01', // 343.20 ÷ 4286.98 = 8.0056 %
      quotedGrossProfit: '1717.14', // 6004.12 − 4286.98
      actualGrossProfit: '1373.94', // 6004.12 − 4630.18
      quotedMarginPct: '28.60', // 1717.14 ÷ 6004.12 = 28.599 %
      actualMarginPct: '22.88', // 1373.94 ÷ 6004.12 = 22.883 %
    });
    expect(r.currency).toBe('USD');
    expect(r.budgetVersion).toBe(2);
    expect(r.warnings).toEqual([]);
  });

  it('counts the days with hours logged', () => {
    expect(report().schedule).toEqual({
      plannedStart: '2025-05-12',
      plannedCrewDays: '3',
      actualCrewDays: '3', // 12th, 13th and 15th of May
      crewDaysVariance: '0',
      firstWorkedDate: '2025-05-12',
      lastWorkedDate: '2025-05-15',
      hoursPerCrewDay: '8',
    });
    // A day with only deliveries is not a day worked.
    const logs = [
      ...fixtureLogs(),
      {
        logDate: '2025-05-16',
        entries: [
          quantityEntry('material', 'delivered', 'BOULDER-M', 'Boulders', '0.4', 'short ton', null),
        ],
      },
    ];
    expect(report({ logs, hoursPerCrewDay: '9' }).schedule).toMatchObject({
      actualCrewDays: '3',
      lastWorkedDate: '2025-05-15',
      hoursPerCrewDay: '9',
    });
  });

  it('reads logs in date order, whatever order they come in', () => {
    const logs = fixtureLogs();
    expect(report({ logs: [...logs].reverse() })).toEqual(report({ logs }));
  });

  it('with no logs, costs mobilization only', () => {
    const r = report({ logs: [] });
    expect(r.totals).toEqual({
      quotedPriceBeforeTax: '6004.12',
      estimatedCost: '4286.98',
      actualCost: '350.00', // mobilization; the loader's delivery is not incurred without the loader
      variance: '-3936.98', // 350.00 − 4286.98
      variancePct: '-91.84', // −3936.98 ÷ 4286.98 = −91.836 %
      quotedGrossProfit: '1717.14',
      actualGrossProfit: '5654.12', // 6004.12 − 350.00
      quotedMarginPct: '28.60',
      actualMarginPct: '94.17', // 5654.12 ÷ 6004.12 = 94.171 %
    });
    expect(r.labor.map((row) => [row.task, row.actualHours, row.actualCost])).toEqual([
      ['excavation', '0', '0.00'],
      ['rockPlacing', '0', '0.00'],
      ['linerUnderlayment', '0', '0.00'],
      ['cleanUp', '0', '0.00'],
    ]);
    expect(r.equipment.map((row) => row.actualCost)).toEqual(['0.00', '0.00']);
    expect(r.people).toEqual([]);
    expect(r.schedule).toMatchObject({
      actualCrewDays: '0',
      crewDaysVariance: '-3',
      firstWorkedDate: null,
      lastWorkedDate: null,
    });
    expect(r.warnings).toEqual([]);
  });

  it('leaves margins out when the price is 0', () => {
    const budget = { ...fixtureBudget(), priceBeforeTax: '0.00' };
    const r = report({ budget, logs: [] });
    expect(r.totals).toMatchObject({
      quotedGrossProfit: '-4286.98',
      actualGrossProfit: '-350.00',
      quotedMarginPct: null,
      actualMarginPct: null,
    });
  });

  it('warns when the budget’s cost is not the sum of its lines', () => {
    const budget = { ...fixtureBudget(), cost: '4300.00' };
    expect(report({ budget, logs: [] }).warnings).toEqual([
      "The budget's lines cost 4286.98 but its cost is 4300.00.",
    ]);
  });

  it('refuses hours per crew day of 0', () => {
    expect(() => report({ hoursPerCrewDay: '0' })).toThrow(RangeError);
  });
});

describe('jobCostReport: properties', () => {
  const codes = [
    'LINER-EPDM-45',
    'UNDERLAY-8OZ',
    'BOULDER-S',
    'BOULDER-M',
    'GRAVEL-RIVER-MIX',
    'MTL-36',
    'HAUL-YD',
    'PUMP-X',
    null,
  ];
  const decimalString = (max: number, places: number) =>
    fc.integer({ min: 0, max: max * 10 ** places }).map((n) =>
      toDecimal(n)
        .dividedBy(10 ** places)
        .toFixed(places),
    );
  const unitCost = fc.option(decimalString(500, 4), { nil: null });
  const entry: fc.Arbitrary<LogEntry> = fc.oneof(
    fc
      .tuple(
        fc.constantFrom('Dana Ruiz', 'Sam Okafor', 'Lee Park'),
        fc.constantFrom(...LABOR_TASKS),
        decimalString(12, 2),
      )
      .map(([person, task, hours]) => hoursEntry(person, task, hours)),
    fc
      .tuple(
        fc.constantFrom('material', 'equipment', 'disposal'),
        fc.constantFrom('delivered', 'used', 'returned'),
        fc.constantFrom(...codes),
        fc.constantFrom('Item', 'Other item'),
        decimalString(50, 3),
        fc.constantFrom('sq ft', 'short ton', 'day', 'each', 'cu yd', 'load'),
        unitCost,
        fc.option(decimalString(40, 2), { nil: undefined }),
      )
      .map(([kind, movement, code, description, quantity, unit, cost, loadSize]) => {
        const entry = quantityEntry(
          kind,
          kind === 'material' ? movement : null,
          code,
          description,
          quantity,
          unit,
          cost,
        );
        return kind === 'disposal' && unit === 'load' && loadSize !== undefined
          ? { ...entry, loadVolumeLooseCubicYards: loadSize }
          : entry;
      }),
  );
  const date = fc.constantFrom(
    '2025-05-12',
    '2025-05-13',
    '2025-05-14',
    '2025-05-15',
    '2025-05-16',
  );
  const logs = fc.array(fc.record({ logDate: date, entries: fc.array(entry, { maxLength: 12 }) }), {
    maxLength: 5,
  });

  it('actual cost is the sum of the category actual costs, and each of its rows', () => {
    fc.assert(
      fc.property(logs, (generated) => {
        const r = report({ logs: generated });
        const sum = (values: string[]) => sumDecimals(values.map((v) => toDecimal(v)));
        const categories = sum(r.categories.map((c) => c.actualCost));
        expect(toDecimal(r.totals.actualCost).equals(categories)).toBe(true);
        const rows = {
          materials: r.materials,
          labor: r.labor,
          equipment: r.equipment,
          disposal: r.disposal,
          other: r.other,
        };
        for (const category of r.categories) {
          const ofRows = sum(rows[category.category].map((row) => row.actualCost));
          expect(toDecimal(category.actualCost).equals(ofRows)).toBe(true);
          expect(
            toDecimal(category.variance).equals(
              toDecimal(category.actualCost).minus(toDecimal(category.estimatedCost)),
            ),
          ).toBe(true);
        }
        expect(
          toDecimal(r.totals.actualGrossProfit)
            .plus(toDecimal(r.totals.actualCost))
            .equals(toDecimal(r.totals.quotedPriceBeforeTax)),
        ).toBe(true);
      }),
    );
  });

  it('logging zero hours changes nothing', () => {
    const zeros = fc.array(
      fc.tuple(
        fc.nat({ max: 4 }),
        date,
        fc.constantFrom('Dana Ruiz', 'Pat New', 'Lee Park'),
        fc.constantFrom(...LABOR_TASKS),
        fc.constantFrom('0', '0.0', '0.00'),
      ),
      { minLength: 1, maxLength: 6 },
    );
    fc.assert(
      fc.property(logs, zeros, (generated, added) => {
        const withZeros = generated.map((log) => ({ ...log, entries: [...log.entries] }));
        for (const [index, logDate, person, task, hours] of added) {
          const target = withZeros[index];
          if (target) target.entries.push(hoursEntry(person, task, hours));
          else withZeros.push({ logDate, entries: [hoursEntry(person, task, hours)] });
        }
        expect(report({ logs: withZeros })).toEqual(report({ logs: generated }));
      }),
    );
  });
});
