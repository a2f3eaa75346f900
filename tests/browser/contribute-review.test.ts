import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import Papa from 'papaparse';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testEnv } from '../support/env';
import { type BrowserSession, baseUrl, openBrowser, paceAuthAttempt, screenshot, waitForIslands } from './support/browser';

let session: BrowserSession;
beforeAll(async () => {
  session = await openBrowser();
});
afterAll(async () => {
  await session.close();
});

const DEMO_PASSWORD = 'saltreach-demo-2026';
const contributor = 'contributor@quillfen.example.test';
const steward = 'steward@example.test';
const stamp = Date.now().toString(36).toUpperCase();
const csvName = `quillfen-oedometer-${stamp}.csv`;
const agsName = `quillfen-two-boreholes-${stamp}.ags`;
const returnComment = 'Cc of 0.85 looks high beside e0 2.10 at this depth; check it against the lab sheet.';

const isLoopback = (url: string) => /^(https?:\/\/127\.0\.0\.1[:/]|data:|blob:|about:blank)/.test(url);

interface MailMessage {
  to: string[];
  subject: string;
  text: string;
}

/** Mail leaves through the outbox after the response; poll the relay until it has the message. */
async function waitForMail(to: string, matches: (message: MailMessage) => boolean): Promise<MailMessage> {
  const url = `${testEnv('CLAYBANK_TEST_INBOX_URL')}/messages?to=${encodeURIComponent(to)}`;
  for (let attempt = 0; attempt < 100; attempt += 1) {
    const body = (await (await fetch(url)).json()) as { messages: MailMessage[] };
    const found = body.messages.find(matches);
    if (found) return found;
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  throw new Error(`No matching mail reached ${to}`);
}

/** Signs in through the page, paced so the shared sign-in allowance of 127.0.0.1 is never exceeded. */
async function signIn(page: Page, email: string, next: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in?next=${next}`);
  await waitForIslands(page);
  await page.getByLabel('E-mail address').fill(email);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await paceAuthAttempt('sign-in');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(`${baseUrl}${next}`);
  await waitForIslands(page);
}

async function signOut(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Sign out' }).click();
  await page.waitForURL(`${baseUrl}/`);
}

/** Three tests from the template's example row: unique boreholes and depths, row 3 with LL 900 %. */
function threeRowFile(template: string): string {
  const parsed = Papa.parse<string[]>(template.replace(/^\uFEFF/, ''), { skipEmptyLines: true });
  const [header, example] = parsed.data as [string[], string[]];
  const column = (name: string) => {
    const index = header.indexOf(name);
    if (index < 0) throw new Error(`The template has no "${name}" column`);
    return index;
  };
  const depths = [
    ['6.00', '6.45'],
    ['7.50', '7.95'],
    ['9.00', '9.45'],
  ];
  const rows = depths.map(([top, bottom], i) => {
    const row = [...example];
    row[column('Borehole / location id')] = `BT-${stamp}-${i + 1}`;
    row[column('Sample id')] = `U${i + 1}`;
    row[column('Depth top (m)')] = top ?? '';
    row[column('Depth bottom (m)')] = bottom ?? '';
    if (i === 1) row[column('LL (%)')] = '900';
    return row;
  });
  return `${Papa.unparse([header, ...rows], { newline: '\r\n' })}\r\n`;
}

/** The fixture's three incremental-loading tests, under borehole ids of their own so the firm has no duplicates. */
function agsFile(): string {
  const fixture = readFileSync(join(import.meta.dirname, '../fixtures/import/invented-two-boreholes.ags'), 'utf8');
  return fixture.replaceAll('QF-BH-0', `AG${stamp}-BH-0`);
}

const state = { csvId: '', agsId: '', returnedRecordId: '' };

describe('contributing and reviewing test records, end to end in a real browser', () => {
  it('builds a file from the downloaded template, maps, checks, corrects a cell in the browser and submits it', async () => {
    const { page } = session;
    await signIn(page, contributor, '/contribute');
    await page.getByTestId('upload-workspace').waitFor();
    await page.getByTestId('submissions-list').getByRole('table').or(page.getByTestId('no-submissions')).waitFor();
    await screenshot(page, 'cr-01-contribute');

    const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('template-link').click()]);
    expect(download.suggestedFilename()).toBe('claybank-template.csv');
    const template = readFileSync(await download.path(), 'utf8');
    const csv = threeRowFile(template);

    await page.getByTestId('upload-file').setInputFiles({ name: csvName, mimeType: 'text/csv', buffer: Buffer.from(csv) });
    await page.getByTestId('mapping-step').waitFor();
    await expect(page.getByTestId('delimiter-select').inputValue()).resolves.toBe(',');
    await expect(page.getByTestId('delimiter-source').textContent()).resolves.toContain('found in the header row');
    await expect(page.getByTestId('read-summary').textContent()).resolves.toContain('3 data rows');
    const mappingRow = (header: string) =>
      page.getByTestId('mapping-row').filter({ has: page.getByTestId('mapping-header').getByText(header, { exact: true }) });
    await expect(mappingRow('LL (%)').getByTestId('mapping-field').inputValue()).resolves.toBe('liquidLimitPct');
    await expect(mappingRow('Borehole / location id').getByTestId('mapping-field').inputValue()).resolves.toBe('boreholeId');
    await expect(mappingRow('Depth top (m)').getByTestId('mapping-unit').inputValue()).resolves.toBe('m');
    await expect(mappingRow('cv (NC range) (m²/yr)').getByTestId('mapping-field').inputValue()).resolves.toBe('cvNc');
    expect(await page.getByTestId('mapping-missing').count()).toBe(0);
    await screenshot(page, 'cr-02-columns-matched');

    await page.getByTestId('check-button').click();
    const summary = page.getByTestId('check-summary');
    await summary.waitFor();
    await expect(summary.textContent()).resolves.toContain('1 row to correct');
    const badCell = page.locator(
      '[data-testid="problem-row"][data-row="3"] [data-testid="problem-cell"][data-field="liquidLimitPct"]',
    );
    await expect(badCell.getByTestId('problem-message').textContent()).resolves.toMatch(/LL/);
    await expect(badCell.getByTestId('problem-input').inputValue()).resolves.toBe('900');
    expect(await page.getByTestId('submit-button').isDisabled()).toBe(true);
    await screenshot(page, 'cr-03-row-to-correct');

    await badCell.getByTestId('problem-input').fill('82');
    await page.getByTestId('check-stale').waitFor();
    await page.getByTestId('check-button').click();
    await summary.filter({ hasText: 'No problems found' }).waitFor();
    expect(await page.getByTestId('problem-table').count()).toBe(0);
    await expect(page.getByTestId('edit-list').textContent()).resolves.toContain('Row 3, LL (%): 82');
    const preview = page.getByTestId('shared-preview');
    await expect(preview.getByTestId('shared-preview-row').count()).resolves.toBe(3);
    const previewText = (await preview.getByTestId('shared-preview-table').textContent()) ?? '';
    expect(previewText).toContain('Saltreach Estuarine Clay');
    expect(previewText).not.toContain(`BT-${stamp}`);
    expect(previewText).not.toContain('Quayside Relief Road');
    await expect(preview.getByTestId('private-list').textContent()).resolves.toContain('Borehole / location id');
    await screenshot(page, 'cr-04-what-others-see');

    await page.getByTestId('submit-button').click();
    await page.getByTestId('stored-notice').waitFor();
    state.csvId = ((await page.getByTestId('stored-link').getAttribute('href')) ?? '').split('/').pop() ?? '';
    expect(state.csvId).toMatch(/^[0-9a-f-]{36}$/);
    await page.locator(`[data-testid="submission-row"][data-submission-id="${state.csvId}"]`).waitFor();
    await screenshot(page, 'cr-05-submitted');
  });

  it('uploads an AGS4 file with raw readings, giving the region and the geology code the bank unit', async () => {
    const { page } = session;
    await Promise.all([page.waitForEvent('load'), page.getByRole('button', { name: 'Upload another file' }).click()]);
    await waitForIslands(page);
    await page
      .getByTestId('upload-file')
      .setInputFiles({ name: agsName, mimeType: 'text/plain', buffer: Buffer.from(agsFile()) });
    await page.getByTestId('ags4-step').waitFor();
    await expect(page.getByTestId('read-summary').textContent()).resolves.toContain('3 consolidation tests');
    await page.getByTestId('upload-region').selectOption('Saltreach Estuary');
    await page.getByLabel('Geological unit for SEC').selectOption('Saltreach Estuarine Clay');
    await page.getByTestId('check-button').click();
    await page.getByTestId('check-summary').filter({ hasText: 'No problems found' }).waitFor();
    await expect(page.getByTestId('shared-preview').textContent()).resolves.toContain('loading steps');
    await screenshot(page, 'cr-06-ags4-checked');
    await page.getByTestId('submit-button').click();
    await page.getByTestId('stored-notice').waitFor();
    state.agsId = ((await page.getByTestId('stored-link').getAttribute('href')) ?? '').split('/').pop() ?? '';
    expect(state.agsId).toMatch(/^[0-9a-f-]{36}$/);
    await signOut(page);
  });

  it('lets the steward, told by mail, plot the raw readings of the AGS4 tests and accept them', async () => {
    const { page } = session;
    await waitForMail(steward, (m) => m.text.includes(`/review/${state.agsId}`));
    await waitForMail(steward, (m) => m.text.includes(`/review/${state.csvId}`));
    await signIn(page, steward, '/review');
    await page.goto(`${baseUrl}/contribute`);
    await expect(page.getByTestId('contribute-no-firm').textContent()).resolves.toContain(
      'As a data steward you review what firms submit',
    );
    expect(await page.getByTestId('upload-workspace').count()).toBe(0);
    await screenshot(page, 'cr-16-steward-on-contribute');
    await page.goto(`${baseUrl}/review`);
    await waitForIslands(page);
    await page.getByTestId('review-queue').waitFor();
    const queueRow = (id: string) => page.locator(`[data-testid="queue-row"][data-submission-id="${id}"]`);
    await queueRow(state.agsId).waitFor();
    await queueRow(state.csvId).waitFor();
    await expect(page.getByTestId('queue-totals').textContent()).resolves.toMatch(/submissions? · [\d,]+ test records?/);
    await screenshot(page, 'cr-07-review-queue');

    await queueRow(state.agsId).getByTestId('open-review').click();
    await page.waitForURL(`${baseUrl}/review/${state.agsId}`);
    await waitForIslands(page);
    await page.getByTestId('review-records').waitFor();
    const withReadings = page.getByTestId('review-record').filter({ has: page.getByTestId('toggle-curve') });
    await expect(withReadings.count()).resolves.toBe(3);
    await withReadings.first().getByTestId('toggle-curve').click();
    const chart = page.getByTestId('elog-chart');
    await chart.locator('canvas').waitFor();
    await expect(chart.textContent()).resolves.toMatch(/6 loading and 2 unloading steps, 12\.5 to 400 kPa/);
    await screenshot(page, 'cr-08-elog-curve');

    await page.getByTestId('decide-button').click();
    await expect(page.getByTestId('decision-done').textContent()).resolves.toContain('3 records published in bank version');
  });

  it('shows the CSV records with their pool comparison and returns one record with a comment beside it', async () => {
    const { page } = session;
    await page.goto(`${baseUrl}/review`);
    await waitForIslands(page);
    await page.locator(`[data-testid="queue-row"][data-submission-id="${state.csvId}"]`).getByTestId('open-review').click();
    await page.waitForURL(`${baseUrl}/review/${state.csvId}`);
    await waitForIslands(page);
    const records = page.getByTestId('review-record');
    await records.first().waitFor();
    await expect(records.count()).resolves.toBe(3);
    // The AGS4 tests just published are this unit's pool, so LL is ranked against theirs.
    const llBadge = records.first().locator('[data-value="liquidLimitPct"]').getByTestId('comparison-badge');
    await expect(llBadge.textContent()).resolves.toMatch(/^P\d+/);
    expect(await page.getByTestId('comparison-badge').count()).toBeGreaterThanOrEqual(3 * 8);
    // CSV rows carry no raw readings: each says so instead of a curve.
    await expect(page.getByTestId('no-readings').count()).resolves.toBe(3);
    expect(await page.getByTestId('review-records').textContent()).not.toContain(`BT-${stamp}`);
    await screenshot(page, 'cr-09-review-csv');

    const second = page.locator('[data-testid="review-record"][data-row="2"]');
    state.returnedRecordId = (await second.getAttribute('data-record-id')) ?? '';
    await second.getByTestId('toggle-comment').click();
    await page.getByTestId('record-comment-input').fill(returnComment);
    await page.locator('input[name="decision"][value="return"]').check();
    await page.getByTestId('decision-comment').fill('One record to check; the other two look consistent with the deposit.');
    await expect(page.getByTestId('decide-button').textContent()).resolves.toBe('Return to the firm with 1 record comment');
    await screenshot(page, 'cr-10-return-with-comment');
    await page.getByTestId('decide-button').click();
    await expect(page.getByTestId('decision-done').textContent()).resolves.toContain(
      'Returned to the firm with comments on 1 record',
    );
    await page.locator('[data-testid="review-submission"][data-status="returned"]').waitFor();
    await signOut(page);
  });

  it('lets the contributor read the comment beside the row, correct the value in place and send it back', async () => {
    const { page } = session;
    await waitForMail(
      contributor,
      (m) => m.subject.includes('returned') && m.text.includes(`/contribute/submissions/${state.csvId}`),
    );
    await signIn(page, contributor, `/contribute/submissions/${state.csvId}`);
    await page.locator('[data-testid="submission-detail"][data-status="returned"]').waitFor();
    const returned = page.locator('[data-testid="record-row"][data-status="returned"]');
    await expect(returned.count()).resolves.toBe(1);
    expect(await returned.getAttribute('data-record-id')).toBe(state.returnedRecordId);
    await expect(returned.getByTestId('record-comment').textContent()).resolves.toBe(returnComment);
    await screenshot(page, 'cr-11-returned');

    await returned.getByTestId('correct-record').click();
    const editor = page.getByTestId('record-editor');
    await expect(editor.getByTestId('edit-compressionIndex').inputValue()).resolves.toBe('0.85');
    await editor.getByTestId('edit-compressionIndex').fill('0.78');
    await screenshot(page, 'cr-12-correcting');
    await editor.getByTestId('save-record').click();
    await page.getByTestId('form-success').filter({ hasText: 'Correction saved' }).waitFor();
    await returned
      .locator('[data-field="compressionIndex"]')
      .filter({ hasText: /^0\.78$/ })
      .waitFor();

    await page.getByTestId('resubmit').click();
    await page.locator('[data-testid="submission-detail"][data-status="submitted"]').waitFor();
    await screenshot(page, 'cr-13-sent-back');
    await signOut(page);
  });

  it('lets the steward accept the corrected submission, and the contributor sees every record published', async () => {
    const { page } = session;
    await waitForMail(steward, (m) => m.subject.includes('corrected and sent back') && m.text.includes(`/review/${state.csvId}`));
    await signIn(page, steward, `/review/${state.csvId}`);
    await page.getByTestId('decision-form').waitFor();
    await expect(page.getByTestId('review-records').textContent()).resolves.toContain(returnComment);
    await page.locator('input[name="decision"][value="accept"]').check();
    await page.getByTestId('decide-button').click();
    await expect(page.getByTestId('decision-done').textContent()).resolves.toContain('3 records published in bank version');
    await screenshot(page, 'cr-14-accepted');
    const record = await page.request.get(`${baseUrl}/api/records/${state.returnedRecordId}`);
    expect(record.status()).toBe(200);
    const body = (await record.json()) as { record: { status: string; compressionIndex: number } };
    expect(body.record.status).toBe('published');
    expect(body.record.compressionIndex).toBe(0.78);
    await signOut(page);

    await waitForMail(
      contributor,
      (m) => m.subject.includes('accepted') && m.text.includes(`/contribute/submissions/${state.csvId}`),
    );
    await signIn(page, contributor, `/contribute/submissions/${state.csvId}`);
    await page.locator('[data-testid="submission-detail"][data-status="accepted"]').waitFor();
    const statuses = await page
      .getByTestId('record-row')
      .evaluateAll((rows) => rows.map((row) => row.getAttribute('data-status')));
    expect(statuses).toEqual(['published', 'published', 'published']);
    await expect(page.getByTestId('record-counts').textContent()).resolves.toMatch(/^3 published in bank version \d+$/);
    await screenshot(page, 'cr-15-published');

    await page.goto(`${baseUrl}/review`);
    await expect(page.getByTestId('no-access').textContent()).resolves.toContain('Review is for data stewards');
    expect(await page.getByTestId('review-queue').count()).toBe(0);
    await screenshot(page, 'cr-17-contributor-on-review');
  });

  it('raised no browser errors and sent no request beyond this machine', () => {
    expect(session.errors).toEqual([]);
    expect(session.requests.filter((url) => !isLoopback(url))).toEqual([]);
  });
});
