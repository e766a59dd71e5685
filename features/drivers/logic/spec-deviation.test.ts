import { deviationPercent, formatDeviation, parameterRows } from './spec-deviation';

describe('deviation from the maker spec', () => {
  it('is relative to the spec value', () => {
    // (112 - 100) / 100 = +12 %, (45 - 50) / 50 = -10 % (arithmetic).
    expect(deviationPercent(112, 100)).toBeCloseTo(12, 9);
    expect(deviationPercent(45, 50)).toBeCloseTo(-10, 9);
    expect(deviationPercent(1, 0)).toBeNull();
  });

  it('reads as a signed whole percent', () => {
    expect(formatDeviation(12.4)).toBe('+12 %');
    expect(formatDeviation(-3.6)).toBe('−4 %');
    expect(formatDeviation(0.2)).toBe('0 %');
  });

  it('builds rows in display units for one signal level and marks beyond ±10 %', () => {
    const rows = parameterRows(
      [
        { name: 'vas', value: 0.00112, unit: 'm^3', signal: 'small' },
        { name: 'fs', value: 95, unit: 'Hz', signal: 'small' },
        { name: 'qts', value: 0.5, unit: '', signal: 'small' },
        { name: 'xbl', value: 0.004, unit: 'm', signal: 'large' },
      ],
      [
        { name: 'fs', value: 100, unit: 'Hz' },
        { name: 'vas', value: 0.001, unit: 'm^3' },
      ],
      'small',
    );
    expect(rows.map((r) => r.name)).toEqual(['fs', 'qts', 'vas']);
    const vas = rows.find((r) => r.name === 'vas');
    expect(vas).toMatchObject({ label: 'Vas', unit: 'L', measured: '1.12', spec: '1.00', deviationText: '+12 %', flagged: true });
    const fs = rows.find((r) => r.name === 'fs');
    expect(fs).toMatchObject({ deviationText: '−5 %', flagged: false });
    expect(rows.find((r) => r.name === 'qts')).toMatchObject({ spec: null, deviationText: null, flagged: false });
  });

  it('formats an unknown large-signal parameter by its SI unit', () => {
    const [row] = parameterRows([{ name: 'x_mech', value: 0.0061, unit: 'm', signal: 'large' }], [], 'large');
    expect(row).toMatchObject({ label: 'x_mech', measured: '6.10', unit: 'mm' });
  });
});
