import type { EstimateView, StaleDraftBody } from '@pondwright/shared';
import { manualLinesFor } from './estimate-integrity';

/** One request of a burst and what came of it; `status` is `no-answer` when the connection died. */
export type BurstCall = {
  chain: number;
  op: 'save' | 'finalise';
  marker: string;
  /** The draft revision the request named. */
  sentRevision: number;
  status: number | 'no-answer' | 'hung';
  code?: string;
  startedAt: number;
  ms: number;
  /** A 200 save: the revision it stored and its total. */
  revision?: number;
  total?: string;
  /** A 201 finalise: the version it made. */
  versionNumber?: number;
  sha256?: string;
};

/** A request that takes longer than this counts as hung. */
const HANG_MS = 15_000;

/**
 * One estimator editing one estimate as fast as the server lets them: save the draft with 30 new lines
 * (its `notes` naming the save), finalise that revision into a version, and again. A stale revision is
 * taken from the 409; a 503 waits a moment and starts over with a save. Stops when `stopped()` says
 * so or when the server no longer answers.
 */
export async function runChain(options: {
  baseUrl: () => string;
  token: string;
  estimate: EstimateView;
  chain: number;
  calls: BurstCall[];
  stopped: () => boolean;
  onAnswer?: (call: BurstCall) => void;
}): Promise<void> {
  const { token, estimate, chain, calls, stopped } = options;
  const { revision: startRevision, content } = estimate.draft;
  let revision = startRevision;
  let seq = 0;
  const request = async (
    op: BurstCall['op'],
    marker: string,
    method: string,
    path: string,
    body: object,
  ): Promise<{ call: BurstCall; json: unknown }> => {
    const call: BurstCall = {
      chain,
      op,
      marker,
      sentRevision: revision,
      status: 'no-answer',
      startedAt: Date.now(),
      ms: 0,
    };
    calls.push(call);
    let json: unknown = null;
    try {
      const response = await fetch(`${options.baseUrl()}${path}`, {
        method,
        headers: { authorization: `Bearer ${token}`, 'content-type': 'application/json' },
        body: JSON.stringify(body),
        signal: AbortSignal.timeout(HANG_MS),
      });
      json = await response.json();
      call.status = response.status;
      call.code = (json as { code?: string }).code;
    } catch (error) {
      call.status = (error as Error).name === 'TimeoutError' ? 'hung' : 'no-answer';
    }
    call.ms = Date.now() - call.startedAt;
    options.onAnswer?.(call);
    return { call, json };
  };
  const pause = () => new Promise((resolve) => setTimeout(resolve, 50));

  while (!stopped()) {
    seq += 1;
    const marker = `chain ${chain} save ${seq}`;
    const saved = await request('save', marker, 'PUT', `/api/estimates/${estimate.id}/draft`, {
      ...content,
      notes: marker,
      manualLines: manualLinesFor(chain * 10_000 + seq),
      revision,
    });
    if (saved.call.status === 'no-answer' || saved.call.status === 'hung') return;
    if (saved.call.status === 409) {
      // The save before answered 503 yet committed: go on from the revision it stored.
      revision = (saved.json as StaleDraftBody).current.revision;
      continue;
    }
    if (saved.call.status !== 200) {
      await pause();
      continue;
    }
    const view = saved.json as EstimateView;
    revision = view.draft.revision;
    saved.call.revision = revision;
    saved.call.total = view.draft.computed.priced.totals.total;
    if (stopped()) return;

    const finalised = await request(
      'finalise',
      marker,
      'POST',
      `/api/estimates/${estimate.id}/finalise`,
      { revision },
    );
    if (finalised.call.status === 'no-answer' || finalised.call.status === 'hung') return;
    if (finalised.call.status === 201) {
      const latest = (finalised.json as EstimateView).versions.at(-1)!;
      finalised.call.versionNumber = latest.versionNumber;
      finalised.call.sha256 = latest.contentSha256;
    } else if (finalised.call.status !== 409) {
      await pause();
    }
  }
}

export function isSuccess(call: BurstCall): boolean {
  return call.status === 200 || call.status === 201;
}

/** How many calls ended with each status, e.g. `{ "200": 41, "201": 40, "no-answer": 8 }`. */
export function countByStatus(calls: BurstCall[]): Record<string, number> {
  const counts: Record<string, number> = {};
  for (const call of calls) counts[String(call.status)] = (counts[String(call.status)] ?? 0) + 1;
  return counts;
}
