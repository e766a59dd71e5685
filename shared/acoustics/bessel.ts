/**
 * Bessel function of the first kind, order one, by the polynomial approximations of
 * Abramowitz & Stegun, "Handbook of Mathematical Functions" (1964):
 *   9.4.4 for |x| ≤ 3 (|ε| < 1.3e-8 on x⁻¹·J1),
 *   9.4.6 for x ≥ 3 (|ε| < 4e-8 on f1, 9e-8 on θ1).
 * Accuracy of about 1e-7 absolute is far below anything a loudspeaker measurement resolves.
 */
export function besselJ1(x: number): number {
  const ax = Math.abs(x);
  if (ax <= 3) {
    const y = (x / 3) * (x / 3);
    const p =
      0.5 +
      y * (-0.56249985 + y * (0.21093573 + y * (-0.03954289 + y * (0.00443319 + y * (-0.00031761 + y * 0.00001109)))));
    return x * p;
  }
  const z = 3 / ax;
  const f1 =
    0.79788456 +
    z * (0.00000156 + z * (0.01659667 + z * (0.00017105 + z * (-0.00249511 + z * (0.00113653 + z * -0.00020033)))));
  const theta1 =
    ax -
    2.35619449 +
    z * (0.12499612 + z * (0.0000565 + z * (-0.00637879 + z * (0.00074348 + z * (0.00079824 + z * -0.00029166)))));
  const j = (f1 * Math.cos(theta1)) / Math.sqrt(ax);
  return x < 0 ? -j : j;
}

/** 2·J1(x)/x with its limit 1 at x = 0 (the piston directivity kernel). */
export function jinc(x: number): number {
  if (Math.abs(x) < 1e-8) return 1;
  return (2 * besselJ1(x)) / x;
}
