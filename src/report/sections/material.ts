import { escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';
import { materialTable } from '../tables/material-table.ts';
import { markdownTable } from '../tables/report-table.ts';

/** Each segment's stress against its material's shear yield and ultimate shear estimate. */
export const materialSection: ReportSection = {
  id: 'material',
  title: 'Comparison with the material',
  render({ results: r }) {
    const used = [...new Set(r.case.shaft.segments.map((s) => s.material))].map((k) => r.case.materials[k]);
    const basis = used.map(
      (m) => `${m.name}: ${m.strengthBasis === 'typical' ? 'typical (mean) strengths' : m.strengthBasis === 'minimum' ? 'published minimum strengths' : 'strengths as given in the case'}`,
    );
    const notes = escapeMarkdown(
      `Shear yield follows the case's criterion (${r.case.analysis.criterion}). The ultimate shear strength is estimated as 0.67 × the tensile strength, an estimate for steels; for cast irons and aluminium take it as indicative only. Strength basis: ${basis.join('; ')}. A real bar is usually stronger than its published minimum, which matters when reading damage back.`,
    );
    return `${markdownTable(materialTable(r))}\n\n${notes}`;
  },
};
