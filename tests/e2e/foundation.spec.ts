// Foundation: signing in and out, the jobs list, creating and opening a job, and what crew may not do.
import { expect, test, type Page } from '@playwright/test';
import { DEMO_PASSWORD, demoUsers, fillSignIn, signIn, signOut } from './helpers';

// Each flow signs in more than once; give a busy machine room (the config's default is 60 s).
test.describe.configure({ timeout: 180_000 });

const uuid = /[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/;

/** A title no other run has used, so searches find exactly this job. */
function uniqueTitle(prefix: string): string {
  return `${prefix} ${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}`;
}

async function createJob(page: Page, title: string, siteAddress: string): Promise<string> {
  await page.goto('/jobs');
  await page.getByRole('link', { name: 'New job' }).click();
  await expect(page.getByRole('heading', { name: 'New job' })).toBeVisible();
  await page.getByLabel('Job title').fill(title);
  await page.getByLabel('Site address').fill(siteAddress);
  await page.getByRole('button', { name: 'Create job' }).click();
  await page.waitForURL(new RegExp(`/jobs/${uuid.source}$`));
  await expect(page.getByRole('heading', { level: 1, name: title })).toBeVisible();
  return page.url().split('/').pop()!;
}

test('a designer creates a job, opens it, and finds it again from the list', async ({ page }) => {
  await signIn(page, 'designer');
  await expect(page.getByRole('heading', { level: 1, name: 'Jobs' })).toBeVisible();
  await expect(page.getByTestId('signed-in-user')).toContainText('Designer');

  const title = uniqueTitle('Rear deck, Ferncombe');
  const id = await createJob(page, title, '12 Ferncombe Rise, Kestrelford, KF2 8AA');
  await expect(page.getByText('12 Ferncombe Rise, Kestrelford, KF2 8AA')).toBeVisible();
  await expect(page.locator('[data-status="enquiry"]').first()).toBeVisible();

  // The job is in the list; the search box narrows to it (and to nothing for nonsense).
  await page.getByRole('link', { name: 'Jobs', exact: true }).first().click();
  await page.waitForURL(/\/jobs$/);
  const table = page.getByRole('table');
  await expect(table.getByRole('link', { name: title })).toBeVisible();
  await page.getByRole('searchbox', { name: 'Search jobs' }).fill(title.split(' ').pop()!);
  await expect(page).toHaveURL(/[?&]q=/);
  await expect(table.getByRole('row')).toHaveCount(2); // header + our job
  await expect(table.getByRole('link', { name: title })).toHaveAttribute('href', `/jobs/${id}`);
  await page.getByRole('searchbox', { name: 'Search jobs' }).fill('no job is called this zqxw');
  await expect(page.getByRole('heading', { name: 'No jobs match' })).toBeVisible();

  // Clearing the search and filtering by state: our new enquiry is under Enquiry, not Complete.
  await page.getByRole('button', { name: 'Clear search and filter' }).click();
  await page
    .getByRole('group', { name: 'Filter by status' })
    .getByRole('button', { name: 'Complete' })
    .click();
  await expect(page).toHaveURL(/status=complete/);
  await expect(page.getByRole('table').getByRole('link', { name: title })).toHaveCount(0);
  await page
    .getByRole('group', { name: 'Filter by status' })
    .getByRole('button', { name: 'Enquiry' })
    .click();
  await expect(page.getByRole('table').getByRole('link', { name: title })).toBeVisible();

  // Opening it from the list.
  await page.getByRole('table').getByRole('link', { name: title }).click();
  await page.waitForURL(`**/jobs/${id}`);
  await expect(page.getByRole('heading', { level: 1, name: title })).toBeVisible();
});

test('sorting by a column header reorders the list and says so', async ({ page }) => {
  await signIn(page, 'owner');
  const header = page.getByRole('columnheader', { name: 'Job' });
  await expect(header).toHaveAttribute('aria-sort', 'none');
  await header.getByRole('button').click();
  await expect(header).toHaveAttribute('aria-sort', 'ascending');
  await expect(page).toHaveURL(/sort=title&dir=asc/);
  const titles = await page
    .getByRole('table')
    .locator('tbody tr td:first-child a')
    .allTextContents();
  expect(titles.length).toBeGreaterThan(1);
  const sorted = [...titles].sort((a, b) => a.localeCompare(b, 'en', { sensitivity: 'base' }));
  expect(titles.map((t) => t.toLowerCase())).toEqual(sorted.map((t) => t.toLowerCase()));
  await header.getByRole('button').click();
  await expect(header).toHaveAttribute('aria-sort', 'descending');
});

test('a designer changes the status, adds a design, and the owner deletes the job', async ({
  page,
}) => {
  await signIn(page, 'designer');
  const title = uniqueTitle('Side return deck');
  const id = await createJob(page, title, '7 Sedge Lane, Kestrelford, KF4 1SL');

  await page.getByLabel('Job status').selectOption('surveyed');
  await expect(page.getByTestId('toasts')).toContainText('Status changed to Surveyed');
  await page.reload();
  await expect(page.getByLabel('Job status')).toHaveValue('surveyed');

  // New design: created on the server and opened in the editor.
  await page.getByRole('button', { name: 'New design' }).click();
  await page.getByLabel('Design name').fill('Option A');
  await page.getByRole('button', { name: 'Create and open' }).click();
  await page.waitForURL(new RegExp(`/designs/${uuid.source}`));
  await page.goto(`/jobs/${id}`);
  await expect(page.getByRole('list', { name: 'Designs' }).getByRole('link')).toContainText([
    'Option A',
  ]);
  await expect(page.getByRole('list', { name: 'Designs' })).toContainText('Version 1');
  await expect(page.getByRole('list', { name: 'Designs' })).toContainText('by Tom Ashby');
  // Designers may not delete jobs.
  await expect(page.getByRole('button', { name: 'Delete job' })).toHaveCount(0);
  await signOut(page);

  await signIn(page, 'owner', `/jobs/${id}`);
  await page.getByRole('button', { name: 'Delete job' }).click();
  const dialog = page.getByRole('dialog');
  await expect(dialog).toContainText(`Delete “${title}”?`);
  await expect(dialog).toContainText('its 1 design');
  await dialog.getByRole('button', { name: 'Cancel' }).click();
  await expect(dialog).toBeHidden();
  await page.getByRole('button', { name: 'Delete job' }).click();
  await page.getByRole('dialog').getByRole('button', { name: 'Delete job' }).click();
  await page.waitForURL(/\/jobs$/);
  const res = await page.request.get(`/api/jobs/${id}`);
  expect(res.status()).toBe(404);
  await page.goto(`/jobs/${id}`);
  await expect(page.getByRole('heading', { name: 'This job isn’t here' })).toBeVisible();
});

test('crew read jobs but cannot create them: no button, and the API answers 403', async ({
  page,
}) => {
  await signIn(page, 'crew');
  await expect(page.getByTestId('signed-in-user')).toContainText('Crew');
  await expect(page.getByRole('table').getByRole('link').first()).toBeVisible();
  await expect(page.getByRole('link', { name: 'New job' })).toHaveCount(0);
  await expect(
    page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Catalogue' }),
  ).toHaveCount(0);

  // A direct POST from the signed-in page is refused by the server too.
  const answer = await page.evaluate(async () => {
    const res = await fetch('/api/jobs', {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ title: 'Crew job', siteAddress: '1 Nowhere Lane' }),
    });
    return { status: res.status, body: await res.json() };
  });
  expect(answer.status).toBe(403);
  expect(typeof answer.body.error).toBe('string');

  // The form's address sends crew to the 403 page.
  await page.goto('/jobs/new');
  await expect(page).toHaveURL(/\/forbidden$/);
  await expect(page.getByRole('heading', { name: 'Your role can’t open this page' })).toBeVisible();

  // On a job page crew see the state but cannot change it or add designs.
  await page.goto('/jobs');
  await page.getByRole('table').getByRole('link').first().click();
  await page.waitForURL(new RegExp(`/jobs/${uuid.source}$`));
  await expect(page.getByTestId('safety-notice')).toBeVisible();
  await expect(page.getByLabel('Job status')).toHaveCount(0);
  await expect(page.getByRole('button', { name: 'New design' })).toHaveCount(0);
  await expect(page.getByRole('button', { name: 'Edit details' })).toHaveCount(0);
});

test('a wrong password shows a clear error and does not sign in', async ({ page }) => {
  await page.goto('/sign-in');
  await fillSignIn(page, demoUsers.designer.email, `${DEMO_PASSWORD}-wrong`);
  const alert = page.getByRole('alert').filter({ hasText: 'Not signed in' });
  await expect(alert).toContainText('do not match an account');
  await expect(page).toHaveURL(/\/sign-in/);
  await expect(page.getByTestId('signed-in-user')).toHaveCount(0);
  const session = await page.request.get('/api/auth/session');
  expect(await session.json()).toEqual({});

  // An empty form is caught before it is sent.
  await page.getByLabel('Email').fill('');
  await page.getByLabel('Password', { exact: true }).fill('');
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await expect(page.getByText('Email is required')).toBeVisible();
  await expect(page.getByText('Password is required')).toBeVisible();
});

test('signing out ends the session; signed-out visitors are sent to sign in', async ({ page }) => {
  await page.goto('/jobs');
  await expect(page).toHaveURL(/\/sign-in/);
  await signIn(page, 'owner');
  await expect(
    page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Catalogue' }),
  ).toBeVisible();
  await signOut(page);
  const session = await page.request.get('/api/auth/session');
  expect(await session.json()).toEqual({});
  await page.goto('/settings');
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=/);

  // Signing in from there returns to the page asked for.
  await fillSignIn(page, demoUsers.owner.email, DEMO_PASSWORD);
  await page.waitForURL(/\/settings$/);
  await expect(page.getByTestId('firm-name')).toHaveText('Larchfield Decks');
});

test('settings show the firm, the team and switch the units', async ({ page }) => {
  await signIn(page, 'designer', '/settings');
  await expect(page.getByTestId('firm-name')).toHaveText('Larchfield Decks');
  await expect(page.getByText('4 Mill Lane')).toBeVisible();
  const team = page.getByRole('table', { name: /People in the firm/ });
  for (const who of Object.values(demoUsers)) await expect(team).toContainText(who.name);
  await expect(team).not.toContainText('orchardrow');

  const imperial = page.getByRole('radio', { name: /Feet and inches/ });
  const metric = page.getByRole('radio', { name: /Metric/ });
  await imperial.check();
  await expect(page.getByTestId('toasts')).toContainText('feet and inches');
  await page.reload();
  await expect(page.getByRole('radio', { name: /Feet and inches/ })).toBeChecked();
  await metric.check();
  await expect(page.getByTestId('toasts')).toContainText('metric');
  await page.reload();
  await expect(page.getByRole('radio', { name: /Metric/ })).toBeChecked();
});
