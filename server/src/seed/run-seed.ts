import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { validateDatabaseEnv } from '../config/env.schema';
import { databaseSettingsFromEnv, dataSourceOptions } from '../database/data-source-options';
import { seedDemo } from './seed-demo';

/** `npm run seed -w server`: adds the demo company when it is missing. */
async function main(): Promise<void> {
  const env = validateDatabaseEnv(process.env);
  const dataSource = new DataSource(
    dataSourceOptions({ ...databaseSettingsFromEnv(env), poolSize: 2 }),
  );
  await dataSource.initialize();
  try {
    const { created } = await seedDemo(dataSource);
    console.log(
      created.length ? `[seed] added ${created.join(', ')}` : '[seed] demo data already present',
    );
  } finally {
    await dataSource.destroy();
  }
}

main().catch((error: unknown) => {
  console.error('[seed] failed:', error instanceof Error ? error.message : error);
  process.exit(1);
});
