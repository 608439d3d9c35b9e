import 'reflect-metadata';
import { Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { NestFactory } from '@nestjs/core';
import { NestExpressApplication } from '@nestjs/platform-express';
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
  Logger.log(`Swapwright API listening on http://127.0.0.1:${port}/api`, 'Bootstrap');
}

bootstrap().catch((error: unknown) => {
  if (error instanceof ConfigValidationError) {
    console.error(error.message);
  } else {
    console.error('Swapwright could not start:', error instanceof Error ? (error.stack ?? error.message) : error);
  }
  process.exit(1);
});
