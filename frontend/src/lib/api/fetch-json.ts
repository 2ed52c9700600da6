/**
 * The transport under every request: errors as ApiError, a lost connection reported to the offline
 * support. Requests whose path is known only at run time (entries kept on the device, the
 * signed-in person on the sign-in page) go straight through `sendTo`; features use the typed
 * client in lib/api-client.ts, which ends its refusals the same way. Kept apart from that client
 * so the sign-in page loads without it.
 */
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

/** A request got no answer: tells the listener and gives the error to throw. */
export function noAnswer(): ApiError {
  noAnswerListener?.();
  return new ApiError(0, NO_ANSWER_MESSAGE);
}

export function safeParse(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return text;
  }
}

/**
 * A request to `/api` + `path` (the concrete path, e.g. `/bolt-downs/…/holes/3`): a JSON body
 * (or form data as it is), the answer's JSON, a refusal thrown as ApiError.
 */
export async function sendTo<T>(
  method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE',
  path: string,
  body?: unknown,
  headers: Record<string, string> = {},
): Promise<T> {
  const json = body !== undefined && !(body instanceof FormData);
  let response: Response;
  try {
    response = await fetch(`/api${path}`, {
      method,
      credentials: 'same-origin',
      headers: { Accept: 'application/json', ...(json ? { 'Content-Type': 'application/json' } : {}), ...headers },
      body: json ? JSON.stringify(body) : (body as FormData | undefined),
    });
  } catch {
    throw noAnswer();
  }
  const text = response.status === 204 ? '' : await response.text();
  const parsed = text ? safeParse(text) : undefined;
  if (!response.ok) throw apiErrorOf(response.status, parsed ?? null);
  return parsed as T;
}
