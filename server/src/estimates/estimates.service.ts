import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import {
  createEstimateRequestSchema,
  ESTIMATE_STATUSES,
  ESTIMATE_VIEW_EVENT_LIMIT,
  finaliseEstimateRequestSchema,
  saveDraftRequestSchema,
  sendBackEstimateRequestSchema,
  type ApprovalQueueItem,
  type EstimateComparison,
  type EstimateComputed,
  type EstimateContent,
  type EstimateDraftView,
  type EstimateEventView,
  type EstimateListPage,
  type EstimateStatus,
  type EstimateVersionSummary,
  type EstimateVersionView,
  type EstimateView,
} from '@pondwright/shared';
import { examplePondInput, toFieldErrors } from '@pondwright/shared/engine';
import { diffPricedEstimates } from '@pondwright/shared/pricing';
import { DataSource, type EntityManager } from 'typeorm';
import type { z } from 'zod';
import { AppError } from '../common/errors/app-error';
import { TenantContext } from '../common/tenancy/tenant-context';
import {
  isUuid,
  TenantRepositories,
  type TenantRepository,
} from '../common/tenancy/tenant-repository';
import { Customer } from '../customers/entities/customer.entity';
import { Site } from '../customers/entities/site.entity';
import { PriceBookService } from '../price-book/price-book.service';
import { canonicalJson, versionSha256 } from './content-hash';
import { EstimateDraft } from './entities/estimate-draft.entity';
import { EstimateEvent } from './entities/estimate-event.entity';
import { EstimateVersion } from './entities/estimate-version.entity';
import { Estimate } from './entities/estimate.entity';
import { fieldErrors } from './field-errors';
import { lockEstimate } from './lock-estimate';
import { priceEstimateContent, type UncheckedContent } from './price-estimate';
import { StaleDraftError } from './stale-draft';
import { WriteQueue } from './write-queue';

export type EstimateListQuery = { status?: string; q?: string; page?: string; pageSize?: string };

const DEFAULT_PAGE_SIZE = 25;
const MAX_PAGE_SIZE = 100;

/**
 * Estimates: a working draft recomputed by the server on every save (its numbers are the only ones
 * stored), finalised into immutable numbered versions, approved by an owner when the margin or discount
 * is outside the policy. Every write records an audit event in the same transaction.
 *
 * Status: a save makes the estimate a `draft` again (editing after finalising starts the next version);
 * finalising makes it `awaiting_approval` when the version's pricing needs approval, else `approved`
 * (nothing stands between it and sending); an owner's approval makes it `approved`, a send-back `draft`.
 */
@Injectable()
export class EstimatesService {
  private readonly estimates: TenantRepository<Estimate>;
  private readonly customers: TenantRepository<Customer>;
  private readonly sites: TenantRepository<Site>;
  private readonly writes = new WriteQueue();

  constructor(
    repositories: TenantRepositories,
    private readonly tenant: TenantContext,
    private readonly priceBook: PriceBookService,
    @InjectDataSource() private readonly dataSource: DataSource,
  ) {
    this.estimates = repositories.for(Estimate);
    this.customers = repositories.for(Customer);
    this.sites = repositories.for(Site);
  }

  async create(body: unknown, actorId: string): Promise<EstimateView> {
    const request = parse(createEstimateRequestSchema, body);
    const siteId = request.siteId ?? null;
    await this.checkCustomerAndSite(request.customerId, siteId);
    const version = await this.priceBook.currentVersion();
    const { content, computed } = priceEstimateContent(
      {
        title: request.title,
        customerId: request.customerId,
        siteId,
        input: request.input ?? examplePondInput(),
        discountPct: '0',
        manualLines: [],
        scope: '',
        notes: '',
      },
      version.content,
    );
    const companyId = this.tenant.companyId;
    const id = await this.dataSource.transaction(async (manager) => {
      // A per-company lock makes max + 1 safe: estimate numbers never repeat or skip.
      await manager.query('SELECT pg_advisory_xact_lock(hashtextextended($1, 0))', [
        `estimate-number:${companyId}`,
      ]);
      const [{ next }] = (await manager.query(
        'SELECT coalesce(max(number), 0) + 1 AS next FROM estimates WHERE company_id = $1',
        [companyId],
      )) as [{ next: number }];
      const estimate = await this.estimates.save(
        this.estimates.create({
          number: Number(next),
          title: content.title,
          customerId: content.customerId,
          siteId,
          status: 'draft',
          createdById: actorId,
        }),
        manager,
      );
      await manager.insert(EstimateDraft, {
        estimateId: estimate.id,
        revision: 1,
        content,
        computed,
        priceBookVersionId: version.id,
        updatedById: actorId,
        updatedAt: new Date(),
      });
      await this.record(manager, estimate.id, actorId, 'created', {
        number: estimate.number,
        total: computed.priced.totals.total,
      });
      return estimate.id;
    });
    return this.get(id);
  }

  async list(query: EstimateListQuery): Promise<EstimateListPage> {
    const status = query.status || null;
    if (status !== null && !(ESTIMATE_STATUSES as readonly string[]).includes(status)) {
      throw fieldErrors([
        { field: 'status', message: `Choose one of: ${ESTIMATE_STATUSES.join(', ')}` },
      ]);
    }
    const page = positiveInt(query.page, 1, 'page', Number.MAX_SAFE_INTEGER);
    const pageSize = positiveInt(query.pageSize, DEFAULT_PAGE_SIZE, 'pageSize', MAX_PAGE_SIZE);
    const text = query.q?.trim() ? `%${query.q.trim().replace(/[\\%_]/g, '\\$&')}%` : null;
    // Every estimate has its draft (both are written in one transaction), so only a search needs a
    // join here: the customer's name. The drafts join the chosen page only (below).
    const search =
      text === null
        ? { join: '', where: '', parameters: [] }
        : {
            join: 'JOIN customers c ON c.id = e.customer_id',
            where: 'AND (e.title ILIKE $3 OR c.name ILIKE $3 OR e.number::text = $4)',
            parameters: [text, query.q?.trim() ?? ''],
          };
    const filters = `
      FROM estimates e ${search.join}
      WHERE e.company_id = $1 AND ($2::text IS NULL OR e.status = $2) ${search.where}`;
    const parameters = [this.tenant.companyId, status, ...search.parameters];
    const [limit, offset] = [`$${parameters.length + 1}`, `$${parameters.length + 2}`];
    const [{ count }] = (await this.dataSource.query(
      `SELECT count(*)::int AS count ${filters}`,
      parameters,
    )) as [{ count: number }];
    // The page is chosen from `estimates` alone (estimates_company_updated_idx), then joined to its 25
    // drafts. Selecting the totals in the same query as the sort made PostgreSQL read and decompress the
    // `computed` JSON (~30 KB) of every estimate before sorting: seconds at 10,000 estimates (npm run
    // bench). The lateral `OFFSET 0` fence takes the totals out of each draft once, not once per field.
    const rows = (await this.dataSource.query(
      `SELECT p.id, p.number, p.title, p.status, p.updated_at, pc.name AS customer_name,
              t.totals ->> 'total' AS total, t.totals ->> 'grossMarginPct' AS gross_margin_pct
       FROM (
         SELECT e.id, e.number, e.title, e.status, e.updated_at, e.customer_id
         ${filters}
         ORDER BY e.updated_at DESC, e.number DESC
         LIMIT ${limit} OFFSET ${offset}
       ) p
       JOIN customers pc ON pc.id = p.customer_id
       JOIN estimate_drafts d ON d.estimate_id = p.id
       CROSS JOIN LATERAL (SELECT d.computed #> '{priced,totals}' AS totals OFFSET 0) t
       ORDER BY p.updated_at DESC, p.number DESC`,
      [...parameters, pageSize, (page - 1) * pageSize],
    )) as Array<{
      id: string;
      number: number;
      title: string;
      status: EstimateStatus;
      updated_at: Date;
      customer_name: string;
      total: string;
      gross_margin_pct: string | null;
    }>;
    return {
      items: rows.map((row) => ({
        id: row.id,
        number: row.number,
        title: row.title,
        customerName: row.customer_name,
        status: row.status,
        total: row.total,
        grossMarginPct: row.gross_margin_pct,
        updatedAt: new Date(row.updated_at).toISOString(),
      })),
      total: count,
      page,
      pageSize,
    };
  }

  /**
   * One estimate with its draft, version summaries and audit log, in one plain query limited to the
   * caller's company. Opening an estimate is the most frequent read: the seven ORM look-ups it used to
   * make (estimate, customer, draft and author, versions, events, job) each cost more CPU than the
   * query itself, and loaded every version's content only to show its totals (npm run bench).
   */
  async get(id: string): Promise<EstimateView> {
    const estimate = isUuid(id)
      ? await estimateView(this.dataSource.manager, id, this.tenant.companyId)
      : null;
    if (!estimate) throw new AppError('NOT_FOUND', 'Estimate not found');
    return estimate;
  }

  /** The whole audit log, oldest first (the estimate's view carries only the latest entries). */
  async events(id: string): Promise<EstimateEventView[]> {
    const events = isUuid(id)
      ? await estimateEvents(this.dataSource.manager, id, this.tenant.companyId)
      : null;
    if (!events) throw new AppError('NOT_FOUND', 'Estimate not found');
    return events;
  }

  /**
   * Saves the draft from the revision the client edited: recomputed with the book in effect today and
   * stored with the next revision. A stale revision answers 409 with the current draft; nothing is written.
   */
  async saveDraft(id: string, body: unknown, actorId: string): Promise<EstimateView> {
    await this.estimates.getById(id, 'Estimate');
    const { revision, ...unchecked } = parse(saveDraftRequestSchema, body);
    await this.checkCustomerAndSite(unchecked.customerId, unchecked.siteId);
    const version = await this.priceBook.currentVersion();
    const { content, computed } = priceEstimateContent(
      unchecked as UncheckedContent,
      version.content,
    );
    return this.writeTransaction(id, async (manager) => {
      const estimate = await this.lockEstimate(manager, id);
      refuseIfAccepted(estimate);
      // The revision alone decides. The whole draft (~30 KB of JSON, parsed) is read only to answer
      // a stale save, not on every save (npm run bench).
      const current = await manager.findOneOrFail(EstimateDraft, {
        where: { estimateId: id },
        select: { estimateId: true, revision: true },
      });
      if (current.revision !== revision) {
        const draft = await this.loadDraft(manager, id);
        throw new StaleDraftError(draftView(draft), changedFields(draft.content, content));
      }
      // Editing a quote the homeowner may be reading withdraws its link: they must never accept
      // a version that is being changed. The next version is sent once it is approved.
      const withdrawn = (await manager.query(
        `UPDATE quote_links SET revoked_at = now()
         WHERE estimate_id = $1 AND revoked_at IS NULL AND expires_at > now() RETURNING id`,
        [id],
      )) as [unknown[], number];
      const nextRevision = current.revision + 1;
      await manager.update(
        EstimateDraft,
        { estimateId: id },
        {
          revision: nextRevision,
          content,
          computed,
          priceBookVersionId: version.id,
          updatedById: actorId,
          updatedAt: new Date(),
        },
      );
      await manager.update(
        Estimate,
        { id },
        {
          title: content.title,
          customerId: content.customerId,
          siteId: content.siteId,
          status: 'draft',
        },
      );
      await this.record(manager, id, actorId, 'draft-saved', {
        revision: nextRevision,
        total: computed.priced.totals.total,
        ...(estimate.status !== 'draft' ? { statusBefore: estimate.status } : {}),
        ...(withdrawn[0].length > 0 ? { quoteLinksWithdrawn: withdrawn[0].length } : {}),
      });
      return this.viewIn(manager, id);
    });
  }

  /**
   * Freezes the draft at `revision` into the next immutable version with its SHA-256 (see
   * `versionSha256`). Only a draft can be finalised; a stale revision answers 409 like a save.
   */
  async finalise(id: string, body: unknown, actorId: string): Promise<EstimateView> {
    await this.estimates.getById(id, 'Estimate');
    const { revision } = parse(finaliseEstimateRequestSchema, body);
    return this.writeTransaction(id, async (manager) => {
      const estimate = await this.lockEstimate(manager, id);
      refuseIfAccepted(estimate);
      const draft = await this.loadDraft(manager, id);
      if (draft.revision !== revision) throw new StaleDraftError(draftView(draft));
      if (estimate.status !== 'draft') {
        throw new AppError(
          'ESTIMATE_NOT_FINALISABLE',
          'This draft is already finalised. Edit it to start the next version.',
        );
      }
      const [{ next }] = (await manager.query(
        'SELECT coalesce(max(version_number), 0) + 1 AS next FROM estimate_versions WHERE estimate_id = $1',
        [id],
      )) as [{ next: number }];
      const sha256 = versionSha256(draft.content, draft.computed);
      const approval = draft.computed.priced.approval;
      const status: EstimateStatus = approval.needsApproval ? 'awaiting_approval' : 'approved';
      await manager.insert(EstimateVersion, {
        estimateId: id,
        versionNumber: Number(next),
        content: draft.content,
        computed: draft.computed,
        contentSha256: sha256,
        priceBookVersionId: draft.priceBookVersionId,
        finalisedById: actorId,
        finalisedAt: new Date(),
      });
      await manager.update(Estimate, { id }, { status });
      await this.record(manager, id, actorId, 'finalised', {
        versionNumber: Number(next),
        revision,
        sha256,
        status,
        reasons: approval.reasons,
      });
      return this.viewIn(manager, id);
    });
  }

  async getVersion(id: string, versionNumber: string): Promise<EstimateVersionView> {
    const estimate = await this.estimates.getById(id, 'Estimate');
    const version = await this.findVersion(estimate.id, versionNumber);
    return {
      ...versionSummary(version),
      content: version.content,
      computed: version.computed,
      priceBookVersionId: version.priceBookVersionId,
    };
  }

  /** Two versions side by side: lines (quantities, costs, prices) and totals that differ, from a to b. */
  async compare(
    id: string,
    a: string | undefined,
    b: string | undefined,
  ): Promise<EstimateComparison> {
    const estimate = await this.estimates.getById(id, 'Estimate');
    const [before, after] = await Promise.all([
      this.findVersion(estimate.id, a, 'a'),
      this.findVersion(estimate.id, b, 'b'),
    ]);
    const changes = diffPricedEstimates(before.computed.priced, after.computed.priced);
    return { a: versionSummary(before), b: versionSummary(after), ...changes };
  }

  /** The owner's queue: estimates whose latest version waits for approval, with the reasons. */
  async approvalQueue(): Promise<ApprovalQueueItem[]> {
    const rows = (await this.dataSource.query(
      `SELECT e.id, e.number, e.title, c.name AS customer_name, v.version_number,
              v.computed -> 'priced' -> 'totals' ->> 'total' AS total,
              v.computed -> 'priced' -> 'totals' ->> 'grossMarginPct' AS gross_margin_pct,
              v.computed -> 'priced' -> 'approval' -> 'reasons' AS reasons,
              u.name AS finalised_by_name, v.finalised_at
       FROM estimates e
       JOIN customers c ON c.id = e.customer_id
       JOIN LATERAL (
         SELECT * FROM estimate_versions WHERE estimate_id = e.id ORDER BY version_number DESC LIMIT 1
       ) v ON true
       JOIN users u ON u.id = v.finalised_by
       WHERE e.company_id = $1 AND e.status = 'awaiting_approval'
       ORDER BY v.finalised_at ASC`,
      [this.tenant.companyId],
    )) as Array<{
      id: string;
      number: number;
      title: string;
      customer_name: string;
      version_number: number;
      total: string;
      gross_margin_pct: string | null;
      reasons: ApprovalQueueItem['reasons'];
      finalised_by_name: string;
      finalised_at: Date;
    }>;
    return rows.map((row) => ({
      estimateId: row.id,
      number: row.number,
      title: row.title,
      customerName: row.customer_name,
      versionNumber: row.version_number,
      total: row.total,
      grossMarginPct: row.gross_margin_pct,
      reasons: row.reasons,
      finalisedByName: row.finalised_by_name,
      finalisedAt: new Date(row.finalised_at).toISOString(),
    }));
  }

  async approve(id: string, actorId: string): Promise<EstimateView> {
    await this.decide(id, actorId, 'approved', {});
    return this.get(id);
  }

  async sendBack(id: string, body: unknown, actorId: string): Promise<EstimateView> {
    await this.estimates.getById(id, 'Estimate');
    const { comment } = parse(sendBackEstimateRequestSchema, body);
    await this.decide(id, actorId, 'sent-back', { comment });
    return this.get(id);
  }

  private async decide(
    id: string,
    actorId: string,
    action: 'approved' | 'sent-back',
    detail: Record<string, unknown>,
  ): Promise<void> {
    await this.estimates.getById(id, 'Estimate');
    await this.dataSource.transaction(async (manager) => {
      const estimate = await this.lockEstimate(manager, id);
      if (estimate.status !== 'awaiting_approval') {
        throw new AppError(
          'ESTIMATE_NOT_AWAITING_APPROVAL',
          'This estimate is not waiting for approval.',
        );
      }
      const [{ latest }] = (await manager.query(
        'SELECT max(version_number) AS latest FROM estimate_versions WHERE estimate_id = $1',
        [id],
      )) as [{ latest: number }];
      await manager.update(
        Estimate,
        { id },
        { status: action === 'approved' ? 'approved' : 'draft' },
      );
      await this.record(manager, id, actorId, action, { versionNumber: latest, ...detail });
    });
  }

  /** The customer and site must be this company's, and the site the customer's: else 404. */
  private async checkCustomerAndSite(customerId: string, siteId: string | null): Promise<void> {
    await this.customers.getById(customerId, 'Customer');
    if (siteId !== null) {
      const site = await this.sites.findOneBy({ id: siteId, customerId });
      if (!site) throw new AppError('NOT_FOUND', 'Site not found for this customer');
    }
  }

  /**
   * A transaction writing estimate `id`, queued behind this process's other writes to it (see
   * WriteQueue): waiting for the estimate's row lock would hold a pooled connection.
   */
  private writeTransaction<T>(
    id: string,
    work: (manager: EntityManager) => Promise<T>,
  ): Promise<T> {
    return this.writes.run(id, () => this.dataSource.transaction(work));
  }

  /**
   * The estimate as its own transaction wrote it, for the answer to a write. Read on the transaction's
   * connection: read after the commit on another, it could wait for a free pooled connection under
   * load and answer 503 for a save that was stored (npm run bench, before this).
   */
  private async viewIn(manager: EntityManager, id: string): Promise<EstimateView> {
    const view = await estimateView(manager, id, this.tenant.companyId);
    if (!view) throw new AppError('NOT_FOUND', 'Estimate not found');
    return view;
  }

  private lockEstimate(manager: EntityManager, id: string): Promise<Estimate> {
    return lockEstimate(manager, id, this.tenant.companyId);
  }

  private async loadDraft(manager: EntityManager, estimateId: string): Promise<EstimateDraft> {
    return manager.findOneOrFail(EstimateDraft, {
      where: { estimateId },
      relations: { updatedBy: true },
    });
  }

  private async findVersion(
    estimateId: string,
    versionNumber: string | undefined,
    field = 'versionNumber',
  ): Promise<EstimateVersion> {
    const number = Number(versionNumber);
    if (!Number.isInteger(number) || number < 1 || number > 2_147_483_647) {
      throw fieldErrors([{ field, message: 'Give a version number such as 1' }]);
    }
    const version = await this.dataSource.manager.findOne(EstimateVersion, {
      where: { estimateId, versionNumber: number },
      relations: { finalisedBy: true },
    });
    if (!version) {
      throw new AppError('ESTIMATE_VERSION_NOT_FOUND', `This estimate has no version ${number}`);
    }
    return version;
  }

  private async record(
    manager: EntityManager,
    estimateId: string,
    actorId: string,
    action: string,
    detail: Record<string, unknown>,
  ): Promise<void> {
    await manager.save(
      manager.create(EstimateEvent, {
        companyId: this.tenant.companyId,
        estimateId,
        actorId,
        action,
        detail,
      }),
    );
  }
}

function parse<S extends z.ZodType>(schema: S, body: unknown): z.infer<S> {
  const result = schema.safeParse(body);
  if (!result.success) throw fieldErrors(toFieldErrors(result.error.issues));
  return result.data;
}

/** An accepted quote is evidence of what the homeowner agreed to: its estimate is never edited again. */
function refuseIfAccepted(estimate: Estimate): void {
  if (estimate.status === 'accepted') {
    throw new AppError(
      'ESTIMATE_LOCKED',
      'Accepted quotes are locked. The accepted version is kept as the homeowner saw it.',
    );
  }
}

function positiveInt(value: string | undefined, fallback: number, field: string, max: number) {
  if (value === undefined || value === '') return fallback;
  const number = Number(value);
  if (!Number.isInteger(number) || number < 1 || number > max) {
    throw fieldErrors([{ field, message: `Give a whole number from 1 to ${max}` }]);
  }
  return number;
}

/** The content fields where the stored draft differs from the copy the client sent. */
function changedFields(current: object, sent: object): Array<{ field: string; message: string }> {
  const keys = new Set([...Object.keys(current), ...Object.keys(sent)]);
  return [...keys]
    .filter(
      (key) =>
        canonicalJson((current as Record<string, unknown>)[key]) !==
        canonicalJson((sent as Record<string, unknown>)[key]),
    )
    .sort()
    .map((field) => ({ field, message: 'Differs from the saved draft' }));
}

function draftView(draft: EstimateDraft): EstimateDraftView {
  return {
    revision: draft.revision,
    content: draft.content,
    computed: draft.computed,
    priceBookVersionId: draft.priceBookVersionId,
    updatedByName: draft.updatedBy?.name ?? '',
    updatedAt: draft.updatedAt.toISOString(),
  };
}

/**
 * The estimate as `GET /api/estimates/:id` shows it, or null when the company has no such estimate.
 * Versions are summarised in SQL (their totals taken out of `computed`, ~30 KB each, which stays in
 * the database); the events name their actor as the audit log always has.
 */
async function estimateView(
  manager: EntityManager,
  id: string,
  companyId: string,
): Promise<EstimateView | null> {
  const [row] = (await manager.query(
    `SELECT e.id, e.number, e.title, e.customer_id, c.name AS customer_name, e.site_id, e.status,
            e.created_at, e.updated_at, d.revision, d.content, d.computed, d.price_book_version_id,
            u.name AS updated_by_name, d.updated_at AS draft_updated_at,
            (SELECT j.id FROM jobs j WHERE j.estimate_id = e.id) AS job_id,
            (SELECT coalesce(json_agg(json_build_object(
                      'versionNumber', v.version_number, 'contentSha256', v.content_sha256,
                      'total', t.totals ->> 'total', 'grossMarginPct', t.totals ->> 'grossMarginPct',
                      'finalisedByName', coalesce(vu.name, ''), 'finalisedAt', v.finalised_at)
                    ORDER BY v.version_number), '[]')
             FROM estimate_versions v
             LEFT JOIN users vu ON vu.id = v.finalised_by
             CROSS JOIN LATERAL (SELECT v.computed #> '{priced,totals}' AS totals OFFSET 0) t
             WHERE v.estimate_id = e.id) AS versions,
            (SELECT coalesce(json_agg(latest.event ORDER BY latest.id), '[]')
             FROM (SELECT ev.id, ${EVENT_JSON} AS event
                   FROM estimate_events ev
                   LEFT JOIN users au ON au.id = ev.actor_id
                   WHERE ev.estimate_id = e.id AND ev.company_id = e.company_id
                   ORDER BY ev.id DESC
                   LIMIT ${ESTIMATE_VIEW_EVENT_LIMIT}) latest) AS events,
            (SELECT count(*)::int FROM estimate_events ev
             WHERE ev.estimate_id = e.id AND ev.company_id = e.company_id) AS event_count
     FROM estimates e
     JOIN customers c ON c.id = e.customer_id
     JOIN estimate_drafts d ON d.estimate_id = e.id
     LEFT JOIN users u ON u.id = d.updated_by
     WHERE e.id = $1 AND e.company_id = $2`,
    [id, companyId],
  )) as Array<{
    id: string;
    number: number;
    title: string;
    customer_id: string;
    customer_name: string;
    site_id: string | null;
    status: EstimateStatus;
    created_at: Date;
    updated_at: Date;
    revision: number;
    content: EstimateContent;
    computed: EstimateComputed;
    price_book_version_id: string;
    updated_by_name: string | null;
    draft_updated_at: Date;
    job_id: string | null;
    versions: EstimateVersionSummary[];
    events: EstimateEventView[];
    event_count: number;
  }>;
  if (!row) return null;
  // json_agg writes times as text with microseconds; the API sends ISO strings with milliseconds.
  const iso = (text: string) => new Date(text).toISOString();
  return {
    id: row.id,
    number: row.number,
    title: row.title,
    customerId: row.customer_id,
    customerName: row.customer_name,
    siteId: row.site_id,
    status: row.status,
    createdAt: row.created_at.toISOString(),
    updatedAt: row.updated_at.toISOString(),
    draft: {
      revision: row.revision,
      content: row.content,
      computed: row.computed,
      priceBookVersionId: row.price_book_version_id,
      updatedByName: row.updated_by_name ?? '',
      updatedAt: row.draft_updated_at.toISOString(),
    },
    versions: row.versions.map((version) => ({
      ...version,
      finalisedAt: iso(version.finalisedAt),
    })),
    jobId: row.job_id,
    events: row.events.map((event) => ({ ...event, createdAt: iso(event.createdAt) })),
    eventCount: row.event_count,
  };
}

/** One audit-log entry as JSON, naming its actor (`ev` the event, `au` its actor). */
const EVENT_JSON = `json_build_object(
  'id', ev.id::text, 'action', ev.action, 'actorName', coalesce(au.name, ev.actor_label, ''),
  'detail', ev.detail, 'createdAt', ev.created_at)`;

/** The whole audit log of one estimate of the company, oldest first; null when it has no such estimate. */
async function estimateEvents(
  manager: EntityManager,
  id: string,
  companyId: string,
): Promise<EstimateEventView[] | null> {
  const rows = (await manager.query(
    `SELECT ${EVENT_JSON} AS event
     FROM estimates e
     LEFT JOIN estimate_events ev ON ev.estimate_id = e.id AND ev.company_id = e.company_id
     LEFT JOIN users au ON au.id = ev.actor_id
     WHERE e.id = $1 AND e.company_id = $2
     ORDER BY ev.id`,
    [id, companyId],
  )) as Array<{ event: EstimateEventView & { id: string | null } }>;
  if (rows.length === 0) return null;
  return rows
    .filter((row) => row.event.id !== null)
    .map(({ event }) => ({ ...event, createdAt: new Date(event.createdAt).toISOString() }));
}

function versionSummary(version: EstimateVersion): EstimateVersionSummary {
  return {
    versionNumber: version.versionNumber,
    contentSha256: version.contentSha256,
    total: version.computed.priced.totals.total,
    grossMarginPct: version.computed.priced.totals.grossMarginPct,
    finalisedByName: version.finalisedBy?.name ?? '',
    finalisedAt: version.finalisedAt.toISOString(),
  };
}
