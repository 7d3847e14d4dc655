import type { DataSource } from 'typeorm';
import type { BenchEstimateRef } from './bench-seed';

/** What a load's saves left in the database, against what the server acknowledged. */
export type SaveCount = {
  acknowledged: number;
  /** Revisions the drafts moved on by. */
  stored: number;
  /** `draft-saved` audit events written. */
  events: number;
};

/**
 * Keeps the revision each saved estimate is at (the next save must name it) and checks that nothing
 * acknowledged was lost: every 200 must be a stored revision with its audit event. A save still in
 * flight when the load stops may be stored without being counted, so stored can exceed acknowledged.
 */
export class SaveLedger {
  readonly revisions = new Map<string, number>();
  private before = { revisions: 0, events: 0 };

  constructor(
    private readonly dataSource: DataSource,
    private readonly estimates: BenchEstimateRef[],
  ) {}

  /**
   * Reads where the estimates stand; call before every run. Saves still in flight from the run before
   * (a load stops without waiting for its answers) are waited for, or the first save would be stale.
   */
  async open(): Promise<void> {
    const now = await this.settled();
    for (const [id, revision] of now.byEstimate) this.revisions.set(id, revision);
    this.before = { revisions: now.revisions, events: now.events };
  }

  /** Waits until the server has finished the saves in flight, then counts. */
  async close(acknowledged: number): Promise<SaveCount> {
    const now = await this.settled();
    return {
      acknowledged,
      stored: now.revisions - this.before.revisions,
      events: now.events - this.before.events,
    };
  }

  /** Reads until two reads a quarter of a second apart agree (five seconds at most). */
  private async settled() {
    let last = await this.read();
    for (let attempt = 0; attempt < 20; attempt++) {
      await new Promise((resolve) => setTimeout(resolve, 250));
      const next = await this.read();
      const same = next.revisions === last.revisions && next.events === last.events;
      last = next;
      if (same) break;
    }
    return last;
  }

  private async read() {
    const ids = this.estimates.map((estimate) => estimate.id);
    const rows = (await this.dataSource.query(
      `SELECT d.estimate_id, d.revision,
              (SELECT count(*)::int FROM estimate_events ev
               WHERE ev.estimate_id = d.estimate_id AND ev.action = 'draft-saved') AS events
       FROM estimate_drafts d WHERE d.estimate_id = ANY($1::uuid[])`,
      [ids],
    )) as Array<{ estimate_id: string; revision: number; events: number }>;
    return {
      byEstimate: new Map(rows.map((row) => [row.estimate_id, row.revision])),
      revisions: rows.reduce((sum, row) => sum + row.revision, 0),
      events: rows.reduce((sum, row) => sum + row.events, 0),
    };
  }
}

/** Nothing acknowledged is missing, and every stored revision has its audit event. */
export function nothingLost(count: SaveCount): boolean {
  return count.stored >= count.acknowledged && count.events === count.stored;
}
