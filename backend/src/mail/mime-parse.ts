import { simpleParser, type AddressObject, type HeaderValue } from 'mailparser';

/** A message as the development outbox and the tests read it (parsed by mailparser). */
export interface ParsedAttachment {
  filename: string;
  contentType: string;
  content: Buffer;
}

export interface ParsedMail {
  /** Header name in lower case → its value as text (the first, when a header repeats). */
  headers: Record<string, string>;
  subject: string;
  from: string;
  to: string[];
  text: string;
  html: string;
  attachments: ParsedAttachment[];
}

const addresses = (field: AddressObject | AddressObject[] | undefined): string[] =>
  (Array.isArray(field) ? field : field ? [field] : []).flatMap((a) =>
    a.value.map((v) => (v.name ? `${v.name} <${v.address ?? ''}>` : (v.address ?? ''))),
  );

const headerText = (value: HeaderValue): string => {
  if (typeof value === 'string') return value;
  if (value instanceof Date) return value.toISOString();
  if (value && typeof value === 'object' && 'text' in value) return String(value.text);
  if (value && typeof value === 'object' && 'value' in value) return String(value.value);
  return String(value);
};

export async function parseMail(raw: Buffer | string): Promise<ParsedMail> {
  const mail = await simpleParser(raw, { skipImageLinks: true, skipTextToHtml: true, skipTextLinks: true });
  const headers: Record<string, string> = {};
  for (const [name, value] of mail.headers) headers[name] ??= headerText(value);
  return {
    headers,
    subject: mail.subject ?? '',
    from: addresses(mail.from).join(', '),
    to: addresses(mail.to),
    text: mail.text ?? '',
    html: typeof mail.html === 'string' ? mail.html : '',
    attachments: mail.attachments.map((a) => ({
      filename: a.filename ?? 'attachment',
      contentType: a.contentType,
      content: a.content,
    })),
  };
}
