import { decodeText } from './decode-text';
import { mapHeader, splitHeader } from './header';
import type {
  CurveKind,
  DecimalMark,
  ErrorField,
  ParseError,
  ParseErrorReason,
  ParseInput,
  ParseOptions,
  ParseResult,
  ParseSettings,
  PhaseUnit,
  Separator,
  UnitSource,
  XUnit,
  YUnit,
} from './types';
import {
  allowedXUnits,
  allowedYUnits,
  convertY,
  defaultXUnit,
  defaultYUnit,
  isAcoustic,
  isDistortion,
  outputUnits,
  phaseScale,
  xScale,
} from './units';

export const DEFAULT_MAX_BYTES = 5 * 1024 * 1024;
export const MIN_POINTS = 10;
export const MAX_ABS_PHASE_DEG = 360;

interface Scheme {
  separator: Separator;
  decimal: DecimalMark;
}

// Order is the tie-break: when two schemes read a sample equally well, the more specific separator wins.
const SCHEMES: readonly Scheme[] = [
  { separator: 'tab', decimal: '.' },
  { separator: 'tab', decimal: ',' },
  { separator: 'semicolon', decimal: '.' },
  { separator: 'semicolon', decimal: ',' },
  { separator: 'comma', decimal: '.' },
  { separator: 'space', decimal: '.' },
  { separator: 'space', decimal: ',' },
];

const NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;
const NOT_FINITE_WORD = /^[+-]?(?:nan|inf|infinity|1\.#inf|1\.#ind|-?1\.#qnan)$/i;
const WHITESPACE = /[ \t]+/;
const LETTER = /\p{L}/u;

class Rejection extends Error {
  constructor(
    readonly reason: ParseErrorReason,
    readonly line: number | null,
    readonly field: ErrorField | undefined,
    readonly detail: string,
  ) {
    super(detail);
  }
}

function reject(reason: ParseErrorReason, line: number | null, field: ErrorField | undefined, detail: string): never {
  throw new Rejection(reason, line, field, detail);
}

function formatMessage(file: string, line: number | null, detail: string): string {
  return line === null ? `"${file}": ${detail}` : `"${file}", line ${line}: ${detail}`;
}

function isComment(trimmed: string): boolean {
  const c = trimmed.charCodeAt(0);
  // # ; * ! %  and //
  return c === 35 || c === 59 || c === 42 || c === 33 || c === 37 || (c === 47 && trimmed.charCodeAt(1) === 47);
}

function tokenize(trimmed: string, separator: Separator): string[] {
  let parts: string[];
  if (separator === 'space') parts = trimmed.split(WHITESPACE);
  else {
    parts = trimmed.split(separator === 'tab' ? '\t' : separator === 'semicolon' ? ';' : ',');
    // Spreadsheet exports often end every row with a separator.
    while (parts.length > 1 && parts[parts.length - 1].trim() === '') parts.pop();
  }
  for (let i = 0; i < parts.length; i++) {
    let t = parts[i].trim();
    if (t.length >= 2 && t.charCodeAt(0) === 34 && t.charCodeAt(t.length - 1) === 34) t = t.slice(1, -1).trim();
    parts[i] = t;
  }
  return parts;
}

function looksNumeric(token: string, decimal: DecimalMark): boolean {
  return toNumber(token, decimal) !== null;
}

function toNumber(token: string, decimal: DecimalMark): number | null {
  const t = decimal === ',' ? (token.indexOf('.') >= 0 ? '' : token.replace(',', '.')) : token;
  if (NUMBER.test(t)) return Number(t);
  return NOT_FINITE_WORD.test(token) ? NaN : null;
}

function isDataLine(tokens: string[], decimal: DecimalMark): boolean {
  if (tokens.length < 2) return false;
  for (const t of tokens) if (!looksNumeric(t, decimal)) return false;
  return true;
}

const LF = 10;
const CR = 13;

/**
 * Each line of `text` with its 0-based index, split at CRLF, CR or LF as `split` would, but one at a
 * time: an array of every line of a large file would hold a second copy of it for the whole read.
 */
function* eachLine(text: string): Generator<[number, string]> {
  const n = text.length;
  let start = 0;
  for (let i = 0; ; i++) {
    let end = start;
    while (end < n && text.charCodeAt(end) !== LF && text.charCodeAt(end) !== CR) end++;
    yield [i, text.slice(start, end)];
    if (end >= n) return;
    start = end + (text.charCodeAt(end) === CR && text.charCodeAt(end + 1) === LF ? 2 : 1);
  }
}

/** The lines of `text` from the last one back, split as `eachLine` splits them. */
function* eachLineBackwards(text: string): Generator<string> {
  let end = text.length;
  for (;;) {
    let start = end;
    while (start > 0 && text.charCodeAt(start - 1) !== LF && text.charCodeAt(start - 1) !== CR) start--;
    yield text.slice(start, end);
    if (start === 0) return;
    end = start - 1;
    if (text.charCodeAt(end) === LF && end > 0 && text.charCodeAt(end - 1) === CR) end--;
  }
}

function lineEnding(text: string): ParseSettings['lineEnding'] {
  if (text.indexOf('\r\n') >= 0) return 'crlf';
  if (text.indexOf('\r') >= 0) return 'cr';
  if (text.indexOf('\n') >= 0) return 'lf';
  return 'none';
}

/** Scores each separator/decimal pair on a sample from both ends of the file (preamble at the top, data below). */
function chooseScheme(text: string, options: ParseOptions): Scheme | null {
  const sample: string[] = [];
  for (const [, line] of eachLine(text)) {
    if (sample.length >= 100) break;
    const t = line.trim();
    if (t && !isComment(t)) sample.push(t);
  }
  let tail = 0;
  for (const line of eachLineBackwards(text)) {
    if (tail >= 100) break;
    const t = line.trim();
    if (t && !isComment(t)) {
      sample.push(t);
      tail++;
    }
  }
  let best: Scheme | null = null;
  let bestScore = 0;
  for (const scheme of SCHEMES) {
    if (options.separator && options.separator !== scheme.separator) continue;
    if (options.decimal && options.decimal !== scheme.decimal) continue;
    let score = 0;
    for (const t of sample) if (isDataLine(tokenize(t, scheme.separator), scheme.decimal)) score++;
    if (score > bestScore) {
      best = scheme;
      bestScore = score;
    }
  }
  return best;
}

function checkOptions(options: ParseOptions): void {
  const { columns, maxBytes } = options;
  if (maxBytes !== undefined && !(Number.isFinite(maxBytes) && maxBytes > 0)) {
    reject('invalid_options', null, undefined, `maxBytes must be a positive number`);
  }
  if (columns) {
    const idx = [columns.x, columns.y, ...(columns.phase === undefined ? [] : [columns.phase])];
    if (!idx.every((i) => Number.isInteger(i) && i >= 0)) reject('invalid_options', null, undefined, 'column indexes must be whole numbers from 0');
    if (new Set(idx).size !== idx.length) reject('invalid_options', null, undefined, 'column indexes must differ');
  }
}

interface Layout {
  x: number;
  y: number;
  phase: number | null;
  source: ParseSettings['columns']['source'];
  headerXUnit: XUnit | null;
  headerYUnit: YUnit | null;
  headerPhaseUnit: PhaseUnit | null;
  headerLine: number | null;
  headerText: string | null;
}

function chooseLayout(
  kind: CurveKind,
  count: number,
  firstLine: number,
  headerIndex: number,
  headerRaw: string,
  separator: Separator,
  options: ParseOptions,
  warnings: string[],
): Layout {
  let mapping = null;
  let headerLine: number | null = null;
  let headerText: string | null = null;
  if (headerIndex >= 0) {
    const titles = splitHeader(headerRaw, count, separator);
    mapping = titles ? mapHeader(titles, kind) : null;
    if (mapping) {
      headerLine = headerIndex + 1;
      headerText = headerRaw.trim();
    } else if (titles || !options.columns) {
      warnings.push(`line ${headerIndex + 1} was not read as a column header`);
    }
  }
  const units = {
    headerXUnit: mapping?.xUnit ?? null,
    headerYUnit: mapping?.yUnit ?? null,
    headerPhaseUnit: mapping?.phaseUnit ?? null,
    headerLine,
    headerText,
  };
  if (options.columns) {
    const { x, y, phase } = options.columns;
    const highest = Math.max(x, y, phase ?? 0);
    if (highest >= count) {
      reject('column_out_of_range', firstLine, undefined, `column ${highest} was chosen but the data has ${count} columns (0-based)`);
    }
    const sameAsHeader = mapping && mapping.x === x && mapping.y === y;
    return {
      x,
      y,
      phase: phase ?? null,
      source: 'option',
      ...units,
      // Header units belong to the header's columns; they only carry over when the choice agrees with it.
      headerXUnit: sameAsHeader ? units.headerXUnit : null,
      headerYUnit: sameAsHeader ? units.headerYUnit : null,
      headerPhaseUnit: sameAsHeader && mapping?.phase === (phase ?? null) ? units.headerPhaseUnit : null,
    };
  }
  if (mapping) return { x: mapping.x, y: mapping.y, phase: mapping.phase, source: 'header', ...units };
  if (count > 3) {
    reject('ambiguous_columns', firstLine, undefined, `${count} columns and no header naming them; choose the columns to use`);
  }
  return { x: 0, y: 1, phase: count === 3 ? 2 : null, source: 'position', ...units };
}

function resolveXUnit(kind: CurveKind, layout: Layout, options: ParseOptions, warnings: string[]): { unit: XUnit; source: UnitSource } {
  const allowed = allowedXUnits(kind);
  const option: XUnit | undefined = options.xUnit === 'hz' ? 'Hz' : options.xUnit === 'khz' ? 'kHz' : options.xUnit;
  if (option) {
    if (!allowed.includes(option)) reject('invalid_options', null, undefined, `x unit ${option} does not fit a ${kind} curve`);
    if (layout.headerXUnit && layout.headerXUnit !== option) warnings.push(`header says ${layout.headerXUnit}, option ${option} used`);
    return { unit: option, source: 'option' };
  }
  if (layout.headerXUnit) {
    if (allowed.includes(layout.headerXUnit)) return { unit: layout.headerXUnit, source: 'header' };
    warnings.push(`header x unit ${layout.headerXUnit} does not fit a ${kind} curve and was ignored`);
  }
  const unit = defaultXUnit(kind);
  if (!isAcoustic(kind)) warnings.push(`no x unit given; read as ${unit}`);
  return { unit, source: 'default' };
}

function resolveYUnit(kind: CurveKind, layout: Layout, options: ParseOptions, warnings: string[]): { unit: YUnit; source: UnitSource } {
  const allowed = allowedYUnits(kind);
  let optionUnit: YUnit | undefined = options.yUnit;
  if (isDistortion(kind) && options.distortionUnit) optionUnit = options.distortionUnit === 'db' ? 'dB_rel' : 'percent';
  if (optionUnit) {
    if (!allowed.includes(optionUnit)) reject('invalid_options', null, undefined, `value unit ${optionUnit} does not fit a ${kind} curve`);
    return { unit: optionUnit, source: 'option' };
  }
  let headerUnit = layout.headerYUnit;
  // A plain "dB" over a distortion column means relative to the fundamental.
  if (headerUnit === 'dB' && isDistortion(kind)) headerUnit = 'dB_rel';
  if (headerUnit) {
    if (allowed.includes(headerUnit)) return { unit: headerUnit, source: 'header' };
    warnings.push(`header value unit ${headerUnit} does not fit a ${kind} curve and was ignored`);
  }
  const unit = defaultYUnit(kind);
  if (kind === 'le_x' || kind === 'kms_x') warnings.push(`no value unit given; read as ${unit}`);
  return { unit, source: 'default' };
}

function parseUnsafe(input: ParseInput, state: { line: number | null }): ParseResult {
  const { bytes, kind } = input;
  const options = input.options ?? {};
  checkOptions(options);
  const maxBytes = options.maxBytes ?? DEFAULT_MAX_BYTES;
  if (bytes.length > maxBytes) reject('too_large', null, 'file', `file is ${bytes.length} bytes, over the ${maxBytes}-byte limit`);
  if (bytes.length === 0) reject('empty', null, 'file', 'file is empty');

  const decoded = decodeText(bytes);
  const text = decoded.text;
  if (text.trim() === '') reject('empty', null, 'file', 'file holds no text');

  const scheme = chooseScheme(text, options);
  if (!scheme) reject('no_data', null, 'file', 'no lines of numbers found');
  const { separator, decimal } = scheme;

  const warnings: string[] = [];
  const acoustic = isAcoustic(kind);
  const xs: number[] = [];
  const ys: number[] = [];
  const phases: number[] = [];
  const yLines: number[] = [];
  let layout: Layout | null = null;
  let count = 0;
  let headerIndex = -1;
  let headerRaw = '';
  let firstDataLine = 0;
  let lastDataLine = 0;
  let xMul = 1;
  let pMul = 1;
  let xUnit: { unit: XUnit; source: UnitSource } = { unit: 'Hz', source: 'default' };
  let yUnit: { unit: YUnit; source: UnitSource } = { unit: 'dB', source: 'default' };
  let phaseUnit: PhaseUnit = 'deg';
  const columnField = (i: number): ErrorField | undefined =>
    layout === null ? undefined : i === layout.x ? 'x' : i === layout.y ? 'y' : i === layout.phase ? 'phase' : undefined;

  const read = (tokens: string[], col: number, line: number): number => {
    const token = tokens[col];
    const v = toNumber(token, decimal);
    if (v === null) reject('non_numeric', line, columnField(col), `non-numeric value "${token}"`);
    if (!Number.isFinite(v)) reject('not_finite', line, columnField(col), `value "${token}" is not a finite number`);
    return v;
  };

  for (const [i, line] of eachLine(text)) {
    const lineNo = i + 1;
    state.line = lineNo;
    const trimmed = line.trim();
    if (trimmed === '') continue;
    if (isComment(trimmed)) {
      if (layout === null && LETTER.test(trimmed)) [headerIndex, headerRaw] = [i, line];
      continue;
    }
    const tokens = tokenize(trimmed, separator);
    if (layout === null) {
      if (!isDataLine(tokens, decimal)) {
        if (LETTER.test(trimmed)) [headerIndex, headerRaw] = [i, line];
        continue;
      }
      count = tokens.length;
      firstDataLine = lineNo;
      layout = chooseLayout(input.kind, count, lineNo, headerIndex, headerRaw, separator, options, warnings);
      xUnit = resolveXUnit(kind, layout, options, warnings);
      yUnit = resolveYUnit(kind, layout, options, warnings);
      phaseUnit = layout.headerPhaseUnit ?? 'deg';
      xMul = xScale(xUnit.unit);
      pMul = phaseScale(phaseUnit);
    }
    if (tokens.length !== count) {
      // Text in the data block is the likelier cause than a missing column, and names the culprit.
      const bad = tokens.findIndex((t) => !looksNumeric(t, decimal));
      if (bad >= 0) reject('non_numeric', lineNo, columnField(bad), `non-numeric value "${tokens[bad]}"`);
      reject('wrong_column_count', lineNo, undefined, `expected ${count} columns, found ${tokens.length}`);
    }
    const x = read(tokens, layout.x, lineNo) * xMul;
    if (acoustic && x <= 0) reject('non_positive_frequency', lineNo, 'x', `frequency ${tokens[layout.x]} is not above zero`);
    if (xs.length > 0 && !(x > xs[xs.length - 1])) {
      reject('not_increasing', lineNo, 'x', `x value ${tokens[layout.x]} does not increase on the line before`);
    }
    const y = read(tokens, layout.y, lineNo);
    if (layout.phase !== null) {
      const p = read(tokens, layout.phase, lineNo) * pMul;
      if (Math.abs(p) > MAX_ABS_PHASE_DEG) reject('phase_out_of_range', lineNo, 'phase', `phase ${tokens[layout.phase]} is outside ±360°`);
      phases.push(p);
    }
    xs.push(x);
    ys.push(y);
    yLines.push(lineNo);
    lastDataLine = lineNo;
  }
  state.line = null;

  if (layout === null) reject('no_data', null, 'file', 'no lines of numbers found');
  if (xs.length < MIN_POINTS) reject('too_few_points', null, 'file', `only ${xs.length} data points, at least ${MIN_POINTS} needed`);

  if (isDistortion(kind) && yUnit.source === 'default' && ys.some((v) => v < 0)) {
    // Percentages cannot be negative; negative distortion figures are levels below the fundamental.
    yUnit = { unit: 'dB_rel', source: 'values' };
    warnings.push('negative distortion values read as dB relative to the fundamental');
  }
  if (kind === 'impedance' || yUnit.unit === 'percent') {
    const bad = ys.findIndex((v) => v < 0);
    if (bad >= 0) reject('negative_value', yLines[bad], 'y', `value ${ys[bad]} cannot be negative`);
  }
  const out = yUnit.unit === 'dB' || yUnit.unit === 'ohm' || yUnit.unit === 'percent' || yUnit.unit === 'T·m' || yUnit.unit === 'N/m' || yUnit.unit === 'H';
  const y = out ? ys : ys.map((v) => convertY(v, yUnit.unit));
  for (let k = 0; k < y.length; k++) {
    if (!Number.isFinite(y[k])) reject('not_finite', yLines[k], 'y', `value converts to a number out of range`);
  }

  const settings: ParseSettings = {
    encoding: decoded.encoding,
    bom: decoded.bom,
    lineEnding: lineEnding(text),
    separator,
    decimal,
    headerLine: layout.headerLine,
    headerText: layout.headerText,
    firstDataLine,
    lastDataLine,
    columns: { count, x: layout.x, y: layout.y, phase: layout.phase, source: layout.source },
    units: { x: xUnit.unit, y: yUnit.unit, phase: layout.phase === null ? null : phaseUnit },
    unitSources: { x: xUnit.source, y: yUnit.source, phase: layout.phase === null ? null : layout.headerPhaseUnit ? 'header' : 'default' },
    output: { ...outputUnits(kind), phase: layout.phase === null ? null : 'deg' },
  };
  return { ok: true, points: { x: xs, y, phase: layout.phase === null ? null : phases }, settings, warnings };
}

function toError(file: string, err: unknown, line: number | null): ParseError {
  if (err instanceof Rejection) {
    const e: ParseError = { file, line: err.line, reason: err.reason, message: formatMessage(file, err.line, err.detail) };
    if (err.field) e.field = err.field;
    return e;
  }
  const detail = `could not be read (${err instanceof Error ? err.message : String(err)})`;
  return { file, line, reason: 'internal', message: formatMessage(file, line, detail) };
}

/** Reads a reviewer's measurement text file into SI/percent arrays. Never throws: every failure is a typed error. */
export function parseMeasurementFile(input: ParseInput): ParseResult {
  const state: { line: number | null } = { line: null };
  const file = typeof input?.name === 'string' ? input.name : '';
  try {
    if (!(input?.bytes instanceof Uint8Array)) reject('invalid_options', null, 'file', 'bytes must be a Uint8Array');
    return parseUnsafe(input, state);
  } catch (err) {
    return { ok: false, error: toError(file, err, state.line) };
  }
}
