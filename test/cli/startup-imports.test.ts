import { readFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const SRC = fileURLToPath(new URL('../../src/', import.meta.url));
const DIST_CLI = fileURLToPath(new URL('../../dist/cli/', import.meta.url));
/** Packages only the report needs; `check` must never load them. */
const REPORT_ONLY = ['@observablehq/plot', 'linkedom', 'arquero', 'markdown-it', 'jszip', 'playwright-core'];

/** Every module reached from `entry` through static imports (dynamic `import()` not followed). */
function staticGraph(entry: string): { files: Set<string>; packages: Set<string> } {
  const files = new Set<string>();
  const packages = new Set<string>();
  const visit = (file: string) => {
    if (files.has(file)) return;
    files.add(file);
    const text = readFileSync(file, 'utf8');
    for (const m of text.matchAll(/^\s*(?:import|export)\s+(?!type\b)(?:[^'"]*?\sfrom\s+)?['"]([^'"]+)['"]/gm)) {
      const spec = m[1];
      if (spec.startsWith('.')) visit(resolve(dirname(file), spec));
      else packages.add(spec.startsWith('@') ? spec.split('/').slice(0, 2).join('/') : spec.split('/')[0]);
    }
  };
  visit(entry);
  return { files, packages };
}

describe('start-up of the CLI', () => {
  it("the CLI entry reaches none of the report's packages through static imports", () => {
    const { files, packages } = staticGraph(join(SRC, 'cli', 'bin.ts'));
    // The walk does follow the project's imports: a command reaches the engine.
    expect(staticGraph(join(SRC, 'cli', 'commands', 'check.ts')).files.size).toBeGreaterThan(10);
    for (const p of REPORT_ONLY) expect([...packages], p).not.toContain(p);
    expect([...files].some((f) => f.includes('/src/report/'))).toBe(false);
  });

  it('--help and the arguments load no engine: the CLI entry reaches only the argument parser, the version and the error class', () => {
    const { files, packages } = staticGraph(join(SRC, 'cli', 'bin.ts'));
    const rel = [...files].map((f) => f.slice(SRC.length)).sort();
    // The number limits, the run's own errors and the system-fault class are small and import no engine.
    expect(rel).toEqual(['case/case-error.ts', 'case/limits.ts', 'cli/bin.ts', 'cli/main.ts', 'cli/run-errors.ts', 'cli/version.ts', 'io/system-fault.ts']);
    expect([...packages].sort()).toEqual(['commander', 'node:fs']);
  });

  it.each(['check', 'resize', 'materials', 'new'])("the %s command reaches none of the report's packages or modules", (command) => {
    const { files, packages } = staticGraph(join(SRC, 'cli', 'commands', `${command}.ts`));
    for (const p of REPORT_ONLY) expect([...packages], p).not.toContain(p);
    expect([...files].some((f) => f.includes('/src/report/'))).toBe(false);
  });

  it("check --json does not load the terminal summary's views", () => {
    const { files } = staticGraph(join(SRC, 'cli', 'commands', 'check.ts'));
    expect([...files].some((f) => f.endsWith('/views/summary.ts'))).toBe(false);
  });

  it("the bundled CLI (dist/cli, what `npx shaftcase` runs): check's chunks hold none of the report's libraries, and the report's do", () => {
    // `npm test` bundles before the tests run (scripts/bundle.mjs). A command's chunk is loaded by
    // bin.js's `import()`; what it loads with it are its static imports, walked as above.
    const bin = join(DIST_CLI, 'bin.js');
    const chunkOf = (command: string) => join(DIST_CLI, readFileSync(bin, 'utf8').match(new RegExp(`import\\("\\./(${command}-[\\w-]+\\.js)"\\)`))![1]);
    const text = (command: string) => [...staticGraph(chunkOf(command)).files].map((f) => readFileSync(f, 'utf8')).join('\n');
    const signatures = ['observablehq', 'linkedom', 'markdown-it', 'JSZip'];
    const check = text('check');
    expect(check).toMatch(/shear yield/);
    for (const s of signatures) expect(check.includes(s), s).toBe(false);
    const report = text('report');
    for (const s of signatures) expect(report.includes(s), s).toBe(true);
  });

  it('the report command itself does reach them (so the check above looks at the right graph)', () => {
    const { packages } = staticGraph(join(SRC, 'cli', 'commands', 'report.ts'));
    for (const p of ['@observablehq/plot', 'linkedom', 'arquero', 'markdown-it', 'jszip']) expect([...packages], p).toContain(p);
  });
});
