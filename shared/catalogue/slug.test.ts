import { joinSlugs, slugOf, slugVariant } from './slug';

// Expected transliterations follow the npm `transliteration` package's tables (Pinyin for Han,
// Hepburn-style kana, ISO-9-like Cyrillic); the dash-joined lower-case form is common practice
// for URL slugs, no source. Every name here is invented.
describe('slugOf', () => {
  it('keeps Latin names as lower-case words joined by dashes', () => {
    expect(slugOf('Halvorsen Lydverk  KM-80 Mk2')).toBe('halvorsen-lydverk-km-80-mk2');
    expect(slugOf('--Odd__Name..')).toBe('odd-name');
  });

  it('folds accents and transliterates other scripts instead of dropping them', () => {
    expect(slugOf('Müller Åkustik')).toBe('muller-akustik');
    expect(slugOf('Звук Лаб')).toBe('zvuk-lab');
    const japanese = slugOf('日本音響');
    expect(japanese).toMatch(/^[a-z0-9]+(-[a-z0-9]+)*$/);
    expect(japanese).not.toBe(slugOf('東京音響'));
  });

  it('is empty for a name without any letter or digit', () => {
    expect(slugOf('!!! — …')).toBe('');
    expect(slugOf('   ')).toBe('');
  });

  it('stays within the limit, cutting at a dash near the end and never ending on one', () => {
    const long = slugOf('Acoustic Works '.repeat(20), 120);
    expect(long.length).toBeLessThanOrEqual(120);
    expect(long).not.toMatch(/-$/);
    expect(long.endsWith('acoustic') || long.endsWith('works')).toBe(true);
    expect(slugOf('x'.repeat(300), 120)).toBe('x'.repeat(120));
  });
});

describe('joinSlugs and slugVariant', () => {
  it('shortens the last part so the whole fits', () => {
    const joined = joinSlugs('m'.repeat(116), 'model-'.repeat(20), 156);
    expect(joined.length).toBeLessThanOrEqual(156);
    expect(joined.startsWith(`${'m'.repeat(116)}-model`)).toBe(true);
  });

  it('numbers a taken slug within the limit', () => {
    expect(slugVariant('kestrel-works', 2, 120)).toBe('kestrel-works-2');
    expect(slugVariant('k'.repeat(120), 12, 120)).toBe(`${'k'.repeat(117)}-12`);
  });
});
