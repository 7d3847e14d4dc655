import { spawnSync } from 'node:child_process';
import { resolve } from 'node:path';
import { Client } from 'pg';
import { DataSource } from 'typeorm';
import { validateDatabaseEnv } from '../../src/config/env.schema';
import { databaseSettingsFromEnv, dataSourceOptions } from '../../src/database/data-source-options';

/** The test database's connection settings (test-env.ts points DB_NAME at it). */
const settings = databaseSettingsFromEnv(validateDatabaseEnv(process.env));

/**
 * A database name of this test run's own, beside the test database (`pondwright_test_backup_copy`), so
 * checkouts that test side by side with their own DB_TEST_NAME never share one.
 */
export function scratchDatabaseName(label: string): string {
  return `${settings.database}_${label}`;
}

async function admin<T>(work: (client: Client) => Promise<T>): Promise<T> {
  const client = new Client({
    host: settings.host,
    port: settings.port,
    user: settings.username,
    password: settings.password,
    database: 'postgres',
  });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

const quoted = (name: string) => `"${name.replace(/"/g, '""')}"`;

export async function dropDatabase(name: string): Promise<void> {
  await admin((client) => client.query(`DROP DATABASE IF EXISTS ${quoted(name)} WITH (FORCE)`));
}

/** An empty database under this name, whatever was there before. */
export async function createEmptyDatabase(name: string): Promise<void> {
  await dropDatabase(name);
  await admin((client) => client.query(`CREATE DATABASE ${quoted(name)}`));
}

/** A TypeORM connection to the named database, with the app's entities and migrations. */
export async function openDatabase(name: string): Promise<DataSource> {
  const dataSource = new DataSource(
    dataSourceOptions({ ...settings, database: name, poolSize: 2 }),
  );
  return dataSource.initialize();
}

/** Runs `scripts/<name>` with the test database's connection settings plus `env`. */
export function runScript(
  name: string,
  args: string[],
  env: Record<string, string | undefined>,
): { status: number | null; stdout: string; stderr: string } {
  const result = spawnSync('bash', [resolve(__dirname, '../../../scripts', name), ...args], {
    env: {
      PATH: process.env.PATH,
      DB_HOST: settings.host,
      DB_PORT: String(settings.port),
      DB_USER: settings.username,
      DB_PASSWORD: settings.password,
      ...env,
    },
    encoding: 'utf8',
    timeout: 120_000,
  });
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

export type TableFingerprint = { rows: number; md5: string };

/**
 * Every table's row count and the MD5 of its rows (each row as text, in a fixed order), and every
 * sequence's last value: two databases with the same fingerprint hold the same data.
 */
export async function dataFingerprint(dataSource: DataSource): Promise<{
  tables: Record<string, TableFingerprint>;
  sequences: Record<string, string | null>;
}> {
  const tables: Record<string, TableFingerprint> = {};
  const names = (await dataSource.query(
    `SELECT table_name AS name FROM information_schema.tables
     WHERE table_schema = 'public' AND table_type = 'BASE TABLE' ORDER BY table_name`,
  )) as Array<{ name: string }>;
  for (const { name } of names) {
    const [row] = (await dataSource.query(
      `SELECT count(*)::int AS rows,
              md5(coalesce(string_agg(t::text, E'\\n' ORDER BY t::text), '')) AS md5
       FROM ${quoted(name)} t`,
    )) as [TableFingerprint];
    tables[name] = row;
  }
  const sequences = Object.fromEntries(
    (
      (await dataSource.query(
        `SELECT sequencename AS name, last_value::text AS value FROM pg_sequences
         WHERE schemaname = 'public' ORDER BY sequencename`,
      )) as Array<{ name: string; value: string | null }>
    ).map(({ name, value }) => [name, value]),
  );
  return { tables, sequences };
}

export type SchemaFingerprint = Record<
  'columns' | 'constraints' | 'indexes' | 'triggers' | 'functions' | 'extensions',
  string[]
>;

/**
 * The schema's objects as PostgreSQL describes them: columns with types, nullability and defaults;
 * constraints, indexes and triggers with their definitions; functions; extensions.
 */
export async function schemaFingerprint(dataSource: DataSource): Promise<SchemaFingerprint> {
  const list = async (sql: string) =>
    ((await dataSource.query(sql)) as Array<{ item: string }>).map((row) => row.item);
  return {
    columns: await list(
      `SELECT concat_ws(' ', table_name, column_name, data_type, is_nullable, column_default) AS item
       FROM information_schema.columns WHERE table_schema = 'public' ORDER BY 1`,
    ),
    constraints: await list(
      `SELECT conrelid::regclass || ' ' || conname || ' ' || pg_get_constraintdef(oid) AS item
       FROM pg_constraint WHERE connamespace = 'public'::regnamespace ORDER BY 1`,
    ),
    indexes: await list(
      `SELECT indexdef AS item FROM pg_indexes WHERE schemaname = 'public' ORDER BY 1`,
    ),
    triggers: await list(
      `SELECT tgrelid::regclass || ' ' || pg_get_triggerdef(oid) AS item
       FROM pg_trigger WHERE NOT tgisinternal ORDER BY 1`,
    ),
    functions: await list(
      `SELECT p.oid::regprocedure::text AS item FROM pg_proc p
       WHERE p.pronamespace = 'public'::regnamespace
         AND NOT EXISTS (SELECT 1 FROM pg_depend d WHERE d.objid = p.oid AND d.deptype = 'e')
       ORDER BY 1`,
    ),
    extensions: await list(`SELECT extname AS item FROM pg_extension ORDER BY 1`),
  };
}
