import { DEMO_SIGN_INS } from '@swapwright/seed-data';
import type { Page } from 'playwright-core';

export type DemoRole = 'owner' | 'estimator' | 'fabricator' | 'counter' | 'customer';

export function demoSignIn(role: DemoRole): { email: string; password: string; name: string } {
  const signIn = DEMO_SIGN_INS.find((entry) => entry.role === role);
  if (!signIn) throw new Error(`The demo data has no ${role} sign-in`);
  return signIn;
}

export async function signInAs(page: Page, role: DemoRole): Promise<void> {
  const { email, password } = demoSignIn(role);
  await page.goto('/sign-in');
  await page.getByLabel('Email').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('navigation', { name: 'Main' }).waitFor();
}

export async function mainNavigationLabels(page: Page): Promise<string[]> {
  const links = page.getByRole('navigation', { name: 'Main' }).getByRole('link');
  return (await links.allInnerTexts()).map((text) => text.trim());
}
