import {
  DEFAULT_QUOTE_TERMS,
  ESTIMATE_VIEW_EVENT_LIMIT,
  type EstimateComputed,
  type EstimateContent,
  type EstimateListPage,
  type EstimateStatus,
  type EstimateView,
  type QuoteView,
} from '@pondwright/shared';
import type { Pool, PoolClient } from 'pg';
import { buildQuoteView } from '../quotes/quote-view';

/**
 * The baseline's reads: each answer is one SQL statement (the user check included) and the same JSON
 * the Nest server returns, built by hand. Nothing here is clever on purpose; it is the floor the real
 * server is measured against, not a second implementation to maintain.
 */

type Queryable = Pool | PoolClient;
export type Caller = { userId: string; companyId: string };

/** The caller must still be an active owner or estimator of the company named in the token. */
const STAFF = `SELECT company_id FROM users
  WHERE id = $1 AND company_id = $2 AND active AND role IN ('owner', 'estimator')`;

export async function isStaff(db: Queryable, caller: Caller): Promise<boolean> {
  return (await db.query(STAFF, [caller.userId, caller.companyId])).rowCount === 1;
}

type EstimateRow = {
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
  versions: Array<{
    versionNumber: number;
    contentSha256: string;
    total: string;
    grossMarginPct: string | null;
    finalisedByName: string;
    finalisedAt: string;
  }>;
  events: Array<{
    id: string;
    action: string;
    actorName: string;
    detail: Record<string, unknown>;
    createdAt: string;
  }>;
  event_count: number;
  job_id: string | null;
};

/** One estimate with its draft, version summaries and audit log, or null (404) for anyone else's. */
export async function estimateView(
  db: Queryable,
  caller: Caller,
  id: string,
): Promise<EstimateView | null> {
  const { rows } = await db.query<EstimateRow>(
    `SELECT e.id, e.number, e.title, e.customer_id, c.name AS customer_name, e.site_id, e.status,
            e.created_at, e.updated_at, d.revision, d.content, d.computed, d.price_book_version_id,
            du.name AS updated_by_name, d.updated_at AS draft_updated_at,
            (SELECT coalesce(json_agg(json_build_object(
                      'versionNumber', v.version_number, 'contentSha256', v.content_sha256,
                      'total', v.computed -> 'priced' -> 'totals' ->> 'total',
                      'grossMarginPct', v.computed -> 'priced' -> 'totals' ->> 'grossMarginPct',
                      'finalisedByName', coalesce(vu.name, ''), 'finalisedAt', v.finalised_at)
                    ORDER BY v.version_number), '[]')
             FROM estimate_versions v LEFT JOIN users vu ON vu.id = v.finalised_by
             WHERE v.estimate_id = e.id) AS versions,
            (SELECT coalesce(json_agg(latest.event ORDER BY latest.id), '[]')
             FROM (SELECT ev.id, json_build_object(
                            'id', ev.id::text, 'action', ev.action,
                            'actorName', coalesce(au.name, ev.actor_label, ''),
                            'detail', ev.detail, 'createdAt', ev.created_at) AS event
                   FROM estimate_events ev LEFT JOIN users au ON au.id = ev.actor_id
                   WHERE ev.estimate_id = e.id AND ev.company_id = e.company_id
                   ORDER BY ev.id DESC LIMIT ${ESTIMATE_VIEW_EVENT_LIMIT}) latest) AS events,
            (SELECT count(*)::int FROM estimate_events ev
             WHERE ev.estimate_id = e.id AND ev.company_id = e.company_id) AS event_count,
            (SELECT j.id FROM jobs j WHERE j.estimate_id = e.id) AS job_id
     FROM (${STAFF}) me
     JOIN estimates e ON e.company_id = me.company_id AND e.id = $3
     JOIN customers c ON c.id = e.customer_id
     JOIN estimate_drafts d ON d.estimate_id = e.id
     LEFT JOIN users du ON du.id = d.updated_by`,
    [caller.userId, caller.companyId, id],
  );
  const row = rows[0];
  if (!row) return null;
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
    // json_agg hands times back as text with microseconds; the API sends milliseconds.
    versions: row.versions.map((version) => ({
      ...version,
      finalisedAt: iso(version.finalisedAt),
    })),
    jobId: row.job_id,
    events: row.events.map((event) => ({ ...event, createdAt: iso(event.createdAt) })),
    eventCount: row.event_count,
  };
}

/**
 * A page of the estimate list, newest change first (no filters: the bench reads plain pages); null when
 * the caller is no longer staff of the company.
 */
export async function estimateListPage(
  db: Queryable,
  caller: Caller,
  page: number,
  pageSize: number,
): Promise<EstimateListPage | null> {
  const { rows } = await db.query<{
    total: number;
    staff: number;
    id: string | null;
    number: number;
    title: string;
    status: EstimateStatus;
    updated_at: Date;
    customer_name: string;
    total_price: string;
    gross_margin_pct: string | null;
  }>(
    `WITH mine AS (${STAFF}),
          counted AS (SELECT count(*)::int AS total, (SELECT count(*)::int FROM mine) AS staff
                      FROM estimates WHERE company_id = (SELECT company_id FROM mine)),
          paged AS (
            SELECT e.id, e.number, e.title, e.status, e.updated_at, e.customer_id
            FROM estimates e WHERE e.company_id = (SELECT company_id FROM mine)
            ORDER BY e.updated_at DESC, e.number DESC LIMIT $3 OFFSET $4)
     SELECT counted.total, counted.staff, p.id, p.number, p.title, p.status, p.updated_at, c.name AS customer_name,
            t.totals ->> 'total' AS total_price, t.totals ->> 'grossMarginPct' AS gross_margin_pct
     FROM counted
     LEFT JOIN paged p ON true
     LEFT JOIN customers c ON c.id = p.customer_id
     LEFT JOIN estimate_drafts d ON d.estimate_id = p.id
     LEFT JOIN LATERAL (SELECT d.computed #> '{priced,totals}' AS totals OFFSET 0) t ON true
     ORDER BY p.updated_at DESC, p.number DESC`,
    [caller.userId, caller.companyId, pageSize, (page - 1) * pageSize],
  );
  if (rows[0]?.staff !== 1) return null;
  return {
    items: rows
      .filter((row) => row.id !== null)
      .map((row) => ({
        id: row.id!,
        number: row.number,
        title: row.title,
        customerName: row.customer_name,
        status: row.status,
        total: row.total_price,
        grossMarginPct: row.gross_margin_pct,
        updatedAt: row.updated_at.toISOString(),
      })),
    total: rows[0]?.total ?? 0,
    page,
    pageSize,
  };
}

export type QuoteAnswer =
  { status: 200; view: QuoteView } | { status: 404 | 410 | 429 | 501; message: string };

/**
 * The homeowner's quote for a token's SHA-256, with the wrong-token count of the caller's address in the
 * same statement. Only quote links: invoice and change-order links answer 501 (the bench sends none).
 */
export async function quoteView(
  db: Queryable,
  tokenHash: string,
  ip: string,
): Promise<QuoteAnswer> {
  const { rows } = await db.query(
    `SELECT (SELECT count(*)::int FROM quote_token_failures
             WHERE ip = $2 AND created_at > now() - interval '15 minutes') AS failures,
            l.id AS link_id, l.revoked_at, l.expires_at, l.created_at, l.quote_terms,
            l.invoice_id, l.change_order_id,
            v.version_number, v.content_sha256, v.content, v.computed,
            e.number, cu.name AS customer_name, co.name AS company_name, s.email AS sender_email,
            EXISTS (SELECT 1 FROM company_logos g WHERE g.company_id = l.company_id) AS has_logo,
            si.address_line, si.city, si.region, si.postal_code,
            a.link_id AS accepted_link_id, a.full_name, a.accepted_at, a.option_ids, a.total, a.deposit,
            p.status AS payment_status, p.amount AS payment_amount, p.paid_at,
            dc.link_id AS declined_link_id, dc.declined_at
     FROM (SELECT 1) one
     LEFT JOIN quote_links l ON l.token_hash = $1
     LEFT JOIN estimate_versions v ON v.id = l.version_id
     LEFT JOIN estimates e ON e.id = l.estimate_id
     LEFT JOIN customers cu ON cu.id = e.customer_id
     LEFT JOIN companies co ON co.id = l.company_id
     LEFT JOIN users s ON s.id = l.created_by
     LEFT JOIN sites si ON si.id = (v.content ->> 'siteId')::uuid
     LEFT JOIN quote_acceptances a ON a.estimate_id = l.estimate_id
     LEFT JOIN LATERAL (SELECT * FROM payments WHERE estimate_id = l.estimate_id AND purpose = 'deposit'
                        ORDER BY (status = 'paid') DESC, created_at DESC LIMIT 1) p ON true
     LEFT JOIN LATERAL (SELECT * FROM quote_declines WHERE estimate_id = l.estimate_id
                        ORDER BY declined_at DESC LIMIT 1) dc ON true`,
    [tokenHash, ip],
  );
  const row = rows[0];
  if (row.failures >= 20) return { status: 429, message: 'Too many wrong links' };
  if (!row.link_id) return { status: 404, message: 'We could not find this quote.' };
  if (row.invoice_id || row.change_order_id) return { status: 501, message: 'Not in the baseline' };
  const accepted = row.accepted_link_id === row.link_id;
  if (row.revoked_at || (row.expires_at.getTime() <= Date.now() && !accepted)) {
    return { status: 410, message: 'This link is no longer valid.' };
  }
  const address = [row.address_line, row.city, row.region, row.postal_code].filter(Boolean);
  const view = buildQuoteView({
    companyName: row.company_name,
    hasLogo: row.has_logo,
    replyToEmail: row.sender_email,
    estimateNumber: row.number,
    customerName: row.customer_name,
    siteAddress: row.address_line ? address.join(', ') : null,
    version: {
      versionNumber: row.version_number,
      contentSha256: row.content_sha256,
      content: row.content,
      computed: row.computed,
    },
    link: { createdAt: row.created_at, expiresAt: row.expires_at },
    companyTerms: row.quote_terms ?? DEFAULT_QUOTE_TERMS,
    acceptance: accepted
      ? {
          fullName: row.full_name,
          acceptedAt: row.accepted_at.toISOString(),
          optionIds: row.option_ids,
          total: row.total,
          deposit: row.deposit,
        }
      : null,
    payment:
      accepted && row.payment_status
        ? {
            status: row.payment_status,
            amount: row.payment_amount,
            paidAt: row.paid_at?.toISOString() ?? null,
          }
        : null,
    declinedAt: row.declined_link_id === row.link_id ? row.declined_at : null,
    invoice: null,
    changeOrder: null,
  });
  return { status: 200, view };
}

function iso(text: string): string {
  return new Date(text).toISOString();
}
