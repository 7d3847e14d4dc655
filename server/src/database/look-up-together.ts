import type { EntityManager } from 'typeorm';

type LookUps<T extends readonly unknown[]> = { readonly [K in keyof T]: () => Promise<T[K]> };

/**
 * Independent look-ups through one manager. Through the pooled manager they run at once, each on a
 * connection of its own. A transaction's manager holds a single connection, and a PostgreSQL
 * connection answers one query at a time: pg 8 queues a query sent to a busy client with a
 * deprecation warning, and pg 9 refuses it. So there they run one after another.
 */
export async function lookUpTogether<T extends readonly unknown[]>(
  manager: EntityManager,
  lookUps: LookUps<T>,
): Promise<T> {
  if (!manager.queryRunner)
    return Promise.all(lookUps.map((lookUp) => lookUp())) as unknown as Promise<T>;
  const results: unknown[] = [];
  for (const lookUp of lookUps) results.push(await lookUp());
  return results as unknown as T;
}
