import { existsSync, mkdtempSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
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

// The app's database, seeded with the demo, and the database a backup of it is restored into.
const source = scratchDatabaseName('backup_source');
const copy = scratchDatabaseName('backup_copy');
const folder = mkdtempSync(join(tmpdir(), 'pondwright-backup-'));
const backupFile = join(folder, 'demo.dump');
let sourceDb: DataSource;

beforeAll(async () => {
  await createEmptyDatabase(source);
  await dropDatabase(copy);
  sourceDb = await openDatabase(source);
  await sourceDb.runMigrations({ transaction: 'each' });
  await seedDemo(sourceDb);
});

afterAll(async () => {
  await sourceDb?.destroy();
  await dropDatabase(source);
  await dropDatabase(copy);
  rmSync(folder, { recursive: true, force: true });
});

async function fingerprintsOf(name: string) {
  const dataSource = await openDatabase(name);
  try {
    return { data: await dataFingerprint(dataSource), schema: await schemaFingerprint(dataSource) };
  } finally {
    await dataSource.destroy();
  }
}

describe('npm run db:backup, then npm run db:restore into a new database', () => {
  it('restores every table row for row, with the same schema and sequences', async () => {
    const backup = runScript('backup.sh', [backupFile], { DB_NAME: source });
    expect(backup.stderr).toContain('wrote');
    expect(backup.status).toBe(0);
    expect(backup.stdout.trim()).toBe(backupFile);
    // Owner-only: the dump holds password hashes and customers' details.
    expect(statSync(backupFile).mode & 0o777).toBe(0o600);

    const restore = runScript('restore.sh', [backupFile], {
      DB_NAME: source,
      RESTORE_DB_NAME: copy,
    });
    expect(restore.stderr).toContain(`created database ${copy}`);
    expect(restore.status).toBe(0);

    const original = await fingerprintsOf(source);
    const restored = await fingerprintsOf(copy);
    // The demo is really there, so equal fingerprints mean something.
    for (const table of ['companies', 'users', 'customers', 'estimates', 'jobs', 'job_logs'])
      expect(original.data.tables[table]!.rows, table).toBeGreaterThan(0);
    expect(Object.keys(original.data.tables).length).toBeGreaterThan(20);
    expect(restored.data).toEqual(original.data);
    expect(restored.schema).toEqual(original.schema);
  });

  it('replaces what a database holds when restored over it again', async () => {
    const copyDb = await openDatabase(copy);
    try {
      await copyDb.query(`UPDATE customers SET notes = 'changed after the backup'`);
      await copyDb.query(`DELETE FROM job_logs`);
      await copyDb.query(`INSERT INTO companies (name) VALUES ('Founded after the backup')`);
    } finally {
      await copyDb.destroy();
    }
    const restore = runScript('restore.sh', [backupFile], {
      DB_NAME: source,
      RESTORE_DB_NAME: copy,
    });
    expect(restore.status).toBe(0);
    expect((await fingerprintsOf(copy)).data).toEqual((await fingerprintsOf(source)).data);
  });

  it('refuses to restore over the app’s database unless told to, and leaves it as it was', async () => {
    const before = await fingerprintsOf(copy);
    // The copy plays the app's database here (DB_NAME), with no other database named to restore into.
    const refused = runScript('restore.sh', [backupFile], { DB_NAME: copy });
    expect(refused.status).not.toBe(0);
    expect(refused.stderr).toContain(`refusing to restore over ${copy}`);
    expect((await fingerprintsOf(copy)).data).toEqual(before.data);

    const allowed = runScript('restore.sh', ['--overwrite-app-db', backupFile], { DB_NAME: copy });
    expect(allowed.status).toBe(0);
  });

  it('refuses a missing file, and leaves no file behind when a backup fails', async () => {
    const notABackup = runScript('restore.sh', [join(folder, 'missing.dump')], {
      RESTORE_DB_NAME: copy,
    });
    expect(notABackup.status).not.toBe(0);
    expect(notABackup.stderr).toContain('no such file');

    const wrongPassword = runScript('backup.sh', [join(folder, 'never.dump')], {
      DB_NAME: source,
      DB_PASSWORD: 'not-the-password',
    });
    expect(wrongPassword.status).not.toBe(0);
    expect(existsSync(join(folder, 'never.dump'))).toBe(false);
    expect(existsSync(join(folder, 'never.dump.partial'))).toBe(false);
  });

  it('names a backup by its UTC time under .data/backups when no file is given', () => {
    const backup = runScript('backup.sh', [], { DB_NAME: source });
    expect(backup.status).toBe(0);
    const written = backup.stdout.trim();
    try {
      expect(written).toMatch(/\/\.data\/backups\/pondwright-\d{8}T\d{6}Z\.dump$/);
      expect(existsSync(written)).toBe(true);
    } finally {
      rmSync(written, { force: true });
    }
  });
});
