import type { Role } from '../../lib/session/user';

export interface Person {
  id: string;
  email: string;
  name: string;
  role: Role;
  active: boolean;
  /** Invited and not signed up yet: only then can the invitation be sent again. */
  invitationPending: boolean;
  createdAt: string;
}

export const peopleKeys = { all: ['people'] as const };
