// Temporary probe (not committed): opens the fit page, counts frames, takes screenshots.
const { chromium } = require('playwright-core');
const { DEMO_SIGN_INS } = require('@swapwright/seed-data');
(async () => {
  const base = process.env.E2E_BASE_URL;
  const width = Number(process.env.W || 1440);
  const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', headless: true, args: ['--no-sandbox', '--disable-gpu', '--disable-dev-shm-usage'] });
  const page = await browser.newPage({ viewport: { width, height: 900 }, baseURL: base });
  page.setDefaultTimeout(60000);
  const s = DEMO_SIGN_INS.find((e) => e.role === (process.env.ROLE || 'estimator'));
  await page.goto('/sign-in');
  await page.getByLabel('Email').fill(s.email);
  await page.getByLabel('Password').fill(s.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'));
  await page.goto('/projects');
  await page.getByRole('link', { name: /Harlan Ridgeback 1978/ }).first().click();
  await page.waitForURL(/projects\/[^/]+$/);
  await page.goto(page.url() + '/fit');
  if (process.env.RUN) await page.getByRole('button', { name: 'Run fit check' }).click();
  await page.getByText('Every check').waitFor();
  const t0 = Date.now();
  const frames = await page.evaluate(() => new Promise((res) => { let n = 0; const end = performance.now() + 2000; const f = () => { n++; if (performance.now() < end) requestAnimationFrame(f); else res(n); }; requestAnimationFrame(f); }));
  console.log('frames in 2s', frames, 'wall', Date.now() - t0);
  const counts = await page.evaluate(() => ({ w: document.documentElement.scrollWidth, cw: document.documentElement.clientWidth }));
  console.log('scrollWidth', counts);
  if (process.env.TYPE) {
    const h = page.getByRole('spinbutton', { name: 'Crank height' });
    await h.fill(process.env.TYPE);
    await h.blur();
    console.log('height box', await h.inputValue());
  }
  if (process.env.EL) {
    const el = page.locator(process.env.EL).first();
    await el.scrollIntoViewIfNeeded();
    await el.screenshot({ path: `/tmp/webfit-shots/el-${width}${process.env.TAG || ''}.png`, timeout: 120000 });
  }
  const t1 = Date.now();
  if (!process.env.NOFULL) await page.screenshot({ path: `/tmp/webfit-shots/fit-${width}${process.env.TAG || ''}.png`, fullPage: true, timeout: 120000 });
  console.log('screenshot ms', Date.now() - t1);
  await browser.close();
})().catch((e) => { console.error(e); process.exit(1); });
