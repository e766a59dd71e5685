import { describeNormalisation, parseEntries, parseOptions, toParams, DEFAULT_OPTIONS } from './stack-options';

describe('stack URL state', () => {
  it('reads drivers with their sets, dropping bad and repeated slugs', () => {
    expect(parseEntries('a-1,b-2,,Bad!,a-1,c-3', '12,,x')).toEqual([
      { slug: 'a-1', setId: 12 }, { slug: 'b-2', setId: null }, { slug: 'c-3', setId: null },
    ]);
    expect(parseEntries(undefined, undefined)).toEqual([]);
  });

  it('round-trips options and writes only what differs from the defaults', () => {
    const o = { ...DEFAULT_OPTIONS, level: 'band' as const, smoothing: '1/3' as const, bandLo: 300, bandHi: 3000, highlight: true, thdUnit: 'db' as const, thdLevelV: 8.94 };
    const p = toParams([{ slug: 'a', setId: null }, { slug: 'b', setId: 4 }], o);
    expect(p).toMatchObject({ drivers: 'a,b', sets: ',4', level: 'band', smoothing: '1/3', bandLo: '300', highlight: '1', thdUnit: 'db', thdLevelV: '8.94' });
    expect(p.offAxis).toBeUndefined();
    const clean = Object.fromEntries(Object.entries(p).filter(([, v]) => v != null));
    expect(parseOptions(clean)).toEqual(o);
    expect(toParams([], DEFAULT_OPTIONS)).toEqual(Object.fromEntries(Object.keys(p).map((k) => [k, undefined])));
  });

  it('ignores values out of range', () => {
    expect(parseOptions({ level: 'loud', smoothing: '1/5', bandLo: '3000', bandHi: '300', alignHz: '-1' })).toEqual(DEFAULT_OPTIONS);
    // Narrower than the server accepts: dropped here so the comparison request never carries it.
    expect(parseOptions({ bandLo: '1000', bandHi: '1040' })).toEqual(DEFAULT_OPTIONS);
  });

  it('names the normalisation in words', () => {
    expect(describeNormalisation({ ...DEFAULT_OPTIONS, level: 'band', smoothing: '1/3' })).toBe('levels aligned to the first driver on the mean over 300 Hz–3 kHz, 1/3 octave smoothing');
    expect(describeNormalisation(DEFAULT_OPTIONS)).toBe('levels as measured, no smoothing');
  });
});
