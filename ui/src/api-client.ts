import type { z } from 'zod';
import { apiErrorBody, type ErrorKind } from '@server/contracts/errors.ts';

/** An API failure with the server's kind and message, or a network failure (kind 'network'). */
export class ApiError extends Error {
  constructor(
    readonly kind: ErrorKind | 'server' | 'network',
    message: string,
    readonly status: number,
    readonly fields?: Record<string, string>,
    /** Figures the server sent with a refusal (see apiErrorBody). */
    readonly details?: Record<string, unknown>,
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

interface RequestOptions {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  body?: unknown;
  signal?: AbortSignal;
}

/**
 * The one way the apps talk to the API: same-origin fetch with the session cookie, the response parsed with the
 * contract's schema, and error bodies turned into ApiError.
 */
export async function apiRequest<T>(
  path: string,
  schema: z.ZodType<T> | null,
  options: RequestOptions = {},
): Promise<T> {
  let response: Response;
  try {
    response = await fetch(`/api${path}`, {
      method: options.method ?? 'GET',
      credentials: 'same-origin',
      headers:
        options.body === undefined
          ? { Accept: 'application/json' }
          : { Accept: 'application/json', 'Content-Type': 'application/json' },
      body: options.body === undefined ? undefined : JSON.stringify(options.body),
      signal: options.signal,
    });
  } catch {
    throw new ApiError('network', 'We could not reach the shop. Check your connection and try again.', 0);
  }
  if (!response.ok) {
    const parsed = apiErrorBody.safeParse(await response.json().catch(() => null));
    if (parsed.success) {
      const { kind, message, fields, details } = parsed.data.error;
      throw new ApiError(kind, message, response.status, fields, details);
    }
    throw new ApiError('server', `The shop answered with an unexpected error (${response.status}).`, response.status);
  }
  if (response.status === 204 || schema === null) return undefined as T;
  return schema.parse(await response.json());
}
