import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { CaseError } from '../../src/case/case-error.ts';
import { parseCase } from '../../src/case/parse-case.ts';

const template = (name: string) => readFileSync(fileURLToPath(new URL(`../../templates/${name}`, import.meta.url)), 'utf8');

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
    const filled = template(name)
      .replace(/^( {2}id:)/m, '$1 INC-1')
      .replace(/^(speed:)/m, '$1 420 rpm')
      .replace(/^( {2}at:)( +#)/m, '$1 rotor$2')
      .replace(/^( {2}material:)\s*$/m, '$1 aisi-1045-cd')
      .replace('{ length: , diameter: ,', '{ length: 20 in, diameter: 2 in,')
      .replace(/^( {2}- name:)( +# REQUIRED\. Your name)/m, '$1 drive pulley$2')
      .replace(/^( {4}at:)( +# REQUIRED\. Distance)/m, '$1 2 in$2')
      .replace('{ shape: disc, name: , diameter: , thickness: ,', '{ shape: disc, name: pulley, diameter: 10 in, thickness: 2 in,')
      .replace('bore: , material: }', 'bore: , material: gray-iron-30 }')
      .replace(/^( {2}- name:)( +# REQUIRED\. The station)/m, '$1 rotor$2')
      .replace(/^( {4}at:)( +# REQUIRED\.)$/m, '$1 18 in$2');
    expect(parseCase(filled, name).stations.map((s) => s.name)).toEqual(['drive pulley', 'rotor']);
  });
});
