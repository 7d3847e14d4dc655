import type {
  CrewBudgetLine,
  DailyLogView,
  JobBudget,
  JobListItem,
  JobView,
} from '@pondwright/shared';

export const JOB_ID = '0b5c1f0e-4c8d-4f3a-9a51-7d2f6c1e0a01';

export const CREW_BUDGET: CrewBudgetLine[] = [
  {
    id: 'labor:excavation',
    category: 'labor',
    description: 'Excavation (Crew member)',
    code: null,
    task: 'excavation',
    quantity: '14.00',
    unit: 'h',
  },
  {
    id: 'gravel',
    category: 'materials',
    description: 'River gravel',
    code: 'GRAVEL-RIVER',
    task: null,
    quantity: '3.2',
    unit: 'short ton',
  },
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
    id: 'equipment:excavation:MTL',
    category: 'equipment',
    description: 'Mini track loader, 2 days',
    code: 'MTL',
    task: null,
    quantity: '2',
    unit: 'day',
  },
  {
    id: 'disposal:HAUL',
    category: 'disposal',
    description: 'Haul-off',
    code: 'HAUL',
    task: null,
    quantity: '6.5',
    unit: 'cu yd',
  },
];

/** The same plan with the office's money on it, as owners and estimators receive it. */
export function buildBudget(): JobBudget {
  const money = (line: CrewBudgetLine, unitCost: string, extendedCost: string, price: string) => ({
    ...line,
    source: line.id,
    unitCost,
    extendedCost,
    price,
  });
  const [labor, gravel, liner, loader, haul] = CREW_BUDGET as [
    CrewBudgetLine,
    CrewBudgetLine,
    CrewBudgetLine,
    CrewBudgetLine,
    CrewBudgetLine,
  ];
  return {
    versionNumber: 2,
    contentSha256: 'f'.repeat(64),
    currency: 'USD',
    lines: [
      money(labor, '30.08', '421.12', '589.57'),
      money(gravel, '68.00', '217.60', '272.00'),
      money(liner, '0.85', '408.00', '510.00'),
      money(loader, '325.00', '650.00', '780.00'),
      money(haul, '45.00', '292.50', '336.38'),
    ],
    cost: '1989.22',
    priceBeforeTax: '2487.95',
    tax: '57.13',
    total: '2545.08',
    laborHours: '14.00',
    crewDays: '2',
  };
}

export function buildListItem(overrides: Partial<JobListItem> = {}): JobListItem {
  return {
    id: JOB_ID,
    number: 12,
    title: 'Koi pond with stream',
    customerName: 'Bram Thistlewood',
    siteAddress: '14 Alder Row',
    status: 'in_progress',
    crewId: 'crew-1',
    crewName: 'North crew',
    plannedStart: '2026-03-03',
    plannedCrewDays: '3',
    plannedEnd: '2026-03-05',
    ...overrides,
  };
}

/** A job as a crew lead receives it: the plan in quantities, `budget` null. */
export function buildCrewJob(overrides: Partial<JobView> = {}): JobView {
  return {
    ...buildListItem(),
    estimateId: '0b5c1f0e-4c8d-4f3a-9a51-7d2f6c1e0a99',
    budget: null,
    crewBudget: CREW_BUDGET,
    scheduleChanges: [],
    logs: [],
    startedOn: '2026-03-03',
    completedOn: null,
    closedAt: null,
    ...overrides,
  };
}

export function buildLog(overrides: Partial<DailyLogView> = {}): DailyLogView {
  return {
    id: '6f1d3a52-8b2e-4c71-9f0a-3e5d7c9b1a22',
    jobId: JOB_ID,
    logDate: '2026-03-04',
    notes: 'Dry ground.',
    entries: [
      {
        id: '9a8b7c6d-5e4f-4a3b-8c2d-1e0f9a8b7c6d',
        kind: 'hours',
        person: 'Rowan Vale',
        task: 'excavation',
        hours: '6',
      },
    ],
    revision: 2,
    authorName: 'Cal Crewlead',
    updatedAt: '2026-03-04T15:00:00.000Z',
    ...overrides,
  };
}
