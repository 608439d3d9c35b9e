import { INestApplication } from '@nestjs/common';
import { DocumentBuilder, OpenAPIObject, SwaggerModule } from '@nestjs/swagger';
import { correlationIdMiddleware } from './common/middleware/correlation-id.middleware';
import { createJsonBodyMiddleware } from './common/middleware/json-body.middleware';
import { noStoreMiddleware } from './common/middleware/no-store.middleware';
import { createSecurityHeadersMiddleware } from './common/middleware/security-headers.middleware';
import { compileMarkedValidators } from './common/validation/compiled-body-validator';

export const API_PREFIX = 'api';

/** Everything main.ts and the e2e tests share, so tests run the app exactly as served. */
export function configureApp(app: INestApplication): INestApplication {
  // API answers are `Cache-Control: no-store`, so a weak ETag (a SHA-1 over every JSON body) would never be used.
  // The built web app's files keep theirs: serve-static sets its own.
  (app.getHttpAdapter().getInstance() as { set(name: string, value: unknown): void }).set('etag', false);
  compileMarkedValidators();
  app.use(correlationIdMiddleware);
  app.use(`/${API_PREFIX}`, noStoreMiddleware);
  app.use(createSecurityHeadersMiddleware());
  app.use(createJsonBodyMiddleware());
  app.setGlobalPrefix(API_PREFIX);
  app.enableShutdownHooks();
  SwaggerModule.setup(`${API_PREFIX}/docs`, app, createOpenApiDocument(app), { jsonDocumentUrl: `${API_PREFIX}/docs-json` });
  return app;
}

/** The OpenAPI document: the contract the web's generated types come from (see openapi/write-openapi-document.ts). */
export function createOpenApiDocument(app: INestApplication): OpenAPIObject {
  return SwaggerModule.createDocument(
    app,
    new DocumentBuilder()
      .setTitle('Swapwright API')
      .setDescription('Plan, check, quote and build engine swaps. Errors share one shape: see ErrorResponseDto.')
      .setVersion('0.1.0')
      .addBearerAuth()
      .build(),
  );
}
