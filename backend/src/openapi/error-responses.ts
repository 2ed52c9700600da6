import { SetMetadata } from '@nestjs/common';
import type { OperationObject, ResponseObject, SchemaObject } from '@nestjs/swagger';

/**
 * Why a command can be refused with 409, besides a repeated Idempotency-Key (which any command of
 * a signed-in person can meet, so the document adds it to every one of them):
 */
export const CONFLICT_CAUSES = {
  /** MachinesService.lockForChange, RecordsService.assertEditable and the database's approval guard. */
  'approval-lock':
    "An approval stands on the machine's records: they are read-only while it stands (the owner can reopen the machine with a reason).",
  /** An id or write id the client made for an entry, sent again with another entry. */
  'reused-id': 'The id the client made for this entry is already used by another record or write.',
  /** A unique rule: explicit checks, and unique violations the database-error filter turns into 409. */
  taken: 'The name or address is already taken.',
  /** An explicit ConflictException about where the record stands (its state, a step already done). */
  state: 'The record is not in a state that allows it; the message says what stands in the way.',
} as const;
export type ConflictCause = keyof typeof CONFLICT_CAUSES;

export const CONFLICTS_KEY = 'railwright:conflicts';

/** The causes of 409 this handler can meet (see CONFLICT_CAUSES); read by the API description. */
export const ConflictsWhen = (...causes: ConflictCause[]) => SetMetadata(CONFLICTS_KEY, causes);

/**
 * The two answers of a command whose entry carries an id the client made (a sweep, a final sweep):
 * 201 when it is recorded, 200 when the same id comes again (an entry sent twice from a device
 * that lost its connection), with the record as first made and nothing recorded again.
 */
export const NEW_OR_REPEATED = {
  created: (what: string) => `The ${what} is recorded: the new record.`,
  repeated: (what: string) =>
    `The ${what} with this \`id\` was recorded before (the same entry sent again): the record as first made; nothing is recorded again.`,
};

/**
 * A well-formed request refused because of what it asks (422), a cause of the handler's own; every
 * command of a signed-in person can meet KEY_UNPROCESSABLE besides.
 */
export const UNPROCESSABLE_KEY = 'railwright:unprocessable';
export const UnprocessableWhen = (...reasons: string[]) => SetMetadata(UNPROCESSABLE_KEY, reasons);

/** The 422 any command of a signed-in person can meet through database/command-keys.ts. */
export const KEY_UNPROCESSABLE =
  'The Idempotency-Key header was sent before with another command (another method or path): make a new key for each entry.';

/** The 409 any command of a signed-in person can meet through database/command-keys.ts. */
export const KEY_CONFLICT =
  'Sent with an Idempotency-Key header only: the same key is still being recorded, was sent by someone else, or its first answer was too large to keep.';

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
  /** `@ConflictsWhen(...)`: the causes of 409 of the handler's own. */
  conflicts: ConflictCause[];
  /** `@UnprocessableWhen(...)`: the causes of 422 of the handler's own. */
  unprocessable: string[];
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
  UnprocessableResponse: {
    type: 'object',
    description: 'A well-formed request refused because of what it asks.',
    properties: {
      statusCode: { type: 'number', enum: [422], description: 'The HTTP status code.' },
      message: {
        oneOf: [{ type: 'string' }, { type: 'array', items: { type: 'string' } }],
        description: 'Written for people: what was refused and what to do (a list names the field first).',
      },
      error: { type: 'string', enum: ['Unprocessable Entity'] },
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
 * - 409 and 422 for a signed-in person's commands, naming the causes the route can meet: its own
 *   (`@ConflictsWhen`, `@UnprocessableWhen`) and the Idempotency-Key's. A route without a session
 *   takes no key.
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
    const causes = [...route.conflicts.map((cause) => CONFLICT_CAUSES[cause]), KEY_CONFLICT];
    out['409'] = refusal(
      `Refused as a conflict, for one of these reasons:\n- ${causes.join('\n- ')}`,
      'ConflictResponse',
    );
    const reasons = [...route.unprocessable, KEY_UNPROCESSABLE];
    out['422'] = refusal(
      `Refused although well formed, for one of these reasons:\n- ${reasons.join('\n- ')}`,
      'UnprocessableResponse',
    );
  }
  return out;
}
