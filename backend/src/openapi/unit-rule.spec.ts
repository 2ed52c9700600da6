import type { OpenAPIObject } from '@nestjs/swagger';
import { numbersWithoutUnit, saysUnit } from './unit-rule.js';

describe('the rule that every number in the API description says its unit', () => {
  it.each([
    'Straightness over the rail, mm.',
    'Readings in the record’s `readingUnit`.',
    'Station positions, in `lengthUnit`.',
    'Latest minus approved, in the `unit` beside it.',
    'Air temperature while the sweep was taken, °C.',
    'Fastest feed within both limits, mm/min.',
    'Screw speed, rpm.',
    'Angle of the first hole from +x, in degrees.',
    'Dwell at each target, seconds.',
    'Expansion coefficient, µm per metre per kelvin.',
    'Size of the file, in bytes.',
    'Count of holes on the circle.',
    'The hole from the rail’s start, index from 0.',
    'Measured over commanded (a ratio; 1 is exact).',
    'Factor of the end mountings (no unit).',
    'Full steps per motor revolution (a count).',
  ])('accepts %j', (text) => {
    expect(saysUnit(text)).toBe(true);
  });

  it.each([
    undefined,
    '',
    // The word "unit" alone names no unit.
    'The unit the axis is set up in.',
    'Unit of the station positions.',
    // "number of" in a sentence does not make the field a count; a count says it is one.
    'Number of holes.',
    'How many stations were read.',
    'Rows of holes.',
    'Where the travel trial starts.',
    'The index of the next hole.',
    // Words that merely contain a unit's letters.
    'The commanded diameter of the circle.',
    'A mmap of the summary.',
    'Accounts of the diagonals.',
  ])('refuses %j', (text) => {
    expect(saysUnit(text)).toBe(false);
  });

  it('finds numbers at every depth: nested objects, arrays of arrays, choices, maps, parameters and inline answers', () => {
    const document = {
      openapi: '3.0.0',
      info: { title: 't', version: '1' },
      components: {
        schemas: {
          Sweep: {
            type: 'object',
            properties: {
              lengthMm: { type: 'number', description: 'Length, mm.' },
              label: { type: 'string' },
              stations: {
                type: 'array',
                items: { type: 'object', properties: { position: { type: 'number', description: 'Where.' } } },
              },
              grid: { type: 'array', items: { type: 'array', items: { type: 'number' } } },
              either: { oneOf: [{ type: 'string' }, { type: 'integer' }], description: 'Number of things.' },
              byKey: { type: 'object', additionalProperties: { type: 'number' } },
            },
          },
        },
      },
      paths: {
        '/api/x': {
          get: {
            parameters: [
              { name: 'limit', in: 'query', schema: { type: 'integer' } },
              { name: 'feed', in: 'query', schema: { type: 'number' }, description: 'Feed, mm/min.' },
            ],
            responses: {
              '200': {
                description: 'Done.',
                content: {
                  'application/json': {
                    schema: { type: 'object', properties: { total: { type: 'integer', description: 'The total.' } } },
                  },
                },
              },
            },
          },
        },
      },
    } as unknown as OpenAPIObject;
    expect(numbersWithoutUnit(document)).toEqual([
      'GET /api/x ?limit',
      'GET /api/x total',
      'Sweep byKey.{key}',
      'Sweep either',
      'Sweep grid',
      'Sweep stations.[].position',
    ]);
  });
});
