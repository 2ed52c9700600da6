import { parseNumberCell } from './tabular-input';

/**
 * A number as typed in a form field ("1,5" reads as 1.5, "−2" as -2); NaN when the field is
 * empty or does not hold a number, so a range check in a form schema fails on it.
 */
export function typedNumber(text: string): number {
  const parsed = parseNumberCell(text);
  return parsed.ok && parsed.value !== null ? parsed.value : NaN;
}

/** A number as typed, or null when the field was left empty (an optional field). */
export function typedOptionalNumber(text: string): number | null {
  return text.trim() === '' ? null : typedNumber(text);
}
