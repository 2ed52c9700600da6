export type Role = 'admin' | 'owner' | 'technician' | 'builder' | 'viewer';

export interface User {
  id: string;
  email: string;
  name: string;
  role: Role;
  workshop: { id: string; name: string };
}
