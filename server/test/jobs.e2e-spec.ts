import type {
  DailyLogView,
  EstimateView,
  JobCostReport,
  JobListItem,
  JobView,
  LogEntry,
} from '@pondwright/shared';
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { acceptedEstimate } from './support/quote-fixtures';
import { addMember, bearer, createTestApp, signupCompany, type TestApp } from './support/test-app';

let testApp: TestApp;

beforeAll(async () => {
  testApp = await createTestApp();
});
afterAll(async () => {
  await testApp.close();
});

type Session = { accessToken: string };
type Owner = Awaited<ReturnType<typeof signupCompany>>;

const cents = (money: string) => Math.round(Number(money) * 100);

async function makeJob(owner: Owner, extra: Record<string, unknown> = {}) {
  const accepted = await acceptedEstimate(testApp, owner);
  const job = (
    await testApp
      .http()
      .post('/api/jobs')
      .set(...bearer(owner))
      .send({ estimateId: accepted.estimate.id, ...extra })
      .expect(201)
  ).body as JobView;
  return { ...accepted, job };
}

async function addCrew(owner: Session, name: string, leadUserId: string | null = null) {
  return (
    await testApp
      .http()
      .post('/api/crews')
      .set(...bearer(owner))
      .send({ name, leadUserId })
      .expect(201)
  ).body as { id: string; name: string };
}

function putLog(session: Session, jobId: string, logId: string, body: object) {
  return testApp
    .http()
    .put(`/api/jobs/${jobId}/logs/${logId}`)
    .set(...bearer(session))
    .send(body);
}

const hours = (person: string, task: string, value: string): LogEntry =>
  ({ id: randomUUID(), kind: 'hours', person, task, hours: value }) as LogEntry;

describe('a job from an accepted quote', () => {
  it('carries the accepted lines, with the chosen options, as its budget', async () => {
    const owner = await signupCompany(testApp);
    const { estimate, acceptance, job } = await makeJob(owner, { plannedStart: '2027-03-08' });
    const budget = job.budget!;

    // The budget is the accepted version's base lines plus the chosen add-on's line.
    const [version] = (await testApp.dataSource.query(
      `SELECT computed FROM estimate_versions WHERE estimate_id = $1`,
      [estimate.id],
    )) as Array<{ computed: EstimateView['draft']['computed'] }>;
    const priced = version!.computed.priced;
    const optionLines = priced.options.flatMap((option) => option.lines);
    expect(budget.lines).toHaveLength(priced.lines.length + optionLines.length);
    expect(budget.lines.map((line) => line.description)).toContain(
      'Flagstone bench beside the pond',
    );
    // Cost: Σ extended cost of every budget line, in cents.
    expect(cents(budget.cost)).toBe(
      [...priced.lines, ...optionLines].reduce((sum, line) => sum + cents(line.extendedCost), 0),
    );
    // Price before tax = the accepted total − (base tax + the option's tax).
    expect(cents(budget.priceBeforeTax)).toBe(
      cents(acceptance!.total) - cents(priced.totals.tax) - cents(priced.options[0]!.tax),
    );
    expect(budget.lines.filter((line) => line.category === 'labor').every((l) => l.task)).toBe(
      true,
    );
    expect(job).toMatchObject({
      status: 'scheduled',
      plannedStart: '2027-03-08',
      plannedCrewDays: budget.crewDays,
      number: estimate.number,
    });

    const again = await testApp
      .http()
      .post('/api/jobs')
      .set(...bearer(owner))
      .send({ estimateId: estimate.id })
      .expect(409);
    expect(again.body.code).toBe('JOB_EXISTS');
    const view = (
      await testApp
        .http()
        .get(`/api/estimates/${estimate.id}`)
        .set(...bearer(owner))
        .expect(200)
    ).body as EstimateView;
    expect(view.jobId).toBe(job.id);
  });

  it('is refused for an estimate the homeowner has not accepted', async () => {
    const owner = await signupCompany(testApp);
    const customer = (await testApp.dataSource.query(
      `INSERT INTO customers (company_id, name) VALUES ($1, 'Pending Person') RETURNING id`,
      [owner.companyId],
    )) as Array<{ id: string }>;
    const draft = (
      await testApp
        .http()
        .post('/api/estimates')
        .set(...bearer(owner))
        .send({ title: 'Not yet', customerId: customer[0]!.id })
        .expect(201)
    ).body as EstimateView;
    const refused = await testApp
      .http()
      .post('/api/jobs')
      .set(...bearer(owner))
      .send({ estimateId: draft.id })
      .expect(409);
    expect(refused.body.code).toBe('ESTIMATE_NOT_ACCEPTED');
  });
});

describe('the schedule', () => {
  it('moves a job with a reason, keeps every move, and lists jobs by week', async () => {
    const owner = await signupCompany(testApp);
    const crewLead = await addMember(testApp, owner, 'crew_lead');
    const crew = await addCrew(owner, 'North crew');
    const { job } = await makeJob(owner, { plannedStart: '2027-03-08', crewId: crew.id });

    const noReason = await testApp
      .http()
      .post(`/api/jobs/${job.id}/schedule`)
      .set(...bearer(owner))
      .send({ plannedStart: '2027-03-15', crewId: crew.id })
      .expect(400);
    expect(noReason.body.details).toEqual([{ field: 'reason', message: 'Say why the job moves' }]);
    await testApp
      .http()
      .post(`/api/jobs/${job.id}/schedule`)
      .set(...bearer(crewLead))
      .send({ plannedStart: '2027-03-15', crewId: crew.id, reason: 'weather' })
      .expect(403);
    const moved = (
      await testApp
        .http()
        .post(`/api/jobs/${job.id}/schedule`)
        .set(...bearer(owner))
        .send({
          plannedStart: '2027-03-15',
          crewId: crew.id,
          reason: 'weather',
          note: 'Ground frozen',
        })
        .expect(200)
    ).body as JobView;
    expect(moved.scheduleChanges.map((c) => [c.fromStart, c.toStart, c.reason])).toEqual([
      [null, '2027-03-08', null],
      ['2027-03-08', '2027-03-15', 'weather'],
    ]);

    // 2027-03-15 is a Monday; the planned end counts working days only.
    const week = (
      await testApp
        .http()
        .get('/api/jobs?from=2027-03-15&to=2027-03-19')
        .set(...bearer(crewLead))
        .expect(200)
    ).body as JobListItem[];
    expect(week.map((j) => j.id)).toEqual([job.id]);
    expect(week[0]).toMatchObject({ crewName: 'North crew', plannedStart: '2027-03-15' });
    const earlier = (
      await testApp
        .http()
        .get('/api/jobs?from=2027-03-01&to=2027-03-05')
        .set(...bearer(owner))
        .expect(200)
    ).body as JobListItem[];
    expect(earlier).toEqual([]);
    await testApp
      .http()
      .get('/api/jobs?from=March')
      .set(...bearer(owner))
      .expect(400);
    await testApp
      .http()
      .get('/api/jobs?status=scheduled,done')
      .set(...bearer(owner))
      .expect(400);
    const open = (
      await testApp
        .http()
        .get('/api/jobs?status=scheduled,in_progress')
        .set(...bearer(owner))
        .expect(200)
    ).body as JobListItem[];
    expect(open.map((j) => j.id)).toEqual([job.id]);
  });
});

describe('daily logs', () => {
  it('are saved once per id: a resend changes nothing, a stale edit is a conflict', async () => {
    const owner = await signupCompany(testApp);
    const crewLead = await addMember(testApp, owner, 'crew_lead');
    const { job } = await makeJob(owner);
    const logId = randomUUID();
    const body = {
      logDate: '2027-03-15',
      notes: 'Dug the main basin.',
      entries: [hours('Ana', 'excavation', '7.5'), hours('Ben', 'excavation', '6')],
      baseRevision: 0,
    };

    const created = await putLog(crewLead, job.id, logId, body).expect(201);
    expect((created.body as DailyLogView).revision).toBe(1);
    // The phone did not hear the answer and sends it again: same log, nothing new.
    const resent = await putLog(crewLead, job.id, logId, body).expect(200);
    expect((resent.body as DailyLogView).revision).toBe(1);

    const edited = { ...body, notes: 'Dug the main basin and the shelf.', baseRevision: 1 };
    expect((await putLog(crewLead, job.id, logId, edited).expect(200)).body.revision).toBe(2);
    // A second phone still holds revision 1 and edits something else.
    const stale = { ...body, notes: 'Rain stopped work at 2 pm.', baseRevision: 1 };
    const conflict = await putLog(owner, job.id, logId, stale).expect(409);
    expect(conflict.body.code).toBe('LOG_CONFLICT');
    expect(conflict.body.current).toMatchObject({
      revision: 2,
      notes: 'Dug the main basin and the shelf.',
    });

    const logs = (
      await testApp
        .http()
        .get(`/api/jobs/${job.id}/logs`)
        .set(...bearer(crewLead))
        .expect(200)
    ).body as DailyLogView[];
    expect(logs).toHaveLength(1);
    expect(logs[0]!.entries).toHaveLength(2);

    const invalid = await putLog(crewLead, job.id, randomUUID(), {
      ...body,
      entries: [hours('Ana', 'excavation', '30')],
    }).expect(400);
    expect(invalid.body.details[0].field).toBe('entries.0.hours');
  });

  it('keep disposal counted in loads with its load size, and the report compares it in yd³', async () => {
    const owner = await signupCompany(testApp);
    const crewLead = await addMember(testApp, owner, 'crew_lead');
    const { job } = await makeJob(owner);
    const haul = job.budget!.lines.find((line) => line.category === 'disposal')!;
    expect(haul.unit).toBe('cu yd');
    const loads = (quantity: string, loadVolumeLooseCubicYards?: string): LogEntry => ({
      id: randomUUID(),
      kind: 'disposal',
      movement: null,
      code: haul.code,
      description: 'Tri-axle loads to the tip',
      quantity,
      unit: 'load',
      unitCost: null,
      supplier: null,
      ticketNumber: null,
      ...(loadVolumeLooseCubicYards === undefined ? {} : { loadVolumeLooseCubicYards }),
    });
    const logId = randomUUID();
    const body = { logDate: '2027-03-15', notes: '', entries: [loads('3', '10')], baseRevision: 0 };
    await putLog(crewLead, job.id, logId, body).expect(201);
    // The same content again is a resend: the load size is part of what is compared.
    expect((await putLog(crewLead, job.id, logId, body).expect(200)).body.revision).toBe(1);
    // A log written before loads had a size, as old phones still send them, is kept as it was.
    await putLog(crewLead, job.id, randomUUID(), {
      logDate: '2027-03-16',
      notes: '',
      entries: [loads('2')],
      baseRevision: 0,
    }).expect(201);

    const logs = (
      await testApp
        .http()
        .get(`/api/jobs/${job.id}/logs`)
        .set(...bearer(crewLead))
        .expect(200)
    ).body as DailyLogView[];
    expect(logs[0]!.entries).toEqual(body.entries);
    expect(logs[0]!.entries[0]).toMatchObject({ unit: 'load', loadVolumeLooseCubicYards: '10' });
    expect(logs[1]!.entries[0]).not.toHaveProperty('loadVolumeLooseCubicYards');

    const tooBig = await putLog(crewLead, job.id, randomUUID(), {
      ...body,
      logDate: '2027-03-17',
      entries: [loads('1', '45')],
    }).expect(400);
    expect(tooBig.body.details).toContainEqual({
      field: 'entries.0.loadVolumeLooseCubicYards',
      message: 'At most 40 yd³ a load (the largest roll-off container)',
    });

    const report = (
      await testApp
        .http()
        .get(`/api/jobs/${job.id}/report`)
        .set(...bearer(owner))
        .expect(200)
    ).body as JobCostReport;
    const row = report.disposal.find((r) => r.code === haul.code && r.unit === 'cu yd')!;
    // 3 loads × 10 yd³ = 30 yd³, plus the 2 loads without a size counted as 2 yd³ (and warned about)
    expect(row).toMatchObject({ actualQuantity: '32', loggedLoads: '3' });
    expect(cents(row.actualCost)).toBe(
      Math.round(30 * Number(haul.unitCost) * 100) + Math.round(2 * Number(haul.unitCost) * 100),
    );
    expect(report.warnings.some((w) => w.includes('without a load size'))).toBe(true);
    expect(report.notes.some((n) => n.includes('nominal capacity'))).toBe(true);
  });

  it('stop when the job is closed; only the owner closes it', async () => {
    const owner = await signupCompany(testApp);
    const estimator = await addMember(testApp, owner, 'estimator');
    const crewLead = await addMember(testApp, owner, 'crew_lead');
    const { job } = await makeJob(owner);
    const status = (session: Session, value: string) =>
      testApp
        .http()
        .post(`/api/jobs/${job.id}/status`)
        .set(...bearer(session))
        .send({ status: value });

    expect((await status(crewLead, 'completed').expect(409)).body.code).toBe('JOB_STATUS_CHANGE');
    expect((await status(crewLead, 'in_progress').expect(200)).body.startedOn).toBeTruthy();
    await status(crewLead, 'completed').expect(200);
    await status(estimator, 'closed').expect(403);
    expect((await status(owner, 'closed').expect(200)).body.status).toBe('closed');
    const late = await putLog(crewLead, job.id, randomUUID(), {
      logDate: '2027-03-20',
      notes: '',
      entries: [],
      baseRevision: 0,
    }).expect(409);
    expect(late.body.code).toBe('JOB_CLOSED');
  });
});

describe('who sees what', () => {
  it('shows crew leads quantities but no money, and hides jobs from other companies', async () => {
    const owner = await signupCompany(testApp);
    const crewLead = await addMember(testApp, owner, 'crew_lead');
    const other = await signupCompany(testApp);
    const { job } = await makeJob(owner);

    const seen = (
      await testApp
        .http()
        .get(`/api/jobs/${job.id}`)
        .set(...bearer(crewLead))
        .expect(200)
    ).body as JobView;
    expect(seen.budget).toBeNull();
    expect(seen.crewBudget.length).toBeGreaterThan(0);
    expect(JSON.stringify(seen)).not.toMatch(/unitCost|extendedCost|price|cost/i);

    await testApp
      .http()
      .get(`/api/jobs/${job.id}`)
      .set(...bearer(other))
      .expect(404);
    await putLog(other, job.id, randomUUID(), {
      logDate: '2027-03-15',
      notes: '',
      entries: [],
      baseRevision: 0,
    }).expect(404);
    const theirs = (
      await testApp
        .http()
        .get('/api/jobs')
        .set(...bearer(other))
        .expect(200)
    ).body as JobListItem[];
    expect(theirs.map((j) => j.id)).not.toContain(job.id);

    // A log id already used in one company is not reachable through another company's job.
    const logId = randomUUID();
    await putLog(crewLead, job.id, logId, {
      logDate: '2027-03-15',
      notes: 'ours',
      entries: [],
      baseRevision: 0,
    }).expect(201);
    const theirJob = await makeJob(other);
    await putLog(other, theirJob.job.id, logId, {
      logDate: '2027-03-15',
      notes: 'theirs',
      entries: [],
      baseRevision: 1,
    }).expect(404);
  });
});

describe('the cost report and learned rates', () => {
  it('costs the logged hours at the quoted rate and teaches the price book from closed jobs', async () => {
    const owner = await signupCompany(testApp);
    const estimator = await addMember(testApp, owner, 'estimator');
    const crewLead = await addMember(testApp, owner, 'crew_lead');
    const { job } = await makeJob(owner);
    const budget = job.budget!;
    const rock = budget.lines.find((line) => line.task === 'rockPlacing')!;
    const quotedRockHours = Number(rock.quantity);

    // Two days: the crew needs 1.5 × the quoted rock-placing hours, split 60 / 40 over the days.
    const day1 = (quotedRockHours * 1.5 * 0.6).toFixed(2);
    const day2 = (quotedRockHours * 1.5 * 0.4).toFixed(2);
    await putLog(crewLead, job.id, randomUUID(), {
      logDate: '2027-03-15',
      notes: '',
      entries: [hours('Ana', 'rockPlacing', day1)],
      baseRevision: 0,
    }).expect(201);
    await putLog(crewLead, job.id, randomUUID(), {
      logDate: '2027-03-16',
      notes: '',
      entries: [hours('Ana', 'rockPlacing', day2)],
      baseRevision: 0,
    }).expect(201);

    await testApp
      .http()
      .get(`/api/jobs/${job.id}/report`)
      .set(...bearer(crewLead))
      .expect(403);
    const report = (
      await testApp
        .http()
        .get(`/api/jobs/${job.id}/report`)
        .set(...bearer(estimator))
        .expect(200)
    ).body as { labor: Array<{ task: string; actualHours: string; actualCost: string }> };
    const rockRow = report.labor.find((row) => row.task === 'rockPlacing')!;
    // Actual cost = logged hours × the quoted unit cost of the rock-placing line, to the cent.
    const loggedHours = Number(day1) + Number(day2);
    expect(Number(rockRow.actualHours)).toBeCloseTo(loggedHours, 2);
    expect(cents(rockRow.actualCost)).toBe(Math.round(loggedHours * Number(rock.unitCost) * 100));
    const csv = await testApp
      .http()
      .get(`/api/jobs/${job.id}/report.csv`)
      .set(...bearer(owner))
      .expect(200);
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    expect(csv.text.split('\r\n')[0]).toMatch(/^section,item,unit/);

    // Nothing is learned until the job is closed.
    const before = (
      await testApp
        .http()
        .get('/api/learned-rates')
        .set(...bearer(owner))
        .expect(200)
    ).body as Array<{
      parameter: string;
      jobs: number;
      learnedValue: number | null;
      bookValue: number;
    }>;
    expect(before.every((rate) => rate.jobs === 0)).toBe(true);
    for (const status of ['in_progress', 'completed', 'closed']) {
      await testApp
        .http()
        .post(`/api/jobs/${job.id}/status`)
        .set(...bearer(owner))
        .send({ status })
        .expect(200);
    }
    const after = (
      await testApp
        .http()
        .get('/api/learned-rates')
        .set(...bearer(owner))
        .expect(200)
    ).body as typeof before;
    const machine = budget.lines.some((line) => line.source === 'equipment:excavation');
    const boulders = after.find(
      (rate) =>
        rate.parameter ===
        (machine ? 'boulderMachineLaborHoursPerShortTon' : 'boulderHandLaborHoursPerShortTon'),
    )!;
    // Ratio = logged ÷ quoted ≈ 1.5 (the two days were rounded to cents of an hour).
    const ratio = loggedHours / quotedRockHours;
    expect(boulders.jobs).toBe(1);
    expect(boulders.learnedValue).toBe(Number((boulders.bookValue * ratio).toPrecision(3)));

    await testApp
      .http()
      .post('/api/learned-rates/adopt')
      .set(...bearer(estimator))
      .send({ parameter: boulders.parameter })
      .expect(403);
    const adopted = await testApp
      .http()
      .post('/api/learned-rates/adopt')
      .set(...bearer(owner))
      .send({ parameter: boulders.parameter })
      .expect(201);
    expect(adopted.body.note).toMatch(/Adopted the crew/);
    const book = (
      await testApp
        .http()
        .get('/api/price-book')
        .set(...bearer(owner))
        .expect(200)
    ).body as {
      book: { productionRates: Record<string, number> };
    };
    expect(book.book.productionRates[boulders.parameter]).toBe(boulders.learnedValue);
    const nothing = await testApp
      .http()
      .post('/api/learned-rates/adopt')
      .set(...bearer(owner))
      .send({ parameter: 'fixtureLaborHoursEach' })
      .expect(409);
    expect(nothing.body.code).toBe('NOTHING_LEARNED');
  });
});

describe('change orders', () => {
  it('are the estimate’s next version, accepted by the homeowner by link; only then does the budget grow', async () => {
    const owner = await signupCompany(testApp);
    const crewLead = await addMember(testApp, owner, 'crew_lead');
    const { job, estimate } = await makeJob(owner);
    const line = {
      id: 'wall',
      category: 'materials',
      description: 'Dry-stone retaining wall behind the waterfall',
      quantity: '12',
      unit: 'ft',
      unitCost: '45.00',
      taxable: true,
    };
    const create = (session: Session, body: object) =>
      testApp
        .http()
        .post(`/api/jobs/${job.id}/change-orders`)
        .set(...bearer(session))
        .send(body);

    await create(crewLead, { title: 'Retaining wall', lines: [line] }).expect(403);
    const bad = await create(owner, { title: 'Retaining wall', lines: [] }).expect(400);
    expect(bad.body.details[0].field).toBe('lines');
    const order = (
      await create(owner, {
        title: 'Retaining wall',
        reason: 'The bank behind the falls is looser than it looked.',
        lines: [line],
      }).expect(201)
    ).body as {
      id: string;
      total: string;
      tax: string;
      priceBeforeTax: string;
      newJobTotal: string;
      previousJobTotal: string;
      versionNumber: number;
      lines: Array<{ price: string }>;
    };
    // 12 ft × 45.00 = 540.00 cost; its price is the line's price, taxed at the book's rate.
    expect(order.versionNumber).toBe(estimate.versions.length + 1);
    expect(order.previousJobTotal).toBe(job.budget!.total);
    expect(cents(order.newJobTotal)).toBe(cents(job.budget!.total) + cents(order.total));
    expect(cents(order.total)).toBe(cents(order.priceBeforeTax) + cents(order.tax));

    // Not in the budget until accepted.
    const unchanged = (
      await testApp
        .http()
        .get(`/api/jobs/${job.id}`)
        .set(...bearer(owner))
        .expect(200)
    ).body as JobView;
    expect(unchanged.budget!.total).toBe(job.budget!.total);

    await testApp
      .http()
      .post(`/api/jobs/${job.id}/change-orders/${order.id}/send`)
      .set(...bearer(owner))
      .send({})
      .expect(200);
    const [mail] = (await testApp.dataSource.query(
      `SELECT text_body FROM outbox_messages WHERE company_id = $1 AND kind = 'change-order-sent'`,
      [owner.companyId],
    )) as Array<{ text_body: string }>;
    const token = /\/q\/([A-Za-z0-9_-]{43})/.exec(mail!.text_body)![1]!;
    const shown = (await testApp.http().get(`/api/quotes/${token}`).expect(200)).body as {
      changeOrder: { title: string; total: string; state: string };
      estimate: { contentSha256: string };
    };
    expect(shown.changeOrder).toMatchObject({
      title: 'Retaining wall',
      total: order.total,
      state: 'open',
    });

    await testApp
      .http()
      .post(`/api/quotes/${token}/accept`)
      .send({
        fullName: 'Wren Halloway',
        consent: true,
        optionIds: [],
        contentSha256: shown.estimate.contentSha256,
      })
      .expect(200);
    const grown = (
      await testApp
        .http()
        .get(`/api/jobs/${job.id}`)
        .set(...bearer(owner))
        .expect(200)
    ).body as JobView;
    expect(grown.budget!.total).toBe(order.newJobTotal);
    expect(cents(grown.budget!.cost)).toBe(cents(job.budget!.cost) + 54000);
    expect(grown.budget!.lines.map((l) => l.description)).toContain(line.description);
    const again = await testApp
      .http()
      .post(`/api/quotes/${token}/accept`)
      .send({
        fullName: 'Wren Halloway',
        consent: true,
        optionIds: [],
        contentSha256: shown.estimate.contentSha256,
      })
      .expect(409);
    expect(again.body.code).toBe('QUOTE_ALREADY_ANSWERED');

    // The next change is priced on top of the accepted one; declining it leaves the budget alone.
    const second = (
      await create(owner, {
        title: 'Extra lights',
        lines: [{ ...line, id: 'lights', description: 'Two more uplights' }],
      }).expect(201)
    ).body as { id: string; previousJobTotal: string };
    expect(second.previousJobTotal).toBe(order.newJobTotal);
    await testApp
      .http()
      .post(`/api/jobs/${job.id}/change-orders/${second.id}/send`)
      .set(...bearer(owner))
      .send({})
      .expect(200);
    const [secondMail] = (await testApp.dataSource.query(
      `SELECT text_body FROM outbox_messages WHERE company_id = $1 AND kind = 'change-order-sent' ORDER BY created_at DESC LIMIT 1`,
      [owner.companyId],
    )) as Array<{ text_body: string }>;
    const secondToken = /\/q\/([A-Za-z0-9_-]{43})/.exec(secondMail!.text_body)![1]!;
    await testApp
      .http()
      .post(`/api/quotes/${secondToken}/decline`)
      .send({ reason: 'Not this year' })
      .expect(200);
    const after = (
      await testApp
        .http()
        .get(`/api/jobs/${job.id}`)
        .set(...bearer(owner))
        .expect(200)
    ).body as JobView;
    expect(after.budget!.total).toBe(order.newJobTotal);
    await testApp
      .http()
      .get(`/api/jobs/${job.id}/change-orders`)
      .set(...bearer(crewLead))
      .expect(403);
    const listed = (
      await testApp
        .http()
        .get(`/api/jobs/${job.id}/change-orders`)
        .set(...bearer(owner))
        .expect(200)
    ).body as Array<{ status: string; cost: string }>;
    expect(listed.map((o) => o.status)).toEqual(['accepted', 'declined']);
    expect(listed[0]!.cost).toBe('540.00');
    // The crew builds the accepted change from its budget, without prices.
    const crewView = (
      await testApp
        .http()
        .get(`/api/jobs/${job.id}`)
        .set(...bearer(crewLead))
        .expect(200)
    ).body as JobView;
    expect(crewView.crewBudget.map((l) => l.description)).toContain(line.description);
  });
});
