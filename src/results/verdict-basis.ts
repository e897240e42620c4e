import type { Case } from '../case/case.ts';
import type { SideResult } from '../physics/energy-method.ts';

export type VerdictBasis = 'energy method' | 'dynamic model';

/**
 * Which result the verdict stands on, and why in one sentence. The energy method is exact for one
 * mass on a massless shaft stopped instantly with nothing else acting; the dynamic model is used
 * as soon as the case leaves that: more than one loaded station on a side, a stop with duration, a
 * drive, or a slip element (torque limiter, shear pin, belt, soft jam).
 */
export function verdictBasis(c: Case, sides: readonly SideResult[]): { basis: VerdictBasis; reason: string } {
  const why: string[] = [];
  for (const s of sides) if (s.stations.length > 1) why.push(`side ${s.side} has ${s.stations.length} loaded stations`);
  if (c.stop.duration > 0) why.push(`the stop took ${(c.stop.duration * 1000).toPrecision(3)} ms`);
  const drives = c.stations.filter((s) => s.drive);
  if (drives.length > 0) why.push(`${drives.length === 1 ? 'a drive acts' : 'drives act'} at ${drives.map((s) => `"${s.name}"`).join(', ')}`);
  const limiters = c.shaft.segments.filter((s) => s.slipTorque !== undefined).length;
  const pins = c.shaft.segments.filter((s) => s.shearTorque !== undefined).length;
  const belts = drives.filter((s) => s.drive!.belt).length;
  const slip = [
    limiters > 0 ? (limiters === 1 ? 'a torque limiter' : `${limiters} torque limiters`) : '',
    pins > 0 ? (pins === 1 ? 'a shear pin' : `${pins} shear pins`) : '',
    belts > 0 ? (belts === 1 ? 'a belt that can slip' : `${belts} belts that can slip`) : '',
    c.stop.torqueCapacity !== undefined ? 'a jam that can slip' : '',
    c.stations.some((s) => s.fit) ? 'a shrink or press fit that can slip' : '',
    c.shaft.segments.some((s) => s.coupling?.stiffness) ? 'a flexible coupling' : '',
    c.shaft.segments.some((s) => s.backlash !== undefined) ? 'backlash' : '',
  ].filter(Boolean);
  if (slip.length > 0) why.push(`the case has ${joinAnd(slip)}`);
  if (why.length === 0) {
    return {
      basis: 'energy method',
      reason:
        'The verdict uses the energy method: each side has one loaded station, the stop is instantaneous and no drive or slip element acts, which is the case the energy method is exact for; the dynamic model is shown beside it as a check.',
    };
  }
  return {
    basis: 'dynamic model',
    reason: `The verdict uses the dynamic model because ${joinAnd(why)}, which the energy method (one mass, stopped instantly, nothing else acting) does not represent.`,
  };
}

function joinAnd(items: string[]): string {
  return items.length <= 1 ? items.join('') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}
