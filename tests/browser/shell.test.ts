import nodemailer from 'nodemailer';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testEnv } from '../support/env';
import { type BrowserSession, baseUrl, openBrowser, screenshot, waitForIslands } from './support/browser';

let session: BrowserSession;
beforeAll(async () => {
  session = await openBrowser();
});
afterAll(async () => {
  await session.close();
});

const isLoopback = (url: string) => /^(https?:\/\/127\.0\.0\.1[:/]|data:|blob:)/.test(url);

describe('the shell in a real browser', () => {
  it('serves the home page in Public Sans from this server, with no request leaving loopback', async () => {
    const { page } = session;
    await page.goto(`${baseUrl}/`, { waitUntil: 'networkidle' });
    const fontFamily = await page.evaluate(() => getComputedStyle(document.body).fontFamily);
    expect(fontFamily).toMatch(/^"?Public Sans"?/);
    await page.evaluate(() => document.fonts.ready);
    expect(await page.evaluate(() => document.fonts.check('16px "Public Sans"'))).toBe(true);
    const fontFiles = session.requests.filter((url) => /public-sans.*\.woff2?$/.test(url));
    expect(fontFiles.length).toBeGreaterThan(0);
    expect(fontFiles.every(isLoopback)).toBe(true);
    expect(session.requests.filter((url) => !isLoopback(url))).toEqual([]);
    await expect(page.getByTestId('standing-caution').textContent()).resolves.toContain('Preliminary assessment only');
    await screenshot(page, 'home');
    expect(session.errors).toEqual([]);
  });

  it('shows every area in the navigation with an empty state saying what will be there', async () => {
    const { page } = session;
    for (const [label, path] of [
      ['Bank', '/bank'],
      ['Estimates', '/estimates'],
    ] as const) {
      await page.goto(`${baseUrl}/`);
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: label }).click();
      await page.waitForURL(`${baseUrl}${path}`);
      await expect(page.getByRole('heading', { level: 1 }).textContent()).resolves.toBe(label);
      expect(await page.getByTestId('empty-state').isVisible()).toBe(true);
      expect(await page.locator(`nav a[aria-current="page"]`).textContent()).toContain(label);
    }
    await screenshot(page, 'empty-state-estimates');
  });

  it('sends a signed-out visitor from Contribute, Review and Firm settings to sign in', async () => {
    const { page } = session;
    for (const [label, path] of [
      ['Contribute', '/contribute'],
      ['Review', '/review'],
      ['Firm settings', '/firm'],
    ] as const) {
      await page.goto(`${baseUrl}/`);
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: label }).click();
      await page.waitForURL(`${baseUrl}/sign-in?next=${path}`);
      await expect(page.getByRole('heading', { level: 1 }).textContent()).resolves.toBe('Sign in');
    }
  });

  it('switches to US customary units and remembers it on the server', async () => {
    const { page } = session;
    await page.goto(`${baseUrl}/bank`);
    await page.getByTestId('unit-US').click();
    await page.waitForURL(`${baseUrl}/bank`);
    expect(await page.getByTestId('unit-US').getAttribute('aria-pressed')).toBe('true');
    await page.goto(`${baseUrl}/`);
    await expect(page.getByTestId('current-units').textContent()).resolves.toContain('US customary');
    await page.getByTestId('unit-SI').click();
    await page.waitForURL(`${baseUrl}/`);
    await expect(page.getByTestId('current-units').textContent()).resolves.toContain('SI');
  });

  it('lists mail from the fake SMTP relay in the development inbox, with working links', async () => {
    const subject = `Inbox check ${Date.now()}`;
    const transport = nodemailer.createTransport(testEnv('CLAYBANK_TEST_SMTP_URL'));
    await transport.sendMail({
      from: 'tester@example.test',
      to: 'engineer@example.test',
      subject,
      text: `Open ${baseUrl}/bank to continue.`,
    });
    const { page } = session;
    await page.goto(`${baseUrl}/dev/inbox`);
    await waitForIslands(page);
    const message = page.getByTestId('inbox-message').filter({ hasText: subject });
    await message.getByRole('button').click();
    await message.getByRole('link', { name: `${baseUrl}/bank` }).click();
    await page.waitForURL(`${baseUrl}/bank`);
    await page.goto(`${baseUrl}/dev/inbox`);
    await waitForIslands(page);
    await page.getByTestId('inbox-message').filter({ hasText: subject }).getByRole('button').click();
    await screenshot(page, 'dev-inbox');
    expect(session.errors).toEqual([]);
  });
});
