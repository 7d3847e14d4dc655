import type {
  CompanyProfile,
  CreatedInvite,
  CurrentUser,
  PendingInvite,
  TeamMember,
} from '@pondwright/shared';
import type { PriceBook, PricedEstimate } from '@pondwright/shared/pricing';

/** The API's answer for one price-book version, as `GET /api/price-book` sends it. */
export type PriceBookVersionRecord = {
  id: string;
  versionNumber: number;
  effectiveDate: string;
  authorName: string;
  note: string | null;
  createdAt: string;
  book: PriceBook;
};

let sequence = 0;
const nextId = () => `00000000-0000-4000-8000-${String(++sequence).padStart(12, '0')}`;

export function buildCurrentUser(overrides: Partial<CurrentUser> = {}): CurrentUser {
  return {
    id: nextId(),
    email: 'owner@example.test',
    name: 'Olive Owner',
    role: 'owner',
    companyId: 'company-1',
    companyName: 'Example Ponds Co',
    ...overrides,
  };
}

export function buildMember(overrides: Partial<TeamMember> = {}): TeamMember {
  const id = overrides.id ?? nextId();
  return {
    id,
    email: `member-${id.slice(-4)}@example.test`,
    name: 'Esme Estimator',
    role: 'estimator',
    active: true,
    createdAt: '2026-01-15T10:00:00.000Z',
    ...overrides,
  };
}

export function buildInvite(overrides: Partial<PendingInvite> = {}): PendingInvite {
  return {
    id: nextId(),
    email: 'new.hire@example.test',
    role: 'crew_lead',
    expiresAt: '2099-03-01T10:00:00.000Z',
    createdAt: '2026-02-22T10:00:00.000Z',
    invitedByName: 'Olive Owner',
    ...overrides,
  };
}

export function buildCreatedInvite(overrides: Partial<CreatedInvite> = {}): CreatedInvite {
  return {
    ...buildInvite(overrides),
    inviteUrl: '/accept-invite/tok-123',
    ...overrides,
  };
}

export function buildCompany(overrides: Partial<CompanyProfile> = {}): CompanyProfile {
  return {
    id: 'company-1',
    name: 'Example Ponds Co',
    unitSystem: 'us',
    hasLogo: false,
    ...overrides,
  };
}

/** A small, valid price book: one of each thing the schema insists on, and a pump with a curve. */
export function buildPriceBook(overrides: Partial<PriceBook> = {}): PriceBook {
  const taskRoles = {
    excavation: 'CREW',
    rockPlacing: 'CREW',
    linerUnderlayment: 'CREW',
    plumbingEquipment: 'LEAD',
    electricalLighting: 'LEAD',
    renovationTearOut: 'CREW',
    cleanUp: 'CREW',
  };
  return {
    currency: 'USD',
    materials: [
      {
        code: 'LINER-45',
        name: 'EPDM liner, 45 mil',
        kind: 'liner',
        unit: 'sq ft',
        unitCost: '0.85',
        taxable: true,
        linerThicknessMil: 45,
      },
      {
        code: 'UNDER-8',
        name: 'Underlayment, 8 oz',
        kind: 'underlayment',
        unit: 'sq ft',
        unitCost: '0.22',
        taxable: true,
      },
      {
        code: 'GRAVEL-RIVER',
        name: 'River gravel',
        kind: 'gravel',
        unit: 'short ton',
        unitCost: '68.00',
        taxable: true,
      },
      {
        code: 'PUMP-3000',
        name: 'Submersible pump, 3000 gph',
        kind: 'pump',
        unit: 'each',
        unitCost: '410.00',
        taxable: true,
        pumpCurve: [
          { flowGph: 0, headFt: 18, inputWatts: 240 },
          { flowGph: 1500, headFt: 12, inputWatts: 230 },
          { flowGph: 3000, headFt: 4, inputWatts: 220 },
        ],
      },
    ],
    laborRoles: [
      { code: 'LEAD', name: 'Crew lead', wagePerHour: '32.00', burdenPct: '28' },
      { code: 'CREW', name: 'Crew member', wagePerHour: '23.50', burdenPct: '28' },
    ],
    equipment: [
      {
        code: 'MTL',
        name: 'Mini track loader',
        use: 'excavation',
        dailyRate: '325.00',
        minimumDays: 1,
        deliveryFee: '90.00',
        widthIn: 36,
      },
    ],
    disposal: [{ code: 'HAUL', name: 'Haul-off', basis: 'per-loose-cu-yd', unitCost: '45.00' }],
    productionRates: {
      machineBankCuYdPerHour: 4,
      boulderHandLaborHoursPerShortTon: 6,
      boulderMachineLaborHoursPerShortTon: 2.5,
      gravelLaborHoursPerShortTon: 2,
      linerLaborHoursPer100SqFt: 1.5,
      pipeLaborHoursPerFt: 0.05,
      fittingLaborHoursEach: 0.2,
      pumpSetLaborHours: 2,
      fixtureLaborHoursEach: 0.75,
      cableLaborHoursPerFt: 0.02,
    },
    settings: {
      mobilizationCost: '250.00',
      minimumJobPrice: '1500.00',
      contingencyPct: '5',
      salesTaxPct: '7.25',
      depositPct: '30',
      taskRoles,
      defaultLinerCode: 'LINER-45',
      defaultUnderlaymentCode: 'UNDER-8',
      defaultGravelCode: 'GRAVEL-RIVER',
      defaultDisposalCode: 'HAUL',
    },
    policy: {
      markupPct: { materials: '25', labor: '40', equipment: '20', disposal: '15', other: '25' },
      marginFloorPct: '22',
      discountCeilingPct: '10',
    },
    ...overrides,
  };
}

export function buildPriceBookVersion(
  overrides: Partial<PriceBookVersionRecord> = {},
): PriceBookVersionRecord {
  return {
    id: nextId(),
    versionNumber: 3,
    effectiveDate: '2026-03-01',
    authorName: 'Olive Owner',
    note: 'Spring prices',
    createdAt: '2026-02-27T15:00:00.000Z',
    book: buildPriceBook(),
    ...overrides,
  };
}

export function buildPricedEstimate(overrides: Partial<PricedEstimate> = {}): PricedEstimate {
  const line = (
    id: string,
    category: PricedEstimate['lines'][number]['category'],
    description: string,
    extendedCost: string,
    price: string,
  ): PricedEstimate['lines'][number] => ({
    id,
    category,
    description,
    code: null,
    quantity: '1',
    unit: 'each',
    unitCost: extendedCost,
    extendedCost,
    markupPct: '25.00',
    price,
    taxable: category === 'materials',
    kind: 'base',
    source: id,
    optionId: null,
  });
  return {
    currency: 'USD',
    lines: [
      line('liner', 'materials', 'EPDM liner, 45 mil', '400.00', '500.00'),
      line('pump', 'materials', 'Submersible pump, 3000 gph', '410.00', '512.50'),
      line('labor:excavation', 'labor', 'Excavation', '300.00', '420.00'),
    ],
    categories: [
      { category: 'materials', cost: '810.00', price: '1012.50' },
      { category: 'labor', cost: '300.00', price: '420.00' },
    ],
    adjustments: [],
    totals: {
      subtotalCost: '1110.00',
      subtotalPrice: '1432.50',
      discountPct: '0.00',
      discount: '0.00',
      minimumJobCharge: '67.50',
      taxableAmount: '1012.50',
      salesTaxPct: '7.25',
      tax: '73.41',
      total: '1573.41',
      depositPct: '30.00',
      deposit: '472.02',
      grossProfit: '390.00',
      grossMarginPct: '26.00',
    },
    options: [],
    missing: [],
    complete: true,
    approval: { needsApproval: false, reasons: [] },
    ...overrides,
  };
}
