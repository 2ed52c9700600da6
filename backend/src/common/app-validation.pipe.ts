import { BadRequestException, ValidationPipe, type ArgumentMetadata, type ValidationPipeOptions } from '@nestjs/common';
import { getMetadataStorage } from 'class-validator';
import type { ValidationMetadata } from 'class-validator/types/metadata/ValidationMetadata.js';
import { defaultMetadataStorage } from 'class-transformer/cjs/storage.js';

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
  }

  override async transform(value: unknown, metadata: ArgumentMetadata): Promise<unknown> {
    const type = metadata.metatype as Ctor | undefined;
    if (!type || !isPlainObject(value) || !isDto(type)) return super.transform(value, metadata);
    const tooLong = arrayCapBreach(value, type, '', 0);
    if (tooLong) throw new BadRequestException([tooLong]);
    const lists = numberListsOf(value, type);
    if (!lists.length) return super.transform(value, metadata);
    const sampled = { ...value };
    for (const { key } of lists) sampled[key] = (value[key] as unknown[]).slice(0, SAMPLE);
    const dto = (await super.transform(sampled, metadata)) as Record<string, unknown>;
    for (const { key } of lists) dto[key] = value[key];
    // A long computation follows: let requests that arrived meanwhile (health checks, page loads) go first.
    await new Promise((resolve) => setImmediate(resolve));
    return dto;
  }
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
    if (Array.isArray(v) && v.length > max) {
      const msg = typeof m.message === 'string' ? m.message : `${prefix}${m.propertyName} must hold at most ${max} entries`;
      return msg;
    }
  }
  const keys = new Set(metas.filter((m) => m.name === undefined && m.type === 'nestedValidation').map((m) => m.propertyName));
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

/** Top-level lists longer than the sample whose rules are only "array of numbers, size bounds". */
function numberListsOf(value: Record<string, unknown>, type: Ctor): { key: string }[] {
  const byKey = new Map<string, ValidationMetadata[]>();
  for (const m of metadatasOf(type)) byKey.set(m.propertyName, [...(byKey.get(m.propertyName) ?? []), m]);
  const lists: { key: string }[] = [];
  for (const [key, metas] of byKey) {
    const v = value[key];
    if (!Array.isArray(v) || v.length <= SAMPLE) continue;
    if (!metas.every((m) => m.name !== undefined && LIST_RULES.has(m.name))) continue;
    const numberRule = metas.find((m) => m.name === 'isNumber' && m.each);
    if (!numberRule) continue;
    for (let i = 0; i < v.length; i++) {
      const x = v[i];
      if (typeof x !== 'number' || !Number.isFinite(x)) {
        const msg = typeof numberRule.message === 'string' ? numberRule.message : `every value in ${key} must be a finite number`;
        throw new BadRequestException([`${msg} (${key}[${i}])`]);
      }
    }
    lists.push({ key });
  }
  return lists;
}
