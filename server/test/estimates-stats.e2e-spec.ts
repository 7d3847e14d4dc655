import type { EstimateStatus } from '@pondwright/shared';
import { randomBytes } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { EstimateStats } from '../src/estimates/estimates-stats.service';
import { addMember, bearer, createTestApp, signupCompany, type TestApp } from './support/test-app';

let testApp: TestApp;

beforeAll(async () => {
  testApp = await createTestApp();
});
afterAll(async () => {
  await testApp.close();
});

type Company = { companyId: string; userId: string; accessToken: string };

/** Only the figures the statistics read; the rest of a priced estimate is beside the point here. */
function computed(total: string, grossMarginPct: string | null) {
  return JSON.stringify({ priced: { totals: { total, grossMarginPct } } });
}

/**
 * Inserts an estimate straight into the tables, so every total and margin is chosen by hand: the
 * pricing that normally produces them is tested elsewhere.
 */
async function insertEstimate(
  company: Company,
  number: number,
  status: EstimateStatus,
  draftTotal: string,
  versions: Array<{ total: string; marginPct: string | null }> = [],
): Promise<void> {
  const { dataSource } = testApp;
  const [book] = (await dataSource.query(
    'SELECT id FROM price_book_versions WHERE company_id = $1 ORDER BY version_number DESC LIMIT 1',
    [company.companyId],
  )) as [{ id: string }];
  const [customer] = (await dataSource.query(
    'INSERT INTO customers (company_id, name) VALUES ($1, $2) RETURNING id',
    [company.companyId, `Stats Customer ${number}`],
  )) as [{ id: string }];
  const [estimate] = (await dataSource.query(
    `INSERT INTO estimates (company_id, number, title, customer_id, status, created_by)
     VALUES ($1, $2, $3, $4, $5, $6) RETURNING id`,
    [company.companyId, number, `Pond ${number}`, customer.id, status, company.userId],
  )) as [{ id: string }];
  await dataSource.query(
    `INSERT INTO estimate_drafts (estimate_id, revision, content, computed, price_book_version_id, updated_by)
     VALUES ($1, 1, '{}'::jsonb, $2::jsonb, $3, $4)`,
    [estimate.id, computed(draftTotal, null), book.id, company.userId],
  );
  for (const [index, version] of versions.entries()) {
    await dataSource.query(
      `INSERT INTO estimate_versions
         (estimate_id, version_number, content, computed, content_sha256, price_book_version_id, finalised_by)
       VALUES ($1, $2, '{}'::jsonb, $3::jsonb, $4, $5, $6)`,
      [
        estimate.id,
        index + 1,
        computed(version.total, version.marginPct),
        randomBytes(32).toString('hex'),
        book.id,
        company.userId,
      ],
    );
  }
}

async function statsOf(session: { accessToken: string }, expectedStatus = 200) {
  const response = await testApp
    .http()
    .get('/api/estimate-stats')
    .set(...bearer(session))
    .expect(expectedStatus);
  return response.body as EstimateStats;
}

function countsAndValues(stats: EstimateStats) {
  return Object.fromEntries(stats.byStatus.map((row) => [row.status, [row.count, row.value]]));
}

describe('GET /api/estimate-stats', () => {
  it('counts and values the pipeline by status, with the win rate and the average margin', async () => {
    const companyA = await signupCompany(testApp);
    const companyB = await signupCompany(testApp);

    await insertEstimate(companyA, 1, 'draft', '100.00');
    // Valued at its latest version, not at the draft being edited.
    await insertEstimate(companyA, 2, 'awaiting_approval', '999.99', [
      { total: '200.00', marginPct: '20.00' },
    ]);
    await insertEstimate(companyA, 3, 'accepted', '300.00', [
      { total: '500.00', marginPct: '10.00' },
      { total: '300.00', marginPct: '40.00' },
    ]);
    await insertEstimate(companyA, 4, 'accepted', '400.00', [
      { total: '400.00', marginPct: '30.00' },
    ]);
    await insertEstimate(companyA, 5, 'declined', '250.50', [
      { total: '250.50', marginPct: '25.00' },
    ]);
    // Edited again after finalising: a draft, valued and averaged at its version.
    await insertEstimate(companyA, 6, 'draft', '75.00', [{ total: '50.00', marginPct: '36.00' }]);
    // Company B's large win must never reach company A's figures.
    await insertEstimate(companyB, 1, 'accepted', '10000.00', [
      { total: '10000.00', marginPct: '90.00' },
    ]);

    const stats = await statsOf(companyA);
    expect(stats.byStatus.map((row) => row.status)).toEqual([
      'draft',
      'awaiting_approval',
      'approved',
      'sent',
      'viewed',
      'accepted',
      'declined',
      'expired',
    ]);
    expect(countsAndValues(stats)).toEqual({
      draft: [2, '150.00'], // #1 draft 100.00 + #6 version 50.00
      awaiting_approval: [1, '200.00'], // #2 version, not its 999.99 draft
      approved: [0, '0.00'],
      sent: [0, '0.00'],
      viewed: [0, '0.00'],
      accepted: [2, '700.00'], // #3 latest version 300.00 + #4 400.00
      declined: [1, '250.50'],
      expired: [0, '0.00'],
    });
    // 2 accepted ÷ (2 accepted + 1 declined) = 66.666… → 66.67
    expect(stats.winRatePct).toBe('66.67');
    // Latest versions only: (20 + 40 + 30 + 25 + 36) ÷ 5 = 151 ÷ 5 = 30.20; #1 has no version.
    expect(stats.averageMarginPct).toBe('30.20');
    expect(stats.currency).toBe('USD');

    const statsB = await statsOf(companyB);
    expect(countsAndValues(statsB).accepted).toEqual([1, '10000.00']);
    expect(statsB.byStatus.reduce((sum, row) => sum + row.count, 0)).toBe(1);
    expect(statsB.winRatePct).toBe('100.00');
    expect(statsB.averageMarginPct).toBe('90.00');
  });

  it('reports no win rate and no margin before anything is decided or finalised', async () => {
    const company = await signupCompany(testApp);
    await insertEstimate(company, 1, 'draft', '120.00');

    const stats = await statsOf(company);
    expect(countsAndValues(stats).draft).toEqual([1, '120.00']);
    expect(stats.winRatePct).toBeNull();
    expect(stats.averageMarginPct).toBeNull();
  });

  it('is for owners only', async () => {
    const owner = await signupCompany(testApp);
    const estimator = await addMember(testApp, owner, 'estimator');
    const crewLead = await addMember(testApp, owner, 'crew_lead');

    await statsOf(estimator, 403);
    await statsOf(crewLead, 403);
    await testApp.http().get('/api/estimate-stats').expect(401);
  });
});
