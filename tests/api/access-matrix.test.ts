// One table of roles × routes × {own firm, other firm, published, unpublished}. Every route the app
// serves must have a row (a new route without one fails), every cell states its status, and every
// answer is searched for the other firm's private or unpublished data.
// source: OWASP ASVS 5.0 §8.2.2, §8.4.1 (per-object and cross-tenant authorisation); OWASP IDOR
// prevention cheat sheet ("user A / user B" testing).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { type FirmFixture, makeFirmFixture, makeSubmittedSubmission, PRIVATE_MARKERS, uploadForm } from './support/fixtures';
import { type Expectation, everyone, FIRM_OF, ROLE_EMAILS, ROLES, type Role } from './support/roles';
import { routeInventory } from './support/route-inventory';
import { base, type CallResult, call, db, firmIdOf, makePerson, memberIdOf, sessionCookie, userIdOf } from './support/world';

const cookies = {} as Record<Role, string | null>;
let A: FirmFixture;
let B: FirmFixture;
let aContributorMemberId = '';
let bEngineerMemberId = '';
let removableMemberId = '';
let aInvitationId = '';
let aKeyId = '';
let aKeySecret = '';
let revokedKeySecret = '';
let uploadKeySecret = '';
let regionId = '';
let unitId = '';

const asObject = (result: CallResult) => result.body as Record<string, unknown>;
const listOf = (result: CallResult, key: string) => asObject(result)[key] as Record<string, unknown>[];
const ids = (result: CallResult, key: string) => listOf(result, key).map((row) => row.id);
const statisticsOwn = (result: CallResult, parameter: string) =>
  listOf(result, 'summaries').find((s) => s.parameter === parameter)?.own ?? null;

const PREVIEW_BODY = {
  unitSystem: 'SI',
  waterTableDepth: 1,
  layers: [
    {
      name: 'Soft clay',
      thickness: 8,
      unitWeightAboveWater: 17,
      unitWeightBelowWater: 16,
      cc: 0.8,
      cr: 0.08,
      e0: 2,
      ocr: 1,
      cv: 2,
    },
  ],
  load: { type: 'wideFill', pressure: 40 },
  drainage: { top: 'pervious', bottom: 'pervious' },
};

type Request = { method: string; path: string; body?: unknown; headers?: Record<string, string> };
type Case = {
  context: string;
  /** may build a fresh target per call (for one-shot actions such as a decision or a withdrawal) */
  request: (role: Role) => Request | Promise<Request>;
  expect: Record<Role, Expectation>;
};
const get = (path: () => string) => () => ({ method: 'GET', path: path() });

/** The whole table. Keys are `METHOD /pattern` (or `PAGE /pattern`) exactly as routeInventory() lists them. */
const MATRIX: Record<string, Case[]> = {
  'GET /api/health': [{ context: 'public', request: get(() => '/api/health'), expect: everyone(200) }],
  'ALL /api/*path': [{ context: 'unknown path', request: get(() => '/api/no-such-route'), expect: everyone(404) }],
  'POST /api/preferences/unit-system': [
    {
      context: 'own preference',
      request: () => ({ method: 'POST', path: '/api/preferences/unit-system', body: { unitSystem: 'SI' } }),
      expect: everyone(200),
    },
  ],
  'GET /api/dev/inbox': [{ context: 'development mode only', request: get(() => '/api/dev/inbox'), expect: everyone(200) }],
  // The sign-in library's own routes: only the links in mails stay reachable; everything else under
  // /api/auth is 404 in our error shape, whoever asks (regressions: any member read the firm's pending
  // invitations, reset mails bypassed the per-address limit, a firm admin's role change gave a 500).
  'ALL /api/auth/*all': [
    ...[
      ['GET', '/api/auth/get-session'],
      ['GET', `/api/auth/organization/list-invitations`],
      ['POST', '/api/auth/organization/update-member-role'],
      ['GET', '/api/auth/organization/get-full-organization'],
      ['POST', '/api/auth/organization/set-active'],
      ['GET', '/api/auth/api-key/list'],
      ['POST', '/api/auth/request-password-reset'],
      ['POST', '/api/auth/sign-in/email'],
      ['POST', '/api/auth/sign-up/email'],
      ['GET', '/api/auth/no-such-route'],
    ].map(([method, path]) => ({
      context: `not exposed: ${method} ${path}`,
      request: () => ({
        method: method as string,
        path: path as string,
        ...(method === 'POST' ? { body: { memberId: bEngineerMemberId, role: 'admin', organizationId: B.firmId } } : {}),
      }),
      expect: everyone({ status: 404, check: (r) => expect(asObject(r).error).toMatchObject({ code: 'NOT_FOUND' }) }),
    })),
  ],
  'GET /api/auth/verify-email': [
    {
      context: 'mail link with a token that is not valid: back to the page with the reason',
      request: get(() => '/api/auth/verify-email?token=not-a-token&callbackURL=/welcome'),
      expect: everyone({ status: 302, check: (r) => expect(r.location).toBe('/welcome?error=INVALID_TOKEN') }),
    },
    {
      context: 'without a page to return to: our error shape',
      request: get(() => '/api/auth/verify-email?token=not-a-token'),
      expect: everyone({ status: 401, check: (r) => expect(asObject(r).error).toMatchObject({ code: 'UNAUTHENTICATED' }) }),
    },
  ],
  'GET /api/auth/reset-password/:token': [
    {
      context: 'mail link with a well-formed token that names nothing (expired or used)',
      request: get(() => '/api/auth/reset-password/NoSuchToken0000000000000?callbackURL=/reset-password'),
      expect: everyone({
        status: 302,
        check: (r) => {
          const to = new URL(r.location ?? '', base);
          expect(to.origin).toBe(new URL(base).origin);
          expect(`${to.pathname}${to.search}`).toBe('/reset-password?error=INVALID_TOKEN');
        },
      }),
    },
    {
      context: 'a token no link could carry (not letters and digits): 404 before the library sees it',
      request: get(() => '/api/auth/reset-password/not-a-token?callbackURL=/reset-password'),
      expect: everyone({ status: 404, check: (r) => expect(asObject(r).error).toMatchObject({ code: 'NOT_FOUND' }) }),
    },
  ],
  'POST /api/session/sign-in': [
    {
      context: 'malformed body',
      request: () => ({ method: 'POST', path: '/api/session/sign-in', body: { email: 'x' } }),
      expect: everyone(400),
    },
  ],
  'POST /api/session/sign-up': [
    {
      context: 'malformed body',
      request: () => ({ method: 'POST', path: '/api/session/sign-up', body: { email: 'x' } }),
      expect: everyone(400),
    },
  ],
  'POST /api/session/forgot-password': [
    {
      context: 'malformed body',
      request: () => ({ method: 'POST', path: '/api/session/forgot-password', body: {} }),
      expect: everyone(400),
    },
  ],
  'POST /api/session/reset-password': [
    {
      context: 'password too short',
      request: () => ({
        method: 'POST',
        path: '/api/session/reset-password',
        body: { token: 'not-a-real-token', password: 'short' },
      }),
      expect: everyone(400),
    },
  ],
  'POST /api/session/sign-out': [
    {
      context: 'own session',
      request: () => ({ method: 'POST', path: '/api/session/sign-out' }),
      expect: everyone({ status: 200, freshSession: true }),
    },
  ],
  'POST /api/session/active-firm': [
    {
      context: 'switch to firm B',
      request: () => ({ method: 'POST', path: '/api/session/active-firm', body: { firmId: B.firmId } }),
      expect: everyone(404, { anon: 401, bAdmin: 200 }),
    },
  ],
  'POST /api/firms': [
    {
      context: 'start a firm',
      request: () => ({
        method: 'POST',
        path: '/api/firms',
        body: { name: `Matrix test firm ${Math.random().toString(36).slice(2, 7)}` },
      }),
      expect: everyone({ status: 201, standIn: true }, { anon: 401 }),
    },
  ],
  'GET /api/firm': [
    {
      context: 'own firm',
      request: get(() => '/api/firm'),
      expect: everyone(
        { status: 200, check: (r) => expect((asObject(r).firm as { id: string }).id).toBe(A.firmId) },
        {
          anon: 401,
          platformAdmin: 403,
          steward: 403,
          bAdmin: { status: 200, check: (r) => expect((asObject(r).firm as { id: string }).id).toBe(B.firmId) },
          aEngineer: { status: 200, check: (r) => expect(asObject(r).invitations).toEqual([]) },
        },
      ),
    },
  ],
  'POST /api/firm/leave': [
    {
      context: 'own firm',
      request: () => ({ method: 'POST', path: '/api/firm/leave' }),
      expect: everyone({ status: 204, standIn: true }, { anon: 401, platformAdmin: 403, steward: 403, aOwner: 409 }),
    },
  ],
  'PATCH /api/firm/members/:memberId': [
    {
      context: 'own firm member',
      request: () => ({ method: 'PATCH', path: `/api/firm/members/${aContributorMemberId}`, body: { role: 'contributor' } }),
      expect: everyone(403, { anon: 401, aOwner: 200, bAdmin: 404 }),
    },
    {
      context: 'other firm member',
      request: () => ({ method: 'PATCH', path: `/api/firm/members/${bEngineerMemberId}`, body: { role: 'engineer' } }),
      expect: everyone(403, { anon: 401, aOwner: 404, bAdmin: 200 }),
    },
  ],
  'DELETE /api/firm/members/:memberId': [
    {
      context: 'own firm member',
      request: () => ({ method: 'DELETE', path: `/api/firm/members/${removableMemberId}` }),
      expect: everyone(403, { anon: 401, aOwner: 204, bAdmin: 404 }),
    },
  ],
  'POST /api/firm/invitations': [
    {
      context: 'own firm',
      request: () => ({
        method: 'POST',
        path: '/api/firm/invitations',
        body: { email: `invitee.${Math.random().toString(36).slice(2, 8)}@example.test`, role: 'estimator' },
      }),
      expect: everyone(403, { anon: 401, aOwner: 201, bAdmin: 201 }),
    },
  ],
  'DELETE /api/firm/invitations/:id': [
    {
      context: 'own firm invitation',
      request: () => ({ method: 'DELETE', path: `/api/firm/invitations/${aInvitationId}` }),
      expect: everyone(403, { anon: 401, aOwner: 204, bAdmin: 404 }),
    },
  ],
  'GET /api/firm/api-keys': [
    {
      context: 'own firm',
      request: get(() => '/api/firm/api-keys'),
      expect: everyone(403, {
        anon: 401,
        aOwner: { status: 200, check: (r) => expect(ids(r, 'keys')).toContain(aKeyId) },
        bAdmin: { status: 200, check: (r) => expect(ids(r, 'keys')).not.toContain(aKeyId) },
      }),
    },
  ],
  'POST /api/firm/api-keys': [
    {
      context: 'own firm',
      request: () => ({ method: 'POST', path: '/api/firm/api-keys', body: { name: 'matrix script' } }),
      expect: everyone(403, {
        anon: 401,
        aOwner: { status: 201, check: (r) => expect(String(asObject(r).secret)).toMatch(/^cbk_/) },
        bAdmin: 201,
      }),
    },
  ],
  'GET /api/partner/whoami': [
    { context: 'no key (a session is not enough)', request: get(() => '/api/partner/whoami'), expect: everyone(401) },
    {
      context: "firm A's key",
      request: () => ({ method: 'GET', path: '/api/partner/whoami', headers: { 'x-api-key': aKeySecret } }),
      expect: everyone({ status: 200, check: (r) => expect((asObject(r).firm as { id: string }).id).toBe(A.firmId) }),
    },
    {
      context: 'revoked key',
      request: () => ({ method: 'GET', path: '/api/partner/whoami', headers: { 'x-api-key': revokedKeySecret } }),
      expect: everyone(401),
    },
  ],
  'DELETE /api/firm/api-keys/:id': [
    {
      context: "own firm's key",
      request: () => ({ method: 'DELETE', path: `/api/firm/api-keys/${aKeyId}` }),
      expect: everyone(403, { anon: 401, aOwner: 204, bAdmin: 404 }),
    },
  ],
  'GET /api/invitations/:id': [
    {
      context: 'addressed to someone else',
      request: get(() => `/api/invitations/${aInvitationId}`),
      expect: everyone(404, { anon: 401 }),
    },
  ],
  'POST /api/invitations/:id/accept': [
    {
      context: 'addressed to someone else',
      request: () => ({ method: 'POST', path: `/api/invitations/${aInvitationId}/accept` }),
      expect: everyone(404, { anon: 401 }),
    },
  ],
  'POST /api/invitations/:id/reject': [
    {
      context: 'addressed to someone else',
      request: () => ({ method: 'POST', path: `/api/invitations/${aInvitationId}/reject` }),
      expect: everyone(404, { anon: 401 }),
    },
  ],
  'GET /api/vocabulary': [
    { context: 'shared vocabulary', request: get(() => '/api/vocabulary'), expect: everyone(200, { anon: 401 }) },
  ],
  'POST /api/vocabulary/regions': [
    {
      context: 'shared vocabulary',
      request: () => ({
        method: 'POST',
        path: '/api/vocabulary/regions',
        body: { name: `Matrix region ${Math.random().toString(36).slice(2, 8)}` },
      }),
      expect: everyone(403, { anon: 401, platformAdmin: 201, steward: 201 }),
    },
  ],
  'PATCH /api/vocabulary/regions/:id': [
    {
      context: 'shared vocabulary',
      request: () => ({
        method: 'PATCH',
        path: `/api/vocabulary/regions/${regionId}`,
        body: { description: 'Edited by the access matrix.' },
      }),
      expect: everyone(403, { anon: 401, platformAdmin: 200, steward: 200 }),
    },
  ],
  'POST /api/vocabulary/units': [
    {
      context: 'shared vocabulary',
      request: () => ({
        method: 'POST',
        path: '/api/vocabulary/units',
        body: { name: `Matrix unit ${Math.random().toString(36).slice(2, 8)}`, genesis: 'alluvial' },
      }),
      expect: everyone(403, { anon: 401, platformAdmin: 201, steward: 201 }),
    },
  ],
  'PATCH /api/vocabulary/units/:id': [
    {
      context: 'shared vocabulary',
      request: () => ({ method: 'PATCH', path: `/api/vocabulary/units/${unitId}`, body: { age: 'Holocene' } }),
      expect: everyone(403, { anon: 401, platformAdmin: 200, steward: 200 }),
    },
  ],
  'GET /api/records': [
    {
      context: 'published and own firm',
      request: get(() => '/api/records?limit=200&offset=0'),
      expect: everyone(
        {
          status: 200,
          check: (r) => {
            const seen = ids(r, 'records');
            expect(seen).toEqual(expect.arrayContaining([A.publishedId, B.publishedId, A.unpublishedId]));
            expect(seen).not.toContain(B.unpublishedId);
          },
        },
        {
          anon: 401,
          aEstimator: 403,
          platformAdmin: { status: 200, check: (r) => expect(ids(r, 'records')).not.toContain(A.unpublishedId) },
          steward: { status: 200, check: (r) => expect(ids(r, 'records')).not.toContain(A.unpublishedId) },
          bAdmin: {
            status: 200,
            check: (r) => {
              const seen = ids(r, 'records');
              expect(seen).toEqual(expect.arrayContaining([A.publishedId, B.publishedId, B.unpublishedId]));
              expect(seen).not.toContain(A.unpublishedId);
            },
          },
        },
      ),
    },
  ],
  'GET /api/records/:id': [
    {
      context: 'firm A, published',
      request: get(() => `/api/records/${A.publishedId}`),
      expect: everyone(
        { status: 200, check: (r) => expect(asObject(r).private).toBeUndefined() },
        {
          anon: 401,
          aOwner: {
            status: 200,
            check: (r) => expect(asObject(r).private).toMatchObject({ projectName: PRIVATE_MARKERS.A.project }),
          },
          aEngineer: {
            status: 200,
            check: (r) => expect(asObject(r).private).toMatchObject({ boreholeId: PRIVATE_MARKERS.A.borehole }),
          },
          aEstimator: 403,
          aContributor: {
            status: 200,
            check: (r) => expect(asObject(r).private).toMatchObject({ projectName: PRIVATE_MARKERS.A.project }),
          },
        },
      ),
    },
    {
      context: 'firm A, unpublished',
      request: get(() => `/api/records/${A.unpublishedId}`),
      expect: everyone(404, {
        anon: 401,
        steward: { status: 200, check: (r) => expect(asObject(r).private).toBeUndefined() },
        aOwner: 200,
        aEngineer: 200,
        aEstimator: 403,
        aContributor: {
          status: 200,
          check: (r) => expect(asObject(r).private).toMatchObject({ projectName: PRIVATE_MARKERS.A.project }),
        },
      }),
    },
    {
      context: 'firm B, published',
      request: get(() => `/api/records/${B.publishedId}`),
      expect: everyone(
        { status: 200, check: (r) => expect(asObject(r).private).toBeUndefined() },
        {
          anon: 401,
          aEstimator: 403,
          bAdmin: {
            status: 200,
            check: (r) => expect(asObject(r).private).toMatchObject({ projectName: PRIVATE_MARKERS.B.project }),
          },
        },
      ),
    },
    {
      context: 'firm B, unpublished',
      request: get(() => `/api/records/${B.unpublishedId}`),
      expect: everyone(404, { anon: 401, aEstimator: 403, steward: 200, bAdmin: 200 }),
    },
  ],
  'GET /api/estimates': [
    {
      context: 'own firm (private)',
      request: get(() => '/api/estimates'),
      expect: everyone(403, {
        anon: 401,
        aOwner: { status: 200, check: (r) => expect(ids(r, 'estimates')).toContain(A.estimateId) },
        aEngineer: 200,
        aEstimator: 200,
        bAdmin: { status: 200, check: (r) => expect(ids(r, 'estimates')).toEqual(expect.arrayContaining([B.estimateId])) },
      }),
    },
  ],
  'POST /api/estimates': [
    {
      context: 'own firm (private)',
      request: () => ({
        method: 'POST',
        path: '/api/estimates',
        body: { name: 'Matrix embankment', unitSystem: 'SI', input: PREVIEW_BODY },
      }),
      expect: everyone(403, { anon: 401, aOwner: 201, aEngineer: 201, aEstimator: 201, bAdmin: 201 }),
    },
  ],
  'POST /api/estimates/preview': [
    {
      context: 'no data touched',
      request: () => ({ method: 'POST', path: '/api/estimates/preview', body: PREVIEW_BODY }),
      expect: everyone(403, { anon: 401, aOwner: 200, aEngineer: 200, aEstimator: 200, bAdmin: 200 }),
    },
  ],
  'GET /api/submissions': [
    {
      context: 'own firm; stewards see all',
      request: get(() => '/api/submissions'),
      expect: everyone(403, {
        anon: 401,
        steward: {
          status: 200,
          check: (r) => expect(ids(r, 'submissions')).toEqual(expect.arrayContaining([A.submissionId, B.submissionId])),
        },
        aOwner: { status: 200, check: (r) => expect(ids(r, 'submissions')).toContain(A.submissionId) },
        aEngineer: 200,
        aContributor: 200,
        bAdmin: { status: 200, check: (r) => expect(ids(r, 'submissions')).toContain(B.submissionId) },
      }),
    },
  ],
  'GET /api/review': [
    {
      context: 'review queue (all firms)',
      request: get(() => '/api/review'),
      expect: everyone(403, {
        anon: 401,
        steward: {
          status: 200,
          check: (r) =>
            expect(listOf(r, 'submissions').map((s) => s.id)).toEqual(expect.arrayContaining([A.submissionId, B.submissionId])),
        },
      }),
    },
  ],
  'GET /api/review/:id': [
    {
      context: 'firm A submission, as reviewed (no private details)',
      request: get(() => `/api/review/${A.submissionId}`),
      expect: everyone(403, {
        anon: 401,
        steward: { status: 200, check: (r) => expect(ids(r, 'records')).toEqual(expect.arrayContaining([A.unpublishedId])) },
      }),
    },
  ],
  'POST /api/review/:id/decision': [
    {
      context: 'a fresh firm A submission, returned with a comment',
      request: async () => ({
        method: 'POST',
        path: `/api/review/${await makeSubmittedSubmission(A.firmId)}/decision`,
        body: { action: 'return', comment: 'Check the units of σ′p.' },
      }),
      expect: everyone(403, { anon: 401, steward: 200 }),
    },
  ],
  'GET /api/submissions/:id': [
    {
      context: 'firm A submission in full',
      request: get(() => `/api/submissions/${A.submissionId}`),
      expect: everyone(403, {
        anon: 401,
        aOwner: { status: 200, check: (r) => expect(r.text).toContain(PRIVATE_MARKERS.A.project) },
        aEngineer: 200,
        aContributor: 200,
        bAdmin: 404,
      }),
    },
  ],
  'POST /api/submissions/:id/resubmit': [
    {
      context: 'firm A submission that is not returned',
      request: () => ({ method: 'POST', path: `/api/submissions/${A.submissionId}/resubmit` }),
      expect: everyone(403, { anon: 401, aOwner: 409, aEngineer: 409, aContributor: 409, bAdmin: 404 }),
    },
  ],
  'POST /api/submissions/:id/withdraw': [
    {
      context: 'a fresh firm A submission',
      request: async () => ({ method: 'POST', path: `/api/submissions/${await makeSubmittedSubmission(A.firmId)}/withdraw` }),
      expect: everyone(403, { anon: 401, aOwner: 200, aEngineer: 200, aContributor: 200, bAdmin: 404 }),
    },
  ],
  'POST /api/submissions': [
    {
      context: 'upload for the active firm',
      request: (role) => ({ method: 'POST', path: '/api/submissions', body: uploadForm(role) }),
      expect: everyone(403, { anon: 401, aOwner: 201, aEngineer: 201, aContributor: 201, bAdmin: 201 }),
    },
  ],
  'POST /api/submissions/check': [
    {
      context: 'dry run for the active firm',
      request: (role) => ({ method: 'POST', path: '/api/submissions/check', body: uploadForm(role) }),
      expect: everyone(403, { anon: 401, aOwner: 200, aEngineer: 200, aContributor: 200, bAdmin: 200 }),
    },
  ],
  'PATCH /api/submissions/:id/records/:recordId': [
    {
      context: 'firm A record of a submission that is not returned',
      request: () => ({
        method: 'PATCH',
        path: `/api/submissions/${A.submissionId}/records/${A.unpublishedId}`,
        body: { values: { compressionIndex: 0.9 } },
      }),
      expect: everyone(403, { anon: 401, aOwner: 409, aEngineer: 409, aContributor: 409, bAdmin: 404 }),
    },
  ],
  'GET /api/contribute/template': [
    { context: 'public template', request: get(() => '/api/contribute/template'), expect: everyone(200) },
  ],
  'GET /api/firm/field-mapping': [
    {
      context: "own firm's remembered columns",
      request: get(() => '/api/firm/field-mapping'),
      expect: everyone(403, { anon: 401, aOwner: 200, aEngineer: 200, aContributor: 200, bAdmin: 200 }),
    },
  ],
  'POST /api/partner/submissions': [
    {
      context: 'no key (a session is not enough)',
      request: (role) => ({ method: 'POST', path: '/api/partner/submissions', body: uploadForm(role) }),
      expect: everyone(401),
    },
    {
      context: "firm A's key, CSV body",
      request: (role) => ({
        method: 'POST',
        path: '/api/partner/submissions',
        body: `Borehole / location id,Region,Geological unit,Depth top (m),Depth bottom (m),Cc\nAPI-${role}-${Math.random().toString(36).slice(2, 8)},Saltreach Estuary,Saltreach Estuarine Clay,3,3.4,0.7\n`,
        headers: { 'x-api-key': uploadKeySecret, 'content-type': 'text/csv' },
      }),
      expect: everyone(201),
    },
  ],
  'GET /api/statistics': [
    {
      context: "matrix unit: published tests of every firm plus own firm's, own figures only to members",
      request: get(() => '/api/statistics?unit=aa-access-matrix-clay'),
      expect: everyone(
        { status: 200, check: (r) => expect(statisticsOwn(r, 'compressionIndex')).not.toBeNull() },
        {
          anon: 401,
          steward: { status: 200, check: (r) => expect(statisticsOwn(r, 'compressionIndex')).toBeNull() },
          platformAdmin: { status: 200, check: (r) => expect(statisticsOwn(r, 'compressionIndex')).toBeNull() },
        },
      ),
    },
  ],
  'GET /api/statistics/correlation': [
    {
      context: 'matrix unit, Cc–LL',
      request: get(() => '/api/statistics/correlation?unit=aa-access-matrix-clay&pair=cc-ll'),
      expect: everyone(200, { anon: 401 }),
    },
  ],
  'GET /api/statistics/profile': [
    {
      context: 'matrix unit',
      request: get(() => '/api/statistics/profile?unit=aa-access-matrix-clay'),
      expect: everyone(200, { anon: 401 }),
    },
  ],
  'POST /api/statistics/compare': [
    {
      context: 'matrix unit, one site value',
      request: () => ({
        method: 'POST',
        path: '/api/statistics/compare?unit=aa-access-matrix-clay',
        body: { values: { compressionIndex: [0.9] } },
      }),
      expect: everyone(200, { anon: 401 }),
    },
  ],
  'GET /api/audit': [
    {
      context: 'own firm; platform admin sees all',
      request: get(() => '/api/audit?limit=200'),
      expect: everyone(403, {
        anon: 401,
        platformAdmin: { status: 200, privateMarkersOnly: true },
        aOwner: {
          status: 200,
          privateMarkersOnly: true,
          check: (r) => expect(listOf(r, 'entries').every((e) => e.firmId === A.firmId)).toBe(true),
        },
        bAdmin: {
          status: 200,
          privateMarkersOnly: true,
          check: (r) => expect(listOf(r, 'entries').every((e) => e.firmId === B.firmId)).toBe(true),
        },
      }),
    },
  ],
};

/** A new unit through the API, as the steward makes one. */
async function freshUnit(label: string): Promise<string> {
  const made = await call('POST', '/api/vocabulary/units', cookies.steward, {
    name: `Matrix ${label} ${Math.random().toString(36).slice(2, 8)}`,
    genesis: 'alluvial',
  });
  return String((asObject(made).unit as { id: string }).id);
}

/** A new firm with an owner and one engineer; returns the firm and the engineer's member id. */
async function freshFirm(): Promise<{ firmId: string; memberId: string }> {
  const owner = await makePerson('matrix-owner');
  const made = await call('POST', '/api/firms', await sessionCookie(owner.id), {
    name: `Matrix firm ${Math.random().toString(36).slice(2, 7)}`,
  });
  const firmId = String((asObject(made).firm as { id: string }).id);
  const engineer = await makePerson('matrix-engineer', { id: firmId, role: 'engineer' });
  const member = await db.selectFrom('member').select('id').where('userId', '=', engineer.id).executeTakeFirstOrThrow();
  return { firmId, memberId: member.id };
}

const adminOnly = (ok: Expectation) => everyone(403, { anon: 401, platformAdmin: ok });
const curatorsOnly = (ok: Expectation) => everyone(403, { anon: 401, platformAdmin: ok, steward: ok });

// The admin area, the vocabulary's curation and the API description.
Object.assign(MATRIX, {
  'GET /api/openapi.json': [{ context: 'public description', request: get(() => '/api/openapi.json'), expect: everyone(200) }],
  'GET /api/admin/vocabulary': [
    { context: 'shared vocabulary with counts', request: get(() => '/api/admin/vocabulary'), expect: curatorsOnly(200) },
  ],
  'POST /api/vocabulary/regions/:id/retirement': [
    {
      context: 'keep a region in use',
      request: () => ({ method: 'POST', path: `/api/vocabulary/regions/${regionId}/retirement`, body: { retired: false } }),
      expect: curatorsOnly(200),
    },
  ],
  'POST /api/vocabulary/units/:id/retirement': [
    {
      context: 'keep a unit in use',
      request: () => ({ method: 'POST', path: `/api/vocabulary/units/${unitId}/retirement`, body: { retired: false } }),
      expect: curatorsOnly(200),
    },
  ],
  'POST /api/vocabulary/units/:id/merge': [
    {
      context: 'two fresh units',
      request: async () => ({
        method: 'POST',
        path: `/api/vocabulary/units/${await freshUnit('merged')}/merge`,
        body: { intoUnitId: await freshUnit('survivor') },
      }),
      expect: curatorsOnly(200),
    },
  ],
  'GET /api/admin/people': [
    {
      context: 'everyone, searched',
      request: get(() => '/api/admin/people?q=example.test&limit=100'),
      expect: adminOnly({ status: 200, check: (r) => expect(Number(asObject(r).total)).toBeGreaterThan(5) }),
    },
  ],
  'POST /api/admin/people/:id/suspension': [
    {
      context: 'a fresh person',
      request: async () => ({
        method: 'POST',
        path: `/api/admin/people/${(await makePerson('matrix-suspended')).id}/suspension`,
        body: { suspended: true, reason: 'Access matrix check.' },
      }),
      expect: adminOnly(200),
    },
  ],
  'GET /api/admin/firms': [{ context: 'every firm', request: get(() => '/api/admin/firms?limit=100'), expect: adminOnly(200) }],
  'POST /api/admin/firms/:id/ownership': [
    {
      context: 'a fresh firm',
      request: async () => {
        const firm = await freshFirm();
        return { method: 'POST', path: `/api/admin/firms/${firm.firmId}/ownership`, body: { newOwnerMemberId: firm.memberId } };
      },
      expect: adminOnly(200),
    },
  ],
  'GET /api/admin/bank-versions': [
    { context: 'published versions', request: get(() => '/api/admin/bank-versions'), expect: curatorsOnly(200) },
  ],
  'GET /api/admin/settings': [{ context: 'bank-wide', request: get(() => '/api/admin/settings'), expect: adminOnly(200) }],
  'PUT /api/admin/settings/disclosure-rule': [
    {
      context: 'the default rule again',
      request: () => ({
        method: 'PUT',
        path: '/api/admin/settings/disclosure-rule',
        body: { minTests: 5, minFirms: 2, maxFirmSharePct: 75 },
      }),
      expect: adminOnly(200),
    },
  ],
} satisfies Record<string, Case[]>);

const signedInPage = (path: string) =>
  everyone(200, { anon: { status: 302, check: (r) => expect(r.location).toBe(`/sign-in?next=${path}`) } });
const PAGES: Record<string, string> = {
  'PAGE /': '/',
  'PAGE /404': '/404',
  'PAGE /bank': '/bank',
  'PAGE /bank/deposits': '/bank/deposits',
  'PAGE /bank/deposits/:slug': '/bank/deposits/saltreach-estuarine-clay',
  'PAGE /bank/statistics': '/bank/statistics?unit=saltreach-estuarine-clay',
  'PAGE /contribute': '/contribute',
  'PAGE /review': '/review',
  'PAGE /estimates': '/estimates',
  'PAGE /sign-in': '/sign-in',
  'PAGE /sign-up': '/sign-up',
  'PAGE /check-email': '/check-email',
  'PAGE /forgot-password': '/forgot-password',
  'PAGE /reset-password': '/reset-password',
  'PAGE /welcome': '/welcome',
  'PAGE /firm': '/firm',
  'PAGE /firm/new': '/firm/new',
  'PAGE /invitations/:id': '/invitations/unknown-invitation',
  'PAGE /dev/inbox': '/dev/inbox',
  'PAGE /audit': '/audit',
  'PAGE /contribute/submissions/:id': '/contribute/submissions/SUBMISSION_A',
  'PAGE /review/:id': '/review/SUBMISSION_A',
  'PAGE /admin': '/admin',
  'PAGE /admin/vocabulary': '/admin/vocabulary',
  'PAGE /admin/people': '/admin/people',
  'PAGE /admin/firms': '/admin/firms',
  'PAGE /admin/versions': '/admin/versions',
  'PAGE /admin/settings': '/admin/settings',
  'PAGE /api-guide': '/api-guide',
};
const signedOutPage = everyone({ status: 302 }, { anon: 200 });
const PAGE_EXPECTATIONS: Record<string, Record<Role, Expectation>> = {
  'PAGE /sign-in': signedOutPage,
  'PAGE /sign-up': signedOutPage,
  'PAGE /404': everyone(404),
  'PAGE /welcome': signedInPage('/welcome'),
  'PAGE /firm': signedInPage('/firm'),
  'PAGE /firm/new': signedInPage('/firm/new'),
  'PAGE /invitations/:id': signedInPage('/invitations/unknown-invitation'),
  'PAGE /contribute': signedInPage('/contribute'),
  'PAGE /review': signedInPage('/review'),
  'PAGE /admin': signedInPage('/admin'),
  'PAGE /admin/vocabulary': signedInPage('/admin/vocabulary'),
  'PAGE /admin/people': signedInPage('/admin/people'),
  'PAGE /admin/firms': signedInPage('/admin/firms'),
  'PAGE /admin/versions': signedInPage('/admin/versions'),
  'PAGE /admin/settings': signedInPage('/admin/settings'),
  'PAGE /bank/deposits': signedInPage('/bank/deposits'),
  'PAGE /bank/deposits/:slug': signedInPage('/bank/deposits/saltreach-estuarine-clay'),
  'PAGE /bank/statistics': everyone(200, { anon: 302 }),
  'PAGE /audit': everyone(
    { status: 200, privateMarkersOnly: true },
    { anon: { status: 302, check: (r) => expect(r.location).toBe('/sign-in?next=/audit') } },
  ),
  'PAGE /contribute/submissions/:id': everyone(200, {
    anon: 302,
    aOwner: { status: 200, check: (r) => expect(r.text).toContain(A.submissionId) },
  }),
  'PAGE /review/:id': everyone(200, {
    anon: 302,
    steward: { status: 200, check: (r) => expect(r.text).toContain(A.submissionId) },
  }),
};
for (const [route, path] of Object.entries(PAGES)) {
  MATRIX[route] = [
    {
      context: 'page',
      request: get(() => path.replace('SUBMISSION_A', A.submissionId)),
      expect: PAGE_EXPECTATIONS[route] ?? everyone(200),
    },
  ];
}

/** Strings of one firm that must never appear in an answer to someone outside it. */
function forbiddenFor(role: Role): string[] {
  const firm = FIRM_OF[role];
  const secretsOf = (f: FirmFixture, marker: { project: string; borehole: string }) => [
    marker.project,
    marker.borehole,
    f.unpublishedId,
    f.estimateId,
  ];
  const a = secretsOf(A, PRIVATE_MARKERS.A);
  const b = secretsOf(B, PRIVATE_MARKERS.B);
  if (firm === 'A') return b;
  if (firm === 'B') return a;
  // No firm: the steward may see unpublished (pending) records to review them, never private details.
  const privateOnly = (list: string[]) => [list[0], list[1], list[3]] as string[];
  return role === 'steward' ? [...privateOnly(a), ...privateOnly(b)] : [...a, ...b];
}

async function cookieFor(role: Role, expectation: Expectation): Promise<string | null> {
  if (role === 'anon') return null;
  if (typeof expectation === 'object' && expectation.standIn) {
    const firm = FIRM_OF[role];
    if (!firm) {
      const platformRole = role === 'platformAdmin' ? 'admin' : role === 'steward' ? 'steward' : 'user';
      return sessionCookie((await makePerson(`stand-in-${role}`, undefined, platformRole)).id);
    }
    const firmRole =
      { aOwner: 'owner', aEngineer: 'engineer', aEstimator: 'estimator', aContributor: 'contributor', bAdmin: 'admin' }[
        role as string
      ] ?? 'engineer';
    const person = await makePerson(`stand-in-${role}`, { id: firm === 'A' ? A.firmId : B.firmId, role: firmRole });
    return sessionCookie(person.id);
  }
  if (typeof expectation === 'object' && expectation.freshSession) return sessionCookie(await userIdOf(ROLE_EMAILS[role]));
  return cookies[role];
}

beforeAll(async () => {
  for (const role of ROLES) cookies[role] = role === 'anon' ? null : await sessionCookie(await userIdOf(ROLE_EMAILS[role]));
  const aOwnerId = await userIdOf(ROLE_EMAILS.aOwner);
  const bAdminId = await userIdOf(ROLE_EMAILS.bAdmin);
  A = await makeFirmFixture(await firmIdOf('quillfen'), aOwnerId, PRIVATE_MARKERS.A);
  B = await makeFirmFixture(await firmIdOf('ellery-voss'), bAdminId, PRIVATE_MARKERS.B);
  aContributorMemberId = await memberIdOf(ROLE_EMAILS.aContributor, 'quillfen');
  bEngineerMemberId = await memberIdOf('engineer@ellery-voss.example.test', 'ellery-voss');
  const removable = await makePerson('removable', { id: A.firmId, role: 'contributor' });
  removableMemberId = await memberIdOf(removable.email, 'quillfen');

  const invitation = await call('POST', '/api/firm/invitations', cookies.aOwner, {
    email: 'matrix-invitee@example.test',
    role: 'engineer',
  });
  expect(invitation.status).toBe(201);
  aInvitationId = (asObject(invitation).invitation as { id: string }).id;
  const key = await call('POST', '/api/firm/api-keys', cookies.aOwner, { name: 'matrix partner script' });
  expect(key.status).toBe(201);
  aKeyId = (asObject(key).key as { id: string }).id;
  aKeySecret = String(asObject(key).secret);
  uploadKeySecret = String(
    asObject(await call('POST', '/api/firm/api-keys', cookies.aOwner, { name: 'matrix upload script' })).secret,
  );
  const doomed = await call('POST', '/api/firm/api-keys', cookies.aOwner, { name: 'revoked script' });
  revokedKeySecret = String(asObject(doomed).secret);
  expect((await call('DELETE', `/api/firm/api-keys/${(asObject(doomed).key as { id: string }).id}`, cookies.aOwner)).status).toBe(
    204,
  );

  const vocabulary = await call('GET', '/api/vocabulary', cookies.steward);
  regionId = String(listOf(vocabulary, 'regions')[0]?.id);
  unitId = String(listOf(vocabulary, 'units')[0]?.id);
});

afterAll(async () => {
  await db.destroy();
});

describe('access matrix', () => {
  it('has a row for every route the app serves, and no row for a route that is gone', () => {
    expect(Object.keys(MATRIX).sort()).toEqual(routeInventory());
  });

  for (const [route, cases] of Object.entries(MATRIX)) {
    for (const testCase of cases) {
      it(`${route} — ${testCase.context}`, async () => {
        expect(Object.keys(testCase.expect).sort()).toEqual([...ROLES].sort());
        const statusOf = (e: Expectation) => (typeof e === 'number' ? e : e.status);
        // Refusals first, so a successful delete or leave does not change what later roles see.
        const order = [...ROLES].sort(
          (x, y) => Number(statusOf(testCase.expect[x]) < 300) - Number(statusOf(testCase.expect[y]) < 300),
        );
        const failures: string[] = [];
        for (const role of order) {
          const expectation = testCase.expect[role];
          const request = await testCase.request(role);
          const result = await call(
            request.method,
            request.path,
            await cookieFor(role, expectation),
            request.body,
            request.headers,
          );
          if (result.status !== statusOf(expectation)) {
            failures.push(`${role}: expected ${statusOf(expectation)}, got ${result.status} ${result.text.slice(0, 200)}`);
            continue;
          }
          if (typeof expectation === 'object' && expectation.check) {
            try {
              expectation.check(result);
            } catch (error) {
              failures.push(`${role}: ${(error as Error).message}`);
            }
          }
          // The audit log may quote a record id that a member of the firm typed into a request; what it
          // must never hold is another firm's private details.
          const markersOnly = typeof expectation === 'object' && expectation.privateMarkersOnly;
          const forbidden = markersOnly ? forbiddenFor(role).filter((s) => !/^[0-9a-f-]{36}$/.test(s)) : forbiddenFor(role);
          for (const secret of forbidden) {
            if (result.text.includes(secret)) failures.push(`${role}: the answer contains "${secret}" of another firm`);
          }
        }
        expect(failures).toEqual([]);
      });
    }
  }
});

describe('regressions', () => {
  it("a firm owner cannot change the role of another firm's member, by any route", async () => {
    const before = await db.selectFrom('member').select('role').where('id', '=', bEngineerMemberId).executeTakeFirstOrThrow();
    const attempts = [
      await call('PATCH', `/api/firm/members/${bEngineerMemberId}`, cookies.aOwner, { role: 'admin' }),
      await call('POST', '/api/auth/organization/update-member-role', cookies.aOwner, {
        memberId: bEngineerMemberId,
        role: 'admin',
      }),
      await call('POST', '/api/auth/organization/update-member-role', cookies.aOwner, {
        memberId: bEngineerMemberId,
        role: 'admin',
        organizationId: B.firmId,
      }),
    ];
    for (const attempt of attempts) expect(attempt.status).toBeGreaterThanOrEqual(400);
    const after = await db.selectFrom('member').select('role').where('id', '=', bEngineerMemberId).executeTakeFirstOrThrow();
    expect(after.role).toBe(before.role);
  });

  it('a refused request is written to the audit log', async () => {
    await call('GET', '/api/estimates', cookies.aContributor);
    const entry = await db
      .selectFrom('audit_log')
      .select(['action', 'outcome', 'summary'])
      .where('actor_user_id', '=', await userIdOf(ROLE_EMAILS.aContributor))
      .where('action', '=', 'permission.refused')
      .orderBy('id', 'desc')
      .executeTakeFirstOrThrow();
    expect(entry.outcome).toBe('refused');
    expect(entry.summary).toMatchObject({ resource: 'estimate', action: 'read', path: '/api/estimates' });
  });

  it('the invited person can read and accept their invitation, and lands in the firm', async () => {
    const invitee = await makePerson('invitee');
    const invited = await call('POST', '/api/firm/invitations', cookies.aOwner, { email: invitee.email, role: 'estimator' });
    const invitationId = (asObject(invited).invitation as { id: string }).id;
    const cookie = await sessionCookie(invitee.id);
    const seen = await call('GET', `/api/invitations/${invitationId}`, cookie);
    expect(seen.status).toBe(200);
    expect(asObject(seen).invitation).toMatchObject({ firmName: 'Quillfen Ground Partners', role: 'estimator' });
    const accepted = await call('POST', `/api/invitations/${invitationId}/accept`, cookie);
    expect(accepted.status).toBe(200);
    const firm = await call('GET', '/api/firm', cookie);
    expect(firm.status).toBe(200);
    expect(asObject(firm).myRole).toBe('estimator');
    expect((await call('POST', `/api/invitations/${invitationId}/accept`, cookie)).status).toBe(409);
  });
});
