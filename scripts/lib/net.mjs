import { createConnection, createServer } from 'node:net';

/** True when something accepts TCP connections on host:port. */
export function portInUse(port, host = '127.0.0.1') {
  return new Promise((resolve) => {
    const socket = createConnection({ port, host });
    socket.once('connect', () => {
      socket.destroy();
      resolve(true);
    });
    socket.once('error', () => resolve(false));
    socket.setTimeout(1000, () => {
      socket.destroy();
      resolve(false);
    });
  });
}

/** A TCP port on 127.0.0.1 that is free right now (for test runs that must not collide). */
export function freePort() {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address();
      server.close(() => resolve(port));
    });
  });
}

/** Waits until host:port accepts connections, or throws after timeoutMs. */
export async function waitForPort(port, timeoutMs, what) {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    if (await portInUse(port)) return;
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`${what} did not start listening on 127.0.0.1:${port} within ${timeoutMs / 1000} s.`);
}
