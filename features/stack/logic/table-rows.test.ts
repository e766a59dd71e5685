import { bestIndex, buildRow, formatDelta, rowDefs } from './table-rows';
import type { OverlayDriver } from '../../../shared/schemas/overlay';

const withFs = (fs: number | null) => ({ parameters: fs == null ? [] : [{ name: 'fs', value: fs, unit: 'Hz', signal: 'small' }] }) as unknown as OverlayDriver;

describe('best value per row', () => {
  it('follows the row direction and ignores missing values', () => {
    expect(bestIndex([3, 5, null, 4], 'higher')).toBe(1);
    expect(bestIndex([3, 5, null, 4], 'lower')).toBe(0);
    expect(bestIndex([-0.4, 0.1, 0.3], 'nearZero')).toBe(1);
    expect(bestIndex([3, 5], null)).toBe(-1);
    expect(bestIndex([3, null], 'higher')).toBe(-1);
    expect(bestIndex([2, 2], 'higher')).toBe(-1);
  });

  it('gives every other value its difference from the best', () => {
    const fs = rowDefs.find((r) => r.key === 'fs');
    if (!fs) throw new Error('no fs row');
    const row = buildRow(fs, [withFs(120), withFs(95.5), withFs(null)]);
    expect(row.cells.map((c) => c.best)).toEqual([false, true, false]);
    expect(row.cells[0].delta).toBeCloseTo(24.5, 9);
    expect(row.cells[2].text).toBe('—');
    expect(formatDelta(24.5, 1)).toBe('Δ +24.5');
    expect(formatDelta(-3, 0)).toBe('Δ −3');
  });

  it('scales SI values to display units before comparing', () => {
    const xmax = rowDefs.find((r) => r.key === 'xmax');
    if (!xmax) throw new Error('no xmax row');
    const d = (v: number) => ({ parameters: [{ name: 'xmax', value: v, unit: 'm', signal: 'small' }] }) as unknown as OverlayDriver;
    const row = buildRow(xmax, [d(0.0021), d(0.0035)]);
    expect(row.cells.map((c) => c.text)).toEqual(['2.10', '3.50']);
    expect(row.cells[0].delta).toBeCloseTo(-1.4, 9);
  });
});
