import type { EstimateListPage, EstimateQuoteStatus } from '@pondwright/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_USERS } from '../src/seed/demo-data';
import { seedDemo } from '../src/seed/seed-demo';
import { bearer, createTestApp, randomIp, type TestApp } from './support/test-app';

let testApp: TestApp;

beforeAll(async () => {
  testApp = await createTestApp();
});
afterAll(async () => {
  await testApp.close();
});

describe('the demo estimates', () => {
  it('show each stage of a quote once, including an accepted one with its deposit paid', async () => {
    await seedDemo(testApp.dataSource);
    await seedDemo(testApp.dataSource);
    const owner = DEMO_USERS[0]!;
    const login = await testApp
      .http()
      .post('/api/auth/login')
      .set('X-Forwarded-For', randomIp())
      .send({ email: owner.email, password: owner.password })
      .expect(200);
    const session = { accessToken: login.body.accessToken as string };
    const list = (
      await testApp
        .http()
        .get('/api/estimates?pageSize=50')
        .set(...bearer(session))
        .expect(200)
    ).body as EstimateListPage;
    const demo = list.items.filter((item) =>
      [
        'Kitchen-view pond with waterfall',
        'Terrace pond and stream',
        'Courtyard pond (first look)',
      ].includes(item.title),
    );
    expect(demo.map((item) => item.status).sort()).toEqual(['accepted', 'approved', 'draft']);

    const accepted = demo.find((item) => item.status === 'accepted')!;
    const quote = (
      await testApp
        .http()
        .get(`/api/estimates/${accepted.id}/quote`)
        .set(...bearer(session))
        .expect(200)
    ).body as EstimateQuoteStatus;
    expect(quote.payment).toMatchObject({ status: 'paid', amount: quote.acceptance!.deposit });
    const [version] = (await testApp.dataSource.query(
      'SELECT content_sha256 FROM estimate_versions WHERE estimate_id = $1',
      [accepted.id],
    )) as Array<{ content_sha256: string }>;
    expect(quote.acceptance!.contentSha256).toBe(version!.content_sha256);

    // The accepted quote is a job under way, with two days logged by the crew lead.
    const estimate = (
      await testApp
        .http()
        .get(`/api/estimates/${accepted.id}`)
        .set(...bearer(session))
        .expect(200)
    ).body as { jobId: string | null };
    const job = (
      await testApp
        .http()
        .get(`/api/jobs/${estimate.jobId}`)
        .set(...bearer(session))
        .expect(200)
    ).body as { status: string; crewName: string; logs: unknown[] };
    expect(job).toMatchObject({ status: 'in_progress', crewName: 'Reedbank crew' });
    expect(job.logs).toHaveLength(2);
    await testApp
      .http()
      .get(`/api/jobs/${estimate.jobId}/report`)
      .set(...bearer(session))
      .expect(200);
  });
});
