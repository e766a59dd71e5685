import { baseUrl, canvasInkPixels, openBrowser, screenshotPath, type BrowserSession, viewports } from './support/browser';

jest.setTimeout(120_000);

describe.each(viewports)('catalogue at $name size ($width x $height)', ({ name, width, height }) => {
  let s: BrowserSession;
  beforeAll(async () => {
    s = await openBrowser({ width, height });
  });
  afterAll(() => s.close());

  let first: { slug: string; model: string };
  let aliasSlug: string;
  beforeAll(async () => {
    // Pick drivers from the API rather than hard-coding demo slugs.
    const list = await (await fetch(`${baseUrl()}/api/drivers?limit=1`)).json();
    first = list.items[0];
    const hero = await (await fetch(`${baseUrl()}/api/drivers?q=Mk1&limit=1`)).json();
    const detail = await (await fetch(`${baseUrl()}/api/drivers/${hero.items[0].slug}`)).json();
    aliasSlug = detail.aliases.find((a: string) => /^[a-z0-9-]+$/.test(a) && a.includes('-'));
  });

  it('lists the demo drivers from the API', async () => {
    await s.page.goto(baseUrl());
    await s.page.getByTestId('driver-list-screen').waitFor();
    await s.page.getByTestId(`driver-card-${first.slug}`).waitFor();
    const cards = await s.page.locator('[data-testid^="driver-card-"]').count();
    expect(cards).toBeGreaterThanOrEqual(4);
    await expect(s.page.getByText('Conestack').first().isVisible()).resolves.toBe(true);
    await s.page.screenshot({ path: screenshotPath(`list-${name}`), fullPage: true });
  });

  it('opens a driver on its own route with parameters and a drawn response chart', async () => {
    await s.page.getByTestId(`driver-card-${first.slug}`).click();
    await s.page.waitForURL(new RegExp(`/drivers/${first.slug}$`));
    // The list stays mounted (hidden) under the stack, so look inside the driver screen only.
    const screen = s.page.getByTestId('driver-screen');
    await screen.getByRole('heading', { name: first.model }).waitFor();
    await screen.getByText('Fs', { exact: true }).first().waitFor();
    const canvas = screen.locator('[data-testid^="chart-"] canvas, [data-testid="response-chart"] canvas').first();
    await canvas.waitFor({ timeout: 30_000 });
    // Skia draws asynchronously after CanvasKit loads; poll until the grid and curve appear.
    let ink = 0;
    for (let i = 0; i < 40 && ink < 500; i++) {
      await s.page.waitForTimeout(250);
      ink = await canvasInkPixels(canvas);
    }
    expect(ink).toBeGreaterThan(500);
    await s.page.screenshot({ path: screenshotPath(`driver-${name}`), fullPage: true });
    expect(s.errors).toEqual([]);
  });

  it('loads a driver route directly by an old slug and lands on the current entry', async () => {
    const detail = await (await fetch(`${baseUrl()}/api/drivers/${aliasSlug}`)).json();
    expect(detail.slug).not.toBe(aliasSlug);
    await s.page.goto(`${baseUrl()}/drivers/${aliasSlug}`);
    await s.page.getByTestId('driver-screen').getByRole('heading', { name: detail.model }).waitFor();
    expect(s.errors).toEqual([]);
  });
});
