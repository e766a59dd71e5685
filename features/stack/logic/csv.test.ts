import { logFrequencyGrid } from '../../../shared/acoustics/curves';
import { buildCsv } from './csv';
import type { StackCurves } from './curves';

describe('CSV of the normalised curves', () => {
  it('has a frequency column, one column per driver per curve and one row per grid point', () => {
    const grid = logFrequencyGrid(48, 20, 20000);
    const c = (slug: string): StackCurves => ({
      slug, spl: grid.map(() => 85), offAxis: [], offsetDb: 0, impedance: grid.map((_, i) => (i === 0 ? null : 6.2)),
      thd: { driveLevelV: 2.83, thd: grid.map(() => 0.5), h2: null, h3: null },
    });
    const csv = buildCsv(grid, [c('a-1'), c('b-2')], 'percent');
    const lines = csv.trim().split('\n');
    expect(lines[0]).toBe('frequency_hz,a-1_spl_db,a-1_thd_2.83v_percent,a-1_impedance_ohm,b-2_spl_db,b-2_thd_2.83v_percent,b-2_impedance_ohm');
    // 20 Hz to 20 kHz at 48 per octave: floor(48·log2(1000)) + 1 = 479 points.
    expect(lines).toHaveLength(1 + Math.floor(48 * Math.log2(1000)) + 1);
    expect(lines[1]).toBe('20,85,0.5,,85,0.5,');
    for (const l of lines) expect(l.split(',')).toHaveLength(7);
  });
});
