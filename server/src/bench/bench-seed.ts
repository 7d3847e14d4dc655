import { DEFAULT_QUOTE_TERMS, type EstimateContent } from '@pondwright/shared';
import type { PriceBook } from '@pondwright/shared/pricing';
import type { DataSource, EntityManager } from 'typeorm';
import { hashPassword } from '../auth/passwords';
import { hashToken, newSecureToken } from '../auth/secure-token';
import { versionSha256 } from '../estimates/content-hash';
import { addStarterPriceBook } from '../price-book/starter-price-book';
import { benchEstimate } from './bench-estimate';

export const ESTIMATE_COUNT = 10_000;
/** Estimates 1..READ_COUNT are only ever read; the rest are saved by the write and mixed loads. */
const READ_COUNT = 9_000;
const CUSTOMER_COUNT = 2_000;
/** Bump when the seeded shape changes: a database seeded with another layout is rebuilt. */
const SEED_LAYOUT = 1;

const ESTIMATOR = { email: 'estimator@bench.example', password: 'bench-estimator-2026' };
const OWNER = { email: 'owner@bench.example', password: 'bench-owner-2026' };

export type BenchEstimateRef = { id: string; title: string; customerId: string };

/** What the load needs to know about the seeded company. */
export type BenchFixture = {
  companyId: string;
  estimator: { email: string; password: string };
  /** The raw token of a sent (and already viewed) quote link; the database holds only its hash. */
  quoteToken: string;
  readEstimateIds: string[];
  writeEstimates: BenchEstimateRef[];
  /** The content every estimate was seeded with, before its own title and customer. */
  content: EstimateContent;
};

/**
 * The bench database, seeded once: its own tables carry a marker row, so a rerun reuses 10,000
 * estimates instead of rebuilding them (`--reseed` forces a rebuild). Migrations run every time, so a
 * new index reaches the seeded data too. Returns how long seeding took, or null when reused.
 */
export async function ensureBenchData(
  dataSource: DataSource,
  reseed: boolean,
): Promise<{ fixture: BenchFixture; seededSeconds: number | null }> {
  let marker = reseed ? null : await readMarker(dataSource);
  let seededSeconds: number | null = null;
  if (!marker) {
    const started = Date.now();
    // A partial or older seed is never patched: the bench database is rebuilt from the migrations.
    await dataSource.query('DROP SCHEMA public CASCADE');
    await dataSource.query('CREATE SCHEMA public');
    await dataSource.runMigrations({ transaction: 'each' });
    await dataSource.transaction(async (manager) => {
      // Writing 10,000 drafts of ~30 KB each takes longer than the app's 10-second statement limit.
      await manager.query('SET LOCAL statement_timeout = 0');
      await seed(manager);
    });
    await dataSource.transaction(async (manager) => {
      await manager.query('SET LOCAL statement_timeout = 0');
      await manager.query('ANALYZE');
    });
    seededSeconds = (Date.now() - started) / 1000;
    marker = await readMarker(dataSource);
    if (!marker) throw new Error('The bench seed left no marker');
  } else {
    await dataSource.runMigrations({ transaction: 'each' });
  }
  // Saves from earlier runs add audit events to the write pool; dropping them keeps reruns comparable.
  await dataSource.query(
    `DELETE FROM estimate_events WHERE company_id = $1 AND action = 'draft-saved'`,
    [marker.companyId],
  );
  return { fixture: await loadFixture(dataSource, marker), seededSeconds };
}

type Marker = { companyId: string; quoteToken: string };

async function readMarker(dataSource: DataSource): Promise<Marker | null> {
  const [table] = (await dataSource.query(`SELECT to_regclass('public.bench_seed') AS name`)) as [
    { name: string | null },
  ];
  if (!table.name) return null;
  const [row] = (await dataSource.query(
    `SELECT company_id, quote_token FROM bench_seed
     WHERE layout = $1 AND (SELECT count(*) FROM estimates WHERE company_id = bench_seed.company_id) = $2`,
    [SEED_LAYOUT, ESTIMATE_COUNT],
  )) as Array<{ company_id: string; quote_token: string }>;
  return row ? { companyId: row.company_id, quoteToken: row.quote_token } : null;
}

async function seed(manager: EntityManager): Promise<void> {
  const [company] = (await manager.query(
    `INSERT INTO companies (name) VALUES ('Bench Water Gardens') RETURNING id`,
  )) as Array<{ id: string }>;
  const companyId = company!.id;
  const ownerId = await addUser(manager, companyId, OWNER, 'Bench Owner', 'owner');
  const estimatorId = await addUser(manager, companyId, ESTIMATOR, 'Bench Estimator', 'estimator');
  const book = await addStarterPriceBook(manager, companyId, ownerId);
  if (!book) throw new Error('The bench company already had a price book');
  const { content, computed } = benchEstimate(book.content);
  const status = computed.priced.approval.needsApproval ? 'awaiting_approval' : 'approved';

  await manager.query(
    `INSERT INTO customers (company_id, name, phone, email, created_at, updated_at)
     SELECT $1, 'Bench customer ' || i, '555-' || lpad(i::text, 4, '0'), 'customer' || i || '@example.test',
            now(), now()
     FROM generate_series(1, $2::int) AS i`,
    [companyId, CUSTOMER_COUNT],
  );
  // Newest first in the list is estimate 1; every third read-only estimate has a finalised version.
  await manager.query(
    `WITH numbered AS (
       SELECT id, row_number() OVER (ORDER BY created_at, id) - 1 AS k FROM customers WHERE company_id = $1
     )
     INSERT INTO estimates (company_id, number, title, customer_id, status, created_by, created_at, updated_at)
     SELECT $1, i, 'Bench pond ' || i, c.id,
            CASE WHEN i <= $3 AND i % 3 = 0 THEN $4 ELSE 'draft' END, $5,
            now() - make_interval(mins => i * 10), now() - make_interval(mins => i * 10)
     FROM generate_series(1, $2::int) AS i JOIN numbered c ON c.k = i % $6`,
    [companyId, ESTIMATE_COUNT, READ_COUNT, status, estimatorId, CUSTOMER_COUNT],
  );
  await manager.query(
    `INSERT INTO estimate_drafts (estimate_id, revision, content, computed, price_book_version_id, updated_by, updated_at)
     SELECT e.id, 1, $2::jsonb || jsonb_build_object('title', e.title, 'customerId', e.customer_id),
            $3::jsonb, $4, $5, e.updated_at
     FROM estimates e WHERE e.company_id = $1`,
    [companyId, JSON.stringify(content), JSON.stringify(computed), book.id, estimatorId],
  );
  await manager.query(
    `INSERT INTO estimate_events (company_id, estimate_id, actor_id, action, detail, created_at)
     SELECT company_id, id, $2, 'created', jsonb_build_object('number', number, 'total', $3::text), created_at
     FROM estimates WHERE company_id = $1`,
    [companyId, estimatorId, computed.priced.totals.total],
  );
  await addVersions(manager, { companyId, estimatorId, content, computed, status });
  const quoteToken = await addSentQuote(manager, companyId, estimatorId);
  // The marker lives in the bench database only; no migration knows this table.
  await manager.query(
    `CREATE TABLE bench_seed (layout integer PRIMARY KEY, company_id uuid NOT NULL,
       quote_token text NOT NULL, seeded_at timestamptz NOT NULL DEFAULT now())`,
  );
  await manager.query(
    `INSERT INTO bench_seed (layout, company_id, quote_token) VALUES ($1, $2, $3)`,
    [SEED_LAYOUT, companyId, quoteToken],
  );
}

/**
 * Version 1 of every finalised estimate, with its real SHA-256: the content differs per estimate (title
 * and customer), so each fingerprint is computed here as `finalise` would.
 */
async function addVersions(
  manager: EntityManager,
  seedOf: {
    companyId: string;
    estimatorId: string;
    content: EstimateContent;
    computed: ReturnType<typeof benchEstimate>['computed'];
    status: string;
  },
): Promise<void> {
  const rows = (await manager.query(
    `SELECT id, title, customer_id FROM estimates WHERE company_id = $1 AND status = $2`,
    [seedOf.companyId, seedOf.status],
  )) as Array<{ id: string; title: string; customer_id: string }>;
  const shas = rows.map((row) =>
    versionSha256(
      { ...seedOf.content, title: row.title, customerId: row.customer_id },
      seedOf.computed,
    ),
  );
  await manager.query(
    `INSERT INTO estimate_versions (estimate_id, version_number, content, computed, content_sha256,
                                    price_book_version_id, finalised_by, finalised_at)
     SELECT d.estimate_id, 1, d.content, d.computed, v.sha, d.price_book_version_id, $3, d.updated_at
     FROM unnest($1::uuid[], $2::text[]) AS v(id, sha) JOIN estimate_drafts d ON d.estimate_id = v.id`,
    [rows.map((row) => row.id), shas, seedOf.estimatorId],
  );
  await manager.query(
    `INSERT INTO estimate_events (company_id, estimate_id, actor_id, action, detail, created_at)
     SELECT $1, v.estimate_id, $2, 'finalised',
            jsonb_build_object('versionNumber', 1, 'revision', 1, 'sha256', v.content_sha256,
                               'status', $3::text, 'reasons', '[]'::jsonb),
            v.finalised_at
     FROM estimate_versions v JOIN estimates e ON e.id = v.estimate_id WHERE e.company_id = $1`,
    [seedOf.companyId, seedOf.estimatorId, seedOf.status],
  );
}

/** Estimate 3 was sent and opened: its link answers the public quote API without writing. */
async function addSentQuote(
  manager: EntityManager,
  companyId: string,
  estimatorId: string,
): Promise<string> {
  const token = newSecureToken();
  const [link] = (await manager.query(
    `INSERT INTO quote_links (company_id, estimate_id, version_id, token_hash, recipient_email, expires_at,
                              first_viewed_at, quote_terms, created_by, created_at)
     SELECT e.company_id, e.id, v.id, $2, c.email, now() + interval '10 years', now(), $3, $4, now()
     FROM estimates e
     JOIN estimate_versions v ON v.estimate_id = e.id AND v.version_number = 1
     JOIN customers c ON c.id = e.customer_id
     WHERE e.company_id = $1 AND e.number = 3
     RETURNING estimate_id`,
    [companyId, hashToken(token), DEFAULT_QUOTE_TERMS, estimatorId],
  )) as Array<{ estimate_id: string }>;
  if (!link) throw new Error('Estimate 3 has no version to send');
  await manager.query(`UPDATE estimates SET status = 'viewed' WHERE id = $1`, [link.estimate_id]);
  return token;
}

async function addUser(
  manager: EntityManager,
  companyId: string,
  person: { email: string; password: string },
  name: string,
  role: 'owner' | 'estimator',
): Promise<string> {
  const [user] = (await manager.query(
    `INSERT INTO users (company_id, email, name, role, password_hash) VALUES ($1, $2, $3, $4, $5) RETURNING id`,
    [companyId, person.email, name, role, await hashPassword(person.password)],
  )) as Array<{ id: string }>;
  return user!.id;
}

async function loadFixture(dataSource: DataSource, marker: Marker): Promise<BenchFixture> {
  const rows = (await dataSource.query(
    `SELECT id, number, title, customer_id FROM estimates WHERE company_id = $1 ORDER BY number`,
    [marker.companyId],
  )) as Array<{ id: string; number: number; title: string; customer_id: string }>;
  const [book] = (await dataSource.query(
    `SELECT content FROM price_book_versions WHERE company_id = $1 ORDER BY version_number DESC LIMIT 1`,
    [marker.companyId],
  )) as Array<{ content: PriceBook }>;
  if (!book) throw new Error('The bench company has no price book');
  return {
    companyId: marker.companyId,
    estimator: ESTIMATOR,
    quoteToken: marker.quoteToken,
    readEstimateIds: rows.filter((row) => row.number <= READ_COUNT).map((row) => row.id),
    writeEstimates: rows
      .filter((row) => row.number > READ_COUNT)
      .map((row) => ({ id: row.id, title: row.title, customerId: row.customer_id })),
    content: benchEstimate(book.content).content,
  };
}
