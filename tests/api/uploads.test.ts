// Uploads through the real endpoint: files made for the purpose get the right answer and a clear
// message, a bad row stores nothing, a repeated file is not stored twice, the shared record never
// carries private details, and the steward's round trip (return with comments, correct, resubmit,
// accept) publishes the records with one digest mail per step.
// source: OWASP ASVS 5.0 §5.2.1–5.2.2 (upload size and type), §2.3.3 (atomic operations).
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MAX_FILE_BYTES } from '../../src/lib/import';
import { testEnv } from '../support/env';
import { call, ctx, db, inTenantTransaction, makePerson, sessionCookie, userIdOf } from './support/world';

const fixtures = join(import.meta.dirname, '../fixtures/import');
const inbox = testEnv('CLAYBANK_TEST_INBOX_URL');
let stewardCookie = '';

interface TestFirm {
  id: string;
  cookie: string;
  ownerEmail: string;
}

/** A new invented firm with its owner signed in, so each test starts with no earlier uploads. */
async function newFirm(label: string): Promise<TestFirm> {
  const owner = await makePerson(`${label}-owner`);
  const firm = await ctx.auth.api.createOrganization({
    body: { name: `Upload test ${label} (invented)`, slug: `upload-${label}-${Date.now()}`, userId: owner.id },
  });
  if (!firm) throw new Error('no firm');
  return { id: firm.id, cookie: await sessionCookie(owner.id), ownerEmail: owner.email };
}

function form(content: BlobPart, fileName: string, options: Record<string, unknown> = {}): FormData {
  const data = new FormData();
  data.append('file', new Blob([content]), fileName);
  data.append('options', JSON.stringify(options));
  return data;
}

const fixture = (name: string) => readFileSync(join(fixtures, name));
type ErrorBody = { error: { code: string; message: string; issues?: { path: string; message: string }[] } };
const errorOf = (body: unknown) => (body as ErrorBody).error;

async function recordCount(firmId: string): Promise<number> {
  const row = await inTenantTransaction(db, { firmId, platformRole: 'user' }, (trx) =>
    trx
      .selectFrom('test_record')
      .select((eb) => eb.fn.countAll<number>().as('n'))
      .where('firm_id', '=', firmId)
      .executeTakeFirstOrThrow(),
  );
  return row.n;
}

async function mailsTo(address: string, subjectPart: string, atLeast = 1): Promise<{ subject: string; text: string }[]> {
  for (let attempt = 0; attempt < 60; attempt++) {
    const { messages } = (await (await fetch(`${inbox}/messages?to=${encodeURIComponent(address)}`)).json()) as {
      messages: { subject: string; text: string }[];
    };
    const matching = messages.filter((m) => m.subject.includes(subjectPart));
    if (matching.length >= atLeast) return matching;
    await new Promise((r) => setTimeout(r, 250));
  }
  return [];
}

beforeAll(async () => {
  stewardCookie = await sessionCookie(await userIdOf('steward@example.test'));
});
afterAll(() => db.destroy());

describe('files made for the purpose', () => {
  it('stores a good CSV whole, private details apart from the shared record', async () => {
    const firm = await newFirm('good');
    const result = await call('POST', '/api/submissions', firm.cookie, form(fixture('good.csv'), 'good.csv'));
    expect(result.status).toBe(201);
    const submission = (result.body as { submission: { id: string; rowCount: number } }).submission;
    expect(submission.rowCount).toBe(4);
    expect(await recordCount(firm.id)).toBe(4);
    const own = await call('GET', `/api/submissions/${submission.id}`, firm.cookie);
    expect(own.text).toContain('QF-BH-01');
    const reviewed = await call('GET', `/api/review/${submission.id}`, stewardCookie);
    expect(reviewed.status).toBe(200);
    expect(reviewed.text).not.toContain('QF-BH-01');
    expect(reviewed.text).not.toContain('fissured at base');
  });

  it('reads a BOM, semicolons and decimal commas', async () => {
    const firm = await newFirm('bom');
    const result = await call(
      'POST',
      '/api/submissions',
      firm.cookie,
      form(fixture('bom-semicolon-decimal-comma.csv'), 'bom.csv'),
    );
    expect(result.status, result.text).toBe(201);
    const id = (result.body as { submission: { id: string } }).submission.id;
    const own = (await call('GET', `/api/submissions/${id}`, firm.cookie)).body as {
      records: { compressionIndex: number | null }[];
    };
    expect(own.records.every((r) => r.compressionIndex === null || (r.compressionIndex > 0.01 && r.compressionIndex < 10))).toBe(
      true,
    );
  });

  it('keeps tabs inside quoted cells as text, never as delimiters', async () => {
    const firm = await newFirm('tabs');
    const result = await call('POST', '/api/submissions', firm.cookie, form(fixture('tabs-in-quoted-cells.csv'), 'tabs.csv'));
    expect(result.status, result.text).toBe(201);
  });

  it.each([
    ['unbalanced-quotes.csv', 422, /quote/i],
    ['header-only.csv', 422, /no (data )?rows|only a header|header/i],
    ['empty.csv', 422, /empty/i],
  ])('refuses %s with %d and says why', async (name, status, message) => {
    const firm = await newFirm('bad-file');
    const result = await call('POST', '/api/submissions', firm.cookie, form(fixture(name), name));
    expect(result.status, result.text).toBe(status);
    expect(errorOf(result.body).message + JSON.stringify(errorOf(result.body).issues ?? [])).toMatch(message);
    expect(await recordCount(firm.id)).toBe(0);
  });

  it('refuses a binary file named .csv', async () => {
    const firm = await newFirm('binary');
    const bytes = new Uint8Array([0x50, 0x4b, 0x03, 0x04, 0x00, 0x00, 0x08, 0x00, 0xff, 0xfe, 0x00, 0x01]);
    const result = await call('POST', '/api/submissions', firm.cookie, form(bytes, 'results.csv'));
    expect(result.status).toBe(422);
    expect(errorOf(result.body).message).toMatch(/binary|spreadsheet|not a text|workbook/i);
  });

  it('refuses an oversized file with 413 before storing anything', async () => {
    const firm = await newFirm('oversized');
    const big = new Uint8Array(MAX_FILE_BYTES + 1).fill(0x61);
    const result = await call('POST', '/api/submissions', firm.cookie, form(big, 'huge.csv'));
    expect(result.status).toBe(413);
    expect(errorOf(result.body).code).toBe('PAYLOAD_TOO_LARGE');
  });

  it('catches stresses typed in psf under kPa headers, and stores them once the unit is chosen', async () => {
    const firm = await newFirm('units');
    const wrong = await call('POST', '/api/submissions', firm.cookie, form(fixture('wrong-units-psf-as-kpa.csv'), 'units.csv'));
    expect(wrong.status).toBe(422);
    expect(JSON.stringify(errorOf(wrong.body).issues)).toMatch(/preconsolidationStress|verticalEffectiveStress/);
    const check = (
      await call('POST', '/api/submissions/check', firm.cookie, form(fixture('wrong-units-psf-as-kpa.csv'), 'units.csv'))
    ).body as {
      columns: { mapping: (string | null)[]; units: Record<string, string> };
    };
    const units = { ...check.columns.units, preconsolidationStress: 'psf', verticalEffectiveStress: 'psf' };
    const right = await call(
      'POST',
      '/api/submissions',
      firm.cookie,
      form(fixture('wrong-units-psf-as-kpa.csv'), 'units.csv', { mapping: check.columns.mapping, units }),
    );
    expect(right.status, right.text).toBe(201);
  });

  it('names every out-of-range value by row and field, and stores nothing', async () => {
    const firm = await newFirm('ranges');
    const result = await call('POST', '/api/submissions', firm.cookie, form(fixture('out-of-range.csv'), 'ranges.csv'));
    expect(result.status).toBe(422);
    const paths = (errorOf(result.body).issues ?? []).map((i) => i.path);
    expect(paths).toEqual(
      expect.arrayContaining([
        expect.stringMatching(/liquidLimitPct$/),
        expect.stringMatching(/initialVoidRatio$/),
        expect.stringMatching(/recompressionIndex$/),
        expect.stringMatching(/depthBottom$/),
      ]),
    );
    expect(await recordCount(firm.id)).toBe(0);
  });

  it('finds duplicates within the file, naming the earlier row', async () => {
    const firm = await newFirm('dupes');
    const result = await call('POST', '/api/submissions', firm.cookie, form(fixture('duplicates.csv'), 'dupes.csv'));
    expect(result.status).toBe(422);
    expect(JSON.stringify(errorOf(result.body).issues)).toMatch(/Same borehole, sample and depths as row \d/);
  });

  it('stores a 100,000-row file whole', async () => {
    const firm = await newFirm('large');
    const lines = ['Borehole,Sample,Region,Geological unit,Depth top (m),Depth bottom (m),Cc,e0,LL (%),wn (%)'];
    for (let i = 0; i < 100_000; i++) {
      lines.push(
        `LG-${Math.floor(i / 20)},U${i % 20},Saltreach Estuary,Saltreach Estuarine Clay,${(i % 20) + 1},${(i % 20) + 1.4},0.8,2.1,80,75`,
      );
    }
    const started = Date.now();
    const result = await call('POST', '/api/submissions', firm.cookie, form(lines.join('\n'), 'large.csv'));
    expect(result.status, result.text.slice(0, 300)).toBe(201);
    expect(await recordCount(firm.id)).toBe(100_000);
    console.log(`100,000-row upload stored in ${((Date.now() - started) / 1000).toFixed(1)} s`);
  }, 120_000);

  it('reads an AGS4 file with its raw readings once its geology codes are matched to units', async () => {
    const firm = await newFirm('ags4');
    const options = { format: 'ags4', region: 'Saltreach Estuary' };
    const check = (
      await call('POST', '/api/submissions/check', firm.cookie, form(fixture('invented-two-boreholes.ags'), 'site.ags', options))
    ).body as {
      geologyCodes: string[];
      notices: string[];
    };
    expect(check.geologyCodes.length).toBeGreaterThan(0);
    expect(check.notices.join(' ')).toMatch(/ISPT/);
    const geologyMap = Object.fromEntries(check.geologyCodes.map((code) => [code, 'Saltreach Estuarine Clay']));
    const result = await call(
      'POST',
      '/api/submissions',
      firm.cookie,
      form(fixture('invented-two-boreholes.ags'), 'site.ags', { ...options, geologyMap }),
    );
    expect(result.status, result.text).toBe(201);
    const submission = (result.body as { submission: { rowCount: number; incrementCount: number } }).submission;
    expect(submission.rowCount).toBe(3);
    expect(submission.incrementCount).toBeGreaterThan(0);
  });
});

describe('all or nothing', () => {
  it('a file with one bad row among good ones stores nothing, and the corrected file is stored once', async () => {
    const firm = await newFirm('atomic');
    const header = 'Borehole,Sample,Region,Geological unit,Depth top (m),Depth bottom (m),Cc,e0';
    const good = Array.from(
      { length: 30 },
      (_, i) => `AT-1,U${i},Saltreach Estuary,Saltreach Estuarine Clay,${i + 1},${i + 1.4},0.8,2.1`,
    );
    const bad = [...good.slice(0, 29), 'AT-1,U29,Saltreach Estuary,Saltreach Estuarine Clay,30,29,0.8,2.1'];
    const refused = await call('POST', '/api/submissions', firm.cookie, form([header, ...bad].join('\n'), 'atomic.csv'));
    expect(refused.status).toBe(422);
    expect(await recordCount(firm.id)).toBe(0);
    const stored = await call('POST', '/api/submissions', firm.cookie, form([header, ...good].join('\n'), 'atomic.csv'));
    expect(stored.status).toBe(201);
    const again = await call('POST', '/api/submissions', firm.cookie, form([header, ...good].join('\n'), 'atomic.csv'));
    expect(again.status, again.text).toBe(409);
    expect((again.body as ErrorBody).error).toMatchObject({
      code: 'CONFLICT',
      message: expect.stringMatching(/already uploaded/),
    });
    expect(await recordCount(firm.id)).toBe(30);
  });
});

describe('partner uploads by API key', () => {
  it('accepts JSON rows and names the bad ones by position', async () => {
    const firm = await newFirm('partner');
    const key = (await call('POST', '/api/firm/api-keys', firm.cookie, { name: 'lab export' })).body as { secret: string };
    const rows = [
      {
        boreholeId: 'PT-1',
        sampleId: 'U1',
        region: 'Saltreach Estuary',
        geologicalUnit: 'Saltreach Estuarine Clay',
        depthTop: 4,
        depthBottom: 4.4,
        compressionIndex: 0.7,
      },
      {
        boreholeId: 'PT-1',
        sampleId: 'U2',
        region: 'Saltreach Estuary',
        geologicalUnit: 'Saltreach Estuarine Clay',
        depthTop: 6,
        depthBottom: 5,
        compressionIndex: 0.7,
      },
    ];
    const refused = await call('POST', '/api/partner/submissions', null, { rows }, { 'x-api-key': key.secret });
    expect(refused.status).toBe(422);
    expect((errorOf(refused.body).issues ?? []).map((i) => i.path)).toContain('rows.2.depthBottom');
    const stored = await call('POST', '/api/partner/submissions', null, { rows: [rows[0]] }, { 'x-api-key': key.secret });
    expect(stored.status, stored.text).toBe(201);
    expect(await recordCount(firm.id)).toBe(1);
  });
});

describe('partner rows carrying what the bank sets', () => {
  it('refuses each such key with 400 naming the key and the row, and stores nothing', async () => {
    const firm = await newFirm('partner-keys');
    const key = (await call('POST', '/api/firm/api-keys', firm.cookie, { name: 'lab export' })).body as { secret: string };
    const row = {
      boreholeId: 'PK-1',
      region: 'Saltreach Estuary',
      geologicalUnit: 'Saltreach Estuarine Clay',
      depthTop: 4,
      depthBottom: 4.4,
      compressionIndex: 0.7,
    };
    for (const bankKey of ['firmId', 'status', 'id', 'publishedAt', 'bankVersion', 'submissionId', 'ownerId']) {
      const rows = [row, { ...row, depthTop: 5, depthBottom: 5.4, [bankKey]: 'set-by-me' }];
      const refused = await call('POST', '/api/partner/submissions', null, { rows }, { 'x-api-key': key.secret });
      expect(refused.status, bankKey).toBe(400);
      const issue = (errorOf(refused.body).issues ?? []).find((i) => i.path === `rows.2.${bankKey}`);
      expect(issue?.message, bankKey).toContain(`"${bankKey}" is set by the bank`);
    }
    expect(await recordCount(firm.id)).toBe(0);
  });
});

describe('text a spreadsheet may run as a formula', () => {
  it('is stored as typed and flagged for the steward on the review page', async () => {
    const firm = await newFirm('formula');
    const key = (await call('POST', '/api/firm/api-keys', firm.cookie, { name: 'lab export' })).body as { secret: string };
    const row = {
      boreholeId: 'FX-1',
      region: 'Saltreach Estuary',
      geologicalUnit: 'Saltreach Estuarine Clay',
      depthTop: 4,
      depthBottom: 4.4,
      compressionIndex: 0.7,
      samplingMethod: "=cmd|' /C calc'!A0",
    };
    const stored = await call('POST', '/api/partner/submissions', null, { rows: [row] }, { 'x-api-key': key.secret });
    expect(stored.status, stored.text).toBe(201);
    const submissionId = (stored.body as { submission: { id: string } }).submission.id;
    const review = (await call('GET', `/api/review/${submissionId}`, stewardCookie)).body as {
      records: { samplingMethod: string; importFlags: { field: string; reason: string }[] }[];
    };
    const [record] = review.records;
    expect(record?.samplingMethod).toBe(row.samplingMethod);
    expect(record?.importFlags).toEqual([
      expect.objectContaining({ field: 'samplingMethod', reason: expect.stringContaining('may run as a formula') }),
    ]);
  });
});

describe('review round trip', () => {
  it('returns a record with a comment, takes the correction, and publishes on acceptance', async () => {
    const firm = await newFirm('roundtrip');
    const upload = await call('POST', '/api/submissions', firm.cookie, form(fixture('good.csv'), 'good.csv'));
    const submissionId = (upload.body as { submission: { id: string } }).submission.id;
    const stewardMail = await mailsTo('steward@example.test', 'Upload test roundtrip');
    expect(stewardMail.length).toBe(1);
    expect(stewardMail[0]?.text).toContain(`/review/${submissionId}`);

    const review = (await call('GET', `/api/review/${submissionId}`, stewardCookie)).body as {
      records: { id: string; rowNumber: number }[];
    };
    const [first, second] = review.records;
    if (!first || !second) throw new Error('expected records');
    const returned = await call('POST', `/api/review/${submissionId}/decision`, stewardCookie, {
      action: 'return',
      recordComments: [
        { recordId: first.id, comment: 'Check Cc against the curve.' },
        { recordId: second.id, comment: 'Confirm the sample depth.' },
      ],
    });
    expect(returned.status).toBe(200);
    const digest = await mailsTo(firm.ownerEmail, 'returned');
    expect(digest.length).toBe(1);
    expect(digest[0]?.text).toContain('Check Cc against the curve.');
    expect(digest[0]?.text).toContain('Confirm the sample depth.');

    const own = (await call('GET', `/api/submissions/${submissionId}`, firm.cookie)).body as {
      records: { id: string; reviewComment: string | null; status: string }[];
    };
    expect(own.records.find((r) => r.id === first.id)).toMatchObject({
      status: 'returned',
      reviewComment: 'Check Cc against the curve.',
    });
    const badFix = await call('PATCH', `/api/submissions/${submissionId}/records/${first.id}`, firm.cookie, {
      values: { compressionIndex: 40 },
    });
    expect(badFix.status).toBe(400);
    expect((errorOf(badFix.body).issues ?? []).map((i) => i.path)).toContain('values.compressionIndex');
    const fix = await call('PATCH', `/api/submissions/${submissionId}/records/${first.id}`, firm.cookie, {
      values: { compressionIndex: 0.88 },
    });
    expect(fix.status, fix.text).toBe(200);
    expect((await call('POST', `/api/submissions/${submissionId}/resubmit`, firm.cookie)).status).toBe(200);

    const accepted = await call('POST', `/api/review/${submissionId}/decision`, stewardCookie, { action: 'accept' });
    expect(accepted.status).toBe(200);
    expect((accepted.body as { submission: { published: number; bankVersion: number } }).submission.published).toBe(4);
    const published = await call(
      'GET',
      `/api/records/${first.id}`,
      await sessionCookie(await userIdOf('engineer@ellery-voss.example.test')),
    );
    expect(published.status).toBe(200);
    expect((published.body as { record: { compressionIndex: number; status: string } }).record).toMatchObject({
      compressionIndex: 0.88,
      status: 'published',
    });
    expect(published.text).not.toContain('QF-BH-01');

    const audit = await db.selectFrom('audit_log').select('action').where('object_id', '=', submissionId).execute();
    expect(audit.map((a) => a.action)).toEqual(
      expect.arrayContaining(['submission.uploaded', 'submission.returned', 'submission.resubmitted', 'submission.accepted']),
    );
  });
});
