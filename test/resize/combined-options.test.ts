import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { investigate } from '../../src/finding/investigate.ts';
import { withShaftMaterial } from '../../src/resize/change-case.ts';
import { combinedOptions } from '../../src/resize/combined-options.ts';
import { energyCheck } from '../../src/resize/design-run.ts';
import { dynamicLimiterSlip } from '../../src/resize/dynamic-limiter-slip.ts';
import { limiterSlip } from '../../src/resize/limiter-slip.ts';
import { resizeCase } from '../../src/resize/resize-case.ts';
import type { ResizeResult } from '../../src/resize/resize-result.ts';
import { runningCheck } from '../../src/resize/running-check.ts';
import { runToStop, weakestPiece } from '../../src/resize/shaft-run.ts';
import { runningTorque } from '../../src/results/running-torque.ts';
import { rel } from '../helpers/layout.ts';

const made = new Map<string, ResizeResult>();
/** One resize per sample case for the file (each is a whole engine run and its reruns). */
const resized = (f: string) => {
  let z = made.get(f);
  if (!z) {
    const c = parseCase(readFileSync(new URL(`../../sample-cases/${f}`, import.meta.url), 'utf8'));
    z = resizeCase(c, investigate(c, { samples: 0 }));
    made.set(f, z);
  }
  return z;
};

describe('combined options: a limiter at a stated setting, alone or with a stronger shaft', () => {
  it('are made only where no option alone passes', () => {
    const z = resized('screw-conveyor-jam-us.yaml');
    expect(z.recommended?.option).toBe('material:aisi-4340-qt540');
    expect(z.combined).toEqual([]);
  });

  it("the granulator: the limiter at the middle of its window is checked by the single limiter's model at that setting", () => {
    const z = resized('granulator-tramp-metal.yaml');
    const o = z.combined.find((x) => x.option === 'limiter_setting')!;
    const l = o.limiters[0];
    expect(l.station).toBe(z.limiter.station);
    // Its window is the single limiter's, and its setting the window's middle on a log scale.
    expect(l.min).toBe(z.limiter.min);
    expect(l.max).toBe(z.limiter.max);
    expect(rel(l.setting, Math.sqrt(z.limiter.min! * z.limiter.max))).toBeLessThan(1e-12);
    // The same slip run as the single option's (the dynamic model with the limiter as a slip element), at the stated setting.
    const same = limiterSlip(z.results, { station: l.station, side: l.side }, l.setting);
    expect(l.slip.slipMethod).toBe('dynamic model');
    expect(l.slip.peakTorque).toBe(same.peakTorque);
    expect(l.slip.slipEnergy).toBe(same.slipEnergy);
    expect(l.yieldRatio).toBe(same.yieldRatio);
    expect(o.yieldRatio).toBe(same.yieldRatio);
    // A like-for-like shaft runs as the present one does.
    expect(o.running).toEqual(z.present.running);
    expect(o.flags).toEqual([]);
    expect(z.recommended?.option).toBe('limiter_setting');
  });

  it("the mixer: no setting runs the machine and protects the present shaft, so the limiter is set at the lowest that runs it and the shaft's material is checked as the single material option is", () => {
    const z = resized('mixer-motor-drove-through.yaml');
    expect(z.limiter.windowEmpty).toBe(true);
    expect(z.combined.map((o) => o.option)).toEqual(['limiter_material']);
    const o = z.combined[0];
    const l = o.limiters[0];
    expect(l.settingRule).toBe('lowest that runs the machine');
    expect(l.setting).toBe(z.limiter.min);
    const single = z.materials.find((m) => m.material.key === o.material!.key)!;
    // The shaft's check is the single material option's: the same energy method on the same changed case, the same running check.
    expect(o.check.sides.map((s) => s.peakTorque)).toEqual(single.rerun.sides.map((s) => s.peakTorque));
    expect(o.check.yieldRatio).toBe(single.rerun.yieldRatio);
    expect(o.running).toEqual(single.running);
    // At the limiter's torque: the window's top is that shaft's weakest piece over N, and the repeat is the single limiter's slip run on that shaft.
    const mc = withShaftMaterial(z.results.case, o.material!);
    expect(l.max).toBe(weakestPiece(runToStop(mc, l.station))!.yieldTorque / z.designFactor);
    const d = dynamicLimiterSlip(mc, l.station, l.side, l.setting)!;
    expect(l.slip.peakTorque).toBe(d.peakTorque);
    expect(l.yieldRatio).toBe(d.yieldRatio);
    // The weakest of the family that carries N × the setting (with the overshoot) is taken, not the strongest.
    expect(l.max).toBeGreaterThanOrEqual(l.setting);
    expect(z.recommended?.option).toBe('limiter_material');
  });

  it('larger pieces, where no stronger material is at hand: each grown to carry N × the setting, and flagged past max_scale by the rule of the scaled side', () => {
    const z = resized('mixer-motor-drove-through.yaml');
    const c = z.results.case;
    const [o] = combinedOptions({ c, results: z.results, running: runningTorque(c), designFactor: 1.5, serviceFactor: c.analysis.serviceFactor, limiter: z.limiter, materials: [] });
    expect(o.option).toBe('limiter_segments');
    const [g] = o.segments;
    // Yield torque goes as d³: the stock diameter carries at least N × the setting (× the overshoot ≥ 1).
    const before = weakestPiece(runToStop(c, o.limiters[0].station))!;
    expect(before.piece.segment.index).toBe(g.segment.index);
    expect(before.yieldTorque * g.growth ** 3).toBeGreaterThanOrEqual(1.5 * o.limiters[0].setting);
    expect(o.check.yieldRatio).toBe(energyCheck({ ...c, shaft: { segments: c.shaft.segments.map((s) => (s.index === g.segment.index ? { ...s, diameter: g.stockDiameter } : s)) } }).yieldRatio);
    expect(o.running).toEqual(runningCheck(o.check.case, runningTorque(c), 1.5));
  });

  it('the edger: one limiter on each side of the stop, each at the top of its window; by the energy method each side then sits at 1/N exactly', () => {
    const z = resized('edger-arbor-two-sides.yaml');
    expect(z.limiter.flags.join(' ')).toMatch(/does not protect side A/);
    const o = z.combined.find((x) => x.option === 'limiter_setting')!;
    expect(o.limiters.map((l) => l.side).sort()).toEqual(['A', 'B']);
    for (const l of o.limiters) {
      expect(l.slip.slipMethod).toBe('energy method');
      // The top of the window: the weakest piece's τy·J/(c·kt) over N (Shigley 9th ed. Sec. 3-12), computed here from the segment.
      const w = weakestPiece(runToStop(z.results.case, l.station))!;
      const g = w.piece.segment;
      const tauY = z.results.case.materials[g.material].yieldStrength! / Math.sqrt(3);
      const top = (tauY * Math.PI * (g.diameter ** 4 - g.bore ** 4)) / (16 * g.diameter * g.kt * 1.5);
      expect(rel(l.setting, top)).toBeLessThan(1e-9);
      expect(rel(l.yieldRatio, 1 / 1.5)).toBeLessThan(1e-9);
    }
    expect(z.recommended?.option).toBe('limiter_setting');
  });
});

describe("resize's key check", () => {
  it("judges the key at the torque the finding's drive train gives it, the same as check's key check, not the energy method's side peak", () => {
    const z = resized('granulator-tramp-metal.yaml');
    const k = z.keys[0];
    const element = z.results.finding.driveTrain.find((e) => e.kind === 'key' && e.where === k.station)!;
    expect(k.incident.torque).toBe(element.torque);
    expect(k.incident.torque).toBe(z.results.keys[0].torque);
    expect(k.shearOffTorque).toBe(z.results.keys[0].shearOffTorque);
    // The granulator's finding stands on the dynamic model: the key carried the yielding shaft's capped torque, far below the energy method's elastic peak.
    expect(z.results.finding.basis).toBe('dynamic model');
    expect(k.incident.torque).toBeLessThan(0.5 * z.results.sides[0].peakTorque);
  });
});

describe('the order of giving way behind a limiter', () => {
  it("lists the option's shaft and the finding's keys, fits and couplings on the run, as multiples of the setting", () => {
    const z = resized('granulator-tramp-metal.yaml');
    const f = z.combined[0].limiters[0].fuses;
    const key = z.results.finding.driveTrain.find((e) => e.kind === 'key')!;
    expect(f.steps.map((s) => s.kind)).toEqual(['shaft', 'key']);
    const [shaft, k] = f.steps;
    // "sheave seat" Ø55 mm, kt 2.2, AISI 1045 CD (Sy = 530 MPa, Shigley 9th ed. Table A-20): τy·πd³/16 / kt.
    expect(rel(shaft.capacity, ((530e6 / Math.sqrt(3)) * Math.PI * 0.055 ** 3) / 16 / 2.2)).toBeLessThan(1e-9);
    expect(k.capacity).toBe(key.capacity);
    expect(k.multiple).toBe(key.capacity / f.setting);
    expect(f.uprate).toEqual([]);
  });

  it('names a coupling whose rating is below N × the torque through it, with the rating it needs', () => {
    const z = resized('bucket-elevator-coupling-trip.yaml');
    const f = z.limiter.fuses;
    const coupling = f.uprate.find((s) => s.kind === 'coupling')!;
    expect(coupling.capacity).toBe(z.results.finding.driveTrain.find((e) => e.kind === 'coupling')!.capacity);
    expect(coupling.capacity).toBeLessThan(coupling.needed);
    // The fit at the stop is the jam's own slip: it is in the order but not one to uprate.
    expect(f.steps.some((s) => s.kind === 'fit')).toBe(true);
    expect(f.uprate.some((s) => s.kind === 'fit')).toBe(false);
  });
});
