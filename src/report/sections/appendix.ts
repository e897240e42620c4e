import { codeBlock, escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';

/** Traceability: the tool, the run, the case file's hash and its full text as given. */
export const appendixSection: ReportSection = {
  id: 'appendix',
  title: 'Appendix: inputs as given',
  render({ run, source }) {
    const table = [
      '| traceability | |',
      '| :--- | :--- |',
      `| Tool | shaftcase ${escapeMarkdown(run.version)} |`,
      `| Run | ${run.iso} |`,
      `| Case file | ${escapeMarkdown(source.file)} |`,
      `| SHA-256 of the case file | \`${source.sha256}\` |`,
    ].join('\n');
    const files = escapeMarkdown(
      "The report folder also holds results.json (every number at full precision, SI, with the inputs as parsed), the tables above as CSV files in the tables folder (full precision, in the units shown) and each figure as an SVG file in the figures folder; the zip beside it adds the case file, its photos and MANIFEST.txt with every file's SHA-256.",
    );
    return `${table}\n\n${files}\n\n**The case file as given:**\n\n${codeBlock(source.text, 'yaml')}`;
  },
};
