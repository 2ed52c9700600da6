import type { FastifyInstance, FastifyRequest, RouteOptions } from 'fastify';

/**
 * Checks every request meets before any handler, guard or validation runs: cheap, in one place.
 * - Body size per route: small by default, larger only where the route's data needs it.
 * - Cross-site writes: a state-changing request must be JSON (multipart on the upload route) and,
 *   when the browser says where it comes from (Origin, else Referer), come from the app itself.
 *   Requests with neither header (scripts, API clients) are not a browser's cross-site request.
 * - Text: no control characters in any string of the body or query (they cannot be shown, and
 *   PostgreSQL refuses NUL), except tab and line breaks in multi-line fields.
 * - API answers are never cached.
 */

export const DEFAULT_BODY_LIMIT_BYTES = 256 * 1024;

/** Routes whose real data is larger than the default: [pattern on the route url, bytes]. */
export const BODY_LIMITS: [RegExp, number][] = [
  // 200 000 stations of two 20-digit numbers, as JSON.
  [/^\/api\/calc\//, 16 * 1024 * 1024],
  // 100 runs × 500 deviations.
  [/^\/api\/axes\/[^/]+\/positioning-runs$/, 4 * 1024 * 1024],
  // 2 000 stations with notes; 2 500 grid points.
  [/\/sweeps$/, 2 * 1024 * 1024],
  [/\/bed-grids$/, 2 * 1024 * 1024],
];

const WRITE_METHODS = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);
const UPLOAD_ROUTE = /^\/api\/evidence\/?(\?|$)/;

// Fields whose text may run over several lines (notes, descriptions, reasons, statements).
const MULTI_LINE_FIELD = /^(notes?|description|reason|statement|comment|remarks?)$/i;
// Control characters are what these two look for, so the lint rule against them is off here.
// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u001f\u007f]/;
// eslint-disable-next-line no-control-regex
const CONTROL_EXCEPT_LINES = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/;
// Half of a surrogate pair alone is not a character: it would be stored as U+FFFD, changing the text.
const LONE_SURROGATE = /[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;

export interface RequestGuardOptions {
  /** Origins the app is served from (scheme://host[:port]), e.g. the public URL and the dev server. */
  allowedOrigins: string[];
  /** The upload route streams one file under multipart's own limits; this bounds the request. */
  uploadBodyLimit: number;
}

export class RequestRefusal extends Error {
  constructor(
    readonly statusCode: number,
    message: string,
  ) {
    super(message);
  }
}

export function registerRequestGuards(fastify: FastifyInstance, options: RequestGuardOptions): void {
  const allowed = new Set(options.allowedOrigins.map(originOf).filter((o): o is string => o !== null));

  fastify.addHook('onRoute', (route: RouteOptions) => {
    if (route.bodyLimit !== undefined) return;
    if (/^\/api\/evidence\/?$/.test(route.url) && [route.method].flat().includes('POST')) {
      route.bodyLimit = options.uploadBodyLimit;
      return;
    }
    const match = BODY_LIMITS.find(([pattern]) => pattern.test(route.url));
    route.bodyLimit = match ? match[1] : DEFAULT_BODY_LIMIT_BYTES;
  });

  fastify.addHook('onRequest', async (req, reply) => {
    const url = req.url;
    if (url.startsWith('/api')) reply.header('cache-control', 'no-store');
    if (!WRITE_METHODS.has(req.method)) return;
    const refusal = crossSiteRefusal(req, allowed) ?? contentTypeRefusal(req);
    // Returning the reply ends the request here; the handler never runs.
    if (refusal)
      return reply.code(refusal.statusCode).send({ statusCode: refusal.statusCode, message: refusal.message });
  });

  fastify.addHook('preValidation', async (req, reply) => {
    const found = controlCharacterIn(req.body, '') ?? controlCharacterIn(req.query, '');
    if (found !== null) {
      return reply.code(400).send({
        statusCode: 400,
        error: 'Bad Request',
        message: [`${found || 'the body'} must not contain control characters (such as NUL) or broken characters`],
      });
    }
  });
}

/** scheme://host:port of a URL, or null when it is not one. */
export function originOf(value: string | undefined): string | null {
  if (!value) return null;
  try {
    const u = new URL(value);
    return u.origin === 'null' ? null : u.origin;
  } catch {
    return null;
  }
}

function crossSiteRefusal(req: FastifyRequest, allowed: Set<string>): RequestRefusal | null {
  const origin = req.headers.origin;
  const referer = req.headers.referer;
  if (origin === undefined && referer === undefined) return null;
  const from = origin !== undefined ? originOf(origin) : originOf(referer);
  if (from !== null && allowed.has(from)) return null;
  // The page came from the very host the request is addressed to (a browser sets Host to the
  // server it talks to, so another site cannot match it): e.g. the app opened by its LAN address.
  if (from !== null && req.headers.host && new URL(from).host === req.headers.host) return null;
  return new RequestRefusal(
    403,
    'Changes are accepted only from the Railwright app itself (the request came from another site)',
  );
}

function contentTypeRefusal(req: FastifyRequest): RequestRefusal | null {
  const type = (req.headers['content-type'] ?? '').split(';')[0].trim().toLowerCase();
  const hasBody = Number(req.headers['content-length'] ?? 0) > 0 || req.headers['transfer-encoding'] !== undefined;
  if (!type) return hasBody ? new RequestRefusal(415, 'Send the body as application/json') : null;
  if (type === 'application/json') return null;
  if (type === 'multipart/form-data' && req.method === 'POST' && UPLOAD_ROUTE.test(req.url)) return null;
  return new RequestRefusal(415, `Content-Type ${type} is not accepted here; send application/json`);
}

/** True when text holds a control character (tab and line breaks allowed when `multiLine`) or half a surrogate pair. */
export function hasUnshowableCharacter(text: string, multiLine = false): boolean {
  return (multiLine ? CONTROL_EXCEPT_LINES : CONTROL).test(text) || LONE_SURROGATE.test(text);
}

/** The path of the first string holding a control character ('' for the body itself), or null. */
export function controlCharacterIn(value: unknown, path: string, key = ''): string | null {
  if (typeof value === 'string') {
    const pattern = MULTI_LINE_FIELD.test(key) ? CONTROL_EXCEPT_LINES : CONTROL;
    return pattern.test(value) || LONE_SURROGATE.test(value) ? path : null;
  }
  if (value === null || typeof value !== 'object') return null;
  // A large body's long number lists (Float64Array, see markPackedBody) hold no text.
  if (ArrayBuffer.isView(value)) return null;
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const v = value[i];
      if (typeof v === 'number') continue; // long numeric lists: nothing to look at
      const found = controlCharacterIn(v, `${path}[${i}]`, key);
      if (found !== null) return found;
    }
    return null;
  }
  for (const k of Object.keys(value)) {
    const keyPath = path ? `${path}.${k}` : k;
    if (CONTROL.test(k)) return keyPath;
    const found = controlCharacterIn((value as Record<string, unknown>)[k], keyPath, k);
    if (found !== null) return found;
  }
  return null;
}
