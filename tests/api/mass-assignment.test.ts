// Write endpoints take only the fields a caller may set. Firm, status, role, ids and prototype keys
// sent in a body are refused with a per-field message, and nothing is stored.
// source: OWASP ASVS 5.0 §15.3.3 (mass assignment); OWASP Mass Assignment cheat sheet (allow-lists).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { call, db, firmIdOf, memberIdOf, sessionCookie, userIdOf } from './support/world';

let owner = '';
let steward = '';
let firmB = '';
let memberId = '';

beforeAll(async () => {
  owner = await sessionCookie(await userIdOf('owner@quillfen.example.test'));
  steward = await sessionCookie(await userIdOf('steward@example.test'));
  firmB = await firmIdOf('ellery-voss');
  memberId = await memberIdOf('contributor@quillfen.example.test', 'quillfen');
});
afterAll(() => db.destroy());

/** A profile the estimate schema accepts (one clay layer under a wide fill). */
const PROFILE = {
  unitSystem: 'SI',
  waterTableDepth: 1,
  layers: [
    { name: 'Clay', thickness: 6, unitWeightAboveWater: 17, unitWeightBelowWater: 16, cc: 0.6, cr: 0.06, e0: 1.8, ocr: 1, cv: 2 },
  ],
  load: { type: 'wideFill', pressure: 40 },
  drainage: { top: 'pervious', bottom: 'pervious' },
};

const EXTRA_FIELDS = () => [
  { firmId: firmB },
  { firm_id: firmB },
  { organizationId: firmB },
  { status: 'published' },
  { role: 'owner' },
  { id: 'chosen-id' },
];

function rawJson(body: Record<string, unknown>, proto: Record<string, unknown>): string {
  return `${JSON.stringify(body).slice(0, -1)},"__proto__":${JSON.stringify(proto)}}`;
}

describe.each([
  ['POST', '/api/firms', () => owner, { name: 'Extra fields firm' }],
  ['POST', '/api/firm/invitations', () => owner, { email: 'extra-fields@example.test', role: 'engineer' }],
  ['PATCH', '/api/firm/members/:member', () => owner, { role: 'contributor' }],
  ['POST', '/api/firm/api-keys', () => owner, { name: 'extra fields key' }],
  ['POST', '/api/estimates', () => owner, { name: 'Extra fields estimate', unitSystem: 'SI', input: PROFILE }],
  ['POST', '/api/vocabulary/regions', () => steward, { name: 'Extra fields region' }],
  ['POST', '/api/session/active-firm', () => owner, { firmId: 'x' }],
  [
    'POST',
    '/api/session/sign-up',
    () => '',
    { name: 'Extra', email: 'extra-fields-signup@example.test', password: 'a-long-password-1' },
  ],
])('%s %s', (method, pathTemplate, cookieOf, validBody) => {
  const path = () => pathTemplate.replace(':member', memberId);

  it('refuses each field the caller may not set, naming it', async () => {
    for (const extra of EXTRA_FIELDS()) {
      const key = Object.keys(extra)[0] ?? '';
      if (key in validBody) continue;
      const result = await call(method, path(), cookieOf() || null, { ...validBody, ...extra });
      expect(result.status, `${key} → ${result.text}`).toBe(400);
      const issues = (result.body as { error: { code: string; issues: { path: string; message: string }[] } }).error;
      expect(issues.code).toBe('VALIDATION_FAILED');
      expect(JSON.stringify(issues.issues)).toContain(key);
    }
  });

  it('refuses a __proto__ key', async () => {
    const response = await fetch(`${process.env.CLAYBANK_TEST_BASE_URL}${path()}`, {
      method,
      headers: {
        'content-type': 'application/json',
        origin: String(process.env.CLAYBANK_TEST_BASE_URL),
        ...(cookieOf() ? { cookie: cookieOf() } : {}),
      },
      body: rawJson(validBody, { role: 'owner', firmId: firmB }),
    });
    expect(response.status).toBe(400);
  });
});

describe("the sign-in library's own sign-up route", () => {
  it('is not exposed, so a new account cannot choose its platform role or mark itself verified there', async () => {
    const email = `role-grab.${Date.now()}@example.test`;
    const result = await call('POST', '/api/auth/sign-up/email', null, {
      name: 'Grabber',
      email,
      password: 'a-long-password-1',
      role: 'admin',
      emailVerified: true,
    });
    expect(result.status).toBe(404);
    expect(await db.selectFrom('user').select('id').where('email', '=', email).execute()).toEqual([]);
  });
});

describe('nothing was stored by the refused writes', () => {
  it('has no firm, invitation, key, estimate or region named by the refused bodies', async () => {
    expect(await db.selectFrom('organization').select('id').where('name', '=', 'Extra fields firm').execute()).toEqual([]);
    expect(await db.selectFrom('invitation').select('id').where('email', '=', 'extra-fields@example.test').execute()).toEqual([]);
    expect(await db.selectFrom('apikey').select('id').where('name', '=', 'extra fields key').execute()).toEqual([]);
    expect(await db.selectFrom('region').select('id').where('name', '=', 'Extra fields region').execute()).toEqual([]);
    expect(await db.selectFrom('user').select('id').where('email', '=', 'extra-fields-signup@example.test').execute()).toEqual(
      [],
    );
  });
});
