import { describe, expect, it } from 'vitest';
import { StopMotion } from '../../src/physics/stop-motion.ts';

describe('StopMotion: the prescribed motion of the point that stops', () => {
  it('an instantaneous stop is at rest from t = 0', () => {
    const m = new StopMotion(50, 0);
    expect(m.speedAt(0)).toBe(0);
    expect(m.angleAt(1)).toBe(0);
    expect(m.accelerationAt(0.5)).toBe(0);
  });

  it('a ramped stop decelerates evenly, its angle is the integral of its speed, and it ends at ω0·t_r/2', () => {
    const m = new StopMotion(50, 0.01);
    expect(m.speedAt(0.005)).toBeCloseTo(25, 12);
    expect(m.accelerationAt(0.005)).toBeCloseTo(-5000, 9);
    expect(m.speedAt(0.02)).toBe(0);
    // Independent numerical check: midpoint-rule integral of the speed.
    const n = 10000;
    let integral = 0;
    for (let i = 0; i < n; i++) integral += m.speedAt(((i + 0.5) * 0.008) / n) * (0.008 / n);
    expect(m.angleAt(0.008)).toBeCloseTo(integral, 9);
    expect(m.angleAt(1)).toBeCloseTo(0.25, 12);
  });
});
