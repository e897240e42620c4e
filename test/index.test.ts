import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import * as api from '../src/index.ts';

describe('the library entry point', () => {
  it('gives the case reader, the engine, the finding, the resize, the JSON views and the report writer', () => {
    for (const name of [
      'parseCase',
      'loadCase',
      'analyseCase',
      'investigate',
      'decideFinding',
      'withFinding',
      'resizeCase',
      'resultsToJson',
      'resizeToJson',
      'findingToJson',
      'findingSentence',
      'renderSummary',
      'writeCaseReport',
    ]) {
      expect(typeof (api as Record<string, unknown>)[name], name).toBe('function');
    }
    expect(api.SCHEMA_VERSION).toBe(2);
  });

  it('investigate on a sample case gives the finding the JSON carries', () => {
    const text = readFileSync(new URL('../sample-cases/edger-arbor-two-sides.yaml', import.meta.url), 'utf8');
    const r = api.investigate(api.parseCase(text), { samples: 0 });
    expect(api.resultsToJson(r).finding).toEqual(api.findingToJson(r.finding, r.case.units));
  });

  it('package.json points its exports and types at the built entry point', () => {
    const pkg = JSON.parse(readFileSync(new URL('../package.json', import.meta.url), 'utf8'));
    expect(pkg.exports['.']).toEqual({ types: './dist/src/index.d.ts', default: './dist/src/index.js' });
    expect(pkg.files).not.toContain('dist');
  });
});
