import { afterEach, describe, expect, it, vi } from 'vitest';
import { apiRequest, ApiError, buildUrl, SESSION_ENDED_EVENT, tokenStore } from './api-client';

describe('apiRequest', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
    tokenStore.clear();
  });

  it('builds query strings, skipping empty values and joining lists', () => {
    expect(buildUrl('/parts', { q: 'chip', page: 2, empty: '', none: undefined, ids: [1, 2] })).toBe('/api/parts?q=chip&page=2&ids=1%2C2');
  });

  it('throws a typed ApiError carrying the code and field errors', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(
        async () =>
          new Response(
            JSON.stringify({ statusCode: 400, code: 'VALIDATION_FAILED', message: 'name: too long', fields: [{ field: 'name', message: 'too long' }] }),
            { status: 400 },
          ),
      ),
    );
    const error = await apiRequest('/x').catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect((error as ApiError).code).toBe('VALIDATION_FAILED');
    expect((error as ApiError).fieldErrors).toEqual({ name: 'too long' });
  });

  it('ends the session on a 401 when a token was stored', async () => {
    tokenStore.set('stale');
    const ended = vi.fn();
    window.addEventListener(SESSION_ENDED_EVENT, ended);
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => new Response(JSON.stringify({ code: 'AUTH_TOKEN_EXPIRED', message: 'expired' }), { status: 401 })),
    );
    await expect(apiRequest('/x')).rejects.toMatchObject({ status: 401, code: 'AUTH_TOKEN_EXPIRED' });
    expect(tokenStore.get()).toBeNull();
    expect(ended).toHaveBeenCalledTimes(1);
    window.removeEventListener(SESSION_ENDED_EVENT, ended);
  });

  it('reports an unreachable server as NETWORK_ERROR', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => {
        throw new TypeError('fetch failed');
      }),
    );
    await expect(apiRequest('/x')).rejects.toMatchObject({ code: 'NETWORK_ERROR', status: 0 });
  });
});
