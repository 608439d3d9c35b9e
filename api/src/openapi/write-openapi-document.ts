/**
 * Writes the API's OpenAPI document (the contract the web's types are generated from) without a database,
 * a mail server or an open port. Run from the tsc output (`node api/dist/openapi/write-openapi-document.js
 * <file>`): transpilers that drop decorator metadata (tsx, esbuild) break dependency injection.
 */
import 'reflect-metadata';
import { writeFileSync } from 'node:fs';
import { NestFactory } from '@nestjs/core';

/**
 * Fixed placeholder settings, so the document never depends on the machine's environment. Nothing connects:
 * preview mode builds the module graph and reads the decorators but creates no provider (no TypeORM connection,
 * no mail transport).
 */
const DOCUMENT_ENVIRONMENT: Record<string, string> = {
  NODE_ENV: 'production',
  PORT: '3000',
  APP_URL: 'http://127.0.0.1:3000',
  DB_HOST: '127.0.0.1',
  DB_PORT: '1',
  DB_USER: 'openapi-document',
  DB_PASSWORD: '',
  DB_NAME: 'openapi-document',
  JWT_SECRET: 'openapi-document-placeholder',
  SMTP_HOST: '127.0.0.1',
  SMTP_PORT: '1',
  MAIL_FROM: 'Swapwright <no-reply@swapwright.test>',
};

async function writeOpenApiDocument(outFile: string): Promise<void> {
  // Only the placeholders: a setting of the shell (a local .env.sh sourced, say) must not change the document.
  const { PATH, HOME, TMPDIR } = process.env;
  process.env = { PATH, HOME, TMPDIR, ...DOCUMENT_ENVIRONMENT };
  const { AppModule } = await import('../app.module');
  const { configureApp, createOpenApiDocument } = await import('../app-setup');
  const app = await NestFactory.create(AppModule, { logger: false, preview: true, abortOnError: false });
  configureApp(app);
  const document = createOpenApiDocument(app);
  writeFileSync(outFile, `${JSON.stringify(document, null, 2)}\n`);
  await app.close();
}

const outFile = process.argv[2];
if (!outFile) {
  console.error('usage: node api/dist/openapi/write-openapi-document.js <output.json>');
  process.exit(2);
}
writeOpenApiDocument(outFile).then(
  () => console.log(`OpenAPI document written to ${outFile}`),
  (error: unknown) => {
    console.error('The OpenAPI document could not be written:', error instanceof Error ? (error.stack ?? error.message) : error);
    process.exit(1);
  },
);
