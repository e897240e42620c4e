// The JSON Schemas under schemas/: made from the case's description and the results' contract,
// committed as written by `npm run schemas`, and checked with a general-purpose validator (Ajv,
// draft 2020-12) against every sample case, every template, and the JSON of the sample cases.
import { readdirSync, readFileSync } from 'node:fs';
import { Ajv2020 } from 'ajv/dist/2020.js';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { CaseError } from '../src/case/case-error.ts';
import { caseJsonSchema } from '../src/case/case-json-schema.ts';
import { parseCase } from '../src/case/parse-case.ts';
import { investigate } from '../src/finding/investigate.ts';
import { reportJson } from '../src/report/report-json.ts';
import { resultsToJson } from '../src/views/results-json.ts';
import { resultsJsonSchema } from '../src/views/results-json-schema.ts';
import { fixture, RUN } from './report/report-fixtures.ts';

const SCHEMAS = new URL('../schemas/', import.meta.url);
const SAMPLES = new URL('../sample-cases/', import.meta.url);
const TEMPLATES = new URL('../templates/', import.meta.url);
const committed = (name: string) => JSON.parse(readFileSync(new URL(name, SCHEMAS), 'utf8'));
const yamlFiles = (dir: URL) =>
  readdirSync(dir)
    .filter((f) => f.endsWith('.yaml'))
    .map((f) => ({ name: f, text: readFileSync(new URL(f, dir), 'utf8') }));

const ajv = new Ajv2020({ allErrors: true, allowUnionTypes: true, strict: true });
const validCase = ajv.compile(committed('case.schema.json'));
const validResults = ajv.compile(committed('results.schema.json'));
const errors = (v: typeof validCase) => (v.errors ?? []).map((e) => `${e.instancePath} ${e.message} ${JSON.stringify(e.params)}`);

describe('JSON Schemas', () => {
  it('the committed schemas are what npm run schemas writes from the sources', () => {
    expect(committed('case.schema.json')).toEqual(caseJsonSchema());
    expect(committed('results.schema.json')).toEqual(resultsJsonSchema());
  });

  it('every sample case and template validates against the case schema', () => {
    for (const { name, text } of [...yamlFiles(SAMPLES), ...yamlFiles(TEMPLATES)]) {
      expect(validCase(parse(text)), `${name}: ${errors(validCase).join('; ')}`).toBe(true);
    }
  });

  it('a wrong case fails validation on the field the reader names too', () => {
    const good = readFileSync(new URL('granulator-tramp-metal.yaml', SAMPLES), 'utf8');
    const wrongs = [
      { text: good.replace(/^(\s+)- \{ ?shape: disc/m, '$1- { shape: disc, diamter: 1 mm'), field: /stations\[\d+\]\.parts\[\d+\]\.diamter/ },
      { text: good.replace(/^speed: .*$/m, 'speed: fast'), field: /^speed$/ },
      { text: good.replace(/^(\s+)- \{ ?shape: disc/m, '$1- { shape: disc, inertia: 2 kg*m^2'), field: /stations\[\d+\]\.parts\[\d+\]\.inertia/ },
    ];
    for (const { text, field } of wrongs) {
      expect(text).not.toBe(good);
      expect(validCase(parse(text))).toBe(false);
      const paths = (validCase.errors ?? []).map(
        (e) =>
          e.instancePath
            .replace(/\/(\d+)/g, '[$1]')
            .replace(/\//g, '.')
            .replace(/^\./, '') + (e.params && 'additionalProperty' in e.params ? `.${e.params.additionalProperty}` : ''),
      );
      let named: string[] = [];
      try {
        parseCase(text);
      } catch (e) {
        named = (e as CaseError).problems.map((p) => p.path);
      }
      expect(
        named.some((p) => field.test(p)),
        named.join(', '),
      ).toBe(true);
      expect(
        paths.some((p) => field.test(p) || named.includes(p)),
        paths.join(', '),
      ).toBe(true);
    }
  });

  it("check --json of every sample case and a report's results.json validate against the results schema", () => {
    for (const { name, text } of yamlFiles(SAMPLES)) {
      const json = resultsToJson(investigate(parseCase(text, name)));
      expect(validResults(JSON.parse(JSON.stringify(json))), `${name}: ${errors(validResults).join('; ')}`).toBe(true);
    }
    for (const name of ['sample', 'screw-conveyor-jam-us.yaml']) {
      const f = fixture(name);
      const json = JSON.parse(JSON.stringify(reportJson(f.data, RUN, f.source)));
      expect(validResults(json), `${name}: ${errors(validResults).join('; ')}`).toBe(true);
      expect(validResults({ ...json, unexpected: 1 })).toBe(false);
      expect(validResults({ ...json, finding: { ...json.finding, verdict: 3 } })).toBe(false);
    }
  });
});
