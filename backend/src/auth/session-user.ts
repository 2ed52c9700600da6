import type { Role } from '../database/schema/users.js';

/** The signed-in person as every handler sees it; workshopId scopes every query. */
export interface SessionUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  workshopId: string;
  workshopName: string;
}

export interface UserResponse {
  id: string;
  email: string;
  name: string;
  role: Role;
  workshop: { id: string; name: string };
}

export function toUserResponse(user: SessionUser): UserResponse {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    workshop: { id: user.workshopId, name: user.workshopName },
  };
}
