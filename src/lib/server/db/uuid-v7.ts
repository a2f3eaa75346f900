import { randomFillSync } from 'node:crypto';

let lastMs = 0;
let counter = 0;
const pool = new Uint8Array(16 * 1024);
let poolOffset = pool.length;

function randomBytes16(): Uint8Array {
  if (poolOffset + 16 > pool.length) {
    randomFillSync(pool);
    poolOffset = 0;
  }
  const out = pool.slice(poolOffset, poolOffset + 16);
  poolOffset += 16;
  return out;
}

/**
 * A time-ordered UUID (version 7, RFC 9562 §5.7): 48-bit Unix milliseconds, then a 12-bit counter
 * (monotonic within one millisecond, §6.2 method 1), then random bits. Rows keyed by it are appended
 * at the end of their indexes, which keeps bulk inserts fast.
 */
export function uuidV7(): string {
  let ms = Date.now();
  if (ms <= lastMs) {
    counter++;
    if (counter > 0xfff) {
      lastMs++;
      counter = 0;
    }
    ms = lastMs;
  } else {
    lastMs = ms;
    counter = 0;
  }
  const b = randomBytes16();
  b[0] = Math.floor(ms / 2 ** 40) & 0xff;
  b[1] = Math.floor(ms / 2 ** 32) & 0xff;
  b[2] = (ms >>> 24) & 0xff;
  b[3] = (ms >>> 16) & 0xff;
  b[4] = (ms >>> 8) & 0xff;
  b[5] = ms & 0xff;
  b[6] = 0x70 | ((counter >>> 8) & 0x0f);
  b[7] = counter & 0xff;
  b[8] = 0x80 | ((b[8] ?? 0) & 0x3f);
  const hex = Array.from(b, (x) => x.toString(16).padStart(2, '0')).join('');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}
