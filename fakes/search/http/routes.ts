// The route table: method + path pattern → handler.
import type { IncomingMessage } from 'node:http';
import type { Engine } from '../engine/engine';

export interface RouteContext {
  engine: Engine;
  req: IncomingMessage;
  params: Record<string, string>;
  query: URLSearchParams;
  body: () => Promise<Buffer>;
}

export interface Reply {
  status: number;
  body?: unknown;
}

export type Handler = (ctx: RouteContext) => Reply | Promise<Reply>;

export interface Route {
  method: string;
  pattern: RegExp;
  names: string[];
  handler: Handler;
}

export function route(method: string, path: string, handler: Handler): Route {
  const names: string[] = [];
  const pattern = new RegExp(
    `^${path.replace(/:(\w+)/g, (_, name: string) => {
      names.push(name);
      return '([^/]+)';
    })}/?$`,
  );
  return { method, pattern, names, handler };
}

export const accepted = (body: unknown): Reply => ({ status: 202, body });
export const ok = (body: unknown): Reply => ({ status: 200, body });
