// The built API on a free loopback port for a bench script, and a demo sign-in against it.
require('reflect-metadata');
const { NestFactory } = require('@nestjs/core');
const { AppModule } = require('../dist/app.module');
const { configureApp } = require('../dist/app-setup');
const { DataSource } = require('typeorm');
const { DEMO_SIGN_INS, DEMO_PASSWORD } = require('@swapwright/seed-data');

/** Starts the app; answers its `/api` base URL, its data source and the app (close it when done). */
async function startBenchApp() {
  const app = await NestFactory.create(AppModule, { logger: ['error'] });
  configureApp(app);
  await app.listen(0, '127.0.0.1');
  const base = `http://127.0.0.1:${app.getHttpServer().address().port}/api`;
  return { app, base, dataSource: app.get(DataSource) };
}

/** Signs in the demo user of a role; answers the session (with `accessToken`). */
async function signInDemo(base, role) {
  const user = DEMO_SIGN_INS.find((d) => d.role === role);
  const res = await fetch(`${base}/auth/sign-in`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email: user.email, password: DEMO_PASSWORD }) });
  return res.json();
}

module.exports = { startBenchApp, signInDemo };
