import { join } from 'node:path';
import type { DriverListResponse } from '../shared/schemas/drivers';
import type { MySubmission } from '../shared/schemas/submissions';
import { api, artifactsDir, baseUrl, chartInk, openBrowser, screenshotPath, signInWithTestAccount, type BrowserSession } from './support/browser';
import { writeMeasurementFiles } from './support/measurement-files';

jest.setTimeout(300_000);

// A new reviewer's first submission: promoted by an admin, then through the five steps with real
// files picked in the browser's file dialog, to a pending entry in their own list.
describe('a reviewer submits measurements', () => {
  const stamp = Date.now().toString(36);
  const login = `e2e-rev-${stamp}`;
  const model = `QM-3 ${stamp}`;
  const files = writeMeasurementFiles(join(artifactsDir, `uploads-${stamp}`));
  let s: BrowserSession;
  const screen = () => s.page.getByTestId('submit-screen');

  beforeAll(async () => {
    s = await openBrowser({ width: 1440, height: 900 });
    await s.page.goto(`${baseUrl()}/tools`);
    await signInWithTestAccount(s.page, login, '/tools');
    const admin = await openBrowser({ width: 1440, height: 900 });
    try {
      await admin.page.goto(`${baseUrl()}/tools`);
      await signInWithTestAccount(admin.page, 'test-admin', '/admin');
      const adminScreen = admin.page.getByTestId('admin-screen');
      await adminScreen.getByTestId(`role-${login}-reviewer`).click();
      await adminScreen.getByTestId('audit-log').getByText(new RegExp(`made ${login} reviewer`)).waitFor();
    } finally {
      await admin.close();
    }
  });
  afterAll(() => s.close());

  it('warns about a driver that may already be listed', async () => {
    await s.page.goto(`${baseUrl()}/submit`);
    await screen().getByTestId('submit-step-driver').waitFor();
    const listed = (await api<DriverListResponse>('/api/drivers?type=mid-range')).items[0];
    await screen().getByTestId('submit-maker').fill(listed.maker.name.toUpperCase());
    await screen().getByTestId('submit-model').fill(listed.model.replace(/[-\s]/g, '').toLowerCase());
    const warning = screen().getByTestId('submit-near-duplicates');
    await warning.getByTestId(`submit-near-duplicate-${listed.slug}`).waitFor();
    await expect(warning.textContent()).resolves.toMatch(/very likely the same/);

    await screen().getByTestId('submit-maker').fill('Quillfield Audio');
    await screen().getByTestId('submit-model').fill(model);
    await screen().getByTestId('submit-size').fill('3');
    await screen().getByTestId('submit-impedance').fill('4');
    await warning.waitFor({ state: 'detached' });
  });

  it('shows the hearing caution with the method and the shift to 2.83 V / 1 m', async () => {
    await screen().getByTestId('submit-next').click();
    const step = screen().getByTestId('submit-step-method');
    await step.getByTestId('submit-hearing-caution').getByText(/hearing protection/).waitFor();
    await step.getByTestId('submit-voltage').fill('2,83');
    await step.getByTestId('submit-distance').fill('1');
    await step.getByTestId('submit-baffle').fill('600 × 400 mm flat baffle, driver off-centre');
    await step.getByTestId('submit-gating').fill('5 ms gate above 300 Hz');
    await step.getByTestId('submit-temperature').fill('21');
    await step.getByTestId('submit-date').fill('2026-11-30');
    await step.getByTestId('submit-sample').fill('S1');
    await expect(step.getByTestId('submit-shift').textContent()).resolves.toMatch(/\+0\.00 dB/);
  });

  it('reads three angles, an impedance sweep and THD at three levels, and names the broken line', async () => {
    await screen().getByTestId('submit-next').click();
    const step = screen().getByTestId('submit-step-files');
    const chooser = s.page.waitForEvent('filechooser');
    await step.getByTestId('submit-choose-files').click();
    await (await chooser).setFiles([...files.spl, files.impedance, ...files.thd, files.blx, files.broken].map((n) => join(files.dir, n)));
    const row = (name: string) => step.getByTestId(`submit-file-${name.replace(/[^a-zA-Z0-9]+/g, '-')}`);
    for (const n of [...files.spl, files.impedance, ...files.thd, files.blx]) {
      await row(n).getByTestId(`submit-file-${n.replace(/[^a-zA-Z0-9]+/g, '-')}-summary`).waitFor();
    }
    // Kind, angle and level were guessed from the names.
    await expect(row(files.spl[1]).getByRole('textbox', { name: /Angle/ }).inputValue()).resolves.toBe('30');
    await expect(row(files.thd[2]).getByRole('textbox', { name: /Drive level/ }).inputValue()).resolves.toBe('5.66');
    // The top level's table also carries H2 and H3: one press reads those columns too.
    await row(files.thd[2]).getByTestId(`submit-file-${files.thd[2].replace(/[^a-zA-Z0-9]+/g, '-')}-harmonics`).click();
    for (const k of ['h2', 'h3']) await step.getByTestId(`submit-file-${files.thd[2].replace(/[^a-zA-Z0-9]+/g, '-')}-${k}-summary`).waitFor();
    await expect(row(files.impedance).getByTestId(`submit-file-${files.impedance.replace(/[^a-zA-Z0-9]+/g, '-')}-summary`).textContent()).resolves.toMatch(/decimal comma.*with phase/);
    const broken = row(files.broken);
    const error = broken.getByTestId(`submit-file-${files.broken.replace(/[^a-zA-Z0-9]+/g, '-')}-error`);
    await error.waitFor();
    await expect(error.textContent()).resolves.toMatch(/mid3-broken\.txt.*line 42.*non-numeric/);
    await expect(broken.getByRole('progressbar').getAttribute('aria-valuenow')).resolves.toBe('100');
    await s.page.screenshot({ path: screenshotPath('submit-files'), fullPage: true });
    await screen().getByTestId('submit-step-todo').getByText(/mid3-broken\.txt/).waitFor();
    await broken.getByTestId(`submit-file-${files.broken.replace(/[^a-zA-Z0-9]+/g, '-')}-remove`).click();
    await screen().getByTestId('submit-step-todo').waitFor({ state: 'detached' });
  });

  it('takes pasted parameters and shows derived values and a consistency warning as they come in', async () => {
    await screen().getByTestId('submit-next').click();
    const step = screen().getByTestId('submit-step-parameters');
    // Qts given as 0.45 disagrees with Qms·Qes/(Qms + Qes) = 4 · 0.6 / 4.6 = 0.52 (Small, JAES 1972).
    await step.getByTestId('submit-paste').fill(['Fs = 95 Hz', 'Re: 3.4 ohm', 'Qms 4', 'Qes 0,6', 'Qts 0.45', 'Mms 3.2 g', 'Sd 32 cm²', 'Xmax 2.5 mm', 'X_Bl 2.1 mm', 'Wobble 3 Hz'].join('\n'));
    await step.getByTestId('submit-paste-fill').click();
    const report = step.getByTestId('submit-paste-report');
    await report.getByText('9 parameters taken.').waitFor();
    await report.getByText(/line 10/).waitFor();
    await expect(step.getByTestId('submit-ts-fs').inputValue()).resolves.toBe('95');
    await expect(step.getByTestId('submit-large-x_bl').inputValue()).resolves.toBe('2.1');
    // The Bl(x) file gives its own limit; the typed 2.1 mm is checked against it and can be replaced.
    const fromFiles = step.getByTestId('submit-large-from-files');
    await expect(fromFiles.textContent()).resolves.toMatch(/X at Bl 82 % \d+(\.\d+)? mm.*Xmax .* set by Bl/);
    await fromFiles.getByTestId('submit-large-use-files').click();
    await expect(step.getByTestId('submit-large-x_bl').inputValue()).resolves.not.toBe('2.1');
    await expect(step.getByTestId('submit-large-disagrees').count()).resolves.toBe(0);
    await step.getByTestId('submit-ts-warnings').waitFor();
    await step.getByTestId('submit-ts-result-vas').waitFor();
    // Vas = ρ·c²·Sd²·Cms with Cms = 1/((2π·Fs)²·Mms) (Small, JAES 1972): with ρ ≈ 1.2 kg/m³ and
    // c ≈ 344 m/s at 21 °C, 1/((2π·95)²·0.0032) = 0.877 mm/N and Vas ≈ 1.27 L (hand arithmetic).
    expect(Number(await step.getByTestId('submit-ts-result-vas').textContent())).toBeCloseTo(1.27, 1);
  });

  it('previews every curve, submits, and finds the submission pending', async () => {
    await screen().getByTestId('submit-next').click();
    const step = screen().getByTestId('submit-step-preview');
    await expect(step.getByTestId('submit-curve-count').textContent()).resolves.toBe('Curves: 3 SPL, 1 Impedance, 3 THD, 1 H2, 1 H3, 1 Bl(x)');
    for (const chart of ['chart-spl', 'chart-impedance', 'chart-thd', 'chart-large-signal']) {
      expect(await chartInk(s.page, step.getByTestId(chart))).toBeGreaterThan(1500);
    }
    await expect(step.getByTestId('chart-spl-legend').textContent()).resolves.toMatch(/30°.*60°/);
    await step.getByTestId('toggle-h2').click();
    await expect(step.getByTestId('chart-thd-legend').textContent()).resolves.toMatch(/H2 5\.66 V/);
    await s.page.screenshot({ path: screenshotPath('submit-preview-wide'), fullPage: true });
    await s.page.setViewportSize({ width: 390, height: 844 });
    expect(await chartInk(s.page, step.getByTestId('chart-spl'))).toBeGreaterThan(800);
    await s.page.screenshot({ path: screenshotPath('submit-preview-phone'), fullPage: true });
    await s.page.setViewportSize({ width: 1440, height: 900 });

    await step.getByTestId('submit-send').click();
    await screen().getByTestId('submit-sent').waitFor();
    const mine = screen().getByTestId('my-submissions');
    await mine.getByText(`Quillfield Audio ${model}`).waitFor();
    await mine.getByText('awaiting approval').first().waitFor();

    const res = await s.page.request.get(`${baseUrl()}/api/submissions/mine`);
    const list = ((await res.json()) as { submissions: MySubmission[] }).submissions;
    expect(list[0]).toMatchObject({ status: 'pending', model, makerName: 'Quillfield Audio', curveCount: 10 });
    // Pending work stays out of the public search.
    const search = await api<DriverListResponse>(`/api/drivers?q=${encodeURIComponent(`Quillfield ${model}`)}`);
    expect(search.items.map((d) => d.model)).not.toContain(model);
    expect(s.errors).toEqual([]);
  });

  it('adds a second sample to a driver already listed, picked from the catalogue', async () => {
    const listed = (await api<DriverListResponse>('/api/drivers?type=mid-range&sizeMin=3&sizeMax=3')).items[1];
    await screen().getByTestId('submit-another').click();
    const driverStep = screen().getByTestId('submit-step-driver');
    await driverStep.getByTestId('submit-driver-mode-existing').click();
    await driverStep.getByTestId('submit-driver-search').fill(listed.model);
    await driverStep.getByTestId(`submit-driver-pick-${listed.slug}`).click();
    await expect(driverStep.getByTestId('submit-driver-chosen').textContent()).resolves.toBe(`Adding a measurement set to ${listed.maker.name} ${listed.model}`);
    await screen().getByTestId('submit-next').click();
    await screen().getByTestId('submit-baffle').fill('600 × 400 mm flat baffle');
    await screen().getByTestId('submit-sample').fill('S2');
    await screen().getByTestId('submit-next').click();
    const chooser = s.page.waitForEvent('filechooser');
    await screen().getByTestId('submit-choose-files').click();
    await (await chooser).setFiles(join(files.dir, files.spl[0]));
    await screen().getByTestId(`submit-file-${files.spl[0].replace(/[^a-zA-Z0-9]+/g, '-')}-summary`).waitFor();
    await screen().getByTestId('submit-stepbar-5').click();
    await screen().getByTestId('submit-send').click();
    await screen().getByTestId('submit-sent').getByText('Open the listed entry').waitFor();
    const list = ((await (await s.page.request.get(`${baseUrl()}/api/submissions/mine`)).json()) as { submissions: MySubmission[] }).submissions;
    expect(list.map((x) => x.driverSlug).slice(0, 2)).toEqual([listed.slug, expect.stringMatching(/^quillfield-audio-qm-3-/)]);
    expect(list[0]).toMatchObject({ status: 'pending', curveCount: 1 });
    await screen().getByTestId('my-submissions').getByText(`${listed.maker.name} ${listed.model}`).waitFor();
    expect(s.errors).toEqual([]);
  });

  it('starts a submission from a driver page with that driver picked', async () => {
    const listed = (await api<DriverListResponse>('/api/drivers?type=tweeter')).items[0];
    await s.page.goto(`${baseUrl()}/drivers/${listed.slug}`);
    await s.page.getByTestId('driver-screen').getByTestId('driver-submit-link').click();
    await s.page.waitForURL(new RegExp(`/submit\\?driver=${listed.slug}$`));
    await expect(screen().getByTestId('submit-driver-chosen').textContent()).resolves.toBe(`Adding a measurement set to ${listed.maker.name} ${listed.model}`);
  });
});
