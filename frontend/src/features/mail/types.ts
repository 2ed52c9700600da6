import type { Schemas } from '../../lib/api/schemas';

/** `linkHidden`: a set-your-password link was cut out; only its recipient may see it. */
export type OutboxMessage = Schemas['OutboxMessage'];

export const mailKeys = { outbox: ['mail', 'outbox'] as const };

export const attachmentUrl = (messageId: string, index: number) => `/api/dev/outbox/${messageId}/attachments/${index}`;
