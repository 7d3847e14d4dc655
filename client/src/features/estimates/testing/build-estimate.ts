import type { EstimateView } from '@pondwright/shared';
import fixture from './estimate-fixture.json';

/** A draft estimate as the server answered it for a typical pond, with overrides. */
export function buildEstimate(overrides: Partial<EstimateView> = {}): EstimateView {
  return { ...(structuredClone(fixture) as unknown as EstimateView), ...overrides };
}

/** The same estimate at another revision, its total replaced. */
export function withRevision(
  estimate: EstimateView,
  revision: number,
  total: string,
): EstimateView {
  const next = structuredClone(estimate);
  next.draft.revision = revision;
  next.draft.computed.priced.totals.total = total;
  return next;
}
