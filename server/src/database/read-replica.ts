import type { DataSource, EntityManager } from 'typeorm';

/**
 * Runs a report's reads on the read replica when one is configured (`DB_REPLICA_HOST`), else on the
 * primary. Only the reports read there (the job cost report, the estimate stats, the learned rates):
 * they are the heavy aggregate reads, and a figure a second behind is harmless in a report, whereas
 * the rest of the app must read what it has just written. The replica may lag, so nothing that
 * writes should decide from these reads.
 */
export async function readOnReplica<T>(
  dataSource: DataSource,
  read: (manager: EntityManager) => Promise<T>,
): Promise<T> {
  // 'slave' is TypeORM's name for a replica; without one configured it answers from the primary.
  const runner = dataSource.createQueryRunner('slave');
  try {
    return await read(runner.manager);
  } finally {
    await runner.release();
  }
}
