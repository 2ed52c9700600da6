export interface OutboxMessage {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  /** A set-your-password link was cut out: only its recipient may see it. */
  linkHidden: boolean;
  attachments: { index: number; filename: string; contentType: string; sizeBytes: number }[];
}

export const mailKeys = { outbox: ['mail', 'outbox'] as const };

export const attachmentUrl = (messageId: string, index: number) => `/api/dev/outbox/${messageId}/attachments/${index}`;
