import { describe, expect, it } from 'vitest';
import { isUnitSystem, unitSystemFromCookie } from '../../../src/lib/preferences/unit-system';

describe('unit system preference', () => {
  it.each([
    ['SI', 'SI'],
    ['US', 'US'],
    [undefined, 'SI'],
    ['us', 'SI'],
    ['imperial', 'SI'],
    ['', 'SI'],
  ])('cookie %j reads as %s', (cookie, expected) => {
    expect(unitSystemFromCookie(cookie)).toBe(expected);
  });

  it('accepts only the two systems', () => {
    expect(isUnitSystem('SI')).toBe(true);
    expect(isUnitSystem('US')).toBe(true);
    expect(isUnitSystem('metric')).toBe(false);
    expect(isUnitSystem(1)).toBe(false);
  });
});
