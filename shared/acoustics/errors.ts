/**
 * Thrown when inputs are physically impossible or insufficient for a computation.
 * `field` names the offending input so an API layer can map it to a 400 with a per-field message.
 */
export class AcousticsInputError extends Error {
  readonly field: string;

  constructor(field: string, message: string) {
    super(message);
    this.name = 'AcousticsInputError';
    this.field = field;
    // Keeps `instanceof` working when the code is compiled down to ES5-style classes.
    Object.setPrototypeOf(this, AcousticsInputError.prototype);
  }
}

export function isAcousticsInputError(value: unknown): value is AcousticsInputError {
  return value instanceof AcousticsInputError;
}

export function requirePositive(field: string, value: number | undefined): number {
  if (value === undefined || !Number.isFinite(value) || value <= 0) {
    throw new AcousticsInputError(field, `${field} must be a positive finite number`);
  }
  return value;
}
