import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { type BrowserContext, chromium, type Page } from 'playwright-core';
import { testEnv } from '../../support/env';

export const baseUrl = testEnv('CLAYBANK_TEST_BASE_URL');
const artifacts = join(testEnv('CLAYBANK_TEST_ARTIFACTS'), 'screenshots');

export interface BrowserSession {
  context: BrowserContext;
  page: Page;
  /** Every URL the page requested, to prove nothing left loopback. */
  requests: string[];
  /** Console errors and uncaught page errors. */
  errors: string[];
  close(): Promise<void>;
}

/** Debian's Chromium, headless, with a fresh profile and no background traffic. */
export async function openBrowser(): Promise<BrowserSession> {
  const profile = mkdtempSync(join(tmpdir(), 'claybank-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: '/usr/bin/chromium',
    headless: true,
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
    viewport: { width: 1280, height: 860 },
  });
  const page = context.pages()[0] ?? (await context.newPage());
  const requests: string[] = [];
  const errors: string[] = [];
  page.on('request', (request) => requests.push(request.url()));
  page.on('console', (message) => {
    if (message.type() === 'error') errors.push(message.text());
  });
  page.on('pageerror', (error) => errors.push(error.message));
  return {
    context,
    page,
    requests,
    errors,
    async close() {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

/** Saves a full-page screenshot under .data/test-artifacts/screenshots and returns its path. */
export async function screenshot(page: Page, name: string): Promise<string> {
  mkdirSync(artifacts, { recursive: true });
  const path = join(artifacts, `${name}.png`);
  await page.screenshot({ path, fullPage: true });
  return path;
}

/** Waits until every island on the page has hydrated (astro-island is display: contents, so wait for attached). */
export async function waitForIslands(page: Page): Promise<void> {
  await page.waitForFunction(() => [...document.querySelectorAll('astro-island')].every((island) => !island.hasAttribute('ssr')));
}

const attemptsFile = (kind: string) => join(testEnv('CLAYBANK_TEST_ARTIFACTS'), `auth-attempts-${kind}.json`);

/**
 * Sign-in and sign-up allow 3 attempts per 10 s from one client address, and every browser test comes
 * from 127.0.0.1. Before an attempt, wait until fewer than 3 were made in the last window by any test
 * file of this run (the attempts are noted in a file, since each test file runs on its own).
 */
export async function paceAuthAttempt(kind: 'sign-in' | 'sign-up'): Promise<void> {
  const { existsSync, mkdirSync, readFileSync, writeFileSync } = await import('node:fs');
  const file = attemptsFile(kind);
  mkdirSync(testEnv('CLAYBANK_TEST_ARTIFACTS'), { recursive: true });
  // the server's 10 s window starts when a request arrives, a little after it was paced here
  const windowMs = 11_500;
  for (;;) {
    const now = Date.now();
    const recent = (existsSync(file) ? (JSON.parse(readFileSync(file, 'utf8')) as number[]) : []).filter(
      (t) => now - t < windowMs,
    );
    if (recent.length < 3) {
      writeFileSync(file, JSON.stringify([...recent, now]));
      return;
    }
    await new Promise((resolve) => setTimeout(resolve, Math.max(50, (recent[0] ?? now) + windowMs - now)));
  }
}
