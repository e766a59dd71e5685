export type CurveKind = 'spl' | 'impedance' | 'thd' | 'h2' | 'h3' | 'imd' | 'bl_x' | 'kms_x' | 'le_x';

export type XUnit = 'Hz' | 'kHz' | 'mm' | 'm';
/** Options also take lower-case spellings, as request schemas tend to use them. */
export type XUnitOption = XUnit | 'hz' | 'khz';
export type YUnit = 'dB' | 'ohm' | 'percent' | 'dB_rel' | 'T·m' | 'N/m' | 'N/mm' | 'H' | 'mH' | 'µH';
export type PhaseUnit = 'deg' | 'rad';
export type Separator = 'tab' | 'semicolon' | 'comma' | 'space';
export type DecimalMark = '.' | ',';
export type TextEncodingName = 'utf-8' | 'utf-16le' | 'utf-16be' | 'windows-1252';
export type UnitSource = 'option' | 'header' | 'default' | 'values';

export interface ColumnChoice {
  x: number;
  y: number;
  phase?: number;
}

export interface ParseOptions {
  /** 0-based column indexes; overrides anything a header says. */
  columns?: ColumnChoice;
  xUnit?: XUnitOption;
  yUnit?: YUnit;
  distortionUnit?: 'percent' | 'db';
  separator?: Separator;
  decimal?: DecimalMark;
  /** Default 5 MB (5 * 1024 * 1024 bytes). */
  maxBytes?: number;
}

export type ParseErrorReason =
  | 'too_large'
  | 'empty'
  | 'no_data'
  | 'too_few_points'
  | 'invalid_options'
  | 'non_numeric'
  | 'not_finite'
  | 'wrong_column_count'
  | 'ambiguous_columns'
  | 'column_out_of_range'
  | 'not_increasing'
  | 'non_positive_frequency'
  | 'negative_value'
  | 'phase_out_of_range'
  | 'internal';

/** Reasons that describe the file as a whole and so carry `line: null`. */
export const FILE_LEVEL_REASONS: readonly ParseErrorReason[] = ['too_large', 'empty', 'no_data', 'too_few_points', 'invalid_options'];

export type ErrorField = 'x' | 'y' | 'phase' | 'file';

export interface ParseError {
  file: string;
  line: number | null;
  field?: ErrorField;
  reason: ParseErrorReason;
  message: string;
}

export interface ParseSettings {
  encoding: TextEncodingName;
  bom: boolean;
  lineEnding: 'lf' | 'crlf' | 'cr' | 'none';
  separator: Separator;
  decimal: DecimalMark;
  headerLine: number | null;
  headerText: string | null;
  firstDataLine: number;
  lastDataLine: number;
  columns: { count: number; x: number; y: number; phase: number | null; source: 'option' | 'header' | 'position' };
  units: { x: XUnit; y: YUnit; phase: PhaseUnit | null };
  unitSources: { x: UnitSource; y: UnitSource; phase: UnitSource | null };
  /** Units of the returned arrays (SI, or percent/dB/degrees where the catalogue stores those). */
  output: { x: 'Hz' | 'm'; y: 'dB' | 'ohm' | 'percent' | 'T·m' | 'N/m' | 'H'; phase: 'deg' | null };
}

export interface ParsedPoints {
  x: number[];
  y: number[];
  phase: number[] | null;
}

export type ParseResult =
  | { ok: true; points: ParsedPoints; settings: ParseSettings; warnings: string[] }
  | { ok: false; error: ParseError };

export interface ParseInput {
  name: string;
  bytes: Uint8Array;
  kind: CurveKind;
  options?: ParseOptions;
}
