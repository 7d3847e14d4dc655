import { saveDraftRequestSchema, type EstimateView } from '@pondwright/shared';
import type { PriceBook } from '@pondwright/shared/pricing';
import type { Pool } from 'pg';
import { priceEstimateContent, type UncheckedContent } from '../estimates/price-estimate';
import { todayIsoDate } from '../price-book/effective-date';
import { estimateView, type Caller } from './baseline-views';

export type SaveAnswer =
  { ok: true; view: EstimateView } | { ok: false; status: number; message: string };

/**
 * `PUT /api/estimates/:id/draft` in plain SQL: the same checks and writes as the Nest service (the
 * estimate, customer and site are the company's; the book in force prices it; a stale revision is
 * refused; open quote links are withdrawn; an audit event is written) in one transaction, then the
 * estimate as `GET` returns it. Pricing is the server's own `priceEstimateContent`: the baseline
 * measures the framework and the data access, not a different calculation.
 */
export async function saveDraft(
  pool: Pool,
  caller: Caller,
  id: string,
  body: unknown,
): Promise<SaveAnswer> {
  const parsed = saveDraftRequestSchema.safeParse(body);
  if (!parsed.success) return { ok: false, status: 400, message: 'Some fields need attention' };
  const { revision, ...unchecked } = parsed.data;
  const { rows } = await pool.query<{
    estimate_ok: boolean;
    customer_ok: boolean;
    site_ok: boolean;
    book_id: string | null;
    book: PriceBook | null;
  }>(
    `SELECT EXISTS (SELECT 1 FROM estimates WHERE id = $3 AND company_id = me.company_id) AS estimate_ok,
            EXISTS (SELECT 1 FROM customers WHERE id = $4 AND company_id = me.company_id) AS customer_ok,
            ($5::uuid IS NULL OR EXISTS (SELECT 1 FROM sites
               WHERE id = $5 AND customer_id = $4 AND company_id = me.company_id)) AS site_ok,
            pb.id AS book_id, pb.content AS book
     FROM users me
     LEFT JOIN LATERAL (SELECT id, content FROM price_book_versions
                        WHERE company_id = me.company_id AND effective_date <= $6
                        ORDER BY effective_date DESC, version_number DESC LIMIT 1) pb ON true
     WHERE me.id = $1 AND me.company_id = $2 AND me.active AND me.role IN ('owner', 'estimator')`,
    [caller.userId, caller.companyId, id, unchecked.customerId, unchecked.siteId, todayIsoDate()],
  );
  const found = rows[0];
  if (!found) return { ok: false, status: 401, message: 'Your session has ended.' };
  if (!found.estimate_ok || !found.customer_ok || !found.site_ok) {
    return { ok: false, status: 404, message: 'Not found' };
  }
  if (!found.book || !found.book_id)
    return { ok: false, status: 409, message: 'No price book in effect' };
  const { content, computed } = priceEstimateContent(unchecked as UncheckedContent, found.book);

  const client = await pool.connect();
  try {
    await client.query('BEGIN');
    const locked = await client.query<{ status: string; revision: number }>(
      `SELECT e.status, d.revision FROM estimates e JOIN estimate_drafts d ON d.estimate_id = e.id
       WHERE e.id = $1 AND e.company_id = $2 FOR UPDATE OF e`,
      [id, caller.companyId],
    );
    const current = locked.rows[0]!;
    if (current.status === 'accepted' || current.revision !== revision) {
      await client.query('ROLLBACK');
      const message = current.status === 'accepted' ? 'Locked' : 'Stale draft';
      return { ok: false, status: 409, message };
    }
    const withdrawn = await client.query(
      `UPDATE quote_links SET revoked_at = now()
       WHERE estimate_id = $1 AND revoked_at IS NULL AND expires_at > now() RETURNING id`,
      [id],
    );
    await client.query(
      `UPDATE estimate_drafts SET revision = $2, content = $3, computed = $4, price_book_version_id = $5,
              updated_by = $6, updated_at = now()
       WHERE estimate_id = $1`,
      [id, revision + 1, content, computed, found.book_id, caller.userId],
    );
    await client.query(
      `UPDATE estimates SET title = $2, customer_id = $3, site_id = $4, status = 'draft', updated_at = now()
       WHERE id = $1`,
      [id, content.title, content.customerId, content.siteId],
    );
    await client.query(
      `INSERT INTO estimate_events (company_id, estimate_id, actor_id, action, detail)
       VALUES ($1, $2, $3, 'draft-saved', $4)`,
      [
        caller.companyId,
        id,
        caller.userId,
        {
          revision: revision + 1,
          total: computed.priced.totals.total,
          ...(current.status !== 'draft' ? { statusBefore: current.status } : {}),
          ...(withdrawn.rowCount ? { quoteLinksWithdrawn: withdrawn.rowCount } : {}),
        },
      ],
    );
    await client.query('COMMIT');
  } catch (error) {
    await client.query('ROLLBACK').catch(() => undefined);
    throw error;
  } finally {
    client.release();
  }
  const view = await estimateView(pool, caller, id);
  return view ? { ok: true, view } : { ok: false, status: 404, message: 'Not found' };
}
