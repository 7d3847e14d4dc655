import { Foundation1796083200000 } from './1796083200000-foundation';
import { CompanyUnitSystem1796086800000 } from './1796086800000-company-unit-system';
import { PriceBookVersions1796090400000 } from './1796090400000-price-book-versions';
import { PricedTakeoffs1796094000000 } from './1796094000000-priced-takeoffs';
import { CustomersAndSites1796097600000 } from './1796097600000-customers-and-sites';
import { Estimates1796101200000 } from './1796101200000-estimates';
import { QuotesPaymentsOutbox1796104800000 } from './1796104800000-quotes-payments-outbox';
import { Jobs1796108400000 } from './1796108400000-jobs';
import { JobPhotos1796112000000 } from './1796112000000-job-photos';
import { Invoices1796115600000 } from './1796115600000-invoices';
import { ChangeOrders1796119200000 } from './1796119200000-change-orders';
import { ChangeOrderCredits1796122800000 } from './1796122800000-change-order-credits';
import { OutboxRetries1796126400000 } from './1796126400000-outbox-retries';
import { QuoteTerms1796130000000 } from './1796130000000-quote-terms';
import { QuoteTokenFailures1796133600000 } from './1796133600000-quote-token-failures';
import { EstimatesListOrder1796137200000 } from './1796137200000-estimates-list-order';

/** Every migration, oldest first. A new migration is added here as well as in its own file. */
export const migrations = [
  Foundation1796083200000,
  CompanyUnitSystem1796086800000,
  PriceBookVersions1796090400000,
  PricedTakeoffs1796094000000,
  CustomersAndSites1796097600000,
  Estimates1796101200000,
  QuotesPaymentsOutbox1796104800000,
  Jobs1796108400000,
  JobPhotos1796112000000,
  Invoices1796115600000,
  ChangeOrders1796119200000,
  ChangeOrderCredits1796122800000,
  OutboxRetries1796126400000,
  QuoteTerms1796130000000,
  QuoteTokenFailures1796133600000,
  EstimatesListOrder1796137200000,
];
