import fc from 'fast-check';
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { chainModes, countBelow } from '../../src/physics/modes.ts';

/** Dense K and M of a chain, for the reference library. */
function dense(kd: number[], ko: number[], m: number[]) {
  const n = m.length;
  const K = Matrix.zeros(n, n);
  for (let i = 0; i < n; i++) {
    K.set(i, i, kd[i]);
    if (i + 1 < n) {
      K.set(i, i + 1, ko[i]);
      K.set(i + 1, i, ko[i]);
    }
  }
  return { K, M: Matrix.diag(m) };
}

/** ω² from ml-matrix: eigenvalues of M^-½·K·M^-½ (a general-purpose reference library, tests only). */
function referenceOmegaSquared(kd: number[], ko: number[], m: number[]): number[] {
  const { K } = dense(kd, ko, m);
  const s = Matrix.diag(m.map((x) => 1 / Math.sqrt(x)));
  const A = s.mmul(K).mmul(s);
  return new EigenvalueDecomposition(A, { assumeSymmetric: true }).realEigenvalues.sort((a, b) => a - b);
}

/** Ground–k1–J1–k2–J2–…: the chain's tridiagonal K. */
function grounded(k: number[]) {
  const n = k.length;
  return { kd: k.map((ki, i) => ki + (i + 1 < n ? k[i + 1] : 0)), ko: k.slice(1).map((x) => -x) };
}

describe('chainModes: natural frequencies of a tridiagonal chain', () => {
  it('a two-mass fixed–free chain matches the closed-form two-degree-of-freedom result', () => {
    // Shared REFERENCE.md 10.8 (standard 2-DOF result; derived, agrees with numpy):
    // J1 = 2, J2 = 0.5 kg·m², k1 = 1e5, k2 = 5e4 N·m/rad → ω1 = 189.6343, ω2 = 372.8791 rad/s.
    const { kd, ko } = grounded([1e5, 5e4]);
    const modes = chainModes(kd, ko, [2, 0.5], 2);
    expect(modes[0].omega).toBeCloseTo(189.6343, 3);
    expect(modes[1].omega).toBeCloseTo(372.8791, 3);
    // ω² from the closed form, ½[(k1+k2)/J1 + k2/J2] ∓ ½√(…² − 4k1k2/(J1J2)).
    const a = (1e5 + 5e4) / 2 + 5e4 / 0.5;
    const disc = Math.sqrt(a * a - (4 * 1e5 * 5e4) / (2 * 0.5));
    expect(modes[0].omega ** 2 / ((a - disc) / 2)).toBeCloseTo(1, 12);
    expect(modes[1].omega ** 2 / ((a + disc) / 2)).toBeCloseTo(1, 12);
  });

  it('two inertias free at both ends have a rigid-body mode and ω = √(k(J1+J2)/(J1J2))', () => {
    // Shared REFERENCE.md 10.7 (Den Hartog; Thomson & Dahleh; from memory, confident):
    // J1 = 2, J2 = 0.5, k = 1e5 → 500 rad/s, node at 0.2 L from J1.
    const modes = chainModes([1e5, 1e5], [-1e5], [2, 0.5], 2);
    expect(modes[0].omega).toBeLessThan(1e-3);
    expect(modes[1].omega).toBeCloseTo(500, 6);
    const [s1, s2] = modes[1].shape;
    expect(s1 / (s1 - s2)).toBeCloseTo(0.2, 9); // where the line between the two amplitudes crosses zero
  });

  it('a three-mass chain matches ml-matrix eigenvalues, and its shapes solve K·φ = ω²·M·φ', () => {
    const k = [3e5, 1.2e5, 8e4];
    const m = [4, 1.5, 0.7];
    const { kd, ko } = grounded(k);
    const modes = chainModes(kd, ko, m, 3);
    const ref = referenceOmegaSquared(kd, ko, m);
    modes.forEach((mode, i) => expect(mode.omega ** 2 / ref[i]).toBeCloseTo(1, 10));
    const { K, M } = dense(kd, ko, m);
    for (const mode of modes) {
      const phi = Matrix.columnVector(Array.from(mode.shape));
      const r = K.mmul(phi).sub(M.mmul(phi).mul(mode.omega ** 2));
      expect(r.norm() / K.mmul(phi).norm()).toBeLessThan(1e-9);
      expect(Math.max(...mode.shape)).toBeCloseTo(1, 12);
    }
    // M-orthogonality of distinct modes.
    const dot = (a: Float64Array, b: Float64Array) => a.reduce((s, x, i) => s + x * m[i] * b[i], 0);
    expect(Math.abs(dot(modes[0].shape, modes[1].shape))).toBeLessThan(1e-9 * Math.sqrt(dot(modes[0].shape, modes[0].shape) * dot(modes[1].shape, modes[1].shape)));
  });

  it('the participations of all modes add up to one', () => {
    const { kd, ko } = grounded([3e5, 1.2e5, 8e4, 5e4]);
    const modes = chainModes(kd, ko, [4, 1.5, 0.7, 0.2], 4);
    expect(modes.reduce((s, x) => s + x.participation, 0)).toBeCloseTo(1, 12);
  });

  it('Sturm counts agree with ml-matrix for random chains, and frequencies scale as √(k/J)', () => {
    const chain = fc.array(fc.record({ k: fc.double({ min: 1e3, max: 1e7, noNaN: true }), m: fc.double({ min: 1e-2, max: 10, noNaN: true }) }), { minLength: 1, maxLength: 12 });
    fc.assert(
      fc.property(chain, fc.double({ min: 0.1, max: 10, noNaN: true }), fc.double({ min: 0.1, max: 10, noNaN: true }), (c, a, b) => {
        const { kd, ko } = grounded(c.map((x) => x.k));
        const m = c.map((x) => x.m);
        const ref = referenceOmegaSquared(kd, ko, m);
        const s = m.map((x) => 1 / Math.sqrt(x));
        const A = kd.map((x, i) => x * s[i] * s[i]);
        const B = ko.map((x, i) => x * s[i] * s[i + 1]);
        const x = 0.5 * (ref[0] + (ref[1] ?? 2 * ref[0]));
        if (countBelow(A, B, x) !== ref.filter((l) => l < x).length) return false;
        const base = chainModes(kd, ko, m, c.length);
        const scaled = chainModes(
          kd.map((v) => v * a),
          ko.map((v) => v * a),
          m.map((v) => v * b),
          c.length,
        );
        // Both solvers are accurate to rounding of the largest eigenvalue, so compare on that scale.
        const top = ref[ref.length - 1];
        return base.every((mode, i) => Math.abs(scaled[i].omega ** 2 / (a / b) - mode.omega ** 2) < 1e-10 * top && Math.abs(mode.omega ** 2 - ref[i]) < 1e-10 * top);
      }),
      { numRuns: 60 },
    );
  });
});
