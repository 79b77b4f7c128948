/**
 * The smallest shift d on the worse side that a one-sided test flags with probability `power`,
 * when the test flags a move beyond `threshold` and the noise below the centre is the half
 * Student-t `lower` (scale, nu) — the honest figure of what a metric can show:
 *   P(d + noise > threshold) >= power  <=>  d >= threshold + q,
 * q the (1 - power) quantile of the noise's magnitude below the centre, i.e. q = scale x
 * t_nu upper quantile at 1 - power (the noise must not pull a shifted run back under the
 * threshold). `quantile(p, nu)` is the Student-t upper quantile (studentUpperQuantile).
 * @example detectableShift(3.5, { scale: 1, nu: Infinity }, 0.8, upperQuantile) // ≈ 4.34 (3.5 + 0.8416)
 */
export function detectableShift(
  threshold: number,
  lower: { scale: number; nu: number },
  power: number,
  quantile: (p: number, nu: number) => number,
): number {
  return threshold + lower.scale * quantile(1 - power, lower.nu);
}
