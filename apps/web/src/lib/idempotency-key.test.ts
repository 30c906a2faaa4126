import { describe, expect, it } from 'vitest';
import { newIdempotencyKey } from './idempotency-key';

describe('newIdempotencyKey', () => {
  it('is 128 random bits as 32 hex digits, different every time', () => {
    const keys = new Set(Array.from({ length: 1000 }, newIdempotencyKey));
    expect(keys.size).toBe(1000);
    for (const key of keys) expect(key).toMatch(/^[0-9a-f]{32}$/);
  });
});
