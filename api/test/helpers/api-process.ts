import { ChildProcess, spawn } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { freePort } from './payment-fake-process';

export const API_MAIN = join(__dirname, '..', '..', 'dist', 'main.js');

export interface ApiProcess {
  port: number;
  base: string;
  process: ChildProcess;
  log: string[];
  /** Resolves when the process has ended (by itself, or killed). */
  exited: Promise<void>;
}

export function assertApiBuilt(): void {
  if (!existsSync(API_MAIN)) throw new Error('api/dist/main.js is missing: run `npm run build -w api` first (npm test builds it).');
}

/**
 * A real API process (the built server) on its own port against the test database, with the environment of the tests
 * plus `env`. Pass `port` to start it again where the previous one listened (the payment fake sends there).
 */
export async function startApiProcess(env: Record<string, string> = {}, port?: number): Promise<ApiProcess> {
  const listenOn = port ?? (await freePort());
  const log: string[] = [];
  const child = spawn(process.execPath, [API_MAIN], {
    env: { ...process.env, PORT: String(listenOn), WEB_DIST_DIR: '', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  child.stdout?.on('data', (chunk: Buffer) => log.push(chunk.toString()));
  child.stderr?.on('data', (chunk: Buffer) => log.push(chunk.toString()));
  const base = `http://127.0.0.1:${listenOn}/api`;
  const deadline = Date.now() + 60_000;
  for (;;) {
    if (child.exitCode !== null || child.signalCode !== null) throw new Error(`the API process stopped at start-up:\n${log.join('')}`);
    try {
      if ((await fetch(`${base}/health`)).ok) return { port: listenOn, base, process: child, log, exited };
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) throw new Error(`the API process did not answer in 60 s:\n${log.join('')}`);
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}

/** Ends the process: SIGTERM by default, SIGKILL to cut it off with no chance to finish anything. */
export async function stopApiProcess(instance: ApiProcess | undefined, signal: NodeJS.Signals = 'SIGTERM'): Promise<void> {
  if (!instance || instance.process.exitCode !== null || instance.process.signalCode !== null) return;
  instance.process.kill(signal);
  await instance.exited;
}

/** A JSON request to an API process; the answer's status and parsed body. */
export async function callApi(
  instance: Pick<ApiProcess, 'base'>,
  method: string,
  path: string,
  options: { token?: string; body?: unknown } = {},
): Promise<{ status: number; body: any }> {
  const response = await fetch(`${instance.base}${path}`, {
    method,
    headers: { 'content-type': 'application/json', ...(options.token ? { authorization: `Bearer ${options.token}` } : {}) },
    body: options.body === undefined ? undefined : JSON.stringify(options.body),
  });
  const text = await response.text();
  return { status: response.status, body: text ? JSON.parse(text) : null };
}
