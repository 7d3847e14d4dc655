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
  /** A streaming read replica for the reports (`readOnReplica`); absent, everything reads the primary. */
  replica?: { host: string; port: number } | null;
};

/**
 * The one description of how Pondwright talks to PostgreSQL, used by the app, the migration runner, the
 * seed and the tests. Timeouts are short so a missing database answers in seconds instead of hanging.
 */
export function dataSourceOptions(settings: DatabaseSettings): DataSourceOptions {
  const primary = {
    host: settings.host,
    port: settings.port,
    username: settings.username,
    password: settings.password,
    database: settings.database,
  };
  return {
    type: 'postgres',
    ...(settings.replica
      ? {
          replication: {
            master: primary,
            slaves: [{ ...primary, ...settings.replica }],
            // TypeORM's default sends every read outside a transaction to the replica, where a row
            // saved a moment ago may not have arrived yet (an estimate saved, then opened: 404).
            // Reads stay on the primary; only the reports opt in to the replica (readOnReplica).
            defaultMode: 'master' as const,
          },
        }
      : primary),
    entities,
    migrations,
    migrationsTableName: 'migrations',
    synchronize: false,
    migrationsRun: false,
    poolSize: settings.poolSize,
    // node-postgres sends the two session timeouts as startup parameters. PgBouncer refuses unknown
    // ones unless told to ignore them (ignore_startup_parameters), and then they are lost: behind a
    // pooler, set them on the role instead (docs/scaling.md).
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
