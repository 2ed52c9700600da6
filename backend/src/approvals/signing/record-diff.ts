/** One place where the signed record and the live one differ. */
export interface RecordDifference {
  /** JSON path in the signed record, e.g. records["rail-sweep:…"].row.readingsRaw[2]. */
  path: string;
  /** The record it is in, when it is in one of the records the approval stands on. */
  record: { kind: string; id: string } | null;
  /** changed; added (absent when signed); removed (absent now). */
  change: 'changed' | 'added' | 'removed';
  /** Value when signed (null when absent then). */
  signed: unknown;
  /** Value now (null when absent now). */
  current: unknown;
}

const IDENTIFIER = /^[A-Za-z_$][\w$]*$/;
const member = (path: string, key: string) =>
  IDENTIFIER.test(key) ? `${path}.${key}` : `${path}[${JSON.stringify(key)}]`;

const isObject = (v: unknown): v is Record<string, unknown> => !!v && typeof v === 'object' && !Array.isArray(v);

/** Every leaf where two JSON values differ, in a stable order (keys sorted, arrays by index). */
export function diffJson(
  signed: unknown,
  current: unknown,
  path = '$',
): { path: string; signed: unknown; current: unknown }[] {
  if (Array.isArray(signed) && Array.isArray(current)) {
    const out: { path: string; signed: unknown; current: unknown }[] = [];
    for (let i = 0; i < Math.max(signed.length, current.length); i++)
      out.push(...diffJson(signed[i], current[i], `${path}[${i}]`));
    return out;
  }
  if (isObject(signed) && isObject(current)) {
    const keys = [...new Set([...Object.keys(signed), ...Object.keys(current)])].sort();
    return keys.flatMap((k) => diffJson(signed[k], current[k], member(path, k)));
  }
  if (signed === current) return [];
  return [{ path, signed, current }];
}

/** Differences between two canonical signed records, each named by its path and the record it is in. */
export function recordDifferences(signedText: string, currentText: string): RecordDifference[] {
  const signed = JSON.parse(signedText) as { records?: Record<string, { kind: string; id: string }> };
  const current = JSON.parse(currentText) as typeof signed;
  return diffJson(signed, current).map((d) => {
    const inRecord = /^\$\.records\["([^"]+)"\]/.exec(d.path);
    const entry = inRecord ? (signed.records?.[inRecord[1]] ?? current.records?.[inRecord[1]]) : undefined;
    const change = d.signed === undefined ? 'added' : d.current === undefined ? 'removed' : 'changed';
    return {
      path: d.path.replace(/^\$\.?/, ''),
      record: entry ? { kind: entry.kind, id: entry.id } : null,
      change,
      signed: d.signed ?? null,
      current: d.current ?? null,
    };
  });
}
