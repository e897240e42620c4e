import { describe, expect, it } from 'vitest';
import { fillRequired, template } from '../helpers/filled-template.ts';
import { CaseError } from '../../src/case/case-error.ts';
import { parseCase } from '../../src/case/parse-case.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { keyFuses } from '../../src/resize/key-fuse.ts';
import { withFinding } from '../../src/finding/investigation.ts';

/** Every optional block uncommented (the "#|" taken off, the indentation kept), then the required values filled in as the other template test does. */
function everyBlock(name: string): string {
  return fillRequired(template(name).replace(/^(\s*)#\| ?/gm, '$1'));
}

describe('case templates with every optional block filled in with its example values', () => {
  it.each(['case-metric.yaml', 'case-us.yaml'])('%s has the drive, belt, limiter, shear pin, key, tolerance and twist blocks', (name) => {
    const t = template(name);
    for (const block of [
      /^ {4}#\| drive:$/m,
      /^ {4}#\| {3}belt:/m,
      /^ {4}#\| {5}slip_torque:/m,
      /slip_torque: [^}]+\}/,
      /shear_torque: [^}]+\}/,
      /^ {4}#\| key: \{/m,
      /^ {4}#\| gearbox: \{/m,
      /^ {4}#\| backstop: true$/m,
      /^ {2}#\| samples:/m,
      /^ {2}#\| strength_scatter:/m,
      /^ {2}#\| permanent_twist:/m,
      /rotor_inertia:/,
      /curve:/,
    ]) {
      expect(t).toMatch(block);
    }
    // Where to find a rotor's WK² and a speed–torque curve; the speed through a reducer divided, not multiplied.
    expect(t).toMatch(/WK²/);
    expect(t).toMatch(/speed–torque curve \(the maker's curve/);
    expect(t).toMatch(/motor's speed DIVIDED by the reducer's ratio/);
    expect(t).not.toMatch(/nameplate speed times the ratio/);
    // Where a gearbox's rating and a worm's self-locking are found.
    expect(t).toMatch(/nameplate's output torque M2/);
    expect(t).toMatch(/does not back-drive, or a lead angle/);
    // Twist measured by what was in line before the jam, not by a line scribed after it.
    expect(t).toMatch(/keyway to keyway \(or spline to keyway\)/);
    expect(t).toMatch(/a dial indicator against a reference flat/);
    expect(t).not.toMatch(/scribe a straight line along the shaft/);
  });

  it.each(['case-metric.yaml', 'case-us.yaml'])('%s reads without error, and the drive, belt, key and devices reach the model', (name) => {
    let c;
    try {
      c = parseCase(everyBlock(name), name);
    } catch (e) {
      throw new Error(e instanceof CaseError ? e.problems.map((p) => `${p.path}: ${p.message}`).join('\n') : String(e));
    }
    const drive = c.stations[0].drive!;
    expect(drive.belt?.kind).toBe('slip torque');
    expect(drive.torque?.kind).toBe('curve');
    expect(drive.power).toBeGreaterThan(0);
    expect(drive.runningTorque).toBeGreaterThan(0);
    expect(c.stations[0].parts.map((p) => p.name)).toContain('motor rotor');
    expect(c.stations[0].key).toBeDefined();
    expect(c.stations[0].gearbox).toMatchObject({ serviceFactor: 2, efficiency: 0.96, backDrivable: true });
    expect(c.stations[0].backstop?.ratedTorque).toBeGreaterThan(0);
    expect(c.shaft.segments.filter((s) => s.slipTorque !== undefined)).toHaveLength(1);
    expect(c.shaft.segments.filter((s) => s.shearTorque !== undefined)).toHaveLength(1);
    expect(c.stop.torqueCapacity).toBeGreaterThan(0);
    expect(c.observed.permanentTwist[0].method).toBe('keyway to keyway, offset along a straightedge');
    expect(c.analysis.limiterAt).toBe('drive pulley');

    const r = analyseCase(c, { readBack: false });
    // The motor and its belt are in the dynamic model, and the verdict stands on it.
    expect(r.verdictBasis).toBe('dynamic model');
    expect(r.dynamic.slips.map((s) => s.element)).toContain('the belt at "drive pulley"');
    expect(keyFuses(c, withFinding(r)).map((k) => k.station)).toEqual(['drive pulley']);
    // The gearbox and the backstop are rows of the drive train.
    expect(r.driveTrain.map((e) => e.kind)).toEqual(expect.arrayContaining(['gearbox', 'backstop']));
  });
});
