import type { DataSourceOptions } from 'typeorm';
import type { DatabaseEnv } from '../config/env.schema';
import { entities } from './entities';
import { migrations } from './migrations';

export type DatabaseSettings = {
  host: string;
  port: number;
  username: string;
  password: string;
  database: string;
  poolSize: number;
};

/**
 * The one description of how Pondwright talks to PostgreSQL, used by the app, the migration runner, the
 * seed and the tests. Timeouts are short so a missing database answers in seconds instead of hanging.
 */
export function dataSourceOptions(settings: DatabaseSettings): DataSourceOptions {
  return {
    type: 'postgres',
    host: settings.host,
    port: settings.port,
    username: settings.username,
    password: settings.password,
    database: settings.database,
    entities,
    migrations,
    migrationsTableName: 'migrations',
    synchronize: false,
    migrationsRun: false,
    poolSize: settings.poolSize,
    extra: {
      connectionTimeoutMillis: 2000,
      statement_timeout: 10000,
      idle_in_transaction_session_timeout: 30000,
    },
  };
}

export function databaseSettingsFromEnv(env: DatabaseEnv): DatabaseSettings {
  return {
    host: env.DB_HOST,
    port: env.DB_PORT,
    username: env.DB_USER,
    password: env.DB_PASSWORD,
    database: env.DB_NAME,
    poolSize: env.DB_POOL_SIZE,
  };
}
