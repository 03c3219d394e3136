import { afterEach, describe, expect, it, vi } from 'vitest';
import { ApiError, apiRequest } from '../../../ui/src/api-client.ts';

afterEach(() => {
  vi.unstubAllGlobals();
});

describe('apiRequest', () => {
  it('when the server answers 429 with a sentence, then the error carries its kind and the sentence for the page to show', async () => {
    const body = {
      error: { kind: 'too-many-requests', message: 'That is more price checks than we take in a short while.' },
    };
    vi.stubGlobal(
      'fetch',
      async () => new Response(JSON.stringify(body), { status: 429, headers: { 'Retry-After': '30' } }),
    );
    const error = await apiRequest('/quotes/preview', null, { method: 'POST', body: {} }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ kind: 'too-many-requests', status: 429, message: body.error.message });
  });
});
