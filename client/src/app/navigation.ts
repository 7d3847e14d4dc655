import type { Role } from '@pondwright/shared';
import {
  IconAddressBook,
  IconBook2,
  IconBuildingStore,
  IconFileInvoice,
  IconHome2,
  IconMail,
  IconNotebook,
  IconReceipt2,
  IconRulerMeasure,
  IconShovel,
  IconUsersGroup,
} from '@tabler/icons-react';
import type { AppNavItem } from '@/components/layouts/app-layout';
import { paths } from '@/config/paths';
import { ApprovalsNavIcon } from '@/features/approvals/components/approvals-nav-icon';
import { canAccess, type Area } from '@/lib/authorization';

const NAV_ITEMS: Array<AppNavItem & { area: Area }> = [
  { label: 'Home', to: paths.home.getHref(), icon: IconHome2, area: 'home' },
  { label: 'Customers', to: paths.customers.getHref(), icon: IconAddressBook, area: 'customers' },
  { label: 'Takeoff', to: paths.takeoff.getHref(), icon: IconRulerMeasure, area: 'takeoff' },
  {
    label: 'Priced takeoffs',
    to: paths.pricedTakeoffs.getHref(),
    icon: IconReceipt2,
    area: 'pricedTakeoffs',
  },
  { label: 'Estimates', to: paths.estimates.getHref(), icon: IconFileInvoice, area: 'estimates' },
  { label: 'Jobs', to: paths.jobs.getHref(), icon: IconShovel, area: 'jobs' },
  { label: 'Price book', to: paths.priceBook.getHref(), icon: IconBook2, area: 'priceBook' },
  { label: 'Approvals', to: paths.approvals.getHref(), icon: ApprovalsNavIcon, area: 'approvals' },
  { label: 'Team', to: paths.team.getHref(), icon: IconUsersGroup, area: 'team' },
  { label: 'Company', to: paths.company.getHref(), icon: IconBuildingStore, area: 'company' },
];

/** A crew lead's day starts here: today's jobs, each with its log, and anything not sent yet. */
const CREW_LEAD_ITEM: AppNavItem = {
  label: 'My jobs',
  description: 'Today’s log',
  to: paths.myJobs.getHref(),
  icon: IconNotebook,
};

/** Shown only where the server has a developer mailbox (never in production, where it answers 404). */
const MAILBOX_ITEM: AppNavItem & { area: Area } = {
  label: 'Mailbox (dev)',
  to: paths.devMailbox.getHref(),
  icon: IconMail,
  area: 'devMailbox',
};

type NavOptions = {
  /** The server answered `GET /api/dev/mailbox` with 200. */
  mailbox?: boolean;
};

export function navItemsFor(role: Role, { mailbox = false }: NavOptions = {}): AppNavItem[] {
  const items = mailbox ? [...NAV_ITEMS, MAILBOX_ITEM] : NAV_ITEMS;
  const allowed = items
    .filter((item) => canAccess(role, item.area))
    .map(({ area: _area, ...item }) => item);
  if (role !== 'crew_lead') return allowed;
  // Right under Home, where a phone's thumb finds it first.
  return allowed.flatMap((item) =>
    item.to === paths.home.getHref() ? [item, CREW_LEAD_ITEM] : [item],
  );
}
