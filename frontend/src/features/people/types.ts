import type { Schemas } from '../../lib/api/schemas';

/** A member; `invitationPending`: invited and not signed up yet, only then can the invitation be sent again. */
export type Person = Schemas['PersonResponse'];

export const peopleKeys = { all: ['people'] as const };
