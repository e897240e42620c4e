import { FORMULA_SOURCES } from '../../physics/formula-sources.ts';
import { sourceWithoutFlags } from '../../views/source-words.ts';
import { bulletList, escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';

/** The mark beside a source of which some value was entered from memory, explained once below the lists. */
const MARK = ' (†)';

/** Where every formula the report used and every material value comes from: each published source named, and one line on what was entered from memory. */
export const sourcesSection: ReportSection = {
  id: 'sources',
  title: 'Appendix: materials and sources',
  render({ results: r }) {
    const line = (head: string, source: string) => {
      const s = sourceWithoutFlags(source);
      return { text: escapeMarkdown(`${head}: ${s.text}.`) + (s.fromMemory ? MARK : ''), fromMemory: s.fromMemory };
    };
    const materials = Object.values(r.case.materials)
      .sort((a, b) => a.key.localeCompare(b.key))
      .map((m) => line(`${m.name} (${m.key})`, m.source));
    // A formula of an element the case does not have is not one this report used.
    const has = { fit: r.fits.length > 0, gearbox: r.gearboxes.length > 0, 'gear teeth': r.gearboxes.some((g) => g.tooth !== undefined) };
    const formulas = FORMULA_SOURCES.filter((f) => f.only === undefined || has[f.only]).map((f) => line(`${f.what}: ${f.formula}`, f.source));
    const out = ['**Materials**', bulletList(materials.map((m) => m.text)), '**Formulas**', bulletList(formulas.map((f) => f.text))];
    if ([...materials, ...formulas].some((x) => x.fromMemory)) {
      out.push(
        escapeMarkdown(
          "(†) Entered from memory: some value or section number of this source was recalled rather than read from the printed page when it was put into the program. The program's library keeps, value by value, which ones and how sure; check them in the source named before relying on them.",
        ),
      );
    }
    return out.join('\n\n');
  },
};
