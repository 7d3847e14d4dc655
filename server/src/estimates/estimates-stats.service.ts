import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { ESTIMATE_STATUSES, type EstimateStatus } from '@pondwright/shared';
import { DataSource, type EntityManager } from 'typeorm';
import { TenantContext } from '../common/tenancy/tenant-context';
import { readOnReplica } from '../database/read-replica';

/** `GET /api/estimate-stats`: the owner's pipeline. Money and percentages are decimal strings. */
export type EstimateStats = {
  /** Every status in `ESTIMATE_STATUSES` order, zero when the company has none in it. */
  byStatus: Array<{ status: EstimateStatus; count: number; value: string }>;
  /** accepted ÷ (accepted + declined) × 100, 2 decimals; null while none is decided. */
  winRatePct: string | null;
  /** Mean gross margin % of each estimate's latest finalised version, 2 decimals; null when none. */
  averageMarginPct: string | null;
  /** The currency of the price book in force; null before the company has one. */
  currency: string | null;
};

type StatusRow = { status: EstimateStatus; count: number; value: string };
type SummaryRow = {
  win_rate_pct: string | null;
  average_margin_pct: string | null;
  currency: string | null;
};

/**
 * Pipeline figures for the owner's dashboard, aggregated in SQL over the caller's company only.
 * An estimate's value is its latest version's total, or its draft's before it has a version; sums and
 * means are exact `numeric` rounded once, to 2 decimals, at the end. Read on the replica when there
 * is one (a report may be a moment behind).
 */
@Injectable()
export class EstimatesStatsService {
  constructor(
    private readonly tenant: TenantContext,
    @InjectDataSource() private readonly dataSource: DataSource,
  ) {}

  stats(): Promise<EstimateStats> {
    return readOnReplica(this.dataSource, (manager) => this.aggregate(manager));
  }

  private async aggregate(manager: EntityManager): Promise<EstimateStats> {
    const latest = `
      SELECT e.status,
             (COALESCE(v.computed, d.computed) -> 'priced' -> 'totals' ->> 'total')::numeric AS total,
             (v.computed -> 'priced' -> 'totals' ->> 'grossMarginPct')::numeric AS margin_pct,
             v.computed IS NOT NULL AS finalised
      FROM estimates e
      JOIN estimate_drafts d ON d.estimate_id = e.id
      LEFT JOIN LATERAL (
        SELECT computed FROM estimate_versions
        WHERE estimate_id = e.id ORDER BY version_number DESC LIMIT 1
      ) v ON true
      WHERE e.company_id = $1`;
    const companyId = this.tenant.companyId;
    const statusRows = (await manager.query(
      `SELECT status, count(*)::int AS count, round(sum(total), 2)::text AS value
       FROM (${latest}) latest GROUP BY status`,
      [companyId],
    )) as StatusRow[];
    const [summary] = (await manager.query(
      `SELECT
         (SELECT round(100 * count(*) FILTER (WHERE status = 'accepted')::numeric
                   / NULLIF(count(*) FILTER (WHERE status IN ('accepted', 'declined')), 0), 2)::text
          FROM (${latest}) latest) AS win_rate_pct,
         (SELECT round(avg(margin_pct) FILTER (WHERE finalised), 2)::text
          FROM (${latest}) latest) AS average_margin_pct,
         (SELECT content ->> 'currency' FROM price_book_versions
          WHERE company_id = $1 AND effective_date <= current_date
          ORDER BY effective_date DESC, version_number DESC LIMIT 1) AS currency`,
      [companyId],
    )) as [SummaryRow];
    const byStatus = new Map(statusRows.map((row) => [row.status, row]));
    return {
      byStatus: ESTIMATE_STATUSES.map((status) => ({
        status,
        count: byStatus.get(status)?.count ?? 0,
        value: byStatus.get(status)?.value ?? '0.00',
      })),
      winRatePct: summary.win_rate_pct,
      averageMarginPct: summary.average_margin_pct,
      currency: summary.currency,
    };
  }
}
