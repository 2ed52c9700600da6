import type { paths } from '../api/schema';
import type { AnswerOf } from '../api/schemas';

/** The records a list path answers with, newest first. */
export type CheckList<P extends CheckListPath> = Extract<AnswerOf<P, 'get'>, { id: string }[]>;
/** One record of a list path. */
export type CheckRecordOf<P extends CheckListPath> = CheckList<P>[number];

/** A GET under a parent `{id}` that takes `limit` and `cursor` (a `query?: never` takes neither). */
type Pages<O> = O extends { parameters: { path: { id: string }; query?: infer Q } }
  ? [NonNullable<Q>] extends [never]
    ? false
    : NonNullable<Q> extends { limit?: number; cursor?: string }
      ? 'limit' | 'cursor' extends keyof NonNullable<Q>
        ? true
        : false
      : false
  : false;

/**
 * The paths of a parent's check records (`/api/axes/{id}/backlash-checks`): a GET that pages
 * through `limit` and `cursor` and answers with records that have ids. `{id}` is the parent.
 */
export type CheckListPath = {
  [P in keyof paths]: Pages<paths[P]['get']> extends true
    ? AnswerOf<P, 'get'> extends { id: string }[]
      ? P
      : never
    : never;
}[keyof paths];

/** The list paths that take a new record as a JSON body (POST). */
export type CheckRecordingPath = {
  [P in CheckListPath]: paths[P] extends { post: { requestBody?: { content: { 'application/json': unknown } } } }
    ? P
    : never;
}[CheckListPath];

/** What a recording path takes. */
export type CheckInput<P extends CheckRecordingPath> = paths[P] extends {
  post: { requestBody?: { content: { 'application/json': infer B } } };
}
  ? B
  : never;

/** What a recording path answers with: the record as recorded. */
export type RecordedCheck<P extends CheckRecordingPath> = AnswerOf<P, 'post'>;

/** The path of one record of a parent (`/api/axes/{id}/backlash-checks/{checkId}`) that can be deleted. */
export type CheckItemPath = {
  [P in keyof paths]: P extends `${string}/{id}/${string}/{${string}}`
    ? paths[P] extends { delete: { parameters: { path: { id: string } } } }
      ? P
      : never
    : never;
}[keyof paths];

/** The name of a path's last parameter: the record's own id in an item path. */
export type LastParam<S extends string> = S extends `${string}{${infer N}}${infer Rest}`
  ? Rest extends `${string}{${string}}${string}`
    ? LastParam<Rest>
    : N
  : never;

/**
 * A typed path with its parameters filled in and without the leading /api, as the device's queue
 * of entries sends it and `useWaitingEntries` matches it: `/axes/<id>/backlash-checks`.
 */
export function commandPath(path: keyof paths, params: Record<string, string>): string {
  return path.replace(/^\/api(?=\/)/, '').replace(/\{(\w+)\}/g, (_, name: string) => {
    const value = params[name];
    if (value === undefined) throw new Error(`${path} needs ${name}`);
    return encodeURIComponent(value);
  });
}

/** The name of the path's last `{parameter}`. */
export function lastParam(path: string): string {
  const names = [...path.matchAll(/\{(\w+)\}/g)].map((m) => m[1]);
  return names[names.length - 1];
}
