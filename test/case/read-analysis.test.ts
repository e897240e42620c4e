import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { lineOf, problems } from '../helpers/case-problems.ts';
import { caseText, type Layout } from '../helpers/layout.ts';

const layout = (analysis?: string): Layout => ({
  rpm: 300,
  segments: [
    [300, 50, 0],
    [300, 50, 0],
  ],
  stations: [
    ['pulley', 0, 1],
    ['spacer', 150, 0],
    ['jam', 300, 0],
    ['flywheel', 600, 2],
    ['outboard', 600, 0],
  ],
  stop: 'jam',
  analysis,
});

describe("analysis: the factors and the limiter's place", () => {
  it('defaults to N = 1.5, a service factor of 1.5 and a largest scale of 1.3', () => {
    const a = parseCase(caseText(layout())).analysis;
    expect(a).toMatchObject({ criterion: 'distortion-energy', designFactor: 1.5, serviceFactor: 1.5, maxScale: 1.3 });
    expect(a.limiterAt).toBeUndefined();
  });

  it('reads the factors and limiter_at as given', () => {
    const a = parseCase(caseText(layout('  design_factor: 2\n  service_factor: 1.25\n  max_scale: 1.2\n  limiter_at: spacer'))).analysis;
    expect(a).toMatchObject({ designFactor: 2, serviceFactor: 1.25, maxScale: 1.2, limiterAt: 'spacer' });
  });

  it('a design factor below 1 is refused with its line', () => {
    const text = caseText(layout('  design_factor: 0.8'));
    expect(problems(text)).toMatch(new RegExp(`case\\.yaml:${lineOf(text, 'design_factor')}:\\d+ analysis\\.design_factor: 0\\.8 is out of range; give a design factor of 1 or more`));
  });

  it('limiter_at must name a station', () => {
    const text = caseText(layout('  limiter_at: pully'));
    expect(problems(text)).toMatch(new RegExp(`:${lineOf(text, 'limiter_at')}:\\d+ analysis\\.limiter_at: no station is named "pully"`));
  });

  it('limiter_at cannot be the station that stopped', () => {
    expect(problems(caseText(layout('  limiter_at: jam')))).toMatch(/analysis\.limiter_at: "jam" is the station that stopped/);
  });

  it('limiter_at must have driving parts at or beyond it', () => {
    const text = caseText({
      ...layout('  limiter_at: outboard'),
      stations: [
        ['pulley', 0, 1],
        ['jam', 300, 0],
        ['outboard', 600, 0],
      ],
    });
    expect(problems(text)).toMatch(/analysis\.limiter_at: a torque limiter at "outboard" would carry no torque/);
  });
});
