// The plan editor on a tablet (touch, 820 x 1180): draw by taps and typed lengths, see the frame,
// drag a support row too far and see the flag, undo, reload; a colleague's save gives the conflict choice.
import { expect, test, type Browser, type BrowserContext, type Page } from '@playwright/test';
import { signIn } from './helpers';

test.use({ viewport: { width: 820, height: 1180 }, hasTouch: true, isMobile: true });
// The editor bundle and the engine worker load on first open; a shared CI machine can be slow.
test.setTimeout(120_000);

async function newDesign(page: Page, name: string): Promise<{ jobId: string; designId: string }> {
  const job = await page.request.post('/api/jobs', {
    data: {
      title: `Editor test ${Date.now().toString(36)}`,
      siteAddress: '7 Orchard Way, Kestrelford',
    },
  });
  expect(job.status()).toBe(201);
  const jobId = (await job.json()).id as string;
  const design = await page.request.post(`/api/jobs/${jobId}/designs`, { data: { name } });
  expect(design.status()).toBe(201);
  return { jobId, designId: (await design.json()).id as string };
}

/** A one-finger drag as the touch screen sends it (touch events, so the page sees pointerType "touch"). */
async function touchDrag(page: Page, from: [number, number], to: [number, number], steps = 12) {
  const cdp = await page.context().newCDPSession(page);
  const send = (type: 'touchStart' | 'touchMove' | 'touchEnd', x: number, y: number) =>
    cdp.send('Input.dispatchTouchEvent', {
      type,
      touchPoints: type === 'touchEnd' ? [] : [{ x, y, id: 1 }],
    });
  await send('touchStart', from[0], from[1]);
  for (let i = 1; i <= steps; i++) {
    await send(
      'touchMove',
      from[0] + ((to[0] - from[0]) * i) / steps,
      from[1] + ((to[1] - from[1]) * i) / steps,
    );
  }
  await send('touchEnd', to[0], to[1]);
  await cdp.detach();
}

async function canvasBox(page: Page) {
  const box = await page.getByTestId('plan-canvas').boundingBox();
  if (!box) throw new Error('no canvas');
  return box;
}

const errorCount = (page: Page) => page.getByTestId('flag-count-error');
const joistCount = async (page: Page) =>
  Number(await page.getByTestId('plan-canvas').getAttribute('data-joists'));

test('draw a 6 m x 4 m deck by taps and typed lengths, break a span, undo, reload', async ({
  page,
}) => {
  await signIn(page, 'designer');
  const { designId } = await newDesign(page, 'Tablet drawing');
  await page.goto(`/designs/${designId}`);
  await expect(page.getByTestId('plan-canvas')).toBeVisible();
  await expect(page.getByTestId('standing-caution')).toContainText('qualified engineer');

  // Every toolbar control is a 44 px touch target.
  for (const b of await page
    .getByRole('toolbar', { name: 'Plan tools' })
    .getByRole('button')
    .all()) {
    const bb = await b.boundingBox();
    expect(bb!.height).toBeGreaterThanOrEqual(44);
    expect(bb!.width).toBeGreaterThanOrEqual(44);
  }

  // Draw: tap the first corner, then type three sides and close.
  await page.getByRole('button', { name: 'Draw outline' }).tap();
  await expect(page.getByTestId('drawing-entry')).toBeVisible();
  const box = await canvasBox(page);
  await page.touchscreen.tap(box.x + box.width * 0.2, box.y + box.height * 0.7);
  await expect(page.getByTestId('drawing-entry')).toContainText('1 corner placed');
  const length = page.getByLabel('Next side length');
  for (const [text, dir] of [
    ['6m', 'Right (0°)'],
    ['4000', 'Up (90°)'],
    ['6 m', 'Left (180°)'],
  ] as const) {
    await length.fill(text);
    await page.getByRole('button', { name: dir }).tap();
    await page.getByRole('button', { name: 'Add side' }).tap();
  }
  await expect(page.getByTestId('drawing-entry')).toContainText('4 corners placed');
  await page.getByRole('button', { name: 'Close outline' }).tap();

  // The frame appears: joists drawn, side lengths as typed, nothing over its limit.
  await expect.poll(() => joistCount(page)).toBeGreaterThan(10);
  await page.getByTestId('tab-side').tap();
  await expect(page.getByRole('button', { name: /^Side 1: 6\s?000 mm$/ })).toBeVisible();
  await expect(page.getByRole('button', { name: /^Side 2: 4\s?000 mm$/ })).toBeVisible();
  await expect(errorCount(page)).toHaveText('0');
  await expect(page.getByTestId('save-status')).toHaveAttribute('data-status', 'saved');

  // Drag the second support row (placed for us) most of the way onto the first: the span beyond it
  // is now far over 1.5 m (common practice for a 125 x 50 mm plastic joist) and is flagged.
  const rows = JSON.parse((await page.getByTestId('plan-canvas').getAttribute('data-rows'))!) as [
    number,
    number,
  ][];
  expect(rows.length).toBeGreaterThanOrEqual(3);
  const sorted = [...rows].sort((a, b) => b[1] - a[1]); // bottom of the screen first
  const [first, second] = sorted;
  const grab: [number, number] = [box.x + second[0] + 40, box.y + second[1]];
  // Down to a fifth of the way above the first row: the next span is then about 2.4 m.
  const dropY = box.y + first[1] - (first[1] - second[1]) * 0.2;
  await touchDrag(page, grab, [grab[0], dropY]);
  await expect(errorCount(page)).not.toHaveText('0');
  await page.getByTestId('flag-summary').tap();
  const spanFlag = page.getByTestId('flag-item').filter({ hasText: 'span' }).first();
  await expect(spanFlag).toBeVisible();
  await spanFlag.tap();
  await expect(page.getByTestId('flag-detail')).toContainText('1500');
  await expect(page.getByTestId('flag-detail')).toContainText('common practice');
  await expect(page.getByTestId('flag-detail')).toContainText('qualified engineer');

  // One undo takes the whole drag back, and the flag with it.
  await page.getByRole('button', { name: 'Undo' }).tap();
  await expect(errorCount(page)).toHaveText('0');
  await expect(page.getByTestId('save-status')).toHaveAttribute('data-status', 'saved', {
    timeout: 15_000,
  });

  // Reload: the drawn design is what the server has.
  await page.reload();
  await expect.poll(() => joistCount(page)).toBeGreaterThan(10);
  await expect(page.getByTestId('draft-banner')).toHaveCount(0);
  await page.getByTestId('tab-side').tap();
  await expect(page.getByRole('button', { name: /^Side 1: 6\s?000 mm$/ })).toBeVisible();
  await expect(errorCount(page)).toHaveText('0');
  const saved = await (await page.request.get(`/api/designs/${designId}`)).json();
  expect(saved.version).toBeGreaterThan(1);
  expect(saved.document.outline).toHaveLength(4);
  expect(saved.document.outline[0]).not.toEqual([0, 0]);
  expect(saved.document.supports).toEqual([]);
});

type Session = Awaited<ReturnType<BrowserContext['storageState']>>;

async function openAs(browser: Browser, designId: string, storageState: Session) {
  const ctx = await browser.newContext({
    viewport: { width: 820, height: 1180 },
    hasTouch: true,
    isMobile: true,
    storageState,
  });
  const page = await ctx.newPage();
  await page.goto(`/designs/${designId}`);
  await expect(page.getByTestId('plan-canvas')).toBeVisible({ timeout: 30_000 });
  return { ctx, page };
}

async function setHeight(page: Page, text: string) {
  await page.getByTestId('tab-inputs').tap();
  const field = page.getByLabel('Deck height');
  await field.fill(text);
  await field.press('Enter');
}

test('a colleague saves first: the editor offers to load theirs or keep this one as a copy', async ({
  page,
  browser,
}) => {
  await signIn(page, 'designer');
  const { designId } = await newDesign(page, 'Shared design');
  // Two tablets signed in as the same designer (the session is shared, not signed in twice).
  const session = await page.context().storageState();
  const a = await openAs(browser, designId, session);
  const b = await openAs(browser, designId, session);

  await setHeight(b.page, '520');
  await expect(b.page.getByTestId('save-status')).toHaveAttribute('data-status', 'saved', {
    timeout: 15_000,
  });

  await setHeight(a.page, '610');
  const dialog = a.page.getByTestId('conflict-dialog');
  await expect(dialog).toBeVisible({ timeout: 15_000 });
  await expect(dialog).toContainText('Tom Ashby saved this design');
  await expect(dialog.getByRole('button', { name: 'Load their version' })).toBeVisible();
  await dialog.getByRole('button', { name: 'Keep mine as a copy' }).tap();
  await a.page.waitForURL(
    (u) => u.pathname.startsWith('/designs/') && !u.pathname.endsWith(designId),
  );
  await expect(a.page.getByTestId('design-name')).toHaveText('Shared design (copy)');
  await a.page.getByTestId('tab-inputs').tap();
  await expect(a.page.getByLabel('Deck height')).toHaveValue(/610/);

  // The original keeps the colleague's save.
  const original = await (await page.request.get(`/api/designs/${designId}`)).json();
  expect(original.document.heightMm).toBe(520);
  await a.ctx.close();
  await b.ctx.close();
});

test('crew see the same plan and flags without edit tools', async ({ page, browser }) => {
  await signIn(page, 'designer');
  const { designId } = await newDesign(page, 'For the crew');
  const ctx = await browser.newContext({
    viewport: { width: 820, height: 1180 },
    hasTouch: true,
    isMobile: true,
  });
  const crew = await ctx.newPage();
  await signIn(crew, 'crew');
  await crew.goto(`/designs/${designId}`);
  await expect.poll(() => joistCount(crew)).toBeGreaterThan(10);
  await expect(crew.getByTestId('design-editor')).toHaveAttribute('data-readonly', 'true');
  await expect(crew.getByRole('button', { name: 'Draw outline' })).toHaveCount(0);
  await expect(crew.getByRole('button', { name: 'Undo' })).toHaveCount(0);
  await expect(crew.getByTestId('flag-summary')).toBeVisible();
  await expect(crew.getByTestId('standing-caution')).toBeVisible();
  await ctx.close();
});
