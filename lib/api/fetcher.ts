import { z } from 'zod';

import { errorBodySchema } from '@/shared/errors';

/** Error thrown for every failed API call, so screens can switch on `code` and `status`. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly details: unknown;

  constructor(status: number, code: string, message: string, details?: unknown) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.details = details;
  }
}

/** Message shown when the request never reached the server. */
export const NETWORK_MESSAGE = 'Cannot reach the Ligandry server. Check that it is running.';

async function readJson(response: Response): Promise<unknown> {
  try {
    return await response.json();
  } catch {
    return undefined;
  }
}

/** Per-call options: `dataStatuses` are non-2xx statuses whose body is data (health answers 503 with its report). */
export type ApiFetchOptions = { dataStatuses?: readonly number[] };

/** Fetches a same-origin API path and returns its body checked against `schema`, or throws ApiError. */
export async function apiFetch<S extends z.ZodType>(
  path: string,
  schema: S,
  init?: RequestInit,
  options: ApiFetchOptions = {},
): Promise<z.infer<S>> {
  let response: Response;
  try {
    response = await fetch(path, {
      ...init,
      credentials: 'same-origin',
      headers: { Accept: 'application/json', ...init?.headers },
    });
  } catch (cause) {
    throw new ApiError(0, 'network', NETWORK_MESSAGE, cause instanceof Error ? cause.message : undefined);
  }

  // 204 No Content has no body to read.
  const body = response.status === 204 ? undefined : await readJson(response);
  if (!response.ok && !options.dataStatuses?.includes(response.status)) {
    const parsed = errorBodySchema.safeParse(body);
    if (parsed.success) {
      const { code, message, details } = parsed.data.error;
      throw new ApiError(response.status, code, message, details);
    }
    throw new ApiError(response.status, 'http_error', `The server answered ${response.status}`);
  }

  const parsed = schema.safeParse(body);
  if (!parsed.success) {
    throw new ApiError(
      response.status,
      'bad_response',
      'The server sent a reply this app does not understand.',
      parsed.error.issues,
    );
  }
  return parsed.data;
}

/** True for errors that repeating the same request will not fix (the server said no). */
export function isClientError(error: unknown): boolean {
  return error instanceof ApiError && error.status >= 400 && error.status < 500;
}

/** Schema for replies that carry no body (204 No Content). */
export const noContent = z.undefined();

/** Sends `body` as JSON with `method` and returns the reply checked against `schema` (ApiError on failure). */
export function apiSend<S extends z.ZodType>(
  method: 'POST' | 'PATCH' | 'PUT' | 'DELETE',
  path: string,
  schema: S,
  body?: unknown,
): Promise<z.infer<S>> {
  const init: RequestInit =
    body === undefined
      ? { method }
      : { method, headers: { 'Content-Type': 'application/json' }, body: JSON.stringify(body) };
  return apiFetch(path, schema, init);
}
