import type { OpenAPIObject, ReferenceObject, SchemaObject } from '@nestjs/swagger';
import { UNIT_ENUM_NAMES } from '../common/unit-fields.js';
import { LENGTH_UNITS } from '../engine/units.js';

/**
 * Units the names already carry (the code's rule: "names carry units where a number has one"),
 * written into the description where the type's own comment did not say it.
 */
const NAMED_UNITS: [RegExp, string, RegExp][] = [
  [/mmPerMin$/i, 'In mm per minute.', /mm per min|mm\/min/i],
  [/mmPerMetre$|mmPerM$/i, 'In mm per metre.', /mm per m|mm\/m/i],
  [/stepsPerMm$/i, 'In steps per mm.', /steps per mm/i],
  [/UmPerMm$/, 'In µm per mm.', /µm per mm|um\/mm/i],
  [/PerMm$/, 'Per mm.', /per mm/i],
  [/Mm$/, 'In mm.', /\bmm\b|millimetres/i],
  [/Um$/, 'In µm.', /µm|\bum\b|micromet/i],
  [/Deg$|Degrees$/, 'In degrees.', /degree|°/i],
  [/Arcsec$/, 'In arcseconds.', /arcsec|″/i],
  [/Rad$/, 'In radians.', /radian/i],
  [/Percent$/, 'In %.', /%|per ?cent/i],
  [/Nm$/, 'In N·m.', /N·m|Nm\b/],
  [/Px$/, 'In pixels.', /pixel/i],
  [/Bytes$/, 'In bytes.', /byte/i],
  [/Days$/, 'In days.', /day/i],
  [/Seconds$/, 'In seconds.', /second/i],
];

const FAMILIES: Record<string, string> = {
  lengthUnit:
    'Unit of the positions, geometry, commanded and measured moves, lead, pitch, diameters, lengths and travel of this record (feed rates in it per minute): mm, um, in or thou (1 in = 25.4 mm exactly).',
  readingUnit:
    'Unit of the indicator readings, deviations and heights of this record: mm, um, in or thou (1 in = 25.4 mm exactly).',
};

const isUnitList = (schema: SchemaObject) =>
  schema.type === 'string' &&
  !schema.nullable &&
  schema.enum?.length === LENGTH_UNITS.length &&
  LENGTH_UNITS.every((unit) => schema.enum!.includes(unit));

/**
 * A unit field of an answer (read from the mapper's type, so its list is written out) refers to the
 * same named list as the requests' unit fields (`LengthUnit`, `ReadingUnit`), so a client has one list.
 */
function unitFamilyReference(name: string, schema: SchemaObject): SchemaObject {
  if (!(name in UNIT_ENUM_NAMES) || !isUnitList(schema)) return schema;
  const enumName = UNIT_ENUM_NAMES[name as keyof typeof UNIT_ENUM_NAMES];
  return {
    allOf: [{ $ref: `#/components/schemas/${enumName}` }],
    description: schema.description ?? FAMILIES[name],
  };
}

function describeProperty(name: string, schema: SchemaObject | ReferenceObject): SchemaObject | ReferenceObject {
  if ('$ref' in schema) return schema;
  if (name in FAMILIES && !schema.description) schema = { ...schema, description: FAMILIES[name] };
  if (name in FAMILIES) return unitFamilyReference(name, schema);
  if (name === 'units' && schema.type === 'object' && !schema.description) {
    return { ...schema, description: 'The unit of each number of this answer, by field name (mm, mm/mm, %, …).' };
  }
  const isNumber =
    schema.type === 'number' ||
    schema.type === 'integer' ||
    (schema.type === 'array' && !!schema.items && 'type' in schema.items && schema.items.type === 'number');
  if (!isNumber) return schema;
  for (const [pattern, text, said] of NAMED_UNITS) {
    if (!pattern.test(name)) continue;
    if (schema.description && said.test(schema.description)) return schema;
    return { ...schema, description: schema.description ? `${schema.description} ${text}` : text };
  }
  return schema;
}

/** A stored value beside its own `unit` (targets): the number is in that unit. */
function describeValueBesideUnit(props: Record<string, SchemaObject | ReferenceObject>) {
  const value = props.value;
  const unit = props.unit;
  if (!value || !unit || '$ref' in value || '$ref' in unit || value.type !== 'number' || value.description) return;
  props.value = { ...value, description: 'In the `unit` stored beside it.' };
}

function walk(value: unknown): void {
  if (Array.isArray(value)) {
    value.forEach(walk);
    return;
  }
  if (!value || typeof value !== 'object') return;
  const record = value as Record<string, unknown>;
  if (record.properties && typeof record.properties === 'object' && record.type === 'object') {
    const props = record.properties as Record<string, SchemaObject | ReferenceObject>;
    for (const key of Object.keys(props)) props[key] = describeProperty(key, props[key]);
    describeValueBesideUnit(props);
  }
  for (const v of Object.values(record)) walk(v);
}

/** Names the unit of every number whose name carries one, and what the two unit fields mean. */
export function describeNamedUnits(document: OpenAPIObject): void {
  walk(document.components?.schemas);
  walk(document.paths);
  // The two lists, each described once (the swagger module would lend them a field's description).
  const schemas = (document.components ??= {}).schemas ?? (document.components.schemas = {});
  for (const [field, enumName] of Object.entries(UNIT_ENUM_NAMES)) {
    schemas[enumName] = { type: 'string', enum: [...LENGTH_UNITS], description: LIST_WORDS[field] };
  }
}

const LIST_WORDS: Record<string, string> = {
  lengthUnit:
    'A length unit (1 in = 25.4 mm exactly, 1 thou = 0.001 in, um = µm): the unit of positions, geometry, moves, lead, pitch, diameters, lengths and travel (feed rates in it per minute).',
  readingUnit:
    'A reading unit (1 in = 25.4 mm exactly, 1 thou = 0.001 in, um = µm): the unit of indicator readings, deviations and heights.',
};
