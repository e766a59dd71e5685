import { renderHook, waitFor } from '@testing-library/react-native';
import { http, HttpResponse } from 'msw';
import { setupServer } from 'msw/node';
import type { ReactNode } from 'react';
import { SWRConfig } from 'swr';
import { fetchJson } from '../../ui';
import { useDriver } from './use-driver';
import { useDrivers } from './use-drivers';

const summary = {
  slug: 'test-m3', model: 'Test M3', maker: { slug: 'test', name: 'Test Maker' }, type: 'mid-range',
  nominalSizeIn: 3, nominalImpedanceOhm: 4, fsHz: 100, qts: 0.6, sensitivityDb: null,
};

const requests: string[] = [];
const server = setupServer(
  http.get('*/api/drivers', ({ request }) => {
    requests.push(request.url);
    return HttpResponse.json({ items: [summary], total: 1 });
  }),
  http.get('*/api/drivers/:slug', ({ params }) =>
    params.slug === 'test-m3'
      ? HttpResponse.json({ ...summary, measurementSets: [] })
      : HttpResponse.json({ error: { code: 'not_found', message: 'Driver "x" was not found' } }, { status: 404 }),
  ),
);

beforeAll(() => server.listen({ onUnhandledRequest: 'error' }));
afterEach(() => {
  server.resetHandlers();
  requests.length = 0;
});
afterAll(() => server.close());

// A fresh cache per test, and no retries or dedupe timers keeping jest alive.
const wrapper = ({ children }: { children: ReactNode }) => (
  <SWRConfig value={{ provider: () => new Map(), fetcher: fetchJson, dedupingInterval: 0, shouldRetryOnError: false }}>{children}</SWRConfig>
);

describe('useDrivers', () => {
  it('fetches the list and passes the search text in the query string', async () => {
    const { result } = renderHook(() => useDrivers({ q: 'tset m3' }), { wrapper });
    await waitFor(() => expect(result.current.data).toBeDefined());
    expect(result.current.data?.items[0].slug).toBe('test-m3');
    expect(new URL(requests[0]).searchParams.get('q')).toBe('tset m3');
  });
});

describe('useDriver', () => {
  it('returns the driver detail', async () => {
    const { result } = renderHook(() => useDriver('test-m3'), { wrapper });
    await waitFor(() => expect(result.current.data?.model).toBe('Test M3'));
  });

  it('surfaces the envelope code and status of a failed request', async () => {
    const { result } = renderHook(() => useDriver('missing'), { wrapper });
    await waitFor(() => expect(result.current.error).toBeDefined());
    expect(result.current.error).toMatchObject({ status: 404, code: 'not_found' });
  });

  it('does not fetch without a slug', async () => {
    const { result } = renderHook(() => useDriver(undefined), { wrapper });
    expect(result.current.isLoading).toBe(false);
    expect(result.current.data).toBeUndefined();
  });
});
