export { parseMeasurementFile, DEFAULT_MAX_BYTES, MIN_POINTS, MAX_ABS_PHASE_DEG } from './parse-measurement-file';
export { parseSummary } from './parse-summary';
export { dbRelativeToPercent } from './units';
export { FILE_LEVEL_REASONS } from './types';
export type {
  ColumnChoice,
  CurveKind,
  DecimalMark,
  ErrorField,
  ParseError,
  ParseErrorReason,
  ParseInput,
  ParseOptions,
  ParseResult,
  ParseSettings,
  ParsedPoints,
  PhaseUnit,
  Separator,
  TextEncodingName,
  UnitSource,
  XUnit,
  XUnitOption,
  YUnit,
} from './types';
