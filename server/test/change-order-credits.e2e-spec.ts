import type {
  ChangeOrderView,
  InvoiceView,
  JobCostReport,
  JobView,
  QuoteView,
} from '@pondwright/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { acceptedEstimate, tokenFromMail } from './support/quote-fixtures';
import { addMember, bearer, createTestApp, signupCompany, type TestApp } from './support/test-app';

/**
 * Credits: change orders that take work off the job. Every job here is the quote fixtures' typical
 * pond, priced with the demo book and accepted with its flagstone bench (job total 10775.15: base
 * 10153.10 with 399.91 tax on 5516.05 taxable, and the bench 580.00 + 42.05 tax). Markups: materials
 * 45 %, labor 55 %; sales tax 7.25 % on materials; minimum job 2500.00; deposit 30 % = 3232.55.
 */
let testApp: TestApp;

beforeAll(async () => {
  testApp = await createTestApp();
});
afterAll(async () => {
  await testApp.close();
});

type Owner = Awaited<ReturnType<typeof signupCompany>>;

async function makeJob(owner: Owner) {
  const accepted = await acceptedEstimate(testApp, owner);
  const job = (
    await testApp
      .http()
      .post('/api/jobs')
      .set(...bearer(owner))
      .send({ estimateId: accepted.estimate.id })
      .expect(201)
  ).body as JobView;
  return { ...accepted, job };
}

function createChange(owner: Owner, jobId: string, body: object) {
  return testApp
    .http()
    .post(`/api/jobs/${jobId}/change-orders`)
    .set(...bearer(owner))
    .send(body);
}

/** Sends the change and answers the token of the link the homeowner got. */
async function sendChange(owner: Owner, jobId: string, orderId: string): Promise<string> {
  await testApp
    .http()
    .post(`/api/jobs/${jobId}/change-orders/${orderId}/send`)
    .set(...bearer(owner))
    .send({})
    .expect(200);
  const [mail] = (await testApp.dataSource.query(
    `SELECT text_body FROM outbox_messages WHERE company_id = $1 AND kind = 'change-order-sent'
     ORDER BY created_at DESC LIMIT 1`,
    [owner.companyId],
  )) as Array<{ text_body: string }>;
  return tokenFromMail(mail!.text_body);
}

/** The homeowner accepts the change the link shows; answers the response, checked for `status`. */
async function acceptChange(token: string, status: number) {
  const shown = (await testApp.http().get(`/api/quotes/${token}`).expect(200)).body as QuoteView;
  return testApp
    .http()
    .post(`/api/quotes/${token}/accept`)
    .send({
      fullName: 'Wren Halloway',
      consent: true,
      optionIds: [],
      contentSha256: shown.estimate.contentSha256,
    })
    .expect(status);
}

async function getJob(session: { accessToken: string }, jobId: string): Promise<JobView> {
  return (
    await testApp
      .http()
      .get(`/api/jobs/${jobId}`)
      .set(...bearer(session))
      .expect(200)
  ).body as JobView;
}

/** The deposit as the payment webhook leaves it: paid. */
async function payDeposit(owner: Owner, estimateId: string, amount: string) {
  await testApp.dataSource.query(
    `INSERT INTO payments (company_id, estimate_id, acceptance_id, purpose, provider,
       checkout_session_id, amount, currency, status, paid_at)
     SELECT company_id, estimate_id, id, 'deposit', 'test', 'cs_' || gen_random_uuid(), $3, 'USD',
       'paid', now()
     FROM quote_acceptances WHERE company_id = $1 AND estimate_id = $2`,
    [owner.companyId, estimateId, amount],
  );
}

async function rowCounts(estimateId: string, jobId: string) {
  const [row] = (await testApp.dataSource.query(
    `SELECT (SELECT count(*) FROM change_orders WHERE job_id = $2)::int AS orders,
            (SELECT count(*) FROM estimate_versions WHERE estimate_id = $1)::int AS versions,
            (SELECT count(*) FROM estimate_events WHERE estimate_id = $1)::int AS events`,
    [estimateId, jobId],
  )) as Array<{ orders: number; versions: number; events: number }>;
  return row!;
}

const line = (job: JobView, id: string) => job.budget!.lines.find((l) => l.id === id);

describe('credit change orders', () => {
  it('take work off at the sold prices; on acceptance the budget, contract total and invoice shrink', async () => {
    const owner = await signupCompany(testApp);
    const crewLead = await addMember(testApp, owner, 'crew_lead');
    const { job, estimate } = await makeJob(owner);
    await payDeposit(owner, estimate.id, '3232.55');
    expect(job.budget!.total).toBe('10775.15');

    // The homeowner drops the lights and the bench, and the stone goes in with less labor.
    const order = (
      await createChange(owner, job.id, {
        title: 'No lights, no bench',
        reason: 'The homeowner would rather light the garden later.',
        reductions: [
          { lineId: 'light:LIGHT-LED-20', newQuantity: '0' },
          { lineId: 'labor:rockPlacing', newQuantity: '9.8' },
          { lineId: 'manual:bench', newQuantity: '0' },
        ],
      }).expect(201)
    ).body as ChangeOrderView;
    // Lights: 3 × 64.00 = 192.00 cost, 278.40 price, taxable: all of it comes off.
    // Rock placing 13.8 h → 9.8 h: 9.8 × 40.96 = 401.408 → 401.41 cost (was 565.25); × 1.55 =
    // 622.1855 → 622.19 price (was 876.14): −253.95, not taxable.
    // The bench (a chosen option): −580.00 and its own tax −42.05.
    expect(order.lines).toEqual([
      {
        change: 'removed',
        description: line(job, 'light:LIGHT-LED-20')!.description,
        quantity: '3',
        unit: 'each',
        fromQuantity: '3',
        toQuantity: '0',
        price: '-278.40',
      },
      {
        change: 'reduced',
        description: line(job, 'labor:rockPlacing')!.description,
        quantity: '4',
        unit: 'h',
        fromQuantity: '13.8',
        toQuantity: '9.8',
        price: '-253.95',
      },
      {
        change: 'removed',
        description: 'Flagstone bench beside the pond',
        quantity: '1',
        unit: 'ea',
        fromQuantity: '1',
        toQuantity: '0',
        price: '-580.00',
      },
    ]);
    // Base after: 9753.19 − 278.40 − 253.95 = 9220.84; tax 7.25 % × (5516.05 − 278.40 = 5237.65)
    // = 379.729625 → 379.73; total 9600.57, so the base moves 9600.57 − 10153.10 = −552.53 (tax
    // 379.73 − 399.91 = −20.18). With the bench: total −552.53 − 622.05 = −1174.58, tax −20.18 −
    // 42.05 = −62.23, before tax −1112.35 (= −278.40 − 253.95 − 580.00).
    // Cost: −192.00 − 163.84 − 400.00 = −755.84.
    expect(order).toMatchObject({
      priceBeforeTax: '-1112.35',
      tax: '-62.23',
      total: '-1174.58',
      cost: '-755.84',
      previousJobTotal: '10775.15',
      newJobTotal: '9600.57',
      status: 'ready',
    });

    // Nothing changes before the homeowner says yes.
    expect((await getJob(owner, job.id)).budget!.total).toBe('10775.15');
    const token = await sendChange(owner, job.id, order.id);
    const [mail] = (await testApp.dataSource.query(
      `SELECT text_body FROM outbox_messages WHERE company_id = $1 AND kind = 'change-order-sent'`,
      [owner.companyId],
    )) as Array<{ text_body: string }>;
    expect(mail!.text_body).toContain(
      'This is a credit of $1,174.58 (tax included), bringing the job to $9,600.57.',
    );
    const shown = (await testApp.http().get(`/api/quotes/${token}`).expect(200)).body as QuoteView;
    expect(shown.changeOrder).toMatchObject({ total: '-1174.58', newJobTotal: '9600.57' });
    expect(shown.changeOrder!.lines.map((l) => l.change)).toEqual([
      'removed',
      'reduced',
      'removed',
    ]);
    await acceptChange(token, 200);

    const credited = await getJob(owner, job.id);
    const budget = credited.budget!;
    expect(budget.versionNumber).toBe(order.versionNumber);
    expect(budget.total).toBe('9600.57');
    // 10333.19 − 1112.35; 441.96 − 62.23.
    expect(budget.priceBeforeTax).toBe('9220.84');
    expect(budget.tax).toBe('379.73');
    // 7278.65 − 755.84.
    expect(budget.cost).toBe('6522.81');
    // 41.40 h − 4 h.
    expect(budget.laborHours).toBe('37.40');
    expect(budget.lines).toHaveLength(job.budget!.lines.length - 2);
    expect(line(credited, 'light:LIGHT-LED-20')).toBeUndefined();
    expect(line(credited, 'manual:bench')).toBeUndefined();
    expect(line(credited, 'labor:rockPlacing')).toMatchObject({
      quantity: '9.8',
      extendedCost: '401.41',
      price: '622.19',
      task: 'rockPlacing',
    });
    // The crew builds from the smaller budget too.
    const crewView = await getJob(crewLead, job.id);
    expect(crewView.crewBudget.find((l) => l.id === 'labor:rockPlacing')?.quantity).toBe('9.8');
    expect(crewView.crewBudget.some((l) => l.id === 'light:LIGHT-LED-20')).toBe(false);
    // The cost report quotes the smaller hours.
    const report = (
      await testApp
        .http()
        .get(`/api/jobs/${job.id}/report`)
        .set(...bearer(owner))
        .expect(200)
    ).body as JobCostReport;
    expect(report.labor.find((row) => row.task === 'rockPlacing')).toMatchObject({
      estimatedHours: '9.8',
      estimatedCost: '401.41',
    });

    // The final invoice asks for the new total less the deposit: 9600.57 − 3232.55 = 6368.02.
    for (const status of ['in_progress', 'completed']) {
      await testApp
        .http()
        .post(`/api/jobs/${job.id}/status`)
        .set(...bearer(owner))
        .send({ status })
        .expect(200);
    }
    const invoice = (
      await testApp
        .http()
        .post(`/api/jobs/${job.id}/invoice`)
        .set(...bearer(owner))
        .send({})
        .expect(201)
    ).body as InvoiceView;
    expect(invoice).toMatchObject({
      total: '9600.57',
      depositPaid: '3232.55',
      balance: '6368.02',
    });
    // Once invoiced, the total is fixed: no more change orders.
    const late = await createChange(owner, job.id, {
      title: 'Less cable',
      reductions: [{ lineId: 'cable:12:CABLE-12', newQuantity: '25' }],
    }).expect(409);
    expect(late.body.code).toBe('JOB_INVOICED');
  });

  it('are refused below what the homeowner has paid, with nothing saved', async () => {
    const owner = await signupCompany(testApp);
    const { job, estimate } = await makeJob(owner);
    const everything = job.budget!.lines.map((l) => ({ lineId: l.id, newQuantity: '0' }));
    const before = await rowCounts(estimate.id, job.id);

    // Taking every line off leaves the 2500.00 minimum job charge (nothing taxable) as the total.
    // Without a payment that is a credit of 10775.15 − 2500.00 = 8275.15 and may be priced…
    const order = (
      await createChange(owner, job.id, {
        title: 'Cancel the pond',
        reductions: everything,
      }).expect(201)
    ).body as ChangeOrderView;
    expect(order).toMatchObject({ total: '-8275.15', newJobTotal: '2500.00' });
    const token = await sendChange(owner, job.id, order.id);

    // …but once the 3232.55 deposit is paid, the homeowner cannot accept it: 2500.00 < 3232.55.
    await payDeposit(owner, estimate.id, '3232.55');
    const accepted = await acceptChange(token, 409);
    expect(accepted.body.code).toBe('CREDIT_EXCEEDS_PAID');
    expect(accepted.body.message).toContain('$3,232.55 you have already paid');
    const unchanged = await getJob(owner, job.id);
    expect(unchanged.budget).toEqual(job.budget);
    const [stored] = (await testApp.dataSource.query(
      `SELECT status, accepted_at FROM change_orders WHERE id = $1`,
      [order.id],
    )) as Array<{ status: string; accepted_at: Date | null }>;
    expect(stored).toEqual({ status: 'sent', accepted_at: null });

    // Nor can staff price it again: a credit may take off at most 10775.15 − 3232.55 = 7542.60.
    const during = await rowCounts(estimate.id, job.id);
    const refused = await createChange(owner, job.id, {
      title: 'Cancel the pond',
      reductions: everything,
    }).expect(409);
    expect(refused.body).toMatchObject({
      code: 'CREDIT_EXCEEDS_PAID',
      message:
        "This credit would bring the job's total to $2,500.00, below the $3,232.55 the homeowner has already paid. Take off at most $7,542.60, tax included.",
    });
    // No change order, no estimate version and no event was written for the refused credit.
    expect(await rowCounts(estimate.id, job.id)).toEqual(during);
    expect(during.orders).toBe(before.orders + 1);
    expect((await getJob(owner, job.id)).budget).toEqual(job.budget);
  });

  it('name lines of the job, keep less of them, and stand on the version in force', async () => {
    const owner = await signupCompany(testApp);
    const { job } = await makeJob(owner);

    const unknown = await createChange(owner, job.id, {
      title: 'Fewer fish',
      reductions: [{ lineId: 'fish:koi', newQuantity: '0' }],
    }).expect(400);
    expect(unknown.body.details[0].field).toBe('reductions.0.lineId');
    const more = await createChange(owner, job.id, {
      title: 'More pipe',
      reductions: [{ lineId: 'pipe:pressure:PIPE-PVC40-2', newQuantity: '40' }],
    }).expect(400);
    expect(more.body.details[0]).toMatchObject({
      field: 'reductions.0.newQuantity',
      message: 'Enter less than 40 ft: a credit takes work off (add new work as a line)',
    });
    const nothing = await createChange(owner, job.id, { title: 'Nothing', lines: [] }).expect(400);
    expect(nothing.body.details[0]).toMatchObject({
      field: 'lines',
      message: 'Add a line or take work off',
    });

    // Two changes priced on the same version: once one is accepted, the other no longer holds.
    const first = (
      await createChange(owner, job.id, {
        title: 'Shorter pipe run',
        reductions: [{ lineId: 'pipe:pressure:PIPE-PVC40-2', newQuantity: '30' }],
      }).expect(201)
    ).body as ChangeOrderView;
    const second = (
      await createChange(owner, job.id, {
        title: 'Even shorter pipe run',
        reductions: [{ lineId: 'pipe:pressure:PIPE-PVC40-2', newQuantity: '20' }],
      }).expect(201)
    ).body as ChangeOrderView;
    const secondToken = await sendChange(owner, job.id, second.id);
    await acceptChange(await sendChange(owner, job.id, first.id), 200);
    const stale = await acceptChange(secondToken, 409);
    expect(stale.body.code).toBe('CHANGE_ORDER_SUPERSEDED');
    const resend = await testApp
      .http()
      .post(`/api/jobs/${job.id}/change-orders/${second.id}/send`)
      .set(...bearer(owner))
      .send({})
      .expect(409);
    expect(resend.body.message).toContain(`Change order ${first.number} was accepted`);

    // Pipe 40 ft × 2.40 = 96.00 cost, 139.20 price. At 30 ft: 72.00, × 1.45 = 104.40 (−34.80).
    // Taken down again to 20 ft on top of that: 48.00, × 1.45 = 69.60 (−34.80 more).
    expect(line(await getJob(owner, job.id), 'pipe:pressure:PIPE-PVC40-2')).toMatchObject({
      quantity: '30',
      price: '104.40',
    });
    const third = (
      await createChange(owner, job.id, {
        title: 'Even shorter pipe run',
        reductions: [{ lineId: 'pipe:pressure:PIPE-PVC40-2', newQuantity: '20' }],
      }).expect(201)
    ).body as ChangeOrderView;
    expect(third.lines[0]).toMatchObject({
      change: 'reduced',
      fromQuantity: '30',
      toQuantity: '20',
      quantity: '10',
      price: '-34.80',
    });
    await acceptChange(await sendChange(owner, job.id, third.id), 200);
    const after = await getJob(owner, job.id);
    expect(line(after, 'pipe:pressure:PIPE-PVC40-2')).toMatchObject({
      quantity: '20',
      extendedCost: '48.00',
      price: '69.60',
    });
    // Each step takes 34.80 off the price and the tax follows the taxable amount: 7.25 % × (5516.05
    // − 34.80 = 5481.25) = 397.390625 → 397.39, then 7.25 % × 5446.45 = 394.867625 → 394.87. Base
    // totals 9718.39 + 397.39 = 10115.78 and 9683.59 + 394.87 = 10078.46: each change is −37.32,
    // and the job (with the bench's 622.05) goes 10775.15 → 10737.83 → 10700.51.
    expect(first).toMatchObject({ total: '-37.32', newJobTotal: '10737.83' });
    expect(third).toMatchObject({ total: '-37.32', newJobTotal: '10700.51' });
    expect(after.budget!.total).toBe('10700.51');
  });
});
