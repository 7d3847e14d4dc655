import type { DataSource } from 'typeorm';

/** Rows that belong to a company without carrying its id, reached through their parent. */
const CHILD_TABLES: Array<{ table: string; where: string }> = [
  { table: 'companies', where: 'id = $1' },
  {
    table: 'estimate_drafts',
    where: 'estimate_id IN (SELECT id FROM estimates WHERE company_id = $1)',
  },
  {
    table: 'estimate_versions',
    where: 'estimate_id IN (SELECT id FROM estimates WHERE company_id = $1)',
  },
  { table: 'refresh_tokens', where: 'user_id IN (SELECT id FROM users WHERE company_id = $1)' },
];

export type CompanySnapshot = Record<string, string>;

/**
 * Every row the company owns, as text per table: each table with a `company_id` (found in the catalogue,
 * so a table added later is covered) plus the child tables above. Equal snapshots mean nothing of the
 * company was written, whatever the route did.
 */
export async function snapshotCompany(
  dataSource: DataSource,
  companyId: string,
): Promise<CompanySnapshot> {
  const owned = (await dataSource.query(
    `SELECT table_name FROM information_schema.columns
     WHERE table_schema = 'public' AND column_name = 'company_id' ORDER BY table_name`,
  )) as Array<{ table_name: string }>;
  const sources = [
    ...owned.map(({ table_name }) => ({ table: table_name, where: 'company_id = $1' })),
    ...CHILD_TABLES,
  ];
  const union = sources
    .map(
      ({ table, where }) =>
        `SELECT '${table}' AS name, coalesce(json_agg(t ORDER BY t::text), '[]')::text AS rows
         FROM "${table}" t WHERE ${where}`,
    )
    .join(' UNION ALL ');
  const rows = (await dataSource.query(union, [companyId])) as Array<{
    name: string;
    rows: string;
  }>;
  return Object.fromEntries(rows.map((row) => [row.name, row.rows]));
}

/** The tables whose rows differ between two snapshots. */
export function changedTables(before: CompanySnapshot, after: CompanySnapshot): string[] {
  const tables = new Set([...Object.keys(before), ...Object.keys(after)]);
  return [...tables].filter((table) => before[table] !== after[table]).sort();
}
