import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext, type Locator, type Page } from 'playwright-core';

export const artifactsDir = join(__dirname, '..', '..', 'artifacts', 'e2e');

// Flags that keep Debian's Chromium from reaching for the network on a closed machine.
const quietFlags = [
  '--headless=new', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking',
  '--disable-component-update', '--disable-sync', '--disable-default-apps', '--disable-dev-shm-usage',
];

export function baseUrl(): string {
  const url = process.env.E2E_BASE_URL;
  if (!url) throw new Error('E2E_BASE_URL is not set; the e2e global setup starts the server');
  return url;
}

export interface BrowserSession {
  context: BrowserContext;
  page: Page;
  close: () => Promise<void>;
  errors: string[];
}

export interface BrowserOptions {
  /** A touch phone: touch events on, and the page's meta viewport honoured as a mobile browser does. */
  touch?: boolean;
}

/** A fresh browser profile per session, so cookies and storage never leak between flows. */
export async function openBrowser(viewport: { width: number; height: number }, options: BrowserOptions = {}): Promise<BrowserSession> {
  const profile = mkdtempSync(join(tmpdir(), 'conestack-e2e-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: quietFlags,
    viewport,
    acceptDownloads: true,
    ...(options.touch ? { hasTouch: true, isMobile: true } : {}),
  });
  const page = context.pages()[0] ?? (await context.newPage());
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(e.message));
  return {
    context,
    page,
    errors,
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

export function screenshotPath(name: string): string {
  mkdirSync(artifactsDir, { recursive: true });
  return join(artifactsDir, `${name}.png`);
}

/** Counts canvas pixels that differ from the background, read back from the page itself. */
export async function canvasInkPixels(target: Locator): Promise<number> {
  const page = target.page();
  const shot = await target.first().screenshot();
  // Decode the PNG in the browser, where an image decoder is built in. Passed as text so the test
  // transpiler cannot rewrite it into helpers the page does not have.
  const script = `(async () => {
    const img = new Image();
    img.src = 'data:image/png;base64,${shot.toString('base64')}';
    await img.decode();
    const c = document.createElement('canvas');
    c.width = img.width;
    c.height = img.height;
    const ctx = c.getContext('2d');
    ctx.drawImage(img, 0, 0);
    const data = ctx.getImageData(0, 0, c.width, c.height).data;
    const r0 = data[0], g0 = data[1], b0 = data[2];
    let n = 0;
    for (let i = 0; i < data.length; i += 4) {
      if (Math.abs(data[i] - r0) + Math.abs(data[i + 1] - g0) + Math.abs(data[i + 2] - b0) > 60) n++;
    }
    return n;
  })()`;
  return page.evaluate<number>(script);
}

/** The two sizes every flow runs at: a phone and a wide desktop window. */
export const viewports = [
  { name: 'phone', width: 390, height: 844 },
  { name: 'wide', width: 1440, height: 900 },
];

export async function api<T>(path: string): Promise<T> {
  const res = await fetch(`${baseUrl()}${path}`);
  if (!res.ok) throw new Error(`${path}: ${res.status}`);
  return (await res.json()) as T;
}

/** Signs in through the local test provider and comes back to `returnTo` (the current page by default). */
export async function signInWithTestAccount(page: Page, login: string, returnTo?: string): Promise<void> {
  const back = returnTo ?? `${new URL(page.url()).pathname}${new URL(page.url()).search}`;
  await page.goto(`${baseUrl()}/auth/github?returnTo=${encodeURIComponent(back)}`);
  const existing = page.getByTestId(`fake-account-${login}`);
  if (await existing.count()) await existing.click();
  else {
    await page.getByTestId('fake-login').fill(login);
    await page.getByTestId('fake-create').click();
  }
  await page.getByTestId('account-menu').first().waitFor();
}

/** Waits for a chart's canvas and polls until Skia has drawn (it draws after CanvasKit loads). */
export async function chartInk(page: Page, chart: Locator, enough = 1500): Promise<number> {
  const canvas = chart.locator('canvas');
  await canvas.waitFor({ timeout: 30_000 });
  let ink = 0;
  for (let i = 0; i < 40 && ink < enough; i++) {
    await page.waitForTimeout(250);
    ink = await canvasInkPixels(canvas);
  }
  return ink;
}
