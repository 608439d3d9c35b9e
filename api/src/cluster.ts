import cluster, { Worker } from 'node:cluster';
import { availableParallelism } from 'node:os';

/** API_WORKERS as a count: `auto` is one per CPU core; unset or empty is 1. */
export function apiWorkerCount(setting: string | undefined, cores: number = availableParallelism()): number {
  if (!setting) return 1;
  if (setting === 'auto') return Math.max(1, cores);
  return Number(setting);
}

/**
 * The primary process of a cluster: forks `count` workers that share the listening port (Node hands each new
 * connection to the next worker in turn). A worker that stops after it came up is replaced; one that fails while
 * starting (bad configuration, database unreachable past the retries) stops the whole API with its exit code, so a
 * broken start is not retried for ever. SIGINT/SIGTERM are passed on and the primary exits once every worker has.
 */
export function runClusterPrimary(count: number, log: (message: string) => void = (message) => console.log(message)): void {
  const ready = new WeakSet<Worker>();
  let stopping = false;

  const fork = (): void => {
    const worker = cluster.fork();
    worker.on('message', (message: unknown) => {
      if (message === 'listening') ready.add(worker);
    });
  };

  cluster.on('exit', (worker, code, signal) => {
    const how = signal ? `signal ${signal}` : `exit code ${code}`;
    if (stopping) {
      if (Object.keys(cluster.workers ?? {}).length === 0) process.exit(0);
      return;
    }
    if (!ready.has(worker)) {
      log(`An API worker stopped while starting (${how}); stopping the others.`);
      stopping = true;
      process.exitCode = code || 1;
      for (const other of Object.values(cluster.workers ?? {})) other?.process.kill('SIGTERM');
      if (Object.keys(cluster.workers ?? {}).length === 0) process.exit(process.exitCode);
      return;
    }
    log(`An API worker stopped (${how}); starting a new one.`);
    fork();
  });

  const stop = (signal: NodeJS.Signals) => {
    if (stopping) return;
    stopping = true;
    for (const worker of Object.values(cluster.workers ?? {})) worker?.process.kill(signal);
    if (Object.keys(cluster.workers ?? {}).length === 0) process.exit(0);
  };
  process.on('SIGINT', () => stop('SIGINT'));
  process.on('SIGTERM', () => stop('SIGTERM'));

  for (let index = 0; index < count; index += 1) fork();
}

/** Called by a worker once its server listens, so the primary knows it came up. */
export function reportListening(): void {
  if (cluster.isWorker) process.send?.('listening');
}
