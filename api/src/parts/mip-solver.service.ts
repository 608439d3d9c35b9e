import { Injectable, OnApplicationBootstrap, OnModuleDestroy } from '@nestjs/common';
import type { MipSolution, MipSolverOptions } from '@swapwright/shared';
import { Worker } from 'node:worker_threads';

/** The worker's code: loads the solver once and answers LP texts; the solve blocks only this thread. */
const WORKER_SOURCE = (highsPath: string) => `
const { parentPort } = require('node:worker_threads');
const loading = require(${JSON.stringify(highsPath)})();
parentPort.on('message', async ({ id, lp, options }) => {
  try {
    const highs = await loading;
    const solution = highs.solve(lp, options);
    const columns = {};
    for (const [name, column] of Object.entries(solution.Columns || {})) columns[name] = { Primal: column.Primal };
    parentPort.postMessage({ id, solution: { Status: solution.Status, ObjectiveValue: solution.ObjectiveValue, Columns: columns } });
  } catch (error) {
    parentPort.postMessage({ id, error: String((error && error.message) || error) });
  }
});
`;

/** Runs the MIP solver (highs, synchronous) in a worker thread so the API keeps answering while it works. */
@Injectable()
export class MipSolverService implements OnApplicationBootstrap, OnModuleDestroy {
  private worker: Worker | null = null;
  private nextId = 0;
  private readonly pending = new Map<number, { resolve: (s: MipSolution) => void; reject: (e: Error) => void }>();

  private start(): Worker {
    if (this.worker) return this.worker;
    const worker = new Worker(WORKER_SOURCE(require.resolve('highs')), { eval: true });
    worker.on('message', (message: { id: number; solution?: MipSolution; error?: string }) => {
      const waiting = this.pending.get(message.id);
      if (!waiting) return;
      this.pending.delete(message.id);
      if (this.pending.size === 0) worker.unref();
      if (message.error) waiting.reject(new Error(`The solver refused the model: ${message.error}`));
      else waiting.resolve(message.solution!);
    });
    worker.on('error', (error) => {
      for (const waiting of this.pending.values()) waiting.reject(error);
      this.pending.clear();
      this.worker = null;
    });
    worker.unref();
    this.worker = worker;
    return worker;
  }

  solve(lp: string, options: MipSolverOptions): Promise<MipSolution> {
    const worker = this.start();
    const id = this.nextId++;
    worker.ref();
    return new Promise((resolve, reject) => {
      this.pending.set(id, { resolve, reject });
      worker.postMessage({ id, lp, options });
    });
  }

  /** Keeps the worker warm: the solver is loaded and compiled before the first plan asks for it. */
  onApplicationBootstrap(): void {
    this.solve('Minimize\n obj: x\nSubject To\n r0: x >= 0\nBinary\n x\nEnd', { output_flag: false }).catch(() => undefined);
  }

  async onModuleDestroy(): Promise<void> {
    await this.worker?.terminate();
    this.worker = null;
  }
}
