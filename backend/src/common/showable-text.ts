import { ValidateBy, type ValidationOptions } from 'class-validator';
import { hasUnshowableCharacter } from './request-guards.js';

/**
 * For text that does not arrive as a JSON body (multipart fields), which the request-wide check
 * in request-guards.ts cannot see: no control characters, no broken characters.
 */
export const ShowableText = (field: string, options: ValidationOptions & { multiLine?: boolean } = {}) =>
  ValidateBy(
    {
      name: 'showableText',
      validator: {
        validate: (value: unknown) => typeof value !== 'string' || !hasUnshowableCharacter(value, options.multiLine),
      },
    },
    { message: `${field} must not contain control characters (such as NUL) or broken characters`, ...options },
  );
