import { DEMO_FIT_SELECTIONS, DEMO_PROJECT_IDS } from '@swapwright/seed-data';
import { BASE_URL } from './browser';
import { demoSignIn, type DemoRole } from './session';

async function accessTokenOf(role: DemoRole): Promise<string> {
  const { email, password } = demoSignIn(role);
  const response = await fetch(`${BASE_URL}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  if (!response.ok) throw new Error(`Signing in as ${role} answered ${response.status}`);
  return ((await response.json()) as { accessToken: string }).accessToken;
}

/**
 * Puts the demo projects' fit selections back as the demo data has them (the stock front-sump pan), so a
 * journey that starts from the demo project's shortfalls does not depend on which journey ran before it.
 */
export async function restoreDemoFitSelections(): Promise<void> {
  const token = await accessTokenOf('estimator');
  for (const { projectId, ...selection } of DEMO_FIT_SELECTIONS) {
    const response = await fetch(`${BASE_URL}/api/projects/${projectId}/fit-selections`, {
      method: 'PUT',
      headers: { 'content-type': 'application/json', authorization: `Bearer ${token}` },
      body: JSON.stringify(selection),
    });
    if (!response.ok) throw new Error(`Restoring the demo fit selections answered ${response.status}: ${await response.text()}`);
  }
}

/**
 * Makes sure the demo customer's project (the Ridgeback) has a parts plan, built as the estimator through the public
 * route when it has none yet (the journeys' seed holds no plans; the plan journeys build their own newer versions).
 */
export async function ensureDemoPartsPlan(): Promise<void> {
  const token = await accessTokenOf('estimator');
  const url = `${BASE_URL}/api/projects/${DEMO_PROJECT_IDS.ridgeback}/parts-plans`;
  const headers = { 'content-type': 'application/json', authorization: `Bearer ${token}` };
  const existing = await fetch(url, { headers });
  if (!existing.ok) throw new Error(`Reading the demo project's plans answered ${existing.status}: ${await existing.text()}`);
  if (((await existing.json()) as unknown[]).length > 0) return;
  const built = await fetch(url, { method: 'POST', headers, body: JSON.stringify({ objective: 'lowest-cost' }) });
  if (!built.ok) throw new Error(`Building the demo project's plan answered ${built.status}: ${await built.text()}`);
}
