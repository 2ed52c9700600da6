import nodemailer from 'nodemailer';
import { parseMail } from './mime-parse.js';

// nodemailer writes the message and mailparser reads it: two independent MIME libraries.
describe('parseMail reads back what nodemailer writes', () => {
  it('subject, recipients, text and an attachment survive the round trip', async () => {
    // nodemailer's own stream transport builds the raw message (an independent MIME writer).
    const t = nodemailer.createTransport({ streamTransport: true, buffer: true, newline: 'unix' });
    const pdf = Buffer.from('%PDF-1.3\n\u00b5 binary \u0000\u00ff', 'latin1');
    const info = await t.sendMail({
      from: 'Railwright <railwright@localhost>',
      to: ['Ödön Vár <o@example.com>', 'b@example.com'],
      subject: 'Re-check due: Small router — straightness ≤ 20 µm over a long subject line that folds',
      text: 'Line one ±0.1 mm\nLine two',
      textEncoding: 'quoted-printable',
      attachments: [{ filename: 'certificate.pdf', content: pdf, contentType: 'application/pdf' }],
    });
    const mail = await parseMail(info.message as Buffer);
    expect(mail.subject).toBe('Re-check due: Small router — straightness ≤ 20 µm over a long subject line that folds');
    expect(mail.to).toEqual(['Ödön Vár <o@example.com>', 'b@example.com']);
    expect(mail.text.trim()).toBe('Line one ±0.1 mm\nLine two');
    expect(mail.attachments).toHaveLength(1);
    expect(mail.attachments[0].filename).toBe('certificate.pdf');
    expect(Buffer.compare(mail.attachments[0].content, pdf)).toBe(0);
  });
});
