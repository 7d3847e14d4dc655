import type {
  PriceBookChange,
  PricedEstimate,
  PricedLineChange,
  PricedTotalChange,
} from '@pondwright/shared/pricing';

/** The price-book version a priced takeoff was (or would be) priced with. */
export type PricedWithVersion = { id: string; versionNumber: number; effectiveDate: string };

/** A takeoff saved with its price; it stands in for an estimate until estimates exist. */
export type PricedTakeoff = {
  id: string;
  name: string;
  input: unknown;
  takeoff: unknown;
  priced: PricedEstimate;
  priceBookVersion: PricedWithVersion;
  createdByName?: string;
  createdAt: string;
  repricedAt: string | null;
};

export type PricedTakeoffSummary = {
  id: string;
  name: string;
  total: string;
  versionNumber: number;
  createdAt: string;
  repricedAt?: string | null;
};

/** What pricing again with the latest book would change; nothing is saved by asking. */
export type RepricePreview = {
  currentVersion: PricedWithVersion;
  latestVersion: PricedWithVersion;
  upToDate: boolean;
  bookChanges: PriceBookChange[];
  estimateChanges: { lines: PricedLineChange[]; totals: PricedTotalChange[] };
  currentTotal: string;
  newTotal: string;
};
