import { act, renderHook, waitFor } from '@testing-library/react-native';
import { http, HttpResponse } from 'msw';
import { setupServer } from 'msw/node';
import type { ReactNode } from 'react';
import { SWRConfig } from 'swr';
import { fetchJson } from '../../ui';
import { useNearDuplicates } from './use-near-duplicates';
import { useSubmissionDraft } from './use-submission-draft';

const metas: unknown[] = [];
const nearQueries: URLSearchParams[] = [];
const settings = {
  encoding: 'utf-8', bom: false, lineEnding: 'lf', separator: 'tab', decimal: '.', headerLine: 1, headerText: 'f spl', firstDataLine: 2, lastDataLine: 11,
  columns: { count: 2, x: 0, y: 1, phase: null, source: 'header' }, units: { x: 'Hz', y: 'dB', phase: null }, unitSources: { x: 'header', y: 'header', phase: null },
  output: { x: 'Hz', y: 'dB', phase: null },
};

const server = setupServer(
  http.post('*/api/uploads/parse', async ({ request }) => {
    // React Native's FormData type has no get(); the request's body is the web one.
    const form = (await request.formData()) as unknown as { get(name: string): unknown };
    const meta = JSON.parse(String(form.get('meta')))[0];
    metas.push(meta);
    const file = form.get('files') as File;
    if (file.name.startsWith('broken')) {
      return HttpResponse.json({ files: [{ fileName: file.name, ok: false, error: { file: file.name, line: 212, reason: 'non_numeric', message: `"${file.name}", line 212: non-numeric value "abc"` } }] });
    }
    const x = Array.from({ length: 10 }, (_, i) => 100 * (i + 1));
    // The reply carries a preview, not every point read, and says itself what was read.
    const preview = { x, y: x.map(() => 85), phase: null };
    return HttpResponse.json({ files: [{ fileName: file.name, ok: true, token: 'f'.repeat(32), preview, pointCount: 2000, summary: '2000 points, 100–1000 Hz, tab-separated', settings, warnings: [] }] });
  }),
  http.get('*/api/submissions/near-duplicates', ({ request }) => {
    nearQueries.push(new URL(request.url).searchParams);
    return HttpResponse.json({ candidates: [{ id: 1, slug: 'test-m3', makerName: 'Test Maker', model: 'TM-3', aliases: [], status: 'listed', reasons: ['same model code'], strength: 'strong' }] });
  }),
);
beforeAll(() => server.listen({ onUnhandledRequest: 'error' }));
afterEach(() => {
  server.resetHandlers();
  metas.length = 0;
  nearQueries.length = 0;
});
afterAll(() => server.close());

const wrapper = ({ children }: { children: ReactNode }) => <SWRConfig value={{ provider: () => new Map(), fetcher: fetchJson, dedupingInterval: 0 }}>{children}</SWRConfig>;
const blob = (text: string) => new Blob([text], { type: 'text/plain' });

describe('useSubmissionDraft', () => {
  it('reads a file as soon as it is added, with the kind and angle its name suggests', async () => {
    const { result } = renderHook(() => useSubmissionDraft(), { wrapper });
    act(() => result.current.addFiles([{ name: 'spl-30deg.txt', size: 20, blob: blob('f spl\n100 85') }]));
    await waitFor(() => expect(result.current.draft.files[0].status).toBe('read'));
    expect(metas).toEqual([{ kind: 'spl', angleDeg: 30, driveLevelV: null }]);
    expect(result.current.draft.files[0]).toMatchObject({ token: 'f'.repeat(32), progress: 1 });
    expect(result.current.draft.files[0].summary).toBe('2000 points, 100–1000 Hz, tab-separated');
    expect(result.current.draft.files[0].points?.x).toHaveLength(10);
  });

  it('reads the file again when its description changes, and not while it is incomplete', async () => {
    const { result } = renderHook(() => useSubmissionDraft(), { wrapper });
    act(() => result.current.addFiles([{ name: 'response.txt', size: 20, blob: blob('x') }]));
    await waitFor(() => expect(result.current.draft.files[0].status).toBe('read'));
    const id = result.current.draft.files[0].id;
    act(() => result.current.updateFile(id, { kind: 'thd', level: '' }));
    // THD needs a drive level: nothing is sent until it is given.
    await new Promise((r) => setTimeout(r, 50));
    expect(metas).toHaveLength(1);
    act(() => result.current.updateFile(id, { level: '2,83' }));
    await waitFor(() => expect(metas).toHaveLength(2));
    expect(metas[1]).toEqual({ kind: 'thd', angleDeg: null, driveLevelV: 2.83 });
    await waitFor(() => expect(result.current.draft.files[0].status).toBe('read'));
  });

  it('keeps the line-numbered reason of a file the server could not read', async () => {
    const { result } = renderHook(() => useSubmissionDraft(), { wrapper });
    act(() => result.current.addFiles([{ name: 'broken.txt', size: 20, blob: blob('x') }]));
    await waitFor(() => expect(result.current.draft.files[0].status).toBe('failed'));
    expect(result.current.draft.files[0].error).toEqual({ line: 212, message: '"broken.txt", line 212: non-numeric value "abc"' });
    expect(result.current.draft.files[0].token).toBeUndefined();
  });

  it('refuses a file over the size limit without sending it', async () => {
    const { result } = renderHook(() => useSubmissionDraft(), { wrapper });
    act(() => result.current.addFiles([{ name: 'huge.txt', size: 6 * 1024 * 1024, blob: blob('x') }]));
    expect(result.current.draft.files[0].status).toBe('failed');
    expect(result.current.draft.files[0].error?.message).toBe('huge.txt: 6.0 MB is over the 5.0 MB limit');
    await new Promise((r) => setTimeout(r, 50));
    expect(metas).toHaveLength(0);
  });
});

describe('useNearDuplicates', () => {
  it('asks once typing pauses, with both names', async () => {
    const { result, rerender } = renderHook<ReturnType<typeof useNearDuplicates>, { maker: string; model: string }>(({ maker, model }) => useNearDuplicates(maker, model, 20), { wrapper, initialProps: { maker: 'T', model: '' } });
    rerender({ maker: 'Test Maker', model: 'tm3' });
    await waitFor(() => expect(result.current.data?.candidates).toHaveLength(1));
    expect(nearQueries).toHaveLength(1);
    expect(nearQueries[0].get('makerName')).toBe('Test Maker');
    expect(nearQueries[0].get('model')).toBe('tm3');
  });
});
