import express from 'express';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { compressAnswers } from './compress-answers';

// The same 8 KB of JSON from an ordinary route and from the routes that hand out tokens.
const body = { lines: Array.from({ length: 200 }, (_, i) => ({ id: i, label: `line ${i}` })) };
const app = express();
app.use(compressAnswers());
for (const path of ['/api/estimates', '/api/auth/refresh', '/api/invites/abc/accept']) {
  app.get(path, (_request, response) => {
    response.json(body);
  });
}

describe('compressAnswers', () => {
  it('compresses a large JSON answer for a client that accepts gzip or brotli', async () => {
    const gzip = await request(app)
      .get('/api/estimates')
      .set('Accept-Encoding', 'gzip')
      .expect(200);
    expect(gzip.headers['content-encoding']).toBe('gzip');
    expect(gzip.body).toEqual(body);
    const brotli = await request(app)
      .get('/api/estimates')
      .set('Accept-Encoding', 'br')
      .expect(200);
    expect(brotli.headers['content-encoding']).toBe('br');
  });

  it('never compresses answers that carry sign-in tokens (BREACH)', async () => {
    for (const path of ['/api/auth/refresh', '/api/invites/abc/accept']) {
      const response = await request(app).get(path).set('Accept-Encoding', 'gzip, br').expect(200);
      expect(response.headers['content-encoding']).toBeUndefined();
      expect(response.body).toEqual(body);
    }
  });
});
