import { renderHook, waitFor } from '@testing-library/react-native';
import { http, HttpResponse } from 'msw';
import { setupServer } from 'msw/node';
import type { ClosedBoxCalcInput } from '../../../shared/schemas/calc';
import { useCalc, type CalcState } from './use-calc';

const bodies: unknown[] = [];
const server = setupServer(
  http.post('*/api/calc/:name', async ({ request, params }) => {
    const body = (await request.json()) as { vas: number };
    bodies.push({ name: params.name, ...body });
    if (body.vas < 0) {
      const fields = [{ field: 'vas', message: 'vas must be positive' }];
      return HttpResponse.json({ error: { code: 'validation_failed', message: 'Invalid body: vas: vas must be positive', details: { fields } } }, { status: 400 });
    }
    return HttpResponse.json({ vb: body.vas / 2 });
  }),
);

beforeAll(() => server.listen({ onUnhandledRequest: 'error' }));
afterEach(() => {
  server.resetHandlers();
  bodies.length = 0;
});
afterAll(() => server.close());

const input = (vas: number): ClosedBoxCalcInput => ({ fs: 30, qts: 0.35, vas, qtc: 0.707 });

describe('useCalc', () => {
  it('sends only the last of several quick changes', async () => {
    const { result, rerender } = renderHook<CalcState<{ vb: number }>, { body: ClosedBoxCalcInput }>(
      ({ body }) => useCalc<{ vb: number }, 'closed-box'>('closed-box', body, 40),
      { initialProps: { body: input(0.01) } },
    );
    rerender({ body: input(0.02) });
    rerender({ body: input(0.05) });
    expect(result.current.pending).toBe(true);
    await waitFor(() => expect(result.current.data).toEqual({ vb: 0.025 }));
    expect(result.current.pending).toBe(false);
    expect(bodies).toEqual([{ name: 'closed-box', ...input(0.05) }]);
  });

  it('returns the envelope messages keyed by field', async () => {
    const { result } = renderHook(() => useCalc<{ vb: number }, 'closed-box'>('closed-box', input(-1), 0));
    await waitFor(() => expect(result.current.fieldErrors).toEqual({ vas: 'vas must be positive' }));
    expect(result.current.data).toBeUndefined();
    expect(result.current.error).toBeUndefined();
  });

  it('does not post incomplete inputs', async () => {
    const { result } = renderHook(() => useCalc('closed-box', null, 0));
    await new Promise((r) => setTimeout(r, 30));
    expect(result.current).toEqual({ fieldErrors: {}, pending: false });
    expect(bodies).toEqual([]);
  });
});
