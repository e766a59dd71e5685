import fc from 'fast-check';
import {
  LARGE_SIGNAL_KEYS,
  PARAMETER_KEYS,
  parseParameterText,
  type ParameterKey,
  type ParameterTextResult,
} from './parameter-text';

/** toBeCloseTo at ten significant figures, whatever the magnitude of the SI value. */
function expectSi(actual: number | undefined, expected: number): void {
  expect(typeof actual).toBe('number');
  expect(actual as number).toBeCloseTo(expected, 10 - Math.ceil(Math.log10(Math.abs(expected))));
}

function expectValues(r: ParameterTextResult, expected: Partial<Record<ParameterKey, number>>): void {
  expect(Object.keys(r.values).sort()).toEqual(Object.keys(expected).sort());
  for (const [key, value] of Object.entries(expected) as [ParameterKey, number][]) expectSi(r.values[key], value);
}

function errors(r: ParameterTextResult): string[] {
  return r.lines.flatMap((l) => (l.error === undefined ? [] : [l.error]));
}

function only(line: string): ParameterTextResult['lines'][number] {
  const r = parseParameterText(line);
  expect(r.lines).toHaveLength(1);
  return r.lines[0];
}

describe('parseParameterText: whole blocks', () => {
  it('reads a colon-style block from reviewer notes, skipping the comment, driver and blank lines', () => {
    const text = [
      '# Invented MW-130 midwoofer, sample 2, free air, 1 V drive',
      'Driver: Invented MW-130 (5.25")',
      '',
      'Fs: 48.7 Hz',
      'Re: 5.62 Ω',
      'Le: 0.41 mH',
      'Qms: 3.85',
      'Qes: 0.52',
      'Qts: 0.458',
      'Mms: 11.4 g',
      'Cms: 0.94 mm/N',
      'Rms: 0.91 kg/s',
      'Bl: 6.12 T·m',
      'Sd: 88.2 cm²',
      'Vas: 10.2 L',
      'Xmax: 4.5 mm',
    ].join('\n');
    const r = parseParameterText(text);
    expect(errors(r)).toEqual([]);
    expect(r.lines.map((l) => l.line)).toEqual([4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14, 15, 16]);
    expect(r.lines[0]).toEqual({ line: 4, text: 'Fs: 48.7 Hz', key: 'fs', value: 48.7 });
    // SI prefixes: m = 1e-3, c = 1e-2 (so cm² = 1e-4 m²); 1 L = 1e-3 m³ (SI brochure, 9th ed., table 8).
    expectValues(r, {
      fs: 48.7,
      re: 5.62,
      le: 0.00041,
      qms: 3.85,
      qes: 0.52,
      qts: 0.458,
      mms: 0.0114,
      cms: 0.00094,
      rms: 0.91,
      bl: 6.12,
      sd: 0.00882,
      vas: 0.0102,
      xmax: 0.0045,
    });
  });

  it('reads an equals-style export with units attached to the numbers and scientific notation', () => {
    const text = [
      '; exported by an invented bench program',
      '[Invented TW-25 tweeter]',
      'fs=1.18kHz',
      're=3.4ohm',
      'le=2.1e-5H',
      'qms=2.9',
      'qes=0.95',
      'qts=0.716',
      'mms=0.31g',
      'rms=0.71kg/s',
      'bl=2.6Tm',
      'sd=7.1cm2',
      'xmax=0.3mm',
    ].join('\r\n');
    const r = parseParameterText(text);
    expect(errors(r)).toEqual([]);
    expect(r.lines.map((l) => l.line)).toEqual([3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13]);
    // 1 kHz = 1000 Hz; 0.31 g = 0.00031 kg; 7.1 cm² = 7.1e-4 m²; 0.3 mm = 3e-4 m (SI prefixes).
    expectValues(r, { fs: 1180, re: 3.4, le: 2.1e-5, qms: 2.9, qes: 0.95, qts: 0.716, mms: 0.00031, rms: 0.71, bl: 2.6, sd: 0.00071, xmax: 0.0003 });
  });

  it('reads a tab-separated table with a "Parameter\\tValue\\tUnit" header, small and large signal', () => {
    const rows = [
      ['Parameter', 'Value', 'Unit'],
      ['Fs', '82.4', 'Hz'],
      ['Re', '3.21', 'Ohm'],
      ['Le', '0.12', 'mH'],
      ['Qms', '5.1', ''],
      ['Qes', '0.48', ''],
      ['Qts', '0.44', '-'],
      ['Mms', '4.3', 'g'],
      ['Cms', '0.87', 'mm/N'],
      ['Kms', '1.15', 'N/mm'],
      ['Rms', '0.41', 'kg/s'],
      ['Bl', '3.9', 'N/A'],
      ['Sd', '33.2', 'cm^2'],
      ['Vas', '1.9', 'l'],
      ['Xmax', '3.2', 'mm'],
      ['X_Bl', '3.1', 'mm'],
      ['X_C', '4.4', 'mm'],
      ['X_L', '5.0', 'mm'],
      ['Bl(0)', '3.95', 'T*m'],
      ['Kms(0)', '1.2', 'N/mm'],
    ];
    const r = parseParameterText(rows.map((cells) => cells.join('\t')).join('\n'));
    expect(errors(r)).toEqual([]);
    expect(r.lines[0].line).toBe(2);
    expect(r.lines).toHaveLength(rows.length - 1);
    // N/mm → N/m is × 1000; N/A ≡ T·m (1 T = 1 N/(A·m), SI brochure, 9th ed., table 4).
    expectValues(r, {
      fs: 82.4,
      re: 3.21,
      le: 0.00012,
      qms: 5.1,
      qes: 0.48,
      qts: 0.44,
      mms: 0.0043,
      cms: 0.00087,
      kms: 1150,
      rms: 0.41,
      bl: 3.9,
      sd: 0.00332,
      vas: 0.0019,
      xmax: 0.0032,
      x_bl: 0.0031,
      x_c: 0.0044,
      x_l: 0.005,
      bl0: 3.95,
      kms0: 1200,
    });
  });

  it('reads a markdown table and a bulleted list from notes', () => {
    const r = parseParameterText(['| Parameter | Value | Unit |', '|---|---|---|', '| Fs | 82.4 | Hz |', '| Vas | 1.9 | L |', '- Qts: 0.44', '2) Re 3.21 Ω'].join('\n'));
    expect(errors(r)).toEqual([]);
    expect(r.lines.map((l) => l.line)).toEqual([3, 4, 5, 6]);
    expectValues(r, { fs: 82.4, vas: 0.0019, qts: 0.44, re: 3.21 });
  });
});

describe('parseParameterText: number styles', () => {
  it('reads decimal commas, including a semicolon-separated spreadsheet export', () => {
    const r = parseParameterText(['Qes 0,48', 'Re: 3,21 Ω', 'Sd 33,2 cm²', 'Vas=1,9 l', 'Fs;82,4;Hz', 'Le\t1,2e-1\tmH'].join('\n'));
    expect(errors(r)).toEqual([]);
    expectValues(r, { qes: 0.48, re: 3.21, sd: 0.00332, vas: 0.0019, fs: 82.4, le: 0.00012 });
  });

  it('reads scientific notation in either case and with a sign', () => {
    expectSi(only('Le 1.2e-3 H').value, 0.0012);
    expectSi(only('Le 1.2E-1 mH').value, 0.00012);
    expectSi(only('Kms0 +1.15e+3 N/m').value, 1150);
  });

  it('rejects a comma followed by exactly three digits, which could be a thousands separator', () => {
    const l = only('Kms 1,150 N/m');
    expect(l.error).toBe('line 1: "1,150" for Kms could be a decimal comma or a thousands separator; write it without the comma or with a point');
    expect(parseParameterText('Kms 1,150 N/m').values).toEqual({});
    // A leading zero cannot start a thousands group, so this is a decimal comma.
    expectSi(only('Qts 0,440').value, 0.44);
  });
});

describe('parseParameterText: units', () => {
  // [line, key, SI value worked by hand, source]
  const cases: [string, ParameterKey, number, string][] = [
    ['Fs 0.0824 kHz', 'fs', 82.4, 'SI prefix k = 1e3'],
    ['Le 0.00012 H', 'le', 0.00012, 'SI base'],
    ['Le 120 \u00b5H', 'le', 0.00012, 'SI prefix µ = 1e-6 (micro sign U+00B5)'],
    ['Le 120 \u03bcH', 'le', 0.00012, 'SI prefix µ = 1e-6 (Greek mu U+03BC)'],
    ['Le 120 uH', 'le', 0.00012, 'SI prefix µ = 1e-6, ASCII spelling'],
    ['Mms 0.0043 kg', 'mms', 0.0043, 'SI base'],
    ['Mms 4300 mg', 'mms', 0.0043, 'SI prefix m = 1e-3 of the gram: 4300e-6 kg'],
    ['Mmd 3.9 g', 'mmd', 0.0039, 'SI: 1 g = 1e-3 kg'],
    ['Cms 0.00087 m/N', 'cms', 0.00087, 'SI base'],
    ['Cms 870 µm/N', 'cms', 0.00087, 'SI prefix µ: 870e-6 m/N'],
    ['Kms 1150 N/m', 'kms', 1150, 'SI base'],
    ['Rms 0.41 N·s/m', 'rms', 0.41, 'N·s/m = kg·m/s²·s/m = kg/s (SI brochure, 9th ed., table 4)'],
    ['Re 3.21 Ω', 're', 3.21, 'Greek capital omega U+03A9'],
    ['Re 3.21 \u2126', 're', 3.21, 'ohm sign U+2126'],
    ['Re 3.21 ohms', 're', 3.21, 'spelled out'],
    ['Bl 3.9 Tm', 'bl', 3.9, 'T·m written without the dot'],
    ['Bl 3.9 T*m', 'bl', 3.9, 'T·m with an asterisk'],
    ['Bl 3.9 N/A', 'bl', 3.9, 'T = N/(A·m), so T·m = N/A (SI brochure, 9th ed., table 4)'],
    ['Sd 33.2 cm2', 'sd', 0.00332, '1 cm² = (1e-2 m)² = 1e-4 m²'],
    ['Sd 0.00332 m²', 'sd', 0.00332, 'SI base'],
    ['Sd 0.00332 m2', 'sd', 0.00332, 'SI base, ASCII exponent'],
    // 5.146 × 0.00064516 = 0.00331999336: 1 in = 0.0254 m exactly (international yard and pound, 1959).
    ['Sd 5.146 in²', 'sd', 0.00331999336, '1 in² = 0.0254² m² = 0.00064516 m²'],
    ['Vas 1.9 litre', 'vas', 0.0019, '1 L = 1e-3 m³ (SI brochure, 9th ed., table 8)'],
    ['Vas 1.9 liter', 'vas', 0.0019, '1 L = 1e-3 m³'],
    ['Vas 1.9 ltr', 'vas', 0.0019, '1 L = 1e-3 m³'],
    ['Vas 1.9 dm3', 'vas', 0.0019, '1 dm³ = (1e-1 m)³ = 1e-3 m³'],
    ['Vas 0.0019 m³', 'vas', 0.0019, 'SI base'],
    ['Vas 0.0019 m3', 'vas', 0.0019, 'SI base, ASCII exponent'],
    // 0.0671 × 0.028316846592 = 0.0019000604063232 (1 ft³ = 0.3048³ m³ exactly, international foot, 1959).
    ['Vas 0.0671 ft3', 'vas', 0.0019000604063232, '1 ft³ = 0.028316846592 m³'],
    ['Vas 0.0671 ft³', 'vas', 0.0019000604063232, '1 ft³ = 0.028316846592 m³'],
    ['Xmax 0.32 cm', 'xmax', 0.0032, 'SI prefix c = 1e-2'],
    ['Xmax 0.0032 m', 'xmax', 0.0032, 'SI base'],
  ];
  it.each(cases)('%s → %s = %s (%s)', (line, key, expected) => {
    const l = only(line);
    expect(l.error).toBeUndefined();
    expect(l.key).toBe(key);
    expectSi(l.value, expected);
  });

  // Bare numbers are read in the unit the parameter is usually quoted in (common practice, no source).
  const bare: [string, ParameterKey, number][] = [
    ['Fs 82.4', 'fs', 82.4],
    ['Re 3.21', 're', 3.21],
    ['Le 0.12', 'le', 0.00012],
    ['Mms 4.3', 'mms', 0.0043],
    ['Mmd 3.9', 'mmd', 0.0039],
    ['Cms 0.87', 'cms', 0.00087],
    ['Kms 1.15', 'kms', 1150],
    ['Rms 0.41', 'rms', 0.41],
    ['Bl 3.9', 'bl', 3.9],
    ['Sd 33.2', 'sd', 0.00332],
    ['Vas 1.9', 'vas', 0.0019],
    ['Xmax 3.2', 'xmax', 0.0032],
    ['Xbl 3.1', 'x_bl', 0.0031],
    ['Xc 4.4', 'x_c', 0.0044],
    ['Xl 5', 'x_l', 0.005],
    ['Bl0 3.95', 'bl0', 3.95],
    ['Kms0 1.2', 'kms0', 1200],
  ];
  it.each(bare)('reads a bare "%s" in the usual unit', (line, key, expected) => {
    const l = only(line);
    expect(l.key).toBe(key);
    expectSi(l.value, expected);
  });

  it('takes a unit in brackets after the name or the value, and rejects two different units', () => {
    expectSi(only('Fs (Hz): 82.4').value, 82.4);
    expectSi(only('Vas [L] 1.9').value, 0.0019);
    expectSi(only('Le (µH)\t120').value, 0.00012);
    expectSi(only('Fs (kHz) 0.0824 kHz').value, 82.4);
    expectSi(only('Vas 1.9 (L)').value, 0.0019);
    expectSi(only('Sd: 33.2 [cm²]').value, 0.00332);
    expect(only('Fs [Hz] 0.08 kHz').error).toBe('line 1: two units for Fs: "Hz" and "kHz"');
  });

  it('names the line, the unit and the parameter for an unknown unit', () => {
    const r = parseParameterText('Fs 82.4\nRe 3.21\nQts 0.44\nLe 0.12 furlongs');
    expect(r.lines[3]).toEqual({ line: 4, text: 'Le 0.12 furlongs', key: 'le', error: 'line 4: unknown unit "furlongs" for Le' });
    expect(r.values.le).toBeUndefined();
    expect(only('Qms 5.1 Hz').error).toBe('line 1: unknown unit "Hz" for Qms');
    expect(only('Vas 1.9 constructor').error).toBe('line 1: unknown unit "constructor" for Vas');
  });
});

describe('parseParameterText: names', () => {
  it('matches names case-insensitively, with any of the separators', () => {
    const r = parseParameterText(['FS 82.4', 'vAs:1.9', 'qts\t0.44', 'RE = 3.21', 'xMAX\t:\t3.2'].join('\n'));
    expect(errors(r)).toEqual([]);
    expectValues(r, { fs: 82.4, vas: 0.0019, qts: 0.44, re: 3.21, xmax: 0.0032 });
  });

  it('reads the large-signal spellings', () => {
    const cases: [string, ParameterKey, number][] = [
      ['X_Bl 3.1 mm', 'x_bl', 0.0031],
      ['XBl 3.1', 'x_bl', 0.0031],
      ['Xbl (82%) 3.1 mm', 'x_bl', 0.0031],
      ['X Bl [Bl min 82 %]   3.1   mm', 'x_bl', 0.0031],
      ['X_C: 4.4 mm', 'x_c', 0.0044],
      ['XC 4.4', 'x_c', 0.0044],
      ['X C (C min=75%)\t4.4\tmm', 'x_c', 0.0044],
      ['X_L = 5 mm', 'x_l', 0.005],
      ['XL 5', 'x_l', 0.005],
      ['X L (10 %) 5 mm', 'x_l', 0.005],
      ['Bl(0) 3.95 T·m', 'bl0', 3.95],
      ['Bl(X=0) 3.95', 'bl0', 3.95],
      ['Bl at rest: 3.95 Tm', 'bl0', 3.95],
      ['Kms(0) 1.2 N/mm', 'kms0', 1200],
      ['Kms0 1200 N/m', 'kms0', 1200],
      ['Kms(X=0)\t1.2\tN/mm', 'kms0', 1200],
      ['Kms at rest = 1.2', 'kms0', 1200],
    ];
    for (const [line, key, expected] of cases) {
      const l = only(line);
      expect({ line, error: l.error, key: l.key }).toEqual({ line, error: undefined, key });
      expectSi(l.value, expected);
    }
  });

  it('keeps Bl and Bl(0), Kms and Kms(0) apart', () => {
    const r = parseParameterText('Bl 0.9\nBl0 3.9\nKms 1.1\nKms(0) 1.2');
    expect(errors(r)).toEqual([]);
    expectValues(r, { bl: 0.9, bl0: 3.9, kms: 1100, kms0: 1200 });
  });

  it('rejects a large-signal limit quoted at another threshold than the one it is defined at', () => {
    // 82 %, 75 % and 10 % are the defaults of shared/acoustics/large-signal.ts.
    expect(only('Xbl (70%) 3.1 mm').error).toBe('line 1: X_Bl is defined where Bl(x) falls to 82 %, not 70 %');
    expect(only('X C (C min=50%) 4 mm').error).toBe('line 1: X_C is defined where Cms(x) falls to 75 %, not 50 %');
    expect(only('X_L (20 %) 5').error).toBe('line 1: X_L is defined where Le(x) departs from Le(0) by 10 %, not 20 %');
  });

  it('lists the large-signal keys', () => {
    expect([...LARGE_SIGNAL_KEYS].sort()).toEqual(['bl0', 'kms0', 'x_bl', 'x_c', 'x_l']);
    for (const key of LARGE_SIGNAL_KEYS) expect(PARAMETER_KEYS).toContain(key);
  });
});

describe('parseParameterText: skipped lines and errors', () => {
  it('skips comments, blank lines, headers, metadata and prose without reporting them', () => {
    const text = [
      '# comment',
      '// comment',
      '; comment',
      '*comment',
      '',
      '   ',
      'Parameter  Value  Unit',
      'Parameter\tValue\tUnit',
      'Driver: Invented W-165 6.5" woofer',
      'Temperature: 22 °C',
      'Measured on 2024-03-01 at 22 °C with 2 samples averaged',
      'Small-signal parameters',
      'Qts is low for a vented box',
      'Fs 82.4 Hz # free air',
    ].join('\n');
    const r = parseParameterText(text);
    expect(r.lines).toEqual([{ line: 14, text: 'Fs 82.4 Hz # free air', key: 'fs', value: 82.4 }]);
    expect(r.values).toEqual({ fs: 82.4 });
  });

  it('counts lines the same with LF, CRLF and CR endings', () => {
    for (const eol of ['\n', '\r\n', '\r']) {
      const r = parseParameterText(['# notes', '', 'Fs 82.4', '', 'Vb 12 L'].join(eol));
      expect(r.lines.map((l) => [l.line, l.error])).toEqual([
        [3, undefined],
        [5, 'line 5: unknown parameter "Vb"'],
      ]);
    }
  });

  it('reports each kind of bad line with its line number, and keeps only the good values', () => {
    const text = [
      'Fs 82.4 Hz',
      'Le 0.12 furlongs',
      'Vb 12 L',
      'Qms: n/a',
      'Re -3.2',
      'Mms 1e999 g',
      'Qts = 0',
      'Sd:',
      '82.4 Hz',
      'Qes 0.48 Hz extra words',
    ].join('\n');
    const r = parseParameterText(text);
    expect(errors(r)).toEqual([
      'line 2: unknown unit "furlongs" for Le',
      'line 3: unknown parameter "Vb"',
      'line 4: value "n/a" for Qms is not a number',
      'line 5: Re must be greater than zero, got -3.2',
      'line 6: value "1e999" for Mms is not finite',
      'line 7: Qts must be greater than zero, got 0',
      'line 8: no value for Sd',
      'line 9: no parameter name before the value "82.4 Hz"',
      'line 10: unknown unit "Hz extra words" for Qes',
    ]);
    expect(r.lines.map((l) => l.line)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
    expect(r.values).toEqual({ fs: 82.4 });
  });

  it('rejects a value that overflows on conversion to SI', () => {
    expect(only('Fs 1e308 kHz').error).toBe('line 1: value "1e308 kHz" for Fs is not finite');
  });

  it('rejects a name given twice on the second line, keeping the first value', () => {
    const r = parseParameterText(['Fs 82.4 Hz', 'Qts 0.44', 'FS = 90', 'Bl0 3.9', 'Bl(0) 3.8', 'Fs 82.4 Hz'].join('\n'));
    expect(errors(r)).toEqual([
      'line 3: Fs given twice (first on line 1)',
      'line 5: Bl(0) given twice (first on line 4)',
      'line 6: Fs given twice (first on line 1)',
    ]);
    expect(r.lines[2]).toEqual({ line: 3, text: 'FS = 90', key: 'fs', error: 'line 3: Fs given twice (first on line 1)' });
    expectValues(r, { fs: 82.4, qts: 0.44, bl0: 3.9 });
  });

  it('counts a name as given even when its first line was rejected', () => {
    const r = parseParameterText('Le 0.12 furlongs\nLe 0.12 mH');
    expect(errors(r)).toEqual(['line 1: unknown unit "furlongs" for Le', 'line 2: Le given twice (first on line 1)']);
    expect(r.values).toEqual({});
  });

  it('returns an empty result for empty input and for a non-string from plain JavaScript', () => {
    expect(parseParameterText('')).toEqual({ values: {}, lines: [] });
    expect(parseParameterText(undefined as unknown as string)).toEqual({ values: {}, lines: [] });
  });
});

describe('parseParameterText properties', () => {
  function checkInvariants(text: string, r: ParameterTextResult): void {
    const raw = text.replace(/^\uFEFF/, '').split(/\r\n|\r|\n/);
    const clean = new Map<ParameterKey, number>();
    let previous = 0;
    for (const l of r.lines) {
      expect(Number.isInteger(l.line) && l.line > previous && l.line <= raw.length).toBe(true);
      previous = l.line;
      expect(l.text).toBe(raw[l.line - 1]);
      if (l.error !== undefined) {
        expect(l.error.startsWith(`line ${l.line}: `)).toBe(true);
        expect(l.value).toBeUndefined();
      } else {
        expect(l.key !== undefined && PARAMETER_KEYS.includes(l.key)).toBe(true);
        expect(typeof l.value === 'number' && Number.isFinite(l.value) && l.value > 0).toBe(true);
        expect(clean.has(l.key as ParameterKey)).toBe(false);
        clean.set(l.key as ParameterKey, l.value as number);
      }
    }
    expect(r.values).toEqual(Object.fromEntries(clean));
  }

  it('never throws on 2,000 random Unicode strings, and every error names its own line', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 300 }), (text) => checkInvariants(text, parseParameterText(text))),
      { numRuns: 2000 },
    );
  });

  it('never throws on 3,000 strings built from parameter-like pieces, and every error names its own line', () => {
    const pieces = [
      'Fs', 'Qts', 'Le', 'Mms', 'Vas', 'Sd', 'Bl', 'Bl(0)', 'Kms0', 'X_Bl', 'Xbl (82%)', 'X C (C min=75%)', 'Driver', 'Parameter',
      '82.4', '0,48', '1,150', '-3', '0', '1e999', '1.2e-3', '.5', 'NaN', 'Infinity',
      'Hz', 'kHz', 'mH', 'µH', 'Ω', 'cm²', 'm^2', 'ft³', 'L', 'N/mm', 'T·m', 'N/A', 'furlongs', 'constructor', '__proto__',
      ' ', '  ', '\t', ':', '=', ';', '|', '#', '//', '- ', '(', ')', '[', ']', '%', '@', '\n', '\r\n', '\r', '\uFEFF',
    ];
    fc.assert(
      fc.property(fc.array(fc.constantFrom(...pieces), { maxLength: 80 }), (parts) => {
        const text = parts.join('');
        checkInvariants(text, parseParameterText(text));
      }),
      { numRuns: 3000 },
    );
  });
});
