import { randomUUID } from 'node:crypto';
import pg from 'pg';
import { hashPassword } from '../../src/auth/password.js';
import type { BenchContext } from './bench-types.js';

/** The bench's own workshop and owner, written as the database's owner, then signed in through the product. */
export async function seedBenchWorkshop(
  productUrl: string,
  bareUrl: string,
  ownerDatabaseUrl: string,
): Promise<BenchContext & { userId: string; userName: string }> {
  const tag = randomUUID().slice(0, 8);
  const email = `bench.${tag}@bench.example.com`;
  const password = `bench password ${tag} ${randomUUID()}`;
  const userName = `Bench owner ${tag}`;
  const client = new pg.Client({ connectionString: ownerDatabaseUrl });
  await client.connect();
  let workshopId: string;
  let userId: string;
  try {
    workshopId = (
      await client.query<{ id: string }>('insert into workshops (name) values ($1) returning id', [
        `Bench workshop ${tag}`,
      ])
    ).rows[0].id;
    userId = (
      await client.query<{ id: string }>(
        `insert into users (workshop_id, email, name, role, password_hash) values ($1, $2, $3, 'owner', $4) returning id`,
        [workshopId, email, userName, await hashPassword(password)],
      )
    ).rows[0].id;
  } finally {
    await client.end();
  }
  const res = await fetch(`${productUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  if (!res.ok) throw new Error(`bench sign-in failed: ${res.status} ${await res.text()}`);
  const cookie = (res.headers.get('set-cookie') ?? '').split(';')[0];
  return { productUrl, bareUrl, ownerDatabaseUrl, cookie, workshopId, userId, userName };
}

/** A call to the product as the bench's owner; throws on anything but 2xx. */
export async function productJson<T>(ctx: BenchContext, method: string, path: string, body?: unknown): Promise<T> {
  const res = await fetch(`${ctx.productUrl}${path}`, {
    method,
    headers: {
      cookie: ctx.cookie,
      accept: 'application/json',
      ...(body === undefined ? {} : { 'content-type': 'application/json' }),
    },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${await res.text()}`);
  return (await res.json()) as T;
}
