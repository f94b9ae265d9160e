import { z } from 'zod';

import { ApiError, apiFetch, isClientError, NETWORK_MESSAGE } from '@/lib/api/fetcher';
import { keys } from '@/lib/api/keys';
import { swrOptions } from '@/lib/api/swr-options';
import { healthSchema } from '@/shared/health';

import { healthyReply, jsonResponse, mockFetch } from './helpers';

async function caught(promise: Promise<unknown>): Promise<ApiError> {
  try {
    await promise;
  } catch (error) {
    if (error instanceof ApiError) return error;
    throw error;
  }
  throw new Error('expected the call to fail');
}

describe('apiFetch', () => {
  it('returns the parsed body of a 2xx reply and asks for JSON from the same origin', async () => {
    const fetchMock = mockFetch().mockResolvedValue(jsonResponse(200, healthyReply));
    await expect(apiFetch(keys.health, healthSchema)).resolves.toEqual(healthyReply);
    const [path, init] = fetchMock.mock.calls[0] as [string, RequestInit];
    expect(path).toBe('/api/health');
    expect(init.credentials).toBe('same-origin');
    expect(init.headers).toEqual(expect.objectContaining({ Accept: 'application/json' }));
  });

  it('throws bad_response when a 2xx body does not match the schema', async () => {
    mockFetch().mockResolvedValue(jsonResponse(200, { status: 'fine' }));
    const error = await caught(apiFetch('/api/health', healthSchema));
    expect(error.code).toBe('bad_response');
    expect(error.status).toBe(200);
  });

  it('turns an error body into an ApiError with its code, message and details', async () => {
    const body = { error: { code: 'validation_failed', message: 'Volume must be positive', details: { field: 'v' } } };
    mockFetch().mockResolvedValue(jsonResponse(422, body));
    const error = await caught(apiFetch('/api/things', z.object({})));
    expect(error).toBeInstanceOf(ApiError);
    expect(error.status).toBe(422);
    expect(error.code).toBe('validation_failed');
    expect(error.message).toBe('Volume must be positive');
    expect(error.details).toEqual({ field: 'v' });
  });

  it('falls back to the status when the error body is not ours', async () => {
    mockFetch().mockResolvedValue({ ok: false, status: 503, json: () => Promise.reject(new SyntaxError('x')) });
    const error = await caught(apiFetch('/api/health', healthSchema));
    expect(error.status).toBe(503);
    expect(error.code).toBe('http_error');
    expect(error.message).toBe('The server answered 503');
  });

  it('reports a network failure as status 0, code network', async () => {
    mockFetch().mockRejectedValue(new TypeError('Failed to fetch'));
    const error = await caught(apiFetch('/api/health', healthSchema));
    expect(error.status).toBe(0);
    expect(error.code).toBe('network');
    expect(error.message).toBe(NETWORK_MESSAGE);
    expect(error.message).toBe('Cannot reach the Ligandry server. Check that it is running.');
  });
});

describe('retry policy', () => {
  it('treats 4xx ApiErrors as final and everything else as retryable', () => {
    expect(isClientError(new ApiError(404, 'not_found', 'gone'))).toBe(true);
    expect(isClientError(new ApiError(500, 'internal', 'boom'))).toBe(false);
    expect(isClientError(new ApiError(0, 'network', NETWORK_MESSAGE))).toBe(false);
    expect(isClientError(new Error('plain'))).toBe(false);
  });

  it('does not schedule a retry for a 4xx but does for a network failure', () => {
    jest.useFakeTimers();
    const retry = swrOptions.onErrorRetry;
    if (!retry) throw new Error('onErrorRetry is not set');
    const revalidate = jest.fn();
    const opts = { retryCount: 1, dedupe: true };
    retry(new ApiError(403, 'forbidden', 'no'), '/api/x', {} as never, revalidate, opts);
    jest.runAllTimers();
    expect(revalidate).not.toHaveBeenCalled();
    retry(new ApiError(0, 'network', NETWORK_MESSAGE), '/api/x', {} as never, revalidate, opts);
    jest.runAllTimers();
    expect(revalidate).toHaveBeenCalledTimes(1);
    jest.useRealTimers();
  });
});
