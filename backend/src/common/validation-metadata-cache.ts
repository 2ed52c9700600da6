import { getMetadataStorage } from 'class-validator';
import type { ValidationMetadata } from 'class-validator/types/metadata/ValidationMetadata.js';

type Storage = ReturnType<typeof getMetadataStorage> & {
  getTargetValidationMetadatas(
    target: unknown,
    targetSchema: string,
    always: boolean,
    strictGroups: boolean,
    groups?: string[],
  ): ValidationMetadata[];
  groupByPropertyName(metadata: ValidationMetadata[]): Record<string, ValidationMetadata[]>;
  addValidationMetadata(metadata: ValidationMetadata): void;
  addConstraintMetadata(metadata: unknown): void;
};

const installed = Symbol('railwright.validationMetadataCache');

/**
 * class-validator looks up a class's rules afresh for every object it validates: it filters the
 * class's rules and then walks every validated class of the application for parents. A sweep's
 * body is a dozen objects (each station is one), so that lookup cost more than the checks. Rules
 * are only added while classes are declared, so the answers are kept per class and options, and
 * forgotten whenever a rule is added.
 */
export function cacheValidationMetadata(): void {
  const storage = getMetadataStorage() as Storage & { [installed]?: true };
  if (storage[installed]) return;
  storage[installed] = true;
  const lookUp = storage.getTargetValidationMetadatas.bind(storage);
  const group = storage.groupByPropertyName.bind(storage);
  let kept = new Map<unknown, Map<string, ValidationMetadata[]>>();
  let grouped = new WeakMap<ValidationMetadata[], Record<string, ValidationMetadata[]>>();
  const forget = () => {
    kept = new Map();
    grouped = new WeakMap();
  };
  storage.getTargetValidationMetadatas = (target, targetSchema, always, strictGroups, groups) => {
    const key = `${targetSchema}\u0000${always}\u0000${strictGroups}\u0000${groups?.join('\u0001') ?? ''}`;
    let byOptions = kept.get(target);
    if (!byOptions) kept.set(target, (byOptions = new Map()));
    let found = byOptions.get(key);
    if (!found)
      byOptions.set(
        key,
        (found = Object.freeze(lookUp(target, targetSchema, always, strictGroups, groups)) as ValidationMetadata[]),
      );
    return found;
  };
  storage.groupByPropertyName = (metadata) => {
    if (!Object.isFrozen(metadata)) return group(metadata);
    let found = grouped.get(metadata);
    if (!found) grouped.set(metadata, (found = group(metadata)));
    return found;
  };
  for (const name of ['addValidationMetadata', 'addConstraintMetadata'] as const) {
    const add = (storage[name] as (m: unknown) => void).bind(storage);
    (storage as unknown as Record<string, (m: unknown) => void>)[name] = (metadata) => {
      forget();
      add(metadata);
    };
  }
}
