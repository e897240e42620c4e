import { describe, expect, it } from 'vitest';
import { fillRequired, template } from '../helpers/filled-template.ts';
import { CaseError } from '../../src/case/case-error.ts';
import { parseCase } from '../../src/case/parse-case.ts';

function problems(text: string) {
  try {
    parseCase(text, 'case.yaml');
  } catch (e) {
    if (e instanceof CaseError) return e.problems;
    throw e;
  }
  throw new Error('the empty template parsed as a complete case');
}

describe('case templates', () => {
  it.each(['case-metric.yaml', 'case-us.yaml'])('%s uses only keys the case format knows: every problem of the empty template is a value still to fill in', (name) => {
    const found = problems(template(name));
    expect(found.length).toBeGreaterThan(5);
    for (const p of found) expect(p.code, `${p.path}: ${p.message}`).toBe('E_MISSING');
    expect(found.map((p) => p.path)).toEqual(expect.arrayContaining(['case.id', 'speed', 'stop.at', 'shaft.segments[0].length', 'shaft.segments[0].diameter', 'stations[0].name']));
  });

  it('case-us.yaml and case-metric.yaml set their units', () => {
    expect(template('case-us.yaml')).toMatch(/^units: us\b/m);
    expect(template('case-metric.yaml')).toMatch(/^units: metric\b/m);
  });

  it.each(['case-metric.yaml', 'case-us.yaml'])('%s, filled in, is a complete case', (name) => {
    const filled = fillRequired(template(name));
    expect(parseCase(filled, name).stations.map((s) => s.name)).toEqual(['drive pulley', 'rotor']);
  });
});
