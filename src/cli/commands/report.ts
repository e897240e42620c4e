import { readFileSync } from 'node:fs';
import { basename } from 'node:path';
import { CaseError } from '../../case/case-error.ts';
import { ChromiumMissing, printPdf } from '../../io/chromium.ts';
import { loadCase } from '../../io/load-case.ts';
import { packageFile } from '../../io/package-files.ts';
import { readPhotos } from '../../io/read-photos.ts';
import { writeReport, type ReportFile } from '../../io/write-report.ts';
import { buildReportData } from '../../report/build-report-data.ts';
import { drawFigures } from '../../report/draw-figures.ts';
import { figureHref, photoHref, tableHref } from '../../report/layout.ts';
import { renderHtml } from '../../report/render-html.ts';
import { renderReport } from '../../report/render-report.ts';
import { reportJson } from '../../report/report-json.ts';
import { runInfo } from '../../report/run-info.ts';
import { reportTablesCsv } from '../../report/tables-csv.ts';
import { findingSentence } from '../../views/finding-words.ts';
import { withAssetHistory } from '../asset-history.ts';
import { screenInputs } from '../input-warnings.ts';
import type { Io } from '../io.ts';
import { version } from '../version.ts';
import { findingToJson } from '../../views/finding-json.ts';
import { SCHEMA_VERSION } from '../../views/schema-version.ts';
import { terminalProgress } from '../progress.ts';

export interface ReportOptions {
  template?: string;
  pdf?: boolean;
  /** Monte Carlo samples and seed, as `check` takes them. */
  samples?: number;
  seed?: number;
  /** Design factor for what goes back in, as `resize` takes it. */
  factor?: number;
  /** Plausibility warnings become errors (exit 2), as for `check`. */
  strict?: boolean;
  /** The site's materials catalogue (else materials.yaml up the tree). */
  materials?: string;
  /** Print what was written as one JSON object instead of lines. */
  json?: boolean;
}

/** `shaftcase report CASE`: a new dated report folder and its zip beside the case. */
export async function reportCommand(path: string, opts: ReportOptions, io: Io, now: Date): Promise<void> {
  const loaded = loadCase(path, { materials: opts.materials });
  const inputWarnings = screenInputs(loaded, opts.strict, io);
  // What is read from disk first, so a missing template or photo is reported before any computing.
  const template = readTemplate(opts.template);
  const photos = readPhotos(loaded.file, loaded.text, loaded.case.observed.photos);
  // Everything the report shows is computed here, once; rendering only reads it.
  const computed = buildReportData(loaded.case, {
    samples: opts.samples,
    seed: opts.seed,
    factor: opts.factor,
    onDynamicProgress: terminalProgress('Dynamic model under the tolerances'),
    inputWarnings,
  });
  // A case of an asset: its place in the history, from the cases around it.
  const data = { ...computed, results: withAssetHistory(loaded, computed.results) };
  const { results } = data;
  const run = runInfo(now, version());
  const source = { file: basename(loaded.file), text: loaded.text, sha256: loaded.sha256 };

  const figures = drawFigures(data);
  const markdown = renderReport(data, { run, source, figures, template });
  const meta = loaded.case.meta;
  const html = renderHtml(markdown, {
    title: `${meta.id}${meta.title ? ` ${meta.title}` : ''}: investigation report`,
    pageFooter: `${meta.id} · ${run.date}`,
    figures: Object.fromEntries(figures.map((f) => [figureHref(f.figure.name), f.figure.svg])),
    images: Object.fromEntries(photos.filter((p) => p.mediaType).map((p) => [photoHref(p.photo.path), `data:${p.mediaType};base64,${Buffer.from(p.data).toString('base64')}`])),
  });
  const files: ReportFile[] = [
    { path: 'report.md', data: markdown },
    { path: 'report.html', data: html },
    { path: 'results.json', data: JSON.stringify(reportJson(data, run, source), null, 2) + '\n' },
    ...figures.map((f) => ({ path: figureHref(f.figure.name), data: f.figure.svg })),
    ...reportTablesCsv(results).map((t) => ({ path: tableHref(t.name), data: t.csv })),
  ];
  if (opts.pdf) {
    try {
      files.push({ path: 'report.pdf', data: await printPdf(html, loaded.case.units === 'us' ? 'Letter' : 'A4') });
    } catch (e) {
      // A missing or failing browser costs the PDF, never the report.
      const why = e instanceof ChromiumMissing ? e.message : `Chromium could not print it (${String((e as Error).message).split('\n')[0]})`;
      io.err(`report.pdf not written: ${why}. The rest of the report is written; print report.html from a browser instead.\n`);
    }
  }

  const written = await writeReport({
    caseFile: loaded.file,
    caseText: loaded.text,
    photos,
    files,
    caseId: loaded.case.meta.id,
    date: run.date,
    ranAt: now,
    ...(loaded.site ? { siteCatalogue: loaded.site.text } : {}),
  });
  if (opts.json) {
    const report = { folder: written.folder, zip: written.zip, files: files.map((f) => f.path), open: `${written.folder}/report.html` };
    io.out(JSON.stringify({ schema_version: SCHEMA_VERSION, report, finding: findingToJson(results.finding, results.case.units) }, null, 2) + '\n');
    return;
  }
  const lines = [`Wrote the report ${written.folder}/`, ...files.map((f) => `  ${f.path}`)];
  lines.push(
    `Wrote the bundle for the ticket ${written.zip} (the report, the case file, ${loaded.site ? 'the materials catalogue, ' : ''}${photos.length} photo${photos.length === 1 ? '' : 's'}, MANIFEST.txt)`,
  );
  lines.push(`Open ${written.folder}/report.html`);
  lines.push(`Finding: ${findingSentence(results.finding, results.case.units)}`);
  io.out(lines.join('\n') + '\n');
}

function readTemplate(file: string | undefined): { text: string; file: string } {
  const path = file ?? packageFile('templates/report.md');
  try {
    return { text: readFileSync(path, 'utf8'), file: path };
  } catch (e) {
    const why = (e as NodeJS.ErrnoException).code === 'ENOENT' ? 'no such file' : (e as Error).message;
    throw new CaseError(path, [{ code: 'E_FILE', path: '', message: `cannot read the report template (${why}); give a Markdown file, such as a copy of templates/report.md` }]);
  }
}
