import type { DriverListResponse } from '../shared/schemas/drivers';
import { api, baseUrl, openBrowser, screenshotPath, type BrowserSession } from './support/browser';

jest.setTimeout(240_000);

// One person's path through sign-in, saving, signing out and back, and being promoted by an admin.
describe('accounts and roles in the browser', () => {
  const login = `e2e-${Date.now().toString(36)}`;
  let s: BrowserSession;
  let savedTitle = '';
  beforeAll(async () => {
    s = await openBrowser({ width: 1440, height: 900 });
  });
  afterAll(() => s.close());

  async function signInAs(who: string, create: boolean) {
    await s.page.getByTestId('sign-in').first().click();
    await s.page.waitForURL(/fake-provider\/login\/oauth\/authorize/);
    if (create) {
      await s.page.getByTestId('fake-login').fill(who);
      await s.page.getByTestId('fake-name').fill(`E2E ${who}`);
      await s.page.getByTestId('fake-create').click();
    } else {
      await s.page.getByTestId(`fake-account-${who}`).click();
    }
    await s.page.getByTestId('account-menu').first().waitFor();
  }

  it('signs a new user in through the test provider and back to the page they were on', async () => {
    await s.page.goto(`${baseUrl()}/tools`);
    await s.page.getByTestId('tools-screen').waitFor();
    await signInAs(login, true);
    expect(new URL(s.page.url()).pathname).toBe('/tools');
    await expect(s.page.getByTestId('account-role').first().textContent()).resolves.toBe('member');
    await expect(s.page.getByTestId('submit-link').count()).resolves.toBe(0);
  });

  it('saves a comparison, signs out, and finds it again after signing back in', async () => {
    const mids = await api<DriverListResponse>('/api/drivers?type=mid-range&sizeMin=3&sizeMax=3&limit=2');
    await s.page.goto(`${baseUrl()}/stack?drivers=${mids.items.map((d) => d.slug).join(',')}`);
    const form = s.page.getByTestId('stack-screen').getByTestId('save-form');
    savedTitle = `Door pod mids ${login}`;
    await form.getByTestId('save-title').fill(savedTitle);
    await form.getByTestId('save-submit').click();
    await form.getByTestId('saved-link').waitFor();

    await s.page.getByTestId('sign-out').first().click();
    await s.page.getByTestId('sign-in').first().waitFor();
    await s.page.goto(`${baseUrl()}/saved`);
    // A protected page sends a visitor to sign in and back.
    await s.page.waitForURL(/fake-provider\/login\/oauth\/authorize/);
    await s.page.getByTestId(`fake-account-${login}`).click();
    await s.page.waitForURL(/\/saved$/);
    await s.page.getByTestId('saved-screen').getByText(savedTitle).waitFor();
    await s.page.screenshot({ path: screenshotPath('account-saved') });
  });

  it('lets an admin make the user a reviewer, who then sees the submit action', async () => {
    // Leave the protected page first, or signing out sends the visitor straight back to sign in.
    await s.page.goto(`${baseUrl()}/tools`);
    await s.page.getByTestId('sign-out').first().click();
    await s.page.getByTestId('sign-in').first().waitFor();
    await signInAs('test-admin', false);
    await s.page.goto(`${baseUrl()}/admin`);
    const screen = s.page.getByTestId('admin-screen');
    await screen.getByTestId(`role-${login}-reviewer`).click();
    await screen.getByTestId('audit-log').getByText(new RegExp(`made ${login} reviewer`)).waitFor();
    await s.page.screenshot({ path: screenshotPath('account-admin') });

    await s.page.goto(`${baseUrl()}/tools`);
    await s.page.getByTestId('sign-out').first().click();
    await s.page.getByTestId('sign-in').first().waitFor();
    await signInAs(login, false);
    await expect(s.page.getByTestId('account-role').first().textContent()).resolves.toBe('reviewer');
    await s.page.getByTestId('submit-link').first().click();
    await s.page.getByTestId('submit-screen').getByTestId('submit-step-driver').waitFor();
    expect(s.errors).toEqual([]);
  });
});
