import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import {
  customerListQuerySchema,
  type CreateSiteInput,
  type CustomerDetail,
  type CustomerPage,
  type CustomerSummary,
  type SiteView,
  type UpdateSiteInput,
} from '@pondwright/shared';
import { DataSource, type EntityManager } from 'typeorm';
import { AppError } from '../common/errors/app-error';
import { TenantContext } from '../common/tenancy/tenant-context';
import {
  isUuid,
  TenantRepositories,
  type TenantRepository,
} from '../common/tenancy/tenant-repository';
import type {
  CreateCustomerDto,
  CustomerListQueryDto,
  UpdateCustomerDto,
} from './dto/customer.dto';
import { Customer } from './entities/customer.entity';
import { Site } from './entities/site.entity';
import { Estimate } from '../estimates/entities/estimate.entity';

/** Sort keys map to fixed SQL; the `id` tie-break keeps pages stable when names or times repeat. */
const ORDER_BY = {
  name: (direction: string) => `lower(name) ${direction}, id ${direction}`,
  createdAt: (direction: string) => `created_at ${direction}, id ${direction}`,
  updatedAt: (direction: string) => `updated_at ${direction}, id ${direction}`,
} as const;

type SummaryRow = {
  id: string;
  name: string;
  phone: string;
  email: string;
  site_count: number;
  created_at: Date;
  updated_at: Date;
  total: string;
};

/** Customers and their sites, always within the caller's company. */
@Injectable()
export class CustomersService {
  private readonly customers: TenantRepository<Customer>;
  private readonly sites: TenantRepository<Site>;

  constructor(
    repositories: TenantRepositories,
    private readonly tenant: TenantContext,
    @InjectDataSource() private readonly dataSource: DataSource,
  ) {
    this.customers = repositories.for(Customer);
    this.sites = repositories.for(Site);
  }

  /**
   * One page of customers. Search is a case-insensitive "contains" over name, e-mail and phone, on the
   * same expression the trigram index covers; the total comes from a window count in the same round trip.
   */
  async list(rawQuery: CustomerListQueryDto): Promise<CustomerPage> {
    const query = customerListQuerySchema.parse(rawQuery);
    const companyId = this.tenant.companyId;
    const search = query.q ? `%${escapeLike(query.q.toLowerCase())}%` : null;
    const orderBy = ORDER_BY[query.sort](query.order === 'desc' ? 'DESC' : 'ASC');
    const where = `company_id = $1 AND ($2::text IS NULL OR lower(name || ' ' || email || ' ' || phone) ILIKE $2)`;
    const rows = (await this.dataSource.query(
      `WITH page AS (
         SELECT id, name, phone, email, created_at, updated_at, count(*) OVER () AS total
         FROM customers WHERE ${where}
         ORDER BY ${orderBy} LIMIT $3 OFFSET $4
       )
       SELECT page.*, (SELECT count(*)::int FROM sites WHERE sites.customer_id = page.id) AS site_count
       FROM page ORDER BY ${orderBy}`,
      [companyId, search, query.pageSize, (query.page - 1) * query.pageSize],
    )) as SummaryRow[];
    // Past the last page the window count has no row to ride on; count separately only then.
    const total = rows.length
      ? Number(rows[0]!.total)
      : query.page === 1
        ? 0
        : Number(
            (
              (await this.dataSource.query(
                `SELECT count(*) AS total FROM customers WHERE ${where}`,
                [companyId, search],
              )) as Array<{ total: string }>
            )[0]!.total,
          );
    return {
      items: rows.map(toSummaryFromRow),
      total,
      page: query.page,
      pageSize: query.pageSize,
    };
  }

  async get(id: string): Promise<CustomerDetail> {
    const customer = await this.customers.getById(id, 'Customer');
    const sites = await this.sites.find({
      where: { customerId: customer.id },
      order: { createdAt: 'ASC', id: 'ASC' },
    });
    return toDetail(customer, sites);
  }

  /** Creates the customer and any sites sent with it in one transaction: all saved, or nothing. */
  async create(input: CreateCustomerDto): Promise<CustomerDetail> {
    const { sites: siteInputs = [], ...fields } = input;
    const { customer, sites } = await this.dataSource.transaction(async (manager) => {
      const customer = await this.customers.save(this.customers.create(fields), manager);
      const sites: Site[] = [];
      for (const siteInput of siteInputs) {
        sites.push(await this.saveNewSite(customer.id, siteInput, manager));
      }
      return { customer, sites };
    });
    return toDetail(customer, sites);
  }

  async update(id: string, change: UpdateCustomerDto): Promise<CustomerDetail> {
    const customer = await this.customers.getById(id, 'Customer');
    for (const key of ['name', 'phone', 'email', 'notes'] as const) {
      if (change[key] !== undefined) customer[key] = change[key];
    }
    await this.customers.save(customer);
    return this.get(customer.id);
  }

  /**
   * Removes the customer and its sites. A customer with estimates is refused (409) rather than
   * cascading them away: estimates carry quotes, acceptances and jobs, the company's records.
   */
  async remove(id: string): Promise<void> {
    const customer = await this.customers.getById(id, 'Customer');
    await this.dataSource.transaction(async (manager) => {
      const estimates = await manager.countBy(Estimate, {
        customerId: customer.id,
        companyId: customer.companyId,
      });
      if (estimates > 0) {
        throw new AppError(
          'CUSTOMER_HAS_ESTIMATES',
          `This customer has ${estimates === 1 ? 'an estimate' : `${estimates} estimates`}, so they stay on file. Their estimates and jobs keep their details.`,
        );
      }
      await manager
        .getRepository(Customer)
        .delete({ id: customer.id, companyId: customer.companyId });
    });
  }

  async addSite(customerId: string, input: CreateSiteInput): Promise<SiteView> {
    const customer = await this.customers.getById(customerId, 'Customer');
    const site = await this.dataSource.transaction((manager) =>
      this.saveNewSite(customer.id, input, manager),
    );
    return toSiteView(site);
  }

  async updateSite(customerId: string, siteId: string, change: UpdateSiteInput): Promise<SiteView> {
    const site = await this.getSite(customerId, siteId);
    applySiteFields(site, change);
    return toSiteView(await this.sites.save(site));
  }

  async removeSite(customerId: string, siteId: string): Promise<void> {
    const site = await this.getSite(customerId, siteId);
    await this.dataSource.getRepository(Site).delete({ id: site.id, companyId: site.companyId });
  }

  private async getSite(customerId: string, siteId: string): Promise<Site> {
    const customer = await this.customers.getById(customerId, 'Customer');
    const site = isUuid(siteId)
      ? await this.sites.findOneBy({ id: siteId, customerId: customer.id })
      : null;
    if (!site) throw new AppError('NOT_FOUND', 'Site not found');
    return site;
  }

  private saveNewSite(
    customerId: string,
    input: CreateSiteInput,
    manager: EntityManager,
  ): Promise<Site> {
    const site = this.sites.create({ customerId, addressLine: input.addressLine });
    applySiteFields(site, input);
    return this.sites.save(site, manager);
  }
}

function applySiteFields(site: Site, change: UpdateSiteInput): void {
  const textKeys = ['label', 'addressLine', 'city', 'region', 'postalCode', 'notes'] as const;
  for (const key of textKeys) if (change[key] !== undefined) site[key] = change[key];
  const measureKeys = ['accessWidthIn', 'carryDistanceFt', 'slopePct'] as const;
  for (const key of measureKeys) {
    const value = change[key];
    if (value !== undefined) site[key] = value === null ? null : String(value);
  }
  if (change.soil !== undefined) site.soil = change.soil;
  if (change.waterAvailable !== undefined) site.waterAvailable = change.waterAvailable;
  if (change.powerAvailable !== undefined) site.powerAvailable = change.powerAvailable;
  if (change.utilitiesLocated !== undefined) site.utilitiesLocated = change.utilitiesLocated;
}

/** `%`, `_` and `\` typed by a person are searched for literally. */
function escapeLike(text: string): string {
  return text.replace(/[\\%_]/g, (character) => `\\${character}`);
}

function toSummaryFromRow(row: SummaryRow): CustomerSummary {
  return {
    id: row.id,
    name: row.name,
    phone: row.phone,
    email: row.email,
    siteCount: row.site_count,
    createdAt: new Date(row.created_at).toISOString(),
    updatedAt: new Date(row.updated_at).toISOString(),
  };
}

function toDetail(customer: Customer, sites: Site[]): CustomerDetail {
  return {
    id: customer.id,
    name: customer.name,
    phone: customer.phone,
    email: customer.email,
    notes: customer.notes,
    siteCount: sites.length,
    createdAt: customer.createdAt.toISOString(),
    updatedAt: customer.updatedAt.toISOString(),
    sites: sites.map(toSiteView),
  };
}

function toNumber(value: string | null): number | null {
  return value === null ? null : Number(value);
}

function toSiteView(site: Site): SiteView {
  return {
    id: site.id,
    customerId: site.customerId,
    label: site.label,
    addressLine: site.addressLine,
    city: site.city,
    region: site.region,
    postalCode: site.postalCode,
    accessWidthIn: toNumber(site.accessWidthIn),
    carryDistanceFt: toNumber(site.carryDistanceFt),
    slopePct: toNumber(site.slopePct),
    soil: site.soil,
    waterAvailable: site.waterAvailable,
    powerAvailable: site.powerAvailable,
    utilitiesLocated: site.utilitiesLocated,
    notes: site.notes,
    createdAt: site.createdAt.toISOString(),
    updatedAt: site.updatedAt.toISOString(),
  };
}
