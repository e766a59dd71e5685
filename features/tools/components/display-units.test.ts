import { formatNumber, parseDisplay, toDisplay } from './display-units';

describe('parseDisplay', () => {
  it('converts display units to SI', () => {
    // 1 L = 1e-3 m³, 1 cm² = 1e-4 m², 1 mH = 1e-3 H: SI prefixes (common practice, no source).
    expect(parseDisplay('50', 'litre').value).toBeCloseTo(0.05, 12);
    expect(parseDisplay('133', 'cm2').value).toBeCloseTo(0.0133, 12);
    expect(parseDisplay('0.5', 'mh').value).toBeCloseTo(5e-4, 12);
    expect(parseDisplay('2', 'nPerMm').value).toBe(2000);
  });

  it('accepts a decimal comma and treats empty text as not given', () => {
    expect(parseDisplay(' 0,35 ', 'none').value).toBeCloseTo(0.35, 12);
    expect(parseDisplay('', 'hz')).toEqual({});
  });

  it('rejects text that is not a plain number', () => {
    expect(parseDisplay('3O', 'hz').error).toBe('enter a number');
    expect(parseDisplay('0x10', 'hz').error).toBe('enter a number');
  });
});

describe('formatNumber', () => {
  it('rounds to four significant figures', () => {
    expect(formatNumber(16.231658)).toBe('16.23');
    expect(formatNumber(0.0123456)).toBe('0.01235');
    expect(toDisplay(0.016231658, 'litre')).toBe('16.23');
    expect(toDisplay(null, 'hz')).toBe('—');
  });
});
