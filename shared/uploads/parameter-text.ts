/**
 * Reads Thiele/Small and large-signal parameters pasted as text from a reviewer's notes or a
 * measurement program's export, one parameter per line, into SI values.
 *
 * Every line that could carry a parameter is reported back, with an error naming the line when it
 * cannot be used, so the paste box can show what was taken and what was not.
 */
import { DEFAULT_EXCURSION_THRESHOLDS } from '../acoustics/large-signal';

export const PARAMETER_KEYS = [
  'fs', 'qms', 'qes', 'qts', 're', 'le', 'mms', 'mmd', 'cms', 'kms', 'rms', 'bl', 'sd', 'vas', 'xmax',
  'x_bl', 'x_c', 'x_l', 'bl0', 'kms0',
] as const;
export type ParameterKey = (typeof PARAMETER_KEYS)[number];

/** SI: Hz, ohm, H, kg, m/N, N/m, kg/s, T·m, m², m³, m; Q factors are plain numbers. */
export type ParameterValues = Partial<Record<ParameterKey, number>>;

export const LARGE_SIGNAL_KEYS: readonly ParameterKey[] = ['x_bl', 'x_c', 'x_l', 'bl0', 'kms0'];

export interface ParameterLine {
  /** 1-based. */
  line: number;
  text: string;
  key?: ParameterKey;
  /** SI, as stored in `values`. */
  value?: number;
  error?: string;
}

export interface ParameterTextResult {
  values: ParameterValues;
  lines: ParameterLine[];
}

/** SI value = given value × num / den. Dividing by powers of ten keeps "1.9 L" exactly 0.0019. */
type Scale = readonly [num: number, den: number];

/** A Map, not an object, so that a unit spelled "constructor" finds nothing. */
function table(entries: Record<string, Scale>): ReadonlyMap<string, Scale> {
  return new Map(Object.entries(entries));
}

const LITRE: Scale = [1, 1e3];
// 1 in = 0.0254 m and 1 ft = 0.3048 m exactly (international yard and pound agreement, 1959), so
// 1 in² = 0.00064516 m² and 1 ft³ = 0.3048³ = 0.028316846592 m³.
const SQUARE_INCH: Scale = [0.00064516, 1];
const CUBIC_FOOT: Scale = [0.028316846592, 1];

const FREQUENCY = table({ hz: [1, 1], khz: [1e3, 1] });
const RESISTANCE = table({ ohm: [1, 1], ohms: [1, 1] });
const INDUCTANCE = table({ h: [1, 1], mh: [1, 1e3], uh: [1, 1e6] });
const MASS = table({ kg: [1, 1], g: [1, 1e3], gram: [1, 1e3], grams: [1, 1e3], mg: [1, 1e6] });
const COMPLIANCE = table({ 'm/n': [1, 1], 'mm/n': [1, 1e3], 'um/n': [1, 1e6] });
const STIFFNESS = table({ 'n/m': [1, 1], 'n/mm': [1e3, 1], 'kn/m': [1e3, 1] });
// N·s/m is the same unit as kg/s (the mechanical ohm).
const RESPONSIVENESS = table({ 'kg/s': [1, 1], 'ns/m': [1, 1] });
// N/A (newton per ampere) is the same unit as T·m.
const FORCE_FACTOR = table({ tm: [1, 1], 't-m': [1, 1], 'n/a': [1, 1] });
const AREA = table({ m2: [1, 1], cm2: [1, 1e4], mm2: [1, 1e6], in2: SQUARE_INCH, sqin: SQUARE_INCH });
const VOLUME = table({
  m3: [1, 1],
  l: LITRE, litre: LITRE, litres: LITRE, liter: LITRE, liters: LITRE, ltr: LITRE, dm3: LITRE,
  cm3: [1, 1e6], cc: [1, 1e6], ml: [1, 1e6],
  ft3: CUBIC_FOOT, cuft: CUBIC_FOOT,
});
const LENGTH = table({ m: [1, 1], cm: [1, 1e2], mm: [1, 1e3] });
// Tables often put a dash in the unit column of a dimensionless quantity.
const DIMENSIONLESS = table({ '-': [1, 1] });

interface Spec {
  /** Name used in messages. */
  label: string;
  /** Regular-expression sources, matched case-insensitively at the start of the line. */
  aliases: readonly string[];
  units: ReadonlyMap<string, Scale>;
  /** Normalised unit read when none is given. */
  bare: string | null;
  /** Large-signal limits are defined at one threshold; a different one is a different quantity. */
  threshold?: { percent: number; definition: string };
}

const pct = (fraction: number): number => Math.round(fraction * 1000) / 10;

// A bare number is read in the unit data sheets and measurement reports quote that parameter in:
// Hz, ohm, mH for Le, g for masses, mm/N, N/mm, kg/s, T·m, cm², litres, mm (common practice, no source).
const SPECS: Record<ParameterKey, Spec> = {
  fs: { label: 'Fs', aliases: ['f_?s', 'f_?0'], units: FREQUENCY, bare: 'hz' },
  qms: { label: 'Qms', aliases: ['q_?ms'], units: DIMENSIONLESS, bare: null },
  qes: { label: 'Qes', aliases: ['q_?es'], units: DIMENSIONLESS, bare: null },
  qts: { label: 'Qts', aliases: ['q_?ts'], units: DIMENSIONLESS, bare: null },
  re: { label: 'Re', aliases: ['r_?e', 'r_?dc', 'r_?evc'], units: RESISTANCE, bare: 'ohm' },
  le: { label: 'Le', aliases: ['l_?e'], units: INDUCTANCE, bare: 'mh' },
  mms: { label: 'Mms', aliases: ['m_?ms'], units: MASS, bare: 'g' },
  mmd: { label: 'Mmd', aliases: ['m_?md'], units: MASS, bare: 'g' },
  cms: { label: 'Cms', aliases: ['c_?ms'], units: COMPLIANCE, bare: 'mm/n' },
  kms: { label: 'Kms', aliases: ['k_?ms'], units: STIFFNESS, bare: 'n/mm' },
  rms: { label: 'Rms', aliases: ['r_?ms'], units: RESPONSIVENESS, bare: 'kg/s' },
  bl: { label: 'Bl', aliases: ['b_?l', 'b\\s*[·*×]\\s*l'], units: FORCE_FACTOR, bare: 'tm' },
  sd: { label: 'Sd', aliases: ['s_?d'], units: AREA, bare: 'cm2' },
  vas: { label: 'Vas', aliases: ['v_?as'], units: VOLUME, bare: 'l' },
  xmax: { label: 'Xmax', aliases: ['x_?max'], units: LENGTH, bare: 'mm' },
  x_bl: {
    label: 'X_Bl',
    aliases: ['x[\\s_]?bl'],
    units: LENGTH,
    bare: 'mm',
    threshold: { percent: pct(DEFAULT_EXCURSION_THRESHOLDS.blMin), definition: 'where Bl(x) falls to' },
  },
  x_c: {
    label: 'X_C',
    aliases: ['x[\\s_]?c'],
    units: LENGTH,
    bare: 'mm',
    threshold: { percent: pct(DEFAULT_EXCURSION_THRESHOLDS.cmsMin), definition: 'where Cms(x) falls to' },
  },
  x_l: {
    label: 'X_L',
    aliases: ['x[\\s_]?l'],
    units: LENGTH,
    bare: 'mm',
    threshold: { percent: pct(DEFAULT_EXCURSION_THRESHOLDS.leVariation), definition: 'where Le(x) departs from Le(0) by' },
  },
  bl0: { label: 'Bl(0)', aliases: ['b_?l_?0', 'bl\\s*\\(\\s*(?:x\\s*=\\s*)?0\\s*(?:mm\\s*)?\\)', 'bl\\s+at\\s+rest'], units: FORCE_FACTOR, bare: 'tm' },
  kms0: { label: 'Kms(0)', aliases: ['k_?ms_?0', 'kms\\s*\\(\\s*(?:x\\s*=\\s*)?0\\s*(?:mm\\s*)?\\)', 'kms\\s+at\\s+rest'], units: STIFFNESS, bare: 'n/mm' },
};

const ALIASES: readonly { key: ParameterKey; re: RegExp }[] = PARAMETER_KEYS.flatMap((key) =>
  SPECS[key].aliases.map((source) => ({ key, re: new RegExp(`^(?:${source})`, 'i') })),
);

/** Labels of notes about the sample or the session rather than the drive unit. */
const METADATA_WORDS: ReadonlySet<string> = new Set([
  'driver', 'model', 'maker', 'manufacturer', 'brand', 'serial', 's/n', 'sample', 'unit', 'date', 'time', 'note', 'notes',
  'comment', 'comments', 'remark', 'remarks', 'operator', 'measured', 'software', 'method', 'source', 'rig', 'project',
  'file', 'name', 'description', 'title', 'temperature', 'temp', 'humidity', 'pressure', 'drive', 'voltage', 'level',
]);

// "*" opens a comment in some exports; "* " followed by text is a list bullet, handled below.
const COMMENT_START = /^(?:#|\/\/|;|%|\*(?!\s))/;
// Notes are often lists: "- Fs: 82.4 Hz", "• Qts 0.44", "3) Vas 1.9 L".
const BULLET = /^(?:[-\u2013\u2022*+]|\d{1,2}[.)])\s+/;
const NUMBER = /^[+\-\u2212]?(?:\d+(?:[.,]\d*)?|[.,]\d+)(?:[eE][+\-\u2212]?\d+)?/;
// A comma followed by exactly three digits reads as a decimal comma or as a thousands separator.
const AMBIGUOUS_COMMA = /^[+\-\u2212]?[1-9]\d{0,2},\d{3}$/;
const QUALIFIER_NUMBER = '(\\d+(?:[.,]\\d+)?)';
// Every \s* follows a required token, so a long run of spaces cannot be split many ways.
const QUALIFIER_WORDS = '(?:[a-z]+\\s*(?:(?:min|max)\\s*)?(?:[=:]\\s*)?)?';
// "Xbl (82%)", "X_C [75 %]" or "X Bl (Bl min=82%)".
const QUALIFIER = new RegExp(`^\\s*[(\\[]\\s*${QUALIFIER_WORDS}${QUALIFIER_NUMBER}\\s*%\\s*[)\\]]`, 'i');
// A unit in the name column, as exports write "Fs (Hz)" or "Vas [L]".
const NAME_UNIT = /^\s*[([]([^()[\]]{0,24})[)\]]/;
const SEPARATOR = /^[\s:=;]*/;

const MAX_QUOTED = 40;

function quote(text: string): string {
  return JSON.stringify(text.length > MAX_QUOTED ? `${text.slice(0, MAX_QUOTED)}…` : text);
}

function normaliseUnit(unit: string): string {
  return unit
    .replace(/[\u03a9\u2126\u03c9]/g, 'ohm')
    .toLowerCase()
    .replace(/[\u00b5\u03bc]/g, 'u')
    .replace(/\u2113/g, 'l')
    .replace(/\u00b2/g, '2')
    .replace(/\u00b3/g, '3')
    .replace(/[\s\u00b7\u22c5*.^]/g, '');
}

interface NameMatch {
  key: ParameterKey;
  nameLength: number;
  percent: string | null;
  nameUnit: string | null;
  /** Name and value were separated by ':', '=', ';' or a tab rather than by spaces alone. */
  explicit: boolean;
  valueText: string;
}

function matchName(body: string): NameMatch | null {
  let best: NameMatch | null = null;
  for (const { key, re } of ALIASES) {
    const m = re.exec(body);
    if (!m || (best && best.nameLength >= m[0].length)) continue;
    let rest = body.slice(m[0].length);
    let percent: string | null = null;
    if (SPECS[key].threshold) {
      const q = QUALIFIER.exec(rest);
      if (q) {
        percent = q[1];
        rest = rest.slice(q[0].length);
      }
    }
    let nameUnit: string | null = null;
    const u = NAME_UNIT.exec(rest);
    if (u) {
      nameUnit = u[1].trim();
      rest = rest.slice(u[0].length);
    }
    const sep = SEPARATOR.exec(rest)?.[0] ?? '';
    // "Fsx 3" or "Bl0.9" is not Fs or Bl followed by a value.
    if (sep === '' && rest !== '' && nameUnit === null && percent === null) continue;
    best = { key, nameLength: m[0].length, percent, nameUnit, explicit: /[:=;\t]/.test(sep), valueText: rest.slice(sep.length).trim() };
  }
  return best;
}

interface SplitValue {
  numberText: string;
  unitText: string;
}

/** A leading number and the unit after it; further tab- or semicolon-separated columns (notes) are ignored. */
function splitValue(text: string): SplitValue | null {
  const m = NUMBER.exec(text);
  if (!m) return null;
  const rest = text.slice(m[0].length);
  const cut = rest.search(/[\t;]/);
  let unit = (cut < 0 ? rest : rest.slice(0, cut)).trim();
  if (unit === '' && cut >= 0) {
    const after = rest.slice(cut + 1);
    const next = after.search(/[\t;]/);
    unit = (next < 0 ? after : after.slice(0, next)).trim();
  }
  const bracketed = /^[([]([^()[\]]*)[)\]]$/.exec(unit);
  return { numberText: m[0], unitText: bracketed ? bracketed[1].trim() : unit };
}

function toNumber(text: string): number {
  return Number(text.replace(',', '.').replace(/\u2212/g, '-'));
}

type LineOutcome = { skip: true } | { skip: false; key?: ParameterKey; value?: number; error?: string };

const SKIP: LineOutcome = { skip: true };

function isNameLike(label: string): boolean {
  return label.length <= 32 && /^[A-Za-z\u00c0-\u024f\u0370-\u03ff]/.test(label) && !/[,!?"]/.test(label) && label.split(/\s+/).length <= 3;
}

/** A number with at most one short unit-like word after it, as a parameter line has. */
function isParameterShaped(valueText: string): boolean {
  const v = splitValue(valueText);
  if (!v) return false;
  const before = valueText.search(/[\t;]/);
  const head = before < 0 ? valueText : valueText.slice(0, before);
  const words = head.trim().split(/\s+/).length;
  return words <= 2 && v.unitText.length <= 12 && !/\s/.test(v.unitText);
}

function readUnknownName(body: string, where: string): LineOutcome {
  let label: string;
  let valueText: string;
  const at = body.search(/[:=;\t]/);
  if (at >= 0) {
    label = body.slice(0, at).trim();
    valueText = body.slice(at + 1).replace(SEPARATOR, '');
  } else {
    const words = body.split(/\s+/);
    const first = words.findIndex((w) => /^[+\-\u2212]?[.,]?\d/.test(w));
    label = first < 0 ? body : words.slice(0, first).join(' ');
    valueText = first < 0 ? '' : words.slice(first).join(' ');
  }
  if (label === '' && NUMBER.test(body)) return { skip: false, error: `${where}: no parameter name before the value ${quote(body)}` };
  const firstWord = label.split(/\s+/)[0].toLowerCase().replace(/[^a-z/]/g, '');
  if (METADATA_WORDS.has(firstWord)) return SKIP;
  if (!isNameLike(label) || !isParameterShaped(valueText)) return SKIP;
  return { skip: false, error: `${where}: unknown parameter ${quote(label)}` };
}

function readKnownName(match: NameMatch, hasDigit: boolean, where: string, firstSeen: Map<ParameterKey, number>, lineNo: number): LineOutcome {
  const { key } = match;
  const spec = SPECS[key];
  // "Qts is low for this driver", or a header row that starts with a parameter name.
  if (!hasDigit && !match.explicit) return SKIP;
  if (match.percent !== null && spec.threshold && Math.abs(toNumber(match.percent) - spec.threshold.percent) > 1e-9) {
    return {
      skip: false,
      error: `${where}: ${spec.label} is defined ${spec.threshold.definition} ${spec.threshold.percent} %, not ${match.percent} %`,
    };
  }
  const first = firstSeen.get(key);
  if (first !== undefined) return { skip: false, key, error: `${where}: ${spec.label} given twice (first on line ${first})` };
  firstSeen.set(key, lineNo);

  const fail = (error: string): LineOutcome => ({ skip: false, key, error: `${where}: ${error}` });
  if (match.valueText === '') return fail(`no value for ${spec.label}`);
  const split = splitValue(match.valueText);
  if (!split) return fail(`value ${quote(match.valueText)} for ${spec.label} is not a number`);
  const { numberText, unitText } = split;
  if (AMBIGUOUS_COMMA.test(numberText)) {
    return fail(`${quote(numberText)} for ${spec.label} could be a decimal comma or a thousands separator; write it without the comma or with a point`);
  }
  const given = toNumber(numberText);
  if (!Number.isFinite(given)) return fail(`value ${quote(numberText)} for ${spec.label} is not finite`);

  const nameUnit = match.nameUnit !== null && match.nameUnit !== '' ? match.nameUnit : null;
  if (nameUnit !== null && unitText !== '' && normaliseUnit(nameUnit) !== normaliseUnit(unitText)) {
    return fail(`two units for ${spec.label}: ${quote(nameUnit)} and ${quote(unitText)}`);
  }
  const unit = unitText !== '' ? unitText : (nameUnit ?? '');
  const scale = unit === '' ? (spec.bare === null ? ([1, 1] as const) : spec.units.get(spec.bare)) : spec.units.get(normaliseUnit(unit));
  if (!scale) return fail(`unknown unit ${quote(unit)} for ${spec.label}`);

  const si = (given * scale[0]) / scale[1];
  if (!Number.isFinite(si)) return fail(`value ${quote(`${numberText} ${unit}`.trim())} for ${spec.label} is not finite`);
  if (!(si > 0)) return fail(`${spec.label} must be greater than zero, got ${numberText}`);
  return { skip: false, key, value: si };
}

/**
 * Parses pasted parameter text. Never throws: problems are reported per line in `lines`, and
 * `values` holds only the parameters that were read cleanly (the first one, when a name repeats).
 */
export function parseParameterText(text: string): ParameterTextResult {
  // Paste handlers in plain JavaScript can hand over undefined or null.
  const source = typeof text === 'string' ? text.replace(/^\uFEFF/, '') : '';
  const values: ParameterValues = {};
  const lines: ParameterLine[] = [];
  const firstSeen = new Map<ParameterKey, number>();

  source.split(/\r\n|\r|\n/).forEach((raw, index) => {
    const lineNo = index + 1;
    let body = raw.trim();
    if (body === '' || COMMENT_START.test(body)) return;
    // Markdown tables: "| Fs | 82.4 | Hz |" reads like a tab-separated row.
    if (body.startsWith('|')) body = body.replace(/^\|/, '').replace(/\|$/, '').replace(/\|/g, '\t').trim();
    body = body.replace(BULLET, '');
    body = body.replace(/\s(?:#|\/\/).*$/, '').trim();
    if (body === '') return;

    const where = `line ${lineNo}`;
    const hasDigit = /\d/.test(body);
    const match = matchName(body);
    let outcome: LineOutcome;
    if (match) outcome = readKnownName(match, hasDigit, where, firstSeen, lineNo);
    else outcome = hasDigit ? readUnknownName(body, where) : SKIP;
    if (outcome.skip) return;

    const entry: ParameterLine = { line: lineNo, text: raw };
    if (outcome.key !== undefined) entry.key = outcome.key;
    if (outcome.error !== undefined) entry.error = outcome.error;
    else if (outcome.key !== undefined && outcome.value !== undefined) {
      entry.value = outcome.value;
      values[outcome.key] = outcome.value;
    }
    lines.push(entry);
  });
  return { values, lines };
}
