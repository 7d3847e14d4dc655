import {
  createEstimateRequestSchema,
  finaliseEstimateRequestSchema,
  saveDraftRequestSchema,
  sendBackEstimateRequestSchema,
} from '@pondwright/shared';
import { z } from 'zod';

/** OpenAPI bodies generated from the shared zod schemas, so the contract is written once. */
const bodyDoc = (schema: z.ZodType) =>
  z.toJSONSchema(schema, { io: 'input', unrepresentable: 'any' }) as object;

export const createEstimateBodyDoc = bodyDoc(createEstimateRequestSchema);
export const saveDraftBodyDoc = bodyDoc(saveDraftRequestSchema);
export const finaliseEstimateBodyDoc = bodyDoc(finaliseEstimateRequestSchema);
export const sendBackEstimateBodyDoc = bodyDoc(sendBackEstimateRequestSchema);
