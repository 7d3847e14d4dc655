import type {
  CustomerDetail,
  EstimateQuoteStatus,
  EstimateView,
  JobView,
  QuoteView,
  Role,
} from '@pondwright/shared';
import { examplePondInput } from '@pondwright/shared/engine';
import type { PriceBook } from '@pondwright/shared/pricing';
import { randomBytes, randomUUID } from 'node:crypto';
import sharp from 'sharp';
import { approvedEstimate, tokenFromMail } from '../support/quote-fixtures';
import {
  addMember,
  bearer,
  signupCompany,
  tokenFromInviteUrl,
  uniqueEmail,
  type TestApp,
} from '../support/test-app';

export type Session = { accessToken: string };

/** The kinds of object a path parameter can name. */
export const OBJECT_KINDS = [
  'customer',
  'site',
  'estimate',
  'estimateVersionNumber',
  'quoteLink',
  'job',
  'log',
  'photo',
  'changeOrder',
  'invite',
  'teamMember',
  'outboxMessage',
  'pricedTakeoff',
  'priceBookVersion',
  'inviteToken',
  'quoteToken',
] as const;
export type ObjectKind = (typeof OBJECT_KINDS)[number];

/** Spare objects the attacking company needs for the body-reference checks. */
export type Spares = {
  /** Accepted, with no job yet. */
  acceptedEstimateId: string;
  /** A job still scheduled, so rescheduling and uploads are allowed on it. */
  openJobId: string;
  /** An estimate still in draft. */
  draftEstimateId: string;
  draftRevision: number;
};

/** One company with a real object of every kind, each carrying the company's tag where it has text. */
export type World = {
  /** Lower-case and unique: every name, note and address the company writes contains it. */
  tag: string;
  companyId: string;
  sessions: Record<Role, Session>;
  userIds: Record<Role, string>;
  objects: Record<ObjectKind, string>;
  crewId: string;
  invoiceId: string;
  /** The customer the accepted estimate is for (the `customer` object is another, with a site). */
  estimateCustomerId: string;
  /** Text that must never reach another company: the tag, every id, the members' e-mails. */
  secrets: string[];
  spares: Spares | null;
};

const jpeg = (hue: number) =>
  sharp({ create: { width: 64, height: 48, channels: 3, background: { r: hue, g: 120, b: 90 } } })
    .jpeg({ quality: 70 })
    .toBuffer();

type Agent = ReturnType<TestApp['http']>;

/** Sends JSON as the session and insists on the status, with the body in the message otherwise. */
async function send<T>(
  testApp: TestApp,
  session: Session,
  method: 'get' | 'post' | 'put' | 'patch',
  path: string,
  status: number,
  body?: object,
): Promise<T> {
  const agent: Agent = testApp.http();
  const request = agent[method](path).set(...bearer(session));
  const response = body === undefined ? await request : await request.send(body);
  if (response.status !== status) {
    throw new Error(
      `${method.toUpperCase()} ${path}: expected ${status}, got ${response.status} ${response.text}`,
    );
  }
  return response.body as T;
}

/** An estimate sent to a tagged homeowner and accepted with every option; answers its id and token. */
async function acceptedEstimate(
  testApp: TestApp,
  owner: Session & { companyId: string },
  customerName: string,
  recipientEmail: string,
): Promise<{ estimate: EstimateView; token: string; outboxId: string }> {
  const estimate = await approvedEstimate(testApp, owner, customerName);
  await send(testApp, owner, 'post', `/api/estimates/${estimate.id}/send`, 201, {
    recipientEmail,
  });
  const [mail] = (await testApp.dataSource.query(
    `SELECT id, text_body FROM outbox_messages
     WHERE company_id = $1 AND kind = 'quote-sent' ORDER BY created_at DESC LIMIT 1`,
    [owner.companyId],
  )) as Array<{ id: string; text_body: string }>;
  const token = tokenFromMail(mail!.text_body);
  const quote = (await testApp.http().get(`/api/quotes/${token}`).expect(200)).body as QuoteView;
  await testApp
    .http()
    .post(`/api/quotes/${token}/accept`)
    .send({
      fullName: customerName,
      consent: true,
      optionIds: quote.options.map((option) => option.id),
      contentSha256: quote.estimate.contentSha256,
    })
    .expect(200);
  return { estimate, token, outboxId: mail!.id };
}

/**
 * Signs up a company and gives it one real object of every kind a route can name: a customer with a
 * site, a price-book version, a priced takeoff, a crew, an estimate sent, accepted and changed (two
 * versions), its quote link, a job with a daily log, a photo and a change order, the final invoice, a
 * pending invite, a team member and a failed e-mail. With `spares`, also the extra objects the
 * attacking company sends in request bodies.
 */
export async function buildWorld(
  testApp: TestApp,
  label: string,
  options: { spares?: boolean } = {},
): Promise<World> {
  const tag = `${label}${randomBytes(4).toString('hex')}`;
  const owner = await signupCompany(testApp, {
    companyName: `${tag} Water Gardens`,
    name: `${tag} Owner`,
    email: uniqueEmail(tag),
  });
  const [estimator, crewLead, teamMember] = await Promise.all([
    addMember(testApp, owner, 'estimator'),
    addMember(testApp, owner, 'crew_lead'),
    addMember(testApp, owner, 'estimator'),
  ]);

  await send(testApp, owner, 'put', '/api/company/quote-terms', 200, {
    terms: `${tag} terms: net 14 days, permits by the contractor.`,
  });
  const logo = await sharp({
    create: { width: 32, height: 32, channels: 3, background: `#${tag.slice(-6)}` },
  })
    .png()
    .toBuffer();
  await testApp
    .http()
    .put('/api/company/logo')
    .set(...bearer(owner))
    .attach('logo', logo, { filename: 'logo.png', contentType: 'image/png' })
    .expect(200);
  // The stored logo is re-encoded (metadata stripped), so its fingerprint is the stored one.
  const [{ sha256: logoSha256 }] = (await testApp.dataSource.query(
    'SELECT sha256 FROM company_logos WHERE company_id = $1',
    [owner.companyId],
  )) as [{ sha256: string }];

  const current = await send<{ book: PriceBook }>(testApp, owner, 'get', '/api/price-book', 200);
  const [first] = current.book.materials;
  const priceBookVersion = await send<{ id: string }>(
    testApp,
    owner,
    'put',
    '/api/price-book',
    201,
    {
      book: {
        ...current.book,
        materials: [
          ...current.book.materials,
          { ...first!, code: 'ZZX-1', name: `${tag} obsidian boulder` },
        ],
      },
      note: `${tag} added the obsidian boulder`,
    },
  );

  const customer = await send<CustomerDetail>(testApp, owner, 'post', '/api/customers', 201, {
    name: `${tag} Fenwick`,
    email: uniqueEmail(tag),
    phone: '555-0199',
    sites: [{ label: `${tag} back garden`, addressLine: `14 ${tag} Row` }],
  });
  const pricedTakeoff = await send<{ id: string }>(
    testApp,
    owner,
    'post',
    '/api/priced-takeoffs',
    201,
    { name: `${tag} koi pond`, input: examplePondInput() },
  );
  const crew = await send<{ id: string }>(testApp, owner, 'post', '/api/crews', 201, {
    name: `${tag} north crew`,
    leadUserId: crewLead.userId,
  });

  const accepted = await acceptedEstimate(testApp, owner, `${tag} Halloway`, uniqueEmail(tag));
  // A failed e-mail, so retrying it would really do something.
  await testApp.dataSource.query(
    `UPDATE outbox_messages SET status = 'failed', attempts = 8, last_error = $2 WHERE id = $1`,
    [accepted.outboxId, `${tag} mailbox full`],
  );
  const quoteStatus = await send<EstimateQuoteStatus>(
    testApp,
    owner,
    'get',
    `/api/estimates/${accepted.estimate.id}/quote`,
    200,
  );
  const job = await send<JobView>(testApp, owner, 'post', '/api/jobs', 201, {
    estimateId: accepted.estimate.id,
    crewId: crew.id,
    plannedStart: '2027-03-15',
  });

  const logId = randomUUID();
  await send(testApp, crewLead, 'put', `/api/jobs/${job.id}/logs/${logId}`, 201, {
    logDate: '2027-03-15',
    notes: `${tag} dug the main basin`,
    entries: [
      { id: randomUUID(), kind: 'hours', person: `${tag} Ana`, task: 'excavation', hours: '7.5' },
    ],
    baseRevision: 0,
  });
  const photoId = randomUUID();
  await testApp
    .http()
    .put(`/api/jobs/${job.id}/photos/${photoId}`)
    .set(...bearer(crewLead))
    .field('kind', 'progress')
    .field('caption', `${tag} north corner`)
    .field('logId', logId)
    .attach('photo', await jpeg(40), { filename: 'IMG_0001.JPG', contentType: 'image/jpeg' })
    .expect(201);
  const changeOrder = await send<{ id: string }>(
    testApp,
    owner,
    'post',
    `/api/jobs/${job.id}/change-orders`,
    201,
    {
      title: `${tag} retaining wall`,
      reason: `${tag} bank is looser than it looked`,
      lines: [
        {
          id: 'wall',
          category: 'materials',
          description: `${tag} dry-stone wall`,
          quantity: '12',
          unit: 'ft',
          unitCost: '45.00',
          taxable: true,
        },
      ],
    },
  );
  await send(
    testApp,
    owner,
    'post',
    `/api/jobs/${job.id}/change-orders/${changeOrder.id}/send`,
    200,
    {},
  );
  for (const status of ['in_progress', 'completed']) {
    await send(testApp, owner, 'post', `/api/jobs/${job.id}/status`, 200, { status });
  }
  const invoice = await send<{ id: string }>(
    testApp,
    owner,
    'post',
    `/api/jobs/${job.id}/invoice`,
    201,
    {},
  );
  const invite = await send<{ id: string; inviteUrl: string }>(
    testApp,
    owner,
    'post',
    '/api/invites',
    201,
    { email: uniqueEmail(tag), role: 'crew_lead' },
  );

  const objects: Record<ObjectKind, string> = {
    customer: customer.id,
    site: customer.sites[0]!.id,
    estimate: accepted.estimate.id,
    estimateVersionNumber: '1',
    quoteLink: quoteStatus.links[0]!.id,
    job: job.id,
    log: logId,
    photo: photoId,
    changeOrder: changeOrder.id,
    invite: invite.id,
    teamMember: teamMember.userId,
    outboxMessage: accepted.outboxId,
    pricedTakeoff: pricedTakeoff.id,
    priceBookVersion: priceBookVersion.id,
    inviteToken: tokenFromInviteUrl(invite.inviteUrl),
    quoteToken: accepted.token,
  };
  const userIds = { owner: owner.userId, estimator: estimator.userId, crew_lead: crewLead.userId };
  const world: World = {
    tag,
    companyId: owner.companyId,
    sessions: { owner, estimator, crew_lead: crewLead },
    userIds,
    objects,
    crewId: crew.id,
    invoiceId: invoice.id,
    estimateCustomerId: accepted.estimate.customerId,
    secrets: [
      tag,
      owner.companyId,
      ...Object.values(userIds),
      ...Object.entries(objects)
        .filter(([kind]) => kind !== 'estimateVersionNumber')
        .map(([, value]) => value),
      crew.id,
      invoice.id,
      accepted.estimate.customerId,
      estimator.email,
      crewLead.email,
      teamMember.email,
      logoSha256,
    ],
    spares: null,
  };
  if (options.spares) world.spares = await buildSpares(testApp, world, owner);
  return world;
}

async function buildSpares(
  testApp: TestApp,
  world: World,
  owner: Session & { companyId: string },
): Promise<Spares> {
  const waiting = await acceptedEstimate(
    testApp,
    owner,
    `${world.tag} Ashdown`,
    uniqueEmail('spare'),
  );
  const forJob = await acceptedEstimate(
    testApp,
    owner,
    `${world.tag} Marlow`,
    uniqueEmail('spare'),
  );
  const openJob = await send<JobView>(testApp, owner, 'post', '/api/jobs', 201, {
    estimateId: forJob.estimate.id,
  });
  const draft = await send<EstimateView>(testApp, owner, 'post', '/api/estimates', 201, {
    title: `${world.tag} draft pond`,
    customerId: world.objects.customer,
  });
  return {
    acceptedEstimateId: waiting.estimate.id,
    openJobId: openJob.id,
    draftEstimateId: draft.id,
    draftRevision: draft.draft.revision,
  };
}

/** A small camera-like JPEG for upload requests; the hue keeps the bytes of each one apart. */
export function photoBytes(hue: number): Promise<Buffer> {
  return jpeg(hue);
}
