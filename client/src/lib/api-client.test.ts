import { afterEach, describe, expect, it, vi } from 'vitest';
import { apiError, json, mockApi, noContent } from '@/testing/mock-api';
import {
  api,
  getAccessToken,
  refreshAccessToken,
  setAccessToken,
  setSessionExpiredHandler,
} from './api-client';
import { ApiError, NetworkError } from './api-error';

describe('api client', () => {
  let restoreHandler: (() => void) | undefined;
  afterEach(() => restoreHandler?.());

  it('sends requests to /api with the bearer token and credentials included', async () => {
    const server = mockApi({ 'GET /api/users': json([]) });
    setAccessToken('token-1');

    await api.get('/users');

    const [request] = server.requests;
    expect(request?.path).toBe('/api/users');
    expect(request?.credentials).toBe('include');
    expect(request?.headers.authorization).toBe('Bearer token-1');
  });

  it('refreshes the token once after a 401 and retries the request with the new token', async () => {
    const server = mockApi({
      'GET /api/users': (request) =>
        request.headers.authorization === 'Bearer fresh'
          ? json([{ id: 'u1' }])
          : apiError(401, 'Token expired'),
      'POST /api/auth/refresh': json({ accessToken: 'fresh' }),
    });
    setAccessToken('stale');

    await expect(api.get('/users')).resolves.toEqual([{ id: 'u1' }]);

    expect(server.callsTo('POST /api/auth/refresh')).toHaveLength(1);
    expect(server.callsTo('POST /api/auth/refresh')[0]?.credentials).toBe('include');
    expect(server.callsTo('GET /api/users')).toHaveLength(2);
    expect(getAccessToken()).toBe('fresh');
  });

  it('shares one refresh between requests that fail at the same time', async () => {
    const server = mockApi({
      'GET /api/users': (request) =>
        request.headers.authorization === 'Bearer fresh' ? json([]) : apiError(401, 'Expired'),
      'GET /api/invites': (request) =>
        request.headers.authorization === 'Bearer fresh' ? json([]) : apiError(401, 'Expired'),
      'POST /api/auth/refresh': () =>
        new Promise<Response>((resolve) =>
          setTimeout(() => resolve(json({ accessToken: 'fresh' })), 10),
        ),
    });
    setAccessToken('stale');

    await Promise.all([api.get('/users'), api.get('/invites'), refreshAccessToken()]);

    expect(server.callsTo('POST /api/auth/refresh')).toHaveLength(1);
  });

  it('clears the token and reports the expired session when the refresh is refused', async () => {
    const server = mockApi({
      'GET /api/users': apiError(401, 'Token expired'),
      'POST /api/auth/refresh': apiError(401, 'No session'),
    });
    const onExpired = vi.fn();
    restoreHandler = setSessionExpiredHandler(onExpired);
    setAccessToken('stale');

    await expect(api.get('/users')).rejects.toMatchObject({ statusCode: 401 });

    expect(onExpired).toHaveBeenCalledTimes(1);
    expect(getAccessToken()).toBeNull();
    expect(server.callsTo('GET /api/users')).toHaveLength(1);
  });

  it('does not refresh after a 401 from the sign-in call itself', async () => {
    const server = mockApi({
      'POST /api/auth/login': apiError(401, 'Wrong e-mail or password'),
    });
    const onExpired = vi.fn();
    restoreHandler = setSessionExpiredHandler(onExpired);

    await expect(api.post('/auth/login', { email: 'a@b.test', password: 'x' })).rejects.toThrow(
      'Wrong e-mail or password',
    );

    expect(server.callsTo('POST /api/auth/refresh')).toHaveLength(0);
    expect(onExpired).not.toHaveBeenCalled();
  });

  it('turns the server error shape into an ApiError with field details', async () => {
    mockApi({
      'POST /api/invites': apiError(400, 'Check the highlighted fields', [
        { field: 'email', message: 'Enter a valid e-mail address' },
      ]),
    });
    setAccessToken('t');

    const error = await api.post('/invites', {}).catch((caught: unknown) => caught);

    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({
      statusCode: 400,
      message: 'Check the highlighted fields',
      details: [{ field: 'email', message: 'Enter a valid e-mail address' }],
    });
  });

  it('gives a readable error when the answer is not JSON', async () => {
    mockApi({ 'GET /api/users': new Response('<html>Bad gateway</html>', { status: 502 }) });
    setAccessToken('t');

    await expect(api.get('/users')).rejects.toMatchObject({
      statusCode: 502,
      message: expect.stringMatching(/something went wrong/i),
    });
  });

  it('reports an unreachable server as a NetworkError', async () => {
    vi.stubGlobal('fetch', vi.fn().mockRejectedValue(new TypeError('Failed to fetch')));

    await expect(api.get('/health')).rejects.toBeInstanceOf(NetworkError);
  });

  it('treats a failing server during refresh as an error, not as a signed-out user', async () => {
    mockApi({ 'POST /api/auth/refresh': new Response('Bad gateway', { status: 502 }) });
    setAccessToken('kept');

    await expect(refreshAccessToken()).rejects.toMatchObject({ statusCode: 502 });
    expect(getAccessToken()).toBe('kept');
  });

  it('returns nothing for 204 answers', async () => {
    mockApi({ 'DELETE /api/invites/i1': noContent() });
    setAccessToken('t');

    await expect(api.delete('/invites/i1')).resolves.toBeUndefined();
  });

  it('never writes the access token to localStorage or sessionStorage', async () => {
    const setItem = vi.spyOn(Storage.prototype, 'setItem');
    mockApi({
      'POST /api/auth/login': json({ accessToken: 'secret-token' }),
      'POST /api/auth/refresh': json({ accessToken: 'rotated-token' }),
    });

    const { accessToken } = await api.post<{ accessToken: string }>('/auth/login', {});
    setAccessToken(accessToken);
    await refreshAccessToken();

    expect(getAccessToken()).toBe('rotated-token');
    expect(setItem).not.toHaveBeenCalled();
    expect(window.localStorage).toHaveLength(0);
    expect(window.sessionStorage).toHaveLength(0);
    expect(document.cookie).not.toContain('token');
  });
});
