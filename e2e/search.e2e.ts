import type { DriverListResponse, DriverSummary } from '../shared/schemas/drivers';
import { baseUrl, openBrowser, screenshotPath, type BrowserSession, viewports, api } from './support/browser';

jest.setTimeout(180_000);

/** A typo a person makes: two neighbouring letters swapped in the longest word of the model. */
function typoOf(model: string): string {
  const words = model.split(/\s+/);
  const longest = words.reduce((a, b) => (b.length > a.length ? b : a));
  const i = Math.floor(longest.length / 2) - 1;
  const typo = longest.slice(0, i) + longest[i + 1] + longest[i] + longest.slice(i + 2);
  return words.map((w) => (w === longest ? typo : w)).join(' ');
}

async function takeShot(s: BrowserSession, name: string, width: number): Promise<void> {
  // The app scrolls inside its own frame, so a tall viewport shows the whole page in one picture.
  await s.page.setViewportSize({ width, height: 3000 });
  await s.page.waitForTimeout(400);
  await s.page.screenshot({ path: screenshotPath(name) });
}

describe.each(viewports)('search at $name size ($width x $height)', ({ name, width, height }) => {
  let s: BrowserSession;
  let all: DriverSummary[];
  beforeAll(async () => {
    all = (await api<DriverListResponse>('/api/drivers?limit=100')).items;
    s = await openBrowser({ width, height });
  });
  afterAll(() => s.close());
  afterEach(async () => {
    await s.page.setViewportSize({ width, height });
  });

  const list = () => s.page.getByTestId('driver-list-screen');
  const cards = () => list().locator('[data-testid^="driver-card-"]');

  it('finds a driver from search text with a typo, and the URL carries the search', async () => {
    // A model with a distinctive long word, so the typo points at one driver.
    const target = [...all].sort((a, b) => b.model.length - a.model.length).find((d) => d.model.split(/\s+/).some((w) => w.length >= 6)) ?? all[0];
    const typo = typoOf(target.model);
    expect(typo).not.toBe(target.model);
    await s.page.goto(baseUrl());
    await list().waitFor();
    await cards().first().waitFor();
    await list().getByTestId('driver-search').fill(typo);
    await list().getByTestId(`driver-card-${target.slug}`).waitFor({ timeout: 15_000 });
    await s.page.waitForURL((u) => u.searchParams.get('q') === typo);
    await expect(list().getByTestId(`driver-card-${target.slug}`).textContent()).resolves.toContain(target.model);
    await s.page.screenshot({ path: screenshotPath(`search-typo-${name}`) });
  });

  it('narrows results with a type facet, shows the facet count, and the URL carries it', async () => {
    const facets = (await api<DriverListResponse>('/api/drivers')).facets;
    const tweeters = all.filter((d) => d.type === 'tweeter');
    const facetCount = facets.type.find((f) => f.value === 'tweeter')?.count;
    expect(facetCount).toBe(tweeters.length);
    await s.page.goto(baseUrl());
    await cards().first().waitFor();
    if (name === 'phone') {
      await list().getByTestId('filters-button').click();
      const sheet = s.page.getByTestId('filters-sheet');
      await sheet.waitFor();
      await expect(sheet.getByTestId('filter-type-tweeter').textContent()).resolves.toContain(String(facetCount));
      await sheet.getByTestId('filter-type-tweeter').click();
      await sheet.getByTestId('filters-apply').filter({ hasText: `${facetCount} driver` }).waitFor();
      await s.page.screenshot({ path: screenshotPath(`search-sheet-${name}`) });
      await sheet.getByTestId('filters-apply').click();
      await sheet.waitFor({ state: 'detached' });
      await list().getByTestId('filters-button').filter({ hasText: 'Filters (1)' }).waitFor();
    } else {
      const chip = list().getByTestId('filter-column').getByTestId('filter-type-tweeter');
      await expect(chip.textContent()).resolves.toContain(String(facetCount));
      await chip.click();
    }
    await s.page.waitForURL((u) => u.searchParams.get('type') === 'tweeter');
    await list().getByTestId('driver-count').filter({ hasText: `${tweeters.length} drivers` }).waitFor();
    const shown = await cards().evaluateAll((els) => els.map((e) => e.getAttribute('data-testid')));
    expect(shown.length).toBe(Math.min(24, tweeters.length));
    const allowed = new Set(tweeters.map((d) => `driver-card-${d.slug}`));
    for (const id of shown) expect(allowed.has(id ?? '')).toBe(true);
    // A reload restores the filtered search from the URL alone.
    await s.page.reload();
    await list().getByTestId('driver-count').filter({ hasText: `${tweeters.length} drivers` }).waitFor();
  });

  it('ranks 3-inch mid-ranges for 300 Hz–3 kHz at 90 dB with reasons on each card', async () => {
    await s.page.goto(baseUrl());
    await cards().first().waitFor();
    await list().getByTestId('role-preset-mid3').click();
    await s.page.waitForURL((u) => u.searchParams.get('bandLo') === '300' && u.searchParams.get('bandHi') === '3000' && u.searchParams.get('sort') === 'role');
    const expected = await api<DriverListResponse>('/api/drivers?type=mid-range&sizeMin=2.5&sizeMax=3.5&bandLo=300&bandHi=3000&level=90&sort=role&limit=24');
    expect(expected.items.length).toBeGreaterThanOrEqual(3);
    const first = expected.items[0];
    const block = list().getByTestId(`role-${first.slug}`);
    await block.waitFor();
    await expect(block.textContent()).resolves.toContain('#1');
    await expect(block.textContent()).resolves.toContain(first.role?.reasons[0] ?? '@@');
    const order = await cards().evaluateAll((els) => els.map((e) => e.getAttribute('data-testid')));
    expect(order.slice(0, 3)).toEqual(expected.items.slice(0, 3).map((d) => `driver-card-${d.slug}`));
    await expect(list().locator('[data-testid^="role-"][data-testid$="-"]').count()).resolves.toBe(0);
    await expect(list().getByTestId('driver-count').textContent()).resolves.toContain('ranked for 300–3000 Hz at 90 dB');
    await s.page.screenshot({ path: screenshotPath(`search-role-${name}`) });
    await takeShot(s, `search-role-${name}-full`, width);
  });

  it('shows the server message for a search the API refuses', async () => {
    await s.page.goto(`${baseUrl()}/?fsMin=90&fsMax=50`);
    const err = list().getByTestId('list-error');
    await err.waitFor();
    await expect(err.textContent()).resolves.toContain('fsMax');
    expect(s.errors).toEqual([]);
  });
});
