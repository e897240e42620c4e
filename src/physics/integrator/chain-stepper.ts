import type { ChainSystem } from './chain-system.ts';
import { meanForce, updateAccelerations } from './chain-forces.ts';
import { setPiece, type DriveState } from './drive-state.ts';
import { pieceOf } from '../motor-torque.ts';
import { StopMotion } from '../stop-motion.ts';
import { TridiagonalSolver } from './tridiagonal.ts';
import { ElasticLaw, type TorqueLaw } from '../torque-law.ts';

/**
 * One time step of the torsional chain by the trapezoidal rule (Newmark's average-acceleration
 * method, γ = ½, β = ¼; Newmark 1959, and Hughes, The Finite Element Method, Sec. 9.1; from memory,
 * confident):
 *
 *   J·(v₁ − v₀)/h = ½(F₀ + F₁),   φ₁ − φ₀ = ½h(v₀ + v₁).
 *
 * Why this scheme. It is unconditionally stable, so the step follows the modes that matter (the
 * lowest few) and not the stiff short elements a finely split shaft adds; for a linear undamped
 * chain it conserves the energy ½vᵀJv + ½θᵀKθ exactly (to rounding), which is what a sudden stop's
 * peak torque hangs on; and its matrix (2J/h² + ½K_t + C/h) is tridiagonal, so a step costs O(n):
 * one forward and one back substitution with a factorisation that is reused until the step size or
 * a branch changes. Nothing dense is ever formed.
 *
 * Unknown per step: Δφ. With v₁ = 2Δφ/h − v₀ each node's row reads
 *   (2J/h²)Δφᵢ + Σ wₑ(Δφᵢ − Δφⱼ) = (2J/h)v₀ + Σ ±Tₑ₀ + f̄ᵢ,   wₑ = ½kₜ + c/h,
 * exact for laws that are affine on their branch; other laws are Newton-iterated on the same
 * matrix form. Motor torque, piecewise linear in speed, is exact within a piece of its curve.
 *
 * Belts and the jam are rigid until they slip: a sticking belt adds the rotor's inertia to its
 * pulley's node, a slipping one leaves the rotor on its own scalar equation and puts ±T_slip on the
 * node; a holding jam prescribes the stop node's motion, a slipping one puts ∓T_cap on it.
 *
 * The stepper only does trial steps and commits them; `integrateChain` decides the step and
 * locates events.
 */
export class ChainStepper {
  readonly n: number;
  readonly m: number;
  t = 0;
  readonly phi: Float64Array;
  readonly v: Float64Array;
  readonly theta: Float64Array;
  /** Torque of each law at the committed twist, current branch. */
  readonly tq: Float64Array;
  // Trial end state.
  readonly phiT: Float64Array;
  readonly vT: Float64Array;
  readonly thetaT: Float64Array;
  readonly rateT: Float64Array;
  readonly dphi: Float64Array;
  /** Node accelerations at the committed state, rad/s² (from the torques on each node; the ramp's for a holding stop node). */
  readonly acc: Float64Array;
  hT = 0;
  // Matrix and right side.
  private readonly diag: Float64Array;
  private readonly off: Float64Array;
  private readonly rhs: Float64Array;
  readonly kt: Float64Array;
  private readonly ofs: Float64Array;
  private readonly w: Float64Array;
  private readonly solver: TridiagonalSolver;
  private hFactored = 0;
  dirty = true;
  readonly jeff: Float64Array;
  readonly laws: TorqueLaw[];
  /** Elements whose law is not affine on its current branch (Newton-iterated); re-read at every branch change. */
  nonAffine: number[];
  /** 1 where the element's law is plain elastic, or elastic until its next event (handled inline, no call into the law). */
  private readonly plain: Uint8Array;
  /** The dashpot acting across each element on its current branch (0 across a slipping or parted device). */
  readonly cEff: Float64Array;
  readonly motion: StopMotion;
  readonly P: number;
  /** Jam: 0 holding (prescribed motion), ±1 slipping with the stop node ahead (+1) or behind the jam. */
  jam: -1 | 0 | 1 = 0;
  readonly drives: DriveState[];
  /** The one-way nodes (`ChainSystem.holds`), whether each is held now, and 1 per node where it is held. */
  readonly holdNode: Int32Array;
  readonly held: Uint8Array;
  readonly heldNode: Uint8Array;
  // Energy books, J.
  /** Kinetic energy taken out where a one-way node is caught at standstill (its speed set to exactly 0 at the located event), J. */
  holdWork = 0;
  dampingWork = 0;
  /** The dashpot work of each element, J (sums to `dampingWork`): which damper took the energy. */
  readonly elementDampingWork: Float64Array;
  motorWork = 0;
  boundaryWork = 0;
  jamWork = 0;
  jamSlipAngle = 0;

  constructor(readonly sys: ChainSystem) {
    const n = sys.inertia.length;
    this.n = n;
    this.m = n - 1;
    const f = () => new Float64Array(n);
    this.phi = f();
    this.v = f();
    this.phiT = f();
    this.vT = f();
    this.dphi = f();
    this.acc = f();
    this.diag = f();
    this.rhs = f();
    this.jeff = f();
    const g = () => new Float64Array(Math.max(n - 1, 1));
    this.theta = g();
    this.tq = g();
    this.thetaT = g();
    this.rateT = g();
    this.off = g();
    this.kt = g();
    this.ofs = g();
    this.w = g();
    this.solver = new TridiagonalSolver(n);
    this.laws = sys.laws;
    this.nonAffine = sys.laws.flatMap((l, e) => (l.affine ? [] : [e]));
    this.plain = new Uint8Array(sys.laws.length);
    this.cEff = new Float64Array(Math.max(n - 1, 1));
    this.elementDampingWork = new Float64Array(Math.max(n - 1, 1));
    this.P = sys.stop.node;
    this.motion = new StopMotion(sys.speed, sys.stop.duration);
    this.holdNode = Int32Array.from(sys.holds ?? []);
    this.held = new Uint8Array(this.holdNode.length);
    this.heldNode = new Uint8Array(n);
    this.drives = sys.drives.map((d) => ({ ...d, stuck: true, sigma: 0, vR: 0, vRT: 0, dphiR: 0, piece: 0, base: 0, slope: 0, lo: 0, hi: 0, beltTorque: 0, slipAngle: 0, slipWork: 0 }));

    // Running state: the running torque's twist, everything at ω0; then the stop's start at t = 0.
    let angle = 0;
    for (let i = 0; i < n; i++) {
      if (i > 0) angle += sys.initialTwist[i - 1];
      this.phi[i] = angle;
      this.v[i] = sys.speed;
    }
    const origin = this.phi[this.P];
    for (let i = 0; i < n; i++) this.phi[i] -= origin;
    for (let e = 0; e < this.m; e++) {
      this.theta[e] = this.phi[e + 1] - this.phi[e];
      this.tq[e] = this.laws[e].torque(this.theta[e]);
    }
    if (sys.stop.torqueCapacity === undefined || sys.stop.duration > 0) {
      this.jam = 0;
      this.v[this.P] = this.motion.speedAt(0);
    } else {
      this.jam = 1;
    }
    for (const d of this.drives) {
      d.vR = sys.speed;
      setPiece(d, pieceOf(d.line, this.v[d.node]));
    }
    this.updateInertia();
    this.refreshBranches();
    this.refreshStart();
    updateAccelerations(this, 0);
  }

  /**
   * Re-reads every law's tangent, dashpot and torque at the committed twist: after an event has
   * moved a law to another branch. Between events the integrator uses these cached values, so a
   * plain elastic element costs a few multiplications per step and no call.
   */
  refreshBranches(): void {
    for (let e = 0; e < this.m; e++) {
      const law = this.laws[e];
      this.kt[e] = law.tangent(this.theta[e]);
      this.cEff[e] = law.damped() ? this.dashpot(e, this.kt[e]) : 0;
      this.tq[e] = law.torque(this.theta[e]);
      this.plain[e] = law instanceof ElasticLaw || law.elasticUntilEvent === true ? 1 : 0;
    }
    this.nonAffine = this.laws.flatMap((l, e) => (l.affine ? [] : [e]));
    this.dirty = true;
  }

  /**
   * The dashpot across element e whose law has tangent k: the system's stiffness-proportional
   * dashpot scaled by k/k_elastic, so damping follows the tangent stiffness and a section that flows
   * plastically (tangent near 0) is not damped as if it were still elastic, which would take some
   * five times the energy the nominal ratio implies out of the swing and leave the permanent twist
   * short of the energy balance. This is tangent-stiffness-proportional Rayleigh damping (Charney,
   * "Unintended consequences of modeling damping in structures", J. Struct. Eng. 134(4), 2008,
   * 581–592; from memory, confident). It is taken at the start of each step and held over the step
   * (Newton iterations do not move it), so the damping work booked at commit is the one stepped.
   */
  private dashpot(e: number, k: number): number {
    const k0 = this.laws[e].stiffness;
    return k0 > 0 ? (this.sys.damping[e] * k) / k0 : 0;
  }

  /** Copies the committed state into the trial arrays (a zero-length trial). */
  refreshStart(): void {
    this.phiT.set(this.phi);
    this.vT.set(this.v);
    for (let e = 0; e < this.m; e++) {
      this.thetaT[e] = this.theta[e];
      this.rateT[e] = this.v[e + 1] - this.v[e];
    }
    for (const d of this.drives) d.vRT = d.vR;
    this.hT = 0;
  }

  /** Speed of drive d's motor side (rotor when the belt slips, else its node), shaft units. */
  motorSpeed(d: DriveState, trial: boolean): number {
    if (!d.stuck) return trial ? d.vRT : d.vR;
    return trial ? this.vT[d.node] : this.v[d.node];
  }

  updateInertia(): void {
    this.jeff.set(this.sys.inertia);
    for (let j = 0; j < this.drives.length; j++) {
      const d = this.drives[j];
      if (d.beltSlipTorque !== undefined && d.stuck) this.jeff[d.node] += d.rotorInertia;
    }
    this.dirty = true;
  }

  private assemble(h: number): void {
    const { n, m, diag, off, w, kt, jeff, cEff } = this;
    for (let e = 0; e < m; e++) w[e] = 0.5 * kt[e] + cEff[e] / h;
    for (let i = 0; i < n; i++) diag[i] = (2 * jeff[i]) / (h * h) + (i > 0 ? w[i - 1] : 0) + (i < m ? w[i] : 0);
    for (let e = 0; e < m; e++) off[e] = -w[e];
    for (let j = 0; j < this.drives.length; j++) {
      const d = this.drives[j];
      if (d.stuck) diag[d.node] -= d.slope / h;
    }
    if (this.jam === 0) {
      const P = this.P;
      diag[P] = 1;
      if (P > 0) off[P - 1] = 0;
      if (P < m) off[P] = 0;
    }
    // A held one-way node does not move in the step (Δφ = 0): its row is the identity and its
    // neighbours lose their coupling to it, as for the holding jam.
    for (let k = 0; k < this.holdNode.length; k++) {
      if (!this.held[k]) continue;
      const i = this.holdNode[k];
      diag[i] = 1;
      if (i > 0) off[i - 1] = 0;
      if (i < m) off[i] = 0;
    }
    this.solver.factor(diag, off);
    this.hFactored = h;
    this.dirty = false;
  }

  /** A trial step of length h from the committed state; fills the trial arrays. */
  trial(h: number): void {
    const { n, m, laws, kt, ofs, tq, theta } = this;
    for (let q = 0; q < this.nonAffine.length; q++) {
      const e = this.nonAffine[q];
      const k = laws[e].tangent(theta[e]);
      const c = laws[e].damped() ? this.dashpot(e, k) : 0;
      if (k !== kt[e] || c !== this.cEff[e]) {
        kt[e] = k;
        this.cEff[e] = c;
        this.dirty = true;
      }
      ofs[e] = tq[e];
    }
    if (this.dirty || h !== this.hFactored) this.assemble(h);
    this.solveWith(h);
    for (let it = 0; it < 30 && this.nonAffine.length > 0; it++) {
      let worst = 0;
      for (let q = 0; q < this.nonAffine.length; q++) {
        const e = this.nonAffine[q];
        const dth = this.dphi[e + 1] - this.dphi[e];
        const th = theta[e] + dth;
        const k = laws[e].tangent(th);
        const model = ofs[e] + kt[e] * dth;
        const real = laws[e].torque(th);
        worst = Math.max(worst, Math.abs(real - model) / (Math.abs(real) + laws[e].stiffness * 1e-9 + 1e-12));
        ofs[e] = real - k * dth;
        kt[e] = k;
      }
      if (worst < 1e-12) break;
      this.assemble(h);
      this.solveWith(h);
    }
    this.hT = h;
    const { dphi, phi, v, phiT, vT, thetaT, rateT } = this;
    for (let i = 0; i < n; i++) {
      phiT[i] = phi[i] + dphi[i];
      vT[i] = (2 * dphi[i]) / h - v[i];
    }
    for (let e = 0; e < m; e++) {
      thetaT[e] = phiT[e + 1] - phiT[e];
      rateT[e] = vT[e + 1] - vT[e];
    }
    for (let j = 0; j < this.drives.length; j++) {
      const d = this.drives[j];
      if (d.stuck) continue;
      const s = d.slope;
      const f0 = d.base + s * d.vR;
      d.vRT = d.vR + (f0 - d.sigma * d.beltSlipTorque!) / (d.rotorInertia / h - 0.5 * s);
      d.dphiR = 0.5 * h * (d.vR + d.vRT);
    }
  }

  private solveWith(h: number): void {
    const { n, m, rhs, jeff, v, tq, ofs, w, P } = this;
    for (let i = 0; i < n; i++) rhs[i] = ((2 * jeff[i]) / h) * v[i];
    for (let e = 0; e < m; e++) {
      rhs[e] += tq[e];
      rhs[e + 1] -= tq[e];
    }
    for (let q = 0; q < this.nonAffine.length; q++) {
      // A law that is not affine: ½(T₀ + T₁) with T₁ from its linearisation about the last iterate.
      const e = this.nonAffine[q];
      const d = 0.5 * (ofs[e] - tq[e]);
      rhs[e] += d;
      rhs[e + 1] -= d;
    }
    for (let j = 0; j < this.drives.length; j++) {
      const d = this.drives[j];
      if (d.stuck) {
        // Trapezoidal mean of the motor's torque on its piece: T(v₀) + s·(Δφ/h − v₀), the s·Δφ/h part in the matrix.
        rhs[d.node] += d.base;
      } else {
        rhs[d.node] += d.sigma * d.beltSlipTorque!;
      }
    }
    if (this.jam !== 0) {
      rhs[P] -= this.jam * this.sys.stop.torqueCapacity!;
    } else {
      const dG = this.motion.angleAt(this.t + h) - this.motion.angleAt(this.t);
      rhs[P] = dG;
      if (P > 0) rhs[P - 1] += w[P - 1] * dG;
      if (P < m) rhs[P + 1] += w[P] * dG;
    }
    for (let k = 0; k < this.holdNode.length; k++) if (this.held[k]) rhs[this.holdNode[k]] = 0;
    this.solver.solve(rhs, this.dphi);
  }

  /** Makes the trial step the committed state, with its energy books. */
  commit(): void {
    const { m, laws, sys, dphi, hT: h, P, cEff, plain, theta, thetaT, tq, kt } = this;
    let damp = 0;
    const byElement = this.elementDampingWork;
    for (let e = 0; e < m; e++) {
      const d = thetaT[e] - theta[e];
      const w = cEff[e] * d * d;
      damp += w;
      byElement[e] += w / h;
    }
    this.dampingWork += damp / h;
    for (let j = 0; j < this.drives.length; j++) {
      const d = this.drives[j];
      const s = d.slope;
      if (d.stuck) {
        const f = d.base + 0.5 * s * (this.vT[d.node] + this.v[d.node]);
        this.motorWork += f * dphi[d.node];
      } else {
        const f = d.base + 0.5 * s * (d.vRT + d.vR);
        this.motorWork += f * d.dphiR;
        const rel = d.dphiR - dphi[d.node];
        d.slipWork += d.sigma * d.beltSlipTorque! * rel;
        d.slipAngle += Math.abs(rel);
        d.vR = d.vRT;
      }
    }
    for (let j = 0; j < this.drives.length; j++) if (this.drives[j].stuck) this.drives[j].vR = this.vT[this.drives[j].node];
    const dG = this.motion.angleAt(this.t + h) - this.motion.angleAt(this.t);
    if (this.jam !== 0) {
      const cap = sys.stop.torqueCapacity!;
      this.jamWork += this.jam * cap * (dphi[P] - dG);
      this.jamSlipAngle += Math.abs(dphi[P] - dG);
      this.boundaryWork -= this.jam * cap * dG;
    } else if (dG !== 0) {
      // Work of the holding jam: its torque over the step, from the stop node's trapezoidal
      // equation J·(v₁ − v₀)/h = F̄ + R̄, through the stop node's turn.
      this.boundaryWork += ((this.jeff[P] * (this.vT[P] - this.v[P])) / h - meanForce(this, P)) * dG;
    }
    this.phi.set(this.phiT);
    this.v.set(this.vT);
    for (let e = 0; e < m; e++) {
      const th = thetaT[e];
      if (plain[e] === 1) {
        tq[e] = kt[e] * th;
      } else {
        laws[e].commit(th);
        tq[e] = laws[e].torque(th);
      }
      theta[e] = th;
    }
    this.t += h;
    updateAccelerations(this, h);
  }
}
