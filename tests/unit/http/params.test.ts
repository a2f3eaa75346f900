// Path ids are checked against their format before use; anything else is "nothing here".
// source: RFC 9562 §4 (uuid text form: 8-4-4-4-12 hex digits, version and variant bits);
// RFC 9110 §15.5.5 (404 Not Found); OWASP ASVS 5.0 §2.2.1 (allow-list input validation).
import { describe, expect, it } from 'vitest';
import { ApiError } from '../../../src/lib/server/http/api-error';
import { authIdParam, readParams, uuidParam } from '../../../src/lib/server/http/params';

const read = (params: Record<string, string | undefined>, shape: Parameters<typeof readParams>[1]) =>
  readParams({ params }, shape);

describe('readParams', () => {
  it('returns the ids when they fit', () => {
    expect(read({ id: '0190a8a0-1234-7abc-8def-0123456789ab' }, { id: uuidParam })).toEqual({
      id: '0190a8a0-1234-7abc-8def-0123456789ab',
    });
    expect(read({ memberId: 'AbCdEfGhIjKlMnOpQrStUvWxYz012345' }, { memberId: authIdParam })).toEqual({
      memberId: 'AbCdEfGhIjKlMnOpQrStUvWxYz012345',
    });
  });

  it.each([
    ['not a uuid', 'not-a-uuid', uuidParam],
    ['a NUL', '\u0000', uuidParam],
    ['a uuid with a NUL after it', '0190a8a0-1234-7abc-8def-0123456789ab\u0000', uuidParam],
    ['10 kB', 'a'.repeat(10_240), authIdParam],
    ['empty', '', authIdParam],
    ['missing', undefined, uuidParam],
    ['a uuid where better-auth ids go', '0190a8a0-1234-7abc-8def-0123456789ab', authIdParam],
  ])('%s is 404 NOT_FOUND naming the parameter, not the value', (_label, value, schema) => {
    let thrown: unknown;
    try {
      read({ id: value }, { id: schema });
    } catch (error) {
      thrown = error;
    }
    expect(thrown).toBeInstanceOf(ApiError);
    expect(thrown).toMatchObject({ code: 'NOT_FOUND', status: 404 });
    expect((thrown as ApiError).message).toContain('its id is not a valid id');
    expect((thrown as ApiError).message.length).toBeLessThan(300);
  });
});
