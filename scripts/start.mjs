// npm start (and npm run dev): sets up whatever is missing, starts everything on 127.0.0.1 with
// the invented demo data, prints where to go, and stops what it started on Ctrl-C or SIGTERM.
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { ensureDependencies } from './lib/deps.mjs';

const projectDir = resolve(import.meta.dirname, '..');
ensureDependencies(projectDir);

const dev = process.argv.includes('--dev');
const { cleanup, isStopping, onCleanup } = await import('./lib/children.mjs');
const { RunbookError, runMain } = await import('./lib/errors.mjs');
const { dataDir, settings } = await import('./lib/settings.mjs');
const stack = await import('./lib/stack.mjs');

function takeStartLock() {
  mkdirSync(dataDir, { recursive: true });
  const lockFile = join(dataDir, 'start.lock');
  if (existsSync(lockFile)) {
    const pid = Number(readFileSync(lockFile, 'utf8'));
    let alive = false;
    try {
      process.kill(pid, 0);
      alive = pid !== process.pid;
    } catch {}
    if (alive) {
      throw new RunbookError(
        `Claybank is already running from this checkout (process ${pid}).\n` +
          `  Use it at http://127.0.0.1:${settings.appPort}, or stop it with Ctrl-C in its terminal (or: kill ${pid}) first.`,
      );
    }
  }
  writeFileSync(lockFile, String(process.pid));
  onCleanup(() => rmSync(lockFile, { force: true }));
}

function demoSignIns() {
  const file = join(dataDir, 'demo-sign-ins.json');
  if (!existsSync(file)) return [];
  return JSON.parse(readFileSync(file, 'utf8'));
}

function printBanner(inboxUrl, searchUrl) {
  const url = `http://127.0.0.1:${settings.appPort}`;
  const people = demoSignIns();
  const lines = ['', `  Claybank is running${dev ? ' (astro dev)' : ''}:  ${url}`, ''];
  if (people.length) {
    lines.push(`  Demo sign-ins (invented people; development only), password for all: ${people[0].password}`);
    for (const person of people) lines.push(`    ${person.email.padEnd(38)} ${person.role}`);
  } else {
    lines.push('  Demo sign-ins: none yet.');
  }
  lines.push('', `  Mail sent by the app:  ${url}/dev/inbox   (fake SMTP relay, inbox data at ${inboxUrl})`);
  lines.push(`  Search service:        ${searchUrl}   (local search fake, data in ${join(dataDir, 'search')})`);
  lines.push('  Press Ctrl-C to stop everything this command started.', '');
  console.log(lines.join('\n'));
}

await runMain(async () => {
  takeStartLock();
  await stack.assertPortFree(settings.appPort, 'PORT', 'app');
  await stack.assertPortFree(settings.smtpPort, 'MAIL_FAKE_SMTP_PORT', 'mail fake (SMTP)');
  await stack.assertPortFree(settings.mailHttpPort, 'MAIL_FAKE_HTTP_PORT', 'mail fake (inbox)');
  await stack.assertPortFree(settings.searchPort, 'SEARCH_FAKE_PORT', 'search fake');
  const { urls, secrets } = await stack.bringUpDatabase({ database: settings.database });
  stack.migrate(urls.ownerUrl);
  stack.seed({ appUrl: urls.appUrl, secrets, port: settings.appPort, signInsFile: join(dataDir, 'demo-sign-ins.json') });
  const mail = await stack.startMailFake({
    smtpPort: settings.smtpPort,
    httpPort: settings.mailHttpPort,
    storeDir: join(dataDir, 'mail'),
  });
  const search = await stack.startSearchFake({
    port: settings.searchPort,
    storeDir: join(dataDir, 'search'),
    key: secrets.searchKey,
  });
  const env = stack.appEnvironment({ port: settings.appPort, appUrl: urls.appUrl, secrets, mail, search });
  let app;
  if (dev) {
    app = await stack.serveDevApp(env);
  } else {
    const outDir = join(projectDir, 'dist');
    stack.buildApp(outDir);
    app = await stack.serveBuiltApp(outDir, env);
  }
  printBanner(mail.inboxUrl, search.url);
  app.once('exit', async (code) => {
    await new Promise((r) => setTimeout(r, 200));
    if (isStopping()) return;
    console.error(`\n✖ The app server stopped unexpectedly (exit code ${code}). Stopping the rest.`);
    await cleanup();
    process.exit(1);
  });
});
if (process.exitCode) await cleanup();
