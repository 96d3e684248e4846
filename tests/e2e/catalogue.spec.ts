// The owner keeps the catalogue: search, add a joist with validation and a live span preview, change it, remove it.
import { expect, test } from '@playwright/test';
import { signIn } from './helpers';

test('the owner searches, adds, changes and removes a product', async ({ page }) => {
  const sku = `E2E-${Date.now().toString(36)}`;
  await signIn(page, 'owner');
  await page.getByRole('navigation').getByRole('link', { name: 'Catalogue' }).click();
  await expect(page.getByRole('heading', { name: 'Catalogue', level: 1 })).toBeVisible();
  const table = page.getByRole('table', { name: 'Catalogue products' });
  await expect(table.getByText('Recycled-plastic joist 125 x 50')).toBeVisible();

  // Search narrows the table.
  await page.getByLabel('Search the catalogue').fill('clip');
  await expect(table.getByText('Hidden clip, starter')).toBeVisible();
  await expect(table.getByText('Recycled-plastic joist 125 x 50')).toHaveCount(0);
  await page.getByLabel('Search the catalogue').fill('');

  // An empty joist is refused with messages on the fields.
  await page.getByRole('button', { name: 'Add a product' }).click();
  const form = page.getByRole('form', { name: 'New product' });
  await form.getByRole('button', { name: 'Add product' }).click();
  await expect(form.getByText('Name is required')).toBeVisible();
  await expect(
    form.getByText('Give the maker’s span table or the material properties'),
  ).toBeVisible();

  // A timber joist with material properties: the preview shows the engineered spans.
  await form.getByLabel('Name').fill(`E2E timber joist ${sku}`);
  await form.getByLabel('SKU').fill(sku);
  await form.getByRole('textbox', { name: 'Price' }).fill('18.40');
  await form.getByLabel('Width').fill('47');
  await form.getByLabel('Depth').fill('200');
  await form.getByLabel('Stock lengths').fill('3600, 4.8 m');
  await form.getByLabel('E (MPa)').fill('8640');
  await form.getByLabel('Allowable bending stress (MPa)').fill('6');
  await form.getByLabel('Allowable shear stress (MPa)').fill('0.64');
  const preview = form.getByTestId('span-preview');
  await expect(preview).toContainText('UK basis');
  await preview.getByText(/How the span at/).click();
  await expect(preview).toContainText('Design Aid No. 6');
  await expect(preview).toContainText('qualified engineer');
  await form.getByRole('button', { name: 'Add product' }).click();
  await expect(form).toHaveCount(0);

  await page.getByLabel('Search the catalogue').fill(sku);
  const row = table.getByRole('row').filter({ hasText: sku });
  await expect(row).toHaveCount(1);
  await expect(row).toContainText('18.40 per length');
  await expect(row).toContainText('engineered');

  // Change the price.
  await row.getByRole('button', { name: `E2E timber joist ${sku}` }).click();
  const edit = page.getByRole('form', { name: `Change E2E timber joist ${sku}` });
  await edit.getByRole('textbox', { name: 'Price' }).fill('19.95');
  await edit.getByRole('button', { name: 'Save product' }).click();
  await expect(row).toContainText('19.95 per length');

  // A duplicate SKU comes back from the server on the SKU field.
  await page.getByLabel('Search the catalogue').fill('');
  await page.getByRole('button', { name: 'Add a product' }).click();
  const dup = page.getByRole('form', { name: 'New product' });
  await dup.getByLabel('Kind').selectOption('screw');
  await dup.getByLabel('Name').fill('Duplicate screw');
  await dup.getByLabel('SKU').fill(sku);
  await dup.getByRole('textbox', { name: 'Price' }).fill('0.30');
  await dup.getByRole('button', { name: 'Add product' }).click();
  await expect(dup.getByText(`Another product already has the SKU “${sku}”`).first()).toBeVisible();
  await dup.getByRole('button', { name: 'Cancel' }).click();

  // Remove it.
  await page.getByLabel('Search the catalogue').fill(sku);
  await row.getByRole('button', { name: `E2E timber joist ${sku}` }).click();
  await page.getByRole('button', { name: 'Remove product' }).click();
  await page.getByRole('dialog').getByRole('button', { name: 'Remove' }).click();
  await expect(page.getByText('No products match')).toBeVisible();
});

test('a designer reads the catalogue but cannot change it', async ({ page }) => {
  await signIn(page, 'designer', '/catalogue');
  await expect(page.getByRole('heading', { name: 'Catalogue', level: 1 })).toBeVisible();
  await expect(
    page
      .getByRole('table', { name: 'Catalogue products' })
      .getByText('Composite deck board 140 x 25'),
  ).toBeVisible();
  await expect(page.getByRole('button', { name: 'Add a product' })).toHaveCount(0);
  await expect(page.getByTestId('safety-notice')).toBeVisible();
});
