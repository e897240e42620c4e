/**
 * Tooth bending stress of a spur gear by the Lewis equation, σ = W_t/(F·m·Y) (SI form; in US units
 * σ = W_t·P/(F·Y) with the diametral pitch P = 1/m), the tangential tooth load W_t = 2T/d at the
 * pitch diameter d = m·z (Shigley's Mechanical Engineering Design, 9th ed., Sec. 14-1, Eq. (14-3)
 * for the US form and the SI form beside it; from memory, equation numbers: verify). A first
 * estimate: it takes the whole load at the tip of one tooth, with no dynamic (velocity),
 * load-distribution or stress-concentration factor of the AGMA or ISO ratings.
 */

/**
 * Lewis form factor Y for 20° full-depth teeth, by tooth count (Shigley 9th ed., Table 14-2; from
 * memory, confident about the values to the third decimal, verify): a rack is 0.485.
 */
const LEWIS_Y: readonly [number, number][] = [
  [12, 0.245],
  [13, 0.261],
  [14, 0.277],
  [15, 0.29],
  [16, 0.296],
  [17, 0.303],
  [18, 0.309],
  [19, 0.314],
  [20, 0.322],
  [21, 0.328],
  [22, 0.331],
  [24, 0.337],
  [26, 0.346],
  [28, 0.353],
  [30, 0.359],
  [34, 0.371],
  [38, 0.384],
  [43, 0.397],
  [50, 0.409],
  [60, 0.422],
  [75, 0.435],
  [100, 0.447],
  [150, 0.46],
  [300, 0.472],
  [400, 0.48],
];
const RACK_Y = 0.485;

/** The fewest teeth the table gives (fewer undercut a 20° full-depth tooth). */
export const LEWIS_MIN_TEETH = 12;

/** Y at z teeth (z ≥ 12): the table's value, linear between its rows, toward the rack's beyond 400. */
export function lewisFormFactor(z: number): number {
  if (z < LEWIS_MIN_TEETH) throw new Error(`lewisFormFactor: ${z} teeth is below the table's ${LEWIS_MIN_TEETH}`);
  const last = LEWIS_Y[LEWIS_Y.length - 1];
  if (z >= last[0]) return last[1] + (RACK_Y - last[1]) * (1 - last[0] / z);
  let i = 0;
  while (LEWIS_Y[i + 1][0] <= z) i++;
  const [z0, y0] = LEWIS_Y[i];
  const [z1, y1] = LEWIS_Y[i + 1];
  return y0 + ((y1 - y0) * (z - z0)) / (z1 - z0);
}

/** Tangential tooth load at the pitch circle of a gear of module m and z teeth carrying torque T, N: W_t = 2T/(m·z). */
export function toothLoad(torque: number, module: number, teeth: number): number {
  return (2 * torque) / (module * teeth);
}

/** Lewis bending stress at the tooth root, Pa: σ = W_t/(F·m·Y). */
export function lewisStress(toothLoadN: number, faceWidth: number, module: number, formFactor: number): number {
  return toothLoadN / (faceWidth * module * formFactor);
}
