import { LoginFailure } from '../auth/entities/login-failure.entity';
import { RefreshToken } from '../auth/entities/refresh-token.entity';
import { Company } from '../companies/entities/company.entity';
import { Customer } from '../customers/entities/customer.entity';
import { Site } from '../customers/entities/site.entity';
import { EstimateDraft } from '../estimates/entities/estimate-draft.entity';
import { EstimateEvent } from '../estimates/entities/estimate-event.entity';
import { EstimateVersion } from '../estimates/entities/estimate-version.entity';
import { Estimate } from '../estimates/entities/estimate.entity';
import { Invite } from '../invites/entities/invite.entity';
import { PriceBookVersion } from '../price-book/entities/price-book-version.entity';
import { PricedTakeoff } from '../priced-takeoffs/entities/priced-takeoff.entity';
import { User } from '../users/entities/user.entity';

export const entities = [
  Company,
  User,
  Invite,
  RefreshToken,
  LoginFailure,
  PriceBookVersion,
  PricedTakeoff,
  Customer,
  Site,
  Estimate,
  EstimateDraft,
  EstimateVersion,
  EstimateEvent,
];
