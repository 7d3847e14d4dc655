import type {
  CrewView,
  DailyLogView,
  JobCostReport,
  JobListItem,
  JobView,
} from '@pondwright/shared';

export const CREW_A = '00000000-0000-4000-8000-00000000c0a1';
export const CREW_B = '00000000-0000-4000-8000-00000000c0b2';

export function buildCrews(): CrewView[] {
  return [
    { id: CREW_A, name: 'Heron crew', leadUserId: null, leadName: 'Cal Crewlead' },
    { id: CREW_B, name: 'Otter crew', leadUserId: null, leadName: null },
  ];
}

export function buildJobListItem(overrides: Partial<JobListItem> = {}): JobListItem {
  return {
    id: '00000000-0000-4000-8000-0000000j0b01',
    number: 12,
    title: 'Koi pond with waterfall',
    customerName: 'Bram Thistlewood',
    siteAddress: '14 Mossbank Lane',
    status: 'scheduled',
    crewId: CREW_A,
    crewName: 'Heron crew',
    plannedStart: '2026-03-03',
    plannedCrewDays: '3.0',
    plannedEnd: '2026-03-05',
    ...overrides,
  };
}

export function buildLog(overrides: Partial<DailyLogView> = {}): DailyLogView {
  return {
    id: '00000000-0000-4000-8000-00000000l0g1',
    jobId: '00000000-0000-4000-8000-0000000j0b01',
    logDate: '2026-03-03',
    notes: '',
    entries: [
      {
        id: '00000000-0000-4000-8000-0000000e0001',
        kind: 'hours',
        person: 'Cal',
        task: 'excavation',
        hours: '7.5',
      },
      {
        id: '00000000-0000-4000-8000-0000000e0002',
        kind: 'hours',
        person: 'Pip',
        task: 'excavation',
        hours: '8.25',
      },
      {
        id: '00000000-0000-4000-8000-0000000e0003',
        kind: 'disposal',
        movement: null,
        code: 'HAUL',
        description: 'Haul-off',
        quantity: '6',
        unit: 'loose yd³',
        unitCost: null,
        supplier: null,
        ticketNumber: null,
      },
    ],
    revision: 1,
    authorName: 'Cal Crewlead',
    updatedAt: '2026-03-03T17:00:00.000Z',
    ...overrides,
  };
}

/** A job as an owner or estimator gets it: the budget with money, two lines. */
export function buildJob(overrides: Partial<JobView> = {}): JobView {
  const base = buildJobListItem();
  return {
    ...base,
    estimateId: '00000000-0000-4000-8000-00000000e571',
    budget: {
      versionNumber: 1,
      contentSha256: 'ab12',
      currency: 'USD',
      lines: [
        {
          id: 'liner',
          category: 'materials',
          description: 'EPDM liner, 45 mil',
          code: 'LINER-45',
          source: 'material:LINER-45',
          task: null,
          quantity: '480',
          unit: 'sq ft',
          unitCost: '0.85',
          extendedCost: '408.00',
          price: '510.00',
        },
        {
          id: 'labor:excavation',
          category: 'labor',
          description: 'Excavation',
          code: null,
          source: 'labor:excavation',
          task: 'excavation',
          quantity: '16',
          unit: 'h',
          unitCost: '30.08',
          extendedCost: '481.28',
          price: '673.79',
        },
      ],
      cost: '889.28',
      priceBeforeTax: '1183.79',
      tax: '36.98',
      total: '1220.77',
      laborHours: '16',
      crewDays: '3.0',
    },
    crewBudget: [
      {
        id: 'liner',
        category: 'materials',
        description: 'EPDM liner, 45 mil',
        code: 'LINER-45',
        task: null,
        quantity: '480',
        unit: 'sq ft',
      },
      {
        id: 'labor:excavation',
        category: 'labor',
        description: 'Excavation',
        code: null,
        task: 'excavation',
        quantity: '16',
        unit: 'h',
      },
    ],
    scheduleChanges: [
      {
        id: 'change-1',
        fromStart: null,
        toStart: '2026-03-03',
        fromCrewName: null,
        toCrewName: 'Heron crew',
        reason: null,
        note: null,
        actorName: 'Olive Owner',
        createdAt: '2026-02-20T10:00:00.000Z',
      },
    ],
    logs: [buildLog()],
    startedOn: null,
    completedOn: null,
    closedAt: null,
    ...overrides,
  };
}

/** The same job as a crew lead gets it: no budget money. */
export function buildCrewLeadJob(overrides: Partial<JobView> = {}): JobView {
  return { ...buildJob(), budget: null, ...overrides };
}

export function buildReport(overrides: Partial<JobCostReport> = {}): JobCostReport {
  return {
    currency: 'USD',
    budgetVersion: 1,
    labor: [
      {
        task: 'excavation',
        label: 'Excavation',
        estimatedHours: '16',
        actualHours: '19.5',
        rate: '30.08',
        rateBasis: 'task',
        estimatedCost: '481.28',
        actualCost: '586.56',
        variance: '105.28',
        people: [
          { person: 'Cal', hours: '11.25' },
          { person: 'Pip', hours: '8.25' },
        ],
      },
    ],
    people: [
      {
        person: 'Cal',
        hours: '11.25',
        daysWorked: '2',
        tasks: [{ task: 'excavation', hours: '11.25' }],
      },
      {
        person: 'Pip',
        hours: '8.25',
        daysWorked: '1',
        tasks: [{ task: 'excavation', hours: '8.25' }],
      },
    ],
    materials: [
      {
        key: 'code:liner-45',
        code: 'LINER-45',
        description: 'EPDM liner, 45 mil',
        unit: 'sq ft',
        budgeted: true,
        estimatedQuantity: '480',
        deliveredQuantity: '500',
        usedQuantity: '470',
        returnedQuantity: '0',
        actualQuantity: '500',
        onHandQuantity: '30',
        budgetUnitCost: '0.85',
        averageDeliveredUnitCost: '0.85',
        estimatedCost: '408.00',
        deliveredCost: '425.00',
        returnedCredit: '0.00',
        actualCost: '425.00',
        variance: '17.00',
      },
    ],
    equipment: [
      {
        key: 'code:mtl|day',
        code: 'MTL',
        description: 'Mini track loader',
        unit: 'day',
        budgeted: true,
        estimatedQuantity: '2',
        actualQuantity: '3',
        loggedLoads: null,
        budgetUnitCost: '325.00',
        estimatedCost: '650.00',
        actualCost: '975.00',
        variance: '325.00',
      },
    ],
    disposal: [],
    other: [
      {
        key: 'mobilization',
        source: 'mobilization',
        description: 'Mobilization',
        estimatedCost: '250.00',
        actualCost: '250.00',
        variance: '0.00',
      },
    ],
    categories: [
      {
        category: 'materials',
        estimatedCost: '408.00',
        actualCost: '425.00',
        variance: '17.00',
        variancePct: '4.17',
      },
      {
        category: 'labor',
        estimatedCost: '481.28',
        actualCost: '586.56',
        variance: '105.28',
        variancePct: '21.88',
      },
    ],
    schedule: {
      plannedStart: '2026-03-03',
      plannedCrewDays: '3.0',
      actualCrewDays: '4',
      crewDaysVariance: '1',
      firstWorkedDate: '2026-03-03',
      lastWorkedDate: '2026-03-06',
      hoursPerCrewDay: '8',
    },
    totals: {
      quotedPriceBeforeTax: '1183.79',
      estimatedCost: '889.28',
      actualCost: '1011.56',
      variance: '122.28',
      variancePct: '13.75',
      quotedGrossProfit: '294.51',
      actualGrossProfit: '172.23',
      quotedMarginPct: '24.88',
      actualMarginPct: '14.55',
    },
    notes: ['Labor is costed at each task’s rate in the accepted version.'],
    warnings: ['Two deliveries have no unit cost; they are costed at the budget’s unit cost.'],
    ...overrides,
  };
}
