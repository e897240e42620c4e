/**
 * The Palmgren–Miner sum: damage adds linearly, D = Σ nᵢ/Nᵢ, and a crack is expected near D = 1
 * (A. Palmgren 1924; M. A. Miner, J. Appl. Mech. 12, 1945). Tests scatter widely about 1, and
 * the order of the loads matters, which the sum ignores (Dowling, 4th ed., Sec. 9.8; from memory).
 */
export function minerSum(damages: readonly number[]): number {
  let sum = 0;
  for (const d of damages) sum += d;
  return sum;
}
