import type { CapturedMail } from './fake-smtp.server.js';

export interface OutboxMessage {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  attachments: { index: number; filename: string; contentType: string; sizeBytes: number }[];
}

export const toOutboxMessage = (m: CapturedMail): OutboxMessage => ({
  id: m.id,
  receivedAt: m.receivedAt.toISOString(),
  from: m.from,
  to: m.envelopeTo,
  subject: m.subject,
  text: m.text,
  attachments: m.attachments.map((a, index) => ({ index, filename: a.filename, contentType: a.contentType, sizeBytes: a.content.length })),
});
