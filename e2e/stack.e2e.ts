import { readFileSync } from 'node:fs';
import type { DriverListResponse } from '../shared/schemas/drivers';
import { api, baseUrl, openBrowser, screenshotPath, type BrowserSession, viewports, signInWithTestAccount, chartInk } from './support/browser';

jest.setTimeout(300_000);

type Chart = ReturnType<BrowserSession['page']['getByTestId']>;

async function inkOf(s: BrowserSession, chart: Chart): Promise<number> {
  return chartInk(s.page, chart);
}

/** Width and height from a PNG's IHDR chunk (bytes 16–23, big-endian), after the 8-byte signature. */
function pngSize(buf: Buffer): { width: number; height: number; signature: boolean } {
  const signature = buf.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]));
  return { signature, width: buf.readUInt32BE(16), height: buf.readUInt32BE(20) };
}

describe.each(viewports)('stack at $name size ($width x $height)', ({ name, width, height }) => {
  let s: BrowserSession;
  let slugs: string[];
  let savedUrl = '';
  beforeAll(async () => {
    const list = await api<DriverListResponse>('/api/drivers?type=mid-range&sizeMin=3&sizeMax=3&limit=4');
    slugs = list.items.map((d) => d.slug);
    if (slugs.length < 4) throw new Error(`demo data has ${slugs.length} 3-inch mid-ranges, need 4`);
    s = await openBrowser({ width, height });
  });
  afterAll(() => s.close());

  const screen = () => s.page.getByTestId('stack-screen');

  async function readout(): Promise<string[]> {
    const texts: string[] = [];
    for (let i = 0; i < 4; i++) texts.push((await screen().getByTestId(`readout-${i}-spl`).textContent()) ?? '');
    return texts;
  }

  async function hoverSpl(fraction: number) {
    const chart = screen().getByTestId('stack-chart-spl');
    await chart.scrollIntoViewIfNeeded();
    const box = await chart.locator('canvas').boundingBox();
    if (!box) throw new Error('no SPL canvas');
    await s.page.mouse.move(box.x + box.width * fraction, box.y + box.height * 0.5, { steps: 4 });
    await screen().getByTestId('cursor-frequency').waitFor();
    await s.page.waitForTimeout(100);
  }

  it('draws the three charts for four drivers and reads all four at the cursor', async () => {
    await s.page.goto(`${baseUrl()}/stack?drivers=${slugs.join(',')}`);
    await screen().getByTestId('slot-3').waitFor();
    for (const id of ['stack-chart-spl', 'stack-chart-thd', 'stack-chart-impedance']) {
      const chart = screen().getByTestId(id);
      await chart.scrollIntoViewIfNeeded();
      const ink = await inkOf(s, chart);
      expect({ id, drawn: ink > 1500 }).toEqual({ id, drawn: true });
    }
    await hoverSpl(0.55);
    const freq = (await screen().getByTestId('cursor-frequency').textContent()) ?? '';
    expect(freq).toMatch(/^\d+(\.\d+)? (Hz|kHz)$/);
    const values = await readout();
    for (const v of values) expect(v).toMatch(/^\d+\.\d dB$/);
    await expect(screen().getByTestId('readout-0-z').textContent()).resolves.toMatch(/Ω$/);
    await expect(screen().getByTestId('stack-legend').textContent()).resolves.toContain('·');
    await expect(screen().getByTestId('thd-caution').textContent()).resolves.toContain('hearing');
    const table = screen().getByTestId('stack-table');
    await expect(table.textContent()).resolves.toContain('Qts');
    await table.getByText('best', { exact: true }).first().waitFor();
    await expect(table.textContent()).resolves.toContain('Δ');
    await s.page.screenshot({ path: screenshotPath(`stack-${name}`) });
  });

  it('puts normalisation and smoothing in the URL and changes the readout', async () => {
    await hoverSpl(0.3);
    const before = await readout();
    await screen().getByTestId('level-band').click();
    await s.page.waitForURL((u) => u.searchParams.get('level') === 'band');
    await screen().getByTestId('smoothing-1-3').click();
    await s.page.waitForURL((u) => u.searchParams.get('smoothing') === '1/3');
    await expect(screen().getByTestId('stack-normalisation').textContent()).resolves.toContain('1/3 octave smoothing');
    await hoverSpl(0.31);
    await hoverSpl(0.3);
    const after = await readout();
    expect(after).not.toEqual(before);
    // Band alignment brings every driver's band mean to the first one's; drivers still read a level.
    for (const v of after) expect(v).toMatch(/dB$/);
    await screen().getByTestId('toggle-highlight').click();
    await s.page.waitForURL((u) => u.searchParams.get('highlight') === '1');
    await s.page.screenshot({ path: screenshotPath(`stack-${name}-band`) });
  });

  it('saves a link that opens the same stack in a fresh browser', async () => {
    // Saving needs a signed-in member; sign-in returns to this very URL, options and all.
    await signInWithTestAccount(s.page, 'test-member');
    await screen().getByTestId('stack-legend').waitFor();
    const form = screen().getByTestId('save-form');
    await form.scrollIntoViewIfNeeded();
    await form.getByTestId('save-title').fill(`Four 3-inch mids (${name})`);
    await form.getByTestId('save-note').fill('Band-aligned, 1/3 octave.');
    await form.getByTestId('save-submit').click();
    const link = form.getByTestId('saved-link');
    await link.waitFor({ timeout: 15_000 });
    savedUrl = (await link.textContent()) ?? '';
    expect(savedUrl).toMatch(/\/o\/[A-Za-z0-9_-]+$/);

    const fresh = await openBrowser({ width, height });
    try {
      await fresh.page.goto(savedUrl);
      const other = fresh.page.getByTestId('stack-screen');
      await expect(other.getByTestId('saved-title').textContent()).resolves.toContain('Four 3-inch mids');
      await other.getByTestId('slot-3').waitFor();
      const legend = (await other.getByTestId('stack-legend').textContent()) ?? '';
      const original = (await screen().getByTestId('stack-legend').textContent()) ?? '';
      expect(legend).toBe(original);
      await expect(other.getByTestId('stack-normalisation').textContent()).resolves.toContain('1/3 octave smoothing');
      const ink = await inkOf(fresh, other.getByTestId('stack-chart-spl'));
      expect(ink).toBeGreaterThan(1500);
      await fresh.page.screenshot({ path: screenshotPath(`stack-${name}-saved`) });
      await fresh.page.goto(`${savedUrl}/embed`);
      const embed = fresh.page.getByTestId('embed-screen');
      await expect(embed.getByTestId('embed-source').textContent()).resolves.toContain('measured at 2.83 V / 1 m');
      expect(await inkOf(fresh, embed.getByTestId('stack-chart-impedance'))).toBeGreaterThan(1500);
      expect(await fresh.page.getByTestId('nav-tools').count()).toBe(0);
      await fresh.page.screenshot({ path: screenshotPath(`stack-${name}-embed`) });
      expect(fresh.errors).toEqual([]);
    } finally {
      await fresh.close();
    }
  });

  it('downloads a PNG of the charts and a CSV of the curves', async () => {
    const pngButton = screen().getByTestId('export-png');
    await pngButton.scrollIntoViewIfNeeded();
    const [png] = await Promise.all([s.page.waitForEvent('download', { timeout: 30_000 }), pngButton.click()]).catch(async (e: Error) => {
      throw new Error(`${e.message}; page says: ${await screen().getByTestId('export-error').textContent().catch(() => 'nothing')}; errors: ${s.errors.join(' | ')}`);
    });
    expect(png.suggestedFilename()).toBe('conestack-stack.png');
    const buf = readFileSync(await png.path());
    const size = pngSize(buf);
    expect(size.signature).toBe(true);
    expect(size.width).toBe(1200);
    expect(size.height).toBeGreaterThan(800);
    expect(buf.length).toBeGreaterThan(20_000);

    const [csv] = await Promise.all([s.page.waitForEvent('download'), screen().getByTestId('export-csv').click()]);
    expect(csv.suggestedFilename()).toBe('conestack-stack.csv');
    const lines = readFileSync(await csv.path(), 'utf8').trim().split('\n');
    expect(lines[0].startsWith('frequency_hz,')).toBe(true);
    for (const slug of slugs) expect(lines[0]).toContain(`${slug}_spl_db`);
    expect(lines.length - 1).toBeGreaterThan(470);
    expect(lines.length - 1).toBeLessThan(490);
    expect(s.errors).toEqual([]);
  });
});
