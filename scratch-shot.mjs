import { chromium } from 'playwright-core';
const base = 'http://127.0.0.1:4451';
const ctx = await chromium.launchPersistentContext('/tmp/understand-profile-' + Date.now(), { executablePath: '/usr/bin/chromium', headless: true, args: ['--headless','--no-sandbox','--disable-gpu'], viewport: { width: 1280, height: 900 } });
const page = ctx.pages()[0];
const errors = [];
page.on('console', (m) => { if (m.type() === 'error') errors.push(m.text()); });
page.on('pageerror', (e) => errors.push(e.message));
await page.goto(`${base}/sign-in?next=/bank/deposits/saltreach-estuarine-clay`);
await page.waitForFunction(() => [...document.querySelectorAll('astro-island')].every((i) => !i.hasAttribute('ssr')), null, { timeout: 60000 });
await page.getByLabel('E-mail address').fill(process.argv[2] ?? 'engineer@quillfen.example.test');
await page.getByLabel('Password').fill('saltreach-demo-2026');
await page.getByRole('button', { name: 'Sign in' }).click();
await page.waitForURL(/deposits/, { timeout: 60000 });
await page.waitForSelector('[data-testid=value-cards]', { timeout: 60000 }); await page.waitForTimeout(1000); await page.screenshot({ path: '/tmp/shots/first.png', fullPage: true }); console.log('errors so far', errors);
await page.waitForTimeout(800);
await page.screenshot({ path: '/tmp/shots/deposit.png', fullPage: true });
for (const tab of ['correlations', 'profiles', 'compare']) {
  await page.click(`[data-testid=tab-${tab}]`);
  await page.waitForTimeout(2500);
  await page.screenshot({ path: `/tmp/shots/${tab}.png`, fullPage: true });
}
console.log('errors', errors);
await ctx.close();
