// Child processes this run started, stopped together on exit, Ctrl-C or SIGTERM.
import { spawn } from 'node:child_process';

const children = new Set();
const cleanups = [];
let cleaningUp = null;

/** Starts a long-running child; its output is prefixed so the terminal shows who said what. */
export function startChild(name, command, args, options = {}) {
  const child = spawn(command, args, { stdio: ['ignore', 'pipe', 'pipe'], ...options });
  const prefix = (stream, out) => {
    let pending = '';
    stream.on('data', (chunk) => {
      pending += chunk.toString();
      const lines = pending.split('\n');
      pending = lines.pop() ?? '';
      for (const line of lines) if (options.quiet !== true || /error|fail/i.test(line)) out.write(`  [${name}] ${line}\n`);
    });
  };
  prefix(child.stdout, process.stdout);
  prefix(child.stderr, process.stderr);
  children.add(child);
  child.once('exit', () => children.delete(child));
  return child;
}

/** Registers work to do after the children are stopped (e.g. stop the database). */
export function onCleanup(fn) {
  cleanups.push(fn);
}

function waitExit(child, ms) {
  return new Promise((resolve) => {
    if (child.exitCode !== null || child.signalCode !== null) return resolve();
    const timer = setTimeout(() => {
      child.kill('SIGKILL');
      resolve();
    }, ms);
    child.once('exit', () => {
      clearTimeout(timer);
      resolve();
    });
  });
}

/** True once shutdown has begun (so a child's exit is expected, not a crash). */
export function isStopping() {
  return signalled || cleaningUp !== null;
}

export function cleanup() {
  if (cleaningUp) return cleaningUp;
  cleaningUp = (async () => {
    const running = [...children];
    for (const child of running) child.kill('SIGTERM');
    await Promise.all(running.map((child) => waitExit(child, 5000)));
    for (const fn of cleanups.reverse()) {
      try {
        await fn();
      } catch (error) {
        console.error(`  cleanup step failed: ${error.message}`);
      }
    }
  })();
  return cleaningUp;
}

let signalled = false;
for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP']) {
  process.on(signal, async () => {
    if (signalled) return;
    signalled = true;
    console.log(`\n• Stopping (${signal}) …`);
    await cleanup();
    console.log('• Stopped everything this run started.');
    process.exit(signal === 'SIGINT' ? 130 : 143);
  });
}
process.on('claybank-cleanup', () => void cleanup());
