import type { CurveKind, PhaseUnit, XUnit, YUnit } from './types';

export const ACOUSTIC_KINDS: readonly CurveKind[] = ['spl', 'impedance', 'thd', 'h2', 'h3', 'imd'];
export const DISTORTION_KINDS: readonly CurveKind[] = ['thd', 'h2', 'h3', 'imd'];

export function isAcoustic(kind: CurveKind): boolean {
  return ACOUSTIC_KINDS.includes(kind);
}

export function isDistortion(kind: CurveKind): boolean {
  return DISTORTION_KINDS.includes(kind);
}

export function allowedXUnits(kind: CurveKind): readonly XUnit[] {
  return isAcoustic(kind) ? ['Hz', 'kHz'] : ['mm', 'm'];
}

export function allowedYUnits(kind: CurveKind): readonly YUnit[] {
  switch (kind) {
    case 'spl':
      return ['dB'];
    case 'impedance':
      return ['ohm'];
    case 'bl_x':
      return ['T·m'];
    case 'kms_x':
      return ['N/m', 'N/mm'];
    case 'le_x':
      return ['H', 'mH', 'µH'];
    default:
      return ['percent', 'dB_rel'];
  }
}

export function defaultXUnit(kind: CurveKind): XUnit {
  // Reviewers quote excursion in millimetres; the large-signal curves arrive that way.
  return isAcoustic(kind) ? 'Hz' : 'mm';
}

export function defaultYUnit(kind: CurveKind): YUnit {
  switch (kind) {
    case 'spl':
      return 'dB';
    case 'impedance':
      return 'ohm';
    case 'bl_x':
      return 'T·m';
    case 'kms_x':
      return 'N/m';
    case 'le_x':
      // Voice-coil inductance is quoted in millihenries in practice, so bare numbers are read that way.
      return 'mH';
    default:
      return 'percent';
  }
}

export function xScale(unit: XUnit): number {
  switch (unit) {
    case 'kHz':
      return 1000;
    case 'mm':
      return 0.001;
    default:
      return 1;
  }
}

/** Harmonic level relative to the fundamental, in dB, as a percentage of it: 100·10^(dB/20). */
export function dbRelativeToPercent(db: number): number {
  return 100 * Math.pow(10, db / 20);
}

export function convertY(value: number, unit: YUnit): number {
  switch (unit) {
    case 'dB_rel':
      return dbRelativeToPercent(value);
    case 'N/mm':
      return value * 1000;
    case 'mH':
      return value * 1e-3;
    case 'µH':
      return value * 1e-6;
    default:
      return value;
  }
}

export function phaseScale(unit: PhaseUnit): number {
  return unit === 'rad' ? 180 / Math.PI : 1;
}

export function outputUnits(kind: CurveKind): { x: 'Hz' | 'm'; y: 'dB' | 'ohm' | 'percent' | 'T·m' | 'N/m' | 'H' } {
  const x = isAcoustic(kind) ? 'Hz' : 'm';
  switch (kind) {
    case 'spl':
      return { x, y: 'dB' };
    case 'impedance':
      return { x, y: 'ohm' };
    case 'bl_x':
      return { x, y: 'T·m' };
    case 'kms_x':
      return { x, y: 'N/m' };
    case 'le_x':
      return { x, y: 'H' };
    default:
      return { x, y: 'percent' };
  }
}

export type UnitToken = { kind: 'x'; unit: XUnit } | { kind: 'y'; unit: YUnit } | { kind: 'phase'; unit: PhaseUnit };

const xToken = (unit: XUnit): UnitToken => ({ kind: 'x', unit });
const yToken = (unit: YUnit): UnitToken => ({ kind: 'y', unit });
const phaseToken = (unit: PhaseUnit): UnitToken => ({ kind: 'phase', unit });

// Each unit with every spelling a header may give it, lower case with single spaces.
const UNIT_SPELLINGS: [UnitToken, ...string[]][] = [
  [xToken('Hz'), 'hz'],
  [xToken('kHz'), 'khz'],
  [xToken('mm'), 'mm'],
  [xToken('m'), 'm'],
  [yToken('dB'), 'db', 'dbspl', 'db spl'],
  [yToken('dB_rel'), 'dbr', 'db rel', 'dbc'],
  [yToken('percent'), '%', 'percent'],
  [yToken('ohm'), 'ohm', 'ohms', '\u03a9', '\u2126'],
  [yToken('T·m'), 'tm', 't·m', 't*m', 't.m'],
  [yToken('N/m'), 'n/m'],
  [yToken('N/mm'), 'n/mm'],
  [yToken('H'), 'h'],
  [yToken('mH'), 'mh'],
  [yToken('µH'), 'uh', '\u00b5h', '\u03bch'],
  [phaseToken('deg'), 'deg', 'degree', 'degrees', '\u00b0'],
  [phaseToken('rad'), 'rad'],
];

const UNIT_TOKENS = new Map(UNIT_SPELLINGS.flatMap(([token, ...spellings]) => spellings.map((s) => [s, token] as const)));

export function lookUpUnit(text: string): UnitToken | null {
  const key = text.trim().toLowerCase().replace(/\s+/g, ' ');
  return UNIT_TOKENS.get(key) ?? null;
}
