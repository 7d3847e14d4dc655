import { z } from 'zod';
import { LABOR_TASKS, type LaborTask } from '../engine/labor/labor-hours';
import type { PriceCategory } from '../pricing/price-book-schema';
import { manualLineSchema } from '../estimates/estimate-schemas';
import { isLoadUnit, MAX_LOAD_VOLUME_LOOSE_CU_YD } from './disposal-loads';

/**
 * Jobs: an accepted quote becomes a job carrying its budget; the crew lead's daily logs record what
 * really happened; the cost report sets one against the other. Zod rules and response types only.
 */

export const JOB_STATUSES = ['scheduled', 'in_progress', 'completed', 'closed'] as const;
export type JobStatus = (typeof JOB_STATUSES)[number];

export const RESCHEDULE_REASONS = [
  'weather',
  'access',
  'materials',
  'crew',
  'homeowner',
  'other',
] as const;
export type RescheduleReason = (typeof RESCHEDULE_REASONS)[number];

const isoDate = z
  .string({ error: 'Enter a date' })
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Enter a date as YYYY-MM-DD')
  .refine((value) => !Number.isNaN(Date.parse(`${value}T00:00:00Z`)), 'Enter a real date');

const decimal = (decimals: number, message: string) =>
  z
    .string({ error: message })
    .trim()
    .regex(new RegExp(`^\\d{1,7}(\\.\\d{1,${decimals}})?$`), message);

/** `POST /api/crews`. */
export const createCrewRequestSchema = z
  .object({
    name: z.string({ error: 'Name the crew' }).trim().min(1, 'Name the crew').max(80),
    leadUserId: z.uuid({ error: 'Choose a crew lead' }).nullable().optional(),
  })
  .strict();

/** `POST /api/jobs`: an accepted estimate becomes a job. */
export const createJobRequestSchema = z
  .object({
    estimateId: z.uuid({ error: 'Choose an accepted estimate' }),
    crewId: z.uuid({ error: 'Choose a crew' }).nullable().optional(),
    plannedStart: isoDate.nullable().optional(),
  })
  .strict();

/** `POST /api/jobs/:id/schedule`: a new start (and crew), with the reason when it moves. */
export const rescheduleJobRequestSchema = z
  .object({
    plannedStart: isoDate,
    crewId: z.uuid({ error: 'Choose a crew' }).nullable(),
    plannedCrewDays: decimal(1, 'Enter crew days such as 3 or 2.5').optional(),
    reason: z.enum(RESCHEDULE_REASONS, { error: 'Choose a reason' }).optional(),
    note: z.string().trim().max(500, 'Use at most 500 characters').optional(),
  })
  .strict();

/** `POST /api/jobs/:id/status`: start, complete or close the job. */
export const jobStatusRequestSchema = z
  .object({ status: z.enum(['in_progress', 'completed', 'closed'], { error: 'Choose a status' }) })
  .strict();

const entryId = z.uuid({ error: 'Each entry needs its own id' });

export const hoursEntrySchema = z
  .object({
    id: entryId,
    kind: z.literal('hours'),
    person: z.string({ error: 'Who worked?' }).trim().min(1, 'Who worked?').max(80),
    task: z.enum(LABOR_TASKS, { error: 'Choose a task' }),
    hours: decimal(2, 'Enter hours such as 7.5').refine((v) => Number(v) <= 24, 'At most 24 hours'),
  })
  .strict();

/**
 * A load's size: the truck's or container's nominal capacity in loose yd³ (10 for a tandem dump truck,
 * 6 for a skid-steer trailer), up to 2 decimals, more than 0 and at most 40 (a 40 yd³ roll-off).
 */
export const loadVolumeLooseCubicYardsSchema = decimal(
  2,
  'Enter the load size in loose yd³, such as 10',
)
  .refine((v) => Number(v) > 0, 'A load holds more than 0 yd³')
  .refine(
    (v) => Number(v) <= MAX_LOAD_VOLUME_LOOSE_CU_YD,
    `At most ${MAX_LOAD_VOLUME_LOOSE_CU_YD} yd³ a load (the largest roll-off container)`,
  );

/**
 * Materials delivered (with the supplier's ticket and unit cost), used or returned; equipment and
 * disposal in the budget line's unit (days, loose yd³, loads). `code` ties the entry to a budget line.
 * Disposal counted in loads may give `loadVolumeLooseCubicYards`, each load's nominal capacity, so the
 * cost report can set loads × capacity against a budget in loose yd³. It is optional: logs written
 * before it existed have none, and only disposal in loads may carry it.
 */
export const quantityEntrySchema = z
  .object({
    id: entryId,
    kind: z.enum(['material', 'equipment', 'disposal']),
    movement: z.enum(['delivered', 'used', 'returned']).nullable(),
    code: z.string().trim().max(40).nullable(),
    description: z.string({ error: 'Describe it' }).trim().min(1, 'Describe it').max(200),
    quantity: decimal(3, 'Enter a quantity such as 2 or 1.25'),
    unit: z.string({ error: 'Enter a unit' }).trim().min(1, 'Enter a unit').max(20),
    unitCost: decimal(4, 'Enter a unit cost such as 12.50').nullable(),
    supplier: z.string().trim().max(120).nullable(),
    ticketNumber: z.string().trim().max(60).nullable(),
    loadVolumeLooseCubicYards: loadVolumeLooseCubicYardsSchema.optional(),
  })
  .strict()
  .refine((entry) => (entry.kind === 'material') === (entry.movement !== null), {
    message: 'Say whether the material was delivered, used or returned',
    path: ['movement'],
  })
  .refine(
    (entry) =>
      entry.loadVolumeLooseCubicYards === undefined ||
      (entry.kind === 'disposal' && isLoadUnit(entry.unit)),
    {
      message: 'Only disposal counted in loads has a load size',
      path: ['loadVolumeLooseCubicYards'],
    },
  );

/** Told apart by `kind`, so a wrong entry's messages name its own fields rather than "Invalid input". */
export const logEntrySchema = z.discriminatedUnion('kind', [hoursEntrySchema, quantityEntrySchema]);
export type HoursEntry = z.infer<typeof hoursEntrySchema>;
export type QuantityEntry = z.infer<typeof quantityEntrySchema>;
export type LogEntry = HoursEntry | QuantityEntry;

/**
 * `PUT /api/jobs/:jobId/logs/:logId` (the log's id is made on the phone, so a retry is the same log):
 * the whole day's log and the revision it was edited from (0 for a new log). The same content again
 * answers 200 unchanged; an edit from an older revision answers 409 with the stored log.
 */
export const saveDailyLogRequestSchema = z
  .object({
    logDate: isoDate,
    notes: z.string().max(4000, 'Use at most 4000 characters'),
    entries: z
      .array(logEntrySchema)
      .max(300, 'Use at most 300 entries a day')
      .refine((e) => new Set(e.map((x) => x.id)).size === e.length, 'Each entry needs its own id'),
    baseRevision: z.number().int().min(0),
  })
  .strict();
export type SaveDailyLogRequest = z.infer<typeof saveDailyLogRequestSchema>;

export type DailyLogView = {
  id: string;
  jobId: string;
  logDate: string;
  notes: string;
  entries: LogEntry[];
  revision: number;
  authorName: string;
  updatedAt: string;
};

/** One line of the job's budget: a priced line of the accepted version (base and chosen options). */
export type BudgetLine = {
  id: string;
  category: PriceCategory;
  description: string;
  code: string | null;
  source: string;
  /** The labor task, for labor lines (`source` is `labor:<task>`). */
  task: LaborTask | null;
  quantity: string;
  unit: string;
  unitCost: string;
  extendedCost: string;
  price: string;
};

/**
 * A budget line a change order takes work off: its figures once the change is accepted (quantity "0":
 * the line leaves the budget) and, in `previous`, those it had in the version the change was priced on.
 */
export type BudgetLineReduction = Pick<BudgetLine, 'id' | 'quantity' | 'extendedCost' | 'price'> & {
  previous: Pick<BudgetLine, 'quantity' | 'extendedCost' | 'price'>;
};

/** What the job was sold for and expected to cost: fixed when the job is made (and by change orders). */
export type JobBudget = {
  versionNumber: number;
  contentSha256: string;
  currency: string;
  lines: BudgetLine[];
  /** Σ extended cost of the lines. */
  cost: string;
  /** The accepted total without tax (discount and minimum job charge applied), options included. */
  priceBeforeTax: string;
  tax: string;
  total: string;
  laborHours: string;
  crewDays: string;
};

/** The budget as a crew lead sees it: what to build with, never what it costs. */
export type CrewBudgetLine = Pick<
  BudgetLine,
  'id' | 'category' | 'description' | 'code' | 'task' | 'quantity' | 'unit'
>;

export type JobListItem = {
  id: string;
  number: number;
  title: string;
  customerName: string;
  siteAddress: string | null;
  status: JobStatus;
  crewId: string | null;
  crewName: string | null;
  plannedStart: string | null;
  plannedCrewDays: string;
  /** The last day the plan covers: start + crew days − 1, counting working days Monday to Friday. */
  plannedEnd: string | null;
};

export type ScheduleChangeView = {
  id: string;
  fromStart: string | null;
  toStart: string;
  fromCrewName: string | null;
  toCrewName: string | null;
  reason: RescheduleReason | null;
  note: string | null;
  actorName: string;
  createdAt: string;
};

/** `GET /api/jobs/:id`. `budget` is null for crew leads, who get `crewBudget` instead. */
export type JobView = JobListItem & {
  estimateId: string;
  budget: JobBudget | null;
  crewBudget: CrewBudgetLine[];
  scheduleChanges: ScheduleChangeView[];
  logs: DailyLogView[];
  startedOn: string | null;
  completedOn: string | null;
  closedAt: string | null;
};

export type CrewView = {
  id: string;
  name: string;
  leadUserId: string | null;
  leadName: string | null;
};

export const PHOTO_KINDS = ['before', 'progress', 'after', 'ticket'] as const;
export type PhotoKind = (typeof PHOTO_KINDS)[number];

/**
 * The form fields beside the file in `PUT /api/jobs/:jobId/photos/:photoId` (multipart, file field
 * `photo`); the photo's id is made on the phone so a retried upload is the same photo.
 */
export const uploadPhotoFieldsSchema = z
  .object({
    kind: z.enum(PHOTO_KINDS, {
      error: 'Say what the photo shows: before, progress, after or a ticket',
    }),
    caption: z.string().trim().max(200, 'Use at most 200 characters').default(''),
    logId: z.uuid({ error: 'Give the daily log’s id' }).optional(),
  })
  .strict();

export type PhotoView = {
  id: string;
  jobId: string;
  logId: string | null;
  kind: PhotoKind;
  caption: string;
  widthPx: number;
  heightPx: number;
  uploadedByName: string;
  createdAt: string;
  /** API paths (they need the bearer token): the image, at most 2048 px, and a 320 px thumbnail. */
  imagePath: string;
  thumbnailPath: string;
};

/** `POST /api/learned-rates/adopt`: put one learned rate into a new price-book version. */
export const adoptLearnedRateRequestSchema = z
  .object({
    parameter: z.enum(
      [
        'machineBankCuYdPerHour',
        'boulderHandLaborHoursPerShortTon',
        'boulderMachineLaborHoursPerShortTon',
        'gravelLaborHoursPerShortTon',
        'linerLaborHoursPer100SqFt',
        'pipeLaborHoursPerFt',
        'fittingLaborHoursEach',
        'pumpSetLaborHours',
        'fixtureLaborHoursEach',
        'cableLaborHoursPerFt',
      ],
      { error: 'Choose a production rate' },
    ),
  })
  .strict();

/** `POST /api/jobs/:id/invoice`: the final invoice to the homeowner (the quote's recipient by default). */
export const sendInvoiceRequestSchema = z
  .object({
    recipientEmail: z.email({ error: 'Enter the homeowner’s e-mail address' }).max(254).optional(),
  })
  .strict();

export type InvoiceView = {
  id: string;
  total: string;
  depositPaid: string;
  balance: string;
  status: 'open' | 'paid';
  issuedAt: string;
  paidAt: string | null;
  recipientEmail: string;
};

/** Work taken off a line of the job's budget: the quantity the job keeps ("0" takes the line off). */
export const changeOrderReductionSchema = z
  .object({
    lineId: z
      .string({ error: 'Choose a line of the job' })
      .trim()
      .min(1, 'Choose a line of the job')
      .max(200, 'Choose a line of the job'),
    newQuantity: z
      .string({ error: 'Enter the quantity the job keeps' })
      .trim()
      .regex(/^\d{1,9}(\.\d{1,3})?$/, 'Enter the quantity the job keeps, such as 0 or 2.5'),
  })
  .strict();
export type ChangeOrderReduction = z.infer<typeof changeOrderReductionSchema>;

/**
 * `POST /api/jobs/:id/change-orders`: a scope change, priced with the accepted version's price book on
 * top of the version in force; it becomes the estimate's next version and is sent for the homeowner to
 * accept. New work comes as manual lines; work taken off (a credit) names lines of the job's budget
 * with the quantity each keeps, priced at the rates they were sold at. A change may do both.
 */
export const createChangeOrderRequestSchema = z
  .object({
    title: z.string({ error: 'Name the change' }).trim().min(1, 'Name the change').max(160),
    reason: z.string().trim().max(2000, 'Use at most 2000 characters').default(''),
    lines: z
      .array(manualLineSchema.extend({ kind: z.literal('base').default('base') }))
      .max(50, 'Use at most 50 lines')
      .refine(
        (lines) => new Set(lines.map((l) => l.id)).size === lines.length,
        'Each line needs its own id',
      )
      .default([]),
    reductions: z
      .array(changeOrderReductionSchema)
      .max(50, 'Take off at most 50 lines')
      .refine(
        (reductions) => new Set(reductions.map((r) => r.lineId)).size === reductions.length,
        'Take each line off once',
      )
      .default([]),
  })
  .strict()
  .refine((request) => request.lines.length + request.reductions.length > 0, {
    message: 'Add a line or take work off',
    path: ['lines'],
  });
export type CreateChangeOrderRequest = z.infer<typeof createChangeOrderRequestSchema>;

export const CHANGE_ORDER_STATUSES = ['ready', 'sent', 'accepted', 'declined'] as const;
export type ChangeOrderStatus = (typeof CHANGE_ORDER_STATUSES)[number];

/** What a change order does to a line: new work, less of a line, or the line taken off. */
export const CHANGE_ORDER_LINE_CHANGES = ['added', 'reduced', 'removed'] as const;
export type ChangeOrderLineChange = (typeof CHANGE_ORDER_LINE_CHANGES)[number];

/** One line of a change order as the homeowner reads it. */
export type ChangeOrderLine = {
  change: ChangeOrderLineChange;
  description: string;
  /** The quantity added, or taken off (a positive figure either way). */
  quantity: string;
  unit: string;
  /** For work taken off: the line's quantity before and after the change; null for added lines. */
  fromQuantity: string | null;
  toQuantity: string | null;
  /** What the line changes the price by, before tax: negative for work taken off. */
  price: string;
};

/** A change order's priced lines and what it changes the job by. */
export type ChangeOrderSummary = {
  number: number;
  title: string;
  reason: string;
  lines: ChangeOrderLine[];
  /**
   * What the change adds before tax, its tax, and the two together: negative for a credit (work
   * taken off is worth more than work added).
   */
  priceBeforeTax: string;
  tax: string;
  total: string;
  /** The job's total before and after the change (tax included). */
  previousJobTotal: string;
  newJobTotal: string;
};

export type ChangeOrderView = ChangeOrderSummary & {
  id: string;
  jobId: string;
  status: ChangeOrderStatus;
  versionNumber: number;
  contentSha256: string;
  /** What the change does to the job's cost: Σ extended cost added less Σ taken off. */
  cost: string;
  sentTo: string | null;
  acceptedByName: string | null;
  acceptedAt: string | null;
  declinedAt: string | null;
  createdAt: string;
};
