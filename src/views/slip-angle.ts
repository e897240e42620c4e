import type { Case } from '../case/case.ts';
import { show, sig } from './display-units.ts';

/** A slip angle in words: degrees below a turn, turns (with degrees) above: "187°", "2.9 turns (1040°)". */
export function showSlipAngle(angle: number, units: Case['units']): string {
  const turns = angle / (2 * Math.PI);
  return turns < 1 ? show(angle, 'angle', units) : `${sig(turns, 2)} turns (${show(angle, 'angle', units)})`;
}
