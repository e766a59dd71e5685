import type { CurveKind, PhaseUnit, Separator, XUnit, YUnit } from './types';
import { lookUpUnit, type UnitToken } from './units';

export interface HeaderColumn {
  text: string;
  role: 'x' | 'y' | 'phase';
  unit: UnitToken | null;
}

export interface HeaderMapping {
  x: number;
  y: number;
  phase: number | null;
  xUnit: XUnit | null;
  yUnit: YUnit | null;
  phaseUnit: PhaseUnit | null;
}

const COMMENT_PREFIX = /^(?:#|;|\/\/|\*|!|%)+\s*/;

export function stripCommentMarker(line: string): string {
  return line.replace(COMMENT_PREFIX, '');
}

function unquote(token: string): string {
  const t = token.trim();
  return t.length >= 2 && t.startsWith('"') && t.endsWith('"') ? t.slice(1, -1).trim() : t;
}

// "Freq (Hz)" must stay one column when a header is space-separated, so bracketed units glue to the word before.
function splitWords(text: string): string[] {
  const out: string[] = [];
  for (const word of text.split(/\s+/)) {
    if (!word) continue;
    if (out.length > 0 && (word.startsWith('(') || word.startsWith('['))) out[out.length - 1] += ' ' + word;
    else out.push(word);
  }
  return out;
}

function splitBy(text: string, how: Separator): string[] {
  if (how === 'space') return splitWords(text);
  const sep = how === 'tab' ? '\t' : how === 'semicolon' ? ';' : ',';
  const parts = text.split(sep).map(unquote);
  while (parts.length > 1 && parts[parts.length - 1] === '') parts.pop();
  return parts;
}

/** Splits a header line into exactly `count` column titles, trying the data separator first. */
export function splitHeader(line: string, count: number, dataSeparator: Separator): string[] | null {
  const text = stripCommentMarker(line.trim()).trim();
  const order: Separator[] = [dataSeparator, 'tab', 'semicolon', 'comma', 'space'];
  for (const how of order) {
    const parts = splitBy(text, how).map(unquote);
    if (parts.length === count && parts.every((p) => p.length > 0)) return parts;
  }
  return null;
}

function describe(title: string): HeaderColumn {
  const t = unquote(title);
  let name = t;
  let unitText: string | null = null;
  const bracket = /^(.*?)[([]\s*([^)\]]*?)\s*[)\]]\s*$/.exec(t);
  if (bracket) {
    name = bracket[1].trim();
    unitText = bracket[2];
  } else if (lookUpUnit(t)) {
    name = '';
    unitText = t;
  } else {
    const slash = t.indexOf('/');
    const tail = /^(.*?)[ _]+(\S+)$/.exec(t);
    if (slash > 0 && lookUpUnit(t.slice(slash + 1))) {
      name = t.slice(0, slash).trim();
      unitText = t.slice(slash + 1);
    } else if (tail && lookUpUnit(tail[2])) {
      name = tail[1].trim();
      unitText = tail[2];
    }
  }
  const unit = unitText === null ? null : lookUpUnit(unitText);
  const lower = name.toLowerCase();
  let role: HeaderColumn['role'] = 'y';
  if (/phase|phi/.test(lower) || unit?.kind === 'phase') role = 'phase';
  else if (/freq|^f$|^x$|^x\b|excursion|displacement|position|^pos$/.test(lower) || unit?.kind === 'x') role = 'x';
  return { text: t, role, unit };
}

// Words by which a column title names the curve of each kind. Exports that carry several values per
// frequency (fundamental, THD, H2, H3) are common, so with more than one value column the one named
// for the kind being read is taken.
const KIND_WORDS: Record<CurveKind, RegExp> = {
  spl: /spl|level|response|magnitude|mag\b|amplitude|pressure/,
  impedance: /imp|^\|?z\|?$|^z\b|ohm|magnitude|mag\b/,
  thd: /thd|total/,
  h2: /h2|hd2|k2|2nd|second/,
  h3: /h3|hd3|k3|3rd|third/,
  imd: /imd|intermod/,
  bl_x: /bl|force/,
  kms_x: /kms|cms|stiff|compliance/,
  le_x: /le\b|^le|induct/,
};

function nameOf(c: HeaderColumn): string {
  return c.text.replace(/[([].*$/, '').trim().toLowerCase();
}

export function mapHeader(titles: string[], kind?: CurveKind): HeaderMapping | null {
  const cols = titles.map(describe);
  const x = cols.findIndex((c) => c.role === 'x');
  const values = cols.map((c, i) => (c.role === 'y' ? i : -1)).filter((i) => i >= 0);
  const named = kind && values.length > 1 ? values.find((i) => KIND_WORDS[kind].test(nameOf(cols[i]))) : undefined;
  const y = named ?? values[0] ?? -1;
  const phaseIndex = cols.findIndex((c) => c.role === 'phase');
  if (x < 0 || y < 0) return null;
  const xUnit = cols[x].unit?.kind === 'x' ? cols[x].unit.unit : null;
  const yUnit = cols[y].unit?.kind === 'y' ? cols[y].unit.unit : null;
  const phase = phaseIndex >= 0 ? phaseIndex : null;
  const phaseUnitToken = phase === null ? null : cols[phase].unit;
  const phaseUnit = phaseUnitToken?.kind === 'phase' ? phaseUnitToken.unit : null;
  return { x, y, phase, xUnit, yUnit, phaseUnit };
}
