// The admin area's acts and what the people concerned see afterwards: a renamed unit still matches
// uploads, a merge moves records (new bank version, search index told), a retired unit takes no uploads,
// a suspended person cannot sign in, a firm passes to a new owner, the disclosure rule changes, and each
// act reads in the activity log.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLE_EMAILS } from './support/roles';
import { type CallResult, call, db, makePerson, sessionCookie, userIdOf } from './support/world';

let admin = '';
let steward = '';
let owner = '';
const tag = () => Math.random().toString(36).slice(2, 8);
// biome-ignore lint/suspicious/noExplicitAny: the tests read JSON answers whose shapes the contracts already type
const body = (r: CallResult) => r.body as Record<string, any>;

function csvUpload(unitName: string, rows = 1): FormData {
  const id = tag();
  const lines = ['Borehole / location id,Sample id,Region,Geological unit,Depth top (m),Depth bottom (m),Cc,e0,LL (%)'];
  for (let i = 0; i < rows; i++) lines.push(`ADM-${id}-${i},U${i},Saltreach Estuary,${unitName},${3 + i},${3.4 + i},0.8,2.1,80`);
  const form = new FormData();
  form.append('file', new Blob([lines.join('\n')], { type: 'text/csv' }), `admin-${id}.csv`);
  form.append('options', JSON.stringify({ format: 'csv' }));
  return form;
}

async function newUnit(name: string): Promise<string> {
  const made = await call('POST', '/api/vocabulary/units', steward, { name, genesis: 'estuarine' });
  expect(made.status).toBe(201);
  return body(made).unit.id;
}

/** An upload by firm A's owner naming the unit, accepted by the steward; returns the published record ids. */
async function publishedRecordsIn(unitName: string, rows: number): Promise<string[]> {
  const uploaded = await call('POST', '/api/submissions', owner, csvUpload(unitName, rows));
  expect(uploaded.status, uploaded.text).toBe(201);
  const submissionId = body(uploaded).submission.id;
  const decided = await call('POST', `/api/review/${submissionId}/decision`, steward, { action: 'accept' });
  expect(decided.status, decided.text).toBe(200);
  const records = await db.selectFrom('test_record').select('id').where('submission_id', '=', submissionId).execute();
  return records.map((r) => r.id);
}

async function logTexts(cookie: string, query = ''): Promise<string[]> {
  const log = await call('GET', `/api/audit?limit=200${query}`, cookie);
  expect(log.status, log.text).toBe(200);
  return body(log).entries.map((e: { text: string }) => e.text);
}

beforeAll(async () => {
  admin = await sessionCookie(await userIdOf(ROLE_EMAILS.platformAdmin));
  steward = await sessionCookie(await userIdOf(ROLE_EMAILS.steward));
  owner = await sessionCookie(await userIdOf(ROLE_EMAILS.aOwner));
});

afterAll(async () => {
  await db.destroy();
});

describe('geological units over time', () => {
  it('keeps the old name of a renamed unit as a synonym that uploads still match', async () => {
    const oldName = `Admin Rename Clay ${tag()}`;
    const newName = `${oldName} (renamed)`;
    const id = await newUnit(oldName);
    const renamed = await call('PATCH', `/api/vocabulary/units/${id}`, admin, { name: newName });
    expect(renamed.status, renamed.text).toBe(200);
    expect(body(renamed).unit).toMatchObject({ name: newName, synonyms: [oldName] });

    const checked = await call('POST', '/api/submissions/check', owner, csvUpload(oldName));
    expect(checked.status, checked.text).toBe(200);
    expect(body(checked).errors ?? []).toEqual([]);

    const clash = await call('POST', '/api/vocabulary/units', steward, { name: oldName, genesis: 'alluvial' });
    expect(clash.status).toBe(409);
    expect(body(clash).error.message).toContain(`another name of the geological unit "${newName}"`);
    expect(await logTexts(admin, '&kind=bank')).toContain(
      `Rowan Pike renamed the geological unit “${oldName}” to “${newName}” (the old name still matches uploads).`,
    );
  });

  it('merges a unit into another: records move, a bank version records it, the index is told, uploads follow', async () => {
    const fromName = `Admin Merge From ${tag()}`;
    const from = await newUnit(fromName);
    const into = await newUnit(`Admin Merge Into ${tag()}`);
    const recordIds = await publishedRecordsIn(fromName, 3);
    const outboxBefore = await db
      .selectFrom('search_outbox')
      .select((eb) => eb.fn.max('id').as('id'))
      .executeTakeFirst();

    const merged = await call('POST', `/api/vocabulary/units/${from}/merge`, admin, { intoUnitId: into });
    expect(merged.status, merged.text).toBe(200);
    expect(body(merged)).toMatchObject({ movedRecords: 3, movedPublishedRecords: 3, unit: { mergedIntoId: into } });
    expect(body(merged).into.synonyms).toContain(fromName);

    const moved = await db
      .selectFrom('test_record')
      .select(['geological_unit_id', 'status'])
      .where('id', 'in', recordIds)
      .execute();
    expect(moved.every((r) => r.geological_unit_id === into && r.status === 'published')).toBe(true);
    const version = await db
      .selectFrom('bank_version')
      .selectAll()
      .where('id', '=', body(merged).bankVersion)
      .executeTakeFirstOrThrow();
    expect(version.note).toContain(`"${fromName}" merged into`);
    expect(version.record_count).toBe(3);
    const queued = await db
      .selectFrom('search_outbox')
      .select('entity_id')
      .where('id', '>', Number(outboxBefore?.id ?? 0))
      .where('operation', '=', 'upsert')
      .execute();
    expect(queued.map((q) => q.entity_id)).toEqual(expect.arrayContaining(recordIds));

    const record = await call('GET', `/api/records/${recordIds[0]}`, owner);
    expect(JSON.stringify(record.body)).toContain(body(merged).into.name);
    const upload = await call('POST', '/api/submissions/check', owner, csvUpload(fromName));
    expect(body(upload).errors ?? []).toEqual([]);
    expect((await call('POST', `/api/vocabulary/units/${from}/merge`, admin, { intoUnitId: into })).status).toBe(409);
    expect((await call('POST', `/api/vocabulary/units/${into}/merge`, admin, { intoUnitId: into })).status).toBe(400);
  });

  it('refuses uploads naming a retired unit and keeps its records', async () => {
    const name = `Admin Retired Clay ${tag()}`;
    const id = await newUnit(name);
    const recordIds = await publishedRecordsIn(name, 1);
    const retired = await call('POST', `/api/vocabulary/units/${id}/retirement`, steward, { retired: true });
    expect(retired.status).toBe(200);
    expect(body(retired).unit.retiredAt).not.toBeNull();
    const refused = await call('POST', '/api/submissions/check', owner, csvUpload(name));
    expect(JSON.stringify(refused.body)).toContain('is retired and takes no new uploads');
    expect((await call('GET', `/api/records/${recordIds[0]}`, owner)).status).toBe(200);
    const listed = body(await call('GET', '/api/admin/vocabulary', steward)).units.find((u: { id: string }) => u.id === id);
    expect(listed).toMatchObject({ recordCount: 1 });
    expect((await call('POST', `/api/vocabulary/units/${id}/retirement`, steward, { retired: false })).status).toBe(200);
  });
});

describe('people and firms', () => {
  it('suspends a person: their sessions end and signing in says so plainly; lifting it lets them back', async () => {
    const person = await makePerson('suspend-me');
    const cookie = await sessionCookie(person.id);
    expect((await call('GET', '/api/vocabulary', cookie)).status).toBe(200);
    const suspended = await call('POST', `/api/admin/people/${person.id}/suspension`, admin, {
      suspended: true,
      reason: 'Shared a sign-in with a client.',
    });
    expect(suspended.status, suspended.text).toBe(200);
    expect(body(suspended).person).toMatchObject({ suspended: true, suspendedReason: 'Shared a sign-in with a client.' });
    expect((await call('GET', '/api/vocabulary', cookie)).status).toBe(401);
    const signIn = await call('POST', '/api/session/sign-in', null, { email: person.email, password: 'matrix-test-password' });
    expect(signIn.status).toBe(403);
    expect(body(signIn).error.message).toMatch(/suspended/i);
    const lifted = await call('POST', `/api/admin/people/${person.id}/suspension`, admin, { suspended: false });
    expect(body(lifted).person.suspended).toBe(false);
    const again = await call('POST', '/api/session/sign-in', null, { email: person.email, password: 'matrix-test-password' });
    expect(again.status).toBe(200);
    const self = await call('POST', `/api/admin/people/${await userIdOf(ROLE_EMAILS.platformAdmin)}/suspension`, admin, {
      suspended: true,
      reason: 'Testing.',
    });
    expect(self.status).toBe(403);
    expect(await logTexts(admin, '&kind=people')).toContain('Rowan Pike suspended suspend-me: Shared a sign-in with a client.');
  });

  it('passes a firm to another member: the new owner gets owner controls, the old one becomes admin, both are mailed', async () => {
    const oldOwner = await makePerson('old-owner');
    const made = await call('POST', '/api/firms', await sessionCookie(oldOwner.id), { name: `Admin Handover ${tag()}` });
    const firmId = body(made).firm.id;
    const heir = await makePerson('heir', { id: firmId, role: 'engineer' });
    const firm = body(await call('GET', `/api/admin/firms?q=${encodeURIComponent(body(made).firm.name)}`, admin)).firms[0];
    const heirMember = firm.members.find((m: { userId: string }) => m.userId === heir.id);

    const passed = await call('POST', `/api/admin/firms/${firmId}/ownership`, admin, { newOwnerMemberId: heirMember.memberId });
    expect(passed.status, passed.text).toBe(200);
    expect(body(passed).newOwner).toEqual({ userId: heir.id, name: 'heir' });
    const heirCookie = await sessionCookie(heir.id);
    expect(body(await call('GET', '/api/firm', heirCookie)).myRole).toBe('owner');
    expect((await call('GET', '/api/firm/api-keys', heirCookie)).status).toBe(200);
    expect(body(await call('GET', '/api/firm', await sessionCookie(oldOwner.id))).myRole).toBe('admin');
    const mail = await db
      .selectFrom('mail_outbox')
      .select(['to_address', 'subject'])
      .where('kind', 'like', 'firm_ownership_%')
      .execute();
    expect(mail).toEqual(
      expect.arrayContaining([
        expect.objectContaining({ to_address: heir.email, subject: expect.stringContaining('You now own') }),
        expect.objectContaining({ to_address: oldOwner.email, subject: expect.stringContaining('heir now owns') }),
      ]),
    );
    expect(await logTexts(heirCookie)).toContain(`Rowan Pike passed the ownership of ${body(made).firm.name} to heir.`);
    const wrong = await call('POST', `/api/admin/firms/${firmId}/ownership`, admin, {
      newOwnerMemberId: 'notAMemberOfThisFirm1',
    });
    expect(wrong.status).toBe(400);
  });
});

describe('settings, the log and keys in the wrong place', () => {
  it('changes the disclosure rule within its limits and records before and after', async () => {
    const refused = await call('PUT', '/api/admin/settings/disclosure-rule', admin, {
      minTests: 2,
      minFirms: 1,
      maxFirmSharePct: 99,
    });
    expect(refused.status).toBe(400);
    expect(
      body(refused)
        .error.issues.map((i: { path: string }) => i.path)
        .sort(),
    ).toEqual(['maxFirmSharePct', 'minFirms', 'minTests']);
    const saved = await call('PUT', '/api/admin/settings/disclosure-rule', admin, {
      minTests: 6,
      minFirms: 3,
      maxFirmSharePct: 70,
    });
    expect(saved.status).toBe(200);
    expect(body(await call('GET', '/api/admin/settings', admin)).disclosureRule).toMatchObject({
      value: { minTests: 6, minFirms: 3, maxFirmSharePct: 70 },
      isDefault: false,
    });
    expect((await logTexts(admin, '&kind=people'))[0]).toBe(
      'Rowan Pike set the disclosure rule to at least 6 tests from 3 firms, no firm above 70 %.',
    );
    await call('PUT', '/api/admin/settings/disclosure-rule', admin, { minTests: 5, minFirms: 2, maxFirmSharePct: 75 });
  });

  it('filters the log by person, kind and days, and pages it', async () => {
    const adminId = await userIdOf(ROLE_EMAILS.platformAdmin);
    const mine = body(await call('GET', `/api/audit?person=${adminId}&limit=5`, admin));
    expect(mine.entries.length).toBeGreaterThan(0);
    expect(mine.entries.every((e: { actorUserId: string }) => e.actorUserId === adminId)).toBe(true);
    const next = body(await call('GET', `/api/audit?person=${adminId}&limit=5&offset=5`, admin));
    expect(next.entries.map((e: { id: number }) => e.id)).not.toContain(mine.entries[0].id);
    expect(mine.people.map((p: { name: string }) => p.name)).toContain('Rowan Pike');
    const today = new Date().toISOString().slice(0, 10);
    const dayOf = body(await call('GET', `/api/audit?from=${today}&to=${today}&kind=firm`, admin));
    expect(dayOf.entries.every((e: { action: string }) => e.action.startsWith('firm.'))).toBe(true);
    expect((await call('GET', '/api/audit?from=2026-12-02&to=2026-12-01', admin)).status).toBe(400);
    expect((await call('GET', '/api/audit?kind=everything', admin)).status).toBe(400);
    expect(body(await call('GET', '/api/audit?from=2001-01-01&to=2001-01-02', admin)).total).toBe(0);
  });

  it('tells a firm API key sent to a session endpoint which endpoints take keys', async () => {
    const key = body(await call('POST', '/api/firm/api-keys', owner, { name: `admin test ${tag()}` })).secret;
    const answer = await call('GET', '/api/firm', null, undefined, { 'x-api-key': key });
    expect(answer.status).toBe(401);
    expect(body(answer).error.message).toContain('POST /api/partner/submissions');
    expect(body(answer).error.message).not.toMatch(/readme/i);
    const unknown = await call('GET', '/api/no-such-endpoint', null);
    expect(body(unknown).error.message).not.toMatch(/readme/i);
  });
});
