// A stand-in SMTP relay for local runs: accepts every message on 127.0.0.1, keeps it as JSON on
// disk, and lists the kept messages over a small read-only HTTP interface for the dev inbox.
//   tsx fakes/mail/server.ts --smtp-port 2525 --http-port 2580 --dir .data/mail
import { randomUUID } from 'node:crypto';
import { mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { createServer, type ServerResponse } from 'node:http';
import { join } from 'node:path';
import { parseArgs } from 'node:util';
import { type AddressObject, simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

const { values } = parseArgs({
  options: {
    'smtp-port': { type: 'string', default: '2525' },
    'http-port': { type: 'string', default: '2580' },
    dir: { type: 'string', default: '.data/mail' },
  },
});
const host = '127.0.0.1';
const storeDir = values.dir;
mkdirSync(storeDir, { recursive: true });

const MAX_MESSAGE_BYTES = 5 * 1024 * 1024;

interface StoredMessage {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
}

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(field) ? field : field ? [field] : [];
  return list.flatMap((group) => group.value.map((entry) => entry.address ?? '')).filter(Boolean);
}

const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ['STARTTLS'],
  size: MAX_MESSAGE_BYTES,
  logger: false,
  onData(stream, session, callback) {
    simpleParser(stream)
      .then((parsed) => {
        const receivedAt = new Date().toISOString();
        const message: StoredMessage = {
          id: `${receivedAt.replaceAll(/[-:.]/g, '')}-${randomUUID().slice(0, 8)}`,
          receivedAt,
          from: parsed.from?.value[0]?.address ?? String(session.envelope.mailFrom || ''),
          to: addresses(parsed.to).length ? addresses(parsed.to) : session.envelope.rcptTo.map((rcpt) => rcpt.address),
          subject: parsed.subject ?? '(no subject)',
          text: parsed.text ?? '',
          html: typeof parsed.html === 'string' ? parsed.html : null,
        };
        writeFileSync(join(storeDir, `${message.id}.json`), JSON.stringify(message, null, 2));
        callback();
      })
      .catch((error: Error) => callback(error));
  },
});

function listMessages(): StoredMessage[] {
  return readdirSync(storeDir)
    .filter((name) => name.endsWith('.json'))
    .sort()
    .reverse()
    .map((name) => JSON.parse(readFileSync(join(storeDir, name), 'utf8')) as StoredMessage);
}

function sendJson(res: ServerResponse, status: number, body: unknown) {
  res.writeHead(status, { 'content-type': 'application/json; charset=utf-8' });
  res.end(JSON.stringify(body));
}

const http = createServer((req, res) => {
  const url = new URL(req.url ?? '/', `http://${host}`);
  if (req.method === 'GET' && url.pathname === '/health') return sendJson(res, 200, { status: 'available' });
  if (req.method === 'GET' && url.pathname === '/messages') {
    const to = url.searchParams.get('to')?.toLowerCase();
    const messages = listMessages().filter((m) => !to || m.to.some((address) => address.toLowerCase() === to));
    return sendJson(res, 200, { messages });
  }
  const match = /^\/messages\/([\w-]+)$/.exec(url.pathname);
  if (req.method === 'GET' && match) {
    const message = listMessages().find((m) => m.id === match[1]);
    return message ? sendJson(res, 200, message) : sendJson(res, 404, { error: 'no such message' });
  }
  if (req.method === 'DELETE' && url.pathname === '/messages') {
    for (const name of readdirSync(storeDir)) rmSync(join(storeDir, name), { force: true });
    return sendJson(res, 200, { deleted: true });
  }
  sendJson(res, 404, { error: 'not found' });
});

smtp.on('error', (error) => console.error(`[mail fake] ${error.message}`));
smtp.listen(Number(values['smtp-port']), host, () => {
  http.listen(Number(values['http-port']), host, () => {
    console.log(`[mail fake] SMTP on ${host}:${values['smtp-port']}, inbox on http://${host}:${values['http-port']}`);
  });
});

function shutdown() {
  http.close();
  smtp.close(() => process.exit(0));
  setTimeout(() => process.exit(0), 1000).unref();
}
process.on('SIGTERM', shutdown);
process.on('SIGINT', shutdown);
