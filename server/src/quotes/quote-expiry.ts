import type { EntityManager } from 'typeorm';

/** Who expires a quote: nobody did, time did. Shown in the estimate's timeline. */
export const SYSTEM_ACTOR = 'Pondwright';

/**
 * Marks `expired` every sent or viewed estimate (or just `estimateId`'s) whose links have all lapsed or
 * been withdrawn, logging `quote-expired` on each; answers how many changed. One statement, so a sweep
 * and a homeowner opening a dead link at the same moment cannot both log it.
 */
export async function expireLapsedQuotes(
  manager: EntityManager,
  estimateId: string | null = null,
): Promise<number> {
  const rows = (await manager.query(
    `WITH expired AS (
       UPDATE estimates e SET status = 'expired', updated_at = now()
       WHERE e.status IN ('sent', 'viewed')
         AND ($1::uuid IS NULL OR e.id = $1::uuid)
         AND NOT EXISTS (
           SELECT 1 FROM quote_links l
           WHERE l.estimate_id = e.id AND l.revoked_at IS NULL AND l.expires_at > now())
       RETURNING e.id, e.company_id)
     INSERT INTO estimate_events (company_id, estimate_id, actor_label, action, detail)
     SELECT company_id, id, $2, 'quote-expired', '{}'::jsonb FROM expired
     RETURNING estimate_id`,
    [estimateId, SYSTEM_ACTOR],
  )) as unknown[];
  return rows.length;
}
