import { historyKinds } from '../../lib/record-kinds';

/** The kinds a reader may filter by, in the server's plain words (lib/record-kinds.ts). */
export const MACHINE_HISTORY_KINDS: [string, string][] = historyKinds('machine');

export const WORKSHOP_HISTORY_KINDS: [string, string][] = historyKinds('workshop');
