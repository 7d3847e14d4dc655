import type { EstimateComputed, EstimateContent, ManualLine } from '@pondwright/shared';
import type { PriceBook } from '@pondwright/shared/pricing';
import type { DataSource } from 'typeorm';
import { expect } from 'vitest';
import { canonicalJson, versionSha256 } from '../../src/estimates/content-hash';
import { priceEstimateContent, type UncheckedContent } from '../../src/estimates/price-estimate';

/** How many lines the estimator's copy carries in the durability and concurrency tests. */
export const LINES_PER_SAVE = 30;

/**
 * The estimator's 30 hand-entered lines, every figure different from one save to the next (`seed`),
 * so a version made of two saves' halves could not pass for either.
 */
export function manualLinesFor(seed: number): ManualLine[] {
  const categories = ['materials', 'labor', 'equipment', 'disposal', 'other'] as const;
  return Array.from({ length: LINES_PER_SAVE }, (_, index) => ({
    id: `line-${String(index + 1).padStart(2, '0')}`,
    category: categories[index % categories.length]!,
    description: `Line ${index + 1} of save ${seed}`,
    quantity: String(1 + ((seed + index) % 9)),
    unit: 'ea',
    unitCost: `${10 + ((seed * 7 + index * 13) % 400)}.${String((seed + index) % 100).padStart(2, '0')}`,
    taxable: index % 3 !== 0,
    kind: 'base',
  }));
}

type VersionRow = {
  version_number: number;
  content: EstimateContent;
  computed: EstimateComputed;
  content_sha256: string;
  book: PriceBook;
};
type DraftRow = {
  revision: number;
  content: EstimateContent;
  computed: EstimateComputed;
  book: PriceBook;
};
type EventRow = { action: string; detail: Record<string, unknown> };

export type StoredEstimate = {
  status: string;
  draft: DraftRow;
  /** In version order; `marker` is the `notes` of the save it was finalised from. */
  versions: Array<{ versionNumber: number; sha256: string; marker: string; total: string }>;
  /** Revision → total, from the audit log's `draft-saved` events. */
  savedRevisions: Map<number, string>;
};

/**
 * Reads one estimate back from PostgreSQL and checks that nothing of it is half written:
 * - every version has all its lines (the 30 manual ones priced among them), its figures are what the
 *   server computes from its content with its price book (totals included), and its SHA-256 matches;
 * - version numbers run 1..n without a gap, each with exactly one `finalised` event and each
 *   `finalised` event with its version;
 * - the draft is whole too, its revision is one more than the `draft-saved` events, which run
 *   2..revision without a gap;
 * - the status agrees with the last thing that happened.
 */
export async function readWholeEstimate(
  dataSource: DataSource,
  estimateId: string,
): Promise<StoredEstimate> {
  const [estimate] = (await dataSource.query(`SELECT status FROM estimates WHERE id = $1`, [
    estimateId,
  ])) as Array<{ status: string }>;
  expect(estimate, `estimate ${estimateId}`).toBeDefined();
  const versions = (await dataSource.query(
    `SELECT v.version_number, v.content, v.computed, v.content_sha256, b.content AS book
     FROM estimate_versions v JOIN price_book_versions b ON b.id = v.price_book_version_id
     WHERE v.estimate_id = $1 ORDER BY v.version_number`,
    [estimateId],
  )) as VersionRow[];
  const [draft] = (await dataSource.query(
    `SELECT d.revision, d.content, d.computed, b.content AS book
     FROM estimate_drafts d JOIN price_book_versions b ON b.id = d.price_book_version_id
     WHERE d.estimate_id = $1`,
    [estimateId],
  )) as DraftRow[];
  const events = (await dataSource.query(
    `SELECT action, detail FROM estimate_events WHERE estimate_id = $1 ORDER BY id`,
    [estimateId],
  )) as EventRow[];

  expect(draft, `the draft of ${estimateId}`).toBeDefined();
  expectWhole(draft!.content, draft!.computed, draft!.book, `draft revision ${draft!.revision}`);

  expect(versions.map((v) => v.version_number)).toEqual(versions.map((_, index) => index + 1));
  for (const version of versions) {
    const label = `version ${version.version_number} of ${estimateId}`;
    expect(version.content.manualLines, label).toHaveLength(LINES_PER_SAVE);
    expectWhole(version.content, version.computed, version.book, label);
    expect(version.content_sha256, label).toBe(versionSha256(version.content, version.computed));
  }

  const finalised = events.filter((event) => event.action === 'finalised');
  expect(finalised.map((event) => [event.detail.versionNumber, event.detail.sha256])).toEqual(
    versions.map((version) => [version.version_number, version.content_sha256]),
  );
  const saved = events.filter((event) => event.action === 'draft-saved');
  expect(saved.map((event) => event.detail.revision)).toEqual(saved.map((_, index) => index + 2));
  expect(draft!.revision).toBe(saved.length + 1);
  expect(events.filter((event) => event.action === 'created')).toHaveLength(1);

  const last = events.filter((event) => ['finalised', 'draft-saved'].includes(event.action)).at(-1);
  if (last?.action === 'finalised') expect(estimate!.status).toBe(last.detail.status);
  else expect(estimate!.status).toBe('draft');

  return {
    status: estimate!.status,
    draft: draft!,
    versions: versions.map((version) => ({
      versionNumber: version.version_number,
      sha256: version.content_sha256,
      marker: version.content.notes,
      total: version.computed.priced.totals.total,
    })),
    savedRevisions: new Map(
      saved.map((event) => [event.detail.revision as number, event.detail.total as string]),
    ),
  };
}

/** The stored figures are exactly what the server computes from the stored content, lines and totals. */
function expectWhole(
  content: EstimateContent,
  computed: EstimateComputed,
  book: PriceBook,
  label: string,
): void {
  const manual = computed.priced.lines.filter((line) => line.source === 'manual');
  expect(manual, label).toHaveLength(content.manualLines.length);
  const recomputed = priceEstimateContent(content as unknown as UncheckedContent, book);
  expect(canonicalJson(computed) === canonicalJson(recomputed.computed), label).toBe(true);
}
