/** A decimal number as digits and a power of ten: value = digits × 10^-scale. */
interface Decimal {
  digits: bigint;
  scale: number;
}

function parseDecimal(text: string): Decimal {
  const m = /^(-?)(\d+)(?:\.(\d+))?(?:e([+-]?\d+))?$/i.exec(text);
  if (!m) throw new Error(`not a decimal number: ${text}`);
  const [, sign, whole, fraction = '', exponent = '0'] = m;
  const digits = BigInt(`${sign}${whole}${fraction}`);
  const scale = fraction.length - Number(exponent);
  return scale >= 0 ? { digits, scale } : { digits: digits * 10n ** BigInt(-scale), scale: 0 };
}

/**
 * value × factor rounded to `places` decimals, half away from zero, in exact decimal arithmetic:
 * what PostgreSQL gives for round(value::numeric * factor, places)::float8, where value::numeric
 * is the shortest text of the double (as JSON and jsonb store it).
 */
export function decimalTimes(value: number, factor: string, places: number): number {
  const a = parseDecimal(String(value));
  const b = parseDecimal(factor);
  let digits = a.digits * b.digits;
  const scale = a.scale + b.scale;
  if (scale > places) {
    const divisor = 10n ** BigInt(scale - places);
    const negative = digits < 0n;
    const magnitude = negative ? -digits : digits;
    let q = magnitude / divisor;
    if ((magnitude % divisor) * 2n >= divisor) q += 1n;
    digits = negative ? -q : q;
    return Number(`${digits}e-${places}`);
  }
  return Number(`${digits}e-${scale}`);
}
