import type { Case } from '../case/case.ts';
import type { Chain, ChainElement } from '../model/chain.ts';
import type { SideName } from '../model/shaft-model.ts';
import type { ChainSystem } from '../physics/integrator/chain-system.ts';
import { BacklashLaw } from '../physics/backlash-law.ts';
import { ShearPinLaw } from '../physics/shear-pin-law.ts';
import { SlipLaw } from '../physics/slip-law.ts';
import { ElasticLaw, type TorqueLaw } from '../physics/torque-law.ts';
import { elementDashpot } from './element-damping.ts';

/**
 * The numeric system the integrator takes, from a chain: one law per element (elastic shaft, or
 * the law `shaftLaw` gives a plain shaft element — yielding, breaking —, a limiter's slip, a pin's parting), stiffness-proportional damping c = β·k with β = 2ζ/ω₁ per side
 * so that each side's lowest mode has the damping ratio ζ (Rayleigh damping with the mass term
 * zero; Clough & Penzien, Dynamics of Structures, Sec. 12-4; from memory, confident), each spring
 * of an element (shaft, coupling) with its own ζ where the case gives one (`elementDashpot`,
 * src/results/element-damping.ts; the stepper scales each dashpot by its law's tangent over its
 * elastic stiffness, `ChainStepper.dashpot`), and the twist
 * of the running torque, which flows from each drive to the stop.
 */
export function systemOf(
  chain: Chain,
  speed: number,
  stop: { duration: number; torqueCapacity?: number },
  c: Case,
  lowest: Partial<Record<SideName, number>>,
  shaftLaw?: (el: ChainElement, initialTwist: number) => TorqueLaw | undefined,
): ChainSystem {
  const P = chain.stopNode;
  const m = chain.elements.length;
  const torque = new Float64Array(m);
  for (const d of chain.drives) {
    if (d.runningTorque === 0 || d.node === P) continue;
    if (d.node < P) for (let e = d.node; e < P; e++) torque[e] -= d.runningTorque;
    else for (let e = P; e < d.node; e++) torque[e] += d.runningTorque;
  }
  const initialTwist = Float64Array.from(chain.elements, (el, e) => torque[e] / el.stiffness);
  // A gap: held closed by a running torque through it; with none, taken fully open against the
  // impact's sense (the worst case: the load side crosses all of it before the stop bites). The
  // inertia beyond the stop runs ahead on side B (twist rising) and behind on side A.
  const gaps = chain.elements.map((el, e) => {
    if (!el.backlash) return undefined;
    const g = el.backlash.gap;
    const sense = torque[e] !== 0 ? Math.sign(torque[e]) : el.side === 'B' ? 1 : -1;
    const [lo, hi] = sense > 0 ? [-g, 0] : [0, g];
    if (torque[e] === 0) initialTwist[e] = sense > 0 ? lo : hi;
    return { lo, hi };
  });
  const damping = Float64Array.from(chain.elements, (el) => elementDashpot(c, el, lowest[el.side]));
  const laws: TorqueLaw[] = chain.elements.map((el, e) => {
    if (el.device?.kind === 'torque limiter' || el.device?.kind === 'hub fit') return new SlipLaw(el.stiffness, el.device.torque, initialTwist[e], damping[e]);
    if (el.device?.kind === 'shear pin') return new ShearPinLaw(el.stiffness, el.device.torque);
    const gap = gaps[e];
    if (gap) return new BacklashLaw(el.stiffness, gap.lo, gap.hi, initialTwist[e]);
    // An element with a coupling in series stays elastic: the plastic law's backbone is the shaft's alone.
    if (el.coupling) return new ElasticLaw(el.stiffness);
    return shaftLaw?.(el, initialTwist[e]) ?? new ElasticLaw(el.stiffness);
  });
  return {
    inertia: Float64Array.from(chain.nodes, (n) => n.inertia),
    laws,
    damping,
    elementInertia: Float64Array.from(chain.elements, (el) => el.inertia),
    initialTwist,
    speed,
    stop: { node: P, duration: stop.duration, ...(stop.torqueCapacity !== undefined ? { torqueCapacity: stop.torqueCapacity } : {}) },
    ...(chain.holds.length > 0 ? { holds: chain.holds.map((h) => h.node) } : {}),
    drives: chain.drives.map((d) => ({
      node: d.node,
      line: d.line,
      rotorInertia: d.rotorInertia,
      ...(d.belt ? { beltSlipTorque: d.belt.slipTorque } : {}),
      ...(d.drive.tripAfter !== undefined ? { tripAfter: d.drive.tripAfter } : {}),
    })),
  };
}
