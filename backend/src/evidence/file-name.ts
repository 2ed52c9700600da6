import { create } from 'content-disposition';
const MAX_NAME_CHARS = 120;

// C0/C1 control characters and the bidirectional overrides that can disguise an extension
// (control characters are what it looks for, so the lint rule against them is off here).
// eslint-disable-next-line no-control-regex
const UNSAFE_CHARS = /[\u0000-\u001f\u007f-\u009f\u200e\u200f\u202a-\u202e\u2066-\u2069]/g;

/**
 * A file name safe to store and to send back in content-disposition: no folder parts, no
 * control characters, no leading dots, at most 120 characters with the extension kept.
 */
export function sanitizeFileName(raw: string | undefined | null, fallback = 'file'): string {
  let name = (raw ?? '').normalize('NFC');
  name = name.split(/[\\/]/).pop() ?? '';
  name = name
    .replace(/[\t\n\r\v\f]/g, ' ')
    .replace(UNSAFE_CHARS, '')
    .replace(/\s+/g, ' ')
    .trim();
  name = name.replace(/^[.\s]+/, '').replace(/[.\s]+$/, '');
  if (!name) name = fallback;
  const chars = [...name];
  if (chars.length > MAX_NAME_CHARS) {
    const dot = name.lastIndexOf('.');
    const ext = dot > 0 && name.length - dot <= 10 ? name.slice(dot) : '';
    name =
      chars
        .slice(0, MAX_NAME_CHARS - [...ext].length)
        .join('')
        .trimEnd() + ext;
  }
  return name;
}

/** The name with the extension its contents call for, when it has none of the right ones. */
export function withExtension(name: string, extensions: readonly string[]): string {
  const lower = name.toLowerCase();
  if (extensions.some((ext) => lower.endsWith(ext))) return name;
  return sanitizeFileName(name + extensions[0]);
}

/** content-disposition with an ASCII fallback and the exact name for browsers that read RFC 5987/8187. */
export function contentDisposition(type: 'inline' | 'attachment', name: string): string {
  return create(name, { type });
}
