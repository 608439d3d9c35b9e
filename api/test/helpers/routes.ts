import { INestApplication } from '@nestjs/common';

export type HttpMethod = 'get' | 'post' | 'put' | 'patch' | 'delete';

export interface RegisteredRoute {
  method: HttpMethod;
  /** The Express pattern, e.g. `/api/projects/:id/fit-reports`. */
  path: string;
  /** `GET /api/projects/:id/fit-reports`: the key of the access policy. */
  key: string;
  params: string[];
}

interface Layer {
  route?: { path: string | string[]; methods: Record<string, boolean> };
}

/** Every route the booted app answers, read from its Express router (what really serves requests). */
export function registeredRoutes(app: INestApplication): RegisteredRoute[] {
  const express = app.getHttpAdapter().getInstance() as { router?: { stack: Layer[] }; _router?: { stack: Layer[] } };
  const stack = (express.router ?? express._router)?.stack ?? [];
  const routes: RegisteredRoute[] = [];
  for (const layer of stack) {
    if (!layer.route) continue;
    const paths = Array.isArray(layer.route.path) ? layer.route.path : [layer.route.path];
    for (const path of paths) {
      for (const [method, on] of Object.entries(layer.route.methods)) {
        if (!on || method === '_all' || method === 'head' || method === 'options') continue;
        routes.push({
          method: method as HttpMethod,
          path,
          key: `${method.toUpperCase()} ${path}`,
          params: [...path.matchAll(/:(\w+)/g)].map((match) => match[1]),
        });
      }
    }
  }
  return routes;
}

/** Runs `work` over `items` with at most `limit` at a time; answers in the order of `items`. */
export async function inParallel<T, R>(items: readonly T[], limit: number, work: (item: T) => Promise<R>): Promise<R[]> {
  const results = new Array<R>(items.length);
  let next = 0;
  const worker = async () => {
    while (next < items.length) {
      const index = next++;
      results[index] = await work(items[index]);
    }
  };
  await Promise.all(Array.from({ length: Math.min(limit, items.length) }, worker));
  return results;
}

/** A fingerprint of every table's rows (MariaDB's CHECKSUM TABLE), to prove a set of requests changed nothing. */
export async function tableChecksums(query: (sql: string) => Promise<Array<Record<string, unknown>>>, tables: string[]): Promise<Record<string, string>> {
  const rows = await query(`CHECKSUM TABLE ${tables.map((table) => `\`${table}\``).join(', ')}`);
  return Object.fromEntries(rows.map((row) => [String(row.Table).split('.').pop(), String(row.Checksum)]));
}
