import { describe, expect, it } from 'vitest';
import { redactRequestForLog } from './redact-request';

describe('redactRequestForLog', () => {
  it('cuts quote tokens from the API and page URLs and drops the path segments', () => {
    const token = 'Zm9vYmFyYmF6cXV4MTIzNDU2Nzg5MGFiY2RlZmdoaWo';
    expect(
      redactRequestForLog({
        url: `/api/quotes/${token}/accept`,
        params: { path: ['quotes', token] },
      }),
    ).toEqual({ url: '/api/quotes/[token]/accept', params: undefined });
    expect(redactRequestForLog({ url: `/q/${token}?payment=success` }).url).toBe(
      '/q/[token]?payment=success',
    );
    expect(redactRequestForLog({ url: '/api/estimates/42/quote' }).url).toBe(
      '/api/estimates/42/quote',
    );
  });
});
