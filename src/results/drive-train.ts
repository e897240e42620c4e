import type { Segment } from '../case/case.ts';
import type { SideResult } from '../physics/energy-method.ts';
import type { CouplingCheck } from './coupling-checks.ts';
import type { DynamicResult } from './dynamic-result.ts';
import type { FitCheck } from './hub-fits.ts';
import type { KeyCheck } from './key-checks.ts';
import type { VerdictBasis } from './verdict-basis.ts';
import type { GearboxCheck } from './gearbox-checks.ts';
import type { BackstopCheck } from './backstop-checks.ts';

export type DriveTrainKind = 'shaft' | 'key' | 'fit' | 'coupling' | 'gearbox' | 'backstop' | 'torque limiter' | 'shear pin';

/**
 * One element of the drive train with what it can carry and what it carried in the incident, both
 * at shaft speed where the element sits. Which of them gave way first is the finding's to decide
 * (src/finding/finding.ts); here are only the numbers.
 */
export interface DriveTrainElement {
  kind: DriveTrainKind;
  /** The element in words: 'the key at "drive sheave"', 'the shaft in "journal"'. */
  element: string;
  /** The station or segment it belongs to, as the case names it. */
  where: string;
  /** The torque at which it gives way (yields, shears, crushes, slips, parts), N·m, and how, in words. */
  capacity: number;
  givesWayBy: string;
  /** Peak torque it carried in the incident by the verdict's model, N·m (a shaft piece: its elastic peak). */
  torque: number;
  /** torque / capacity; at least 1 for a device that slipped or parted in the dynamic model. */
  ratio: number;
}

const segmentName = (s: Segment) => (s.label ? `"${s.label}"` : `segment ${s.index + 1}`);

/**
 * The drive train's elements: the shaft's pieces (the verdict's model: capacity the torque at which
 * the kt stress reaches shear yield), each key (the lower of shearing off and crushing), each fit
 * (its slip torque), each coupling (its maximum torque, else its rated one), each gearbox (its rated
 * output torque × service factor, against the larger of the torque at its output and, self-locking,
 * the torque it held against back-driving), each backstop (its rated torque where given, against
 * the rebound it held), each torque limiter (its setting) and shear pin (its parting torque).
 */
export function driveTrainElements(
  basis: VerdictBasis,
  sides: readonly SideResult[],
  dynamic: DynamicResult,
  hubs: {
    keys: readonly KeyCheck[];
    fits: readonly FitCheck[];
    couplings: readonly CouplingCheck[];
    gearboxes: readonly GearboxCheck[];
    backstops: readonly BackstopCheck[];
  },
): DriveTrainElement[] {
  const { keys, fits, couplings, gearboxes, backstops } = hubs;
  const out: DriveTrainElement[] = [];
  const shaftPieces =
    basis === 'energy method'
      ? sides.flatMap((s) => s.pieces.map((p) => ({ piece: p.piece, torque: p.torque, ratio: p.yieldRatio, side: s.side })))
      : dynamic.pieces.map((p) => ({ piece: p.piece, torque: p.elasticPeakTorque, ratio: p.yieldRatio, side: p.side }));
  for (const p of shaftPieces) {
    const where = segmentName(p.piece.segment);
    out.push({
      kind: 'shaft',
      element: `the shaft in ${where} (side ${p.side}, ${Number((p.piece.start * 1000).toPrecision(4))} to ${Number((p.piece.end * 1000).toPrecision(4))} mm)`,
      where,
      capacity: p.ratio > 0 ? p.torque / p.ratio : Infinity,
      givesWayBy: 'yields (kt stress at shear yield)',
      torque: p.torque,
      ratio: p.ratio,
    });
  }
  for (const k of keys) {
    const crush = k.crushTorque < k.shearOffTorque;
    const capacity = Math.min(k.crushTorque, k.shearOffTorque);
    out.push({
      kind: 'key',
      element: `the key at "${k.station}"`,
      where: k.station,
      capacity,
      givesWayBy: crush ? 'crushes (bearing at yield)' : 'shears off',
      torque: k.torque,
      ratio: k.torque / capacity,
    });
  }
  for (const f of fits) {
    out.push({
      kind: 'fit',
      element: `the shrink fit at "${f.station}"`,
      where: f.station,
      capacity: f.slipTorque,
      givesWayBy: 'slips',
      torque: f.torque,
      ratio: f.slipped ? Math.max(1, f.torque / f.slipTorque) : f.torque / f.slipTorque,
    });
  }
  for (const c of couplings) {
    const where = segmentName(c.segment);
    out.push({
      kind: 'coupling',
      element: `the coupling in ${where}`,
      where,
      capacity: c.capacity,
      givesWayBy: c.peakRating === undefined ? 'passes its rated torque' : 'passes its maximum torque',
      torque: c.torque,
      ratio: c.capacityRatio,
    });
  }
  for (const g of gearboxes) {
    const torque = Math.max(g.outputTorque, g.heldTorque ?? 0);
    out.push({
      kind: 'gearbox',
      element: `the gearbox at "${g.station}" (${Number(g.ratio.toPrecision(4))}:1${g.backDrivable ? '' : ', self-locking'})`,
      where: g.station,
      capacity: g.capacity,
      givesWayBy: 'passes its rated output torque × service factor',
      torque,
      ratio: torque / g.capacity,
    });
  }
  for (const b of backstops) {
    const capacity = b.ratedTorque ?? Infinity;
    out.push({
      kind: 'backstop',
      element: `the backstop at "${b.station}"`,
      where: b.station,
      capacity,
      givesWayBy: b.ratedTorque === undefined ? 'holds the rebound (no rated torque given)' : 'passes its rated torque in the rebound',
      torque: b.reboundTorque,
      ratio: b.ratedTorque === undefined ? 0 : b.reboundTorque / b.ratedTorque,
    });
  }
  const segmentPeak = (seg: Segment) => Math.max(0, ...dynamic.pieces.filter((p) => p.piece.segment.index === seg.index).map((p) => p.peakTorque));
  for (const s of dynamic.slips) {
    if (s.kind !== 'torque limiter' || s.elementIndex === undefined) continue;
    const seg = dynamic.pieces.find((p) => s.element.endsWith(segmentName(p.piece.segment)))?.piece.segment;
    const torque = seg ? segmentPeak(seg) : s.slipTorque;
    out.push({
      kind: 'torque limiter',
      element: s.element,
      where: seg ? segmentName(seg) : s.element,
      capacity: s.slipTorque,
      givesWayBy: 'slips (as set)',
      torque,
      ratio: s.firstSlip !== undefined ? Math.max(1, torque / s.slipTorque) : torque / s.slipTorque,
    });
  }
  for (const p of dynamic.pins) {
    const seg = dynamic.pieces.find((x) => p.element.endsWith(segmentName(x.piece.segment)))?.piece.segment;
    const torque = p.partedAt !== undefined ? p.shearTorque : seg ? segmentPeak(seg) : 0;
    out.push({
      kind: 'shear pin',
      element: p.element,
      where: seg ? segmentName(seg) : p.element,
      capacity: p.shearTorque,
      givesWayBy: 'parts',
      torque,
      ratio: p.partedAt !== undefined ? Math.max(1, torque / p.shearTorque) : torque / p.shearTorque,
    });
  }
  return out;
}
