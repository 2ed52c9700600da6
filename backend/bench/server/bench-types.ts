/**
 * The shape every server bench scenario shares, so reads, writes, calculations and the page's
 * sizes land in one table with their goals, measured in one run against a bare baseline.
 */
export interface BenchRow {
  /** What was measured, e.g. "GET /api/machines (6 machines)". */
  name: string;
  /** The product's figure (requests per second, ms, KB…). */
  value: number;
  /** The bare Fastify + pg server's figure for the same work, when there is one. */
  baseline?: number;
  unit: string;
  /** product ÷ baseline (or as the goal states it), and the goal in words, e.g. "≥ 0.5 of bare". */
  ratio?: number;
  goal?: string;
  met?: boolean;
}

export interface BenchContext {
  /** The product under test, e.g. http://127.0.0.1:3511 */
  productUrl: string;
  /** The bare baseline server doing the same work on the same database. */
  bareUrl: string;
  /** A connection to the same database as the owner, for seeding bench data. */
  ownerDatabaseUrl: string;
  /** Cookie of a signed-in owner of the bench workshop, for the product's routes. */
  cookie: string;
  workshopId: string;
}
