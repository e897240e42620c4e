import type { Case } from '../case/case.ts';
import { sig } from './display-units.ts';

const INCH = 0.0254;

/**
 * A diameter as the trade writes it: metric in millimetres (one decimal at most); inch as a
 * fraction to 1/16 in where it lies on that grid ("3 1/8 in"), else three decimals.
 */
export function showDiameter(d: number, units: Case['units']): string {
  if (units === 'metric') return `${Number((d * 1000).toFixed(1))} mm`;
  const x = d / INCH;
  const sixteenths = Math.round(x * 16);
  if (Math.abs(x * 16 - sixteenths) > 1e-6) return `${sig(x, 4)} in`;
  const whole = Math.floor(sixteenths / 16);
  let num = sixteenths % 16;
  let den = 16;
  while (num > 0 && num % 2 === 0) {
    num /= 2;
    den /= 2;
  }
  if (num === 0) return `${whole} in`;
  return whole === 0 ? `${num}/${den} in` : `${whole} ${num}/${den} in`;
}
