import { DrizzleQueryError } from 'drizzle-orm/errors';
import { loggable } from './database-error.filter.js';

describe('what a failed query leaves in the log', () => {
  it('keeps the query and the database message, never the parameters', () => {
    const hash = 'scrypt$32768$8$1$c2VjcmV0c2FsdA==$c2VjcmV0aGFzaA==';
    const cause = Object.assign(new Error('duplicate key value violates unique constraint "users_email_unique"'), {
      code: '23505',
    });
    const err = new DrizzleQueryError(
      'insert into "users" ("email", "password_hash") values ($1, $2)',
      ['a@example.com', hash],
      cause,
    );
    const line = loggable(err);
    expect(line).toContain('insert into "users"');
    expect(line).toContain('23505 duplicate key value');
    expect(line).not.toContain(hash);
    expect(line).not.toContain('a@example.com');
  });

  it('logs other errors with their stack', () => {
    expect(loggable(new Error('boom'))).toMatch(/^Error: boom\n\s+at /);
  });
});
