import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { integrateChain, type IntegrationResult } from '../../../src/physics/integrator/integrate-chain.ts';
import { PlasticBalance } from '../../../src/physics/plastic/plastic-balance.ts';
import { PlasticElementLaw } from '../../../src/physics/plastic/plastic-element-law.ts';
import { residualTwistRate, rigidity, torqueAtTwistRate, yieldTorque, type TorsionLaw } from '../../../src/physics/plastic/plastic-torsion.ts';
import { sectionTwistRate, SeriesBackbone } from '../../../src/physics/plastic/series-backbone.ts';
import { ElasticLaw, type TorqueLaw } from '../../../src/physics/torque-law.ts';
import { chain } from '../integrator/chain-fixtures.ts';

const law = (c2: number, tauY: number, h = 0): TorsionLaw => ({ outerRadius: c2, innerRadius: 0, shearModulus: 79.3e9, shearYield: tauY, hardeningModulus: h });
const rel = (a: number, b: number) => Math.abs(a / b - 1);
const rpm = (n: number) => (n * 2 * Math.PI) / 60;
const books = (r: IntegrationResult) => {
  const e = r.energy;
  return e.final - (e.initial + e.motorWork + e.boundaryWork - e.dampingWork - e.slipWork - e.released);
};

/**
 * Moves a law along a path of twists (straight legs between the given points) the way the
 * integrator does: an event found by bisection on the leg is entered at its crossing, then the
 * leg goes on. Returns the torque at the end of each leg.
 */
function drive(l: PlasticElementLaw, path: number[], steps = 400): number[] {
  const out: number[] = [];
  let th = 0;
  for (const target of path) {
    const rate = Math.sign(target - th);
    if (l.leave(th, rate) > 0) l.enter(th);
    const d = (target - th) / steps;
    for (let i = 0; i < steps; i++) {
      let next = th + d;
      for (let guard = 0; guard < 4 && l.leave(next, rate) > 0; guard++) {
        let a = th;
        let b = next;
        for (let k = 0; k < 60; k++) {
          const m = 0.5 * (a + b);
          if (l.leave(m, rate) > 0) b = m;
          else a = m;
        }
        l.commit(a);
        l.enter(a);
        th = a;
      }
      next = th + (target - th) / (steps - i);
      l.commit(next);
      th = next;
    }
    out.push(l.torque(th));
  }
  return out;
}

describe('PlasticElementLaw, one inertia on one shaft stopped at once (EP5)', () => {
  // EP5 (shared REFERENCE.md 3.3, derived): J = 0.986460 kg·m², d = 40 mm, L = 0.5 m, G = 79.3 GPa,
  // τ_Y = 0.577·530 MPa = 305.81 MPa (AISI 1045 CD, Shigley 9th ed. Table A-20), 300 rpm:
  // T = 4859.34 N·m, residual twist 0.041193 rad, from the energy balance REFERENCE 3.1.9.
  const J = 0.98646;
  const L = 0.5;
  const tl = law(0.02, 0.577 * 530e6);
  const k = rigidity(tl) / L;
  const run = (speed: number) => {
    const el = new PlasticElementLaw(new SeriesBackbone([{ law: tl, length: L }]));
    const period = 2 * Math.PI * Math.sqrt(J / k);
    const r = integrateChain(chain({ J: [0, J], k: [k], speed, laws: [el] }), { duration: 1.5 * period, timeStep: period / 4000 });
    return { el, r };
  };

  it('peaks at 4859.34 N·m within 1 % and agrees with PlasticBalance.stateForEnergy(½Jω²) within 0.5 %', () => {
    const { el, r } = run(rpm(300));
    expect(rel(r.peakTorque[0], 4859.34)).toBeLessThan(0.01);
    const s = new PlasticBalance([{ length: L, law: tl, fractureTwistRate: Infinity }]).stateForEnergy(0.5 * J * rpm(300) ** 2);
    expect(rel(el.peakTorque, s.torque)).toBeLessThan(0.005);
    expect(el.yielded).toBe(true);
  });

  it('leaves a residual twist of 0.041193 rad within 3 % on elastic unloading from its peak', () => {
    const { el } = run(rpm(300));
    const residual = L * residualTwistRate(tl, sectionTwistRate(tl, el.peakTorque));
    expect(rel(residual, 0.041193)).toBeLessThan(0.03);
  });

  it('closes its energy books without damping: kinetic + strain + plastic work = initial within 1e-3', () => {
    const { r } = run(rpm(300));
    expect(Math.abs(books(r)) / r.energy.initial).toBeLessThan(1e-3);
  });

  it('has done the plastic work of the energy balance at its peak: ½Jω² − T²/2k = 190.6 J within 1 %', () => {
    // REFERENCE EP5: KE = 486.799 J all absorbed at θ_max, of which T²/2k (k = 3.98610e4 N·m/rad) is recoverable.
    const { r } = run(rpm(300));
    const el = new PlasticElementLaw(new SeriesBackbone([{ law: tl, length: L }]));
    const period = 2 * Math.PI * Math.sqrt(J / k);
    integrateChain(chain({ J: [0, J], k: [k], speed: rpm(300), laws: [el] }), { duration: r.peakTime[0], timeStep: period / 4000 });
    expect(rel(el.dissipated, 486.799 - 4859.34 ** 2 / (2 * 3.9861e4))).toBeLessThan(0.01);
  });

  it('at 150 rpm stays elastic and steps exactly as the elastic law (T = 3114.81 N·m, REFERENCE EP5)', () => {
    const { el, r } = run(rpm(150));
    const period = 2 * Math.PI * Math.sqrt(J / k);
    const e = integrateChain(chain({ J: [0, J], k: [k], speed: rpm(150), laws: [new ElasticLaw(k)] }), { duration: 1.5 * period, timeStep: period / 4000 });
    expect(el.yielded).toBe(false);
    expect(r.peakTorque[0]).toBe(e.peakTorque[0]);
    expect(rel(r.peakTorque[0], 3114.81)).toBeLessThan(0.005);
    expect(Array.from(r.history.elementTorque[0])).toEqual(Array.from(e.history.elementTorque[0]));
  });
});

describe('PlasticElementLaw in a ramped chain of three inertias', () => {
  it('closes its energy books through reversals and rejoined paths within 1e-3, with and without hardening', () => {
    for (const h of [0, 2e9]) {
      const tl = law(0.015, 300e6, h);
      const mk = (L: number) => new PlasticElementLaw(new SeriesBackbone([{ law: tl, length: L }]));
      const laws = [mk(0.3), mk(0.4), mk(0.2)];
      const k = laws.map((l) => l.stiffness);
      const r = integrateChain(chain({ J: [0, 0.5, 0.2, 0.8], k, speed: rpm(600), ramp: 0.002, laws }), { duration: 0.1, timeStep: 2e-6 });
      expect(laws.some((l) => l.yielded)).toBe(true);
      expect(r.events.some((e) => e.what === 'turns back')).toBe(true);
      expect(Math.abs(books(r)) / r.energy.initial).toBeLessThan(1e-3);
      // Nothing carries more than the section's limit (T_P for a perfectly plastic one).
      if (h === 0) for (const p of r.peakTorque) expect(p).toBeLessThan((4 / 3) * yieldTorque(tl) * (1 + 1e-9));
    }
  });
});

describe('PlasticElementLaw, Masing branches', () => {
  const tl = law(0.02, 300e6);
  const L = 0.5;
  const theta = (phi: number) => phi * L;
  const thetaY = (yieldTorque(tl) / rigidity(tl)) * L;

  it('follows first loading, then the branch T_r + 2·T₀(Δθ/2) after a turn, and first loading in the other sense past −θ_r', () => {
    // Masing's rule (Masing 1926; Iwan, J. Appl. Mech. 33 (1966); from memory, confident), written
    // here straight from the section law.
    const l = new PlasticElementLaw(new SeriesBackbone([{ law: tl, length: L }]));
    const t1 = 3 * thetaY;
    const T0 = (t: number) => torqueAtTwistRate(tl, t / L);
    const [a, b, c] = drive(l, [t1, t1 - 3 * thetaY, -4 * thetaY]);
    expect(rel(a, T0(t1))).toBeLessThan(1e-9);
    expect(rel(b, T0(t1) - 2 * T0((3 * thetaY) / 2))).toBeLessThan(1e-6);
    expect(rel(c, -T0(4 * thetaY))).toBeLessThan(1e-6);
  });

  it('rejoins the earlier path after a small inner loop (memory)', () => {
    const l = new PlasticElementLaw(new SeriesBackbone([{ law: tl, length: L }]));
    const T0 = (t: number) => torqueAtTwistRate(tl, t / L);
    const [, , , last] = drive(l, [2 * thetaY, -1 * thetaY, 1.5 * thetaY, 3 * thetaY]);
    expect(rel(last, T0(3 * thetaY))).toBeLessThan(1e-6);
  });

  it('is odd: loading the other way gives the opposite torque (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -5, max: 5, noNaN: true }), { minLength: 1, maxLength: 5 }), (pts) => {
        const p = new PlasticElementLaw(new SeriesBackbone([{ law: tl, length: L }]));
        const n = new PlasticElementLaw(new SeriesBackbone([{ law: tl, length: L }]));
        const a = drive(
          p,
          pts.map((x) => x * thetaY),
          50,
        );
        const b = drive(
          n,
          pts.map((x) => -x * thetaY),
          50,
        );
        return a.every((t, i) => Math.abs(t + b[i]) <= 1e-6 * yieldTorque(tl));
      }),
      { numRuns: 30 },
    );
  });

  it('never carries more than the first-loading envelope at its largest twist so far (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -5, max: 5, noNaN: true }), { minLength: 1, maxLength: 5 }), (pts) => {
        const l = new PlasticElementLaw(new SeriesBackbone([{ law: tl, length: L }]));
        const out = drive(
          l,
          pts.map((x) => x * thetaY),
          50,
        );
        const most = Math.max(...pts.map(Math.abs)) * thetaY;
        return out.every((t) => Math.abs(t) <= torqueAtTwistRate(tl, most / L) * (1 + 1e-6));
      }),
      { numRuns: 30 },
    );
  });
  void theta;
});

describe('PlasticElementLaw, fracture in time', () => {
  // One inertia on a ductile shaft stopped at once, hard enough to break it: the element breaks
  // when its twist reaches φ_f·L, having absorbed the energy under the torque–twist curve up to
  // there, and carries nothing afterwards, so the inertia spins on with what is left.
  const J = 0.5;
  const L = 0.4;
  const tl = law(0.015, 300e6);
  const gammaF = 0.6;
  const phiF = gammaF / 0.015;
  const k = rigidity(tl) / L;
  /** Energy to break, J: ∫T dθ up to φ_f·L by the trapezoidal rule on a fine geometric grid (independent of energyPerLength). */
  const breakEnergy = (() => {
    const phiY = yieldTorque(tl) / rigidity(tl);
    let e = 0.5 * yieldTorque(tl) * phiY * L;
    const n = 20000;
    for (let i = 0; i < n; i++) {
      const a = phiY * (phiF / phiY) ** (i / n);
      const b = phiY * (phiF / phiY) ** ((i + 1) / n);
      e += 0.5 * (torqueAtTwistRate(tl, a) + torqueAtTwistRate(tl, b)) * (b - a) * L;
    }
    return e;
  })();
  const run = (speed: number) => {
    const el = new PlasticElementLaw(new SeriesBackbone([{ law: tl, length: L, fractureTwistRate: phiF }]));
    const period = 2 * Math.PI * Math.sqrt(J / k);
    const r = integrateChain(chain({ J: [0, J], k: [k], speed, laws: [el] }), { duration: 40 * period, timeStep: period / 2000 });
    return { el, r };
  };

  it('the backbone breaks at φ_f·L on first loading for one piece', () => {
    const b = new SeriesBackbone([{ law: tl, length: L, fractureTwistRate: phiF }]);
    expect(rel(b.fractureTwist, phiF * L)).toBeLessThan(1e-12);
    expect(b.firstToBreak).toBe(0);
    expect(new SeriesBackbone([{ law: tl, length: L }]).fractureTwist).toBe(Infinity);
  });

  it('breaks once above the energy to break, and the inertia keeps ½Jω² less that energy within 0.5 %', () => {
    const w0 = Math.sqrt((2 * 1.5 * breakEnergy) / J);
    const { el, r } = run(w0);
    expect(el.broken).toBe(true);
    expect(r.events.filter((e) => e.what === 'breaks')).toHaveLength(1);
    const left = r.energy.final;
    expect(rel(left, 0.5 * J * w0 ** 2 - breakEnergy)).toBeLessThan(0.005);
    expect(Math.abs(books(r)) / r.energy.initial).toBeLessThan(1e-3);
    expect(el.torque(1)).toBe(0);
    // All the work done on it is gone: the plastic work, and the strain energy T_f²/2k let go at the break.
    const Tf = torqueAtTwistRate(tl, phiF);
    expect(rel(el.dissipated, breakEnergy)).toBeLessThan(0.005);
    expect(rel(el.released, (Tf * Tf) / (2 * k))).toBeLessThan(1e-6);
  });

  it('does not break just below the energy to break (0.97 of it), and yields', () => {
    const { el, r } = run(Math.sqrt((2 * 0.97 * breakEnergy) / J));
    expect(el.broken).toBe(false);
    expect(el.yielded).toBe(true);
    expect(r.events.some((e) => e.what === 'breaks')).toBe(false);
  });

  it('in two pieces in series the piece whose fracture torque is lower breaks first, at the twist where its own rate reaches φ_f', () => {
    const thin = law(0.012, 300e6);
    const thick = law(0.016, 300e6);
    const b = new SeriesBackbone([
      { law: thick, length: 0.3, fractureTwistRate: 0.6 / 0.016 },
      { law: thin, length: 0.2, fractureTwistRate: 0.6 / 0.012 },
    ]);
    expect(b.firstToBreak).toBe(1);
    // Independently: bisect the element twist until the thin piece's rate is at its fracture rate.
    let lo = b.yieldTwist;
    let hi = 1000;
    for (let i = 0; i < 200; i++) {
      const m = 0.5 * (lo + hi);
      if (b.pieceTwistRates(m)[1] < 0.6 / 0.012) lo = m;
      else hi = m;
    }
    expect(rel(b.fractureTwist, lo)).toBeLessThan(1e-6);
  });
});

describe('PlasticElementLaw with stiffness-proportional damping: the dashpot follows the tangent', () => {
  // One mass (EP5's disc, J = 0.986460 kg·m²) on a thick elastic shaft (60 mm × 450 mm) in series
  // with a short neck (40 mm × 50 mm, τ_Y = 0.577·530 MPa) that yields, stopped at once from 400 rpm.
  // The dashpots are c = 2ζ·k/ω₁ per element. Independent references:
  // - the energy balance past yield, `PlasticBalance.stateForEnergy` (shared REFERENCE EP5,
  //   3.1.9), at the kinetic energy less the damping work the run booked to the peak: the
  //   permanent twist of the neck must follow from the energy that is left;
  // - the damping work of a linear viscous oscillator over its elastic arc to yield (derived:
  //   W = ∫c·θ̇² dt with θ̇ = ω0·cos ω₁t, c = 2ζJω₁, gives W = ζJω0²(ω₁t_Y + ½ sin 2ω₁t_Y), first
  //   order in ζ): flow past yield may add a little to it, not a multiple (the dashpot of the
  //   elastic stiffness across a flowing neck took 3.7 times that and left a fifth of the twist).
  const J = 0.98646;
  const thick = law(0.03, 0.577 * 530e6);
  const neck = law(0.02, 0.577 * 530e6);
  const [L1, L2] = [0.45, 0.05];
  const [k1, k2] = [rigidity(thick) / L1, rigidity(neck) / L2];
  const k = 1 / (1 / k1 + 1 / k2);
  const wn = Math.sqrt(k / J);
  const w0 = rpm(400);
  const period = (2 * Math.PI) / wn;
  const balance = new PlasticBalance([
    { length: L1, law: thick, fractureTwistRate: Infinity },
    { length: L2, law: neck, fractureTwistRate: Infinity },
  ]);
  const run = (zeta: number) => {
    const spec = (laws: TorqueLaw[]) => chain({ J: [0, 1e-4 * J, J], k: [k2, k1], c: [((2 * zeta) / wn) * k2, ((2 * zeta) / wn) * k1], speed: w0, laws });
    const fresh = () => [new PlasticElementLaw(new SeriesBackbone([{ law: neck, length: L2 }])), new ElasticLaw(k1)];
    const probe = integrateChain(spec(fresh()), { duration: 1.5 * period, timeStep: period / 4000 });
    const laws = fresh();
    const r = integrateChain(spec(laws), { duration: probe.peakTime[1], timeStep: period / 4000 });
    const el = laws[0] as PlasticElementLaw;
    return { r, permanent: L2 * residualTwistRate(neck, sectionTwistRate(neck, el.peakTorque)) };
  };

  for (const zeta of [0.005, 0.02]) {
    it(`at ζ = ${100 * zeta} % leaves the permanent twist of PlasticBalance.stateForEnergy(½Jω² − W_damping) within 0.1 %`, () => {
      const { r, permanent } = run(zeta);
      const s = balance.stateForEnergy(0.5 * J * w0 ** 2 - r.energy.dampingWork);
      expect(s.pieces[1].permanentTwist).toBeGreaterThan(0);
      expect(rel(permanent, s.pieces[1].permanentTwist)).toBeLessThan(0.001);
    });

    it(`at ζ = ${100 * zeta} % takes at most 1.5 times the damping work of the elastic arc to yield, ζJω0²(ω₁t_Y + ½ sin 2ω₁t_Y)`, () => {
      const { r } = run(zeta);
      const tY = Math.asin(yieldTorque(neck) / ((k * w0) / wn)) / wn;
      const elasticArc = zeta * J * w0 ** 2 * (wn * tY + 0.5 * Math.sin(2 * wn * tY));
      expect(r.energy.dampingWork).toBeGreaterThan(elasticArc);
      expect(r.energy.dampingWork).toBeLessThan(1.5 * elasticArc);
    });
  }

  it('at the default ζ = 0.5 % leaves the permanent twist of the undamped balance, stateForEnergy(½Jω²), within 1 %', () => {
    const { permanent } = run(0.005);
    expect(rel(permanent, balance.stateForEnergy(0.5 * J * w0 ** 2).pieces[1].permanentTwist)).toBeLessThan(0.01);
  });
});
