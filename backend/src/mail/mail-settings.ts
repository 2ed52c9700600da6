/** How mail leaves the server, read once from the environment (documented in README). */
export interface MailSettings {
  /** 'smtp' with SMTP_HOST; 'fake' in development and tests; 'off' in production without SMTP_HOST. */
  mode: 'smtp' | 'fake' | 'off';
  host: string | null;
  port: number;
  secure: boolean;
  user: string | null;
  password: string | null;
  from: string;
}

export function mailSettings(env: NodeJS.ProcessEnv = process.env): MailSettings {
  const host = env.SMTP_HOST?.trim() || null;
  const rawPort = env.SMTP_PORT?.trim();
  const port = rawPort ? Number(rawPort) : host ? 587 : 0;
  if (!Number.isInteger(port) || port < 0 || port > 65535)
    throw new Error('Configuration: SMTP_PORT must be a whole number from 0 to 65535');
  const mode = host ? 'smtp' : env.NODE_ENV === 'production' ? 'off' : 'fake';
  return {
    mode,
    host,
    port,
    secure: env.SMTP_SECURE === 'true',
    user: env.SMTP_USER || null,
    password: env.SMTP_PASSWORD || null,
    from: env.MAIL_FROM || 'Railwright <railwright@localhost>',
  };
}
