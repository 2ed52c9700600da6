/**
 * Just enough MIME reading for the development outbox and the tests: headers (folded, RFC 2047
 * encoded words), nested multiparts, base64 / quoted-printable / 7bit bodies, attachments.
 * Real mail clients read the real thing; this only reads what our own sender writes.
 */
export interface ParsedAttachment {
  filename: string;
  contentType: string;
  content: Buffer;
}

export interface ParsedMail {
  headers: Record<string, string>;
  subject: string;
  from: string;
  to: string[];
  text: string;
  html: string;
  attachments: ParsedAttachment[];
}

export function parseMail(raw: Buffer | string): ParsedMail {
  const out: ParsedMail = { headers: {}, subject: '', from: '', to: [], text: '', html: '', attachments: [] };
  const { headers, body } = splitPart(typeof raw === 'string' ? raw : raw.toString('latin1'));
  out.headers = headers;
  out.subject = decodeWords(headers['subject'] ?? '');
  out.from = decodeWords(headers['from'] ?? '');
  out.to = (headers['to'] ?? '').split(',').map((s) => decodeWords(s.trim())).filter(Boolean);
  walk(headers, body, out);
  return out;
}

function walk(headers: Record<string, string>, body: string, out: ParsedMail): void {
  const type = headers['content-type'] ?? 'text/plain';
  const mediaType = type.split(';')[0].trim().toLowerCase();
  if (mediaType.startsWith('multipart/')) {
    const boundary = param(type, 'boundary');
    if (!boundary) return;
    for (const chunk of body.split(`--${boundary}`).slice(1)) {
      if (chunk.startsWith('--')) break;
      const part = splitPart(chunk.replace(/^\r?\n/, ''));
      walk(part.headers, part.body, out);
    }
    return;
  }
  const content = decodeBody(body, headers['content-transfer-encoding']);
  const disposition = headers['content-disposition'] ?? '';
  const filename = param(disposition, 'filename') ?? param(type, 'name');
  if (/^attachment/i.test(disposition) || (filename && !mediaType.startsWith('text/'))) {
    out.attachments.push({ filename: decodeWords(filename ?? 'attachment'), contentType: mediaType, content });
  } else if (mediaType === 'text/html') out.html += content.toString('utf8');
  else if (mediaType === 'text/plain') out.text += content.toString('utf8');
}

function splitPart(text: string): { headers: Record<string, string>; body: string } {
  const match = /\r?\n\r?\n/.exec(text);
  const head = match ? text.slice(0, match.index) : text;
  const body = match ? text.slice(match.index + match[0].length) : '';
  const headers: Record<string, string> = {};
  for (const line of head.replace(/\r?\n[ \t]+/g, ' ').split(/\r?\n/)) {
    const colon = line.indexOf(':');
    if (colon > 0) headers[line.slice(0, colon).trim().toLowerCase()] = line.slice(colon + 1).trim();
  }
  return { headers, body: body.replace(/\r?\n$/, '') };
}

function param(header: string, name: string): string | null {
  const m = new RegExp(`${name}\\*?=("([^"]*)"|[^;\\s]+)`, 'i').exec(header);
  return m ? (m[2] ?? m[1]) : null;
}

function decodeBody(body: string, encoding = '7bit'): Buffer {
  const enc = encoding.toLowerCase();
  if (enc === 'base64') return Buffer.from(body.replace(/\s+/g, ''), 'base64');
  if (enc === 'quoted-printable') return decodeQuotedPrintable(body);
  return Buffer.from(body, 'latin1');
}

function decodeQuotedPrintable(text: string): Buffer {
  const soft = text.replace(/=\r?\n/g, '');
  const bytes: number[] = [];
  for (let i = 0; i < soft.length; i++) {
    if (soft[i] === '=' && /^[0-9A-F]{2}$/i.test(soft.slice(i + 1, i + 3))) {
      bytes.push(parseInt(soft.slice(i + 1, i + 3), 16));
      i += 2;
    } else bytes.push(soft.charCodeAt(i) & 0xff);
  }
  return Buffer.from(bytes);
}

/** RFC 2047: adjacent encoded words are joined byte-wise, so a character split across two survives. */
export function decodeWords(header: string): string {
  const WORD = /=\?([^?]+)\?([BQbq])\?([^?]*)\?=/g;
  if (!/=\?[^?]+\?[BQbq]\?[^?]*\?=/.test(header)) return header;
  // Whitespace between two encoded words is not part of the text.
  const joined = header.replace(/\?=\s+=\?/g, '?==?');
  let result = '';
  let last = 0;
  let pending: { charset: string; bytes: Buffer[] } | null = null;
  const flush = () => {
    if (pending) result += decodeCharset(Buffer.concat(pending.bytes), pending.charset);
    pending = null;
  };
  for (const m of joined.matchAll(WORD)) {
    if (m.index! > last) {
      flush();
      result += joined.slice(last, m.index);
    }
    const charset = m[1].toLowerCase().split('*')[0];
    const data = m[2].toUpperCase() === 'B' ? Buffer.from(m[3], 'base64') : decodeQuotedPrintable(m[3].replace(/_/g, ' '));
    if (pending && pending.charset !== charset) flush();
    pending ??= { charset, bytes: [] };
    pending.bytes.push(data);
    last = m.index! + m[0].length;
  }
  flush();
  return result + joined.slice(last);
}

function decodeCharset(bytes: Buffer, charset: string): string {
  return charset === 'iso-8859-1' || charset === 'latin1' || charset === 'us-ascii' ? bytes.toString('latin1') : bytes.toString('utf8');
}
