import { emptyDraft, type Draft, type DraftFile } from './draft';
import { previewSet } from './preview';

const read = (over: Partial<DraftFile>): DraftFile => ({
  id: 'x', name: 'x.txt', size: 1, kind: 'spl', angle: '0', level: '', settings: { columns: '', xUnit: 'auto', distortionUnit: 'auto' },
  status: 'read', progress: 1, token: 'c'.repeat(32), warnings: [], points: { x: [100, 1000], y: [80, 86], phase: null }, ...over,
});

describe('previewSet', () => {
  const draft: Draft = {
    ...emptyDraft(),
    method: { ...emptyDraft().method, driveVoltage: '5.66', distance: '0.5', baffle: 'b' },
    files: [
      read({ id: 'a', angle: '30' }),
      read({ id: 'b', kind: 'thd', level: '2,83', angle: '', points: { x: [100, 1000], y: [1, 0.5], phase: null } }),
      read({ id: 'c', status: 'failed', points: undefined }),
    ],
  };
  const set = previewSet(draft);

  it('refers SPL to 2.83 V / 1 m as the server will', () => {
    // 20·log10(2.83/5.66) + 20·log10(0.5) = −12.04 dB (voltage ratio and inverse distance; common practice, no source).
    expect(set.curves[0].y[0]).toBeCloseTo(80 - 12.041, 2);
    expect(set.curves[0].angleDeg).toBe(30);
    expect(set.anglesDeg).toEqual([30]);
  });
  it('keeps distortion as read, at its level, and leaves out files not read', () => {
    expect(set.curves).toHaveLength(2);
    expect(set.curves[1]).toMatchObject({ kind: 'thd', driveLevelV: 2.83, angleDeg: null, y: [1, 0.5] });
  });
});
