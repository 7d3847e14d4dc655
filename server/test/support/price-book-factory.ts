import { priceBookSchema, type PriceBook } from '@pondwright/shared/pricing';

/**
 * A small but complete price book for tests: every reference the schema checks resolves, and the amounts
 * are invented. Overrides replace whole top-level sections.
 */
export function testPriceBook(overrides: Partial<PriceBook> = {}): PriceBook {
  const book: PriceBook = {
    currency: 'USD',
    materials: [
      {
        code: 'LIN-45',
        name: 'Rubber liner 45 mil',
        kind: 'liner',
        unit: 'sq ft',
        unitCost: '0.95',
        taxable: true,
        linerThicknessMil: 45,
      },
      {
        code: 'UND-8',
        name: 'Felt underlayment 8 oz',
        kind: 'underlayment',
        unit: 'sq ft',
        unitCost: '0.28',
        taxable: true,
      },
      {
        code: 'BLD-M',
        name: 'Medium boulders',
        kind: 'boulder',
        unit: 'short ton',
        unitCost: '185.00',
        taxable: true,
        boulderSize: 'medium',
      },
      {
        code: 'GRV-RIVER',
        name: 'River gravel, mixed',
        kind: 'gravel',
        unit: 'short ton',
        unitCost: '62.50',
        taxable: true,
      },
    ],
    laborRoles: [
      { code: 'LEAD', name: 'Crew lead', wagePerHour: '32.00', burdenPct: '28' },
      { code: 'HAND', name: 'Installer', wagePerHour: '22.50', burdenPct: '25.5' },
    ],
    equipment: [
      {
        code: 'MINI-EX',
        name: 'Mini excavator',
        use: 'excavation',
        dailyRate: '340.00',
        minimumDays: 1,
        deliveryFee: '150.00',
        widthIn: 39,
      },
    ],
    disposal: [
      { code: 'HAUL-CY', name: 'Spoil haul-off', basis: 'per-loose-cu-yd', unitCost: '38.00' },
    ],
    productionRates: {
      machineBankCuYdPerHour: 6,
      boulderHandLaborHoursPerShortTon: 4,
      boulderMachineLaborHoursPerShortTon: 1.5,
      gravelLaborHoursPerShortTon: 2,
      linerLaborHoursPer100SqFt: 1.2,
      pipeLaborHoursPerFt: 0.05,
      fittingLaborHoursEach: 0.25,
      pumpSetLaborHours: 2,
      fixtureLaborHoursEach: 0.5,
      cableLaborHoursPerFt: 0.02,
    },
    settings: {
      mobilizationCost: '250.00',
      minimumJobPrice: '2500.00',
      contingencyPct: '5',
      salesTaxPct: '7.25',
      depositPct: '30',
      taskRoles: {
        excavation: 'HAND',
        rockPlacing: 'LEAD',
        linerUnderlayment: 'HAND',
        plumbingEquipment: 'LEAD',
        electricalLighting: 'LEAD',
        renovationTearOut: 'HAND',
        cleanUp: 'HAND',
      },
      defaultLinerCode: 'LIN-45',
      defaultUnderlaymentCode: 'UND-8',
      defaultGravelCode: 'GRV-RIVER',
      defaultDisposalCode: 'HAUL-CY',
    },
    policy: {
      markupPct: { materials: '35', labor: '50', equipment: '25', disposal: '20', other: '30' },
      marginFloorPct: '25',
      discountCeilingPct: '10',
    },
    ...overrides,
  };
  // Fail loudly here rather than in a confusing assertion later.
  return priceBookSchema.parse(book);
}
