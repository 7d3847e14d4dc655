import { z } from 'zod';
import type { TakeoffInput } from '../engine/schemas/takeoff-input';
import type { Takeoff } from '../engine/schemas/takeoff-output';
import type { PricedLineChange, PricedTotalChange } from '../pricing/price-book-diff';
import type { PricedEstimate } from '../pricing/priced-estimate-schema';
import type { LineReduction } from '../pricing/reduce-lines';

/**
 * Estimates: a working draft the estimator saves, numbered immutable versions, and the owner's
 * approval. Zod rules and response types only: the engine and pricing stay out of the main bundle
 * (their types are imported as types).
 */
export const ESTIMATE_STATUSES = [
  'draft',
  'awaiting_approval',
  'approved',
  'sent',
  'viewed',
  'accepted',
  'declined',
  'expired',
] as const;
export const estimateStatusSchema = z.enum(ESTIMATE_STATUSES);
export type EstimateStatus = z.infer<typeof estimateStatusSchema>;

const decimalPattern = (decimals: number) => new RegExp(`^\\d{1,9}(\\.\\d{1,${decimals}})?$`);

/** `POST /api/estimates`: the estimate's title and customer, optionally a site and a takeoff input. */
export const createEstimateRequestSchema = z
  .object({
    title: z
      .string({ error: 'Enter a title' })
      .trim()
      .min(1, 'Enter a title')
      .max(160, 'Use at most 160 characters'),
    customerId: z.uuid({ error: 'Choose a customer' }),
    siteId: z.uuid({ error: 'Choose a site' }).nullable().optional(),
    /** Checked by the takeoff engine on the server; a typical pond when left out. */
    input: z.unknown().optional(),
  })
  .strict();
export type CreateEstimateRequest = z.infer<typeof createEstimateRequestSchema>;

/**
 * A line the estimator adds by hand; priced with the policy's markup for its category. Figures the
 * client may have computed (extended cost, price) are not part of it and are dropped.
 */
export const manualLineSchema = z.object({
  id: z
    .string({ error: 'Give the line an id' })
    .regex(/^[A-Za-z0-9_-]{1,40}$/, 'Use 1 to 40 letters, digits, - or _'),
  category: z.enum(['materials', 'labor', 'equipment', 'disposal', 'other'], {
    error: 'Choose a category',
  }),
  description: z
    .string({ error: 'Describe the line' })
    .trim()
    .min(1, 'Describe the line')
    .max(200, 'Use at most 200 characters'),
  quantity: z
    .string({ error: 'Enter a quantity' })
    .trim()
    .regex(decimalPattern(2), 'Enter a quantity such as 3 or 2.5'),
  unit: z
    .string({ error: 'Enter a unit' })
    .trim()
    .min(1, 'Enter a unit')
    .max(20, 'Use at most 20 characters'),
  unitCost: z
    .string({ error: 'Enter a unit cost' })
    .trim()
    .regex(decimalPattern(4), 'Enter a unit cost such as 12.50'),
  taxable: z.boolean({ error: 'Say whether the line is taxable' }),
  kind: z.enum(['base', 'add-on', 'alternate'], { error: 'Choose base, add-on or alternate' }),
});
export type ManualLine = z.infer<typeof manualLineSchema>;

/**
 * The draft's content as the estimator edits it. The server computes every figure from it; unknown keys
 * (a total the client worked out, say) are dropped rather than refused, and never stored.
 */
export const estimateContentSchema = z.object({
  title: z
    .string({ error: 'Enter a title' })
    .trim()
    .min(1, 'Enter a title')
    .max(160, 'Use at most 160 characters'),
  customerId: z.uuid({ error: 'Choose a customer' }),
  siteId: z.uuid({ error: 'Choose a site' }).nullable(),
  /** The takeoff input, checked by the engine on the server (errors name `input.<path>`). */
  input: z.unknown(),
  discountPct: z
    .string({ error: 'Enter a discount' })
    .trim()
    .regex(/^\d{1,3}(\.\d{1,2})?$/, 'Enter a percentage such as 5 or 2.5')
    .refine((value) => Number(value) <= 100, 'Enter at most 100 %'),
  manualLines: z
    .array(manualLineSchema)
    .max(200, 'Use at most 200 manual lines')
    .refine(
      (lines) => new Set(lines.map((line) => line.id)).size === lines.length,
      'Each manual line needs its own id',
    ),
  scope: z.string().max(20_000, 'Use at most 20000 characters'),
  notes: z.string().max(20_000, 'Use at most 20000 characters'),
});
export type EstimateContent = Omit<z.infer<typeof estimateContentSchema>, 'input'> & {
  input: TakeoffInput;
  /**
   * Work credited by accepted or pending change orders: priced lines of the version repriced at a
   * smaller quantity (`reducePricedLines`). Only change orders set it; a draft never carries it.
   */
  lineReductions?: LineReduction[];
};

/** `PUT /api/estimates/:id/draft`: the content plus the draft revision it was edited from. */
export const saveDraftRequestSchema = estimateContentSchema.extend({
  revision: z.number({ error: 'Send the revision you edited' }).int().min(1),
});

/** `POST /api/estimates/:id/finalise`: the revision being frozen, so a stale copy is never finalised. */
export const finaliseEstimateRequestSchema = z
  .object({ revision: z.number({ error: 'Send the revision you edited' }).int().min(1) })
  .strict();

/** `POST /api/estimates/:id/send-back`: the owner says what to change. */
export const sendBackEstimateRequestSchema = z
  .object({
    comment: z
      .string({ error: 'Say what needs to change' })
      .trim()
      .min(1, 'Say what needs to change')
      .max(2000, 'Use at most 2000 characters'),
  })
  .strict();

/** What the server computes from the content; stored beside it and never taken from the client. */
export type EstimateComputed = { takeoff: Takeoff; priced: PricedEstimate };

export type EstimateDraftView = {
  revision: number;
  content: EstimateContent;
  computed: EstimateComputed;
  priceBookVersionId: string;
  updatedByName: string;
  updatedAt: string;
};

export type EstimateVersionSummary = {
  versionNumber: number;
  contentSha256: string;
  total: string;
  grossMarginPct: string | null;
  finalisedByName: string;
  finalisedAt: string;
};

export type EstimateVersionView = EstimateVersionSummary & {
  content: EstimateContent;
  computed: EstimateComputed;
  priceBookVersionId: string;
};

/** How many of the latest audit-log entries an estimate's view carries (see `EstimateView.events`). */
export const ESTIMATE_VIEW_EVENT_LIMIT = 50;

export type EstimateEventView = {
  id: string;
  action: string;
  actorName: string;
  detail: Record<string, unknown>;
  createdAt: string;
};

export type EstimateListItem = {
  id: string;
  number: number;
  title: string;
  customerName: string;
  status: EstimateStatus;
  total: string;
  grossMarginPct: string | null;
  updatedAt: string;
};

export type EstimateListPage = {
  items: EstimateListItem[];
  total: number;
  page: number;
  pageSize: number;
};

export type EstimateView = {
  id: string;
  number: number;
  title: string;
  customerId: string;
  customerName: string;
  siteId: string | null;
  status: EstimateStatus;
  createdAt: string;
  updatedAt: string;
  draft: EstimateDraftView;
  versions: EstimateVersionSummary[];
  /**
   * The audit log's latest `ESTIMATE_VIEW_EVENT_LIMIT` entries, oldest first. An estimate saved all
   * day would otherwise send its whole history with every open and every save;
   * `GET /api/estimates/:id/events` has all of it.
   */
  events: EstimateEventView[];
  /** How many entries the audit log holds in all. */
  eventCount: number;
  /** The job made from this estimate once accepted; null until then. */
  jobId: string | null;
};

/** The 409 body for a save or finalise from a stale copy: the current draft, so nothing is lost. */
export type StaleDraftBody = {
  statusCode: 409;
  error: string;
  code: 'STALE_DRAFT';
  message: string;
  details?: Array<{ field: string; message: string }>;
  current: EstimateDraftView;
};

export type EstimateComparison = {
  a: EstimateVersionSummary;
  b: EstimateVersionSummary;
  lines: PricedLineChange[];
  totals: PricedTotalChange[];
};

export type ApprovalQueueItem = {
  estimateId: string;
  number: number;
  title: string;
  customerName: string;
  versionNumber: number;
  total: string;
  grossMarginPct: string | null;
  reasons: Array<{ code: string; message: string }>;
  finalisedByName: string;
  finalisedAt: string;
};
