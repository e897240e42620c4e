// Small chains for the integrator's tests, and the same chains as first-order systems for odex
// (the general-purpose reference solver, bench/odex-solver.ts).
import { Solver } from '../../../bench/odex-solver.ts';
import type { ChainSystem, SystemDrive } from '../../../src/physics/integrator/chain-system.ts';
import { torqueAt } from '../../../src/physics/motor-torque.ts';
import { StopMotion } from '../../../src/physics/stop-motion.ts';
import { ElasticLaw, type TorqueLaw } from '../../../src/physics/torque-law.ts';

export interface ChainSpec {
  /** Inertias from the stop outward; the first is the stop node's. */
  J: number[];
  /** Stiffnesses, element e between node e and e + 1. */
  k: number[];
  speed: number;
  ramp?: number;
  /** Dashpot per element. */
  c?: number[];
  laws?: TorqueLaw[];
  drives?: SystemDrive[];
  /** Initial element torques (running torque). */
  preload?: number[];
  torqueCapacity?: number;
}

/** A chain stopped at node 0. */
export function chain(s: ChainSpec): ChainSystem {
  return {
    inertia: Float64Array.from(s.J),
    laws: s.laws ?? s.k.map((k) => new ElasticLaw(k)),
    damping: Float64Array.from(s.c ?? s.k.map(() => 0)),
    initialTwist: Float64Array.from(s.k, (k, e) => (s.preload?.[e] ?? 0) / k),
    speed: s.speed,
    stop: { node: 0, duration: s.ramp ?? 0, ...(s.torqueCapacity !== undefined ? { torqueCapacity: s.torqueCapacity } : {}) },
    drives: s.drives ?? [],
  };
}

/**
 * The same chain (elastic, with dashpots, motors without belts, a rigid jam) as an ODE for odex:
 * y = [φ1…φn-1, v1…vn-1], node 0 moving as the stop prescribes. `torque(θ)` may replace the
 * elastic law of every element. Returns element 0's torque at each time in `times`.
 */
export function odexTorque(s: ChainSpec, times: number[], tol = 1e-11, torque?: (e: number, theta: number) => number): number[][] {
  const n = s.J.length;
  const motion = new StopMotion(s.speed, s.ramp ?? 0);
  const T = (e: number, th: number) => (torque ? torque(e, th) : s.k[e] * th);
  const c = s.c ?? s.k.map(() => 0);
  const angle = (y: number[], t: number, i: number) => (i === 0 ? motion.angleAt(t) : y[i - 1]);
  const speed = (y: number[], t: number, i: number) => (i === 0 ? motion.speedAt(t) : y[n - 1 + i - 1]);
  const f = (t: number, y: number[]) => {
    const out = new Array<number>(2 * (n - 1)).fill(0);
    for (let i = 1; i < n; i++) {
      let F = 0;
      const el = (e: number) => T(e, angle(y, t, e + 1) - angle(y, t, e)) + c[e] * (speed(y, t, e + 1) - speed(y, t, e));
      F -= el(i - 1);
      if (i < n - 1) F += el(i);
      for (const d of s.drives ?? []) if (d.node === i) F += torqueAt(d.line, speed(y, t, i));
      out[i - 1] = speed(y, t, i);
      out[n - 1 + i - 1] = F / s.J[i];
    }
    return out;
  };
  const y0: number[] = [];
  let a = 0;
  for (let i = 1; i < n; i++) {
    a += (s.preload?.[i - 1] ?? 0) / s.k[i - 1];
    y0.push(a);
  }
  for (let i = 1; i < n; i++) y0.push(s.speed);
  const out: number[][] = [];
  const solver = new Solver(2 * (n - 1));
  solver.absoluteTolerance = solver.relativeTolerance = tol;
  solver.denseOutput = true;
  solver.maxSteps = 1e7;
  const dt = times[1] - times[0];
  const record = (t: number, y: number[]) => out.push(s.k.map((_, e) => T(e, angle(y, t, e + 1) - angle(y, t, e))));
  solver.solve(f, 0, y0, times[times.length - 1] + dt / 2, solver.grid(dt, record));
  return out.slice(0, times.length);
}

/**
 * The reference: a Kelvin–Voigt shaft (spring k with a dashpot c in parallel) in series with a
 * Coulomb slider of torque T_s, J at its free end, the other end stopped at once from ω0, as
 * first-order ODEs integrated by odex (a general-purpose extrapolation solver, devDependency; its
 * dense output locates the switches by bisection). Sticking: Jφ̈ = −(kφ + cφ̇), until kφ + cφ̇ = T_s.
 * Sliding: Jφ̈ = −T_s and the spring twist x relaxes, kx + cẋ = T_s, until the slider's rate φ̇ − ẋ
 * is 0. Slip work = T_s·(Δφ − Δx).
 */
export function odexSlip(J: number, k: number, c: number, Ts: number, w0: number): { start: number; slipWork: number } {
  const solver = new Solver(3);
  solver.absoluteTolerance = solver.relativeTolerance = 1e-12;
  solver.denseOutput = true;
  solver.maxSteps = 1e7;
  const root = (f: (t: number, y: number[]) => number[], y0: number[], g: (y: number[]) => number, tEnd: number, fromZero = false) => {
    let hit: { t: number; y: number[] } | undefined;
    let prev = { t: 0, y: y0 };
    if (!fromZero && g(y0) >= 0) return prev;
    solver.solve(f, 0, y0, tEnd, (_n, xOld, x, y, dense) => {
      if (x <= 0 || g(y) < 0) {
        prev = { t: x, y: [...y] };
        return true;
      }
      let [a, b] = [xOld, x];
      const at = (t: number) => [0, 1, 2].map((i) => dense!(i, t));
      for (let i = 0; i < 80; i++) {
        const m = 0.5 * (a + b);
        if (g(at(m)) < 0) a = m;
        else b = m;
      }
      hit = { t: b, y: at(b) };
      return false;
    });
    return hit ?? prev;
  };
  // Stick: y = [φ, φ̇, unused].
  const stick = root(
    (_t, y) => [y[1], -(k * y[0] + c * y[1]) / J, 0],
    [0, w0, 0],
    (y) => k * y[0] + c * y[1] - Ts,
    1,
  );
  // Slide: y = [φ, φ̇, x], time from the slip's start.
  const xRate = (y: number[]) => (c > 0 ? (Ts - k * y[2]) / c : 0);
  const x0 = c > 0 ? stick.y[0] : Ts / k;
  const slide = root(
    (_t, y) => [y[1], -Ts / J, xRate(y)],
    [stick.y[0], stick.y[1], x0],
    (y) => -(y[1] - xRate(y)),
    1,
    true,
  );
  return { start: stick.t, slipWork: Ts * (slide.y[0] - stick.y[0] - (slide.y[2] - x0)) };
}
