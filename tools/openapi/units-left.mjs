// Lists the numbers in backend/openapi.json whose description does not name a unit (nor say they
// are a count, an index or a ratio): the fields still to document with a doc comment on the DTO
// or the response type. Run: node tools/openapi/units-left.mjs
import { readFileSync } from 'node:fs';

const document = JSON.parse(readFileSync(new URL('../../backend/openapi.json', import.meta.url), 'utf8'));
const SAYS_UNIT =
  /\bmm\b|µm|\bum\b|lengthUnit|readingUnit|degree|°|second|minute|%|per ?cent|mm\/m|\bper\b|ratio|steps|N·m|rpm|\bunit\b|how many|number of|index|count|pixel|byte|day|radian|arcsec|rows|columns|teeth|no unit/i;
const COUNT_NAME = /count|Count|index|Index|^rows$|^columns$|^statusCode$/;
const missing = new Set();

function walk(owner, schema, path) {
  if (!schema || typeof schema !== 'object') return;
  for (const [name, prop] of Object.entries(schema.properties ?? {})) {
    const type = prop.type ?? prop.items?.type;
    if ((type === 'number' || type === 'integer') && !SAYS_UNIT.test(prop.description ?? '') && !COUNT_NAME.test(name))
      missing.add(`${owner} ${path}${name}`);
    walk(owner, prop, `${path}${name}.`);
  }
  for (const key of ['oneOf', 'allOf', 'anyOf']) for (const part of schema[key] ?? []) walk(owner, part, path);
  if (schema.items) walk(owner, schema.items, `${path}[].`);
}

for (const [name, schema] of Object.entries(document.components?.schemas ?? {})) walk(name, schema, '');
for (const [path, item] of Object.entries(document.paths)) {
  for (const [method, op] of Object.entries(item)) {
    for (const [status, response] of Object.entries(op.responses ?? {})) {
      const schema = status.startsWith('2') ? response.content?.['application/json']?.schema : undefined;
      if (schema) walk(`${method.toUpperCase()} ${path}`, schema, '');
    }
  }
}
console.log([...missing].sort().join('\n'));
console.error(`${missing.size} numbers without a stated unit`);
