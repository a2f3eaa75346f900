import { describe, expect, it } from 'vitest';
import { uuidV7 } from '../../../src/lib/server/db/uuid-v7';

describe('UUID version 7', () => {
  // source: RFC 9562 (2024) §5.7 — version nibble 7, variant bits 10, leading 48-bit Unix milliseconds
  it('has the version 7 and RFC variant bits and carries the time', () => {
    const before = Date.now();
    const id = uuidV7();
    expect(id).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-7[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
    const ms = Number.parseInt(id.replaceAll('-', '').slice(0, 12), 16);
    expect(ms).toBeGreaterThanOrEqual(before);
    expect(ms).toBeLessThanOrEqual(Date.now() + 1);
  });

  it('sorts in creation order, also within one millisecond (§6.2 counter)', () => {
    const ids = Array.from({ length: 20_000 }, () => uuidV7());
    expect([...ids].sort()).toEqual(ids);
    expect(new Set(ids).size).toBe(ids.length);
  });
});
