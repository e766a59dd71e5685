import { baseUrl, openBrowser, screenshotPath, type BrowserSession, viewports } from './support/browser';

jest.setTimeout(120_000);

describe.each(viewports)('tools at $name size ($width x $height)', ({ name, width, height }) => {
  let s: BrowserSession;
  beforeAll(async () => {
    s = await openBrowser({ width, height });
  });
  afterAll(() => s.close());

  it('reaches the tools from the top bar', async () => {
    await s.page.goto(baseUrl());
    await s.page.getByTestId('driver-list-screen').waitFor();
    await s.page.getByTestId('nav-tools').first().click();
    await s.page.waitForURL(/\/tools$/);
    // The catalogue stays mounted (hidden) under the stack, so look inside the tools screen only.
    await s.page.getByTestId('tools-screen').getByRole('heading', { name: 'Tools' }).waitFor();
  });

  it('sizes a closed box from a target Qtc and shows the source', async () => {
    await s.page.goto(`${baseUrl()}/tools`);
    const screen = s.page.getByTestId('tools-screen');
    await screen.getByTestId('closed-box-fs').fill('30');
    await screen.getByTestId('closed-box-qts').fill('0.35');
    await screen.getByTestId('closed-box-vas').fill('50');
    await screen.getByTestId('closed-box-qtc').fill('0.707');
    const vb = screen.getByTestId('closed-box-result-vb');
    await vb.waitFor();
    // Small, JAES 1972: Qtc = Qts·√(1 + Vas/Vb), so Vb = Vas/((Qtc/Qts)² − 1), here in litres.
    const expectedVb = 50 / ((0.707 / 0.35) ** 2 - 1);
    expect(Math.abs(Number(await vb.textContent()) / expectedVb - 1)).toBeLessThan(5e-4);
    // Small, JAES 1972: fc = Fs·√(1 + α) = Fs·Qtc/Qts.
    const fc = Number(await screen.getByTestId('closed-box-result-fc').textContent());
    expect(Math.abs(fc / ((30 * 0.707) / 0.35) - 1)).toBeLessThan(5e-4);
    await expect(screen.getByTestId('closed-box-source').textContent()).resolves.toMatch(/Small, JAES 1972/);
    await s.page.screenshot({ path: screenshotPath(`tools-closed-box-${name}`), fullPage: true });
  });

  it('shows the server field error beside the input for a bad value', async () => {
    const screen = s.page.getByTestId('tools-screen');
    await screen.getByTestId('closed-box-vas').fill('-50');
    const error = screen.getByTestId('closed-box-vas-error');
    await error.waitFor();
    await expect(error.textContent()).resolves.toBe('vas must be positive');
    await expect(screen.getByTestId('closed-box-result-vb').count()).resolves.toBe(0);
    await screen.getByTestId('closed-box-vas').fill('50');
    await screen.getByTestId('closed-box-result-vb').waitFor();
    await expect(screen.getByTestId('closed-box-vas-error').count()).resolves.toBe(0);
  });

  it('names qts when no B4 alignment exists for the driver', async () => {
    const screen = s.page.getByTestId('tools-screen');
    await screen.getByTestId('vented-box-fs').fill('30');
    await screen.getByTestId('vented-box-qts').fill('0.5');
    await screen.getByTestId('vented-box-vas').fill('50');
    await screen.getByTestId('vented-box-alignment-B4').click();
    // Thiele 1971: the lossless B4 alignment needs Qts = 0.383 (value from memory).
    await expect(screen.getByTestId('vented-box-qts-error').textContent()).resolves.toMatch(/0\.383/);
  });

  it('completes a parameter set and converts THD', async () => {
    const screen = s.page.getByTestId('tools-screen');
    await screen.getByTestId('thiele-small-qms').fill('4');
    await screen.getByTestId('thiele-small-qes').fill('0.4');
    // Thiele 1971: Qts = Qms·Qes/(Qms + Qes).
    const qts = screen.getByTestId('thiele-small-result-qts');
    await qts.waitFor();
    expect(Number(await qts.textContent())).toBeCloseTo((4 * 0.4) / 4.4, 4);
    await expect(screen.getByTestId('thiele-small-constants').textContent()).resolves.toMatch(/343\.2 m\/s/);
    await screen.getByTestId('levels-thdPercent').fill('1');
    // THD 1 % = −40 dB: common practice, no source.
    // A locator wait, not a page function: the app's Content-Security-Policy forbids string eval.
    await screen.getByTestId('levels-result-thd-db').filter({ hasText: /^-40\.0$/ }).waitFor();
  });

  it('lays the calculators out for the screen width', async () => {
    const screen = s.page.getByTestId('tools-screen');
    const a = await screen.getByTestId('closed-box').boundingBox();
    const b = await screen.getByTestId('thiele-small').boundingBox();
    if (!a || !b) throw new Error('calculator cards are not laid out');
    if (name === 'wide') {
      // Two columns: the parameter form sits beside the box calculators, level with them.
      expect(b.x).toBeGreaterThan(a.x + a.width);
      expect(Math.abs(b.y - a.y)).toBeLessThan(2);
    } else {
      expect(b.x).toBeCloseTo(a.x, 0);
      expect(b.y).toBeGreaterThan(a.y + a.height);
      expect(a.width).toBeLessThanOrEqual(width);
    }
    // The page scrolls inside the screen frame, so a full-page shot needs a window as tall as the content.
    const contentHeight = await s.page.evaluate<number>(
      `Math.max(...Array.from(document.querySelectorAll('[data-testid="tools-screen"] *')).map((e) => e.scrollHeight))`,
    );
    await s.page.setViewportSize({ width, height: Math.min(contentHeight + 120, 8000) });
    await s.page.screenshot({ path: screenshotPath(`tools-${name}`), fullPage: true });
    await s.page.setViewportSize({ width, height });
    expect(s.errors).toEqual([]);
  });
});
