import type { Query } from '@tanstack/react-query';

/**
 * The answers kept on the device, so a page opened or reloaded without a connection shows what
 * was last seen of the machines and their records, and its forms can be used: who is signed in
 * and the machines' own data. Left out: live previews (recomputed as typed), calculators,
 * workshop-wide history, people and the mail outbox (large, or of no use at the machine).
 */
const KEPT_ROOTS = new Set([
  'auth',
  'machines',
  'rails',
  'bolt-downs',
  'drives',
  'frame',
  'safety',
  'approvals',
  'target-sets',
  'hole-patterns',
  'evidence',
]);

export function isKeptQuery(query: Query): boolean {
  if (query.state.status !== 'success') return false;
  const [root] = query.queryKey;
  return typeof root === 'string' && KEPT_ROOTS.has(root) && !query.queryKey.includes('preview');
}
