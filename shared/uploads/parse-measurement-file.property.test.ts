import fc from 'fast-check';
import { FILE_LEVEL_REASONS, parseMeasurementFile, type ParseResult, type Separator } from './index';

interface Style {
  kind: 'spl' | 'bl_x';
  separator: Separator;
  decimal: '.' | ',';
  eol: '\n' | '\r\n' | '\r';
  comment: '#' | ';' | '//' | '*' | '';
  preamble: number;
  header: boolean;
  phase: boolean;
  encoding: 'utf-8' | 'utf-8-bom' | 'utf-16le' | 'utf-16be' | 'utf-16le-nobom';
  exponent: boolean;
  trailingEol: boolean;
}

interface Generated {
  bytes: Uint8Array;
  style: Style;
  x: number[];
  y: number[];
  phase: number[] | null;
}

const SEP_CHAR: Record<Separator, string> = { tab: '\t', semicolon: ';', comma: ',', space: ' ' };
const PREAMBLE = ['invented sample data', 'rig: bench one', 'operator: test account', 'conditions: room temperature'];

function encode(text: string, encoding: Style['encoding']): Uint8Array {
  if (encoding === 'utf-8') return new TextEncoder().encode(text);
  if (encoding === 'utf-8-bom') return new Uint8Array([0xef, 0xbb, 0xbf, ...new TextEncoder().encode(text)]);
  const bom = encoding === 'utf-16le-nobom' ? 0 : 2;
  const out = new Uint8Array(bom + text.length * 2);
  const le = encoding !== 'utf-16be';
  if (bom) [out[0], out[1]] = le ? [0xff, 0xfe] : [0xfe, 0xff];
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    out[bom + 2 * i] = le ? c & 0xff : c >> 8;
    out[bom + 2 * i + 1] = le ? c >> 8 : c & 0xff;
  }
  return out;
}

const styleArb: fc.Arbitrary<Style> = fc
  .record({
    kind: fc.constantFrom('spl' as const, 'bl_x' as const),
    separator: fc.constantFrom<Separator>('tab', 'semicolon', 'comma', 'space'),
    decimal: fc.constantFrom('.' as const, ',' as const),
    eol: fc.constantFrom('\n' as const, '\r\n' as const, '\r' as const),
    comment: fc.constantFrom('#' as const, ';' as const, '//' as const, '*' as const, '' as const),
    preamble: fc.integer({ min: 0, max: 3 }),
    header: fc.boolean(),
    phase: fc.boolean(),
    encoding: fc.constantFrom('utf-8' as const, 'utf-8-bom' as const, 'utf-16le' as const, 'utf-16be' as const, 'utf-16le-nobom' as const),
    exponent: fc.boolean(),
    trailingEol: fc.boolean(),
  })
  // Comma as both separator and decimal mark is unreadable, and no one writes it.
  .map((s) => (s.separator === 'comma' ? { ...s, decimal: '.' as const } : s));

const fileArb: fc.Arbitrary<Generated> = fc
  .tuple(
    styleArb,
    fc.array(fc.tuple(fc.integer({ min: 1, max: 5000 }), fc.integer({ min: -99_999, max: 99_999 }), fc.integer({ min: -36_000, max: 36_000 })), {
      minLength: 10,
      maxLength: 25,
    }),
    fc.integer({ min: -1000, max: 1000 }),
  )
  .map(([style, raw, start]) => {
    const fmt = (v: number, digits: number): string => {
      const s = style.exponent ? v.toExponential(6).toUpperCase() : v.toFixed(digits);
      return style.decimal === ',' ? s.replace('.', ',') : s;
    };
    const back = (s: string): number => Number(s.replace(',', '.'));
    const sep = SEP_CHAR[style.separator];
    const lines: string[] = [];
    for (let i = 0; i < style.preamble; i++) lines.push(style.comment ? `${style.comment} ${PREAMBLE[i]}` : PREAMBLE[i]);
    if (style.header) {
      const titles = style.kind === 'spl' ? ['Freq(Hz)', 'SPL(dB)', 'Phase(deg)'] : ['x [mm]', 'Bl [Tm]', 'Phase(deg)'];
      lines.push((style.comment ? style.comment + ' ' : '') + titles.slice(0, style.phase ? 3 : 2).join(sep));
    }
    const x: number[] = [];
    const y: number[] = [];
    const phase: number[] = [];
    let k = style.kind === 'spl' ? 0 : start;
    for (const [step, yv, pv] of raw) {
      k += step;
      const xs = fmt(k / 100, 2);
      const ys = fmt(yv / 1000, 3);
      const ps = fmt(pv / 100, 2);
      x.push(style.kind === 'spl' ? back(xs) : back(xs) * 0.001);
      y.push(back(ys));
      phase.push(back(ps));
      lines.push([xs, ys, ...(style.phase ? [ps] : [])].join(sep));
    }
    const text = lines.join(style.eol) + (style.trailingEol ? style.eol : '');
    return { bytes: encode(text, style.encoding), style, x, y, phase: style.phase ? phase : null };
  });

function checkInvariants(name: string, r: ParseResult): void {
  if (r.ok) {
    const { x, y, phase } = r.points;
    expect(x.length).toBeGreaterThanOrEqual(10);
    expect(y).toHaveLength(x.length);
    if (phase) expect(phase).toHaveLength(x.length);
    for (let i = 0; i < x.length; i++) {
      expect(Number.isFinite(x[i]) && Number.isFinite(y[i])).toBe(true);
      if (i > 0) expect(x[i]).toBeGreaterThan(x[i - 1]);
    }
    return;
  }
  const e = r.error;
  expect(e.reason).not.toBe('internal');
  expect(e.file).toBe(name);
  expect(typeof e.message).toBe('string');
  if (FILE_LEVEL_REASONS.includes(e.reason)) {
    expect(e.line).toBeNull();
  } else {
    expect(Number.isInteger(e.line) && (e.line as number) >= 1).toBe(true);
    expect(e.message.startsWith(`"${name}", line ${e.line}: `)).toBe(true);
  }
}

describe('parseMeasurementFile properties', () => {
  it('reads 5,000 generated files in random styles back to the generated numbers', () => {
    fc.assert(
      fc.property(fileArb, (g) => {
        const r = parseMeasurementFile({ name: 'gen.txt', bytes: g.bytes, kind: g.style.kind });
        if (!r.ok) throw new Error(`${r.error.message} for ${JSON.stringify(g.style)}`);
        expect(r.points.x).toEqual(g.x);
        expect(r.points.y).toEqual(g.y);
        expect(r.points.phase).toEqual(g.phase);
        expect(r.settings.separator).toBe(g.style.separator);
        expect(r.settings.decimal).toBe(g.style.decimal);
        expect(r.settings.encoding).toBe(g.style.encoding.startsWith('utf-8') ? 'utf-8' : g.style.encoding.replace('-nobom', ''));
        if (g.style.header) expect(r.settings.columns.source).toBe('header');
      }),
      { numRuns: 5000 },
    );
  });

  it('never throws on 5,000 mutated files, and every line-level rejection names its line', () => {
    const mutation = fc.oneof(
      fc.record({ op: fc.constant('set' as const), at: fc.nat(), byte: fc.integer({ min: 0, max: 255 }) }),
      fc.record({ op: fc.constant('insert' as const), at: fc.nat(), bytes: fc.uint8Array({ minLength: 1, maxLength: 6 }) }),
      fc.record({ op: fc.constant('insertText' as const), at: fc.nat(), text: fc.constantFrom('x', ',', ';', '\t', ' ', '\n', '\r', '-', 'e', '1e999', 'NaN', '"', '#') }),
      fc.record({ op: fc.constant('delete' as const), at: fc.nat(), length: fc.integer({ min: 1, max: 40 }) }),
      fc.record({ op: fc.constant('truncate' as const), at: fc.nat() }),
    );
    fc.assert(
      fc.property(fileArb, fc.array(mutation, { minLength: 1, maxLength: 4 }), (g, ops) => {
        let b = Array.from(g.bytes);
        for (const m of ops) {
          const at = b.length === 0 ? 0 : m.at % (b.length + 1);
          if (m.op === 'set' && b.length > 0) b[at % b.length] = m.byte;
          else if (m.op === 'insert') b.splice(at, 0, ...m.bytes);
          else if (m.op === 'insertText') b.splice(at, 0, ...new TextEncoder().encode(m.text));
          else if (m.op === 'delete') b.splice(at, m.length);
          else if (m.op === 'truncate') b = b.slice(0, at);
        }
        const r = parseMeasurementFile({ name: 'mutated.txt', bytes: new Uint8Array(b), kind: g.style.kind });
        checkInvariants('mutated.txt', r);
      }),
      { numRuns: 5000 },
    );
  });

  it('never throws on 2,000 garbage inputs of bytes and number-like text', () => {
    const garbage = fc.oneof(
      fc.uint8Array({ maxLength: 400 }),
      fc
        .array(fc.constantFrom('1', '2', '.', ',', ';', '\t', ' ', '\n', '\r', '-', 'e', 'E', '+', '#', 'Hz', 'dB', '"', '\u00b5', '\0'), { maxLength: 300 })
        .map((parts) => new TextEncoder().encode(parts.join(''))),
    );
    const kind = fc.constantFrom('spl' as const, 'impedance' as const, 'thd' as const, 'bl_x' as const, 'kms_x' as const, 'le_x' as const);
    fc.assert(
      fc.property(garbage, kind, (bytes, k) => {
        checkInvariants('garbage.bin', parseMeasurementFile({ name: 'garbage.bin', bytes, kind: k }));
      }),
      { numRuns: 2000 },
    );
  });
});
