export interface OutboxMessage {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  attachments: { index: number; filename: string; contentType: string; sizeBytes: number }[];
}

export const mailKeys = { outbox: ['mail', 'outbox'] as const };

export const attachmentUrl = (messageId: string, index: number) => `/api/dev/outbox/${messageId}/attachments/${index}`;
