import type { Takeoff, TakeoffInput } from '@pondwright/shared/engine';
import type {
  PriceBookChange,
  PricedEstimate,
  PricedLineChange,
  PricedTotalChange,
} from '@pondwright/shared/pricing';
import { z } from 'zod';

/** `POST /priced-takeoffs`: a name and the takeoff input; the input is checked by the takeoff engine. */
export const createPricedTakeoffRequestSchema = z
  .object({
    name: z
      .string({ error: 'Enter a name' })
      .trim()
      .min(1, 'Enter a name')
      .max(120, 'Use at most 120 characters'),
    input: z.unknown(),
  })
  .strict();

export const createPricedTakeoffBodyDoc = z.toJSONSchema(createPricedTakeoffRequestSchema, {
  io: 'input',
  unrepresentable: 'any',
}) as object;

/** The price-book version a priced takeoff was (or would be) priced with. */
export type PricedWithVersion = { id: string; versionNumber: number; effectiveDate: string };

export type PricedTakeoffListItem = {
  id: string;
  name: string;
  /** The priced total, a decimal string with 2 decimals. */
  total: string;
  versionNumber: number;
  createdAt: string;
  repricedAt: string | null;
};

export type PricedTakeoffView = {
  id: string;
  name: string;
  input: TakeoffInput;
  takeoff: Takeoff;
  priced: PricedEstimate;
  priceBookVersion: PricedWithVersion;
  createdByName: string;
  createdAt: string;
  repricedAt: string | null;
};

/** What re-pricing with the book in effect today would change; asking saves nothing. */
export type RepricePreview = {
  currentVersion: PricedWithVersion;
  /** The version in effect today (a version scheduled for a later date is not used yet). */
  latestVersion: PricedWithVersion;
  upToDate: boolean;
  bookChanges: PriceBookChange[];
  estimateChanges: { lines: PricedLineChange[]; totals: PricedTotalChange[] };
  currentTotal: string;
  newTotal: string;
};
