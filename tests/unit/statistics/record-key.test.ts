import { createHmac } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { recordKeyOf } from '../../../src/lib/server/statistics/record-key';

describe('record masking keys', () => {
  it('are the first 4 bytes of HMAC-SHA-256 of the id, big-endian', () => {
    // source: RFC 4231 test case 2 (HMAC-SHA-256, key "Jefe", data "what do ya want for nothing?"):
    // 5bdcc146bf60754e6a042426089575c75a003f089d2739839dec58b964ec3843
    expect(recordKeyOf('Jefe', 'what do ya want for nothing?')).toBe(0x5bdcc146);
  });

  it('are the same for the same record and spread over 32 bits for different ones', () => {
    const secret = 'a'.repeat(40);
    const id = '0190f2c4-6a4e-7cc1-8f3e-3b1f0d9a2c55';
    expect(recordKeyOf(secret, id)).toBe(recordKeyOf(secret, id));
    expect(recordKeyOf(secret, id)).toBe(createHmac('sha256', secret).update(id).digest().readUInt32BE(0));
    const keys = new Set(Array.from({ length: 1000 }, (_, i) => recordKeyOf(secret, `record-${i}`)));
    expect(keys.size).toBe(1000);
  });
});
