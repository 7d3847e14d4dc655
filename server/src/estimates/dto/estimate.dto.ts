import {
  createEstimateRequestSchema,
  finaliseEstimateRequestSchema,
  saveDraftRequestSchema,
  sendBackEstimateRequestSchema,
} from '@pondwright/shared';
import { openApiBody } from '../../common/validation/openapi-body';

export const createEstimateBodyDoc = openApiBody(createEstimateRequestSchema);
export const saveDraftBodyDoc = openApiBody(saveDraftRequestSchema);
export const finaliseEstimateBodyDoc = openApiBody(finaliseEstimateRequestSchema);
export const sendBackEstimateBodyDoc = openApiBody(sendBackEstimateRequestSchema);
