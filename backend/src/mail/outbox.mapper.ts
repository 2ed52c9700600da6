import type { CapturedMail } from './fake-smtp.server.js';

export interface OutboxMessage {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  /** The message held a set-your-password link, which only its recipient may see. */
  linkHidden: boolean;
  attachments: {
    /** The attachment's place in the message, index from 0. */
    index: number;
    filename: string;
    contentType: string;
    sizeBytes: number;
  }[];
}

// A set-your-password link, wherever it sits in the text (any host, any token).
const PASSWORD_LINK = /\S*\/set-password\?token=\S*/g;

/**
 * The outbox is read by admins: a password link in someone else's mail would let them choose
 * that person's password and sign as them, so it is cut out before the message leaves the server.
 */
export function toOutboxMessage(m: CapturedMail): OutboxMessage {
  const linkHidden = PASSWORD_LINK.test(m.text);
  PASSWORD_LINK.lastIndex = 0;
  return {
    id: m.id,
    receivedAt: m.receivedAt.toISOString(),
    from: m.from,
    to: m.envelopeTo,
    subject: m.subject,
    text: linkHidden
      ? m.text.replace(PASSWORD_LINK, `[link hidden: only ${m.envelopeTo.join(', ')} can open it]`)
      : m.text,
    linkHidden,
    attachments: m.attachments.map((a, index) => ({
      index,
      filename: a.filename,
      contentType: a.contentType,
      sizeBytes: a.content.length,
    })),
  };
}
