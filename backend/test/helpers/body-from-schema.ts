import { randomUUID } from 'node:crypto';

/** The part of an OpenAPI 3 schema object a request body is built from. */
export interface JsonSchema {
  $ref?: string;
  type?: string;
  format?: string;
  enum?: unknown[];
  properties?: Record<string, JsonSchema>;
  required?: string[];
  items?: JsonSchema;
  allOf?: JsonSchema[];
  oneOf?: JsonSchema[];
  anyOf?: JsonSchema[];
  minimum?: number;
  maximum?: number;
  minLength?: number;
  maxLength?: number;
  minItems?: number;
  maxItems?: number;
  nullable?: boolean;
}

export interface OpenApiDocument {
  paths: Record<string, Record<string, OpenApiOperation>>;
  components?: { schemas?: Record<string, JsonSchema> };
}

export interface OpenApiOperation {
  requestBody?: { content?: Record<string, { schema?: JsonSchema }> };
}

/**
 * A plausible body for a request schema of the API description: every required field, each value
 * inside its bounds (numbers rising from one item to the next so a list is not degenerate). It is
 * where generated bad bodies start from, so a write route is fuzzed as soon as it is described,
 * without a body written for it by hand. The server may still refuse it on its own rules (a 4xx):
 * that is enough for a starting point.
 */
export function bodyFromSchema(document: OpenApiDocument, schema: JsonSchema, index = 0, depth = 0): unknown {
  if (depth > 8) return null;
  if (schema.$ref) {
    const name = schema.$ref.split('/').pop() as string;
    const target = document.components?.schemas?.[name];
    if (!target) throw new Error(`The description refers to a schema it does not hold: ${schema.$ref}`);
    return bodyFromSchema(document, target, index, depth + 1);
  }
  if (schema.allOf?.length)
    return Object.assign({}, ...schema.allOf.map((part) => bodyFromSchema(document, part, index, depth + 1)));
  const variant = schema.oneOf?.[0] ?? schema.anyOf?.[0];
  if (variant) return bodyFromSchema(document, variant, index, depth + 1);
  if (schema.enum?.length) return schema.enum[0];
  switch (schema.type) {
    case 'object': {
      const out: Record<string, unknown> = {};
      for (const key of schema.required ?? [])
        out[key] = bodyFromSchema(document, schema.properties?.[key] ?? {}, index, depth + 1);
      return out;
    }
    case 'array': {
      const length = Math.min(Math.max(schema.minItems ?? 1, 3), schema.maxItems ?? 3);
      return Array.from({ length }, (_, i) => bodyFromSchema(document, schema.items ?? {}, i, depth + 1));
    }
    case 'number':
    case 'integer':
      return numberWithin(schema, index);
    case 'boolean':
      return false;
    case 'string':
      return stringFor(schema, index);
    default:
      return {};
  }
}

function numberWithin(schema: JsonSchema, index: number): number {
  const low = schema.minimum ?? 0;
  const high = schema.maximum ?? low + 1000;
  const step = Math.max((high - low) / 10, schema.type === 'integer' ? 1 : 0);
  const value = Math.min(low + step * (index + 1), high);
  return schema.type === 'integer' ? Math.floor(value) : value;
}

function stringFor(schema: JsonSchema, index: number): string {
  if (schema.format === 'uuid') return randomUUID();
  if (schema.format === 'email') return `fuzz.${randomUUID().slice(0, 8)}@test.example.com`;
  if (schema.format === 'date-time' || schema.format === 'date')
    return new Date(Date.UTC(2026, 0, 1 + index)).toISOString();
  const text = `Fuzz text ${index + 1} long enough`;
  const length = Math.max(schema.minLength ?? 0, Math.min(text.length, schema.maxLength ?? text.length));
  return text.padEnd(length, '.').slice(0, length);
}

/** The JSON request schema of an operation, if it takes a JSON body. */
export const jsonBodySchema = (op: OpenApiOperation): JsonSchema | undefined =>
  op.requestBody?.content?.['application/json']?.schema;
