import type { QueryKey } from '@tanstack/react-query';

/**
 * The queries that show a machine's state: its header and the machines list (['machines', …])
 * and its readiness board (['approvals', …]). Every write that can change what a check shows
 * refreshes these, so the header, the list and the board agree with the server.
 */
export const MACHINE_STATE_KEYS: QueryKey[] = [['machines'], ['approvals']];
