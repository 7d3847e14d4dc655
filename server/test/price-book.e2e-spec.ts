import { demoPriceBook, priceBookToCsv, type PriceBook } from '@pondwright/shared/pricing';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { hashPassword } from '../src/auth/passwords';
import { todayIsoDate } from '../src/price-book/effective-date';
import { STARTER_PRICE_BOOK_NOTE } from '../src/price-book/starter-price-book';
import { DEMO_USERS } from '../src/seed/demo-data';
import { seedDemo } from '../src/seed/seed-demo';
import { testPriceBook } from './support/price-book-factory';
import {
  addMember,
  bearer,
  createTestApp,
  GOOD_PASSWORD,
  randomIp,
  signupCompany,
  uniqueEmail,
  type TestApp,
} from './support/test-app';

let testApp: TestApp;

beforeAll(async () => {
  testApp = await createTestApp();
});
afterAll(async () => {
  await testApp.close();
});

type Session = { accessToken: string };

const daysFromToday = (days: number) => todayIsoDate(new Date(Date.now() + days * 86_400_000));

function withMaterialCost(book: PriceBook, code: string, unitCost: string): PriceBook {
  return {
    ...book,
    materials: book.materials.map((material) =>
      material.code === code ? { ...material, unitCost } : material,
    ),
  };
}

async function saveBook(
  owner: Session,
  body: { book: unknown; effectiveDate?: string; note?: string },
  status = 201,
) {
  return testApp
    .http()
    .put('/api/price-book')
    .set(...bearer(owner))
    .send(body)
    .expect(status);
}

async function versionCount(companyId: string): Promise<number> {
  const [{ count }] = (await testApp.dataSource.query(
    'SELECT count(*)::int AS count FROM price_book_versions WHERE company_id = $1',
    [companyId],
  )) as [{ count: number }];
  return count;
}

describe('price-book versions', () => {
  it('makes every save a new version, numbered without gaps, with its author, date and note', async () => {
    const owner = await signupCompany(testApp, { name: 'Iris Pondwell' });
    const book = testPriceBook();
    const first = await saveBook(owner, { book, note: 'Spring prices' });
    const raised = withMaterialCost(book, 'BLD-M', '210.00');
    const second = await saveBook(owner, { book: raised });

    expect(first.body).toMatchObject({
      effectiveDate: todayIsoDate(),
      authorName: 'Iris Pondwell',
      note: 'Spring prices',
      status: 'current',
      book,
    });
    expect(second.body.versionNumber).toBe(first.body.versionNumber + 1);
    expect(second.body.status).toBe('current');

    // The older version is exactly as it was saved.
    const older = await testApp
      .http()
      .get(`/api/price-book/versions/${first.body.id}`)
      .set(...bearer(owner))
      .expect(200);
    expect(older.body.book).toEqual(book);
    expect(older.body.status).toBe('superseded');

    const current = await testApp
      .http()
      .get('/api/price-book')
      .set(...bearer(owner))
      .expect(200);
    expect(current.body).toMatchObject({ id: second.body.id, book: raised });

    const list = await testApp
      .http()
      .get('/api/price-book/versions')
      .set(...bearer(owner))
      .expect(200);
    const numbers = list.body.map((item: { versionNumber: number }) => item.versionNumber);
    expect(numbers).toEqual([...numbers].sort((a, b) => b - a));
    expect(numbers[numbers.length - 1]).toBe(1);
    expect(list.body[0]).toMatchObject({ id: second.body.id, changeCount: 1 });
    expect(list.body[0]).not.toHaveProperty('book');

    const changes = await testApp
      .http()
      .get(`/api/price-book/versions/${second.body.id}/changes`)
      .set(...bearer(owner))
      .expect(200);
    expect(changes.body).toEqual([
      expect.objectContaining({
        section: 'material',
        code: 'BLD-M',
        field: 'unitCost',
        before: '185.00',
        after: '210.00',
      }),
    ]);
  });

  it('numbers saves that arrive at the same moment one after another, never twice the same', async () => {
    const owner = await signupCompany(testApp);
    const before = await versionCount(owner.companyId);
    const saves = await Promise.all(
      ['101', '102', '103', '104', '105'].map((cost) =>
        saveBook(owner, { book: withMaterialCost(testPriceBook(), 'BLD-M', cost) }),
      ),
    );
    const numbers = saves.map((save) => save.body.versionNumber as number).sort((a, b) => a - b);
    expect(numbers).toEqual([1, 2, 3, 4, 5].map((step) => before + step));
  });

  it('refuses to change or delete a stored version, even in SQL, but goes with its company', async () => {
    const owner = await signupCompany(testApp);
    const saved = await saveBook(owner, { book: testPriceBook() });
    await expect(
      testApp.dataSource.query(`UPDATE price_book_versions SET note = 'edited' WHERE id = $1`, [
        saved.body.id,
      ]),
    ).rejects.toThrow(/immutable/);
    await expect(
      testApp.dataSource.query('DELETE FROM price_book_versions WHERE id = $1', [saved.body.id]),
    ).rejects.toThrow(/immutable/);
    const [row] = await testApp.dataSource.query(
      'SELECT note FROM price_book_versions WHERE id = $1',
      [saved.body.id],
    );
    expect(row.note).toBe('');

    await testApp.dataSource.query('DELETE FROM companies WHERE id = $1', [owner.companyId]);
    expect(await versionCount(owner.companyId)).toBe(0);
  });

  it('keeps a version with a future effective date out of use until its day', async () => {
    const owner = await signupCompany(testApp);
    const today = await saveBook(owner, { book: testPriceBook() });
    const scheduled = await saveBook(owner, {
      book: withMaterialCost(testPriceBook(), 'LIN-45', '1.10'),
      effectiveDate: daysFromToday(7),
      note: 'Liner price rise next week',
    });
    expect(scheduled.body).toMatchObject({ effectiveDate: daysFromToday(7), status: 'scheduled' });

    const current = await testApp
      .http()
      .get('/api/price-book')
      .set(...bearer(owner))
      .expect(200);
    expect(current.body.id).toBe(today.body.id);
    const list = await testApp
      .http()
      .get('/api/price-book/versions')
      .set(...bearer(owner))
      .expect(200);
    expect(list.body.slice(0, 2).map((item: { status: string }) => item.status)).toEqual([
      'scheduled',
      'current',
    ]);
  });

  it('refuses a back-dated version', async () => {
    const owner = await signupCompany(testApp);
    const response = await saveBook(
      owner,
      { book: testPriceBook(), effectiveDate: daysFromToday(-1) },
      400,
    );
    expect(response.body.details).toEqual([
      { field: 'effectiveDate', message: 'Choose today or a later date' },
    ]);
  });

  it('answers an invalid book with a message per field by dotted path, and saves nothing', async () => {
    const owner = await signupCompany(testApp);
    const before = await versionCount(owner.companyId);
    const book = testPriceBook();
    const bad = {
      ...book,
      materials: book.materials.map((material, index) =>
        index === 2 ? { ...material, unitCost: '12,50' } : material,
      ),
      settings: { ...book.settings, defaultLinerCode: 'NO-SUCH-LINER' },
    };
    const response = await saveBook(owner, { book: bad }, 400);
    expect(response.body).toMatchObject({
      statusCode: 400,
      error: 'Bad Request',
      message: 'Some fields need attention',
    });
    expect(response.body.details).toEqual(
      expect.arrayContaining([
        {
          field: 'book.materials.2.unitCost',
          message: 'Enter an amount such as 12.50 (no currency sign, at most 4 decimals)',
        },
      ]),
    );
    await saveBook(owner, { book, surprise: true } as never, 400);
    await saveBook(owner, {} as never, 400);
    expect(await versionCount(owner.companyId)).toBe(before);
  });

  it('answers 404 with a clear message while a company has no price book in effect', async () => {
    const [company] = await testApp.dataSource.query(
      `INSERT INTO companies (name) VALUES ('Bookless Ponds') RETURNING id`,
    );
    const email = uniqueEmail('bookless');
    await testApp.dataSource.query(
      `INSERT INTO users (company_id, email, name, role, password_hash) VALUES ($1, $2, 'No Book', 'owner', $3)`,
      [company.id, email, await hashPassword(GOOD_PASSWORD)],
    );
    const login = await testApp
      .http()
      .post('/api/auth/login')
      .set('X-Forwarded-For', randomIp())
      .send({ email, password: GOOD_PASSWORD })
      .expect(200);
    const owner = { accessToken: login.body.accessToken as string };
    for (const path of [
      '/api/price-book',
      '/api/price-book/policy',
      '/api/price-book/export.csv',
    ]) {
      const response = await testApp
        .http()
        .get(path)
        .set(...bearer(owner))
        .expect(404);
      expect(response.body.message).toMatch(/no price book in effect/);
    }
    const list = await testApp
      .http()
      .get('/api/price-book/versions')
      .set(...bearer(owner))
      .expect(200);
    expect(list.body).toEqual([]);
    await saveBook(owner, { book: testPriceBook() });
    await testApp
      .http()
      .get('/api/price-book')
      .set(...bearer(owner))
      .expect(200);
  });
});

describe('the pricing policy', () => {
  it('shows each markup with the margin it yields', async () => {
    const owner = await signupCompany(testApp);
    const estimator = await addMember(testApp, owner, 'estimator');
    await saveBook(owner, { book: testPriceBook() });
    const response = await testApp
      .http()
      .get('/api/price-book/policy')
      .set(...bearer(estimator))
      .expect(200);
    expect(response.body.policy).toEqual(testPriceBook().policy);
    // Margin = markup ÷ (100 + markup): 35 → 25.93 %, 50 → 33.33 %, 25 → 20 %.
    expect(Number(response.body.marginPct.materials)).toBeCloseTo(25.93, 2);
    expect(Number(response.body.marginPct.labor)).toBeCloseTo(33.33, 2);
    expect(Number(response.body.marginPct.equipment)).toBeCloseTo(20, 2);
  });

  it('saves a policy change as a new version that changes nothing else', async () => {
    const owner = await signupCompany(testApp);
    const base = await saveBook(owner, { book: testPriceBook() });
    const policy = { ...testPriceBook().policy, marginFloorPct: '28' };
    const saved = await testApp
      .http()
      .put('/api/price-book/policy')
      .set(...bearer(owner))
      .send({ policy, note: 'Higher margin floor' })
      .expect(201);
    expect(saved.body).toMatchObject({
      versionNumber: base.body.versionNumber + 1,
      note: 'Higher margin floor',
      book: { ...testPriceBook(), policy },
    });
    const changes = await testApp
      .http()
      .get(`/api/price-book/versions/${saved.body.id}/changes`)
      .set(...bearer(owner))
      .expect(200);
    expect(changes.body.length).toBeGreaterThan(0);
    expect(changes.body.every((change: { section: string }) => change.section === 'policy')).toBe(
      true,
    );
  });

  it('refuses an invalid policy with dotted field paths', async () => {
    const owner = await signupCompany(testApp);
    await saveBook(owner, { book: testPriceBook() });
    const before = await versionCount(owner.companyId);
    const response = await testApp
      .http()
      .put('/api/price-book/policy')
      .set(...bearer(owner))
      .send({ policy: { ...testPriceBook().policy, marginFloorPct: '120' } })
      .expect(400);
    expect(response.body.details).toEqual([
      { field: 'policy.marginFloorPct', message: 'A percentage is at most 100' },
    ]);
    expect(await versionCount(owner.companyId)).toBe(before);
  });
});

describe('who may see and change the price book', () => {
  it('lets the owner write, the estimator read, and shows a crew lead only materials without costs', async () => {
    const owner = await signupCompany(testApp);
    const estimator = await addMember(testApp, owner, 'estimator');
    const crewLead = await addMember(testApp, owner, 'crew_lead');
    const saved = await saveBook(owner, { book: testPriceBook() });
    const versionId = saved.body.id as string;
    const csv = await testApp
      .http()
      .get('/api/price-book/export.csv')
      .set(...bearer(owner))
      .expect(200);

    const reads = [
      '/api/price-book',
      '/api/price-book/versions',
      `/api/price-book/versions/${versionId}`,
      `/api/price-book/versions/${versionId}/changes`,
      '/api/price-book/policy',
      '/api/price-book/export.csv',
    ];
    const writes = [
      { method: 'put', path: '/api/price-book', body: { book: testPriceBook() } },
      { method: 'put', path: '/api/price-book/policy', body: { policy: testPriceBook().policy } },
      { method: 'post', path: '/api/price-book/import', body: { csv: csv.text } },
    ] as const;

    for (const path of reads) {
      await testApp
        .http()
        .get(path)
        .set(...bearer(estimator))
        .expect(200);
      const refused = await testApp
        .http()
        .get(path)
        .set(...bearer(crewLead))
        .expect(403);
      expect(refused.text).not.toMatch(/unitCost|185\.00/);
    }
    for (const write of writes) {
      for (const member of [estimator, crewLead]) {
        const agent = testApp.http();
        await agent[write.method](write.path)
          .set(...bearer(member))
          .send(write.body)
          .expect(403);
      }
      const agent = testApp.http();
      await agent[write.method](write.path)
        .set(...bearer(owner))
        .send(write.body)
        .expect(201);
    }

    const crewView = await testApp
      .http()
      .get('/api/price-book/materials')
      .set(...bearer(crewLead))
      .expect(200);
    expect(crewView.body.materials.map((material: { code: string }) => material.code)).toEqual(
      testPriceBook().materials.map((material) => material.code),
    );
    expect(crewView.text).not.toMatch(/unitCost|Cost|185\.00|0\.95/);
    const estimatorView = await testApp
      .http()
      .get('/api/price-book/materials')
      .set(...bearer(estimator))
      .expect(200);
    expect(estimatorView.body.materials).toEqual(testPriceBook().materials);
  });

  it('answers another company’s version ids with 404 and no data', async () => {
    const ownerA = await signupCompany(testApp);
    const ownerB = await signupCompany(testApp);
    const savedA = await saveBook(ownerA, {
      book: withMaterialCost(testPriceBook(), 'BLD-M', '777.00'),
    });
    for (const path of [
      `/api/price-book/versions/${savedA.body.id}`,
      `/api/price-book/versions/${savedA.body.id}/changes`,
      '/api/price-book/versions/not-a-uuid',
    ]) {
      const response = await testApp
        .http()
        .get(path)
        .set(...bearer(ownerB))
        .expect(404);
      expect(response.text).not.toMatch(/777\.00|BLD-M/);
    }
    const listB = await testApp
      .http()
      .get('/api/price-book/versions')
      .set(...bearer(ownerB))
      .expect(200);
    expect(listB.body.map((item: { id: string }) => item.id)).not.toContain(savedA.body.id);
  });
});

describe('starter price books', () => {
  it('gives a new company the starter book as version 1, authored by its owner', async () => {
    const owner = await signupCompany(testApp, { name: 'Wren Stillwater' });
    const current = await testApp
      .http()
      .get('/api/price-book')
      .set(...bearer(owner))
      .expect(200);
    expect(current.body).toMatchObject({
      versionNumber: 1,
      effectiveDate: todayIsoDate(),
      authorName: 'Wren Stillwater',
      note: STARTER_PRICE_BOOK_NOTE,
      status: 'current',
      book: demoPriceBook(),
    });
  });

  it('gives the demo company its book once, and never overwrites it', async () => {
    const first = await seedDemo(testApp.dataSource);
    const second = await seedDemo(testApp.dataSource);
    expect(first.created).toContain('price book');
    expect(second.created).toEqual([]);
    const rows = (await testApp.dataSource.query(
      `SELECT v.version_number, v.note FROM price_book_versions v
         JOIN users u ON u.company_id = v.company_id WHERE u.email = $1`,
      [DEMO_USERS[0]!.email],
    )) as Array<{ version_number: number; note: string }>;
    expect(rows).toEqual([{ version_number: 1, note: STARTER_PRICE_BOOK_NOTE }]);
  });
});

describe('CSV export and import', () => {
  it('exports the book in effect as a CSV attachment that imports back to the same book', async () => {
    const owner = await signupCompany(testApp);
    const estimator = await addMember(testApp, owner, 'estimator');
    const exported = await testApp
      .http()
      .get('/api/price-book/export.csv')
      .set(...bearer(estimator))
      .expect(200);
    expect(exported.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(exported.headers['content-disposition']).toBe(
      `attachment; filename="price-book-v1-${todayIsoDate()}.csv"`,
    );
    expect(exported.text.split('\r\n')[0]).toMatch(/^section,code,name,kind,unit,unitCost,/);

    const imported = await testApp
      .http()
      .post('/api/price-book/import')
      .set(...bearer(owner))
      .send({ csv: exported.text, note: 'Back from the spreadsheet' })
      .expect(201);
    expect(imported.body).toMatchObject({
      versionNumber: 2,
      note: 'Back from the spreadsheet',
      book: demoPriceBook(),
    });
    const changes = await testApp
      .http()
      .get(`/api/price-book/versions/${imported.body.id}/changes`)
      .set(...bearer(owner))
      .expect(200);
    expect(changes.body).toEqual([]);
  });

  it('imports a book of 5,000 materials in one request', async () => {
    const owner = await signupCompany(testApp);
    const book = testPriceBook();
    const extras = Array.from({ length: 5000 - book.materials.length }, (_, index) => ({
      code: `EXTRA-${index}`,
      name: `Garden extra number ${index}, assorted`,
      kind: 'extra' as const,
      unit: 'each' as const,
      unitCost: `${(index % 900) + 1}.25`,
      taxable: index % 2 === 0,
    }));
    const big = testPriceBook({ materials: [...book.materials, ...extras] });
    const imported = await testApp
      .http()
      .post('/api/price-book/import')
      .set(...bearer(owner))
      .send({ csv: priceBookToCsv(big) })
      .expect(201);
    expect(imported.body.book).toEqual(big);
    expect(imported.body.note).toBe('Imported from CSV');
  });

  it('imports nothing from a CSV with bad rows, and names the line and column of every problem', async () => {
    const owner = await signupCompany(testApp);
    const before = await versionCount(owner.companyId);
    const book = demoPriceBook();
    // Written as a spreadsheet would hold them: header on line 1, material n on line n + 2.
    const bad = {
      ...book,
      materials: book.materials.map((material, index) =>
        index === 2
          ? { ...material, unitCost: '12,50' }
          : index === 5
            ? { ...material, kind: 'rubber' }
            : material,
      ),
      laborRoles: book.laborRoles.map((role, index) =>
        index === 0 ? { ...role, wagePerHour: 'lots' } : role,
      ),
    } as PriceBook;
    const laborLine = book.materials.length + 2;
    const response = await testApp
      .http()
      .post('/api/price-book/import')
      .set(...bearer(owner))
      .send({ csv: priceBookToCsv(bad) })
      .expect(400);
    expect(response.body).toMatchObject({
      statusCode: 400,
      error: 'Bad Request',
      message: '3 lines have problems; nothing was imported',
    });
    expect(response.body.details).toEqual([
      {
        field: 'line 4, column unitCost',
        line: 4,
        column: 'unitCost',
        message: 'Enter an amount such as 12.50 (no currency sign, at most 4 decimals)',
      },
      {
        field: 'line 7, column kind',
        line: 7,
        column: 'kind',
        message: expect.stringContaining('expected one of'),
      },
      {
        field: `line ${laborLine}, column wagePerHour`,
        line: laborLine,
        column: 'wagePerHour',
        message: 'Enter an amount such as 12.50 (no currency sign, at most 4 decimals)',
      },
    ]);
    expect(await versionCount(owner.companyId)).toBe(before);
  });

  it('refuses an empty or unreadable upload with a field message', async () => {
    const owner = await signupCompany(testApp);
    const empty = await testApp
      .http()
      .post('/api/price-book/import')
      .set(...bearer(owner))
      .send({ csv: '' })
      .expect(400);
    expect(empty.body.details).toEqual([{ field: 'csv', message: 'The CSV is empty' }]);
    const header = await testApp
      .http()
      .post('/api/price-book/import')
      .set(...bearer(owner))
      .send({ csv: 'sku,price\r\nA,1\r\n' })
      .expect(400);
    expect(header.body.details[0]).toMatchObject({ line: 1, column: 'sku' });
  });
});
