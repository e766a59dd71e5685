import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { dbRelativeToPercent, parseMeasurementFile, parseSummary, type CurveKind, type ParseOptions, type ParseResult } from './index';

const FIXTURES = join(__dirname, '..', '..', 'tests', 'fixtures', 'uploads');
const enc = new TextEncoder();

function fixture(name: string, kind: CurveKind, options?: ParseOptions): ParseResult {
  return parseMeasurementFile({ name, bytes: new Uint8Array(readFileSync(join(FIXTURES, name))), kind, options });
}

function text(body: string, kind: CurveKind = 'spl', options?: ParseOptions, name = 'test.txt'): ParseResult {
  return parseMeasurementFile({ name, bytes: enc.encode(body), kind, options });
}

function ok(r: ParseResult): Extract<ParseResult, { ok: true }> {
  if (!r.ok) throw new Error(`expected success, got ${r.error.message}`);
  return r;
}

function fail(r: ParseResult): Extract<ParseResult, { ok: false }>['error'] {
  if (r.ok) throw new Error('expected a rejection');
  return r.error;
}

const rows = (n: number, make: (i: number) => string): string => Array.from({ length: n }, (_, i) => make(i)).join('\n');

describe('fixtures', () => {
  it('reads a tab file with * comments and a Freq/SPL/Phase header', () => {
    const r = ok(fixture('spl-0deg-tab.txt', 'spl'));
    expect(r.settings).toMatchObject({ separator: 'tab', decimal: '.', headerLine: 4, firstDataLine: 5, lineEnding: 'lf', encoding: 'utf-8' });
    expect(r.settings.columns).toMatchObject({ count: 3, x: 0, y: 1, phase: 2, source: 'header' });
    expect(r.points.x).toHaveLength(200);
    expect(r.points.x[0]).toBe(20);
    expect(r.points.y[0]).toBe(85);
    expect(r.points.phase?.[0]).toBe(-170);
    expect(r.points.phase?.[199]).toBe(170);
  });

  it('reads European style: CRLF, text lines, semicolons, decimal commas', () => {
    const r = ok(fixture('spl-30deg-semicolon-decimal-comma.csv', 'spl'));
    expect(r.settings).toMatchObject({ separator: 'semicolon', decimal: ',', headerLine: 4, firstDataLine: 5, lineEnding: 'crlf' });
    expect(r.points.x[0]).toBe(20);
    expect(r.points.y[0]).toBe(84);
    expect(r.points.phase?.[1]).toBe(89.5);
  });

  it('reads a comma CSV with unit-only header and scientific notation', () => {
    const r = ok(fixture('impedance-3col-header.csv', 'impedance'));
    expect(r.settings).toMatchObject({ separator: 'comma', headerLine: 2, units: { x: 'Hz', y: 'ohm', phase: 'deg' } });
    expect(r.points.x[0]).toBe(20);
    expect(r.points.x[1]).toBeCloseTo(20.706, 10);
    expect(r.points.y[0]).toBe(8.6038);
  });

  it('reads THD in dB relative to the fundamental from the header and outputs percent', () => {
    const r = ok(fixture('thd-db-relative.txt', 'thd'));
    expect(r.settings).toMatchObject({ separator: 'space', units: { y: 'dB_rel' }, unitSources: { y: 'header' }, output: { y: 'percent' } });
    // −40 dB relative = 1 %: common practice, no source.
    expect(r.points.y[0]).toBeCloseTo(1, 12);
  });

  it('reads Bl(x) with a quoted header in mm and outputs metres', () => {
    const r = ok(fixture('bl-x-mm.csv', 'bl_x'));
    expect(r.settings).toMatchObject({ headerLine: 1, units: { x: 'mm', y: 'T·m' }, output: { x: 'm', y: 'T·m' } });
    expect(r.points.x[0]).toBeCloseTo(-0.008, 15);
    expect(r.points.x[40]).toBeCloseTo(0, 15);
    expect(r.points.y[40]).toBe(7.5);
  });

  it('reads UTF-16 LE with BOM and a µH header, converting to henries', () => {
    const r = ok(fixture('utf16le-bom.txt', 'le_x'));
    expect(r.settings).toMatchObject({ encoding: 'utf-16le', bom: true, separator: 'tab', lineEnding: 'crlf', units: { x: 'mm', y: 'µH' } });
    expect(r.points.y[0]).toBeCloseTo(500e-6, 15);
    expect(r.points.x).toHaveLength(41);
  });

  it('takes the column named for the kind from a table with fundamental, THD, H2 and H3', () => {
    // Reading the fundamental's dB column as THD would turn 86 dB into 2·10⁶ %; the titles decide.
    const thd = ok(fixture('distortion-5col-header.txt', 'thd'));
    const h2 = ok(fixture('distortion-5col-header.txt', 'h2'));
    const h3 = ok(fixture('distortion-5col-header.txt', 'h3'));
    expect([thd.settings.columns.y, h2.settings.columns.y, h3.settings.columns.y]).toEqual([2, 3, 4]);
    expect(thd.points.y[0]).toBeCloseTo(0.3 + 2 / (1 + (100 / 150) ** 2), 4);
    expect(h3.points.y[0]).toBeCloseTo(thd.points.y[0] * 0.55, 3);
    expect(thd.settings.output.y).toBe('percent');
  });

  it('rejects a non-numeric value at physical line 212', () => {
    const e = fail(fixture('broken-line-212.txt', 'impedance'));
    expect(e).toEqual({
      file: 'broken-line-212.txt',
      line: 212,
      field: 'y',
      reason: 'non_numeric',
      message: '"broken-line-212.txt", line 212: non-numeric value "1,2,3"',
    });
  });

  it('rejects frequencies that stop increasing at line 80 of a CR-only file with a kHz header', () => {
    const e = fail(fixture('not-increasing-line-80.txt', 'spl'));
    expect(e).toMatchObject({ line: 80, field: 'x', reason: 'not_increasing' });
    expect(e.message).toMatch(/^"not-increasing-line-80\.txt", line 80: /);
  });
});

describe('unit conversions', () => {
  it('dB relative → percent: −40 dB = 1 %, −20 dB = 10 %, 0 dB = 100 % (common practice, no source)', () => {
    expect(dbRelativeToPercent(-40)).toBeCloseTo(1, 12);
    expect(dbRelativeToPercent(-20)).toBeCloseTo(10, 12);
    expect(dbRelativeToPercent(0)).toBe(100);
  });

  it('kHz → Hz ×1000 (SI prefix kilo = 10³, BIPM SI Brochure, 9th ed., table 7)', () => {
    const r = ok(text('Freq (kHz)\tSPL (dB)\n' + rows(12, (i) => `${(i + 1) * 0.5}\t80`)));
    expect(r.settings.units.x).toBe('kHz');
    expect(r.points.x[0]).toBe(500);
    expect(ok(text(rows(12, (i) => `${i + 1}\t80`), 'spl', { xUnit: 'kHz' })).points.x[11]).toBe(12000);
    expect(ok(text(rows(12, (i) => `${i + 1}\t80`), 'spl', { xUnit: 'khz' })).points.x[0]).toBe(1000);
    expect(fail(text(rows(12, (i) => `${i + 1}\t80`), 'spl', { xUnit: 'mm' }))).toMatchObject({ reason: 'invalid_options', line: null });
  });

  it('mm → m ×0.001 (SI prefix milli = 10⁻³, BIPM SI Brochure, 9th ed., table 7)', () => {
    const r = ok(text(rows(11, (i) => `${i - 5}\t5`), 'bl_x'));
    expect(r.points.x[0]).toBeCloseTo(-0.005, 15);
    expect(r.warnings.join()).toMatch(/read as mm/);
    expect(ok(text(rows(11, (i) => `${i - 5}\t5`), 'bl_x', { xUnit: 'm' })).points.x[0]).toBe(-5);
  });

  it('N/mm → N/m ×1000 and mH → H ×0.001 (SI prefixes, BIPM SI Brochure, 9th ed., table 7)', () => {
    expect(ok(text('x [mm];Kms [N/mm]\n' + rows(11, (i) => `${i};2,5`), 'kms_x')).points.y[0]).toBe(2500);
    expect(ok(text(rows(11, (i) => `${i}\t0.5`), 'le_x', { yUnit: 'mH' })).points.y[0]).toBeCloseTo(5e-4, 15);
  });

  it('phase in radians is converted to degrees', () => {
    const r = ok(text('f [Hz], Z [Ohm], Phase [rad]\n' + rows(10, (i) => `${i + 1}, 8, ${Math.PI / 2}`), 'impedance'));
    expect(r.points.phase?.[0]).toBeCloseTo(90, 10);
  });

  it('distortion: option wins, negative values without a unit read as dB, explicit percent rejects negatives', () => {
    expect(ok(text(rows(10, (i) => `${i + 1} -20`), 'h2', { distortionUnit: 'db' })).points.y[0]).toBeCloseTo(10, 12);
    const guessed = ok(text(rows(10, (i) => `${i + 1} -40`), 'h3'));
    expect(guessed.settings.unitSources.y).toBe('values');
    expect(guessed.points.y[0]).toBeCloseTo(1, 12);
    expect(ok(text('Hz  THD(%)\n' + rows(10, (i) => `${i + 1} 0.5`), 'thd')).points.y[0]).toBe(0.5);
    const e = fail(text(rows(10, (i) => `${i + 1} ${i === 4 ? -1 : 1}`), 'imd', { distortionUnit: 'percent' }));
    expect(e).toMatchObject({ reason: 'negative_value', line: 5, field: 'y' });
  });
});

describe('formats', () => {
  const data = rows(10, (i) => `${100 * (i + 1)}\t${80 + i}`);

  it('accepts BOM UTF-8, BOM-less UTF-16 BE and LE, and windows-1252 headers', () => {
    const withBom = new Uint8Array([0xef, 0xbb, 0xbf, ...enc.encode(data)]);
    expect(ok(parseMeasurementFile({ name: 'a', bytes: withBom, kind: 'spl' })).settings).toMatchObject({ encoding: 'utf-8', bom: true });
    const le = new Uint8Array(data.length * 2);
    const be = new Uint8Array(data.length * 2);
    for (let i = 0; i < data.length; i++) {
      le[2 * i] = data.charCodeAt(i);
      be[2 * i + 1] = data.charCodeAt(i);
    }
    expect(ok(parseMeasurementFile({ name: 'le', bytes: le, kind: 'spl' })).settings.encoding).toBe('utf-16le');
    const rbe = ok(parseMeasurementFile({ name: 'be', bytes: be, kind: 'spl' }));
    expect(rbe.settings.encoding).toBe('utf-16be');
    expect(rbe.points.y[9]).toBe(89);
    const latin = new Uint8Array([...enc.encode('x (mm)\tLe ('), 0xb5, ...enc.encode('H)\n' + rows(10, (i) => `${i}\t100`))]);
    const rl = ok(parseMeasurementFile({ name: 'l', bytes: latin, kind: 'le_x' }));
    expect(rl.settings).toMatchObject({ encoding: 'windows-1252', units: { y: 'µH' } });
  });

  it('honours options.columns over a wider table and rejects out-of-range choices', () => {
    const wide = rows(10, (i) => `${i + 1}\t9\t${80 + i}\t-5\t0.1`);
    expect(fail(text(wide))).toMatchObject({ reason: 'ambiguous_columns', line: 1 });
    const r = ok(text(wide, 'spl', { columns: { x: 0, y: 2, phase: 3 } }));
    expect(r.points.y[2]).toBe(82);
    expect(r.points.phase?.[0]).toBe(-5);
    expect(fail(text(wide, 'spl', { columns: { x: 0, y: 7 } }))).toMatchObject({ reason: 'column_out_of_range', line: 1 });
    expect(fail(text(wide, 'spl', { columns: { x: 0, y: 0 } }))).toMatchObject({ reason: 'invalid_options', line: null });
  });

  it('picks columns by header names in any order', () => {
    const r = ok(text('Phase;Frequency;Impedance\n' + rows(10, (i) => `${-i};${i + 1}0;8,${i}`), 'impedance'));
    expect(r.settings.columns).toMatchObject({ x: 1, y: 2, phase: 0 });
    expect(r.points.y[3]).toBe(8.3);
  });

  it('counts CR, LF and CRLF lines alike and ignores a trailing separator', () => {
    const body = ['# h', 'f;v;', ...Array.from({ length: 12 }, (_, i) => `${i + 1};${i};`)];
    body[9] = 'oops;1;';
    for (const eol of ['\n', '\r\n', '\r']) {
      expect(fail(text(body.join(eol)))).toMatchObject({ line: 10, field: 'x', reason: 'non_numeric' });
    }
  });
});

describe('rejections', () => {
  const good = (n = 12) => rows(n, (i) => `${(i + 1) * 10}\t${80 + i}\t${i}`);

  it('rejects empty, blank, too large and too short files without a line', () => {
    expect(fail(text(''))).toMatchObject({ reason: 'empty', line: null, field: 'file' });
    expect(fail(text('  \r\n\n'))).toMatchObject({ reason: 'empty', line: null });
    expect(fail(text(good(), 'spl', { maxBytes: 20 }))).toMatchObject({ reason: 'too_large', line: null, field: 'file' });
    expect(fail(text(good(9)))).toMatchObject({ reason: 'too_few_points', line: null, field: 'file' });
    expect(fail(text('just words\nno numbers'))).toMatchObject({ reason: 'no_data', line: null });
  });

  it('names the line and field of each data fault', () => {
    const lines = good().split('\n');
    const at = (i: number, row: string) => text(lines.map((l, k) => (k === i ? row : l)).join('\n'));
    expect(fail(at(5, '60\t85'))).toMatchObject({ reason: 'wrong_column_count', line: 6 });
    expect(fail(at(5, '60\t85\t400'))).toMatchObject({ reason: 'phase_out_of_range', line: 6, field: 'phase' });
    expect(fail(at(5, '60\tNaN\t0'))).toMatchObject({ reason: 'not_finite', line: 6, field: 'y' });
    expect(fail(at(5, '60\t1e999\t0'))).toMatchObject({ reason: 'not_finite', line: 6, field: 'y' });
    expect(fail(at(0, '0\t85\t0'))).toMatchObject({ reason: 'non_positive_frequency', line: 1, field: 'x' });
    expect(fail(at(5, '50\t85\t0'))).toMatchObject({ reason: 'not_increasing', line: 6, field: 'x' });
    expect(fail(at(11, 'end of data'))).toMatchObject({ reason: 'non_numeric', line: 12 });
  });

  it('never throws on bad input objects', () => {
    const bad = parseMeasurementFile({ name: 'x', bytes: 'nope' as unknown as Uint8Array, kind: 'spl' });
    expect(bad.ok).toBe(false);
  });
});

describe('parseSummary', () => {
  it('describes success and failure in one line', () => {
    expect(parseSummary(fixture('spl-0deg-tab.txt', 'spl'))).toBe('200 points, 20–20000 Hz, tab-separated, decimal point, UTF-8, header on line 4, with phase');
    expect(parseSummary(fixture('broken-line-212.txt', 'impedance'))).toBe('"broken-line-212.txt", line 212: non-numeric value "1,2,3"');
  });
});

describe('large files', () => {
  it('reads all of a 100,000-line file (its speed is measured by npm run bench)', () => {
    const big = rows(100_000, (i) => `${(i + 1) * 0.2}\t${(80 + Math.sin(i)).toFixed(4)}\t${(i % 360) - 180}`);
    const r = ok(text(big));
    expect(r.points.x).toHaveLength(100_000);
    expect(r.points.y[99_999]).toBeCloseTo(80 + Math.sin(99_999), 4);
  });
});
