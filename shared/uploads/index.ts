export { parseMeasurementFile, DEFAULT_MAX_BYTES, MIN_POINTS, MAX_ABS_PHASE_DEG } from './parse-measurement-file';
export { parseSummary } from './parse-summary';
export { onCommonGrid, PREVIEW_MAX_POINTS, previewPoints, thinPoints, UPLOAD_LIMITS } from './preview';
export { ACOUSTIC_KINDS, dbRelativeToPercent, DISTORTION_KINDS } from './units';
// types.ts is public whole: the parser's types and FILE_LEVEL_REASONS.
export * from './types';
