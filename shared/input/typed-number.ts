const numberPattern = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;

/**
 * A number as a person types it into a form: a decimal comma is accepted because many builders
 * type one. Empty text is "not given" (`{}`); anything else that is not a plain number is invalid.
 */
export function readTypedNumber(text: string): { value?: number; invalid?: true } {
  const t = text.trim().replace(',', '.');
  if (t === '') return {};
  if (!numberPattern.test(t)) return { invalid: true };
  return { value: Number(t) };
}
