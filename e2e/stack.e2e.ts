import { readFileSync } from 'node:fs';
import type { CDPSession } from 'playwright-core';
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

/** "678 Hz" or "1.23 kHz" back to hertz. */
function hertz(text: string): number {
  const m = /^(\d+(?:\.\d+)?) (Hz|kHz)$/.exec(text);
  if (!m) throw new Error(`not a frequency: ${text}`);
  return Number(m[1]) * (m[2] === 'kHz' ? 1000 : 1);
}

describe('stack on a touch phone (390 x 844)', () => {
  let s: BrowserSession;
  let slugs: string[];
  let cdp: CDPSession;
  beforeAll(async () => {
    const list = await api<DriverListResponse>('/api/drivers?type=mid-range&sizeMin=3&sizeMax=3&limit=4');
    slugs = list.items.map((d) => d.slug);
    if (slugs.length < 4) throw new Error(`demo data has ${slugs.length} 3-inch mid-ranges, need 4`);
    s = await openBrowser({ width: 390, height: 844 }, { touch: true });
    // Touches sent through the browser's own input pipeline, as a finger's would be: Chromium turns
    // them into pointer and touch events and applies touch-action, so the page may scroll instead.
    cdp = await s.context.newCDPSession(s.page);
  });
  afterAll(() => s.close());

  const screen = () => s.page.getByTestId('stack-screen');
  const spl = () => screen().getByTestId('stack-chart-spl');
  type Point = { x: number; y: number };

  async function touchDrag(from: Point, to: Point, steps = 10) {
    const at = (k: number) => ({ x: from.x + ((to.x - from.x) * k) / steps, y: from.y + ((to.y - from.y) * k) / steps });
    await cdp.send('Input.dispatchTouchEvent', { type: 'touchStart', touchPoints: [at(0)] });
    for (let k = 1; k <= steps; k++) {
      await cdp.send('Input.dispatchTouchEvent', { type: 'touchMove', touchPoints: [at(k)] });
      await s.page.waitForTimeout(16);
    }
    await cdp.send('Input.dispatchTouchEvent', { type: 'touchEnd', touchPoints: [] });
    await s.page.waitForTimeout(150);
  }

  /** The SPL plot's box (the cursor layer covers exactly the plot) and a point at a fraction across it. */
  async function plot() {
    const box = await spl().getByTestId('chart-cursor-layer').boundingBox();
    if (!box) throw new Error('no cursor layer on the SPL chart');
    return { box, at: (fx: number, fy = 0.5): Point => ({ x: box.x + box.width * fx, y: box.y + box.height * fy }) };
  }

  async function readRows() {
    const rows: { spl: string; thd: string; z: string }[] = [];
    for (let i = 0; i < 4; i++) {
      const text = async (k: string) => (await screen().getByTestId(`readout-${i}-${k}`).textContent()) ?? '';
      rows.push({ spl: await text('spl'), thd: await text('thd'), z: await text('z') });
    }
    return rows;
  }

  /** The screen's scrolling column: the ScrollView renders as a div with its own overflow. */
  const scrollTop = () =>
    screen().evaluate((root) => {
      const all = root.querySelectorAll('div');
      for (let i = 0; i < all.length; i++) {
        const el = all[i];
        const oy = getComputedStyle(el).overflowY;
        if ((oy === 'auto' || oy === 'scroll') && el.scrollHeight > el.clientHeight) return el.scrollTop;
      }
      return -1;
    });

  it('moves the shared cursor with a finger dragged along the SPL chart, left reading lower than right', async () => {
    await s.page.goto(`${baseUrl()}/stack?drivers=${slugs.join(',')}`);
    await screen().getByTestId('slot-3').waitFor();
    expect(await chartInk(s.page, spl())).toBeGreaterThan(1500);
    const readoutBox = screen().getByTestId('cursor-readout');
    // The readout sits just above the SPL chart; bring it to the top so both are on screen.
    await readoutBox.evaluate((el) => el.scrollIntoView({ block: 'start' }));
    await s.page.waitForTimeout(200);
    // Before any touch: every row is there as dashes, so the first touch moves nothing on the page.
    expect(await screen().getByTestId('cursor-frequency').count()).toBe(0);
    expect((await readRows()).map((r) => r.spl)).toEqual(['—', '—', '—', '—']);
    const emptyHeight = (await readoutBox.boundingBox())?.height;
    const p = await plot();

    await touchDrag(p.at(0.05), p.at(0.2));
    const left = (await screen().getByTestId('cursor-frequency').textContent()) ?? '';
    const leftRows = await readRows();
    for (const r of leftRows) {
      expect(r.spl).toMatch(/^\d+\.\d dB$/);
      expect(r.thd).toMatch(/^\d+\.\d\d %$/);
      expect(r.z).toMatch(/^\d+\.\d\d Ω$/);
    }
    // The cursor follows the finger, not just the touch: 20 Hz–20 kHz is three decades across the plot.
    expect(hertz(left) / (20 * 1000 ** 0.2)).toBeGreaterThan(0.9);
    expect(hertz(left) / (20 * 1000 ** 0.2)).toBeLessThan(1.1);
    // Every chart draws the shared cursor.
    for (const id of ['stack-chart-spl', 'stack-chart-thd', 'stack-chart-impedance']) {
      expect({ id, lines: await screen().getByTestId(id).getByTestId('chart-cursor-line').count() }).toEqual({ id, lines: 1 });
    }
    // A sideways drag belongs to the cursor: the page did not scroll under it, nothing moved.
    const afterLeft = await plot();
    expect(afterLeft.box.y).toBeCloseTo(p.box.y, 0);
    expect((await readoutBox.boundingBox())?.height).toBe(emptyHeight);

    await touchDrag(p.at(0.6), p.at(0.85));
    const right = (await screen().getByTestId('cursor-frequency').textContent()) ?? '';
    expect(hertz(right)).toBeGreaterThan(hertz(left));
    expect(hertz(right) / (20 * 1000 ** 0.85)).toBeGreaterThan(0.9);
    expect(hertz(right) / (20 * 1000 ** 0.85)).toBeLessThan(1.1);
    const rightRows = await readRows();
    expect(rightRows.map((r) => r.spl)).not.toEqual(leftRows.map((r) => r.spl));
    for (const r of rightRows) expect(r.spl).toMatch(/^\d+\.\d dB$/);
    expect((await readoutBox.boundingBox())?.height).toBe(emptyHeight);
    await s.page.screenshot({ path: screenshotPath('stack-touch-phone') });

    // A mostly sideways drag that wanders up and down stays with the cursor to its end (half way
    // across is the geometric mean, 632 Hz) instead of turning into a scroll part way.
    await touchDrag(p.at(0.3, 0.3), p.at(0.5, 0.6));
    const middle = hertz((await screen().getByTestId('cursor-frequency').textContent()) ?? '');
    expect(middle / Math.sqrt(20 * 20000)).toBeGreaterThan(0.9);
    expect(middle / Math.sqrt(20 * 20000)).toBeLessThan(1.1);
    expect((await plot()).box.y).toBeCloseTo(p.box.y, 0);

    // A tap alone sets the cursor too.
    await s.page.touchscreen.tap(p.at(0.4).x, p.at(0.4).y);
    await s.page.waitForTimeout(150);
    const tapped = hertz((await screen().getByTestId('cursor-frequency').textContent()) ?? '');
    expect(tapped / (20 * 1000 ** 0.4)).toBeGreaterThan(0.9);
    expect(tapped / (20 * 1000 ** 0.4)).toBeLessThan(1.1);
    expect(s.errors).toEqual([]);
  });

  it('still scrolls the page with a vertical swipe that starts on the chart', async () => {
    const before = (await screen().getByTestId('cursor-frequency').textContent()) ?? '';
    const top = await scrollTop();
    expect(top).toBeGreaterThanOrEqual(0);
    const p = await plot();
    // Started well left of the cursor: the browser takes the swipe as a scroll and the cursor stays put.
    await touchDrag(p.at(0.1, 0.9), { x: p.at(0.1).x, y: p.at(0.1, 0.9).y - 300 }, 12);
    await s.page.waitForTimeout(400);
    expect(await scrollTop()).toBeGreaterThan(top + 100);
    await expect(screen().getByTestId('cursor-frequency').textContent()).resolves.toBe(before);
    expect(s.errors).toEqual([]);
  });
});
