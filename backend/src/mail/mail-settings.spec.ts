import { NotFoundException } from '@nestjs/common';
import { mailSettings } from './mail-settings.js';
import { OutboxController } from './outbox.controller.js';
import type { MailService } from './mail.service.js';
import type { SessionUser } from '../auth/session-user.js';

describe('mailSettings', () => {
  it('uses the fake server on a free port when SMTP_HOST is not set', () => {
    expect(mailSettings({})).toMatchObject({ mode: 'fake', host: null, port: 0 });
    expect(mailSettings({ SMTP_PORT: '2525' })).toMatchObject({ mode: 'fake', port: 2525 });
  });

  it('uses the named server, port 587 unless told otherwise, with its sign-in', () => {
    expect(mailSettings({ SMTP_HOST: 'mail.example.com' })).toMatchObject({
      mode: 'smtp',
      host: 'mail.example.com',
      port: 587,
      secure: false,
      user: null,
    });
    expect(
      mailSettings({
        SMTP_HOST: 'mail.example.com',
        SMTP_PORT: '465',
        SMTP_SECURE: 'true',
        SMTP_USER: 'u',
        SMTP_PASSWORD: 'p',
        MAIL_FROM: 'Shop <shop@example.com>',
      }),
    ).toMatchObject({
      port: 465,
      secure: true,
      user: 'u',
      password: 'p',
      from: 'Shop <shop@example.com>',
    });
  });

  it('never starts a fake in production: mail is off without SMTP_HOST', () => {
    expect(mailSettings({ NODE_ENV: 'production' }).mode).toBe('off');
  });

  it('stops the boot with a clear message for a bad port', () => {
    expect(() => mailSettings({ SMTP_PORT: 'twenty-five' })).toThrow(/SMTP_PORT must be a whole number/);
    expect(() => mailSettings({ SMTP_PORT: '70000' })).toThrow(/SMTP_PORT/);
  });
});

describe('the outbox without the fake server', () => {
  it('answers 404 with the reason', () => {
    const controller = new OutboxController({ fake: null } as unknown as MailService);
    expect(() => controller.list({ workshopId: 'w' } as SessionUser)).toThrow(NotFoundException);
    expect(() => controller.list({ workshopId: 'w' } as SessionUser)).toThrow(
      /only while the local fake mail server is in use/,
    );
  });
});
