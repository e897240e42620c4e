import type { Case } from '../case/case.ts';
import type { Side } from '../model/shaft-model.ts';
import type { SideResult } from '../physics/energy-method.ts';
import { energyPerLength, plasticTorque, torqueAtTwistRate, yieldTorque, yieldTwistRate } from '../physics/plastic/plastic-torsion.ts';
import type { MostStrained, PlasticPieceResult, PlasticResult, PlasticSideResult, PlasticVerdict } from './plastic-result.ts';
import type { PlasticBalance } from '../physics/plastic/plastic-balance.ts';
import { keyedSeatNotes, sideBalance, type SideBalance } from './side-balance.ts';

/** Points on the loading path drawn for the most strained piece. */
const CURVE_POINTS = 80;

/**
 * The energy balance past yield for every side (REFERENCE 3.1.9 generalised to pieces in series):
 * each side's kinetic energy goes into its run of shaft, which carries one torque, capped by the
 * weakest piece's fully plastic torque. Quasi-static torque–twist law, no strain-rate effect, the
 * shaft's own inertia left out (as in the elastic energy method).
 */
export function analysePlastic(c: Case, model: { sides: Side[] }, elastic: readonly SideResult[]): { plastic: PlasticResult; balances: SideBalance[]; warnings: string[] } {
  const warnings: string[] = [];
  const balances = model.sides.map((side, i) => {
    const e = elastic[i];
    const inertia = e.parts.reduce((s, p) => s + p.reflectedInertia, 0);
    return sideBalance(side, c, inertia);
  });
  const sides = model.sides.map((side, i) => sideResult(side, balances[i], elastic[i].kineticEnergy));
  for (const b of balances) warnings.push(...b.warnings);

  const rank: Record<PlasticVerdict, number> = { elastic: 0, yielded: 1, 'fracture predicted': 2 };
  const verdict = sides.reduce<PlasticVerdict>((v, s) => (rank[s.verdict] > rank[v] ? s.verdict : v), 'elastic');
  const assumptions = [
    c.analysis.hardening === 'linear'
      ? 'Past yield the shear stress rises linearly with strain from Sy to Sut over the elongation at break (an assumption: it carries on past that strain, overstating the torque at large twist).'
      : 'Past yield the material is elastic–perfectly plastic: the shear stress stays at shear yield (no strain hardening), so the torque is capped at the fully plastic torque and the twist is on the high side.',
    'Stress-concentration factors (kt) are not applied to the net-section plastic behaviour of ductile material: local yielding relieves them under a single overload. They matter for fatigue and for brittle material, where they are applied.',
    "The torque–twist law is quasi-static (no strain-rate effect); the shaft unloads elastically to its permanent twist; the shaft's own inertia is left out, as in the elastic energy method.",
    ...keyedSeatNotes(
      c,
      model.sides.flatMap((s) => s.pieces),
    ),
  ];
  const brittleNotes: string[] = [];
  for (const s of sides) {
    for (const p of s.pieces) {
      if (!p.brittle) continue;
      brittleNotes.push(
        `Side ${s.side}, segment ${p.piece.segment.index + 1} (${p.material}) is brittle: it fractures near its ultimate strength without plastic twist, so no permanent twist is predicted in it${p.state.fractured ? ', and it is predicted to break' : ''}.`,
      );
    }
  }
  return {
    plastic: { verdict, peakTorque: Math.max(...sides.map((s) => s.peakTorque)), sides, mostStrained: mostStrained(sides, balances), assumptions, brittleNotes },
    balances,
    warnings,
  };
}

/**
 * A side's state at the end of the stop. When the side has more energy than it can absorb before
 * its first piece breaks, the state is the one at the break: the shaft twists no further, and the
 * rest of the energy is not taken by the shaft.
 */
function sideResult(side: Side, b: SideBalance, energy: number): PlasticSideResult {
  const { state, limit, breaks } = sideEndState(b, energy);
  // A piece that breaks keeps no twist to measure: its ends have parted (as in the dynamic model).
  const kept = state.pieces.map((p) => (p.fractured ? { ...p, permanentTwist: 0 } : p));
  const pieces = side.pieces.map((piece, i): PlasticPieceResult => {
    const bp = b.balance.pieces[i];
    const yieldTwist = yieldTwistRate(bp.law) * bp.length;
    return {
      ...b.facts[i],
      piece,
      yieldTorque: yieldTorque(bp.law),
      plasticTorque: plasticTorque(bp.law),
      yieldTwist,
      fractureTwist: bp.fractureTwistRate * bp.length,
      fractureEnergy: Number.isFinite(bp.fractureTwistRate) ? energyPerLength(bp.law, bp.fractureTwistRate) * bp.length : Infinity,
      yielded: state.pieces[i].twist > yieldTwist,
      surfaceOffset: bp.law.outerRadius * kept[i].permanentTwist,
      helixAngle: Math.atan((bp.law.outerRadius * kept[i].permanentTwist) / bp.length),
      state: kept[i],
    };
  });
  const fractured = breaks || pieces.some((p) => p.state.fractured);
  return {
    side: side.side,
    energy,
    peakTorque: state.torque,
    totalTwist: pieces.reduce((s, p) => s + p.state.twist, 0),
    permanentTwist: sidePermanentTwist(state),
    maxShearStrain: Math.max(...pieces.map((p) => p.state.maxShearStrain)),
    fractureEnergy: limit.energy,
    firstToBreak: limit.piece,
    verdict: fractured ? 'fracture predicted' : pieces.some((p) => p.yielded) ? 'yielded' : 'elastic',
    pieces,
  };
}

/**
 * The side's state at the end of the stop and its fracture limit: the state that absorbs `energy`,
 * or, when that is more than the side can take before its first piece breaks, the state at the break.
 */
export function sideEndState(b: SideBalance, energy: number) {
  const limit = b.balance.fractureLimit();
  const breaks = energy >= limit.energy;
  const state = breaks ? b.balance.stateAt(limit.twistRate) : b.balance.stateForEnergy(energy);
  if (breaks) state.pieces[limit.piece!] = { ...state.pieces[limit.piece!], fractured: true };
  return { state, limit, breaks };
}

/**
 * The side's end-state torque and permanent twist (`sideEndState`'s state read through
 * `sidePermanentTwist`) without building the state, as the Monte Carlo's samples read it: while
 * the side stays elastic and unbroken, in closed form; otherwise by `sideEndState`'s rule (the
 * state at the break when the energy reaches the fracture limit, where the run is in two and keeps
 * no twist; else the state that absorbs the energy). The same numbers either way.
 */
export function sideEndSummary(balance: PlasticBalance, energy: number): { torque: number; permanentTwist: number } {
  if (energy <= balance.elasticLimitEnergy()) {
    const s = balance.summaryForEnergy(energy);
    if (!s.fractured) return s;
  }
  const limit = balance.fractureLimit();
  if (energy >= limit.energy) return { torque: balance.torqueAt(limit.twistRate), permanentTwist: 0 };
  const s = balance.summaryForEnergy(energy);
  return { torque: s.torque, permanentTwist: s.fractured ? 0 : s.permanentTwist };
}

/** The permanent twist of a side's run at its end state, rad: 0 where a piece breaks (the run is in two; its unbroken pieces keep theirs). */
export function sidePermanentTwist(state: { pieces: readonly { permanentTwist: number; fractured: boolean }[] }): number {
  return state.pieces.some((p) => p.fractured) ? 0 : state.pieces.reduce((s, p) => s + p.permanentTwist, 0);
}

/** The piece with the highest outer-fibre shear strain, with its loading path sampled for the figure. */
function mostStrained(sides: readonly PlasticSideResult[], balances: readonly SideBalance[]): MostStrained {
  let best = { s: 0, i: 0 };
  sides.forEach((side, s) =>
    side.pieces.forEach((p, i) => {
      if (p.state.maxShearStrain > sides[best.s].pieces[best.i].state.maxShearStrain) best = { s, i };
    }),
  );
  const bp = balances[best.s].balance.pieces[best.i];
  const peak = sides[best.s].pieces[best.i].state.twistRate;
  // Straight while elastic; past yield, geometric spacing puts the points where the curve bends.
  const yieldRate = yieldTwistRate(bp.law);
  const rates =
    yieldRate < peak
      ? [0, ...Array.from({ length: CURVE_POINTS + 1 }, (_, k) => yieldRate * (peak / yieldRate) ** (k / CURVE_POINTS))]
      : Array.from({ length: CURVE_POINTS + 1 }, (_, k) => (peak * k) / CURVE_POINTS);
  rates[rates.length - 1] = peak;
  return {
    side: sides[best.s].side,
    index: best.i,
    curve: rates.map((phi) => ({ twist: phi * bp.length, torque: torqueAtTwistRate(bp.law, phi) })),
  };
}
