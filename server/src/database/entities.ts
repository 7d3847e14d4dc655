import { ChangeOrder } from '../change-orders/entities/change-order.entity';
import { LoginFailure } from '../auth/entities/login-failure.entity';
import { QuoteTokenFailure } from '../quotes/entities/quote-token-failure.entity';
import { RefreshToken } from '../auth/entities/refresh-token.entity';
import { CompanyLogo } from '../companies/entities/company-logo.entity';
import { Company } from '../companies/entities/company.entity';
import { Crew } from '../crews/entities/crew.entity';
import { Customer } from '../customers/entities/customer.entity';
import { Site } from '../customers/entities/site.entity';
import { EstimateDraft } from '../estimates/entities/estimate-draft.entity';
import { EstimateEvent } from '../estimates/entities/estimate-event.entity';
import { EstimateVersion } from '../estimates/entities/estimate-version.entity';
import { Estimate } from '../estimates/entities/estimate.entity';
import { Invite } from '../invites/entities/invite.entity';
import { Invoice } from '../invoices/entities/invoice.entity';
import { JobLog } from '../jobs/entities/job-log.entity';
import { JobScheduleChange } from '../jobs/entities/job-schedule-change.entity';
import { Job } from '../jobs/entities/job.entity';
import { OutboxMessage } from '../mail/entities/outbox-message.entity';
import { PaymentEvent } from '../payments/entities/payment-event.entity';
import { Payment } from '../payments/entities/payment.entity';
import { JobPhoto } from '../photos/entities/job-photo.entity';
import { PriceBookVersion } from '../price-book/entities/price-book-version.entity';
import { PricedTakeoff } from '../priced-takeoffs/entities/priced-takeoff.entity';
import { QuoteAcceptance } from '../quotes/entities/quote-acceptance.entity';
import { QuoteDecline } from '../quotes/entities/quote-decline.entity';
import { QuoteLink } from '../quotes/entities/quote-link.entity';
import { User } from '../users/entities/user.entity';

export const entities = [
  Company,
  User,
  Invite,
  RefreshToken,
  LoginFailure,
  QuoteTokenFailure,
  PriceBookVersion,
  PricedTakeoff,
  Customer,
  Site,
  Estimate,
  EstimateDraft,
  EstimateVersion,
  EstimateEvent,
  CompanyLogo,
  OutboxMessage,
  QuoteLink,
  QuoteAcceptance,
  QuoteDecline,
  Payment,
  PaymentEvent,
  Crew,
  Job,
  JobScheduleChange,
  JobLog,
  JobPhoto,
  Invoice,
  ChangeOrder,
];
