// npm run bench: times the chain integrator for 2, 10, 50 and 200 elements over the same simulated
// second (same step, so the step count is equal and time per element-step shows the growth), then
// times a general-purpose solver (odex, Gragg–Bulirsch–Stoer) on the 10-element chain to the same
// accuracy (a bounded search), both measured against the chain's exact modal solution; then each
// sample case's dynamic solve per element-step, the closed-form Monte Carlo per sample, past-yield
// runs, and check, resize and report of each sample case as CPU over a bare node. Not a test: no
// assertions. It ends within two minutes.
import { benchChance } from './chance-bench.ts';
import { benchPastYield } from './past-yield-bench.ts';
import { benchUncertainty } from './uncertainty-bench.ts';
import { benchCliCosts } from './cli-costs.ts';
import { benchDynamicSolve } from './dynamic-solve-bench.ts';
import { Solver } from './odex-solver.ts';
import { integrateChain } from '../src/physics/integrator/integrate-chain.ts';
import { chainModes } from '../src/physics/modes.ts';
import type { ChainSystem } from '../src/physics/integrator/chain-system.ts';
import { uniformChain } from './uniform-chain.ts';

const WINDOW = 1;
const STEP = 1e-4;
const SAMPLE = 1e-3;

function best(f: () => void, runs: number): number {
  let t = Infinity;
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    f();
    t = Math.min(t, performance.now() - t0);
  }
  return t;
}

/**
 * Exact history of the disc's twist (the angle of the free end against the stop, which the shaft's
 * peak torque follows) at the sample times: the sum of the undamped chain's modes, each started by
 * the uniform speed: u(t) = Σ φₖ·(φₖᵀM·1/φₖᵀMφₖ)·ω0·sin(ωₖt)/ωₖ.
 */
function exactDiscTwist(sys: ChainSystem, times: number[]): number[] {
  const n = sys.inertia.length - 1;
  const k = sys.laws.map((l) => l.stiffness);
  const mass = Array.from(sys.inertia.slice(1));
  const kd = mass.map((_, j) => k[j] + (j + 1 < n ? k[j + 1] : 0));
  const ko = mass.slice(0, -1).map((_, j) => -k[j + 1]);
  const modes = chainModes(kd, ko, mass, n);
  return times.map((t) => {
    let u1 = 0;
    for (const m of modes) {
      let mm = 0;
      let g = 0;
      for (let j = 0; j < n; j++) {
        mm += mass[j] * m.shape[j] ** 2;
        g += mass[j] * m.shape[j];
      }
      u1 += m.shape[n - 1] * (g / mm) * sys.speed * (Math.sin(m.omega * t) / m.omega);
    }
    return u1;
  });
}

/**
 * The same chain as a first-order system for odex: y = [twist angles of nodes 1..n, their speeds].
 * Undefined when the run is stopped for passing `budgetMs` of time.
 */
function odexRun(sys: ChainSystem, tol: number, times: number[], budgetMs = Infinity): number[] | undefined {
  const n = sys.inertia.length - 1;
  const k = sys.laws.map((l) => l.stiffness);
  const J = Array.from(sys.inertia.slice(1));
  const f = (_: number, y: number[]) => {
    const out = new Array<number>(2 * n);
    for (let j = 0; j < n; j++) {
      const left = k[j] * (y[j] - (j > 0 ? y[j - 1] : 0));
      const right = j + 1 < n ? k[j + 1] * (y[j + 1] - y[j]) : 0;
      out[j] = y[n + j];
      out[n + j] = (right - left) / J[j];
    }
    return out;
  };
  const s = new Solver(2 * n);
  s.absoluteTolerance = s.relativeTolerance = tol;
  s.denseOutput = true;
  s.maxSteps = 1e8;
  const out: number[] = [];
  const y0 = [...new Array<number>(n).fill(0), ...new Array<number>(n).fill(sys.speed)];
  const deadline = performance.now() + budgetMs;
  let stopped = false;
  const grid = s.grid(SAMPLE, (_, y) => void out.push(y[n - 1]));
  // Checked at every accepted step, not only at the samples: a tight tolerance takes many steps between them.
  s.solve(f, 0, y0, times[times.length - 1] + SAMPLE / 2, (k, xOld, x, y, dense) => {
    if (performance.now() > deadline) {
      stopped = true;
      return false;
    }
    return grid(k, xOld, x, y, dense);
  });
  return stopped ? undefined : out.slice(0, times.length);
}

const relError = (a: number[], b: number[]) => Math.max(...a.map((x, i) => Math.abs(x - b[i]))) / Math.max(...b.map(Math.abs));

// Warm the JIT up first, so the first row does not carry the compilation.
for (let i = 0; i < 3; i++) integrateChain(uniformChain(20, 2e-5), { duration: WINDOW / 4, timeStep: STEP });

console.log(`Chain integrator: ${WINDOW} s after an instantaneous stop, step ${STEP * 1e6} µs (${WINDOW / STEP} steps), best of 5`);
console.log('elements   time ms   ns per element-step');
let tenTime = 0;
let fiftyTime = 0;
for (const n of [2, 10, 50, 200]) {
  const t = best(() => integrateChain(uniformChain(n, 2e-5), { duration: WINDOW, timeStep: STEP }), 5);
  if (n === 10) tenTime = t;
  if (n === 50) fiftyTime = t;
  console.log(`${String(n).padStart(8)}  ${t.toFixed(2).padStart(8)}  ${((t * 1e6) / ((n * WINDOW) / STEP)).toFixed(1).padStart(10)}`);
}

console.log(`Goal: 50 elements over 1 s well under 100 ms: ${fiftyTime.toFixed(1)} ms.`);

const sys = uniformChain(10);
const times = Array.from({ length: Math.round(WINDOW / SAMPLE) + 1 }, (_, i) => i * SAMPLE);
const exact = exactDiscTwist(sys, times);
let mine: number[] = [];
const tMine = best(() => {
  const r = integrateChain(uniformChain(10), { duration: WINDOW, timeStep: STEP, samples: times.length });
  // Node angles are not kept, but the twist of the whole shaft is the sum of the element torques over their stiffnesses.
  mine = Array.from(r.history.time, (_, i) => r.history.elementTorque.reduce((s, T, e) => s + T[i] / sys.laws[e].stiffness, 0));
}, 5);
const errMine = relError(mine, exact);
// The loosest tolerance (in decades) at which odex is at least as accurate as the chain integrator,
// searched down to ODEX_TIGHTEST and only while one run stays within ODEX_RUN_BUDGET: odex's work
// grows steeply as its tolerance tightens, and the search must not hold the bench up.
const ODEX_TIGHTEST = 1e-10;
const ODEX_RUN_BUDGET = 4_000; // ms
/** The loosest tolerance tried: at 1e-1 one odex run on this chain took more than 10 s (measured 2026-12-02), at 1e-3 about 2 s, already far inside the integrator's error. */
const ODEX_LOOSEST = 1e-3;
/** The whole search stops within this much time, ms. */
const ODEX_SEARCH_BUDGET = 10_000;
const searchEnd = performance.now() + ODEX_SEARCH_BUDGET;
let tol = ODEX_LOOSEST * 10;
let errOdex = Infinity;
let tOdex = Infinity;
let stopped = '';
const sweep: string[] = [];
while (errOdex > errMine) {
  if (tol / 10 < ODEX_TIGHTEST * 0.99) {
    stopped = `stopped at ${ODEX_TIGHTEST.toExponential(0)}, the tightest tried`;
    break;
  }
  const t0 = performance.now();
  const run = odexRun(sys, tol / 10, times, Math.min(ODEX_RUN_BUDGET, searchEnd - performance.now()));
  tol /= 10;
  if (!run) {
    sweep.push(`tol ${tol.toExponential(0)}: stopped past its time budget`);
    if (performance.now() >= searchEnd) {
      stopped = `stopped: the search passed its budget (${ODEX_RUN_BUDGET / 1000} s a run, ${ODEX_SEARCH_BUDGET / 1000} s in all)`;
      break;
    }
    continue;
  }
  errOdex = relError(run, exact);
  tOdex = performance.now() - t0;
  sweep.push(`tol ${tol.toExponential(0)}: error ${errOdex.toExponential(2)}, ${tOdex.toFixed(0)} ms`);
}
// Timed again where a run is short, to leave its first-run costs out.
if (tOdex < 1000) tOdex = best(() => void odexRun(sys, tol, times), 3);
const odexLabel = stopped ? `odex, tol ${tol.toExponential(0)} (the tightest within the search)` : `odex, tol ${tol.toExponential(0)}`;
console.log('');
console.log(`10 elements, undamped, against the exact modal solution (error: largest deviation of the disc's twist over ${WINDOW} s, over its peak):`);
console.log(`  chain integrator   ${tMine.toFixed(2).padStart(9)} ms   error ${errMine.toExponential(2)}`);
console.log(`  ${odexLabel}   ${tOdex.toFixed(2).padStart(9)} ms   error ${errOdex.toExponential(2)}`);
console.log(`  odex / chain integrator: ${(tOdex / tMine).toFixed(0)}× (the damped 10-element run above took ${tenTime.toFixed(2)} ms)`);
console.log(`  odex tolerances tried, loosest first: ${sweep.join('; ')}${stopped ? ` (${stopped}; odex did not reach the chain integrator's error)` : ''}.`);
console.log('  (odex is explicit: its step is held down by the stiffest element at any tolerance, so it is slow even where it is loose.)');

for (const line of benchDynamicSolve()) console.log(line);
for (const line of benchUncertainty()) console.log(line);
for (const line of benchChance()) console.log(line);
for (const line of benchPastYield()) console.log(line);
for (const line of benchCliCosts()) console.log(line);
