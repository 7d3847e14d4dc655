import type { EstimateView, StaleDraftBody } from '@pondwright/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { manualLinesFor, readWholeEstimate } from './support/estimate-integrity';
import { addCustomer } from './support/quote-fixtures';
import { bearer, createTestApp, signupCompany, type TestApp } from './support/test-app';

/**
 * A hundred estimators saving the same estimate at once, over real HTTP connections to the app: the
 * draft's revision lets exactly one save through per revision (the others get 409 with the draft that
 * won), and every save that succeeded is in the database, with versions numbered without a gap.
 */
const CLIENTS = 100;
/** How long the estimators of the racing test keep trying. */
const RACE_MS = 20_000;

let testApp: TestApp;
let baseUrl: string;

beforeAll(async () => {
  testApp = await createTestApp();
  // A listening server rather than supertest, so the hundred requests really are concurrent.
  await testApp.app.listen(0, '127.0.0.1');
  baseUrl = (await testApp.app.getUrl()).replace('[::1]', '127.0.0.1');
});
afterAll(async () => {
  await testApp.close();
});

type Answer = { status: number; body: Record<string, unknown> };

async function call(token: string, method: string, path: string, body: object): Promise<Answer> {
  const response = await fetch(`${baseUrl}${path}`, {
    method,
    headers: { authorization: `Bearer ${token}`, 'content-type': 'application/json' },
    body: JSON.stringify(body),
    signal: AbortSignal.timeout(55_000),
  });
  return { status: response.status, body: (await response.json()) as Record<string, unknown> };
}

async function newEstimate(): Promise<{ token: string; estimate: EstimateView }> {
  const owner = await signupCompany(testApp);
  const customerId = await addCustomer(testApp, owner.companyId, 'Crowded Customer');
  const created = await testApp
    .http()
    .post('/api/estimates')
    .set(...bearer(owner))
    .send({ title: 'Everyone edits this pond', customerId })
    .expect(201);
  return { token: owner.accessToken, estimate: created.body as EstimateView };
}

/** Client `client`'s own copy of the draft: its name in the notes and 30 lines of its own. */
function draftOf(estimate: EstimateView, client: number, revision: number) {
  return {
    ...estimate.draft.content,
    notes: `client ${client}`,
    manualLines: manualLinesFor(client),
    revision,
  };
}

describe('a hundred saves of one estimate at once', () => {
  it('lets exactly one save of a revision through and answers the other 99 with 409 and the winning draft', async () => {
    const { token, estimate } = await newEstimate();
    const path = `/api/estimates/${estimate.id}/draft`;
    const answers = await Promise.all(
      Array.from({ length: CLIENTS }, (_, client) =>
        call(token, 'PUT', path, draftOf(estimate, client, estimate.draft.revision)),
      ),
    );
    const won = answers.filter((answer) => answer.status === 200);
    const refused = answers.filter((answer) => answer.status === 409);
    expect(won).toHaveLength(1);
    expect(refused).toHaveLength(CLIENTS - 1);
    const winner = (won[0]!.body as unknown as EstimateView).draft;
    expect(winner.revision).toBe(estimate.draft.revision + 1);
    for (const answer of refused) {
      const body = answer.body as unknown as StaleDraftBody;
      expect(body.code).toBe('STALE_DRAFT');
      expect(body.current.revision).toBe(winner.revision);
      expect(body.current.content.notes).toBe(winner.content.notes);
    }

    // The winner's copy, and nothing else, is the draft; finalising it makes version 1 of it.
    const finalised = await call(token, 'POST', `/api/estimates/${estimate.id}/finalise`, {
      revision: winner.revision,
    });
    expect(finalised.status).toBe(201);
    const stored = await readWholeEstimate(testApp.dataSource, estimate.id);
    expect(stored.draft.revision).toBe(winner.revision);
    expect(stored.draft.content.notes).toBe(winner.content.notes);
    expect(stored.savedRevisions.size).toBe(1);
    expect(stored.versions).toEqual([
      expect.objectContaining({ versionNumber: 1, marker: winner.content.notes }),
    ]);
  });

  it('numbers the versions of a hundred estimators racing to save and finalise without a gap, losing no save', async () => {
    const { token, estimate } = await newEstimate();
    type Save = { client: number; sentRevision: number; revision: number; total: string };
    const saves: Save[] = [];
    const finalised = new Map<number, { versionNumber: number; sha256: string }>();
    const statuses: Record<string, number> = {};
    const unavailable = { saves: 0, finalises: 0 };
    const conflictCodes = new Set<string>();
    const count = (answer: Answer) => {
      statuses[answer.status] = (statuses[answer.status] ?? 0) + 1;
      if (answer.status === 409) conflictCodes.add(String(answer.body.code));
    };
    const deadline = Date.now() + RACE_MS;

    // Each estimator saves their copy and finalises it. A 409 means someone saved first: they take
    // the revision it names, wait a little (longer after each conflict, up to 2 s) and try again.
    const estimator = async (client: number) => {
      let revision = estimate.draft.revision;
      for (let attempt = 0; Date.now() < deadline; attempt += 1) {
        if (attempt > 0) {
          const ceiling = Math.min(2_000, 100 * 2 ** attempt);
          await new Promise((resolve) => setTimeout(resolve, Math.random() * ceiling));
        }
        const saved = await call(
          token,
          'PUT',
          `/api/estimates/${estimate.id}/draft`,
          draftOf(estimate, client, revision),
        );
        count(saved);
        if (saved.status === 503) unavailable.saves += 1;
        if (saved.status === 409) {
          revision = (saved.body as unknown as StaleDraftBody).current.revision;
          continue;
        }
        if (saved.status !== 200) continue;
        const draft = (saved.body as unknown as EstimateView).draft;
        saves.push({
          client,
          sentRevision: revision,
          revision: draft.revision,
          total: draft.computed.priced.totals.total,
        });
        revision = draft.revision;
        const done = await call(token, 'POST', `/api/estimates/${estimate.id}/finalise`, {
          revision,
        });
        count(done);
        if (done.status === 503) unavailable.finalises += 1;
        if (done.status === 201) {
          const latest = (done.body as unknown as EstimateView).versions.at(-1)!;
          finalised.set(client, {
            versionNumber: latest.versionNumber,
            sha256: latest.contentSha256,
          });
          return;
        }
        if (done.status === 409)
          revision = (done.body as unknown as StaleDraftBody).current.revision;
      }
    };
    const started = Date.now();
    await Promise.all(Array.from({ length: CLIENTS }, (_, client) => estimator(client)));
    const elapsed = Date.now() - started;

    const stored = await readWholeEstimate(testApp.dataSource, estimate.id);
    console.info(
      `[concurrency] ${CLIENTS} estimators racing for ${elapsed} ms: ` +
        `answers ${JSON.stringify(statuses)}; ${saves.length} saves and ${finalised.size} versions stored`,
    );
    // The designed answers: success, or 409 for a stale revision. A 503 is the pool shedding load
    // (no connection within 2 s on a saturated machine); it is counted against the rows below.
    expect(
      Object.keys(statuses).every((status) => ['200', '201', '409', '503'].includes(status)),
    ).toBe(true);
    expect([...conflictCodes]).toEqual(['STALE_DRAFT']);
    expect(stored.versions.length).toBeGreaterThanOrEqual(2);

    // No lost update: each successful save moved the draft on by exactly one from the revision it
    // was edited from, no two share a revision, and the audit log holds each with its total.
    expect(saves.every((save) => save.revision === save.sentRevision + 1)).toBe(true);
    expect(new Set(saves.map((save) => save.revision)).size).toBe(saves.length);
    for (const save of saves) expect(stored.savedRevisions.get(save.revision)).toBe(save.total);
    expect(stored.savedRevisions.size - saves.length).toBeLessThanOrEqual(unavailable.saves);

    // Versions 1..n without a gap (readWholeEstimate), each estimator's own copy where it was told so.
    for (const [client, version] of finalised) {
      expect(stored.versions[version.versionNumber - 1]).toMatchObject({
        sha256: version.sha256,
        marker: `client ${client}`,
      });
    }
    expect(stored.versions.length - finalised.size).toBeLessThanOrEqual(unavailable.finalises);
    const markers = stored.versions.map((version) => version.marker);
    expect(new Set(markers).size).toBe(markers.length);
  }, 60_000);
});
