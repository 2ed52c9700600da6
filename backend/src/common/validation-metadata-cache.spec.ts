import 'reflect-metadata';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsInt,
  IsNumber,
  IsString,
  Min,
  ValidateNested,
  getMetadataStorage,
  validate,
} from 'class-validator';
import { plainToInstance } from 'class-transformer';
import { cacheValidationMetadata } from './validation-metadata-cache.js';

class Station {
  @IsNumber()
  position!: number;
  @IsNumber()
  reading!: number;
}

class Base {
  @IsString()
  label!: string;
}

class Sweep extends Base {
  @ValidateNested({ each: true })
  @ArrayMaxSize(3)
  @Type(() => Station)
  stations!: Station[];
}

const messages = async (body: unknown) =>
  (await validate(plainToInstance(Sweep, body) as object)).flatMap(function flat(e): string[] {
    return [...Object.values(e.constraints ?? {}), ...(e.children ?? []).flatMap(flat)];
  });

const BAD = {
  label: 7,
  stations: [
    { position: 0, reading: 'x' },
    { position: 'y', reading: 1 },
  ],
};
const GOOD = { label: 'X1', stations: [{ position: 0, reading: 0.01 }] };

describe('validation rules kept per class', () => {
  it('validates exactly as before, with inherited and nested rules, once the rules are kept', async () => {
    const before = { bad: await messages(BAD), good: await messages(GOOD) };
    expect(before.bad).toEqual(
      expect.arrayContaining([
        'label must be a string',
        'reading must be a number conforming to the specified constraints',
      ]),
    );
    expect(before.good).toEqual([]);
    cacheValidationMetadata();
    cacheValidationMetadata(); // a second install changes nothing
    expect({ bad: await messages(BAD), good: await messages(GOOD) }).toEqual(before);
  });

  it('answers a class’s rules from what it kept, and looks again once a rule is added', async () => {
    cacheValidationMetadata();
    const storage = getMetadataStorage();
    const first = storage.getTargetValidationMetadatas(Sweep, '', true, false);
    expect(storage.getTargetValidationMetadatas(Sweep, '', true, false)).toBe(first);
    // Rules of the parent class are part of the answer.
    expect(first.map((m) => m.propertyName)).toEqual(expect.arrayContaining(['label', 'stations']));

    // A class declared later (its decorators add rules) is validated by its own rules.
    class Later {
      @IsInt()
      @Min(1)
      count!: number;
    }
    const after = storage.getTargetValidationMetadatas(Sweep, '', true, false);
    expect(after).not.toBe(first);
    expect(after).toEqual(first);
    const errors = await validate(plainToInstance(Later, { count: 0 }));
    expect(errors.map((e) => Object.keys(e.constraints ?? {}))).toEqual([['min']]);
  });
});
