import { logFrequencyGrid } from '../../../shared/acoustics/curves';
import type { OverlayDriver } from '../../../shared/schemas/overlay';
import { alignmentOffsets, bandMean, formatCursorHz, nonNullRuns, normaliseDrivers, percentToDb, readoutAt, smoothNullable, thdAtLevel, valueAt } from './curves';
import { DEFAULT_OPTIONS } from './stack-options';

const grid = logFrequencyGrid(48, 20, 20000);

function driver(slug: string, spl: (f: number) => number | null, extra: Partial<OverlayDriver> = {}): OverlayDriver {
  const set = { id: 1, label: 'A', reviewer: 'R', sampleId: null, burnIn: 'none' as never };
  return {
    slug, requestedSlug: slug, model: slug, maker: { slug: 'm', name: 'M' }, type: 'mid-range', nominalSizeIn: 3, nominalImpedanceOhm: 8,
    sets: [set], set: { ...set, driveVoltageV: 2.83, distanceM: 1, baffle: 'b', gating: null, temperatureC: null, measuredOn: null },
    spl: [{ angleDeg: 0, y: grid.map(spl) }], impedance: null, thd: [], parameters: [], figures: {} as never, ...extra,
  };
}

describe('smoothing over gaps', () => {
  it('leaves a constant unchanged at 1/3 octave (the mean of a constant is the constant)', () => {
    const y = grid.map(() => 87.5);
    const out = smoothNullable(grid, y, 3);
    for (const v of out) expect(v).toBeCloseTo(87.5, 9);
  });

  it('smooths each measured run alone and keeps the unmeasured points null', () => {
    const y = grid.map((f, i) => (f < 100 || f > 10000 ? null : i % 2 ? 90 : 80));
    const out = smoothNullable(grid, y, 3);
    expect(nonNullRuns(out)).toEqual(nonNullRuns(y));
    const mid = nearest(1000);
    // An alternating 80/90 series averages to 85 inside the run (power mean is a little higher:
    // 10·log10((10^8 + 10^9)/2) = 87.40 dB, computed by hand).
    expect(out[mid]).toBeCloseTo(10 * Math.log10((1e8 + 1e9) / 2), 0);
    expect(out[0]).toBeNull();
  });

  it('returns a copy without smoothing', () => {
    const y = [1, null, 3];
    expect(smoothNullable([1, 2, 3], y, null)).toEqual(y);
  });
});

function nearest(f: number): number {
  let best = 0;
  for (let i = 0; i < grid.length; i++) if (Math.abs(Math.log(grid[i] / f)) < Math.abs(Math.log(grid[best] / f))) best = i;
  return best;
}

describe('level alignment', () => {
  const a = (f: number) => 85 + Math.log10(f);
  const b = (f: number) => 80 + 2 * Math.log10(f);
  const ya = grid.map(a);
  const yb = grid.map(b);

  it('shifts by exactly the measured difference at the alignment frequency', () => {
    const offsets = alignmentOffsets(grid, [ya, yb], { level: 'frequency', alignHz: 1000 });
    const f = grid[nearest(1000)];
    expect(offsets[0]).toBe(0);
    expect(offsets[1]).toBeCloseTo(a(f) - b(f), 12);
  });

  it('shifts by the difference of the band means', () => {
    const offsets = alignmentOffsets(grid, [ya, yb], { level: 'band', bandLo: 300, bandHi: 3000 });
    const inBand = grid.filter((f) => f >= 300 && f <= 3000);
    const mean = (g: (f: number) => number) => inBand.reduce((s, f) => s + g(f), 0) / inBand.length;
    expect(offsets[1]).toBeCloseTo(mean(a) - mean(b), 10);
    expect(bandMean(grid, ya, 300, 3000)).toBeCloseTo(mean(a), 10);
  });

  it('does nothing for raw levels, and leaves a curve unmeasured at the reference alone', () => {
    expect(alignmentOffsets(grid, [ya, yb], { level: 'raw' })).toEqual([0, 0]);
    const gap = grid.map((f) => (f > 500 ? null : 70));
    expect(alignmentOffsets(grid, [ya, gap], { level: 'frequency', alignHz: 1000 })).toEqual([0, 0]);
  });

  it('applies the on-axis offset to the whole driver after smoothing', () => {
    const d1 = driver('one', a);
    const d2 = driver('two', () => 80, { spl: [{ angleDeg: 0, y: grid.map(() => 80) }, { angleDeg: 30, y: grid.map(() => 77) }] });
    const [c1, c2] = normaliseDrivers(grid, [d1, d2], { ...DEFAULT_OPTIONS, level: 'frequency', alignHz: 1000, smoothing: '1/3' });
    const i = nearest(1000);
    expect(c2.spl[i]).toBeCloseTo(c1.spl[i] as number, 9);
    expect(c2.offAxis[0].y[i]).toBeCloseTo((c2.spl[i] as number) - 3, 9);
  });
});

describe('distortion and readout', () => {
  it('converts percent to dB as 20·log10(%/100)', () => {
    expect(percentToDb(1)).toBeCloseTo(-40, 12);
    expect(percentToDb(10)).toBeCloseTo(-20, 12);
    expect(percentToDb(0)).toBeNull();
  });

  it('picks the nearest drive level', () => {
    const t = [{ driveLevelV: 2.83 }, { driveLevelV: 8.94 }, { driveLevelV: 28.3 }];
    expect(thdAtLevel(t, 10)?.driveLevelV).toBe(8.94);
    expect(thdAtLevel(t, undefined)?.driveLevelV).toBe(28.3);
    expect(thdAtLevel([], 1)).toBeNull();
  });

  it('reads every driver at the grid point nearest the cursor', () => {
    const curves = normaliseDrivers(grid, [driver('one', () => 81), driver('two', (f) => (f > 5000 ? null : 84))], DEFAULT_OPTIONS);
    const r = readoutAt(grid, curves, 1003);
    expect(r.frequency).toBe(grid[nearest(1003)]);
    expect(r.rows.map((x) => x.spl)).toEqual([81, 84]);
    expect(readoutAt(grid, curves, 8000).rows[1].spl).toBeNull();
    expect(valueAt(grid, curves[0].spl, 20)).toBe(81);
  });

  it('formats the cursor frequency to three figures', () => {
    expect(formatCursorHz(1000)).toBe('1.00 kHz');
    expect(formatCursorHz(312.4)).toBe('312 Hz');
    expect(formatCursorHz(45.25)).toBe('45.3 Hz');
  });
});
