import { Injectable } from '@nestjs/common';
import { LRUCache } from 'lru-cache';
import { type AuthUser } from './auth-user.js';

/** How long this process trusts what it read about a signed-in user without asking the database again. */
export const activeUserTtlMs = 5_000;
const maxCachedUsers = 10_000;

/**
 * Active users by id, for the JWT guard: without it every authenticated request costs a database
 * round trip. Changes made through this process (role, status, password) call `invalidate` and
 * apply on the next request; changes made by another process show within `activeUserTtlMs`.
 */
@Injectable()
export class ActiveUserCache {
  private readonly users: LRUCache<string, AuthUser>;
  // Bumped by every invalidation: a lookup that was already reading the database when a change
  // committed may hold the old row, so it must not put that row back.
  private generation = 0;

  constructor(options: { ttlMs?: number; now?: () => number } = {}) {
    const now = options.now;
    this.users = new LRUCache<string, AuthUser>({
      max: maxCachedUsers,
      ttl: options.ttlMs ?? activeUserTtlMs,
      ...(now ? { perf: { now }, ttlResolution: 0 } : {}),
    });
  }

  /** The cached user, or what `load` finds; users `load` does not find (inactive, unknown) are never cached. */
  async get(id: string, load: (id: string) => Promise<AuthUser | undefined>): Promise<AuthUser | undefined> {
    const cached = this.users.get(id);
    if (cached) return cached;
    const generation = this.generation;
    const user = await load(id);
    if (user && generation === this.generation) this.users.set(id, user);
    return user;
  }

  /** Call after a change to the user's role, status, name or password has committed. */
  invalidate(id: string): void {
    this.generation += 1;
    this.users.delete(id);
  }
}
