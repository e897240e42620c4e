import type { Case } from '../case/case.ts';
import type { Chain } from '../model/chain.ts';
import type { IntegrationResult } from '../physics/integrator/integrate-chain.ts';
import { ShearPinLaw } from '../physics/shear-pin-law.ts';
import { SlipLaw } from '../physics/slip-law.ts';
import { jamWithFit } from './fit-at-stop.ts';

/** What a slip element (torque limiter, belt, soft jam) did over the incident. */
export interface SlipOutcome {
  /** The element in words: 'the torque limiter in "coupling"', 'the belt at "drive sheave"'. */
  element: string;
  kind: 'torque limiter' | 'hub fit' | 'belt' | 'jam';
  /** Chain element index, for a limiter. */
  elementIndex?: number;
  /** Slip torque at the shaft, N·m. */
  slipTorque: number;
  /** Friction work, J. */
  energy: number;
  /** Angle slipped, rad at the shaft. */
  angle: number;
  /** When it first slipped, s; undefined if it never did. */
  firstSlip?: number;
  slippingAtEnd: boolean;
}

export interface PinOutcome {
  element: string;
  elementIndex: number;
  shearTorque: number;
  /** When it parted, s; undefined if it held. */
  partedAt?: number;
  /** Strain energy released when it parted, J. */
  released: number;
}

/** The limiters, belts, soft jam and shear pins of a solved chain, with what each did. */
export function slipOutcomes(asGiven: Case, chain: Chain, run: IntegrationResult): { slips: SlipOutcome[]; pins: PinOutcome[] } {
  const c = jamWithFit(asGiven);
  const fitAtStop = c !== asGiven && c.stop.torqueCapacity !== asGiven.stop.torqueCapacity;
  const first = (pred: (e: IntegrationResult['events'][number]) => boolean) => run.events.find(pred)?.time;
  const slips: SlipOutcome[] = [];
  const pins: PinOutcome[] = [];
  chain.elements.forEach((el, e) => {
    if (!el.device) return;
    const seg = el.device.segment;
    const where = seg.label ? `"${seg.label}"` : `segment ${seg.index + 1}`;
    const law = run.laws[e];
    if (law instanceof SlipLaw) {
      const fit = el.device.kind === 'hub fit';
      slips.push({
        element: fit ? `the shrink fit at "${el.device.station}"` : `the torque limiter in ${where}`,
        kind: fit ? 'hub fit' : 'torque limiter',
        elementIndex: e,
        slipTorque: law.slipTorque,
        energy: law.dissipated,
        angle: law.slipAngle,
        firstSlip: first((x) => x.source.kind === 'element' && x.source.index === e && x.what === 'starts to slip'),
        slippingAtEnd: law.slipping,
      });
    } else if (law instanceof ShearPinLaw) {
      pins.push({
        element: `the shear pin in ${where}`,
        elementIndex: e,
        shearTorque: law.shearTorque,
        partedAt: first((x) => x.source.kind === 'element' && x.source.index === e),
        released: law.dissipated,
      });
    }
  });
  chain.drives.forEach((d, i) => {
    const b = run.belts[i];
    if (!d.belt || !b) return;
    slips.push({
      element: `the belt at "${d.station}"`,
      kind: 'belt',
      slipTorque: d.belt.slipTorque,
      energy: b.slipWork,
      angle: b.slipAngle,
      firstSlip: first((x) => x.source.kind === 'belt' && x.source.index === i && x.what === 'starts to slip'),
      slippingAtEnd: b.slippingAtEnd,
    });
  });
  if (run.jam && c.stop.torqueCapacity !== undefined) {
    slips.push({
      element: fitAtStop ? `the shrink fit at "${c.stop.at}" (the shaft turning in the held hub)` : `the jam at "${c.stop.at}"`,
      kind: 'jam',
      slipTorque: c.stop.torqueCapacity,
      energy: run.jam.slipWork,
      angle: run.jam.slipAngle,
      firstSlip: run.jam.slipAngle > 0 ? (first((x) => x.source.kind === 'jam' && x.what === 'starts to slip') ?? 0) : undefined,
      slippingAtEnd: run.jam.slippingAtEnd,
    });
  }
  return { slips, pins };
}
