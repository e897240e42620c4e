import { escapeMarkdown } from '../markdown-text.ts';
import type { ReportContext, ReportSection } from '../report-context.ts';

/** One recommendation in Markdown from the results, or undefined when it has nothing to say. */
export type Recommender = (ctx: ReportContext) => string | undefined;

/**
 * The recommendations section: each recommender (listed in src/report/registry.ts) adds its
 * paragraph; while none has anything to say, the section says what the investigator completes.
 */
export function recommendationsSection(recommenders: readonly Recommender[]): ReportSection {
  return {
    id: 'recommendations',
    title: 'Recommendations',
    render(ctx) {
      const given = recommenders.map((rec) => rec(ctx)).filter((t): t is string => t !== undefined && t.trim() !== '');
      if (given.length > 0) return given.join('\n\n');
      const placeholder = escapeMarkdown(
        'This version of shaftcase computes no recommendation. The investigator completes this section: the replacement shaft (material, diameters, keys and hubs), whether a torque limiter or shear pin belongs in the drive, and the return-to-service decision.',
      );
      const yielded = ctx.results.verdict === 'yielded' ? `\n\n${escapeMarkdown('A shaft that may have yielded is not returned to service on a calculation alone.')}` : '';
      return `*${placeholder}*${yielded}`;
    },
  };
}
