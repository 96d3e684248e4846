// Shared end-to-end helpers: sign in and out as the demo firm's people.
import { expect, type Page } from '@playwright/test';

export type DemoRole = 'owner' | 'designer' | 'crew';

/** The demo firm's people (seeders/); one password for all of them. */
export const DEMO_PASSWORD = 'deckdemo-2026';

export const demoUsers: Record<DemoRole, { email: string; name: string }> = {
  owner: { email: 'owner@larchfield.example', name: 'Harriet Vane' },
  designer: { email: 'designer@larchfield.example', name: 'Tom Ashby' },
  crew: { email: 'crew@larchfield.example', name: 'Priya Nandi' },
};

/** Fills the sign-in form (at /sign-in, or wherever the app sent us) without waiting for the outcome. */
export async function fillSignIn(page: Page, email: string, password: string): Promise<void> {
  if (!/\/sign-in/.test(page.url())) await page.goto('/sign-in');
  await page.getByLabel('Email').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
}

/**
 * Signs in as a demo role and waits for the signed-in shell. Pass `next` to land on a path other than
 * the jobs list (the sign-in page honours ?callbackUrl=).
 */
export async function signIn(page: Page, role: DemoRole, next?: string): Promise<void> {
  const target = next ? `/sign-in?callbackUrl=${encodeURIComponent(next)}` : '/sign-in';
  await page.goto(target);
  await fillSignIn(page, demoUsers[role].email, DEMO_PASSWORD);
  await expect(page.getByTestId('signed-in-user')).toContainText(demoUsers[role].name, {
    timeout: 30_000,
  });
  if (next) await page.waitForURL((url) => url.pathname === next.split('?')[0]);
}

/** Signs out through the header and waits for the sign-in page. */
export async function signOut(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Sign out' }).click();
  await page.waitForURL(/\/sign-in/);
  await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
}
