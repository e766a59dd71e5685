import { baseUrl, canvasInkPixels, openBrowser, screenshotPath, type BrowserSession } from './support/browser';

jest.setTimeout(120_000);

const viewports = [
  { name: 'phone', width: 390, height: 844 },
  { name: 'wide', width: 1440, height: 900 },
];

describe.each(viewports)('catalogue at $name size ($width x $height)', ({ name, width, height }) => {
  let s: BrowserSession;
  beforeAll(async () => {
    s = await openBrowser({ width, height });
  });
  afterAll(() => s.close());

  it('lists the demo drivers from the API', async () => {
    await s.page.goto(baseUrl());
    await s.page.getByTestId('driver-list-screen').waitFor();
    await s.page.getByTestId('driver-card-halvard-m3-fibre').waitFor();
    const cards = await s.page.locator('[data-testid^="driver-card-"]').count();
    expect(cards).toBeGreaterThanOrEqual(4);
    await expect(s.page.getByText('Conestack').first().isVisible()).resolves.toBe(true);
    await s.page.screenshot({ path: screenshotPath(`list-${name}`), fullPage: true });
  });

  it('opens a driver on its own route with parameters and a drawn response chart', async () => {
    await s.page.getByTestId('driver-card-halvard-m3-fibre').click();
    await s.page.waitForURL(/\/drivers\/halvard-m3-fibre$/);
    // The list stays mounted (hidden) under the stack, so look inside the driver screen only.
    const screen = s.page.getByTestId('driver-screen');
    await screen.getByRole('heading', { name: 'M3 Fibre' }).waitFor();
    await screen.getByTestId('parameter-table').getByText('Fs', { exact: true }).waitFor();
    const canvas = screen.getByTestId('response-chart').locator('canvas');
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

  it('loads a driver route directly by URL', async () => {
    await s.page.goto(`${baseUrl()}/drivers/orrin-tm-80`);
    await s.page.getByTestId('driver-screen').getByRole('heading', { name: 'TM-80 Alloy' }).waitFor();
    expect(s.errors).toEqual([]);
  });
});
