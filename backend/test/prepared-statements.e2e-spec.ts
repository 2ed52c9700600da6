import pg from 'pg';
import { prepareRepeatedStatements } from '../src/database/prepared-statements.js';

/**
 * Statements with parameters are prepared once per connection and reused; statements without
 * keep the simple protocol (several in one text); past a connection's limit, new texts run
 * unprepared. What PostgreSQL holds prepared is read from its own view, pg_prepared_statements.
 */
describe('prepared statements', () => {
  const clients: pg.Client[] = [];
  const connect = async (most?: number) => {
    const client = new pg.Client({ connectionString: process.env.DATABASE_URL });
    await client.connect();
    prepareRepeatedStatements(client, most);
    clients.push(client);
    return client;
  };
  const preparedOn = async (client: pg.Client) =>
    (
      await client.query<{ statement: string }>('select statement from pg_prepared_statements order by prepare_time')
    ).rows.map((r) => r.statement);
  afterAll(() => Promise.all(clients.map((c) => c.end())));

  it('prepares a statement with parameters once and answers every run from it', async () => {
    const client = await connect();
    const text = 'select $1::int * 2 as twice, $2::text as word';
    const answers = [];
    for (const n of [1, 2, 3]) answers.push((await client.query(text, [n, `w${n}`])).rows[0]);
    expect(answers).toEqual([
      { twice: 2, word: 'w1' },
      { twice: 4, word: 'w2' },
      { twice: 6, word: 'w3' },
    ]);
    // The same text as a query config (as the ORM sends it) uses the same prepared statement.
    expect((await client.query({ text, values: [5, 'five'] })).rows[0]).toEqual({ twice: 10, word: 'five' });
    expect(await preparedOn(client)).toEqual([text]);
  });

  it('leaves statements without parameters on the simple protocol: several in one text still run', async () => {
    const client = await connect();
    const results = (await client.query(
      "begin; select set_config('railwright.probe', 'x', true) as set; commit",
    )) as unknown as pg.QueryResult[];
    expect(results[1].rows).toEqual([{ set: 'x' }]);
    expect(await preparedOn(client)).toEqual([]);
  });

  it('past the limit of a connection a new text runs unprepared, and the ones prepared stay in use', async () => {
    const client = await connect(1);
    const first = 'select $1::int + 1 as n';
    const second = 'select $1::int + 2 as n';
    expect((await client.query(first, [1])).rows[0].n).toBe(2);
    expect((await client.query(second, [1])).rows[0].n).toBe(3);
    expect((await client.query(second, [2])).rows[0].n).toBe(4);
    expect((await client.query(first, [2])).rows[0].n).toBe(3);
    expect(await preparedOn(client)).toEqual([first]);
  });

  it('a statement refused by the database is not left half-prepared: the fixed call answers', async () => {
    const client = await connect();
    await expect(client.query('select $1::int / 0 as n', [1])).rejects.toThrow(/division by zero/);
    expect((await client.query('select $1::int / 1 as n', [7])).rows[0].n).toBe(7);
  });
});
