import type { CustomerDetail, CustomerPage, CustomerSummary, SiteView } from '@pondwright/shared';

export function buildCustomerSummary(overrides: Partial<CustomerSummary> = {}): CustomerSummary {
  return {
    id: '7d0c3c4e-1111-4a5b-9c1d-000000000001',
    name: 'Odile Brackenridge',
    phone: '555-0141',
    email: 'odile.b@example.test',
    siteCount: 1,
    createdAt: '2026-03-02T10:00:00.000Z',
    updatedAt: '2026-03-04T10:00:00.000Z',
    ...overrides,
  };
}

export function buildSite(overrides: Partial<SiteView> = {}): SiteView {
  return {
    id: '7d0c3c4e-2222-4a5b-9c1d-000000000001',
    customerId: '7d0c3c4e-1111-4a5b-9c1d-000000000001',
    label: 'Back garden',
    addressLine: '14 Alder Row',
    city: 'Fernhollow',
    region: '',
    postalCode: '',
    accessWidthIn: 36,
    carryDistanceFt: 80,
    slopePct: 3,
    soil: 'clay',
    waterAvailable: true,
    powerAvailable: null,
    utilitiesLocated: false,
    notes: 'Side gate; soft lawn after rain.',
    createdAt: '2026-03-02T10:00:00.000Z',
    updatedAt: '2026-03-02T10:00:00.000Z',
    ...overrides,
  };
}

export function buildCustomerDetail(overrides: Partial<CustomerDetail> = {}): CustomerDetail {
  const sites = overrides.sites ?? [buildSite()];
  return { ...buildCustomerSummary(), notes: '', siteCount: sites.length, sites, ...overrides };
}

export function buildCustomerPage(
  items: CustomerSummary[],
  overrides: Partial<CustomerPage> = {},
): CustomerPage {
  return { items, total: items.length, page: 1, pageSize: 25, ...overrides };
}
