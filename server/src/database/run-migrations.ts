import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { validateDatabaseEnv } from '../config/env.schema';
import { databaseSettingsFromEnv, dataSourceOptions } from './data-source-options';

/** `npm run migrate -w server`: applies every pending migration to the configured database. */
async function main(): Promise<void> {
  const env = validateDatabaseEnv(process.env);
  const dataSource = new DataSource(
    dataSourceOptions({ ...databaseSettingsFromEnv(env), poolSize: 2 }),
  );
  await dataSource.initialize();
  try {
    const applied = await dataSource.runMigrations({ transaction: 'each' });
    console.log(
      applied.length
        ? `[migrate] applied ${applied.map((m) => m.name).join(', ')} to ${env.DB_NAME}`
        : `[migrate] ${env.DB_NAME} is up to date`,
    );
  } finally {
    await dataSource.destroy();
  }
}

main().catch((error: unknown) => {
  console.error('[migrate] failed:', error instanceof Error ? error.message : error);
  process.exit(1);
});
