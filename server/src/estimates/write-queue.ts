/**
 * Runs the tasks given for one key one after another within this process; tasks for different keys
 * run at once. A failed task does not stop the ones queued behind it.
 *
 * Why estimates need it: their saves and finalises are ordered by the estimate's row lock, and a
 * transaction waiting for that lock holds one of the pool's connections all the while. A burst of
 * saves to one estimate (test/estimate-concurrency.e2e-spec.ts: a hundred at once) parked every pooled
 * connection on the lock, so every other request of the process, any company's, waited for a
 * connection until pg-pool gave up after `connectionTimeoutMillis`: 503s with PostgreSQL healthy,
 * where the losing saves should have had their 409. Queued here, a waiting write holds no connection;
 * the row lock still orders writes between server instances.
 */
export class WriteQueue {
  private readonly tails = new Map<string, Promise<void>>();

  run<T>(key: string, task: () => Promise<T>): Promise<T> {
    const result = (this.tails.get(key) ?? Promise.resolve()).then(task);
    const tail = result.then(
      () => undefined,
      () => undefined,
    );
    this.tails.set(key, tail);
    void tail.then(() => {
      if (this.tails.get(key) === tail) this.tails.delete(key);
    });
    return result;
  }
}
