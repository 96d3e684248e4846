// Full-page screenshots of the main screens for each role at tablet and phone sizes, for people to look at.
import { expect, test } from '@playwright/test';
import { signIn, type DemoRole } from './helpers';

const sizes = [
  { name: 'tablet', width: 820, height: 1180 },
  { name: 'phone', width: 390, height: 844 },
] as const;

const roles: DemoRole[] = ['owner', 'designer', 'crew'];
const dir = 'tests/artifacts/screens';

test.describe.configure({ mode: 'serial', timeout: 240_000 });

for (const size of sizes) {
  for (const role of roles) {
    test(`${role} at ${size.name} ${size.width}x${size.height}`, async ({ page }) => {
      await page.setViewportSize({ width: size.width, height: size.height });
      await signIn(page, role);
      const shot = (name: string) =>
        page.screenshot({ path: `${dir}/${size.name}-${role}-${name}.png`, fullPage: true });

      await expect(page.getByRole('heading', { level: 1, name: 'Jobs' })).toBeVisible();
      const seeded = page
        .getByRole('link', { name: /L-shaped deck with steps to the lawn/ })
        .first();
      await expect(seeded).toBeVisible();
      await shot('jobs');

      await seeded.click();
      await expect(
        page.getByRole('heading', { level: 1, name: 'L-shaped deck with steps to the lawn' }),
      ).toBeVisible();
      await expect(page.getByTestId('safety-notice')).toBeVisible();
      await shot('job');

      await page.goto('/settings');
      await expect(page.getByTestId('firm-name')).toBeVisible();
      await expect(page.getByRole('table', { name: /People in the firm/ })).toBeVisible();
      await shot('settings');

      if (role === 'crew') {
        await page.goto('/jobs/new');
        await expect(page).toHaveURL(/\/forbidden$/);
        await shot('forbidden');
      }

      if (role === 'owner' && size.name === 'tablet') {
        await page.goto('/jobs/new');
        await page.getByRole('button', { name: 'Create job' }).click();
        await expect(page.getByText('Title is required')).toBeVisible();
        await shot('new-job-errors');
      }
    });
  }
}

test('sign-in page at tablet and phone sizes', async ({ page }) => {
  for (const size of sizes) {
    await page.setViewportSize({ width: size.width, height: size.height });
    await page.goto('/sign-in');
    await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
    await page.screenshot({ path: `${dir}/${size.name}-sign-in.png`, fullPage: true });
  }
  await page.setViewportSize({ width: 1180, height: 820 });
  await page.goto('/sign-in');
  await page.screenshot({ path: `${dir}/landscape-sign-in.png`, fullPage: true });
});
