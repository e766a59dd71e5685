import { renderHook, waitFor } from '@testing-library/react-native';
import { http, HttpResponse } from 'msw';
import { setupServer } from 'msw/node';
import type { ReactNode } from 'react';
import { SWRConfig } from 'swr';
import type { OverlayResponse, SavedOverlay } from '../../../shared/schemas/overlay';
import { ApiRequestError, fetchJson } from '../../ui';
import { overlayPath, saveOverlay } from '../api/overlay-api';
import { DEFAULT_OPTIONS } from '../logic/stack-options';
import { useOverlay, useSavedOverlay } from './use-overlay';

const response: OverlayResponse = { grid: [20, 40], band: { lo: 300, hi: 3000 }, drivers: [] };
const saved: SavedOverlay = { code: 'abc123', title: 'Four mids', note: '', entries: [{ slug: 'new-name', setId: 3 }], options: DEFAULT_OPTIONS, createdAt: '2026-01-01T00:00:00Z' };

const requests: URL[] = [];
let saveStatus = 201;
const server = setupServer(
  http.get('*/api/overlay', ({ request }) => {
    const url = new URL(request.url);
    requests.push(url);
    if (url.searchParams.get('drivers')?.includes('missing')) {
      return HttpResponse.json({ error: { code: 'not_found', message: 'Driver "missing" was not found', details: { slugs: ['missing'] } } }, { status: 404 });
    }
    return HttpResponse.json(response);
  }),
  http.get('*/api/overlays/:code', ({ params }) =>
    params.code === 'abc123' ? HttpResponse.json(saved) : HttpResponse.json({ error: { code: 'not_found', message: 'No saved stack "x"' } }, { status: 404 }),
  ),
  http.post('*/api/overlays', async ({ request }) => {
    const body = (await request.json()) as { entries: unknown[] };
    if (saveStatus === 401) return HttpResponse.json({ error: { code: 'unauthorized', message: 'Sign in to save' } }, { status: 401 });
    return HttpResponse.json({ code: 'zz9', url: '/o/zz9', echo: body.entries }, { status: 201 });
  }),
);

beforeAll(() => server.listen({ onUnhandledRequest: 'error' }));
afterEach(() => {
  server.resetHandlers();
  requests.length = 0;
  saveStatus = 201;
});
afterAll(() => server.close());

const wrapper = ({ children }: { children: ReactNode }) => (
  <SWRConfig value={{ provider: () => new Map(), fetcher: fetchJson, dedupingInterval: 0, shouldRetryOnError: false }}>{children}</SWRConfig>
);

describe('overlay paths', () => {
  it('lists slugs in order and leaves an empty place for a default set', () => {
    expect(overlayPath([{ slug: 'a', setId: 12 }, { slug: 'b', setId: null }, { slug: 'c', setId: 15 }])).toBe('/api/overlay?drivers=a,b,c&sets=12,,15');
    expect(overlayPath([{ slug: 'a', setId: null }], { lo: 300, hi: 3000 })).toBe('/api/overlay?drivers=a&bandLo=300&bandHi=3000');
    expect(overlayPath([])).toBeNull();
  });
});

describe('useOverlay', () => {
  it('asks the server with the slugs, sets and band', async () => {
    const { result } = renderHook(() => useOverlay([{ slug: 'a-1', setId: null }, { slug: 'b-2', setId: 7 }], { lo: 300, hi: 3000 }), { wrapper });
    await waitFor(() => expect(result.current.data).toBeDefined());
    const q = requests[0].searchParams;
    expect(q.get('drivers')).toBe('a-1,b-2');
    expect(q.get('sets')).toBe(',7');
    expect(q.get('bandLo')).toBe('300');
    expect(q.get('bandHi')).toBe('3000');
  });

  it('surfaces the error envelope with status, code and details', async () => {
    const { result } = renderHook(() => useOverlay([{ slug: 'missing', setId: null }]), { wrapper });
    await waitFor(() => expect(result.current.error).toBeDefined());
    expect(result.current.error).toBeInstanceOf(ApiRequestError);
    expect(result.current.error).toMatchObject({ status: 404, code: 'not_found', message: 'Driver "missing" was not found', details: { slugs: ['missing'] } });
  });

  it('does not fetch an empty stack', () => {
    const { result } = renderHook(() => useOverlay([]), { wrapper });
    expect(result.current.isLoading).toBe(false);
    expect(requests).toHaveLength(0);
  });
});

describe('saved stacks', () => {
  it('loads a saved stack by code with its current slugs', async () => {
    const { result } = renderHook(() => useSavedOverlay('abc123'), { wrapper });
    await waitFor(() => expect(result.current.data).toBeDefined());
    expect(result.current.data?.entries).toEqual([{ slug: 'new-name', setId: 3 }]);
  });

  it('posts entries and options and returns the short link; a 401 says sign-in is needed', async () => {
    await expect(saveOverlay('T', '', [{ slug: 'a', setId: null }], DEFAULT_OPTIONS)).resolves.toMatchObject({ code: 'zz9', url: '/o/zz9', echo: [{ slug: 'a', setId: null }] });
    saveStatus = 401;
    await expect(saveOverlay('T', '', [{ slug: 'a', setId: null }], DEFAULT_OPTIONS)).rejects.toMatchObject({ status: 401 });
  });
});
