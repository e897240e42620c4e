/**
 * The standard normal distribution function Φ(x), by the complementary error function of
 * Abramowitz & Stegun, Handbook of Mathematical Functions (1964), eq. 7.1.26 (from memory):
 * absolute error below 1.5e-7, plenty for a smoothed indicator.
 */
export function normalCdf(x: number): number {
  const u = Math.abs(x) / Math.SQRT2;
  const t = 1 / (1 + 0.3275911 * u);
  const poly = t * (0.254829592 + t * (-0.284496736 + t * (1.421413741 + t * (-1.453152027 + t * 1.061405429))));
  const erfc = poly * Math.exp(-u * u);
  return x >= 0 ? 1 - erfc / 2 : erfc / 2;
}
