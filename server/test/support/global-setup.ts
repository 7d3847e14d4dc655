import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { validateDatabaseEnv } from '../../src/config/env.schema';
import { databaseSettingsFromEnv, dataSourceOptions } from '../../src/database/data-source-options';

/** Rebuilds the test database from the real migrations once per run (never `synchronize`). */
export async function setup(): Promise<void> {
  const env = validateDatabaseEnv({
    ...process.env,
    DB_NAME: process.env.DB_TEST_NAME ?? 'pondwright_test',
    DB_PASSWORD: process.env.DB_PASSWORD ?? 'pondwright',
  });
  const dataSource = new DataSource(
    dataSourceOptions({ ...databaseSettingsFromEnv(env), poolSize: 1 }),
  );
  await dataSource.initialize();
  try {
    await dataSource.query('DROP SCHEMA public CASCADE');
    await dataSource.query('CREATE SCHEMA public');
    await dataSource.runMigrations({ transaction: 'each' });
  } finally {
    await dataSource.destroy();
  }
}
