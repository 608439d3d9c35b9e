import { INestApplication } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { Test, TestingModuleBuilder } from '@nestjs/testing';
import { DEMO_PASSWORD, DEMO_SIGN_INS, DemoRole } from '@swapwright/seed-data';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { configureApp } from '../../src/app-setup';
import { AppModule } from '../../src/app.module';
import { seedDemo } from '../../src/database/seed/seed-demo';
import { loadOtherShop } from '../fixtures/other-shop.fixture';
import { signUpTokenFor } from './mail';

export interface TestApp {
  app: INestApplication;
  http: ReturnType<typeof request>;
  dataSource: DataSource;
  jwt: JwtService;
  close: () => Promise<void>;
}

export interface Session {
  accessToken: string;
  refreshToken: string;
  expiresIn: number;
  user: { id: string; email: string; name: string; role: DemoRole; shop: { id: string; name: string; unitSystem: string }; customerId: string | null };
}

/** `override` may replace providers, e.g. the rate limits: `(m) => m.overrideProvider(getOptionsToken()).useValue(...)`. */
export async function createTestApp(override: (builder: TestingModuleBuilder) => TestingModuleBuilder = (builder) => builder): Promise<TestApp> {
  const moduleRef = await override(Test.createTestingModule({ imports: [AppModule] })).compile();
  const app = moduleRef.createNestApplication({ logger: ['error', 'warn'] });
  configureApp(app);
  await app.init();
  const dataSource = app.get(DataSource);
  return {
    app,
    http: request(app.getHttpServer()),
    dataSource,
    // Signs like the access tokens do; other modules (quote links) register JwtServices with keys of their own.
    jwt: new JwtService({ secret: process.env.JWT_SECRET, signOptions: { algorithm: 'HS256' } }),
    close: () => app.close(),
  };
}

/** Empties every table (the schema stays), then loads the demo shop and the second test shop. */
export async function resetData(dataSource: DataSource): Promise<void> {
  const runner = dataSource.createQueryRunner();
  try {
    await runner.query('SET FOREIGN_KEY_CHECKS = 0');
    for (const { tableName } of dataSource.entityMetadatas) await runner.query(`DELETE FROM \`${tableName}\``);
    await runner.query('SET FOREIGN_KEY_CHECKS = 1');
  } finally {
    await runner.release();
  }
  await seedDemo(dataSource);
  await loadOtherShop(dataSource);
}

export async function signIn(http: TestApp['http'], email: string, password: string = DEMO_PASSWORD): Promise<Session> {
  const response = await http.post('/api/auth/sign-in').send({ email, password });
  if (response.status !== 200) throw new Error(`sign-in of ${email} failed: ${response.status} ${JSON.stringify(response.body)}`);
  return response.body as Session;
}

export async function signInAllRoles(http: TestApp['http']): Promise<Record<DemoRole, Session>> {
  const sessions = {} as Record<DemoRole, Session>;
  for (const demo of DEMO_SIGN_INS) sessions[demo.role] = await signIn(http, demo.email, demo.password);
  return sessions;
}

export function bearer(session: Pick<Session, 'accessToken'>): [string, string] {
  return ['Authorization', `Bearer ${session.accessToken}`];
}

/** Waits until no background job is due or running (the worker of the app under test has done its work). */
export async function jobsSettled(dataSource: DataSource, timeoutMs = 10_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const [row] = await dataSource.query(
      "SELECT COUNT(*) AS n FROM `jobs` WHERE `state` = 'running' OR (`state` = 'queued' AND `runAt` <= UTC_TIMESTAMP(3))",
    );
    if (Number(row.n) === 0) return;
    if (Date.now() > deadline) throw new Error(`background jobs still pending after ${timeoutMs} ms`);
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
}

export async function countRows(dataSource: DataSource, table: string): Promise<number> {
  const [row] = await dataSource.query(`SELECT COUNT(*) AS n FROM \`${table}\``);
  return Number(row.n);
}

/** A fresh app on freshly loaded demo data. */
export async function startTestApp(): Promise<TestApp> {
  const t = await createTestApp();
  await resetData(t.dataSource);
  return t;
}

/** A fresh app on freshly loaded demo data, with a session for every demo role. */
export async function startSignedInApp(): Promise<{ t: TestApp; s: Record<DemoRole, Session> }> {
  const t = await startTestApp();
  return { t, s: await signInAllRoles(t.http) };
}

/** Signs up the way a person does: the form, then the e-mailed link. Returns the session the link opens. */
export async function signUpThroughMail(
  http: TestApp['http'],
  input: { email: string; password: string; name: string; shopName: string; timeZone?: string },
): Promise<Session> {
  await http.post('/api/auth/sign-up').send(input).expect(202);
  const token = await signUpTokenFor(input.email);
  const response = await http.post('/api/auth/sign-up/confirm').send({ token }).expect(201);
  return response.body as Session;
}

/** Fresh demo data with the demo catalog and the shop's parts, and a session for every demo role. */
export async function seedWithParts(t: TestApp): Promise<Record<DemoRole, Session>> {
  const { seedCatalog } = await import('../../src/database/seed/seed-catalog');
  const { seedParts } = await import('../../src/database/seed/seed-parts');
  await resetData(t.dataSource);
  await seedCatalog(t.dataSource);
  await seedParts(t.dataSource);
  return signInAllRoles(t.http);
}
