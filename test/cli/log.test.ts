import { copyFileSync, existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { removeTempFolders, tempFolder } from '../io/io-fixtures.ts';
import { cli, type CliRun } from './run-cli.ts';

const SAMPLES = new URL('../../sample-cases/', import.meta.url);
const CV7 = [1, 2, 3, 4].map((i) => `conveyor-cv7-jam-${i}.yaml`);

/** A plant folder: the CV-7 series in one folder (in a shuffled order of files), one case folder without an asset. */
function plantFolder(): string {
  const dir = tempFolder();
  mkdirSync(join(dir, 'cv7'));
  for (const [k, f] of [CV7[2], CV7[0], CV7[3], CV7[1]].entries()) copyFileSync(new URL(f, SAMPLES), join(dir, 'cv7', `jam-${'dcba'[k]}.yaml`));
  mkdirSync(join(dir, 'other', 'INC-1'), { recursive: true });
  copyFileSync(new URL('../data/one-disc.yaml', import.meta.url), join(dir, 'other', 'INC-1', 'case.yaml'));
  writeFileSync(join(dir, 'materials.yaml'), 'materials:\n  x: { name: not a case }\n');
  return dir;
}

describe('shaftcase log', () => {
  let dir: string;
  let table: CliRun;
  let json: CliRun;
  let csv: CliRun;
  beforeAll(async () => {
    dir = plantFolder();
    // One case has a report: the log reads its results.json instead of running the engine.
    expect((await cli(['report', join(dir, 'cv7', 'jam-a.yaml')])).code).toBe(0);
    table = await cli(['log', dir]);
    json = await cli(['log', '--json', dir]);
    csv = await cli(['log', '--csv', dir]);
  });
  afterAll(() => removeTempFolders());

  it("prints one row per incident, the asset's rollup and its finding, and says where the engine ran", () => {
    expect(table.code, table.err).toBe(0);
    expect(table.out).toMatch(/Incidents \(5\)/);
    expect(table.out).toMatch(/CV-7 head shaft\s+4\s+2\.01\s+110 days/);
    expect(table.out).toMatch(/CV-7 head shaft's "coupling keyseat" has used about \d+ % of its crack-initiation life in 4 jams; at this rate about \d+ more jams like the worst one\./);
    expect(table.out).toMatch(/DEMO-CV7-01 .*: no report yet; the engine ran on the case file\./);
    expect(table.out).not.toMatch(/DEMO-CV7-02 .*engine ran/);
    expect(table.out).toMatch(/Caution: fatigue estimates scatter by a factor of several/);
  });

  it("--json has the issue's shape; incidents of an asset are in the order they occurred; the Miner sum is the sum of the incidents' damages", () => {
    const j = JSON.parse(json.out);
    expect(j.schema_version).toBe(2);
    expect(Object.keys(j.incidents[0])).toEqual([
      'id',
      'asset',
      'occurred',
      'verdict',
      'basis',
      'side',
      'segment',
      'yield_ratio',
      'peak_torque_Nm',
      'permanent_twist_rad',
      'measured_twist_rad',
      'damage',
      'report',
    ]);
    expect(Object.keys(j.assets[0])).toEqual(['asset', 'incidents', 'worst_yield_ratio', 'mean_interval_days', 'damage']);
    const cv7 = j.incidents.filter((r: { asset: string }) => r.asset === 'CV-7 head shaft');
    expect(cv7.map((r: { id: string }) => r.id)).toEqual(['DEMO-CV7-01', 'DEMO-CV7-02', 'DEMO-CV7-03', 'DEMO-CV7-04']);
    const sum = cv7.reduce((s: number, r: { damage: number }) => s + r.damage, 0);
    expect(j.assets[0].damage).toBeCloseTo(sum, 14);
    expect(j.assets[0].damage).toBeGreaterThan(0);
    // Mean interval: 2025-11-03T07:40 to 2026-09-28T04:50 over three intervals.
    expect(j.assets[0].mean_interval_days).toBeCloseTo((Date.UTC(2026, 8, 28, 4, 50) - Date.UTC(2025, 10, 3, 7, 40)) / 3 / 86_400_000, 9);
    expect(cv7[1].report).toMatch(/cv7[\\/]reports[\\/]DEMO-CV7-02-2026-12-01$/);
    expect(j.incidents.find((r: { id: string }) => r.id === 'T-1').asset).toBeNull();
  });

  it('the row read from the report is the row the engine gives for the same case', async () => {
    const fresh = join(tempFolder(), 'b');
    mkdirSync(fresh);
    copyFileSync(new URL(CV7[1], SAMPLES), join(fresh, 'b.yaml'));
    const engine = JSON.parse((await cli(['log', '--json', fresh])).out).incidents[0];
    const fromReport = JSON.parse(json.out).incidents.find((r: { id: string }) => r.id === 'DEMO-CV7-02');
    expect({ ...fromReport, report: null }).toEqual({ ...engine, report: null });
  });

  it('--csv carries the same rows as --json', () => {
    const lines = csv.out.trim().split('\n');
    const j = JSON.parse(json.out);
    expect(lines[0]).toBe('id,asset,occurred,verdict,basis,side,segment,yield_ratio,peak_torque_Nm,permanent_twist_rad,measured_twist_rad,damage,report');
    expect(lines.length - 1).toBe(j.incidents.length);
    lines.slice(1).forEach((l, k) => {
      expect(l.startsWith(`${j.incidents[k].id},`)).toBe(true);
      expect(l).toContain(String(j.incidents[k].damage));
    });
  });

  it('--html writes a new page and never over an existing file', async () => {
    const page = join(tempFolder(), 'log.html');
    const first = await cli(['log', '--html', page, dir]);
    expect(first.code, first.err).toBe(0);
    const html = readFileSync(page, 'utf8');
    expect(html).toMatch(/Content-Security-Policy" content="default-src 'none'/);
    expect(html.match(/<svg/g)!.length).toBeGreaterThanOrEqual(3);
    const again = await cli(['log', '--html', page, dir]);
    expect(again.code).toBe(2);
    expect(again.err).toMatch(/log\.html exists; the log never writes over a file/);
    expect(readFileSync(page, 'utf8')).toBe(html);
  });

  it("a path that is not a folder is the user's mistake: exit 2, one line", async () => {
    const r = await cli(['log', join(dir, 'nothing-here')]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/is not a folder; give the folder that holds the case files/);
    expect(existsSync(join(dir, 'nothing-here'))).toBe(false);
  });

  it("check of a case with case.asset shows its place in the history the log finds; its damage and the asset's sum are the log's", async () => {
    const file = join(dir, 'cv7', 'jam-d.yaml'); // DEMO-CV7-03
    const text = await cli(['check', file]);
    expect(text.out).toMatch(/This is incident 3 of 4 of CV-7 head shaft found under .*cv7; it added [\d.]+ %, and the asset's Miner sum is \d+ %\./);
    expect(text.out).toMatch(/crack test .* decides; a shaft near its estimated life is inspected before it goes back in/);
    const j = JSON.parse((await cli(['check', '--json', file])).out);
    const log = JSON.parse(json.out);
    expect(j.asset_history.asset_damage).toBeCloseTo(log.assets[0].damage, 14);
    expect(j.asset_history.damage).toBe(j.fatigue.damage);
    expect(j.asset_history.damage).toBe(log.incidents.find((r: { id: string }) => r.id === 'DEMO-CV7-03').damage);
    expect(j.asset_history.others.map((o: { id: string }) => o.id)).toEqual(['DEMO-CV7-01', 'DEMO-CV7-02', 'DEMO-CV7-04']);
  });

  it('a case without case.asset has no history in check --json', async () => {
    const j = JSON.parse((await cli(['check', '--json', join(dir, 'other', 'INC-1')])).out);
    expect(j.asset).toBeNull();
    expect(j.asset_history).toBeUndefined();
    expect(j.fatigue.damage).toBeGreaterThanOrEqual(0);
  });

  it("the report of a case with case.asset has the fatigue section with the asset's history, and results.json carries it", () => {
    const folder = join(dir, 'cv7', 'reports', 'DEMO-CV7-02-2026-12-01');
    const md = readFileSync(join(folder, 'report.md'), 'utf8');
    expect(md).toMatch(/## Appendix: fatigue, what this jam used up[\s\S]*### This asset's history\n\nThis is incident 2 of 4 of CV-7 head shaft/);
    const results = JSON.parse(readFileSync(join(folder, 'results.json'), 'utf8'));
    expect(results.asset_history.position).toBe(2);
    expect(results.asset).toBe('CV-7 head shaft');
  });
});
