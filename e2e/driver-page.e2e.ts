import type { DriverDetail, DriverListResponse } from '../shared/schemas/drivers';
import { baseUrl, openBrowser, screenshotPath, type BrowserSession, viewports, api, chartInk } from './support/browser';

jest.setTimeout(240_000);

/** A parameter whose measured value is more than 10 % off the maker's figure, if any. */
function flaggedParameter(d: DriverDetail): string | null {
  const set = d.measurementSets[0];
  for (const p of set?.parameters ?? []) {
    const spec = d.makerSpecs.find((m) => m.name === p.name);
    if (spec && spec.value !== 0 && Math.abs((p.value - spec.value) / spec.value) > 0.1) return p.name;
  }
  return null;
}

interface Picks {
  /** A mid-range or mid-woofer with several measurement sets: door caution, picker and spread. */
  main: DriverDetail;
  flagged: { slug: string; name: string } | null;
  alias: { old: string; canonical: string } | null;
}

async function pick(): Promise<Picks> {
  const items = (await api<DriverListResponse>('/api/drivers?limit=100')).items;
  let main: DriverDetail | null = null;
  let flagged: Picks['flagged'] = null;
  let alias: Picks['alias'] = null;
  for (const it of items) {
    if (main && flagged && alias) break;
    const d = await api<DriverDetail>(`/api/drivers/${it.slug}`);
    if (!main && (d.type === 'mid-range' || d.type === 'mid-woofer') && d.measurementSets.length > 1) main = d;
    const f = flaggedParameter(d);
    if (!flagged && f) flagged = { slug: d.slug, name: f };
    if (!alias) {
      for (const a of d.aliases.filter((x) => /^[a-z0-9-]+$/.test(x))) {
        const res = await fetch(`${baseUrl()}/api/drivers/${a}`);
        if (res.ok && ((await res.json()) as DriverDetail).slug === d.slug) alias = { old: a, canonical: d.slug };
      }
    }
  }
  if (!main) throw new Error('demo data has no mid-range with several measurement sets');
  return { main, flagged, alias };
}

async function inkOf(s: BrowserSession, chart: ReturnType<BrowserSession['page']['getByTestId']>): Promise<number> {
  return chartInk(s.page, chart);
}

describe.each(viewports)('driver page at $name size ($width x $height)', ({ name, width, height }) => {
  let s: BrowserSession;
  let picks: Picks;
  beforeAll(async () => {
    picks = await pick();
    s = await openBrowser({ width, height });
  });
  afterAll(() => s.close());

  const screen = () => s.page.getByTestId('driver-screen');

  it('draws every chart, impedance phase under magnitude, with a legend', async () => {
    const d = picks.main;
    await s.page.goto(`${baseUrl()}/drivers/${d.slug}`);
    await screen().getByRole('heading', { name: d.model }).waitFor();
    for (const id of ['chart-spl', 'chart-impedance', 'chart-impedance-phase', 'chart-thd', 'chart-large-signal']) {
      const chart = screen().getByTestId(id);
      await chart.scrollIntoViewIfNeeded();
      const ink = await inkOf(s, chart);
      expect({ id, drawn: ink > 1500 }).toEqual({ id, drawn: true });
    }
    await expect(screen().getByTestId('chart-spl-legend').textContent()).resolves.toContain('On axis');
    // The phase chart sits right under the magnitude, the same width, with the same two lines.
    await expect(screen().getByTestId('chart-impedance-phase-legend').textContent()).resolves.toBe('MeasuredFitted model');
    const mag = await screen().getByTestId('chart-impedance').locator('canvas').boundingBox();
    const phase = await screen().getByTestId('chart-impedance-phase').locator('canvas').boundingBox();
    expect(phase && mag && { x: phase.x, width: phase.width, below: phase.y > mag.y + mag.height }).toEqual({ x: mag?.x, width: mag?.width, below: true });
    await screen().getByTestId('chart-impedance-phase').screenshot({ path: screenshotPath(`driver-page-${name}-phase`) });
    // Harmonics join the distortion chart's legend when toggled on.
    await screen().getByTestId('toggle-h2').click();
    await screen().getByTestId('chart-thd-legend').getByText(/^H2 /).first().waitFor();
    await s.page.screenshot({ path: screenshotPath(`driver-page-${name}`) });
  });

  it('shows parameters beside the maker spec, the spread, figures, method and the cautions', async () => {
    const small = screen().getByTestId('params-small');
    await small.getByText('Maker', { exact: true }).waitFor();
    await small.getByText('Fs', { exact: true }).waitFor();
    await screen().getByTestId('params-large').waitFor();
    await expect(screen().getByTestId('spread-table').textContent()).resolves.toContain('±');
    const figures = screen().getByTestId('figures-panel');
    await expect(figures.textContent()).resolves.toContain('Sensitivity, 2.83 V / 1 m');
    await expect(screen().getByTestId('figures-band').textContent()).resolves.toContain('usual band');
    await expect(figures.textContent()).resolves.toContain('sets this edge');
    await expect(screen().getByTestId('method-block').textContent()).resolves.toContain(picks.main.measurementSets[0].reviewer);
    await expect(screen().getByTestId('caution-vehicle-door').textContent()).resolves.toContain('airbags');
    await expect(screen().getByTestId('caution-cutting').textContent()).resolves.toContain('eye and hearing protection');
    // Several sets: a picker, and every set's on-axis response overlaid.
    await screen().getByTestId('set-picker').waitFor();
    const second = picks.main.measurementSets[1];
    await screen().getByTestId(`set-${second.id}`).click();
    await expect(screen().getByTestId('selected-set').textContent()).resolves.toContain(second.label);
    await expect(screen().getByTestId('chart-sets-legend').textContent()).resolves.toContain(second.label);
    await s.page.setViewportSize({ width, height: 4200 });
    await s.page.waitForTimeout(1500);
    await s.page.screenshot({ path: screenshotPath(`driver-page-${name}-full`) });
    await s.page.setViewportSize({ width, height });
  });

  it('adds the driver to the stack and keeps it over a reload', async () => {
    await screen().getByTestId('stack-add').click();
    await screen().getByTestId('stack-add').filter({ hasText: 'Added (1/4)' }).waitFor();
    await s.page.reload();
    await screen().getByTestId('stack-add').filter({ hasText: 'Added (1/4)' }).waitFor();
    await expect(s.page.evaluate<string | null>("window.localStorage.getItem('conestack.stack')")).resolves.toBe(JSON.stringify([picks.main.slug]));
  });

  it('marks a maker-spec deviation beyond ±10 %', async () => {
    if (!picks.flagged) return; // The demo data has no such driver: nothing to mark.
    await s.page.goto(`${baseUrl()}/drivers/${picks.flagged.slug}`);
    const flag = screen().getByTestId(`deviation-flag-${picks.flagged.name}`);
    await flag.waitFor();
    await expect(flag.textContent()).resolves.toMatch(/^[+−]\d+ %$/);
  });

  it('takes an old slug to the canonical URL with a note', async () => {
    if (!picks.alias) throw new Error('demo data has no old slug');
    await s.page.goto(`${baseUrl()}/drivers/${picks.alias.old}`);
    await s.page.waitForURL((u) => u.pathname === `/drivers/${picks.alias?.canonical}`);
    await expect(screen().getByTestId('formerly-note').textContent()).resolves.toContain(picks.alias.old);
    expect(s.errors).toEqual([]);
  });
});
