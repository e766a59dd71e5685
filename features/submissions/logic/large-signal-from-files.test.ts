import type { DraftFile } from './draft';
import { disagreements, limitsFromFiles } from './large-signal-from-files';

const x = Array.from({ length: 201 }, (_, i) => (i - 100) * 0.0001); // −10 mm … +10 mm
const file = (kind: DraftFile['kind'], y: number[], name = `${kind}.txt`): DraftFile => ({
  id: kind, name, size: 1, kind, angle: '', level: '', settings: { columns: '', xUnit: 'auto', distortionUnit: 'auto' }, status: 'read', progress: 1,
  token: 'd'.repeat(32), warnings: [], points: { x, y, phase: null },
});

describe('limitsFromFiles', () => {
  // Closed forms by hand algebra: Bl0·exp(−(x/a)²) = 0.82·Bl0 at x = a·√(−ln 0.82);
  // compliance 1/(1 + (x/b)²) = 0.75 of rest at x = b/√3; Le0·(1 + x/c) varies 10 % at |x| = 0.1·c.
  // Thresholds 82 % / 75 % / 10 % as in IEC 62458:2010 (from memory).
  const a = 0.006;
  const b = 0.005;
  const c = 0.04;
  const r = limitsFromFiles([
    file('bl_x', x.map((v) => 4 * Math.exp(-((v / a) ** 2)))),
    file('kms_x', x.map((v) => 1200 * (1 + (v / b) ** 2))),
    file('le_x', x.map((v) => 0.0002 * (1 + v / c))),
  ]);

  it('finds each limit from its own file', () => {
    expect(r.values.x_bl).toBeCloseTo(a * Math.sqrt(-Math.log(0.82)), 4);
    expect(r.values.x_c).toBeCloseTo(b / Math.sqrt(3), 4);
    expect(r.values.x_l).toBeCloseTo(0.1 * c, 4);
    expect(r.values.bl0).toBeCloseTo(4, 6);
    expect(r.values.kms0).toBeCloseTo(1200, 3);
  });
  it('names the curve that governs Xmax', () => {
    // 2.67 mm (Bl), 2.89 mm (compliance), 4 mm (Le): Bl governs.
    expect(r.xmax?.governedBy).toBe('Bl');
    expect(r.xmax?.value).toBeCloseTo(a * Math.sqrt(-Math.log(0.82)), 4);
  });
  it('notes a file that cannot give a limit instead of failing', () => {
    const onlyPositive = { ...file('bl_x', x.map(() => 4), 'one-sided.txt'), points: { x: x.map((v) => v + 0.02), y: x.map(() => 4), phase: null } };
    const out = limitsFromFiles([onlyPositive]);
    expect(out.values).toEqual({});
    expect(out.notes[0]).toMatch(/^one-sided\.txt: .*both sides of 0/);
  });
});

it('disagreements flags typed values more than 10 % off the files', () => {
  expect(disagreements({ x_bl: 0.0033, bl0: 4.1 }, { x_bl: 0.0027, bl0: 4 })).toEqual(['X at Bl 82 % typed is +22 % from the value in your curve file']);
});
