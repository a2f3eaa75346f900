import { describe, expect, it } from 'vitest';
import { linkify } from '../../../src/components/dev/linkify';

describe('linkify (dev inbox)', () => {
  it('splits links out of text', () => {
    expect(linkify('Open http://127.0.0.1:4321/verify?token=abc to verify.')).toEqual([
      { kind: 'text', value: 'Open ' },
      { kind: 'link', value: 'http://127.0.0.1:4321/verify?token=abc' },
      { kind: 'text', value: ' to verify.' },
    ]);
  });

  it('leaves markup as text, never as a link', () => {
    const parts = linkify('<script>alert(1)</script> javascript:alert(1)');
    expect(parts).toEqual([{ kind: 'text', value: '<script>alert(1)</script> javascript:alert(1)' }]);
  });

  it('handles an empty text', () => {
    expect(linkify('')).toEqual([]);
  });
});
