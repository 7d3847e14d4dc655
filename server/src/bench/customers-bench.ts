import { ClsService } from 'nestjs-cls';
import { AsyncLocalStorage } from 'node:async_hooks';
import { performance } from 'node:perf_hooks';
import type { DataSource } from 'typeorm';
import { TenantContext } from '../common/tenancy/tenant-context';
import { TenantRepositories } from '../common/tenancy/tenant-repository';
import { CustomersService } from '../customers/customers.service';
import type { CustomerListQueryDto } from '../customers/dto/customer.dto';
import { runWithDataSource } from '../database/with-data-source';

const CUSTOMER_COUNT = 10_000;
const RUNS = 20;
const GOAL_MS = 100;

/**
 * `npm run bench:customers`: seeds a throwaway company with 10,000 customers in the test database, times
 * the customer list through the real service (median of 20 after a warm-up) and removes the company again.
 */
runWithDataSource('bench:customers', async (dataSource) => {
  await dataSource.runMigrations({ transaction: 'each' });
  const companyId = await seedCompany(dataSource);
  try {
    const tenant = new TenantContext(new ClsService(new AsyncLocalStorage()));
    const service = new CustomersService(
      new TenantRepositories(dataSource, tenant),
      tenant,
      dataSource,
    );
    const cases: Array<[string, CustomerListQueryDto]> = [
      ['page 1, by name', { page: 1, pageSize: 25 }],
      ['middle page (200 of 400)', { page: 200, pageSize: 25 }],
      ['search "fen"', { q: 'fen', page: 1, pageSize: 25 }],
      ['search by phone "555-04"', { q: '555-04', page: 1, pageSize: 25 }],
      ['newest first, page 10', { sort: 'createdAt', order: 'desc', page: 10, pageSize: 50 }],
      ['name descending, page 1, 100 a page', { sort: 'name', order: 'desc', pageSize: 100 }],
    ];
    const lines = [`${CUSTOMER_COUNT} customers, median of ${RUNS} runs, goal < ${GOAL_MS} ms`];
    for (const [label, query] of cases) {
      const timings: number[] = [];
      let total = 0;
      await tenant.run(companyId, async () => {
        await service.list(query);
        for (let run = 0; run < RUNS; run++) {
          const started = performance.now();
          total = (await service.list(query)).total;
          timings.push(performance.now() - started);
        }
      });
      const ms = median(timings);
      const verdict = ms < GOAL_MS ? 'ok' : 'OVER GOAL';
      lines.push(
        `  ${label.padEnd(38)} ${ms.toFixed(1).padStart(7)} ms  (${total} matches)  ${verdict}`,
      );
    }
    return lines.join('\n');
  } finally {
    await dataSource.query('DELETE FROM companies WHERE id = $1', [companyId]);
  }
});

/** A company with invented customers: names from syllables, sequential phones, a site for every third. */
async function seedCompany(dataSource: DataSource): Promise<string> {
  const [company] = (await dataSource.query(
    `INSERT INTO companies (name) VALUES ($1) RETURNING id`,
    [`Bench Ponds ${Date.now()}`],
  )) as Array<{ id: string }>;
  const companyId = company!.id;
  await dataSource.query(
    `INSERT INTO customers (company_id, name, phone, email, created_at, updated_at)
     SELECT $1,
            (ARRAY['Ash','Bram','Cor','Dell','Elm','Fen','Gale','Hollis','Ivo','Jory'])[1 + i % 10] || ' ' ||
            (ARRAY['brook','wood','marsh','field','stone','reed','moss','well'])[1 + (i / 10) % 8] ||
            (ARRAY['er','ley','ton','by','ford'])[1 + (i / 80) % 5] || ' ' || i,
            '555-' || lpad((i % 10000)::text, 4, '0'),
            'customer' || i || '@example.test',
            now() - (i || ' minutes')::interval,
            now() - (i || ' minutes')::interval
     FROM generate_series(1, $2::int) AS i`,
    [companyId, CUSTOMER_COUNT],
  );
  await dataSource.query(
    `INSERT INTO sites (company_id, customer_id, address_line)
     SELECT company_id, id, 'Bench site' FROM customers
     WHERE company_id = $1 AND right(email, 14) LIKE '%3@example.test'`,
    [companyId],
  );
  await dataSource.query('ANALYZE customers; ANALYZE sites');
  return companyId;
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[middle]! : (sorted[middle - 1]! + sorted[middle]!) / 2;
}
