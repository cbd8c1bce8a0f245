import { type Role } from '@limitbook/contracts';

/** The signed-in user as the guards put it on the request, read fresh from the database. */
export interface AuthUser {
  id: string;
  email: string;
  name: string;
  role: Role;
}
