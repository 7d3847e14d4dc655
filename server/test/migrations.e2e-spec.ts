import type { EstimateListPage, EstimateQuoteStatus } from '@pondwright/shared';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { migrations } from '../src/database/migrations';
import { QuotesPaymentsOutbox1796104800000 } from '../src/database/migrations/1796104800000-quotes-payments-outbox';
import { DEMO_USERS } from '../src/seed/demo-data';
import { seedDemo } from '../src/seed/seed-demo';
import {
  createEmptyDatabase,
  dataFingerprint,
  dropDatabase,
  openDatabase,
  runScript,
  schemaFingerprint,
  scratchDatabaseName,
} from './support/scratch-databases';
import { bearer, createTestApp, randomIp } from './support/test-app';

/** The release this upgrade starts from: homeowner quotes (issue 6), before jobs and all after. */
const OLD_RELEASE = QuotesPaymentsOutbox1796104800000;

const oldProduction = scratchDatabaseName('migrate_old');
const upgraded = scratchDatabaseName('migrate_upgraded');
const empty = scratchDatabaseName('migrate_empty');
const folder = mkdtempSync(join(tmpdir(), 'pondwright-migrate-'));

afterAll(async () => {
  for (const name of [oldProduction, upgraded, empty]) await dropDatabase(name);
  rmSync(folder, { recursive: true, force: true });
});

async function appliedMigrations(dataSource: DataSource): Promise<string[]> {
  const rows = (await dataSource.query(`SELECT name FROM migrations ORDER BY id`)) as Array<{
    name: string;
  }>;
  return rows.map((row) => row.name);
}

async function withDatabase<T>(name: string, work: (dataSource: DataSource) => Promise<T>) {
  const dataSource = await openDatabase(name);
  try {
    return await work(dataSource);
  } finally {
    await dataSource.destroy();
  }
}

describe('every migration', () => {
  beforeAll(() => createEmptyDatabase(empty));

  it('reverts to an empty schema and applies again to the same schema', async () => {
    await withDatabase(empty, async (dataSource) => {
      expect(await dataSource.runMigrations({ transaction: 'each' })).toHaveLength(
        migrations.length,
      );
      const built = await schemaFingerprint(dataSource);

      for (let step = 0; step < migrations.length; step++)
        await dataSource.undoLastMigration({ transaction: 'each' });
      expect(await appliedMigrations(dataSource)).toEqual([]);
      // Everything the migrations made is gone; only TypeORM's own table is left.
      const emptied = await schemaFingerprint(dataSource);
      expect(emptied.indexes.every((index) => / ON public\.migrations /.test(index))).toBe(true);
      expect(emptied.triggers).toEqual([]);
      expect(emptied.functions).toEqual([]);
      expect(Object.keys((await dataFingerprint(dataSource)).tables)).toEqual(['migrations']);

      expect(await dataSource.runMigrations({ transaction: 'each' })).toHaveLength(
        migrations.length,
      );
      expect(await schemaFingerprint(dataSource)).toEqual(built);
    });
  });
});

describe('upgrading a copy of an older release’s data', () => {
  let demoEstimates: string[];

  beforeAll(async () => {
    // The older release's production database: the demo, with the schema as that release left it
    // (seeded on today's schema, then every later migration reverted with the data in place).
    await createEmptyDatabase(oldProduction);
    await dropDatabase(upgraded);
    await withDatabase(oldProduction, async (dataSource) => {
      await dataSource.runMigrations({ transaction: 'each' });
      await seedDemo(dataSource);
      demoEstimates = (
        (await dataSource.query(`SELECT title FROM estimates ORDER BY title`)) as Array<{
          title: string;
        }>
      ).map((row) => row.title);
      const later = migrations.length - 1 - migrations.indexOf(OLD_RELEASE);
      for (let step = 0; step < later; step++)
        await dataSource.undoLastMigration({ transaction: 'each' });
      expect((await appliedMigrations(dataSource)).at(-1)).toBe(OLD_RELEASE.name);
    });

    // Upgrade as docs/operations.md says: back up, restore a copy, run the migrations on it.
    const file = join(folder, 'old-release.dump');
    expect(runScript('backup.sh', [file], { DB_NAME: oldProduction }).status).toBe(0);
    expect(
      runScript('restore.sh', [file], { DB_NAME: oldProduction, RESTORE_DB_NAME: upgraded }).status,
    ).toBe(0);
  });

  it('applies every later migration without an error', async () => {
    await withDatabase(upgraded, async (dataSource) => {
      const applied = await dataSource.runMigrations({ transaction: 'each' });
      expect(applied.map((migration) => migration.name)).toEqual(
        migrations.slice(migrations.indexOf(OLD_RELEASE) + 1).map((migration) => migration.name),
      );
      expect(await appliedMigrations(dataSource)).toHaveLength(migrations.length);
    });
  });

  it('serves the demo data through the API afterwards', async () => {
    const app = await createTestApp({ DB_NAME: upgraded });
    try {
      const estimator = DEMO_USERS[1]!;
      const login = await app
        .http()
        .post('/api/auth/login')
        .set('X-Forwarded-For', randomIp())
        .send({ email: estimator.email, password: estimator.password })
        .expect(200);
      const session = { accessToken: login.body.accessToken as string };
      const list = (
        await app
          .http()
          .get('/api/estimates?pageSize=50')
          .set(...bearer(session))
          .expect(200)
      ).body as EstimateListPage;
      expect(list.items.map((item) => item.title).sort()).toEqual(demoEstimates);

      // The accepted quote kept its answer and deposit, and its link got the terms it was sent with.
      const accepted = list.items.find((item) => item.status === 'accepted')!;
      const quote = (
        await app
          .http()
          .get(`/api/estimates/${accepted.id}/quote`)
          .set(...bearer(session))
          .expect(200)
      ).body as EstimateQuoteStatus;
      expect(quote.acceptance).not.toBeNull();
      expect(quote.payment).toMatchObject({ status: 'paid' });
      const [link] = (await app.dataSource.query(
        `SELECT quote_terms FROM quote_links WHERE estimate_id = $1`,
        [accepted.id],
      )) as Array<{ quote_terms: string | null }>;
      expect(link!.quote_terms).toBeTruthy();
      await app
        .http()
        .get(`/api/estimates/${accepted.id}`)
        .set(...bearer(session))
        .expect(200);
    } finally {
      await app.close();
    }
  });

  it('takes the start command’s seed afterwards, which leaves the upgraded data as it is', async () => {
    await withDatabase(upgraded, async (dataSource) => {
      const before = await dataFingerprint(dataSource);
      expect(await seedDemo(dataSource)).toEqual({ created: [] });
      expect(await dataFingerprint(dataSource)).toEqual(before);
    });
  });
});
