import { bandMean, buildRoleBands, beamingFromBands, ROLE_BANDS, RoleMatrix, scoreRole, thdAtDrive } from './role-index';

// A flat synthetic curve on a 1/24-octave grid makes every expected value easy to state by hand.
const grid = Array.from({ length: 24 * 10 + 1 }, (_, i) => 20 * 2 ** (i / 24));
const flat = (level: number) => ({ x: grid, y: grid.map(() => level) });

describe('ROLE_BANDS', () => {
  it('holds the 31 one-third-octave bands from 20 Hz to 20 kHz', () => {
    // IEC 61260-1:2014 base-10 bands; nominal mid-bands 20, 25, 31.5 … 20k (ISO 266 R10 labels).
    expect(ROLE_BANDS).toHaveLength(31);
    expect(ROLE_BANDS[0].nominal).toBe(20);
    expect(ROLE_BANDS[2].nominal).toBe(31.5);
    expect(ROLE_BANDS[30].nominal).toBe(20000);
  });
});

describe('buildRoleBands and bandMean', () => {
  it('averages a flat response to its level with no deviation', () => {
    const bands = buildRoleBands({ onAxis: flat(86) });
    const m = bandMean(bands.spl, 300, 3000);
    expect(m).toEqual({ mean: 86, up: 0, down: 0 });
  });

  it('reports the worst band above and below the mean', () => {
    // Ten third-octave mid-bands lie in 300 Hz … 3 kHz (316 Hz to 2.51 kHz); lift the 1 kHz band by
    // +3 dB and drop the 2 kHz band by −2 dB.
    const y = grid.map((f) => (f >= 891 && f < 1122 ? 89 : f >= 1778 && f < 2239 ? 84 : 86));
    const bands = buildRoleBands({ onAxis: { x: grid, y } });
    const m = bandMean(bands.spl, 300, 3000)!;
    // Mean of ten bands: (8·86 + 89 + 84) / 10 = 86.1 dB.
    expect(m.mean).toBeCloseTo((8 * 86 + 89 + 84) / 10, 6);
    expect(m.up).toBeCloseTo(89 - m.mean, 3);
    expect(m.down).toBeCloseTo(84 - m.mean, 3);
  });

  it('returns null when the curve does not reach the band', () => {
    const short = { x: grid.filter((f) => f < 1000), y: grid.filter((f) => f < 1000).map(() => 80) };
    expect(bandMean(buildRoleBands({ onAxis: short }).spl, 300, 3000)).toBeNull();
  });
});

describe('thdAtDrive', () => {
  const bands = buildRoleBands({
    onAxis: flat(86),
    thd: [
      { levelV: 8, curve: flat(1) },
      { levelV: 2, curve: flat(0.25) },
    ],
  });

  it('interpolates between measured levels on log-log axes', () => {
    // Halfway in log drive between 2 V and 8 V is 4 V; halfway in log THD between 0.25 % and 1 % is 0.5 %.
    expect(thdAtDrive(bands, 300, 3000, 4)!.percent).toBeCloseTo(0.5, 6);
  });

  it('holds below the lowest level and scales with drive above the highest', () => {
    expect(thdAtDrive(bands, 300, 3000, 1)).toEqual({ percent: 0.25, extrapolated: false });
    expect(thdAtDrive(bands, 300, 3000, 16)).toEqual({ percent: 2, extrapolated: true });
  });
});

describe('beaming and scoring', () => {
  const off = { x: grid, y: grid.map((f) => (f > 2500 ? 78 : 85)) };
  const bands = buildRoleBands({ onAxis: flat(86), offAxis: { angleDeg: 60, curve: off }, thd: [{ levelV: 2.83, curve: flat(0.3) }] });

  it('finds the first band where the off-axis drop reaches 6 dB', () => {
    // 86 − 78 = 8 dB from the 3.15 kHz band up; the 2.5 kHz band straddles the step (mixed values < 6 dB).
    expect(beamingFromBands(bands, 6, 100)).toBe(3150);
  });

  it('penalises beaming inside the band and explains each figure', () => {
    const wide = scoreRole(bands, { bandLo: 300, bandHi: 2000, level: 86 });
    const narrow = scoreRole(bands, { bandLo: 300, bandHi: 6300, level: 86 });
    // At 86 dB the drive is 2.83 V, where THD is 0.3 %: no THD penalty; 1 dB above 85 dB scores +1.
    expect(wide.score).toBeCloseTo(1, 2);
    expect(wide.reasons.join(' ')).toMatch(/stays wide to 3.15 kHz/);
    // 6.3 kHz is log2(6300/3150) = 1 octave above the onset: four points off.
    expect(narrow.score).toBeCloseTo(1 - 4, 2);
    expect(narrow.reasons.join(' ')).toMatch(/beams from 3.15 kHz/);
  });

  it('charges six points per doubling of THD above 0.3 %', () => {
    // 92 dB needs +6 dB over 86 dB, i.e. 2.83 V doubled; beyond the one level, THD scales with drive: 0.6 %.
    const r = scoreRole(bands, { bandLo: 300, bandHi: 2000, level: 92 });
    expect(r.thdPercent).toBeCloseTo(0.3 * 10 ** (6 / 20), 6);
    expect(r.score).toBeCloseTo(1 - 6 * Math.log2(10 ** (6 / 20)), 2);
  });

  it('sinks a driver with no response in the band', () => {
    expect(scoreRole(buildRoleBands({ onAxis: null }), { bandLo: 300, bandHi: 3000, level: 90 }).score).toBe(-Infinity);
  });
});

describe('RoleMatrix', () => {
  it('scores exactly as scoreRole does, for varied drivers and roles', () => {
    // Deterministic variety: level steps, off-axis drops from different bands, two or three THD levels.
    const drivers = Array.from({ length: 40 }, (_, k) => {
      const y = grid.map((f) => 80 + (k % 7) + (f > 1000 * (1 + (k % 5)) ? -(k % 4) : 0) + Math.sin(f / 300 + k));
      const off = grid.map((f, i) => y[i] - (f > 500 * (1 + (k % 6)) ? 7 + (k % 3) : 1));
      const thd = [2.83, 5.66, 11.31].slice(0, 2 + (k % 2)).map((levelV, l) => ({ levelV, curve: { x: grid, y: grid.map((f) => (0.1 + 0.05 * k) * (l + 1) * (1 + 100 / f)) } }));
      return k % 13 === 12 ? null : buildRoleBands({ onAxis: { x: grid, y }, offAxis: { angleDeg: 60, curve: { x: grid, y: off } }, thd });
    });
    const matrix = new RoleMatrix(drivers);
    const idx = drivers.map((_, i) => i);
    for (const req of [{ bandLo: 300, bandHi: 3000, level: 90 }, { bandLo: 80, bandHi: 800, level: 100 }, { bandLo: 2000, bandHi: 16000, level: 84 }]) {
      const fast = matrix.scores(idx, req);
      drivers.forEach((b, i) => {
        const slow = b ? scoreRole(b, req).score : -Infinity;
        if (slow === -Infinity) expect(fast[i]).toBe(-Infinity);
        else expect(fast[i]).toBeCloseTo(slow, 1);
      });
    }
  });
});
