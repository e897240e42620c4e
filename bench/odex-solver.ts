import { createRequire } from 'node:module';

// odex (E. Hairer's ODEX, Gragg–Bulirsch–Stoer extrapolation, ported to JavaScript) is the
// general-purpose reference solver for the benchmark and the tests; src/ never uses it. It is
// loaded through require with the few types used here, because the package ships its TypeScript
// source beside its JavaScript and that source does not compile under this project's strict
// settings.

export type Derivative = (x: number, y: number[]) => number[];
export type OutputFunction = (n: number, xOld: number, x: number, y: number[], dense?: (c: number, x: number) => number) => boolean | void;

export interface OdexSolver {
  absoluteTolerance: number | number[];
  relativeTolerance: number | number[];
  maxSteps: number;
  denseOutput: boolean;
  solve(f: Derivative, x: number, y0: number[], xEnd: number, solOut?: OutputFunction): { y: number[]; outcome: number; nStep: number; nEval: number };
  grid(dt: number, out: (xOut: number, yOut: number[]) => unknown): OutputFunction;
}

export const Solver = (createRequire(import.meta.url)('odex') as { Solver: new (n: number) => OdexSolver }).Solver;
