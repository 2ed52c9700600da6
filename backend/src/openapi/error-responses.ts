import type { OperationObject, ResponseObject, SchemaObject } from '@nestjs/swagger';

/** What the document needs to know of a handler beyond what the swagger explorer reads. */
export interface RouteFacts {
  /** `@Public()`: no session needed. */
  isPublic: boolean;
  /** `@Roles(...)`, or null when any signed-in role may call it. */
  roles: string[] | null;
  /** `@ApiProduces(...)`: the media types of a file or text answer; null for JSON. */
  produces: string[] | null;
  /** Path parameters read with ParseUUIDPipe. */
  uuidParameters: string[];
}

/** The bodies the server answers with when it refuses (Nest's HttpException shape and the filters in common/). */
export const ERROR_SCHEMAS: Record<string, SchemaObject> = {
  ValidationErrorResponse: {
    type: 'object',
    description: 'A refused request: each message names the field it is about.',
    properties: {
      statusCode: { type: 'number', enum: [400], description: 'The HTTP status code.' },
      message: {
        type: 'array',
        items: { type: 'string' },
        description: 'One message per problem, each naming its field.',
      },
      error: { type: 'string', enum: ['Bad Request'] },
      field: { type: 'string', description: 'The field a computation could not use, when there is one.' },
    },
    required: ['statusCode', 'message', 'error'],
  },
  ErrorResponse: {
    type: 'object',
    properties: {
      statusCode: { type: 'number', description: 'The HTTP status code.' },
      message: { type: 'string', description: 'Written for people: what was refused and why.' },
      error: { type: 'string' },
    },
    required: ['statusCode', 'message'],
  },
  ConflictResponse: {
    type: 'object',
    description: 'The request clashes with the state of the records.',
    properties: {
      statusCode: { type: 'number', enum: [409], description: 'The HTTP status code.' },
      message: { type: 'string', description: 'Written for people: what was refused and why.' },
      error: { type: 'string', enum: ['Conflict'] },
      blocking: {
        type: 'array',
        description: 'Approval requests only: the checks that stop the machine from being approved.',
        items: { type: 'object', additionalProperties: true },
      },
    },
    required: ['statusCode', 'message'],
  },
};

const ref = (name: string) => ({ $ref: `#/components/schemas/${name}` });

function refusal(description: string, schema: string): ResponseObject {
  return { description, content: { 'application/json': { schema: ref(schema) } } };
}

/**
 * The refusals a route can answer:
 * - 400 when it takes a body, a query or path parameters (the global validation pipe, the engine);
 * - 401 unless it is public; 403 when it is limited to some roles;
 * - 404 when it names a record in its path (another workshop's record is "not found" too);
 * - 409 for commands: a record an approval stands on cannot change, and a repeated
 *   Idempotency-Key is refused while its first request is running or was someone else's.
 */
export function errorResponses(
  method: string,
  path: string,
  operation: OperationObject,
  route: RouteFacts,
): Record<string, ResponseObject> {
  const out: Record<string, ResponseObject> = {};
  const hasInput = Boolean(operation.requestBody) || (operation.parameters ?? []).length > 0;
  const hasPathParameter = path.includes('{');
  if (hasInput || method !== 'get') {
    out['400'] = refusal(
      'The request breaks a rule: a field is missing, of the wrong type or out of range.',
      'ValidationErrorResponse',
    );
  }
  if (!route.isPublic) out['401'] = refusal('No session: sign in first.', 'ErrorResponse');
  if (!route.isPublic && route.roles) {
    out['403'] = refusal(`Only these roles may do this: ${route.roles.join(', ')}.`, 'ErrorResponse');
  }
  if (hasPathParameter) out['404'] = refusal('No such record in the signed-in workshop.', 'ErrorResponse');
  if (method !== 'get' && !route.isPublic) {
    out['409'] = refusal(
      "Refused because of the records' state: an approval stands on the machine's records (record a new check instead), " +
        'or the same Idempotency-Key was sent by someone else or is still being recorded.',
      'ConflictResponse',
    );
  }
  return out;
}
