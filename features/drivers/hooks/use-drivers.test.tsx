import { renderHook, waitFor } from '@testing-library/react-native';
import { http, HttpResponse } from 'msw';
import { setupServer } from 'msw/node';
import { useState, type ReactNode } from 'react';
import { SWRConfig } from 'swr';
import type { DriverDetail, DriverListResponse, DriverSummary } from '../../../shared/schemas/drivers';
import { fetchJson } from '../../ui';
import { roleDisplay, takeRedirectNote } from '../logic/driver-notes';
import { useAliasRedirect } from './use-alias-redirect';
import { useDriver } from './use-driver';
import { useDrivers } from './use-drivers';

const summary: DriverSummary = {
  slug: 'test-m3', model: 'Test M3', maker: { slug: 'test', name: 'Test Maker' }, type: 'mid-range',
  nominalSizeIn: 3, nominalImpedanceOhm: 4, fsHz: 100, qts: 0.6, vasL: 1.1, xmaxMm: 2.2, sensitivityDb: null, price: 40, currency: 'EUR', aliases: ['test-m3-old'],
};
const facets: DriverListResponse['facets'] = {
  type: [{ value: 'mid-range', count: 1 }], size: [{ value: '3', count: 1 }], impedance: [{ value: '4', count: 1 }],
  fsHz: { min: 100, max: 100 }, qts: { min: 0.6, max: 0.6 }, vasL: { min: 1.1, max: 1.1 }, sensitivityDb: { min: null, max: null }, xmaxMm: { min: 2.2, max: 2.2 }, price: { min: 40, max: 40 },
};
const detail: DriverDetail = {
  ...summary, requestedSlug: 'test-m3', diaphragm: null, surround: null, voiceCoilDiameterMm: null, magnet: null, availability: null, mounting: null,
  makerSpecs: [], measurementSets: [], figures: [], spread: [],
};
const role = { score: 0.91, rank: 1, sensitivityDb: 85.2, linearityDb: 1.4, thdPercent: 0.35, beamingHz: 4400, reasons: ['flat within ±1.4 dB from 300 Hz to 3 kHz', 'THD 0.35 % at 90 dB'] };

const requests: URL[] = [];
const server = setupServer(
  http.get('*/api/drivers', ({ request }) => {
    const url = new URL(request.url);
    requests.push(url);
    if (url.searchParams.get('fsMin') === '90' && url.searchParams.get('fsMax') === '50') {
      return HttpResponse.json({ error: { code: 'validation_failed', message: 'Invalid query: fsMax: fsMax must not be below fsMin' } }, { status: 400 });
    }
    const ranked = url.searchParams.get('sort') === 'role';
    const body: DriverListResponse = {
      items: [ranked ? { ...summary, role } : summary],
      total: 1,
      facets,
      role: ranked ? { bandLo: Number(url.searchParams.get('bandLo')), bandHi: Number(url.searchParams.get('bandHi')), level: Number(url.searchParams.get('level')) } : null,
    };
    return HttpResponse.json(body);
  }),
  http.get('*/api/drivers/:slug', ({ params, request }) => {
    requests.push(new URL(request.url));
    if (params.slug === 'test-m3') return HttpResponse.json(detail);
    if (params.slug === 'test-m3-old') return HttpResponse.json({ ...detail, requestedSlug: 'test-m3-old' });
    return HttpResponse.json({ error: { code: 'not_found', message: 'Driver "x" was not found' } }, { status: 404 });
  }),
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
  it('passes the search text through unchanged for the server to match fuzzily', async () => {
    const { result } = renderHook(() => useDrivers({ q: 'tset m3' }), { wrapper });
    await waitFor(() => expect(result.current.data).toBeDefined());
    expect(result.current.data?.items[0].slug).toBe('test-m3');
    expect(requests[0].searchParams.get('q')).toBe('tset m3');
  });

  it('serialises URL filters to the API query with the same names', async () => {
    const params = { type: 'mid-range,tweeter', sizeMin: '3', sizeMax: '4', impedance: '4', fsMax: '120', vasMaxL: '2', xmaxMinMm: '2', sort: 'price', order: 'desc', offset: '24' };
    const { result } = renderHook(() => useDrivers(params), { wrapper });
    await waitFor(() => expect(result.current.data).toBeDefined());
    const q = requests[0].searchParams;
    for (const [k, v] of Object.entries(params)) expect(q.get(k)).toBe(v);
    expect(q.get('limit')).toBe('24');
    expect(result.current.data?.facets.impedance).toEqual([{ value: '4', count: 1 }]);
  });

  it('asks for role ranking when a band is set, giving the card rank, score and reasons', async () => {
    const { result } = renderHook(() => useDrivers({ bandLo: '300', bandHi: '3000', level: '90' }), { wrapper });
    await waitFor(() => expect(result.current.data?.items[0].role).toBeDefined());
    expect(requests[0].searchParams.get('sort')).toBe('role');
    expect(result.current.data?.role).toEqual({ bandLo: 300, bandHi: 3000, level: 90 });
    const fit = result.current.data?.items[0].role;
    if (!fit) throw new Error('no role');
    // What the card's role block shows, derived from the fetched item.
    const shown = roleDisplay(fit);
    expect(shown.rank).toBe('#1');
    expect(shown.score).toBe('0.91');
    expect(shown.reasons).toEqual(['flat within ±1.4 dB from 300 Hz to 3 kHz', 'THD 0.35 % at 90 dB']);
    expect(shown.figures).toContainEqual({ label: 'Linearity', value: '±1.4 dB' });
  });

  it('surfaces the 400 envelope message for the screen to show', async () => {
    const { result } = renderHook(() => useDrivers({ fsMin: '90', fsMax: '50' }), { wrapper });
    await waitFor(() => expect(result.current.error).toBeDefined());
    expect(result.current.error).toMatchObject({ status: 400, code: 'validation_failed', message: 'Invalid query: fsMax: fsMax must not be below fsMin' });
  });
});

describe('useDriver', () => {
  it('returns the driver detail and passes a role band to the server', async () => {
    const { result } = renderHook(() => useDriver('test-m3', { bandLo: '300', bandHi: '3000' }), { wrapper });
    await waitFor(() => expect(result.current.data?.model).toBe('Test M3'));
    expect(requests[0].searchParams.get('bandLo')).toBe('300');
    expect(requests[0].searchParams.get('bandHi')).toBe('3000');
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

describe('alias redirect', () => {
  it('replaces an old slug with the canonical URL and primes the cache so the new page draws at once', async () => {
    const replace = jest.fn();
    const { result } = renderHook(
      () => {
        const [slug, setSlug] = useState('test-m3-old');
        const d = useDriver(slug);
        useAliasRedirect(d.data, {}, (href) => {
          replace(href);
          setSlug('test-m3');
        });
        return { d, slug };
      },
      { wrapper },
    );
    await waitFor(() => expect(replace).toHaveBeenCalledWith('/drivers/test-m3'));
    expect(replace).toHaveBeenCalledTimes(1);
    expect(takeRedirectNote('test-m3')).toBe('test-m3-old');
    // Straight after the switch the canonical entry is already there, marked as canonical.
    expect(result.current.slug).toBe('test-m3');
    expect(result.current.d.data).toMatchObject({ slug: 'test-m3', requestedSlug: 'test-m3' });
  });

  it('keeps the role band on the canonical URL', async () => {
    const replace = jest.fn();
    renderHook(
      () => {
        const band = { bandLo: '300', bandHi: '3000' };
        const old = useDriver('test-m3-old', band);
        useAliasRedirect(old.data, band, replace);
      },
      { wrapper },
    );
    await waitFor(() => expect(replace).toHaveBeenCalledWith('/drivers/test-m3?bandLo=300&bandHi=3000'));
  });

  it('does nothing on the canonical slug', async () => {
    const replace = jest.fn();
    const { result } = renderHook(
      () => {
        const d = useDriver('test-m3');
        useAliasRedirect(d.data, {}, replace);
        return d;
      },
      { wrapper },
    );
    await waitFor(() => expect(result.current.data).toBeDefined());
    expect(replace).not.toHaveBeenCalled();
  });
});
