import { afterEach, describe, expect, it, vi } from 'vitest';
import { jsonResponse } from '@/testing/render';
import { evaluateOne, evaluationKey, requestFromKey } from './evaluate';

describe('evaluation requests with a pinned method version', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('keeps the key of unpinned requests as it was and carries a pin through the key', () => {
    const unpinned = { method: 'wall-thickness', inputs: { a: 1 }, unit: 'mm' as const };
    expect(evaluationKey({ ...unpinned, methodVersion: null })).toBe(evaluationKey(unpinned));
    const pinned = { method: 'house:gland-squeeze', inputs: { cord: 3.53 }, unit: 'mm' as const, methodVersion: 1 };
    expect(evaluationKey(pinned)).not.toBe(evaluationKey({ ...pinned, methodVersion: 2 }));
    expect(requestFromKey(evaluationKey(pinned)).methodVersion).toBe(1);
  });

  it('asks the server for the pinned version', async () => {
    const fetch = vi.fn(async () => jsonResponse(200, { method: 'house:gland-squeeze', version: 1, unit: 'mm', outputs: {}, warnings: [], steps: [] }));
    vi.stubGlobal('fetch', fetch);
    await evaluateOne({ method: 'house:gland-squeeze', inputs: { cord: 3.53 }, unit: 'mm', methodVersion: 1 });
    const [, init] = fetch.mock.calls[0] as unknown as [string, RequestInit];
    expect(JSON.parse(String(init.body))).toEqual({ inputs: { cord: 3.53 }, unit: 'mm', methodVersion: 1 });
  });
});
