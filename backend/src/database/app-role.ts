import type pg from 'pg';

// History is append-only for the application: it may add rows, never change or remove them.
const APPEND_ONLY = ['audit_entries', 'change_log'];

const ident = (name: string) => `"${name.replace(/"/g, '""')}"`;
const literal = (value: string) => `'${value.replace(/'/g, "''")}'`;

/**
 * When the application connects as a role of its own (a different user in DATABASE_URL than the
 * owner's), that role exists with its password, is no superuser, may read and write the records,
 * and may not update, delete or truncate the history.
 */
export async function ensureAppRole(owner: pg.ClientBase, appUrl: string, ownerUrl: string): Promise<void> {
  const app = new URL(appUrl);
  const user = decodeURIComponent(app.username);
  if (!user || user === decodeURIComponent(new URL(ownerUrl).username)) return;
  const password = decodeURIComponent(app.password);
  const { rows } = await owner.query('select 1 from pg_roles where rolname = $1', [user]);
  const options = `LOGIN NOSUPERUSER NOCREATEDB NOCREATEROLE NOREPLICATION NOBYPASSRLS${password ? ` PASSWORD ${literal(password)}` : ''}`;
  await owner.query(`${rows.length ? 'ALTER' : 'CREATE'} ROLE ${ident(user)} WITH ${options}`);
  const { rows: db } = await owner.query<{ name: string }>('select current_database() as name');
  await owner.query(`GRANT CONNECT ON DATABASE ${ident(db[0].name)} TO ${ident(user)}`);
  await owner.query(`GRANT USAGE ON SCHEMA public TO ${ident(user)}`);
  await owner.query(`GRANT SELECT, INSERT, UPDATE, DELETE ON ALL TABLES IN SCHEMA public TO ${ident(user)}`);
  await owner.query(`GRANT USAGE, SELECT ON ALL SEQUENCES IN SCHEMA public TO ${ident(user)}`);
  await owner.query(`REVOKE UPDATE, DELETE, TRUNCATE ON ${APPEND_ONLY.join(', ')} FROM ${ident(user)}`);
}
