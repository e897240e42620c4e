import { describe, expect, it } from 'vitest';
import { recommendationsSection } from '../../../src/report/sections/recommendations.ts';
import { fixture, RUN } from '../report-fixtures.ts';

describe('recommendationsSection', () => {
  const f = fixture('sample');
  const ctx = { results: f.results, run: RUN, source: f.source };

  it('without recommenders it says what the investigator completes, and repeats the return-to-service caution for a yielded shaft', () => {
    const md = recommendationsSection([]).render(ctx)!;
    expect(md).toMatch(/^\*This version of shaftcase computes no recommendation\. The investigator completes this section: the replacement shaft/);
    expect(md).toMatch(/not returned to service on a calculation alone\.$/);
  });

  it('shows each recommender\'s paragraph in order, skipping those with nothing to say', () => {
    const md = recommendationsSection([() => 'Fit a torque limiter.', () => undefined, (c) => `Speed was ${c.results.case.meta.id}.`]).render(ctx);
    expect(md).toBe('Fit a torque limiter.\n\nSpeed was DEMO-GR-0117.');
  });
});
