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

const stamp = Date.now();
const ana = { name: 'Ana Castell', email: `ana.${stamp}@example.test`, password: 'soft estuarine clay at depth' };
const ben = { name: 'Ben Orrin', email: `ben.${stamp}@example.test`, password: 'peat consolidates for years' };
const anaFirm = 'Saltreach Ground Ltd';
const benFirm = 'Vennmoor Soils';

const isLoopback = (url: string) => /^(https?:\/\/127\.0\.0\.1[:/]|data:|blob:)/.test(url);

interface MailMessage {
  to: string[];
  subject: string;
  text: string;
}

/** Mail is sent after the response; wait until the relay has it. */
async function waitForMail(to: string, subjectPart: string): Promise<MailMessage> {
  const url = `${testEnv('CLAYBANK_TEST_INBOX_URL')}/messages?to=${encodeURIComponent(to)}`;
  for (let attempt = 0; attempt < 50; attempt += 1) {
    const body = (await (await fetch(url)).json()) as { messages: MailMessage[] };
    const found = body.messages.find((message) => message.subject.includes(subjectPart));
    if (found) return found;
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  throw new Error(`No mail "${subjectPart}" reached ${to}`);
}

/** Opens the message in the development inbox page and follows its first link to this app. */
async function followMailLink(page: Page, to: string, subjectPart: string, shot?: string): Promise<void> {
  await waitForMail(to, subjectPart);
  await page.goto(`${baseUrl}/dev/inbox`);
  await waitForIslands(page);
  const message = page.getByTestId('inbox-message').filter({ hasText: to }).filter({ hasText: subjectPart });
  await message.getByRole('button').click();
  if (shot) await screenshot(page, shot);
  await message.getByRole('link').first().click();
}

async function signUp(page: Page, person: typeof ana): Promise<void> {
  await page.goto(`${baseUrl}/sign-up`);
  await waitForIslands(page);
  await page.getByLabel('Your name').fill(person.name);
  await page.getByLabel('Work e-mail address').fill(person.email);
  await page.getByLabel('Password').fill(person.password);
  await paceAuthAttempt('sign-up');
  await page.getByRole('button', { name: 'Create account' }).click();
  await page.waitForURL(`${baseUrl}/check-email`);
}

async function headerFirm(page: Page): Promise<string | null> {
  const switcher = page.getByTestId('firm-switcher');
  if (await switcher.count()) return switcher.locator('option:checked').textContent();
  return page.getByTestId('active-firm').textContent();
}

describe('accounts and firms, end to end in a real browser', () => {
  it('checks the sign-up form in the browser before anything is sent', async () => {
    const { page } = session;
    await page.goto(`${baseUrl}/sign-up`);
    await waitForIslands(page);
    await page.getByLabel('Work e-mail address').fill('not-an-address');
    await page.getByLabel('Password').fill('short');
    await paceAuthAttempt('sign-up');
    await page.getByRole('button', { name: 'Create account' }).click();
    await expect(page.getByTestId('sign-up-name-error').textContent()).resolves.toBe('Enter your name.');
    await expect(page.getByTestId('sign-up-email-error').textContent()).resolves.toContain('name@firm.com');
    await expect(page.getByTestId('sign-up-password-error').textContent()).resolves.toContain('at least 10 characters');
    expect(await page.getByLabel('Password').getAttribute('aria-invalid')).toBe('true');
    expect(page.url()).toBe(`${baseUrl}/sign-up`);
    await screenshot(page, 'flow-00-sign-up-checks');
  });

  it('signs up a new person, who confirms the address from the development inbox and lands signed in', async () => {
    const { page } = session;
    await signUp(page, ana);
    await expect(page.getByTestId('check-email').textContent()).resolves.toContain('confirmation link');
    await screenshot(page, 'flow-01-signed-up');

    await followMailLink(page, ana.email, 'Confirm your e-mail address', 'flow-02-verification-mail');
    await page.waitForURL(`${baseUrl}/welcome`);
    await waitForIslands(page);
    await expect(page.getByRole('heading', { level: 1 }).textContent()).resolves.toBe(`Welcome, ${ana.name}`);
    await expect(page.getByTestId('identity-name').textContent()).resolves.toBe(ana.name);
    expect(await page.getByTestId('welcome-no-firm').isVisible()).toBe(true);
    await screenshot(page, 'flow-03-welcome');
  });

  it('creates a firm, invites a colleague as engineer and issues an API key', async () => {
    const { page } = session;
    await page.getByTestId('create-firm-link').click();
    await page.waitForURL(`${baseUrl}/firm/new`);
    await waitForIslands(page);
    await page.getByLabel('Firm name').fill(anaFirm);
    await page.getByRole('button', { name: 'Create the firm' }).click();
    await page.waitForURL(`${baseUrl}/firm`);
    await waitForIslands(page);
    const owner = page.getByTestId('member-row').filter({ hasText: ana.email });
    await expect(owner.getByTestId('member-role').textContent()).resolves.toBe('Firm owner');
    await expect(headerFirm(page)).resolves.toContain(anaFirm);
    await screenshot(page, 'flow-04-firm-created');

    await page.getByLabel('E-mail address').fill(ben.email);
    await page.getByLabel('Role', { exact: true }).selectOption('engineer');
    await page.getByRole('button', { name: 'Send invitation' }).click();
    const invitation = page.getByTestId('invitation-row').filter({ hasText: ben.email });
    await expect(invitation.textContent()).resolves.toContain('Engineer');
    await expect(page.getByTestId('form-success').textContent()).resolves.toBe(`Invitation sent to ${ben.email}.`);
    await screenshot(page, 'flow-05-invited');

    await page.getByLabel('Key name').fill('nightly lab export');
    await page.getByRole('button', { name: 'Create key' }).click();
    await expect(page.getByTestId('new-api-key-secret').inputValue()).resolves.toMatch(/^cbk_/);
    await expect(page.getByTestId('new-api-key').textContent()).resolves.toContain('only time it is shown');
    const keyRow = page.getByTestId('api-key-row').filter({ hasText: 'nightly lab export' });
    await expect(keyRow.textContent()).resolves.toContain('cbk_');
    await screenshot(page, 'flow-06-api-key');
    await page.getByRole('button', { name: 'I have stored it' }).click();
    await keyRow.getByTestId('revoke-api-key').click();
    await keyRow.getByTestId('revoke-api-key-confirm').click();
    await keyRow.waitFor({ state: 'detached' });

    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(`${baseUrl}/`);
    await waitForIslands(page);
    expect(await page.getByTestId('sign-in-link').isVisible()).toBe(true);
  });

  it('lets the colleague sign up, accept the invitation from the mail and work in that firm', async () => {
    const { page } = session;
    await signUp(page, ben);
    await followMailLink(page, ben.email, 'Confirm your e-mail address');
    await page.waitForURL(`${baseUrl}/welcome`);
    await waitForIslands(page);
    await expect(page.getByTestId('identity-name').textContent()).resolves.toBe(ben.name);
    await screenshot(page, 'flow-07-colleague-welcome');

    await followMailLink(page, ben.email, `invited you to ${anaFirm}`);
    await page.waitForURL(/\/invitations\/[^/]+$/);
    await waitForIslands(page);
    await expect(page.getByTestId('invitation-firm').textContent()).resolves.toBe(anaFirm);
    await expect(page.getByTestId('invitation-role').textContent()).resolves.toBe('Engineer');
    await screenshot(page, 'flow-08-invitation');

    await page.getByRole('button', { name: `Join ${anaFirm}` }).click();
    await page.waitForURL(`${baseUrl}/firm`);
    await waitForIslands(page);
    await expect(headerFirm(page)).resolves.toBe(`${anaFirm} · Engineer`);
    await expect(page.getByTestId('member-row').count()).resolves.toBe(2);
    expect(await page.getByTestId('member-role-select').count()).toBe(0);
    expect(await page.getByTestId('invite-panel').count()).toBe(0);
    expect(await page.getByTestId('api-keys-panel').count()).toBe(0);
    await screenshot(page, 'flow-09-joined');
  });

  it('lets the colleague start a firm of their own and switch between firms from the header', async () => {
    const { page } = session;
    await page.getByRole('link', { name: 'Create another firm' }).click();
    await page.waitForURL(`${baseUrl}/firm/new`);
    await waitForIslands(page);
    await page.getByLabel('Firm name').fill(benFirm);
    await page.getByRole('button', { name: 'Create the firm' }).click();
    await page.waitForURL(`${baseUrl}/firm`);
    await waitForIslands(page);
    await expect(headerFirm(page)).resolves.toBe(`${benFirm} (Firm owner)`);
    await page.getByText(`${benFirm} · your role: Firm owner`).waitFor();
    await screenshot(page, 'flow-10-second-firm');

    await page.getByLabel('Active firm').selectOption({ label: `${anaFirm} (Engineer)` });
    await page.getByText(`${anaFirm} · your role: Engineer`).waitFor();
    await waitForIslands(page);
    await expect(headerFirm(page)).resolves.toBe(`${anaFirm} (Engineer)`);
    await expect(page.getByTestId('member-row').filter({ hasText: ana.email }).textContent()).resolves.toContain('Firm owner');
    await screenshot(page, 'flow-11-switched-firm');

    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(`${baseUrl}/`);
  });

  it('sends a signed-out visitor to sign in and back to the page they asked for', async () => {
    const { page } = session;
    await page.goto(`${baseUrl}/firm`);
    await page.waitForURL(`${baseUrl}/sign-in?next=/firm`);
    await waitForIslands(page);
    await screenshot(page, 'flow-12-sign-in');
    await page.getByLabel('E-mail address').fill(ana.email);
    await page.getByLabel('Password').fill(ana.password);
    await paceAuthAttempt('sign-in');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(`${baseUrl}/firm`);
    await waitForIslands(page);
    const benRow = page.getByTestId('member-row').filter({ hasText: ben.email });
    const roleSaved = page.waitForResponse(
      (response) => response.url().includes('/api/firm/members/') && response.request().method() === 'PATCH',
    );
    await benRow.getByLabel(`Role of ${ben.name}`).selectOption('estimator');
    expect((await roleSaved).status()).toBe(200);
    await page.reload();
    await waitForIslands(page);
    await expect(
      page.getByTestId('member-row').filter({ hasText: ben.email }).getByLabel(`Role of ${ben.name}`).inputValue(),
    ).resolves.toBe('estimator');
    await screenshot(page, 'flow-13-signed-in-again');
  });

  it('resets a forgotten password from the mailed link and signs in with the new one', async () => {
    const { page } = session;
    const newPassword = 'overconsolidated glacial clay';
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(`${baseUrl}/`);
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByRole('link', { name: 'Forgot your password?' }).click();
    await page.waitForURL(`${baseUrl}/forgot-password`);
    await waitForIslands(page);
    await page.getByLabel('E-mail address').fill(ana.email);
    await page.getByRole('button', { name: 'Send a reset link' }).click();
    await expect(page.getByTestId('form-success').textContent()).resolves.toContain('reset link is on its way');
    await screenshot(page, 'flow-14-reset-asked');

    await followMailLink(page, ana.email, 'Reset your Claybank password');
    await page.waitForURL(/\/reset-password\?token=/);
    await waitForIslands(page);
    await page.getByLabel('New password').fill(newPassword);
    await page.getByRole('button', { name: 'Save the new password' }).click();
    await expect(page.getByTestId('form-success').textContent()).resolves.toContain('password is changed');
    await screenshot(page, 'flow-15-password-reset');

    await page.getByRole('link', { name: 'Sign in' }).last().click();
    await page.waitForURL(`${baseUrl}/sign-in`);
    await waitForIslands(page);
    await page.getByLabel('E-mail address').fill(ana.email);
    await page.getByLabel('Password').fill(newPassword);
    await paceAuthAttempt('sign-in');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(`${baseUrl}/welcome`);
    await expect(page.getByTestId('welcome-with-firm').textContent()).resolves.toContain(anaFirm);
  });

  it('raised no browser errors and sent no request beyond this machine', () => {
    expect(session.errors).toEqual([]);
    expect(session.requests.filter((url) => !isLoopback(url))).toEqual([]);
  });
});
