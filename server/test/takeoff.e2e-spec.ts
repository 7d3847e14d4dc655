import { examplePondInput as typicalPond } from '@pondwright/shared/engine';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addMember, bearer, createTestApp, signupCompany, type TestApp } from './support/test-app';

let testApp: TestApp;

beforeAll(async () => {
  testApp = await createTestApp();
});
afterAll(async () => {
  await testApp.close();
});

describe('POST /api/takeoff', () => {
  it('computes a typical pond for an estimator, with explanations', async () => {
    const owner = await signupCompany(testApp);
    const estimator = await addMember(testApp, owner, 'estimator');
    const response = await testApp
      .http()
      .post('/api/takeoff')
      .set(...bearer(estimator))
      .send(typicalPond())
      .expect(200);
    // 15 × 10 ft surface, as entered: the engine's own tests check the figures against their sources.
    expect(response.body.basins[0].surfaceAreaSqFt).toBeCloseTo(150, 5);
    const volume = (
      response.body.explanations as Array<{ figure: string; formula: string; sources: unknown[] }>
    ).find((explanation) => explanation.figure === 'water.volumeGallons');
    expect(volume?.formula).toEqual(expect.any(String));
    expect(volume?.sources.length).toBeGreaterThan(0);
  });

  it('measures a freeform outline that bends inward (the server always has the polygon-offset module)', async () => {
    const owner = await signupCompany(testApp);
    const input = typicalPond();
    // An L-shaped pond: 14 × 12 ft with a 8 × 6 ft corner left out, 14·12 − 8·6 = 120 ft² by hand.
    input.basins[0]!.outline = {
      shape: 'freeform',
      pointsFt: [
        { xFt: 0, yFt: 0 },
        { xFt: 14, yFt: 0 },
        { xFt: 14, yFt: 6 },
        { xFt: 6, yFt: 6 },
        { xFt: 6, yFt: 12 },
        { xFt: 0, yFt: 12 },
      ],
    };
    const response = await testApp
      .http()
      .post('/api/takeoff')
      .set(...bearer(owner))
      .send(input)
      .expect(200);
    expect(response.body.basins[0].surfaceAreaSqFt).toBeCloseTo(120, 5);
  });

  it('answers 400 with a message per field, naming each by its path', async () => {
    const owner = await signupCompany(testApp);
    const bad = typicalPond();
    bad.basins[0]!.maxDepthFt = -2;
    const response = await testApp
      .http()
      .post('/api/takeoff')
      .set(...bearer(owner))
      .send(bad)
      .expect(400);
    expect(response.body.details).toEqual(
      expect.arrayContaining([expect.objectContaining({ field: 'basins.0.maxDepthFt' })]),
    );
  });

  it('is closed to crew leads and to anonymous callers', async () => {
    const owner = await signupCompany(testApp);
    const crewLead = await addMember(testApp, owner, 'crew_lead');
    await testApp
      .http()
      .post('/api/takeoff')
      .set(...bearer(crewLead))
      .send(typicalPond())
      .expect(403);
    await testApp.http().post('/api/takeoff').send(typicalPond()).expect(401);
  });

  it('is described in the OpenAPI document at /api/docs', async () => {
    const response = await testApp.http().get('/api/docs/openapi.json').expect(200);
    expect(response.body.paths['/api/takeoff'].post).toBeDefined();
    expect(response.body.paths['/api/auth/signup'].post).toBeDefined();
  });
});
