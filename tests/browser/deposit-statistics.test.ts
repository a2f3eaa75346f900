// An engineer reads a deposit's typical values, narrows the depth, reads the Cc–LL chart with its bands
// and published lines, switches to depth profiles and US units, downloads a chart and its data,
// compares two site results and sends the ranges to an estimate; a thin selection shows why no pooled
// figures are given. Screenshots go to .data/test-artifacts/screenshots.
import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseEstimatePrefill } from '../../src/lib/schemas/estimate-prefill';
import { type BrowserSession, baseUrl, openBrowser, paceAuthAttempt, screenshot, waitForIslands } from './support/browser';

let session: BrowserSession;
beforeAll(async () => {
  session = await openBrowser();
});
afterAll(async () => {
  await session.close();
});

const isLoopback = (url: string) => /^(https?:\/\/127\.0\.0\.1[:/]|data:|blob:|about:blank)/.test(url);
const DEPOSIT = '/bank/deposits/saltreach-estuarine-clay';

async function signIn(page: Page, next: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in?next=${next}`);
  await waitForIslands(page);
  await page.getByLabel('E-mail address').fill('engineer@quillfen.example.test');
  await page.getByLabel('Password').fill('saltreach-demo-2026');
  await paceAuthAttempt('sign-in');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(`${baseUrl}${next}`);
  await waitForIslands(page);
}

describe('a deposit page', () => {
  it('takes an engineer from typical values to an estimate', async () => {
    const { page } = session;
    await signIn(page, '/bank/deposits');
    await page.getByRole('link', { name: 'Saltreach Estuarine Clay' }).click();
    await page.waitForURL(`${baseUrl}${DEPOSIT}`);
    await waitForIslands(page);

    // typical cv NC with n and firms
    const cvCard = page.getByTestId('card-cvNcM2PerYear');
    await cvCard.getByTestId('value-p50').waitFor();
    expect(await cvCard.getByRole('heading').textContent()).toBe('cv NC (m²/yr)');
    const allCounts = (await cvCard.getByTestId('card-counts').textContent()) ?? '';
    expect(allCounts).toMatch(/n = \d+ tests · \d+ firms/);
    expect(Number(/(\d+) firms/.exec(allCounts)?.[1])).toBeGreaterThanOrEqual(2);
    const allN = Number(/n = (\d+)/.exec(allCounts)?.[1]);
    await screenshot(page, 'deposit-typical-values');

    // narrow the depth to 5–15 m
    await page.getByTestId('depth-from').fill('5');
    await page.getByTestId('depth-to').fill('15');
    await page.getByTestId('apply-depth').click();
    await page.waitForURL(/depth=5\.\.15/);
    await expect.poll(async () => (await cvCard.getByTestId('card-counts').textContent()) ?? '').not.toBe(allCounts);
    const narrowN = Number(/n = (\d+)/.exec((await cvCard.getByTestId('card-counts').textContent()) ?? '')?.[1]);
    expect(narrowN).toBeGreaterThan(4);
    expect(narrowN).toBeLessThan(allN);
    await screenshot(page, 'deposit-depth-5-15');

    // the Cc–LL chart with bands and published lines
    await page.getByTestId('tab-correlations').click();
    const chart = page.getByTestId('correlation-chart');
    await chart.waitFor();
    expect(await chart.getByTestId('correlation-chart-summary').textContent()).toContain('90 % confidence band');
    expect(await chart.getByTestId('correlation-chart-summary').textContent()).toContain('prediction band');
    expect(await chart.getByTestId('published-bias').textContent()).toContain('Skempton (1944)');
    await screenshot(page, 'deposit-cc-ll');

    // depth profiles, then US units (the page reloads on the same view)
    await page.getByTestId('tab-profiles').click();
    await page.getByTestId('profile-preconsolidationStressKpa').waitFor();
    await page.getByTestId('unit-US').click();
    await page.waitForURL(/tab=profiles/);
    await waitForIslands(page);
    const sigmaP = page.getByTestId('profile-preconsolidationStressKpa');
    await sigmaP.waitFor();
    expect(await sigmaP.getByTestId('profile-preconsolidationStressKpa-summary').textContent()).toContain('pcf');
    expect(await page.getByText("Water table for the σ'v0 line (ft below ground)").count()).toBe(1);
    expect(page.url()).toContain('depth=5..15');
    await screenshot(page, 'deposit-profiles-us');

    // download the σ'p chart and its data
    const [png] = await Promise.all([page.waitForEvent('download'), sigmaP.getByRole('button', { name: /as PNG/ }).click()]);
    expect(png.suggestedFilename()).toBe('saltreach-estuarine-clay-profile-preconsolidationStressKpa.png');
    const pngBytes = readFileSync((await png.path()) as string);
    expect(pngBytes.subarray(1, 4).toString()).toBe('PNG');
    const [csv] = await Promise.all([page.waitForEvent('download'), sigmaP.getByRole('button', { name: /as CSV/ }).click()]);
    const csvText = readFileSync((await csv.path()) as string, 'utf8');
    expect(csvText.split('\r\n')[0]).toBe("series,Depth (ft),σ'p (psf)");
    expect(csvText).toContain("in-situ σ'v0");

    // compare two site results (US units: Cc has none)
    await page.getByTestId('tab-compare').click();
    await page.getByTestId('compare-values-0').fill('0.75, 9');
    await page.getByTestId('compare-submit').click();
    const result = page.getByTestId('compare-compressionIndex');
    await result.waitFor();
    expect(await result.getByTestId('compare-row').count()).toBe(2);
    expect(await result.getByTestId('compare-outlier').nth(1).textContent()).toContain('far above');
    await screenshot(page, 'deposit-compare');

    // send the ranges to an estimate
    await page.getByTestId('tab-typical').click();
    const send = page.getByTestId('use-in-estimate');
    await send.waitFor();
    const href = (await send.getAttribute('href')) ?? '';
    expect(href.startsWith('/estimates/new?')).toBe(true);
    const prefill = parseEstimatePrefill(new URL(href, baseUrl).searchParams);
    expect(prefill.success, JSON.stringify(prefill.error?.issues)).toBe(true);
    expect(prefill.data).toMatchObject({ unit: 'saltreach-estuarine-clay', depth: { min: 5, max: 15 } });
    expect(prefill.data?.cvNc?.p50).toBeGreaterThan(0);
    expect(prefill.data?.cc?.p10).toBeLessThan(prefill.data?.cc?.p90 as number);

    expect(session.errors).toEqual([]);
    expect(session.requests.filter((url) => !isLoopback(url))).toEqual([]);
  });

  it('explains a thin selection instead of showing pooled numbers', async () => {
    const { page } = session;
    await page.goto(`${baseUrl}${DEPOSIT}?depth=10..10.5`);
    await waitForIslands(page);
    const cvCard = page.getByTestId('card-cvNcM2PerYear');
    await cvCard.getByTestId('withheld').waitFor();
    expect(await cvCard.getByTestId('withheld').textContent()).toContain('Figures pooled across firms are not shown');
    expect(await cvCard.getByTestId('value-p50').count()).toBe(0);
    await screenshot(page, 'deposit-thin-selection');
    expect(session.errors).toEqual([]);
  });
});
