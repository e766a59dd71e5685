import type { ParseResult } from './types';

const SEPARATOR_WORDS = { tab: 'tab', semicolon: 'semicolon', comma: 'comma', space: 'space' } as const;

function compact(v: number): string {
  return Number(v.toPrecision(4)).toString();
}

/** One line for the upload screen: what was read, or why not. */
export function parseSummary(result: ParseResult): string {
  if (!result.ok) return result.error.message;
  const { points, settings, warnings } = result;
  const n = points.x.length;
  const range = `${compact(points.x[0])}–${compact(points.x[n - 1])} ${settings.output.x}`;
  const parts = [
    `${n} points`,
    range,
    `${SEPARATOR_WORDS[settings.separator]}-separated`,
    settings.decimal === ',' ? 'decimal comma' : 'decimal point',
    settings.encoding.toUpperCase() + (settings.bom ? ' with BOM' : ''),
    settings.headerLine === null ? 'no header' : `header on line ${settings.headerLine}`,
  ];
  if (points.phase) parts.push('with phase');
  if (warnings.length > 0) parts.push(`${warnings.length} warning${warnings.length === 1 ? '' : 's'}`);
  return parts.join(', ');
}
