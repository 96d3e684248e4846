// From quote to paid deposit, and the crew on site: a designer sends a quote, the client opens
// the link, accepts and pays the deposit (local payment fake), the owner sees the job paid and
// the e-mail in the dev mailbox; crew upload a photo and mark the frame stage.
import { expect, test } from '@playwright/test';
import sharp from 'sharp';
import { signIn } from './helpers';

test('quote, proposal, deposit, dev mailbox, site photo and frame stage', async ({ browser }) => {
  // Four people, six pages and a payment round trip: longer than the default minute on a busy machine.
  test.setTimeout(180_000);
  const stamp = Date.now();
  const clientEmail = `client.${stamp}@example.com`;

  // Designer: a job with a client and a design, then a quote from it, sent to the client.
  const designerCtx = await browser.newContext();
  const designer = await designerCtx.newPage();
  await signIn(designer, 'designer');
  const jobRes = await designer.request.post('/api/jobs', {
    data: {
      title: `Terrace deck ${stamp}`,
      siteAddress: '9 Weir Cottages, Kestrelford',
      client: { name: 'Robin Client', email: clientEmail },
    },
  });
  expect(jobRes.status()).toBe(201);
  const job = (await jobRes.json()) as { id: string };
  expect(
    (
      await designer.request.post(`/api/jobs/${job.id}/designs`, { data: { name: 'Terrace' } })
    ).status(),
  ).toBe(201);

  await designer.goto(`/jobs/${job.id}`);
  const quotes = designer.locator('#quotes');
  await quotes.getByLabel(/Crew days/).fill('2');
  await quotes.getByRole('button', { name: 'New quote from the design' }).click();
  await designer.waitForURL(/\/quotes\//);
  await expect(designer.getByRole('heading', { name: /^Quote Q-\d{4}/ })).toBeVisible();
  const total = (await designer.getByTestId('quote-total').textContent())!.trim();
  await designer.getByRole('button', { name: 'Send quote' }).click();
  await expect(designer.getByText(`Sent to ${clientEmail}.`)).toBeVisible();
  const link = (await designer.getByTestId('proposal-link').getAttribute('href'))!;
  expect(link).toMatch(/\/p\/[^/]+$/);
  await designerCtx.close();

  // Client: no account; the link is the key.
  const clientCtx = await browser.newContext();
  const client = await clientCtx.newPage();
  await client.goto(new URL(link).pathname);
  await expect(client.getByRole('heading', { name: /Your deck proposal Q-\d{4}/ })).toBeVisible();
  await expect(client.getByTestId('proposal-total')).toHaveText(total);
  await expect(client.getByText(/qualified engineer decide/)).toBeVisible();
  await client.getByLabel('Your full name').fill('Robin Client');
  await client.getByLabel('I accept this quote and its terms.').check();
  await client.getByRole('button', { name: 'Accept the quote' }).click();
  await expect(client.getByText(/Accepted by Robin Client/)).toBeVisible();
  await client.getByRole('button', { name: /Pay the deposit of/ }).click();
  await expect(client.getByText('Local test payment service')).toBeVisible();
  await client.getByRole('button', { name: 'Pay now (test card)' }).click();
  await expect(client.getByText('Deposit received')).toBeVisible();
  // A changed link shows a clear page, not the proposal.
  await client.goto(`${new URL(link).pathname.slice(0, -3)}abc`);
  await expect(client.getByRole('heading', { name: 'We can’t open this proposal' })).toBeVisible();
  await clientCtx.close();

  // Owner: the job shows the deposit paid; the quote e-mail is in the dev mailbox.
  const ownerCtx = await browser.newContext();
  const owner = await ownerCtx.newPage();
  await signIn(owner, 'owner');
  await owner.goto(`/jobs/${job.id}`);
  await expect(owner.locator('#quotes').getByTestId('deposit-paid')).toBeVisible();
  await owner.goto('/inbox');
  await expect(owner.getByRole('heading', { name: 'Sent mail' })).toBeVisible();
  const row = owner.getByTestId('outbox-row').filter({ hasText: clientEmail });
  await expect(row).toContainText('Sent');
  await owner
    .getByRole('button', { name: new RegExp(`your deck quote Q-\\d{4}.*${clientEmail}`, 's') })
    .first()
    .click();
  await expect(owner.getByTestId('mail-message')).toContainText(new URL(link).pathname);
  await ownerCtx.close();

  // Crew: upload a site photo and mark the frame stage with it.
  const crewCtx = await browser.newContext();
  const crew = await crewCtx.newPage();
  await signIn(crew, 'crew');
  await crew.goto(`/jobs/${job.id}`);
  await expect(crew.locator('#quotes')).toHaveCount(0);
  const png = await sharp({
    create: { width: 640, height: 480, channels: 3, background: { r: 90, g: 110, b: 70 } },
  })
    .png()
    .toBuffer();
  await crew.getByTestId('file-input').setInputFiles({
    name: 'joists-laid.png',
    mimeType: 'image/png',
    buffer: png,
  });
  await expect(crew.getByRole('list', { name: 'Job files' })).toContainText('joists-laid.png');
  const frame = crew.getByTestId('stage-frame');
  await frame.getByRole('button', { name: 'Mark frame done' }).click();
  await frame.getByLabel('Photos (optional)').setInputFiles({
    name: 'frame-done.png',
    mimeType: 'image/png',
    buffer: png,
  });
  await frame.getByRole('button', { name: 'Save stage' }).click();
  await expect(frame).toContainText('marked by Priya Nandi');
  await expect(frame.getByRole('img', { name: 'Frame photo' })).toBeVisible();
  await crew.goto('/jobs');
  await expect(
    crew
      .getByRole('row')
      .filter({ hasText: `Terrace deck ${stamp}` })
      .getByTestId('job-progress'),
  ).toHaveText('Frame done');
  await crewCtx.close();
});
