import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { validateDatabaseEnv } from '../config/env.schema';
import { databaseSettingsFromEnv, dataSourceOptions } from './data-source-options';

/**
 * Runs a command-line task (migrations, the seed) against the database the environment names, with a
 * small pool, and always closes the connection. Exits non-zero with the error's message on failure.
 */
export function runWithDataSource(
  label: string,
  task: (dataSource: DataSource) => Promise<string>,
): void {
  const run = async () => {
    const env = validateDatabaseEnv(process.env);
    const dataSource = new DataSource(
      dataSourceOptions({ ...databaseSettingsFromEnv(env), poolSize: 2 }),
    );
    await dataSource.initialize();
    try {
      console.log(`[${label}] ${await task(dataSource)}`);
    } finally {
      await dataSource.destroy();
    }
  };
  run().catch((error: unknown) => {
    console.error(`[${label}] failed:`, error instanceof Error ? error.message : error);
    process.exit(1);
  });
}
