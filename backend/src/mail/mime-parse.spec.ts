import nodemailer from 'nodemailer';
import { decodeWords, parseMail } from './mime-parse.js';

describe('decodeWords (RFC 2047)', () => {
  // RFC 2047 section 8 examples: the whitespace between adjacent encoded words is dropped.
  it.each([
    ['(=?ISO-8859-1?Q?a?=)', '(a)'],
    ['(=?ISO-8859-1?Q?a?= b)', '(a b)'],
    ['(=?ISO-8859-1?Q?a?= =?ISO-8859-1?Q?b?=)', '(ab)'],
    ['(=?ISO-8859-1?Q?a?=\r\n    =?ISO-8859-1?Q?b?=)', '(ab)'],
    ['(=?ISO-8859-1?Q?a_b?=)', '(a b)'],
    ['=?ISO-8859-1?Q?Andr=E9?= Pirard', 'André Pirard'],
  ])('%j → %j', (encoded, decoded) => {
    expect(decodeWords(encoded)).toBe(decoded);
  });

  it('joins a UTF-8 character split across two base64 words', () => {
    // "≤" is E2 89 A4: first word carries E2 89, the second A4.
    const a = Buffer.from([0x61, 0xe2, 0x89]).toString('base64');
    const b = Buffer.from([0xa4, 0x62]).toString('base64');
    expect(decodeWords(`=?UTF-8?B?${a}?= =?UTF-8?B?${b}?=`)).toBe('a≤b');
  });
});

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
    const mail = parseMail(info.message as Buffer);
    expect(mail.subject).toBe('Re-check due: Small router — straightness ≤ 20 µm over a long subject line that folds');
    expect(mail.to).toEqual(['Ödön Vár <o@example.com>', 'b@example.com']);
    expect(mail.text.trim()).toBe('Line one ±0.1 mm\nLine two');
    expect(mail.attachments).toHaveLength(1);
    expect(mail.attachments[0].filename).toBe('certificate.pdf');
    expect(Buffer.compare(mail.attachments[0].content, pdf)).toBe(0);
  });
});
