import { type SessionUser } from '@limitbook/contracts';

export function toSessionUser(user: { id: string; email: string; name: string; role: SessionUser['role'] }): SessionUser {
  return { id: user.id, email: user.email, name: user.name, role: user.role };
}
