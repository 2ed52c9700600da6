import type { OpenAPIObject, ParameterObject, ReferenceObject, SchemaObject } from '@nestjs/swagger';

/**
 * What a number's description must say: the unit it is measured in, or plainly that it has none.
 * Each pattern names a unit (or a kind of unitless number) itself, so a sentence that merely
 * mentions "unit" or "number of" does not pass: a count says it is a count, an index says where it
 * starts, a ratio says it is a ratio.
 */
export const SAYS_UNIT: readonly RegExp[] = [
  /\bmm\b/, // millimetres, and mm/m, mm/min, steps per mm
  /µm/, // micrometres, and µm per mm
  /`(lengthUnit|readingUnit|unit)`|\b(lengthUnit|readingUnit)\b/, // in the record's unit family (or a stored `unit`)
  /\binch(es)?\b|\bthou\b/,
  /°C|\bkelvin\b/,
  /\bdegrees\b|°(?!C)|\barcseconds?\b|\bradians?\b/,
  /\brpm\b|revolutions? per minute/,
  /\b(milli)?seconds\b|\bminutes\b|\bhours\b|\bdays\b/,
  /\bbytes\b|\bpixels\b/,
  /%|\bper ?cent\b/,
  /N·m/,
  /\bsteps per (mm|in|rev(olution)?|motor revolution)\b/,
  /\bcount\b/i, // a count of things: holes, runs, teeth, microsteps
  /\bindex from [01]\b/i,
  /\bratio\b/i,
  /\bno unit\b/i,
  /\bHTTP status\b/,
];

export function saysUnit(description: string | undefined): boolean {
  return !!description && SAYS_UNIT.some((pattern) => pattern.test(description));
}

type Schema = SchemaObject | ReferenceObject;

/** A number, an array of numbers (at any depth), or a choice one of whose parts is a number. */
function isNumeric(schema: Schema | undefined): boolean {
  if (!schema || '$ref' in schema) return false;
  if (schema.type === 'number' || schema.type === 'integer') return true;
  if (schema.type === 'array') return isNumeric(schema.items);
  return [...(schema.oneOf ?? []), ...(schema.anyOf ?? [])].some((part) => isNumeric(part));
}

/**
 * Every number in the document (request bodies and answers, nested shapes, parameters) whose
 * description names no unit: `Schema.path.to.field`, or `GET /api/x field` for inline answers,
 * or `GET /api/x ?parameter` for parameters.
 */
export function numbersWithoutUnit(document: OpenAPIObject): string[] {
  const missing = new Set<string>();

  function walk(owner: string, schema: Schema | undefined, path: string, seen: Set<object>): void {
    if (!schema || typeof schema !== 'object' || '$ref' in schema || seen.has(schema)) return;
    seen.add(schema);
    for (const [name, property] of Object.entries(schema.properties ?? {})) {
      if (isNumeric(property) && !saysUnit((property as SchemaObject).description))
        missing.add(`${owner} ${path}${name}`);
      walk(owner, property, `${path}${name}.`, seen);
    }
    const extra = schema.additionalProperties;
    if (extra && typeof extra === 'object') {
      if (isNumeric(extra) && !saysUnit((extra as SchemaObject).description) && !saysUnit(schema.description))
        missing.add(`${owner} ${path}{key}`);
      walk(owner, extra, `${path}{key}.`, seen);
    }
    for (const part of [...(schema.oneOf ?? []), ...(schema.anyOf ?? []), ...(schema.allOf ?? [])])
      walk(owner, part, path, seen);
    if (schema.type === 'array') walk(owner, schema.items, `${path}[].`, seen);
  }

  for (const [name, schema] of Object.entries(document.components?.schemas ?? {})) walk(name, schema, '', new Set());
  for (const [route, item] of Object.entries(document.paths)) {
    for (const method of ['get', 'post', 'put', 'patch', 'delete'] as const) {
      const operation = item[method];
      if (!operation) continue;
      const label = `${method.toUpperCase()} ${route}`;
      for (const parameter of (operation.parameters ?? []) as ParameterObject[]) {
        if (isNumeric(parameter.schema) && !saysUnit(parameter.description)) missing.add(`${label} ?${parameter.name}`);
      }
      for (const response of Object.values(operation.responses ?? {})) {
        const schema = response && 'content' in response ? response.content?.['application/json']?.schema : undefined;
        if (!schema) continue;
        if (isNumeric(schema) && !saysUnit((schema as SchemaObject).description)) missing.add(`${label} (answer)`);
        walk(label, schema, '', new Set());
      }
      const body = operation.requestBody;
      const bodySchema = body && 'content' in body ? body.content['application/json']?.schema : undefined;
      if (bodySchema) walk(`${label} (body)`, bodySchema, '', new Set());
    }
  }
  return [...missing].sort();
}
