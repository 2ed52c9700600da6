import { BadRequestException, ValidationPipe, type ArgumentMetadata, type ValidationPipeOptions } from '@nestjs/common';
import { getMetadataStorage } from 'class-validator';
import type { ValidationMetadata } from 'class-validator/types/metadata/ValidationMetadata.js';
import { defaultMetadataStorage } from 'class-transformer/cjs/storage.js';
import { cacheValidationMetadata } from './validation-metadata-cache.js';
import { keepsNumberListsPacked } from './keeps-number-lists-packed.js';
import { isPackedBody, toPlainArray, unpackNumberArrays } from '../engine-worker/number-arrays.js';

type Ctor = new (...args: unknown[]) => object;

// Validators a long number list may carry for the sampled check below to be equivalent.
const LIST_RULES = new Set(['isArray', 'arrayMaxSize', 'arrayMinSize', 'isNumber']);
const SAMPLE = 64;

/**
 * The global validation pipe, with two checks first so size comes before work:
 * 1. every @ArrayMaxSize of the DTO (and its nested DTOs) is checked on the raw body, so a list
 *    300 000 long is refused at once instead of after building and validating each element;
 * 2. a long list of plain numbers is checked in one loop (finite numbers), and class-transformer
 *    and class-validator see only a short sample of it, which is the costly part per element.
 */
export class AppValidationPipe extends ValidationPipe {
  constructor(options: ValidationPipeOptions) {
    super(options);
    cacheValidationMetadata();
  }

  override async transform(value: unknown, metadata: ArgumentMetadata): Promise<unknown> {
    const type = metadata.metatype as Ctor | undefined;
    // A large body parsed in the worker thread holds its long number lists as Float64Arrays.
    const packed = isPackedBody(value);
    if (!type || !isPlainObject(value) || !isDto(type))
      return super.transform(packed ? unpackNumberArrays(value) : value, metadata);
    const tooLong = arrayCapBreach(value, type, '', 0);
    if (tooLong) throw new BadRequestException([tooLong]);
    const long: LongList[] = [];
    const compacted = compactLongLists(value, type, [], long, 0);
    // A packed list the DTO does not take as a number list is a plain one again, so class-validator
    // judges it as it judges any list.
    const sampled = packed ? unpackNumberArrays(compacted) : compacted;
    if (!long.length) return super.transform(sampled, metadata);
    const dto = await super.transform(sampled, metadata);
    const keep = keepsNumberListsPacked(type);
    for (const { path, values } of long)
      putAt(dto, path, !keep && values instanceof Float64Array ? toPlainArray(values) : values);
    // A long computation follows: let requests that arrived meanwhile (health checks, page loads) go first.
    await new Promise((resolve) => setImmediate(resolve));
    return dto;
  }
}

/** A long list checked in one pass, where it sits in the body, and its values to put back. */
interface LongList {
  path: (string | number)[];
  values: unknown[] | Float64Array;
}

function isPlainObject(v: unknown): v is Record<string, unknown> {
  return v !== null && typeof v === 'object' && !Array.isArray(v);
}

function isDto(type: Ctor): boolean {
  return ![String, Number, Boolean, Array, Object].includes(type as never);
}

function metadatasOf(type: Ctor): ValidationMetadata[] {
  return getMetadataStorage().getTargetValidationMetadatas(type, '', true, false);
}

function nestedType(type: Ctor, key: string): Ctor | null {
  const meta = defaultMetadataStorage.findTypeMetadata(type, key);
  const t = meta?.typeFunction?.() as Ctor | undefined;
  return t && isDto(t) ? t : null;
}

/** The first @ArrayMaxSize a raw body breaks, as the DTO's own message; null when none. */
function arrayCapBreach(value: Record<string, unknown>, type: Ctor, prefix: string, depth: number): string | null {
  if (depth > 4) return null;
  const metas = metadatasOf(type);
  for (const m of metas) {
    if (m.name !== 'arrayMaxSize' || m.each) continue;
    const v = value[m.propertyName];
    const max = Number(m.constraints?.[0]);
    if ((Array.isArray(v) || v instanceof Float64Array) && v.length > max) {
      const msg =
        typeof m.message === 'string' ? m.message : `${prefix}${m.propertyName} must hold at most ${max} entries`;
      return msg;
    }
  }
  const keys = new Set(
    metas.filter((m) => m.name === undefined && m.type === 'nestedValidation').map((m) => m.propertyName),
  );
  for (const key of keys) {
    const nested = nestedType(type, key);
    const v = value[key];
    if (!nested) continue;
    const items = Array.isArray(v) ? v : [v];
    for (const item of items) {
      if (!isPlainObject(item)) continue;
      const found = arrayCapBreach(item, nested, `${prefix}${key}.`, depth + 1);
      if (found) return found;
    }
  }
  return null;
}

/**
 * A copy of the body in which every long list that needs only "finite number" checks is checked
 * here in one loop and cut to a short sample for class-transformer and class-validator (which
 * still see the sample, so their messages for the rest of the body are unchanged). Two shapes
 * qualify: a list of numbers (`positions`, also inside nested objects like `runs[i].deviations`),
 * and a list of objects whose every field is a finite number (`points: [{x, y, z}]`).
 */
function compactLongLists(
  value: Record<string, unknown>,
  type: Ctor,
  path: (string | number)[],
  out: LongList[],
  depth: number,
): Record<string, unknown> {
  if (depth > 4) return value;
  let copy: Record<string, unknown> | null = null;
  const set = (key: string, v: unknown) => ((copy ??= { ...value })[key] = v);
  for (const [key, metas] of metadatasByKey(type)) {
    const v = value[key];
    if ((Array.isArray(v) || v instanceof Float64Array) && v.length > SAMPLE && isNumberList(metas)) {
      checkNumbers(v, key, metas, `${[...path, key].join('.')}`);
      out.push({ path: [...path, key], values: v });
      set(key, v instanceof Float64Array ? Array.from(v.subarray(0, SAMPLE)) : v.slice(0, SAMPLE));
      continue;
    }
    const nested = metas.some((m) => m.type === 'nestedValidation') ? nestedType(type, key) : null;
    if (!nested || v === null || typeof v !== 'object') continue;
    const fields = numberFieldsOf(nested);
    if (
      Array.isArray(v) &&
      v.length > SAMPLE &&
      fields &&
      metas.every((m) => m.type === 'nestedValidation' || (m.name !== undefined && OBJECT_LIST_RULES.has(m.name)))
    ) {
      checkNumberObjects(v, key, fields, nested);
      out.push({ path: [...path, key], values: v });
      set(key, v.slice(0, SAMPLE));
      continue;
    }
    const items = Array.isArray(v) ? v : [v];
    const compacted = items.map((item, i) =>
      isPlainObject(item)
        ? compactLongLists(item, nested, Array.isArray(v) ? [...path, key, i] : [...path, key], out, depth + 1)
        : item,
    );
    if (compacted.some((c, i) => c !== items[i])) set(key, Array.isArray(v) ? compacted : compacted[0]);
  }
  return copy ?? value;
}

// Rules a list of numeric objects may carry for the one-pass check to be equivalent.
const OBJECT_LIST_RULES = new Set(['isArray', 'arrayMaxSize', 'arrayMinSize', 'isObject', 'isDefined']);

function metadatasByKey(type: Ctor): Map<string, ValidationMetadata[]> {
  const byKey = new Map<string, ValidationMetadata[]>();
  for (const m of metadatasOf(type)) byKey.set(m.propertyName, [...(byKey.get(m.propertyName) ?? []), m]);
  return byKey;
}

function isNumberList(metas: ValidationMetadata[]): boolean {
  return (
    metas.every((m) => m.name !== undefined && LIST_RULES.has(m.name)) &&
    metas.some((m) => m.name === 'isNumber' && m.each)
  );
}

function messageOf(m: ValidationMetadata | undefined, fallback: string): string {
  return typeof m?.message === 'string' ? m.message : fallback;
}

function checkNumbers(v: ArrayLike<unknown>, key: string, metas: ValidationMetadata[], where: string) {
  const rule = metas.find((m) => m.name === 'isNumber' && m.each);
  for (let i = 0; i < v.length; i++) {
    const x = v[i];
    if (typeof x !== 'number' || !Number.isFinite(x)) {
      throw new BadRequestException([
        `${messageOf(rule, `every value in ${key} must be a finite number`)} (${where}[${i}])`,
      ]);
    }
  }
}

/** The fields of a DTO whose only rule is "a finite number" (each required), or null if it has other rules. */
function numberFieldsOf(type: Ctor): Map<string, ValidationMetadata> | null {
  const fields = new Map<string, ValidationMetadata>();
  for (const [key, metas] of metadatasByKey(type)) {
    const rule = metas.find((m) => m.name === 'isNumber' && !m.each);
    if (!rule || metas.length !== 1) return null;
    const c = rule.constraints?.[0] as { allowNaN?: boolean; allowInfinity?: boolean } | undefined;
    if (c?.allowNaN || c?.allowInfinity) return null;
    fields.set(key, rule);
  }
  return fields.size ? fields : null;
}

function checkNumberObjects(v: unknown[], key: string, fields: Map<string, ValidationMetadata>, type: Ctor) {
  const names = [...fields.keys()];
  const shape = `{${names.join(', ')}}`;
  for (let i = 0; i < v.length; i++) {
    const item = v[i];
    if (!isPlainObject(item)) throw new BadRequestException([`every entry of ${key} must be ${shape} (${key}[${i}])`]);
    for (const name of names) {
      const x = item[name];
      if (typeof x !== 'number' || !Number.isFinite(x))
        throw new BadRequestException([
          `${key}.${i}.${messageOf(fields.get(name), `${name} must be a finite number`)}`,
        ]);
    }
    // The pipe refuses fields the DTO does not name (forbidNonWhitelisted): so does this check.
    for (const extra in item) {
      if (!fields.has(extra)) throw new BadRequestException([`${key}.${i}.property ${extra} should not exist`]);
    }
  }
  void type;
}

function putAt(target: unknown, path: (string | number)[], values: unknown[] | Float64Array) {
  let at = target as Record<string | number, unknown>;
  for (const step of path.slice(0, -1)) at = at[step] as Record<string | number, unknown>;
  at[path[path.length - 1]] = values;
}
