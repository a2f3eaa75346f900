import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { type BrowserSession, baseUrl, openBrowser, paceAuthAttempt, screenshot, waitForIslands } from './support/browser';

// The platform admin renames a unit, merges two units and passes a firm's ownership in the admin area;
// the people concerned see each change (a contributor's upload with the old name is matched, their
// records show under the surviving unit, the new owner has owner controls) and the activity log says
// what happened. The admin's and the steward's landings send them to their own work.

let session: BrowserSession;
beforeAll(async () => {
  session = await openBrowser();
  await session.page.setViewportSize({ width: 1440, height: 900 });
});
afterAll(async () => {
  await session.close();
});

const DEMO_PASSWORD = 'saltreach-demo-2026';
const admin = 'admin@example.test';
const steward = 'steward@example.test';
const contributor = 'contributor@quillfen.example.test';
const newOwner = 'contributor@northmarch.example.test';
const stamp = Date.now().toString(36).toUpperCase();
const units = {
  renamed: `Browser Old Clay ${stamp}`,
  renamedTo: `Browser Harbour Clay ${stamp}`,
  merged: `Browser Fen Silt ${stamp}`,
  survivor: `Browser Marsh Silt ${stamp}`,
};
const state = { submissionId: '' };

async function signIn(page: Page, email: string, next: string): Promise<void> {
  await page.context().clearCookies();
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

/** An API call with the page's session, as the app's own pages make it. */
async function api(page: Page, method: 'GET' | 'POST', path: string, data?: unknown) {
  const response = await page.request.fetch(`${baseUrl}${path}`, {
    method,
    headers: {
      origin: baseUrl,
      ...(data && !(data as { multipart?: unknown }).multipart ? { 'content-type': 'application/json' } : {}),
    },
    ...(data ? ((data as { multipart?: unknown }).multipart ? (data as object) : { data: JSON.stringify(data) }) : {}),
  });
  return { status: response.status(), body: (await response.json()) as Record<string, unknown> };
}

function csv(label: string, unit: string, rows: number): { multipart: Record<string, unknown> } {
  const lines = ['Borehole / location id,Sample id,Region,Geological unit,Depth top (m),Depth bottom (m),Cc,e0,LL (%)'];
  for (let i = 0; i < rows; i++)
    lines.push(`BR-${stamp}-${label}-${i},U${i},Saltreach Estuary,${unit},${4 + i},${4.4 + i},0.8,2.1,80`);
  return {
    multipart: {
      file: { name: `browser-${stamp}-${label}.csv`, mimeType: 'text/csv', buffer: Buffer.from(lines.join('\n')) },
      options: JSON.stringify({ format: 'csv' }),
    },
  };
}

const entry = (page: Page, name: string) => page.locator(`[data-testid="vocabulary-entry"][data-name="${name}"]`);

describe('the admin area, as the people concerned see it', () => {
  it('lands the platform admin on their own work, not on starting a firm', async () => {
    const { page } = session;
    await signIn(page, admin, '/welcome');
    expect(await page.getByTestId('welcome-platform-role').isVisible()).toBe(true);
    expect(await page.getByTestId('create-firm-link').count()).toBe(0);
    expect(await page.getByTestId('no-firm').count()).toBe(0);
    const steps = await page.getByTestId('next-step').evaluateAll((items) => items.map((i) => i.getAttribute('data-href')));
    expect(steps[0]).toBe('/admin');
    expect(steps).not.toContain('/contribute');
    await expect(page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Admin' }).count()).resolves.toBe(1);
    await screenshot(page, 'admin-welcome');
    for (const name of [units.renamed, units.merged, units.survivor]) {
      expect((await api(page, 'POST', '/api/vocabulary/units', { name, genesis: 'estuarine' })).status).toBe(201);
    }
    await page.goto(`${baseUrl}/admin`);
    await expect(page.getByTestId('admin-sections').textContent()).resolves.toContain('Bank versions');
    await screenshot(page, 'admin-home');
    await signOut(page);
  });

  it('has a contributor upload two tests into the unit that will be merged', async () => {
    const { page } = session;
    await signIn(page, contributor, '/welcome');
    const steps = await page.getByTestId('next-step').evaluateAll((items) => items.map((i) => i.textContent ?? ''));
    expect(steps.join(' ')).not.toContain('API keys');
    const uploaded = await api(page, 'POST', '/api/submissions', csv('merged', units.merged, 2));
    expect(uploaded.status, JSON.stringify(uploaded.body)).toBe(201);
    state.submissionId = (uploaded.body.submission as { id: string }).id;
    await signOut(page);
  });

  it('renames a unit, merges two, and passes a firm to a new owner through the admin pages', async () => {
    const { page } = session;
    await signIn(page, admin, '/admin/vocabulary');
    await page.getByTestId('vocabulary-admin').waitFor();

    const renamed = entry(page, units.renamed);
    await renamed.getByRole('button', { name: 'Rename or describe' }).click();
    await renamed.getByLabel('Name of the geological unit').fill(units.renamedTo);
    await renamed.getByTestId('entry-save').click();
    await page.getByTestId('form-success').filter({ hasText: 'Renamed' }).waitFor();
    await entry(page, units.renamedTo).getByTestId('synonyms').filter({ hasText: units.renamed }).waitFor();

    const merged = entry(page, units.merged);
    await merged.getByTestId('merge-open').click();
    await merged.getByTestId('merge-into').selectOption({ label: units.survivor });
    await expect(merged.getByTestId('merge-form').textContent()).resolves.toContain('2 test records move');
    await screenshot(page, 'admin-vocabulary-merge');
    await merged.getByTestId('merge-confirm').click();
    await page.getByTestId('form-success').filter({ hasText: 'Merged' }).waitFor();
    await entry(page, units.merged).getByText(`merged into ${units.survivor}`).waitFor();
    await entry(page, units.survivor).getByTestId('synonyms').filter({ hasText: units.merged }).waitFor();
    await page.setViewportSize({ width: 390, height: 844 });
    await screenshot(page, 'admin-vocabulary-390');
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await page.setViewportSize({ width: 1440, height: 900 });

    await page.goto(`${baseUrl}/admin/firms`);
    await waitForIslands(page);
    await page.getByLabel('Find a firm').fill('Northmarch');
    await page.getByRole('button', { name: 'Search' }).click();
    const firm = page.getByTestId('firm-entry').filter({ hasText: 'Northmarch' });
    await firm.getByTestId('ownership-open').click();
    await firm.getByTestId('ownership-member').selectOption({ label: 'Lena Fisk (Contributor)' });
    await firm.getByTestId('ownership-confirm').click();
    await page.getByTestId('form-success').filter({ hasText: 'Lena Fisk now owns Northmarch' }).waitFor();
    await firm.getByText('Lena Fisk · Firm owner').waitFor();
    await screenshot(page, 'admin-firms-passed');

    await page.goto(`${baseUrl}/admin/versions`);
    await page.getByTestId('bank-versions').waitFor();
    expect(await page.getByTestId('bank-version-row').count()).toBeGreaterThan(0);
    await screenshot(page, 'admin-versions');

    await page.goto(`${baseUrl}/api-guide`);
    await page.getByTestId('partner-quick-start').waitFor();
    expect(await page.getByTestId('api-operation').count()).toBeGreaterThan(40);
    await page.locator('[data-route="POST /api/partner/submissions"] summary').first().click();
    await screenshot(page, 'api-guide');

    await page.goto(`${baseUrl}/audit`);
    await page.getByTestId('activity-log').waitFor();
    await page.getByLabel('Kind').selectOption('bank');
    await page.getByRole('button', { name: 'Show' }).click();
    await page.getByTestId('log-text').filter({ hasText: 'merged the geological unit' }).first().waitFor();
    const bankLog = (await page.getByTestId('log-text').allTextContents()).join('\n');
    expect(bankLog).toContain(`Rowan Pike renamed the geological unit “${units.renamed}” to “${units.renamedTo}”`);
    expect(bankLog).toContain(
      `Rowan Pike merged the geological unit “${units.merged}” into “${units.survivor}”, moving 2 records.`,
    );
    await page.getByTestId('log-entry').first().locator('summary').click();
    await screenshot(page, 'admin-activity-log');
    await page.getByLabel('Kind').selectOption('firm');
    await page.getByRole('button', { name: 'Show' }).click();
    await page.getByTestId('log-text').filter({ hasText: 'passed the ownership of' }).first().waitFor();
    expect(session.errors).toEqual([]);
    await signOut(page);
  });

  it('matches the old unit name in a new upload, and shows merged records under the surviving unit', async () => {
    const { page } = session;
    await signIn(page, contributor, `/contribute/submissions/${state.submissionId}`);
    const checked = await api(page, 'POST', '/api/submissions/check', csv('renamed', units.renamed, 1));
    expect(checked.status).toBe(200);
    expect(checked.body.errors ?? [], JSON.stringify(checked.body.errors)).toEqual([]);
    await page.getByText(units.survivor).first().waitFor();
    expect(await page.getByText(units.merged, { exact: true }).count()).toBe(0);
    await screenshot(page, 'contributor-merged-records');
    await signOut(page);
  });

  it('gives the new owner owner controls and the log entry, and makes the old owner a firm admin', async () => {
    const { page } = session;
    await signIn(page, newOwner, '/firm');
    await expect(page.getByRole('heading', { level: 1 }).locator('..').textContent()).resolves.toContain('Firm owner');
    await page.getByTestId('api-keys-panel').waitFor();
    await page.getByTestId('invite-panel').waitFor();
    await page.getByTestId('key-usage').locator('summary').click();
    await expect(page.getByTestId('key-usage').textContent()).resolves.toContain('POST /api/partner/submissions');
    await screenshot(page, 'new-owner-firm-settings');
    await page.goto(`${baseUrl}/audit`);
    await page.getByTestId('log-text').filter({ hasText: 'Rowan Pike passed the ownership of Northmarch' }).first().waitFor();
    await screenshot(page, 'new-owner-activity-log');
    await signOut(page);
  });

  it('lands the steward on review and curation, never on starting a firm', async () => {
    const { page } = session;
    await signIn(page, steward, '/welcome');
    expect(await page.getByTestId('create-firm-link').count()).toBe(0);
    const steps = await page.getByTestId('next-step').evaluateAll((items) => items.map((i) => i.getAttribute('data-href')));
    expect(steps.slice(0, 2)).toEqual(['/review', '/admin/vocabulary']);
    await expect(page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Curation' }).count()).resolves.toBe(1);
    await screenshot(page, 'steward-welcome');
    await page.goto(`${baseUrl}/admin/people`);
    expect(await page.getByTestId('admin-refused').isVisible()).toBe(true);
    await page.goto(`${baseUrl}/admin`);
    const sections = await page.getByTestId('admin-sections').textContent();
    expect(sections).toContain('Regions and units');
    expect(sections).not.toContain('People');
    await screenshot(page, 'steward-curation');
    expect(session.errors).toEqual([]);
    await signOut(page);
  });
});
