import { examplePondInput as typicalPond } from '@pondwright/shared/engine';
import type { PriceBook } from '@pondwright/shared/pricing';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addMember, bearer, createTestApp, signupCompany, type TestApp } from './support/test-app';

let testApp: TestApp;

beforeAll(async () => {
  testApp = await createTestApp();
});
afterAll(async () => {
  await testApp.close();
});

type Session = { accessToken: string };

async function createPricedTakeoff(session: Session, name = 'Back-garden pond') {
  return testApp
    .http()
    .post('/api/priced-takeoffs')
    .set(...bearer(session))
    .send({ name, input: typicalPond() })
    .expect(201);
}

/** The owner raises every boulder's price by half, as a new version effective today. */
async function raiseBoulderPrices(owner: Session) {
  const current = await testApp
    .http()
    .get('/api/price-book')
    .set(...bearer(owner))
    .expect(200);
  const book = current.body.book as PriceBook;
  const raised: PriceBook = {
    ...book,
    materials: book.materials.map((material) =>
      material.kind === 'boulder'
        ? { ...material, unitCost: (Number(material.unitCost) * 1.5).toFixed(2) }
        : material,
    ),
  };
  return testApp
    .http()
    .put('/api/price-book')
    .set(...bearer(owner))
    .send({ book: raised, note: 'Quarry raised boulder prices' })
    .expect(201);
}

describe('priced takeoffs', () => {
  it('prices a takeoff with the book in effect and stores it with that version', async () => {
    const owner = await signupCompany(testApp);
    const estimator = await addMember(testApp, owner, 'estimator');
    const created = await createPricedTakeoff(estimator);
    expect(created.body).toMatchObject({
      name: 'Back-garden pond',
      priceBookVersion: { versionNumber: 1 },
      repricedAt: null,
    });
    expect(created.body.priced.totals.total).toMatch(/^\d+\.\d{2}$/);
    expect(Number(created.body.priced.totals.total)).toBeGreaterThan(0);
    expect(created.body.takeoff.basins[0].surfaceAreaSqFt).toBeCloseTo(150, 5);

    const list = await testApp
      .http()
      .get('/api/priced-takeoffs')
      .set(...bearer(owner))
      .expect(200);
    expect(list.body).toEqual([
      {
        id: created.body.id,
        name: 'Back-garden pond',
        total: created.body.priced.totals.total,
        versionNumber: 1,
        createdAt: created.body.createdAt,
        repricedAt: null,
      },
    ]);
  });

  it('keeps its prices after the owner raises boulder prices, previews the change, and adopts it when re-priced', async () => {
    const owner = await signupCompany(testApp);
    const estimator = await addMember(testApp, owner, 'estimator');
    const created = await createPricedTakeoff(estimator);
    const oldTotal = created.body.priced.totals.total as string;
    const boulderLine = (body: {
      priced: {
        lines: Array<{ id: string; source: string; unitCost: string; code: string | null }>;
      };
    }) => body.priced.lines.find((line) => line.source.startsWith('boulder'));
    expect(boulderLine(created.body)).toBeDefined();

    const raised = await raiseBoulderPrices(owner);

    const kept = await testApp
      .http()
      .get(`/api/priced-takeoffs/${created.body.id}`)
      .set(...bearer(estimator))
      .expect(200);
    expect(kept.body.priced).toEqual(created.body.priced);
    expect(kept.body.priceBookVersion.versionNumber).toBe(1);

    const preview = await testApp
      .http()
      .get(`/api/priced-takeoffs/${created.body.id}/reprice-preview`)
      .set(...bearer(estimator))
      .expect(200);
    expect(preview.body).toMatchObject({
      currentVersion: { id: created.body.priceBookVersion.id, versionNumber: 1 },
      latestVersion: { id: raised.body.id, versionNumber: 2 },
      upToDate: false,
      currentTotal: oldTotal,
    });
    expect(preview.body.bookChanges).toEqual(
      expect.arrayContaining([expect.objectContaining({ section: 'material', field: 'unitCost' })]),
    );
    expect(preview.body.estimateChanges.lines).toEqual(
      expect.arrayContaining([expect.objectContaining({ id: boulderLine(created.body)!.id })]),
    );
    expect(preview.body.estimateChanges.totals).toEqual(
      expect.arrayContaining([
        expect.objectContaining({ field: 'total', before: oldTotal, after: preview.body.newTotal }),
      ]),
    );
    expect(Number(preview.body.newTotal)).toBeGreaterThan(Number(oldTotal));

    // Previewing changed nothing.
    const stillKept = await testApp
      .http()
      .get(`/api/priced-takeoffs/${created.body.id}`)
      .set(...bearer(estimator))
      .expect(200);
    expect(stillKept.body.priced.totals.total).toBe(oldTotal);

    const repriced = await testApp
      .http()
      .post(`/api/priced-takeoffs/${created.body.id}/reprice`)
      .set(...bearer(estimator))
      .expect(201);
    expect(repriced.body.priceBookVersion).toMatchObject({ id: raised.body.id, versionNumber: 2 });
    expect(repriced.body.priced.totals.total).toBe(preview.body.newTotal);
    expect(repriced.body.repricedAt).toEqual(expect.any(String));
    expect(Number(boulderLine(repriced.body)!.unitCost)).toBeCloseTo(
      Number(boulderLine(created.body)!.unitCost) * 1.5,
      1,
    );

    const after = await testApp
      .http()
      .get(`/api/priced-takeoffs/${created.body.id}/reprice-preview`)
      .set(...bearer(estimator))
      .expect(200);
    expect(after.body).toMatchObject({
      upToDate: true,
      bookChanges: [],
      estimateChanges: { lines: [], totals: [] },
    });
    expect(after.body.newTotal).toBe(after.body.currentTotal);
  });

  it('answers bad input with a message per field by its path, saving nothing', async () => {
    const owner = await signupCompany(testApp);
    const input = typicalPond();
    input.basins[0]!.maxDepthFt = -2;
    const response = await testApp
      .http()
      .post('/api/priced-takeoffs')
      .set(...bearer(owner))
      .send({ name: 'Too shallow', input })
      .expect(400);
    expect(response.body.details).toEqual(
      expect.arrayContaining([expect.objectContaining({ field: 'input.basins.0.maxDepthFt' })]),
    );
    const noName = await testApp
      .http()
      .post('/api/priced-takeoffs')
      .set(...bearer(owner))
      .send({ name: '  ', input: typicalPond() })
      .expect(400);
    expect(noName.body.details).toEqual([{ field: 'name', message: 'Enter a name' }]);
    const list = await testApp
      .http()
      .get('/api/priced-takeoffs')
      .set(...bearer(owner))
      .expect(200);
    expect(list.body).toEqual([]);
  });

  it('is closed to crew leads, and another company’s ids answer 404 with no data', async () => {
    const owner = await signupCompany(testApp);
    const crewLead = await addMember(testApp, owner, 'crew_lead');
    const created = await createPricedTakeoff(owner, 'Koi pond for the corner lot');
    const other = await signupCompany(testApp);
    const id = created.body.id as string;

    for (const session of [crewLead]) {
      await testApp
        .http()
        .post('/api/priced-takeoffs')
        .set(...bearer(session))
        .send({ name: 'x', input: typicalPond() })
        .expect(403);
      for (const path of ['', `/${id}`, `/${id}/reprice-preview`]) {
        const refused = await testApp
          .http()
          .get(`/api/priced-takeoffs${path}`)
          .set(...bearer(session))
          .expect(403);
        expect(refused.text).not.toMatch(/unitCost|total/);
      }
      await testApp
        .http()
        .post(`/api/priced-takeoffs/${id}/reprice`)
        .set(...bearer(session))
        .expect(403);
    }

    for (const path of [`/${id}`, `/${id}/reprice-preview`]) {
      const response = await testApp
        .http()
        .get(`/api/priced-takeoffs${path}`)
        .set(...bearer(other))
        .expect(404);
      expect(response.text).not.toMatch(/Koi pond|unitCost/);
    }
    await testApp
      .http()
      .post(`/api/priced-takeoffs/${id}/reprice`)
      .set(...bearer(other))
      .expect(404);
    const list = await testApp
      .http()
      .get('/api/priced-takeoffs')
      .set(...bearer(other))
      .expect(200);
    expect(list.body).toEqual([]);
  });
});
