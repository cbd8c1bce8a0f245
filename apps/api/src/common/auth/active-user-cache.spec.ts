import { describe, expect, it } from 'vitest';
import { ActiveUserCache } from './active-user-cache.js';
import { type AuthUser } from './auth-user.js';

const reader: AuthUser = { id: '6f1c2a9e-0b7d-4c3e-9a51-2d8e4f6a7b10', email: 'reader@brackwater.example', name: 'Rea Der', role: 'reader' };

function fakeDatabase(initial: AuthUser | undefined) {
  const state = { row: initial, lookups: 0 };
  const load = async () => {
    state.lookups += 1;
    return state.row;
  };
  return { state, load };
}

describe('ActiveUserCache', () => {
  it('answers from memory within the TTL and asks again after it', async () => {
    let now = 1_000;
    const cache = new ActiveUserCache({ ttlMs: 5_000, now: () => now });
    const { state, load } = fakeDatabase(reader);
    expect(await cache.get(reader.id, load)).toEqual(reader);
    state.row = { ...reader, role: 'author' }; // changed by another process
    now = 5_999;
    expect((await cache.get(reader.id, load))?.role).toBe('reader');
    expect(state.lookups).toBe(1);
    now = 6_001;
    expect((await cache.get(reader.id, load))?.role).toBe('author');
    expect(state.lookups).toBe(2);
  });

  it('reads the database again right after an invalidation', async () => {
    const cache = new ActiveUserCache();
    const { state, load } = fakeDatabase(reader);
    await cache.get(reader.id, load);
    state.row = undefined; // deactivated
    cache.invalidate(reader.id);
    expect(await cache.get(reader.id, load)).toBeUndefined();
  });

  it('never caches a user that was not found, so activation applies at once', async () => {
    const cache = new ActiveUserCache();
    const { state, load } = fakeDatabase(undefined);
    expect(await cache.get(reader.id, load)).toBeUndefined();
    state.row = reader;
    expect(await cache.get(reader.id, load)).toEqual(reader);
    expect(state.lookups).toBe(2);
  });

  it('does not keep a row read while a change committed', async () => {
    const cache = new ActiveUserCache();
    let release!: (user: AuthUser) => void;
    const slowLookup = cache.get(reader.id, () => new Promise<AuthUser>((resolve) => (release = resolve)));
    cache.invalidate(reader.id); // the change commits while the lookup is still reading
    release(reader);
    expect(await slowLookup).toEqual(reader);
    const { state, load } = fakeDatabase({ ...reader, role: 'author' });
    expect((await cache.get(reader.id, load))?.role).toBe('author');
    expect(state.lookups).toBe(1);
  });
});
