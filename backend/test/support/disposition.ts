import { parse } from 'content-disposition';

/** A Content-Disposition header as type and file name, read by the content-disposition package (RFC 6266). */
export function disposition(header: string | undefined): { type: string; filename: string | undefined } {
  const parsed = parse(header ?? '');
  return { type: parsed.type, filename: parsed.parameters.filename };
}
