import {
  acceptQuoteRequestSchema,
  declineQuoteRequestSchema,
  sendQuoteRequestSchema,
} from '@pondwright/shared';
import { openApiBody } from '../../common/validation/openapi-body';

export const sendQuoteBodyDoc = openApiBody(sendQuoteRequestSchema);
export const acceptQuoteBodyDoc = openApiBody(acceptQuoteRequestSchema);
export const declineQuoteBodyDoc = openApiBody(declineQuoteRequestSchema);
