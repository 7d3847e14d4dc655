import type { JobView, PhotoView } from '@pondwright/shared';
import { randomUUID } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sharp from 'sharp';
import type { Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startFakeS3, type FakeS3 } from '../src/dev-fakes/fake-s3';
import { acceptedEstimate } from './support/quote-fixtures';
import { addMember, bearer, createTestApp, signupCompany, type TestApp } from './support/test-app';

let testApp: TestApp;
let s3: FakeS3;
const s3Directory = mkdtempSync(join(tmpdir(), 'pondwright-s3-'));

beforeAll(async () => {
  s3 = await startFakeS3({ port: 0, directory: s3Directory, bucket: 'photos-test' });
  testApp = await createTestApp({
    S3_ENDPOINT: s3.url,
    S3_BUCKET: 'photos-test',
    PHOTO_MAX_BYTES: String(300_000),
  });
});
afterAll(async () => {
  await testApp.close();
  await s3.stop();
  rmSync(s3Directory, { recursive: true, force: true });
});

type Session = { accessToken: string };

async function jobFor(owner: Awaited<ReturnType<typeof signupCompany>>): Promise<JobView> {
  const { estimate } = await acceptedEstimate(testApp, owner);
  return (
    await testApp
      .http()
      .post('/api/jobs')
      .set(...bearer(owner))
      .send({ estimateId: estimate.id })
      .expect(201)
  ).body as JobView;
}

/** A real photo-sized JPEG, 1600 × 1200, with an EXIF orientation of 6 (rotate 90° to view). */
function cameraJpeg(): Promise<Buffer> {
  return sharp({ create: { width: 1600, height: 1200, channels: 3, background: '#4d7a5c' } })
    .jpeg({ quality: 60 })
    .withMetadata({ orientation: 6 })
    .toBuffer();
}

function upload(
  session: Session,
  jobId: string,
  photoId: string,
  bytes: Buffer,
  filename: string,
  kind = 'before',
) {
  return testApp
    .http()
    .put(`/api/jobs/${jobId}/photos/${photoId}`)
    .set(...bearer(session))
    .field('kind', kind)
    .field('caption', 'North corner')
    .attach('photo', bytes, { filename, contentType: 'image/jpeg' });
}

const binary = (response: Response) => response.body as Buffer;
function getBinary(session: Session, path: string) {
  return testApp
    .http()
    .get(path)
    .set(...bearer(session))
    .buffer(true)
    .parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on('data', (chunk: Buffer) => chunks.push(chunk));
      res.on('end', () => done(null, Buffer.concat(chunks)));
    });
}

describe('job photos', () => {
  it('stores an upright, metadata-free image and a thumbnail; a retried upload is the same photo', async () => {
    const owner = await signupCompany(testApp);
    const crewLead = await addMember(testApp, owner, 'crew_lead');
    const job = await jobFor(owner);
    const photoId = randomUUID();
    const jpeg = await cameraJpeg();

    const first = await upload(crewLead, job.id, photoId, jpeg, 'IMG_0001.JPG').expect(201);
    const photo = first.body as PhotoView;
    // Orientation 6 means the camera was turned: stored upright, 1200 wide and 1600 tall.
    expect(photo).toMatchObject({
      kind: 'before',
      caption: 'North corner',
      widthPx: 1200,
      heightPx: 1600,
    });
    const again = await upload(crewLead, job.id, photoId, jpeg, 'IMG_0001.JPG').expect(200);
    expect(again.body.id).toBe(photoId);
    const other = await upload(
      crewLead,
      job.id,
      photoId,
      await sharp(jpeg).negate().toBuffer(),
      'x.jpg',
    );
    expect(other.status).toBe(409);

    const image = binary(await getBinary(owner, photo.imagePath).expect(200));
    const meta = await sharp(image).metadata();
    expect([meta.format, meta.width, meta.height, meta.exif, meta.orientation]).toEqual([
      'jpeg',
      1200,
      1600,
      undefined,
      undefined,
    ]);
    const thumbnail = await getBinary(owner, photo.thumbnailPath).expect(200);
    expect(thumbnail.headers['content-type']).toBe('image/webp');
    expect((await sharp(binary(thumbnail)).metadata()).width).toBe(320);

    const listed = (
      await testApp
        .http()
        .get(`/api/jobs/${job.id}/photos`)
        .set(...bearer(owner))
        .expect(200)
    ).body as PhotoView[];
    expect(listed.map((p) => p.id)).toEqual([photoId]);
  });

  it('refuses an executable renamed .jpg, a file over the limit, and other companies', async () => {
    const owner = await signupCompany(testApp);
    const other = await signupCompany(testApp);
    const job = await jobFor(owner);

    // The DOS stub every Windows executable starts with ("MZ"), named as a photo.
    const executable = Buffer.concat([
      Buffer.from('MZ\x90\x00\x03\x00\x00\x00', 'latin1'),
      Buffer.alloc(4096),
    ]);
    const refused = await upload(owner, job.id, randomUUID(), executable, 'holiday.jpg').expect(
      400,
    );
    expect(refused.body.code).toBe('PHOTO_NOT_AN_IMAGE');

    // Noise does not compress: a 1000 × 1000 noisy PNG is well over the 300 kB limit set above.
    const noise = Buffer.from(
      Array.from({ length: 1000 * 1000 * 3 }, () => Math.floor(Math.random() * 256)),
    );
    const big = await sharp(noise, { raw: { width: 1000, height: 1000, channels: 3 } })
      .png()
      .toBuffer();
    expect(big.length).toBeGreaterThan(300_000);
    const tooBig = await upload(owner, job.id, randomUUID(), big, 'big.png').expect(413);
    expect(tooBig.body.code).toBe('PHOTO_TOO_LARGE');

    const kind = await upload(
      owner,
      job.id,
      randomUUID(),
      await cameraJpeg(),
      'a.jpg',
      'selfie',
    ).expect(400);
    expect(kind.body.details[0].field).toBe('kind');

    await upload(other, job.id, randomUUID(), await cameraJpeg(), 'a.jpg').expect(404);
    await testApp
      .http()
      .get(`/api/jobs/${job.id}/photos`)
      .set(...bearer(other))
      .expect(404);
    expect(
      await testApp.dataSource.query('SELECT 1 FROM job_photos WHERE job_id = $1', [job.id]),
    ).toEqual([]);
  });
});
