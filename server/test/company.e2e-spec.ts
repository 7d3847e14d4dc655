import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { deflateSync } from 'node:zlib';
import sharp from 'sharp';
import { addMember, bearer, createTestApp, signupCompany, type TestApp } from './support/test-app';

let testApp: TestApp;

beforeAll(async () => {
  testApp = await createTestApp();
});
afterAll(async () => {
  await testApp.close();
});

describe('the company profile', () => {
  it('starts in US units and is readable by every member', async () => {
    const owner = await signupCompany(testApp, { companyName: 'Sedge Hollow Ponds' });
    const crewLead = await addMember(testApp, owner, 'crew_lead');
    const response = await testApp
      .http()
      .get('/api/company')
      .set(...bearer(crewLead))
      .expect(200);
    expect(response.body).toEqual({
      id: owner.companyId,
      name: 'Sedge Hollow Ponds',
      unitSystem: 'us',
      hasLogo: false,
    });
  });

  it('lets the owner switch to metric and rename the company; members see the change', async () => {
    const owner = await signupCompany(testApp);
    const estimator = await addMember(testApp, owner, 'estimator');
    await testApp
      .http()
      .patch('/api/company')
      .set(...bearer(owner))
      .send({ unitSystem: 'metric', name: '  Reedwater Gardens ' })
      .expect(200);
    const seen = await testApp
      .http()
      .get('/api/company')
      .set(...bearer(estimator))
      .expect(200);
    expect(seen.body).toMatchObject({ name: 'Reedwater Gardens', unitSystem: 'metric' });
    const me = await testApp
      .http()
      .get('/api/auth/me')
      .set(...bearer(estimator))
      .expect(200);
    expect(me.body.companyName).toBe('Reedwater Gardens');
  });

  it('refuses other roles, bad values and empty changes, changing nothing', async () => {
    const owner = await signupCompany(testApp, { companyName: 'Unchanged Ponds' });
    const estimator = await addMember(testApp, owner, 'estimator');
    await testApp
      .http()
      .patch('/api/company')
      .set(...bearer(estimator))
      .send({ unitSystem: 'metric' })
      .expect(403);
    const bad = await testApp
      .http()
      .patch('/api/company')
      .set(...bearer(owner))
      .send({ unitSystem: 'imperial' })
      .expect(400);
    expect(bad.body.details).toEqual([
      { field: 'unitSystem', message: 'Choose US customary or metric' },
    ]);
    await testApp
      .http()
      .patch('/api/company')
      .set(...bearer(owner))
      .send({})
      .expect(400);
    await testApp
      .http()
      .patch('/api/company')
      .set(...bearer(owner))
      .send({ id: 'x', name: 'Renamed' })
      .expect(400);
    const after = await testApp
      .http()
      .get('/api/company')
      .set(...bearer(owner))
      .expect(200);
    expect(after.body).toMatchObject({ name: 'Unchanged Ponds', unitSystem: 'us' });
  });

  it('changes only the caller’s own company', async () => {
    const ownerA = await signupCompany(testApp, { companyName: 'Alpha Water Features' });
    const ownerB = await signupCompany(testApp, { companyName: 'Beta Water Features' });
    await testApp
      .http()
      .patch('/api/company')
      .set(...bearer(ownerA))
      .send({ unitSystem: 'metric' })
      .expect(200);
    const b = await testApp
      .http()
      .get('/api/company')
      .set(...bearer(ownerB))
      .expect(200);
    expect(b.body).toMatchObject({ name: 'Beta Water Features', unitSystem: 'us' });
  });
});

/** A valid 1×1 PNG, built by hand from the PNG specification (ISO/IEC 15948): signature, IHDR, IDAT, IEND. */
function tinyPng(): Buffer {
  const crcTable = Array.from({ length: 256 }, (_, n) => {
    let c = n;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    return c >>> 0;
  });
  const crc = (bytes: Buffer) => {
    let c = 0xffffffff;
    for (const byte of bytes) c = crcTable[(c ^ byte) & 0xff]! ^ (c >>> 8);
    return (c ^ 0xffffffff) >>> 0;
  };
  const chunk = (type: string, data: Buffer) => {
    const length = Buffer.alloc(4);
    length.writeUInt32BE(data.length);
    const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
    const sum = Buffer.alloc(4);
    sum.writeUInt32BE(crc(body));
    return Buffer.concat([length, body, sum]);
  };
  const header = Buffer.from([0, 0, 0, 1, 0, 0, 0, 1, 8, 2, 0, 0, 0]); // 1×1, 8-bit RGB
  const pixels = deflateSync(Buffer.from([0, 0x1f, 0x6f, 0x5c])); // filter 0, one teal pixel
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
    chunk('IDAT', pixels),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

describe('the company logo', () => {
  it('takes a PNG from the owner, serves it to members, and refuses other files', async () => {
    const owner = await signupCompany(testApp);
    const estimator = await addMember(testApp, owner, 'estimator');
    const png = tinyPng();

    await testApp
      .http()
      .get('/api/company/logo')
      .set(...bearer(estimator))
      .expect(404);
    await testApp
      .http()
      .put('/api/company/logo')
      .set(...bearer(estimator))
      .attach('logo', png, { filename: 'logo.png', contentType: 'image/png' })
      .expect(403);

    const notImage = await testApp
      .http()
      .put('/api/company/logo')
      .set(...bearer(owner))
      .attach('logo', Buffer.from('<svg onload="alert(1)"/>'), {
        filename: 'logo.png',
        contentType: 'image/png',
      })
      .expect(400);
    expect(notImage.body.details).toEqual([{ field: 'logo', message: 'Use a PNG or JPEG image' }]);
    const tooBig = Buffer.concat([png, Buffer.alloc(512 * 1024)]);
    await testApp
      .http()
      .put('/api/company/logo')
      .set(...bearer(owner))
      .attach('logo', tooBig, { filename: 'big.png', contentType: 'image/png' })
      .expect((response) => expect([400, 413]).toContain(response.status));
    await testApp
      .http()
      .put('/api/company/logo')
      .set(...bearer(owner))
      .expect(400);

    const saved = await testApp
      .http()
      .put('/api/company/logo')
      .set(...bearer(owner))
      .attach('logo', png, { filename: 'logo.png', contentType: 'image/png' })
      .expect(200);
    expect(saved.body.hasLogo).toBe(true);
    const served = await testApp
      .http()
      .get('/api/company/logo')
      .set(...bearer(estimator))
      .buffer(true)
      .parse((response, done) => {
        const chunks: Buffer[] = [];
        response.on('data', (chunk: Buffer) => chunks.push(chunk));
        response.on('end', () => done(null, Buffer.concat(chunks)));
      })
      .expect(200);
    expect(served.headers['content-type']).toBe('image/png');
    // Re-encoded on upload (metadata stripped), so the same pixels rather than the same bytes.
    const pixels = (image: Buffer) => sharp(image).raw().toBuffer();
    expect(Buffer.compare(await pixels(served.body as Buffer), await pixels(png))).toBe(0);

    const removed = await testApp
      .http()
      .delete('/api/company/logo')
      .set(...bearer(owner))
      .expect(200);
    expect(removed.body.hasLogo).toBe(false);
  });
});
