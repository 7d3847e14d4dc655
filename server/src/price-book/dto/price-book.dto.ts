import {
  materialSchema,
  priceBookSchema,
  pricingPolicySchema,
  type Material,
  type PriceBook,
  type PriceCategory,
  type PricingPolicy,
} from '@pondwright/shared/pricing';
import { z } from 'zod';
import { effectiveDateSchema, versionNoteSchema } from '../effective-date';
import { openApiBody } from '../../common/validation/openapi-body';

/**
 * The price book's request bodies. They wrap the shared zod schemas (one contract per shape) and are
 * validated in the service, so each problem comes back with its dotted path, e.g. `book.materials.3.unitCost`.
 * Unknown keys are refused, as the global ValidationPipe does for class DTOs.
 */
export const savePriceBookRequestSchema = z
  .object({
    book: priceBookSchema,
    effectiveDate: effectiveDateSchema.optional(),
    note: versionNoteSchema.optional(),
  })
  .strict();
export type SavePriceBookRequest = z.infer<typeof savePriceBookRequestSchema>;

export const savePolicyRequestSchema = z
  .object({
    policy: pricingPolicySchema,
    effectiveDate: effectiveDateSchema.optional(),
    note: versionNoteSchema.optional(),
  })
  .strict();
export type SavePolicyRequest = z.infer<typeof savePolicyRequestSchema>;

/** About 4 MB of text: a full book (5,000 materials) exported to CSV fits with room to spare. */
export const MAX_IMPORT_CSV_CHARS = 4_000_000;

export const importPriceBookRequestSchema = z
  .object({
    csv: z
      .string({ error: 'Paste or upload the CSV text' })
      .min(1, 'The CSV is empty')
      .max(MAX_IMPORT_CSV_CHARS, 'The CSV is too large'),
    effectiveDate: effectiveDateSchema.optional(),
    note: versionNoteSchema.optional(),
  })
  .strict();
export type ImportPriceBookRequest = z.infer<typeof importPriceBookRequestSchema>;

/** A version has taken effect (current), is waiting for its date (scheduled), or was replaced. */
export type PriceBookVersionStatus = 'current' | 'scheduled' | 'superseded';

export type PriceBookVersionSummary = {
  id: string;
  versionNumber: number;
  effectiveDate: string;
  status: PriceBookVersionStatus;
  authorName: string;
  note: string;
  createdAt: string;
};

export type PriceBookVersionListItem = PriceBookVersionSummary & {
  /** Changes against the version numbered one lower; 0 for version 1. */
  changeCount: number;
};

export type PriceBookVersionView = PriceBookVersionSummary & { book: PriceBook };

export type PricingPolicyView = {
  versionId: string;
  versionNumber: number;
  effectiveDate: string;
  policy: PricingPolicy;
  /** The gross margin each category's markup yields, %, as a decimal string. */
  marginPct: Record<PriceCategory, string>;
};

/** What a crew lead may see of a material: everything but its cost. */
export type CostFreeMaterial = Omit<Material, 'unitCost'>;

export type MaterialsView = {
  versionNumber: number;
  effectiveDate: string;
  materials: Array<Material | CostFreeMaterial>;
};

/** An import problem: `field` reads "line 7, column unitCost"; line and column are given apart too. */
export type CsvImportProblem = { field: string; line: number; column: string; message: string };

export const savePriceBookBodyDoc = openApiBody(savePriceBookRequestSchema);
export const savePolicyBodyDoc = openApiBody(savePolicyRequestSchema);
export const importPriceBookBodyDoc = openApiBody(importPriceBookRequestSchema);
export const materialDoc = openApiBody(materialSchema);
