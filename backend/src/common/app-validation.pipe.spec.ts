import 'reflect-metadata';
import { BadRequestException } from '@nestjs/common';
import { IsString } from 'class-validator';
import { AppValidationPipe } from './app-validation.pipe.js';
import { controlCharacterIn } from './request-guards.js';
import { StraightnessDto } from '../calculators/dto/straightness.dto.js';
import { NumberList } from '../calculators/dto/validators.js';
import { markPackedBody, packNumberArrays } from '../engine-worker/number-arrays.js';
import { MAX_POINTS } from '../engine/validate.js';

/** A DTO with a long number list that does not take it packed, and a list of words. */
class ListsDto {
  @NumberList('values')
  values!: number[];

  @IsString({ each: true })
  words!: string[];
}

const pipe = new AppValidationPipe({ whitelist: true, forbidNonWhitelisted: true, transform: true });
const run = (dto: object, body: unknown) => pipe.transform(body, { type: 'body', metatype: dto as never });

/** A body as the worker thread answers it: long number lists as Float64Arrays, marked. */
const packed = <T>(body: T) => markPackedBody(packNumberArrays(body) as T);

const N = 5_000;
const positions = Array.from({ length: N }, (_, i) => i * 0.5);
const readings = Array.from({ length: N }, (_, i) => Math.sin(i / 40) * 0.02);

async function messagesOf(work: Promise<unknown>): Promise<string[]> {
  try {
    await work;
  } catch (err) {
    if (err instanceof BadRequestException)
      return ([] as string[]).concat((err.getResponse() as { message: string[] }).message);
    throw err;
  }
  throw new Error('the body was accepted');
}

describe('the validation pipe and a large body parsed in the worker thread', () => {
  it('hands a calculation its long lists as they came, checked, equal to the plain body’s', async () => {
    const body = packed({ positions, readings });
    const dto = (await run(StraightnessDto, body)) as StraightnessDto;
    expect(dto).toBeInstanceOf(StraightnessDto);
    expect(dto.positions).toBe((body as unknown as StraightnessDto).positions);
    expect(dto.positions).toBeInstanceOf(Float64Array);
    const plain = (await run(StraightnessDto, { positions, readings })) as StraightnessDto;
    expect(Array.from(dto.positions)).toEqual(plain.positions);
    expect(Array.from(dto.readings)).toEqual(plain.readings);
  });

  it('refuses a number that is not finite in a packed list, naming where it is, as for a plain list', async () => {
    const bad = readings.slice();
    bad[4321] = Infinity; // JSON's 1e999 parses to Infinity
    const fromPacked = await messagesOf(run(StraightnessDto, packed({ positions, readings: bad })));
    const fromPlain = await messagesOf(run(StraightnessDto, { positions, readings: bad }));
    expect(fromPacked).toEqual(['every value in readings must be a finite number (readings[4321])']);
    expect(fromPacked).toEqual(fromPlain);
  });

  it('refuses a packed list longer than allowed before any other work', async () => {
    const long = new Float64Array(MAX_POINTS + 1);
    const messages = await messagesOf(run(StraightnessDto, markPackedBody({ positions: long, readings: long })));
    expect(messages).toEqual([`positions has more than ${MAX_POINTS} values; at most ${MAX_POINTS} are accepted`]);
  });

  it('gives a DTO that does not take packed lists plain ones, and judges a packed list in the wrong place as a plain one', async () => {
    const values = Array.from({ length: N }, (_, i) => i / 7);
    const dto = (await run(ListsDto, packed({ values, words: ['a'] }))) as ListsDto;
    expect(Array.isArray(dto.values)).toBe(true);
    expect(dto.values).toEqual(values);
    const wrong = await messagesOf(run(ListsDto, packed({ values, words: values })));
    const wrongPlain = await messagesOf(run(ListsDto, { values, words: values }));
    expect(wrong).toEqual(wrongPlain);
    expect(wrong).toEqual(['each value in words must be a string']);
  });

  it('leaves a body that is not marked as it is: a Float64Array sent some other way is not a list', async () => {
    const messages = await messagesOf(run(ListsDto, { values: new Float64Array(3), words: [] }));
    expect(messages).toContain('values must be a list of numbers');
  });

  it('finds no control character in a packed list (numbers hold no text), and still finds one beside it', () => {
    const body = packed({ positions, notes: 'fine' });
    expect(controlCharacterIn(body, '')).toBeNull();
    expect(controlCharacterIn({ ...body, notes: 'bell\u0007' }, '')).toBe('notes');
  });
});
