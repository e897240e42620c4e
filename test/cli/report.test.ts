import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import JSZip from 'jszip';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runInfo } from '../../src/report/run-info.ts';
import { version } from '../../src/cli/version.ts';
import { copyToTemp, removeTempFolders, tempFolder } from '../io/io-fixtures.ts';
import { DATA, FIXED_NOW, SAMPLE, TINY_PNG, TOLERANCED_SAMPLE } from '../report/report-fixtures.ts';
import { cli } from './run-cli.ts';

// The granulator yields and has a measured twist; it states no tolerances.
const FIGURES = [
  'dynamic-modes.svg',
  'dynamic-speeds.svg',
  'dynamic-torque.svg',
  'energy-share.svg',
  'permanent-twist-speed-1.svg',
  'resize-peak-torque-vs-limiter.svg',
  'resize-yield-ratio-vs-diameter.svg',
  'shaft-schematic.svg',
  'stress-along-shaft.svg',
  'stress-vs-speed.svg',
  'torque-twist.svg',
];
const TABLES = ['material.csv', 'parts.csv', 'past-yield-in-time.csv', 'past-yield-pieces.csv', 'past-yield-sides.csv', 'pieces.csv', 'segments.csv', 'sides.csv'];
const UNCERTAINTY_FIGURES = ['uncertainty-sensitivity.svg', 'uncertainty-yield-ratio.svg'];
const UNCERTAINTY_TABLES = ['uncertainty-inputs.csv', 'uncertainty-percentiles.csv', 'uncertainty-sensitivity.csv'];

describe('shaftcase report', () => {
  // The granulator's report is made three times, once here for the whole file: today, a later day
  // (byte-identical apart from the run) and today again (ID-DATE-2); check and resize run once.
  const later = new Date('2026-12-02T17:45:59Z');
  let file = '';
  let run: Awaited<ReturnType<typeof cli>>;
  let again: Awaited<ReturnType<typeof cli>>;
  let firstBefore: Buffer;
  let firstAfter: Buffer;
  let check: Awaited<ReturnType<typeof cli>>;
  let checkJson: Awaited<ReturnType<typeof cli>>;
  let resizeJson: Awaited<ReturnType<typeof cli>>;
  beforeAll(async () => {
    file = copyToTemp(SAMPLE);
    run = await cli(['report', file], FIXED_NOW);
    const first = join(dirname(file), 'reports', 'DEMO-GR-0117-2026-12-01', 'report.md');
    firstBefore = readFileSync(first);
    await cli(['report', file], later);
    again = await cli(['report', file], FIXED_NOW);
    firstAfter = readFileSync(first);
    check = await cli(['check', file]);
    checkJson = await cli(['check', '--json', file]);
    resizeJson = await cli(['resize', '--json', file]);
  });
  afterAll(removeTempFolders);

  it('report writes the dated folder with every part and prints what it wrote, the file to open and the verdict', () => {
    expect(run.err).toBe('');
    expect(run.code).toBe(0);
    const folder = join(dirname(file), 'reports', 'DEMO-GR-0117-2026-12-01');
    expect(readdirSync(folder).sort()).toEqual(['figures', 'report.html', 'report.md', 'results.json', 'tables']);
    expect(readdirSync(join(folder, 'figures')).sort()).toEqual(FIGURES);
    expect(readdirSync(join(folder, 'tables')).sort()).toEqual(TABLES);
    expect(run.out).toContain(`Wrote the report ${folder}/\n  report.md\n  report.html\n  results.json\n`);
    expect(run.out).toContain(`Wrote the bundle for the ticket ${folder}.zip (the report, the case file, 0 photos, MANIFEST.txt)`);
    expect(run.out).toContain(`\nOpen ${folder}/report.html\n`);
    const finding = /^Finding: .*$/m.exec(check.out)![0];
    expect(run.out.trimEnd().split('\n').slice(-1)).toEqual([finding]);
  });

  it('results.json holds exactly what check --json prints, plus the inputs, the version, the run time and the case hash', () => {
    const json = JSON.parse(readFileSync(join(dirname(file), 'reports', 'DEMO-GR-0117-2026-12-01', 'results.json'), 'utf8'));
    const check = JSON.parse(checkJson.out);
    const { resize, inputs, tool_version, ran_at, case_file, case_sha256, ...rest } = json;
    expect(rest).toEqual(check);
    expect(resize).toEqual(JSON.parse(resizeJson.out).resize);
    expect(inputs.speed_rad_s).toBe(check.speed_rad_s);
    expect(tool_version).toBe(version());
    expect(ran_at).toBe('2026-12-01T10:20:30+00:00');
    expect(case_file).toBe(basename(file));
    expect(case_sha256).toBe(createHash('sha256').update(readFileSync(file)).digest('hex'));
  });

  /** Two report folders of one case agree byte for byte apart from the run date and time. */
  const sameApartFromRun = (a: string, b: string, figures: string[], tables: string[]) => {
    const json = (dir: string) => ({ ...JSON.parse(readFileSync(join(dir, 'results.json'), 'utf8')), ran_at: 'RUN' });
    expect(json(b)).toEqual(json(a));
    for (const f of [...figures.map((x) => `figures/${x}`), ...tables.map((x) => `tables/${x}`)]) {
      expect(readFileSync(join(b, f)).equals(readFileSync(join(a, f))), f).toBe(true);
    }
    const dated = (md: string, at: Date) => {
      const r = runInfo(at, version());
      return md.replaceAll(r.iso, 'RUN-ISO').replaceAll(`${r.date} ${r.time}`, 'RUN-DATE-TIME');
    };
    const mdA = dated(readFileSync(join(a, 'report.md'), 'utf8'), FIXED_NOW);
    const mdB = dated(readFileSync(join(b, 'report.md'), 'utf8'), later);
    expect(mdA).toContain('RUN-ISO');
    expect(mdB).toBe(mdA);
  };

  it('the same case and version give byte-identical report.md, figures and CSVs apart from the run date and time: the granulator', () => {
    sameApartFromRun(join(dirname(file), 'reports', 'DEMO-GR-0117-2026-12-01'), join(dirname(file), 'reports', 'DEMO-GR-0117-2026-12-02'), FIGURES, TABLES);
  });

  it('the same case and version give byte-identical report.md, figures and CSVs apart from the run date and time: the toleranced screw conveyor (seeded Monte Carlo)', async () => {
    const file = copyToTemp(TOLERANCED_SAMPLE);
    await cli(['report', file], FIXED_NOW);
    await cli(['report', file], later);
    sameApartFromRun(join(dirname(file), 'reports', 'DEMO-SC-0342-2026-12-01'), join(dirname(file), 'reports', 'DEMO-SC-0342-2026-12-02'), UNCERTAINTY_FIGURES, UNCERTAINTY_TABLES);
  });

  it('report --samples --seed runs the Monte Carlo as check does: results.json holds check --json with the same seed, and the section and figures are written', async () => {
    const file = copyToTemp(TOLERANCED_SAMPLE);
    const run = await cli(['report', '--samples', '3000', '--seed', '7', file]);
    expect(run.code).toBe(0);
    const folder = join(dirname(file), 'reports', 'DEMO-SC-0342-2026-12-01');
    const json = JSON.parse(readFileSync(join(folder, 'results.json'), 'utf8'));
    const check = JSON.parse((await cli(['check', '--json', '--samples', '3000', '--seed', '7', file])).out);
    expect(json.uncertainty).toEqual(check.uncertainty);
    expect(json.uncertainty).toMatchObject({ samples: 3000, seed: 7 });
    const { resize, inputs, tool_version, ran_at, case_file, case_sha256, ...rest } = json;
    expect(rest).toEqual(check);
    expect(readdirSync(join(folder, 'figures'))).toEqual(expect.arrayContaining(UNCERTAINTY_FIGURES));
    expect(readdirSync(join(folder, 'tables'))).toEqual(expect.arrayContaining(UNCERTAINTY_TABLES));
    const md = readFileSync(join(folder, 'report.md'), 'utf8');
    expect(md).toContain('\n## How sure the finding is\n');
    expect(md).toContain('repeated 3000 times (a seeded Monte Carlo, seed 7)');
    // A different seed gives different samples, so different numbers.
    const other = JSON.parse((await cli(['check', '--json', '--samples', '3000', '--seed', '8', file])).out);
    expect(other.uncertainty.percentiles.yield_ratio).not.toEqual(json.uncertainty.percentiles.yield_ratio);
  });

  it('report --samples 0 leaves the uncertainty run out, and --factor sets the design factor of what goes back in', async () => {
    const file = copyToTemp(TOLERANCED_SAMPLE);
    expect((await cli(['report', '--samples', '0', '--factor', '2', file])).code).toBe(0);
    const folder = join(dirname(file), 'reports', 'DEMO-SC-0342-2026-12-01');
    const json = JSON.parse(readFileSync(join(folder, 'results.json'), 'utf8'));
    expect(json.uncertainty).toBeUndefined();
    expect(json.resize.factor).toBe(2);
    expect(json.resize).toEqual(JSON.parse((await cli(['resize', '--json', '--factor', '2', file])).out).resize);
    expect(readFileSync(join(folder, 'report.md'), 'utf8')).not.toContain('## How sure the finding is');
  });

  it('report refuses a --samples that is not a whole number with exit status 2', async () => {
    const run = await cli(['report', '--samples', 'many', copyToTemp(TOLERANCED_SAMPLE)]);
    expect(run.code).toBe(2);
    expect(run.err).toMatch(/"many" is not a whole number/);
  });

  it("the zip's manifest lists the real SHA-256 of every file in it, and they match the files on disk", async () => {
    const dir = join(tempFolder(), 'case');
    mkdirSync(join(dir, 'photos'), { recursive: true });
    writeFileSync(join(dir, 'case.yaml'), readFileSync(SAMPLE, 'utf8') + '  photos:\n    - { path: photos/key.png, caption: the sheave key }\n');
    writeFileSync(join(dir, 'photos', 'key.png'), TINY_PNG);
    expect((await cli(['report', dir])).code).toBe(0);
    const zip = await JSZip.loadAsync(readFileSync(join(dir, 'reports', 'DEMO-GR-0117-2026-12-01.zip')));
    const lines = (await zip.file('MANIFEST.txt')!.async('string')).trimEnd().split('\n');
    const listed = lines.map((l) => l.slice(66));
    expect(listed.sort()).toEqual(
      Object.keys(zip.files)
        .filter((n) => n !== 'MANIFEST.txt' && !zip.files[n].dir)
        .sort(),
    );
    expect(listed).toContain('case.yaml');
    expect(listed).toContain('photos/key.png');
    expect(listed).toContain('reports/DEMO-GR-0117-2026-12-01/report.html');
    for (const line of lines) {
      const [hash, path] = [line.slice(0, 64), line.slice(66)];
      expect(
        createHash('sha256')
          .update(await zip.file(path)!.async('uint8array'))
          .digest('hex'),
        path,
      ).toBe(hash);
      expect(
        createHash('sha256')
          .update(readFileSync(join(dir, path)))
          .digest('hex'),
        path,
      ).toBe(hash);
    }
  });

  it('a second run the same day makes ID-DATE-2 and leaves the first report as it was', () => {
    expect(again.out).toContain(join(dirname(file), 'reports', 'DEMO-GR-0117-2026-12-01-2'));
    expect(firstAfter.equals(firstBefore)).toBe(true);
    expect(readdirSync(join(dirname(file), 'reports')).sort()).toEqual([
      'DEMO-GR-0117-2026-12-01',
      'DEMO-GR-0117-2026-12-01-2',
      'DEMO-GR-0117-2026-12-01-2.zip',
      'DEMO-GR-0117-2026-12-01.zip',
      'DEMO-GR-0117-2026-12-02',
      'DEMO-GR-0117-2026-12-02.zip',
    ]);
  });

  it('hostile text in the case file stays text in report.html, and its photo is embedded', async () => {
    const file = copyToTemp(join(DATA, 'hostile.yaml'));
    mkdirSync(join(dirname(file), 'photos'));
    writeFileSync(join(dirname(file), 'photos', 'a b (1).png'), TINY_PNG);
    expect((await cli(['report', file])).code).toBe(0);
    // The id <script>alert('id')</script> made safe for a file name: each run of other characters one dash, none at the ends.
    expect(readdirSync(join(dirname(file), 'reports')).sort()).toEqual(['script-alert-id-script-2026-12-01', 'script-alert-id-script-2026-12-01.zip']);
    const html = readFileSync(join(dirname(file), 'reports', 'script-alert-id-script-2026-12-01', 'report.html'), 'utf8');
    expect(html).not.toMatch(/<(script|iframe|object|embed)\b/i);
    // The only links are the first page's, to the report's own headings.
    for (const a of html.matchAll(/<a\b[^>]*>/gi)) expect(a[0]).toMatch(/^<a href="#[a-z0-9-]+">$/);
    // The one image is the photo, with only these attributes (the caption's "onerror=" is inside alt, escaped).
    expect(html.match(/<img\b/g)).toHaveLength(1);
    expect(html).toMatch(/<img class="photo" src="data:image\/png;base64,[A-Za-z0-9+/=]+" alt="Photo 1: &lt;img src=x onerror=alert\(8\)&gt; caption">/);
    expect(html).toContain('&lt;script&gt;alert(1)&lt;/script&gt;');
    expect(html).toContain('&lt;img src=x onerror=alert(1)&gt;');
    expect(html).toContain(`src="data:image/png;base64,${TINY_PNG.toString('base64')}"`);
  });

  it("a photo missing on disk stops the report with the photo's line and exit status 2, writing nothing", async () => {
    const file = copyToTemp(join(DATA, 'hostile.yaml'));
    const run = await cli(['report', file]);
    expect(run.code).toBe(2);
    expect(run.err).toMatch(/hostile\.yaml:37:15 observed\.photos\[0\]\.path: no photo file at "photos\/a b \(1\)\.png"/);
    expect(run.err).toMatch(/1 problem in .*hostile\.yaml; nothing was written\./);
    expect(existsSync(join(dirname(file), 'reports'))).toBe(false);
  });

  it('a photo path out of the case folder is refused when the case is read', async () => {
    const file = copyToTemp(SAMPLE);
    writeFileSync(file, readFileSync(file, 'utf8') + '  photos:\n    - { path: ../../etc/passwd.jpg }\n');
    const run = await cli(['report', file]);
    expect(run.code).toBe(2);
    expect(run.err).toMatch(/observed\.photos\[0\]\.path: "\.\.\/\.\.\/etc\/passwd\.jpg" points outside the case folder/);
  });

  it('a site template sets the header and sign-off, and the cautions are added when it leaves them out', async () => {
    const file = copyToTemp(SAMPLE);
    const template = join(dirname(file), 'site.md');
    writeFileSync(template, '# ACME Works: incident {{case.id}}\n\nDistribution: plant manager, insurer\n\n{{section:summary}}\n\nSigned: ________\n');
    expect((await cli(['report', file, '--template', template])).code).toBe(0);
    const md = readFileSync(join(dirname(file), 'reports', 'DEMO-GR-0117-2026-12-01', 'report.md'), 'utf8');
    expect(md).toMatch(/^# ACME Works: incident DEMO-GR-0117\n\nDistribution: plant manager, insurer\n\n## Incident finding\n/);
    expect(md).toMatch(/Signed: ________\n\n## Cautions\n/);
    expect(md).not.toContain('## The incident');
  });

  it('a template with an unknown placeholder is refused with its line, exit status 2, and nothing is written', async () => {
    const file = copyToTemp(SAMPLE);
    const template = join(dirname(file), 'site.md');
    writeFileSync(template, '# Report\n\n{{case.nonsense}}\n');
    const run = await cli(['report', file, '--template', template]);
    expect(run.code).toBe(2);
    expect(run.err).toMatch(/site\.md:3:1: unknown placeholder \{\{case\.nonsense\}\}/);
    expect(existsSync(join(dirname(file), 'reports'))).toBe(false);
  });

  it('a template file that is not there is a clear error with exit status 2', async () => {
    const run = await cli(['report', copyToTemp(SAMPLE), '--template', '/nonexistent/site.md']);
    expect(run.code).toBe(2);
    expect(run.err).toMatch(/^\/nonexistent\/site\.md: cannot read the report template \(no such file\)/);
  });
});
