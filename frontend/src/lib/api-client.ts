import createClient, { type Middleware } from 'openapi-fetch';
import type { paths } from './api/schema';

/** The one way the client talks to the server: JSON over fetch, typed by the server's description, errors as ApiError. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly details: string[] = [],
    readonly body: unknown = null,
  ) {
    super(message);
  }
}

function messagesOf(body: unknown): string[] {
  if (!body || typeof body !== 'object') return [];
  const m = (body as { message?: unknown }).message;
  if (Array.isArray(m)) return m.map(String);
  return typeof m === 'string' ? [m] : [];
}

/** A refusal, with the server's messages (a 400 lists one per field). */
export function apiErrorOf(status: number, body: unknown): ApiError {
  const details = messagesOf(body);
  return new ApiError(status, details[0] ?? `The server answered ${status}`, details, body);
}

export const NO_ANSWER_MESSAGE = 'The server could not be reached. Check the connection and try again.';

let noAnswerListener: (() => void) | null = null;

/** Called whenever a request gets no answer at all (the offline support listens: lib/offline/connection.ts). */
export function onNoAnswer(listener: () => void): void {
  noAnswerListener = listener;
}

function safeParse(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return text;
  }
}

/** No answer at all and refusals both end as ApiError, so a caller only ever sees the answer's data. */
const answersOrApiError: Middleware = {
  onError() {
    noAnswerListener?.();
    return new ApiError(0, NO_ANSWER_MESSAGE);
  },
  async onResponse({ response }) {
    if (response.ok) return undefined;
    const text = await response.text();
    throw apiErrorOf(response.status, text ? safeParse(text) : null);
  },
};

/**
 * `client.GET('/api/machines/{id}', { params: { path: { id } } })`: paths, parameters, bodies and
 * answers are the ones in backend/openapi.json (types in ./api/schema.d.ts, generated from it).
 */
export const client = createClient<paths>({ credentials: 'same-origin', headers: { Accept: 'application/json' } });
client.use(answersOrApiError);

/** The answer's data; a refusal has been thrown as ApiError already. */
export async function answer<T>(call: Promise<{ data?: T }>): Promise<T> {
  return (await call).data as T;
}

/**
 * A request whose path is known only at run time: an entry kept on the device (lib/offline) holds
 * the concrete path it was made for, without /api. Same client, same errors.
 */
export function sendTo<T>(
  method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE',
  path: string,
  body?: unknown,
  headers: Record<string, string> = {},
): Promise<T> {
  const request = client.request as unknown as (
    method: string,
    path: string,
    init: { body?: unknown; headers: Record<string, string> },
  ) => Promise<{ data?: T }>;
  return answer(request(method, `/api${path}`, { body, headers }));
}

/** Untyped calls, left only where a feature still uses its own copies of the server's shapes. */
export const api = {
  get: <T>(path: string) => sendTo<T>('GET', path),
  post: <T>(path: string, json?: unknown) => sendTo<T>('POST', path, json ?? {}),
  put: <T>(path: string, json: unknown) => sendTo<T>('PUT', path, json),
  patch: <T>(path: string, json: unknown) => sendTo<T>('PATCH', path, json),
  delete: <T>(path: string) => sendTo<T>('DELETE', path),
};
