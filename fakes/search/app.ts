// The search service as a request handler over an Engine: routing, the key check, the error envelope.
import type { IncomingMessage, ServerResponse } from 'node:http';
import { Engine } from './engine/engine';
import { SnapshotStore } from './engine/snapshot';
import { SearchFakeError } from './errors';
import { documentRoutes } from './http/document-routes';
import { indexRoutes } from './http/index-routes';
import { checkKey, readBody } from './http/request';
import type { Reply, Route } from './http/routes';
import { searchRoutes } from './http/search-routes';
import { settingsRoutes } from './http/settings-routes';
import { taskRoutes } from './http/task-routes';

const ROUTES: Route[] = [...indexRoutes, ...documentRoutes, ...settingsRoutes, ...searchRoutes, ...taskRoutes];

export interface SearchFakeOptions {
  /** Folder for the snapshot; null keeps everything in memory. */
  dataDir: string | null;
  /** When set, every route but /health needs `Authorization: Bearer <apiKey>`. */
  apiKey: string | null;
}

export interface SearchFake {
  engine: Engine;
  handle(req: IncomingMessage, res: ServerResponse): void;
}

function send(res: ServerResponse, reply: Reply): void {
  if (reply.body === undefined) {
    res.writeHead(reply.status, { 'content-length': '0' });
    res.end();
    return;
  }
  const text = JSON.stringify(reply.body);
  res.writeHead(reply.status, { 'content-type': 'application/json', 'content-length': Buffer.byteLength(text) });
  res.end(text);
}

async function dispatch(engine: Engine, apiKey: string | null, req: IncomingMessage): Promise<Reply> {
  const url = new URL(req.url ?? '/', 'http://127.0.0.1');
  const path = url.pathname.length > 1 ? url.pathname.replace(/\/+$/, '') : url.pathname;
  const matches = ROUTES.map((r) => ({ r, m: r.pattern.exec(path) })).filter((x) => x.m);
  if (matches.length === 0) return { status: 404 };
  const found = matches.find((x) => x.r.method === req.method);
  if (!found?.m) return { status: 405 };
  if (path !== '/health') checkKey(req, apiKey);
  const params: Record<string, string> = {};
  found.r.names.forEach((name, i) => {
    params[name] = decodeURIComponent(found.m?.[i + 1] ?? '');
  });
  let body: Buffer | null = null;
  return found.r.handler({
    engine,
    req,
    params,
    query: url.searchParams,
    body: async () => {
      body ??= await readBody(req);
      return body;
    },
  });
}

export function createSearchFake(options: SearchFakeOptions): SearchFake {
  const engine = new Engine(options.dataDir ? new SnapshotStore(options.dataDir) : null);
  return {
    engine,
    handle(req, res) {
      dispatch(engine, options.apiKey, req)
        .then((reply) => send(res, reply))
        .catch((error: unknown) => {
          if (error instanceof SearchFakeError) return send(res, { status: error.status, body: error.toBody() });
          console.error('[search fake]', error);
          const internal = new SearchFakeError('internal', 'The search fake failed on this request; see its log.');
          send(res, { status: 500, body: internal.toBody() });
        })
        .finally(() => {
          if (!req.complete) req.resume();
        });
    },
  };
}
