/** The part of autocannon's programmatic API the bench uses (the package ships no types). */
export interface AutocannonRequest {
  method?: string;
  path?: string;
  headers?: Record<string, string>;
  body?: string;
  setupRequest?: (req: AutocannonRequest) => AutocannonRequest;
}

export interface AutocannonOptions {
  url: string;
  connections: number;
  duration: number;
  /** Requests per second over all connections: a fixed-rate run. */
  overallRate?: number;
  method?: string;
  headers?: Record<string, string>;
  requests?: AutocannonRequest[];
}

export interface AutocannonResult {
  requests: { average: number; total: number };
  latency: { average: number; p99: number };
  duration: number;
  non2xx: number;
  errors: number;
  timeouts: number;
}

export type Autocannon = (opts: AutocannonOptions) => Promise<AutocannonResult>;

export async function loadAutocannon(): Promise<Autocannon> {
  // A name in a variable: the package has no type declarations to check the import against.
  const name = 'autocannon';
  return ((await import(name)) as { default: Autocannon }).default;
}

export const round = (v: number) => Math.round(v * 100) / 100;
