import 'reflect-metadata';
import { Logger } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import { NestExpressApplication } from '@nestjs/platform-express';
import { configureApp } from './app-setup';
import { AppModule } from './app.module';
import { AppConfigService } from './config/app-config';
import { ConfigValidationError } from './config/env.validation';
import { ConfigService } from '@nestjs/config';

async function bootstrap(): Promise<void> {
  const app = await NestFactory.create<NestExpressApplication>(AppModule, { bufferLogs: false });
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  configureApp(app);
  const config = app.get<AppConfigService>(ConfigService);
  const port = config.get('PORT', { infer: true });
  await app.listen(port, '127.0.0.1');
  Logger.log(`Swapwright API listening on http://127.0.0.1:${port}/api`, 'Bootstrap');
}

bootstrap().catch((error: unknown) => {
  if (error instanceof ConfigValidationError) {
    console.error(error.message);
  } else {
    console.error('Swapwright could not start:', error instanceof Error ? error.message : error);
  }
  process.exit(1);
});
