/** The one way the client talks to the server: JSON over fetch, errors as ApiError. */
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

let noAnswerListener: (() => void) | null = null;

/** Called whenever a request gets no answer at all (the offline support listens: lib/offline/connection.ts). */
export function onNoAnswer(listener: () => void): void {
  noAnswerListener = listener;
}

export async function apiFetch<T>(path: string, init: RequestInit & { json?: unknown } = {}): Promise<T> {
  const { json, headers, ...rest } = init;
  let res: Response;
  try {
    res = await fetch(`/api${path}`, {
      credentials: 'same-origin',
      ...rest,
      headers: { Accept: 'application/json', ...(json !== undefined ? { 'Content-Type': 'application/json' } : {}), ...headers },
      body: json !== undefined ? JSON.stringify(json) : rest.body,
    });
  } catch {
    noAnswerListener?.();
    throw new ApiError(0, 'The server could not be reached. Check the connection and try again.');
  }
  if (res.status === 204) return undefined as T;
  const text = await res.text();
  const body = text ? safeParse(text) : null;
  if (!res.ok) {
    const details = messagesOf(body);
    throw new ApiError(res.status, details[0] ?? `The server answered ${res.status}`, details, body);
  }
  return body as T;
}

function safeParse(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return text;
  }
}

export const api = {
  get: <T>(path: string) => apiFetch<T>(path),
  post: <T>(path: string, json?: unknown) => apiFetch<T>(path, { method: 'POST', json: json ?? {} }),
  put: <T>(path: string, json: unknown) => apiFetch<T>(path, { method: 'PUT', json }),
  patch: <T>(path: string, json: unknown) => apiFetch<T>(path, { method: 'PATCH', json }),
  delete: <T>(path: string) => apiFetch<T>(path, { method: 'DELETE' }),
};
