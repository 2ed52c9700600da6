import type { Role } from '../auth/types';

export interface Person {
  id: string;
  email: string;
  name: string;
  role: Role;
  active: boolean;
  createdAt: string;
}

export const peopleKeys = { all: ['people'] as const };
