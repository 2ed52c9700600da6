import createClient, { type Middleware } from 'openapi-fetch';
import type { paths } from './api/schema';

import { apiErrorOf, noAnswer, safeParse } from './api/fetch-json';

export { ApiError, apiErrorOf, NO_ANSWER_MESSAGE, onNoAnswer } from './api/fetch-json';

/** No answer at all and refusals both end as ApiError, so a caller only ever sees the answer's data. */
const answersOrApiError: Middleware = {
  onError() {
    return noAnswer();
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
