import { ValidateIf } from 'class-validator';

/**
 * An optional DTO field: absent (undefined) skips its rules, but null is checked like any other
 * value and so refused with the field's own message — unlike class-validator's IsOptional, which
 * lets null through to the service. Fields where null means "clear" add
 * `@ValidateIf((_, v) => v !== null)` beside it.
 */
export const Optional = () => ValidateIf((_: object, value: unknown) => value !== undefined);
