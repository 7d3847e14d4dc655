import { z } from 'zod';
import { BOULDER_SIZES, FITTING_KINDS } from '../engine/parameters/parameters-schema';
import { LABOR_TASKS } from '../engine/labor/labor-hours';

/**
 * The price book: what things cost a company and the margin it needs. Money and percentages are decimal
 * strings (never floats) so they survive JSON, CSV and PostgreSQL exactly; the pricing engine reads them
 * with decimal.js. Physical attributes (sizes, watts, flows) are plain numbers with their unit in the
 * name. A stored price book is immutable: every change is a new version.
 */

/** A non-negative amount of money with at most 4 decimals (unit costs may be fractions of a cent). */
export const moneySchema = z
  .string({ error: 'Enter an amount' })
  .trim()
  .regex(
    /^\d{1,9}(\.\d{1,4})?$/,
    'Enter an amount such as 12.50 (no currency sign, at most 4 decimals)',
  );

/** A percentage from 0 to 100 with at most 2 decimals, e.g. "35" or "7.25". */
export const percentSchema = z
  .string({ error: 'Enter a percentage' })
  .trim()
  .regex(/^\d{1,3}(\.\d{1,2})?$/, 'Enter a percentage such as 35 or 7.25')
  .refine((value) => Number(value) <= 100, 'A percentage is at most 100');

/** A markup may exceed 100 % (a 150 % markup is a 60 % margin). */
export const markupPercentSchema = z
  .string({ error: 'Enter a markup' })
  .trim()
  .regex(/^\d{1,4}(\.\d{1,2})?$/, 'Enter a markup such as 35 or 42.5')
  .refine((value) => Number(value) <= 1000, 'A markup is at most 1000 %');

export const codeSchema = z
  .string({ error: 'Enter a code' })
  .trim()
  .min(1, 'Enter a code')
  .max(40, 'Use at most 40 characters')
  .regex(/^[A-Za-z0-9][A-Za-z0-9._-]*$/, 'Use letters, digits, dots, dashes and underscores');

const nameSchema = z.string({ error: 'Enter a name' }).trim().min(1, 'Enter a name').max(120);

/** How line items are grouped on an estimate; markup is set per group. */
export const PRICE_CATEGORIES = ['materials', 'labor', 'equipment', 'disposal', 'other'] as const;
export const priceCategorySchema = z.enum(PRICE_CATEGORIES);
export type PriceCategory = z.infer<typeof priceCategorySchema>;

/** What a material is, so the pricing engine can match takeoff quantities to it. */
export const MATERIAL_KINDS = [
  'liner',
  'underlayment',
  'boulder',
  'gravel',
  'pipe',
  'fitting',
  'skimmer',
  'filter-box',
  'pump',
  'light',
  'transformer',
  'cable',
  'storage-block',
  'plant',
  'extra',
] as const;
export const materialKindSchema = z.enum(MATERIAL_KINDS);
export type MaterialKind = z.infer<typeof materialKindSchema>;

export const MATERIAL_UNITS = ['sq ft', 'ft', 'short ton', 'each', 'cu ft', 'cu yd'] as const;
export const materialUnitSchema = z.enum(MATERIAL_UNITS);
export type MaterialUnit = z.infer<typeof materialUnitSchema>;

const pumpCurvePointSchema = z.object({
  flowGph: z.number().nonnegative(),
  headFt: z.number().nonnegative(),
  inputWatts: z.number().positive(),
});
export type PumpCurvePoint = z.infer<typeof pumpCurvePointSchema>;

/** The unit each kind is priced by, and the attributes each kind must carry. */
export const MATERIAL_KIND_RULES: Record<
  MaterialKind,
  { unit: MaterialUnit; requires: ReadonlyArray<keyof MaterialAttributes> }
> = {
  liner: { unit: 'sq ft', requires: ['linerThicknessMil'] },
  underlayment: { unit: 'sq ft', requires: [] },
  boulder: { unit: 'short ton', requires: ['boulderSize'] },
  gravel: { unit: 'short ton', requires: [] },
  pipe: { unit: 'ft', requires: ['pipeMaterial', 'nominalSizeIn'] },
  fitting: { unit: 'each', requires: ['fittingKind', 'nominalSizeIn'] },
  skimmer: { unit: 'each', requires: ['ratedFlowGph'] },
  'filter-box': { unit: 'each', requires: ['ratedFlowGph'] },
  pump: { unit: 'each', requires: ['pumpCurve'] },
  light: { unit: 'each', requires: ['watts'] },
  transformer: { unit: 'each', requires: ['ratingWatts'] },
  cable: { unit: 'ft', requires: ['cableGaugeAwg'] },
  'storage-block': { unit: 'cu ft', requires: [] },
  plant: { unit: 'each', requires: [] },
  extra: { unit: 'each', requires: [] },
};

const materialAttributesSchema = z.object({
  /** Liner sheet thickness, mil (e.g. 45 mil EPDM). */
  linerThicknessMil: z.number().positive().max(200).optional(),
  /** Liner weight per area, lb/ft², where the maker states it. */
  linerWeightLbPerSqFt: z.number().positive().max(5).optional(),
  boulderSize: z.enum(BOULDER_SIZES).optional(),
  /** Matches the engine's pipe catalogue, e.g. "pvc-sch40". */
  pipeMaterial: z.string().trim().min(1).max(40).optional(),
  nominalSizeIn: z.number().positive().max(24).optional(),
  fittingKind: z.enum(FITTING_KINDS).optional(),
  /** Skimmers and waterfall filter boxes: the flow they are rated for, US gal/h. */
  ratedFlowGph: z.number().positive().max(100000).optional(),
  /** Pumps: catalogue points of flow against head with the input power at each. */
  pumpCurve: z.array(pumpCurvePointSchema).min(2).max(20).optional(),
  /** Lights: lamp power, W. */
  watts: z.number().positive().max(2000).optional(),
  /** Transformers: rated output, W (VA). */
  ratingWatts: z.number().positive().max(10000).optional(),
  /** Low-voltage cable gauge, AWG, as the engine names it (e.g. "12"). */
  cableGaugeAwg: z.string().trim().min(1).max(4).optional(),
});
export type MaterialAttributes = z.infer<typeof materialAttributesSchema>;

export const materialSchema = z
  .object({
    code: codeSchema,
    name: nameSchema,
    kind: materialKindSchema,
    unit: materialUnitSchema,
    unitCost: moneySchema,
    /** Sales tax applies to this material. */
    taxable: z.boolean(),
  })
  .extend(materialAttributesSchema.shape)
  .superRefine((material, ctx) => {
    const rule = MATERIAL_KIND_RULES[material.kind];
    if (material.unit !== rule.unit) {
      ctx.addIssue({
        code: 'custom',
        path: ['unit'],
        message: `A ${material.kind} is priced per ${rule.unit}`,
      });
    }
    for (const attribute of rule.requires) {
      if (material[attribute] === undefined) {
        ctx.addIssue({
          code: 'custom',
          path: [attribute],
          message: `A ${material.kind} needs ${attribute}`,
        });
      }
    }
    if (material.pumpCurve) {
      const flows = material.pumpCurve.map((point) => point.flowGph);
      if (flows.some((flow, index) => index > 0 && flow <= flows[index - 1]!)) {
        ctx.addIssue({
          code: 'custom',
          path: ['pumpCurve'],
          message: 'List curve points by rising flow',
        });
      }
    }
  });
export type Material = z.infer<typeof materialSchema>;

export const laborRoleSchema = z.object({
  code: codeSchema,
  name: nameSchema,
  wagePerHour: moneySchema,
  /** Payroll taxes, insurance and benefits on top of the wage, % of the wage. */
  burdenPct: percentSchema,
});
export type LaborRole = z.infer<typeof laborRoleSchema>;

export const EQUIPMENT_USES = ['excavation', 'rock', 'other'] as const;

export const equipmentSchema = z.object({
  code: codeSchema,
  name: nameSchema,
  use: z.enum(EQUIPMENT_USES),
  dailyRate: moneySchema,
  minimumDays: z.number().int().min(1).max(30),
  /** Delivery and pick-up, once per job. */
  deliveryFee: moneySchema,
  /** Track width, in: the machine fits only where the site's access is at least this wide. */
  widthIn: z.number().positive().max(200),
});
export type Equipment = z.infer<typeof equipmentSchema>;

export const DISPOSAL_BASES = ['per-loose-cu-yd', 'per-short-ton'] as const;

export const disposalSchema = z.object({
  code: codeSchema,
  name: nameSchema,
  basis: z.enum(DISPOSAL_BASES),
  unitCost: moneySchema,
});
export type Disposal = z.infer<typeof disposalSchema>;

/** Crew production rates: the takeoff engine's labor parameters, tuned from the company's own jobs. */
export const productionRatesSchema = z.object({
  machineBankCuYdPerHour: z.number().positive().max(500),
  boulderHandLaborHoursPerShortTon: z.number().positive().max(100),
  boulderMachineLaborHoursPerShortTon: z.number().positive().max(100),
  gravelLaborHoursPerShortTon: z.number().positive().max(100),
  linerLaborHoursPer100SqFt: z.number().positive().max(100),
  pipeLaborHoursPerFt: z.number().nonnegative().max(10),
  fittingLaborHoursEach: z.number().nonnegative().max(10),
  pumpSetLaborHours: z.number().nonnegative().max(100),
  fixtureLaborHoursEach: z.number().nonnegative().max(10),
  cableLaborHoursPerFt: z.number().nonnegative().max(10),
});
export type ProductionRates = z.infer<typeof productionRatesSchema>;

export const pricingPolicySchema = z.object({
  /** Markup on cost per category, %. Margin = markup ÷ (1 + markup). */
  markupPct: z.object(
    Object.fromEntries(
      PRICE_CATEGORIES.map((category) => [category, markupPercentSchema]),
    ) as Record<PriceCategory, typeof markupPercentSchema>,
  ),
  /** An estimate whose gross margin falls below this needs an owner's approval. */
  marginFloorPct: percentSchema,
  /** A discount above this share of the price needs an owner's approval. */
  discountCeilingPct: percentSchema,
});
export type PricingPolicy = z.infer<typeof pricingPolicySchema>;

export const jobSettingsSchema = z.object({
  /** Travel and set-up charged once per job (an "other" line). */
  mobilizationCost: moneySchema,
  /** The least a job is sold for. */
  minimumJobPrice: moneySchema,
  /** Added to direct cost for the unknowns of digging. */
  contingencyPct: percentSchema,
  /** Sales tax on taxable materials. */
  salesTaxPct: percentSchema,
  /** The share of the total asked as a deposit. */
  depositPct: percentSchema,
  /** Which labor role's burdened rate prices each task's hours. */
  taskRoles: z.object(
    Object.fromEntries(LABOR_TASKS.map((task) => [task, codeSchema])) as Record<
      (typeof LABOR_TASKS)[number],
      typeof codeSchema
    >,
  ),
  /** The liner, underlayment, gravel and disposal a takeoff is priced with unless the estimate says otherwise. */
  defaultLinerCode: codeSchema,
  defaultUnderlaymentCode: codeSchema,
  defaultGravelCode: codeSchema,
  defaultDisposalCode: codeSchema,
});
export type JobSettings = z.infer<typeof jobSettingsSchema>;

function duplicateCodes(items: ReadonlyArray<{ code: string }>): number[] {
  const seen = new Set<string>();
  const duplicates: number[] = [];
  items.forEach((item, index) => {
    const key = item.code.toLowerCase();
    if (seen.has(key)) duplicates.push(index);
    seen.add(key);
  });
  return duplicates;
}

export const priceBookSchema = z
  .object({
    /** ISO 4217 code of every amount in the book. */
    currency: z.string().regex(/^[A-Z]{3}$/, 'Use a three-letter currency code such as USD'),
    materials: z.array(materialSchema).max(5000),
    laborRoles: z.array(laborRoleSchema).min(1, 'Add at least one labor role').max(100),
    equipment: z.array(equipmentSchema).max(500),
    disposal: z.array(disposalSchema).min(1, 'Add at least one way to dispose of spoil').max(100),
    productionRates: productionRatesSchema,
    settings: jobSettingsSchema,
    policy: pricingPolicySchema,
  })
  .superRefine((book, ctx) => {
    for (const section of ['materials', 'laborRoles', 'equipment', 'disposal'] as const) {
      for (const index of duplicateCodes(book[section])) {
        ctx.addIssue({
          code: 'custom',
          path: [section, index, 'code'],
          message: 'This code is used twice',
        });
      }
    }
    const materialCode = (code: string, kind: MaterialKind) =>
      book.materials.some((material) => material.code === code && material.kind === kind);
    const references: Array<[keyof JobSettings, MaterialKind]> = [
      ['defaultLinerCode', 'liner'],
      ['defaultUnderlaymentCode', 'underlayment'],
      ['defaultGravelCode', 'gravel'],
    ];
    for (const [setting, kind] of references) {
      if (!materialCode(book.settings[setting] as string, kind)) {
        ctx.addIssue({
          code: 'custom',
          path: ['settings', setting],
          message: `No ${kind} has this code`,
        });
      }
    }
    if (!book.disposal.some((item) => item.code === book.settings.defaultDisposalCode)) {
      ctx.addIssue({
        code: 'custom',
        path: ['settings', 'defaultDisposalCode'],
        message: 'No disposal has this code',
      });
    }
    for (const [task, role] of Object.entries(book.settings.taskRoles)) {
      if (!book.laborRoles.some((labor) => labor.code === role)) {
        ctx.addIssue({
          code: 'custom',
          path: ['settings', 'taskRoles', task],
          message: 'No labor role has this code',
        });
      }
    }
  });
export type PriceBook = z.infer<typeof priceBookSchema>;
