import { FORMULA_SOURCES } from '../../physics/formula-sources.ts';
import { bulletList, escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';

/** Where every formula and every material value comes from. */
export const sourcesSection: ReportSection = {
  id: 'sources',
  title: 'Appendix: materials and sources',
  render({ results: r }) {
    const formulas = FORMULA_SOURCES.map((f) => escapeMarkdown(`${f.what}: ${f.formula}. ${f.source}.`));
    const materials = Object.values(r.case.materials)
      .sort((a, b) => a.key.localeCompare(b.key))
      .map((m) => escapeMarkdown(`${m.name} (${m.key}): ${m.source}.`));
    const note = escapeMarkdown('"From memory" marks a value recalled rather than read from the printed source; check it there before relying on it.');
    return ['**Formulas**', bulletList(formulas), '**Material values**', bulletList(materials), note].join('\n\n');
  },
};
