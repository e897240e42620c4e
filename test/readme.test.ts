import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../src/case/parse-case.ts';
import { analyseCase } from '../src/results/analyse-case.ts';

describe('README', () => {
  it('its annotated case-file example is a valid case that runs through the engine', () => {
    const readme = readFileSync(new URL('../README.md', import.meta.url), 'utf8');
    const example = /## The case file[\s\S]*?```yaml\n([\s\S]*?)```/.exec(readme)![1];
    const r = analyseCase(parseCase(example, 'README example'));
    expect(r.sides.length).toBeGreaterThan(0);
  });
});
