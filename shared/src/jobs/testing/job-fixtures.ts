import type { LaborTask } from '../../engine/labor/labor-hours';
import type { BudgetLine, HoursEntry, JobBudget, LogEntry, QuantityEntry } from '../job-schemas';

/**
 * A realistic job for tests: a 560 ft² liner pond priced with the demo price book (installer 23.50 +
 * 28 % burden = 30.08 /h, crew lead 32.00 + 28 % = 40.96 /h; markups materials 45 %, labor 55 %,
 * equipment 25 %, disposal 20 %, other 20 %; sales tax 7.25 % on materials), and three days of logs.
 *
 * Budget (extended cost = quantity × unit cost, rounded to cents; price = cost × (1 + markup)):
 *   materials  LINER-EPDM-45    560 sq ft × 0.89   = 498.40   price 722.68
 *              UNDERLAY-8OZ     640 sq ft × 0.32   = 204.80   price 296.96
 *              BOULDER-S        2.4 t × 165.00     = 396.00   price 574.20
 *              BOULDER-M        1.6 t × 175.00     = 280.00   price 406.00
 *              GRAVEL-RIVER-MIX 1.97 t × 62.00     = 122.14   price 177.10
 *                                                  Σ 1501.34
 *   labor      excavation        14.6 h × 30.08    = 439.168 → 439.17   price 680.71
 *              rockPlacing       13.8 h × 40.96    = 565.248 → 565.25   price 876.14
 *              linerUnderlayment  6.2 h × 30.08    = 186.496 → 186.50   price 289.08
 *              cleanUp            3 h × 30.08      =  90.24             price 139.87
 *                                 Σ 37.6 h         Σ 1281.16
 *   equipment  MTL-36 rental      2 day × 285.00   = 570.00   price 712.50
 *              MTL-36 delivery    1 each × 150.00  = 150.00   price 187.50
 *                                                  Σ 720.00
 *   disposal   HAUL-YD            6.5 cu yd × 38.00 = 247.00  price 296.40
 *   other      mobilization       350.00                      price 420.00
 *              contingency 5 % of direct cost 3749.50 = 187.475 → 187.48   price 224.98
 *                                                  Σ 537.48
 *   cost 1501.34 + 1281.16 + 720.00 + 247.00 + 537.48 = 4286.98
 *   price before tax Σ prices = 6004.12; tax 7.25 % × 2176.94 = 157.83; total 6161.95
 */
export function fixtureBudget(): JobBudget {
  return {
    versionNumber: 2,
    contentSha256: 'a'.repeat(64),
    currency: 'USD',
    lines: [
      material(
        'liner',
        'LINER-EPDM-45',
        'EPDM liner, 45 mil',
        '560',
        'sq ft',
        '0.89',
        '498.40',
        '722.68',
      ),
      material(
        'underlayment',
        'UNDERLAY-8OZ',
        'Underlayment, 8 oz',
        '640',
        'sq ft',
        '0.32',
        '204.80',
        '296.96',
      ),
      material(
        'boulders:small',
        'BOULDER-S',
        'Boulders, small',
        '2.4',
        'short ton',
        '165.00',
        '396.00',
        '574.20',
      ),
      material(
        'boulders:medium',
        'BOULDER-M',
        'Boulders, medium',
        '1.6',
        'short ton',
        '175.00',
        '280.00',
        '406.00',
      ),
      material(
        'gravel',
        'GRAVEL-RIVER-MIX',
        'River gravel mix',
        '1.97',
        'short ton',
        '62.00',
        '122.14',
        '177.10',
      ),
      labor(
        'excavation',
        'INSTALLER',
        'Excavation (Installer)',
        '14.6',
        '30.08',
        '439.17',
        '680.71',
      ),
      labor(
        'rockPlacing',
        'LEAD',
        'Boulder and gravel placing (Crew lead)',
        '13.8',
        '40.96',
        '565.25',
        '876.14',
      ),
      labor(
        'linerUnderlayment',
        'INSTALLER',
        'Underlayment and liner (Installer)',
        '6.2',
        '30.08',
        '186.50',
        '289.08',
      ),
      labor('cleanUp', 'INSTALLER', 'Clean-up (Installer)', '3', '30.08', '90.24', '139.87'),
      line({
        id: 'equipment:excavation:MTL-36',
        category: 'equipment',
        description: 'Mini track loader, 36 in tracks, 2 days',
        code: 'MTL-36',
        source: 'equipment:excavation',
        quantity: '2',
        unit: 'day',
        unitCost: '285.00',
        extendedCost: '570.00',
        price: '712.50',
      }),
      line({
        id: 'equipment:delivery:MTL-36',
        category: 'equipment',
        description: 'Mini track loader, 36 in tracks, delivery and pick-up',
        code: 'MTL-36',
        source: 'equipment:delivery',
        quantity: '1',
        unit: 'each',
        unitCost: '150.00',
        extendedCost: '150.00',
        price: '187.50',
      }),
      line({
        id: 'disposal:HAUL-YD',
        category: 'disposal',
        description: 'Spoil haul-off and tipping, per loose yd³',
        code: 'HAUL-YD',
        source: 'disposal',
        quantity: '6.5',
        unit: 'cu yd',
        unitCost: '38.00',
        extendedCost: '247.00',
        price: '296.40',
      }),
      line({
        id: 'other:mobilization',
        category: 'other',
        description: 'Mobilization: travel, loading and set-up',
        code: null,
        source: 'mobilization',
        quantity: '1',
        unit: 'each',
        unitCost: '350.00',
        extendedCost: '350.00',
        price: '420.00',
      }),
      line({
        id: 'other:contingency',
        category: 'other',
        description: 'Contingency, 5 % of direct cost 3749.50',
        code: null,
        source: 'contingency',
        quantity: '1',
        unit: 'lump sum',
        unitCost: '187.48',
        extendedCost: '187.48',
        price: '224.98',
      }),
    ],
    cost: '4286.98',
    priceBeforeTax: '6004.12',
    tax: '157.83',
    total: '6161.95',
    laborHours: '37.60',
    crewDays: '3.0',
  };
}

/**
 * Three days on the job (Wednesday lost to rain), in the order a crew lead would log them:
 *
 * 2025-05-12  Sam 8 h, Lee 7.5 h, Dana 1.5 h excavation; Dana 6 h rock placing.
 *             MTL-36 1 day (no unit cost); HAUL-YD 4 cu yd at 40.00 (the tip's ticket).
 *             Delivered BOULDER-S 2 t at 168.50, BOULDER-M 1.6 t (no unit cost), gravel 2.5 t at 60.00.
 * 2025-05-13  Dana 7.5 h rock placing; Sam 4 h, Lee 4 h liner; Lee 2.5 h plumbing (not budgeted).
 *             MTL-36 1 day at 310.00; HAUL-YD 3 cu yd (no unit cost).
 *             Delivered liner 600 sq ft at 0.85, underlayment 640 sq ft (no unit cost), BOULDER-S 0.6 t
 *             (no unit cost), 2 cans of foam sealant at 14.25 (not budgeted, no code).
 *             Used liner 560, underlayment 620, BOULDER-S 2.4, BOULDER-M 1.6, gravel 2.1, foam 2.
 * 2025-05-15  Sam 4 h rock placing, 3 h clean-up; Lee 2.5 h clean-up.
 *             Returned liner 40 sq ft, BOULDER-S 0.2 t.
 */
export function fixtureLogs(): Array<{ logDate: string; entries: LogEntry[] }> {
  return [
    {
      logDate: '2025-05-12',
      entries: [
        hoursEntry('Sam Okafor', 'excavation', '8'),
        hoursEntry('Lee Park', 'excavation', '7.5'),
        hoursEntry('Dana Ruiz', 'excavation', '1.5'),
        hoursEntry('Dana Ruiz', 'rockPlacing', '6'),
        quantityEntry('equipment', null, 'MTL-36', 'Mini track loader', '1', 'day', null),
        quantityEntry('disposal', null, 'HAUL-YD', 'Haul-off, ticket 5521', '4', 'cu yd', '40.00'),
        quantityEntry(
          'material',
          'delivered',
          'BOULDER-S',
          'Small boulders',
          '2',
          'short ton',
          '168.50',
        ),
        quantityEntry(
          'material',
          'delivered',
          'BOULDER-M',
          'Medium boulders',
          '1.6',
          'short ton',
          null,
        ),
        quantityEntry(
          'material',
          'delivered',
          'GRAVEL-RIVER-MIX',
          'River gravel',
          '2.5',
          'short ton',
          '60.00',
        ),
      ],
    },
    {
      logDate: '2025-05-13',
      entries: [
        hoursEntry('Dana Ruiz', 'rockPlacing', '7.5'),
        hoursEntry('Sam Okafor', 'linerUnderlayment', '4'),
        hoursEntry('Lee Park', 'linerUnderlayment', '4'),
        hoursEntry('Lee Park', 'plumbingEquipment', '2.5'),
        quantityEntry('equipment', null, 'MTL-36', 'Mini track loader', '1', 'day', '310.00'),
        quantityEntry('disposal', null, 'HAUL-YD', 'Haul-off', '3', 'cu yd', null),
        quantityEntry(
          'material',
          'delivered',
          'LINER-EPDM-45',
          'EPDM liner 20 × 30',
          '600',
          'sq ft',
          '0.85',
        ),
        quantityEntry(
          'material',
          'delivered',
          'UNDERLAY-8OZ',
          'Underlayment',
          '640',
          'sq ft',
          null,
        ),
        quantityEntry(
          'material',
          'delivered',
          'BOULDER-S',
          'Small boulders',
          '0.6',
          'short ton',
          null,
        ),
        quantityEntry(
          'material',
          'delivered',
          null,
          'Foam sealant, black, 12 oz can',
          '2',
          'each',
          '14.25',
        ),
        quantityEntry('material', 'used', 'LINER-EPDM-45', 'EPDM liner', '560', 'sq ft', null),
        quantityEntry('material', 'used', 'UNDERLAY-8OZ', 'Underlayment', '620', 'sq ft', null),
        quantityEntry('material', 'used', 'BOULDER-S', 'Small boulders', '2.4', 'short ton', null),
        quantityEntry('material', 'used', 'BOULDER-M', 'Medium boulders', '1.6', 'short ton', null),
        quantityEntry(
          'material',
          'used',
          'GRAVEL-RIVER-MIX',
          'River gravel',
          '2.1',
          'short ton',
          null,
        ),
        quantityEntry(
          'material',
          'used',
          null,
          'Foam sealant, black, 12 oz can',
          '2',
          'each',
          null,
        ),
      ],
    },
    {
      logDate: '2025-05-15',
      entries: [
        hoursEntry('Sam Okafor', 'rockPlacing', '4'),
        hoursEntry('Sam Okafor', 'cleanUp', '3'),
        hoursEntry('Lee Park', 'cleanUp', '2.5'),
        quantityEntry(
          'material',
          'returned',
          'LINER-EPDM-45',
          'EPDM liner offcut',
          '40',
          'sq ft',
          null,
        ),
        quantityEntry(
          'material',
          'returned',
          'BOULDER-S',
          'Small boulders',
          '0.2',
          'short ton',
          null,
        ),
      ],
    },
  ];
}

let nextEntry = 1;
/** A fresh entry id (a version-4 UUID, as the phone makes them). */
function entryId(): string {
  const n = nextEntry++;
  return `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`;
}

export function hoursEntry(person: string, task: LaborTask, hours: string): HoursEntry {
  return { id: entryId(), kind: 'hours', person, task, hours };
}

export function quantityEntry(
  kind: QuantityEntry['kind'],
  movement: QuantityEntry['movement'],
  code: string | null,
  description: string,
  quantity: string,
  unit: string,
  unitCost: string | null,
): QuantityEntry {
  return {
    id: entryId(),
    kind,
    movement,
    code,
    description,
    quantity,
    unit,
    unitCost,
    supplier: null,
    ticketNumber: null,
  };
}

function line(fields: Omit<BudgetLine, 'task'> & { task?: LaborTask }): BudgetLine {
  return { ...fields, task: fields.task ?? null };
}

function material(
  source: string,
  code: string,
  description: string,
  quantity: string,
  unit: string,
  unitCost: string,
  extendedCost: string,
  price: string,
): BudgetLine {
  return line({
    id: `${source}:${code}`,
    category: 'materials',
    description,
    code,
    source,
    quantity,
    unit,
    unitCost,
    extendedCost,
    price,
  });
}

function labor(
  task: LaborTask,
  role: string,
  description: string,
  hours: string,
  rate: string,
  extendedCost: string,
  price: string,
): BudgetLine {
  return line({
    id: `labor:${task}`,
    category: 'labor',
    description,
    code: role,
    source: `labor:${task}`,
    task,
    quantity: hours,
    unit: 'h',
    unitCost: rate,
    extendedCost,
    price,
  });
}
