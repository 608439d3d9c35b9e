import 'reflect-metadata';
import cluster from 'node:cluster';
import { Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { NestFactory } from '@nestjs/core';
import { NestExpressApplication } from '@nestjs/platform-express';
import { apiWorkerCount, reportListening, runClusterPrimary } from './cluster';
import { ConfigValidationError, EnvironmentVariables, validateEnv } from './config/env.validation';

async function bootstrap(): Promise<void> {
  // Checked before the modules load, so bad configuration ends with a readable list instead of a stack trace.
  validateEnv(process.env);
  const { AppModule } = await import('./app.module');
  const { configureApp } = await import('./app-setup');
  const app = await NestFactory.create<NestExpressApplication>(AppModule, { abortOnError: false });
  app.disable('x-powered-by');
  configureApp(app);
  const config = app.get<ConfigService<EnvironmentVariables, true>>(ConfigService);
  const port = config.get('PORT', { infer: true });
  await app.listen(port, '127.0.0.1');
  const worker = cluster.isWorker ? ` (worker ${cluster.worker?.id})` : '';
  Logger.log(`Swapwright API listening on http://127.0.0.1:${port}/api${worker}`, 'Bootstrap');
  reportListening();
}

/** API_WORKERS above 1: this process only forks the workers (see cluster.ts); each of them runs bootstrap(). */
async function start(): Promise<void> {
  if (cluster.isPrimary) {
    const workers = apiWorkerCount(validateEnv(process.env).API_WORKERS);
    if (workers > 1) {
      Logger.log(`Starting ${workers} API workers (API_WORKERS=${process.env.API_WORKERS})`, 'Bootstrap');
      runClusterPrimary(workers, (message) => Logger.warn(message, 'Cluster'));
      return;
    }
  }
  await bootstrap();
}

start().catch((error: unknown) => {
  if (error instanceof ConfigValidationError) {
    console.error(error.message);
  } else {
    console.error('Swapwright could not start:', error instanceof Error ? (error.stack ?? error.message) : error);
  }
  process.exit(1);
});
