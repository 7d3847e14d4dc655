import { updateQuoteTermsSchema } from '@pondwright/shared';
import { openApiBody } from '../../common/validation/openapi-body';

export const quoteTermsBodyDoc = openApiBody(updateQuoteTermsSchema);
