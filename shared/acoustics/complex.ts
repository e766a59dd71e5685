/**
 * Minimal complex arithmetic; kept local so shared/ has no runtime dependency for it
 * (tests cross-check against a general-purpose complex library).
 */
export interface Complex {
  re: number;
  im: number;
}

export const cx = (re: number, im = 0): Complex => ({ re, im });
export const cadd = (a: Complex, b: Complex): Complex => ({ re: a.re + b.re, im: a.im + b.im });
export const csub = (a: Complex, b: Complex): Complex => ({ re: a.re - b.re, im: a.im - b.im });
export const cmul = (a: Complex, b: Complex): Complex => ({ re: a.re * b.re - a.im * b.im, im: a.re * b.im + a.im * b.re });
export const cscale = (a: Complex, k: number): Complex => ({ re: a.re * k, im: a.im * k });
export function cdiv(a: Complex, b: Complex): Complex {
  // Smith's method avoids overflow when |b| is very large or small.
  if (Math.abs(b.re) >= Math.abs(b.im)) {
    const r = b.im / b.re;
    const d = b.re + b.im * r;
    return { re: (a.re + a.im * r) / d, im: (a.im - a.re * r) / d };
  }
  const r = b.re / b.im;
  const d = b.re * r + b.im;
  return { re: (a.re * r + a.im) / d, im: (a.im * r - a.re) / d };
}
export const cinv = (a: Complex): Complex => cdiv(cx(1), a);
export const cabs = (a: Complex): number => Math.hypot(a.re, a.im);
export const carg = (a: Complex): number => Math.atan2(a.im, a.re);

/** Evaluates a real-coefficient polynomial, coefficients highest power first, at complex s. */
export function cpolyval(coefficients: readonly number[], s: Complex): Complex {
  let acc = cx(0);
  for (const c of coefficients) acc = cadd(cmul(acc, s), cx(c));
  return acc;
}
