// Bench (not a test): frames per second while dragging a corner of a 30 m x 20 m L-shaped deck with
// steps in the editor, in Debian chromium with touch input at a tablet size. Needs the app running
// (BASE_URL, default http://127.0.0.1:3301) with the demo firm seeded. Skips unless BENCH_EDITOR=1.
//   BENCH_EDITOR=1 BASE_URL=http://127.0.0.1:3301 npx tsx scripts/bench/editor-fps.ts
import { chromium, type Page } from '@playwright/test';

export interface EditorFpsResult {
  fps: number;
  frames: number;
  seconds: number;
  p95FrameMs: number;
  longFrames: number;
  planUpdates: number;
  lastPlanMs: number | null;
}

const L_DECK = {
  version: 1,
  outline: [
    [0, 0],
    [30000, 0],
    [30000, 12000],
    [18000, 12000],
    [18000, 20000],
    [0, 20000],
  ],
  boardAngleDeg: 0,
  heightMm: 450,
  joistCentresMm: 400,
  borderCourses: 1,
  supports: [],
  steps: [{ edge: 0, offsetMm: 2000, widthMm: 3000, count: 2, treadBoards: 3 }],
  joist: { widthMm: 50, depthMm: 125, stockMm: 3000, maxSpanMm: 1500, maxCantileverMm: 100 },
  board: { widthMm: 140, gapMm: 5, endGapMm: 4, stockMm: 4800, maxSpanMm: 400 },
};

async function signIn(page: Page, base: string) {
  await page.goto(`${base}/sign-in`);
  await page.getByLabel('Email').fill('designer@larchfield.example');
  await page.getByLabel('Password', { exact: true }).fill('deckdemo-2026');
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await page.getByTestId('signed-in-user').waitFor();
}

export async function run(): Promise<EditorFpsResult | null> {
  if (process.env.BENCH_EDITOR !== '1') {
    console.log('editor fps: skipped (set BENCH_EDITOR=1 with the app running at BASE_URL)');
    return null;
  }
  const base = process.env.BASE_URL || 'http://127.0.0.1:3301';
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-dev-shm-usage'],
  });
  try {
    const ctx = await browser.newContext({
      viewport: { width: 1180, height: 820 },
      hasTouch: true,
      isMobile: true,
    });
    const page = await ctx.newPage();
    await signIn(page, base);
    const job = await (
      await page.request.post(`${base}/api/jobs`, {
        data: { title: 'Bench: large L deck', siteAddress: 'Bench' },
      })
    ).json();
    const design = await (
      await page.request.post(`${base}/api/jobs/${job.id}/designs`, {
        data: { name: 'Large L deck', document: L_DECK },
      })
    ).json();
    await page.goto(`${base}/designs/${design.id}`);
    const canvas = page.getByTestId('plan-canvas');
    await canvas.waitFor();
    await page.waitForFunction(
      () =>
        Number(document.querySelector('[data-testid=plan-canvas]')?.getAttribute('data-joists')) >
        0,
      null,
      { timeout: 60_000 },
    );
    const box = (await canvas.boundingBox())!;
    const corners = JSON.parse((await canvas.getAttribute('data-corners'))!) as [number, number][];
    const start: [number, number] = [box.x + corners[2][0], box.y + corners[2][1]];

    // A string, not a function: tsx would wrap named helpers in __name(), which the page lacks.
    await page.evaluate(`(() => {
      window.__frames = [];
      window.__plans = 0;
      window.__stop = false;
      function tick(t) {
        window.__frames.push(t);
        if (!window.__stop) requestAnimationFrame(tick);
      }
      requestAnimationFrame(tick);
      const el = document.querySelector('[data-testid=design-editor]');
      new MutationObserver(() => { window.__plans += 1; }).observe(el, { attributes: true, attributeFilter: ['data-plan-ms'] });
    })()`);

    const cdp = await ctx.newCDPSession(page);
    const touch = (type: 'touchStart' | 'touchMove' | 'touchEnd', x: number, y: number) =>
      cdp.send('Input.dispatchTouchEvent', {
        type,
        touchPoints: type === 'touchEnd' ? [] : [{ x, y, id: 1 }],
      });
    await touch('touchStart', start[0], start[1]);
    const steps = 240;
    for (let i = 1; i <= steps; i++) {
      // Out and back along a diagonal, about 16 ms apart like a finger on a 60 Hz screen.
      const f = Math.sin((i / steps) * Math.PI);
      await touch('touchMove', start[0] + f * 120, start[1] + f * 80);
      await page.waitForTimeout(16);
    }
    await touch('touchEnd', start[0], start[1]);
    const r = (await page.evaluate(
      `(() => { window.__stop = true; return { frames: window.__frames, plans: window.__plans }; })()`,
    )) as { frames: number[]; plans: number };
    const t = r.frames;
    const gaps = t
      .slice(1)
      .map((x, i) => x - t[i])
      .sort((a, b) => a - b);
    const seconds = (t[t.length - 1] - t[0]) / 1000;
    const planMs = await page.getByTestId('design-editor').getAttribute('data-plan-ms');
    const via = await page.getByTestId('design-editor').getAttribute('data-planner');
    const result: EditorFpsResult = {
      fps: (t.length - 1) / seconds,
      frames: t.length,
      seconds,
      p95FrameMs: gaps[Math.floor(gaps.length * 0.95)] ?? 0,
      longFrames: gaps.filter((g) => g > 50).length,
      planUpdates: r.plans,
      lastPlanMs: planMs ? Number(planMs) : null,
    };
    console.log(
      `editor fps (drag a corner of a 30 m x 20 m L deck, ${steps} touch moves): ${result.fps.toFixed(1)} fps, ` +
        `p95 frame ${result.p95FrameMs.toFixed(1)} ms, ${result.longFrames} frames over 50 ms, ` +
        `${result.planUpdates} frame plans during the drag (last recompute ${result.lastPlanMs ?? '?'} ms, ${via === 'worker' ? 'in the Web Worker' : 'on the main thread'})`,
    );
    return result;
  } finally {
    await browser.close();
  }
}

if (process.argv[1] && /editor-fps\.ts$/.test(process.argv[1])) {
  run().catch((e) => {
    console.error(e);
    process.exit(1);
  });
}
