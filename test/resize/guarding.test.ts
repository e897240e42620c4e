import { describe, expect, it } from 'vitest';
import { guardingRecommendations } from '../../src/resize/guarding.ts';

const rpm = (n: number) => (n * 2 * Math.PI) / 60;

describe('the guarding recommendations', () => {
  it('cover guards, the jam\'s cause, the restart, wheels and the codes, in the trade\'s words', () => {
    const text = guardingRecommendations([]).map((g) => `${g.topic}: ${g.text}`).join('\n');
    expect(text).toMatch(/guard over exposed rotating parts .* before the machine is restarted/);
    expect(text).toMatch(/tramp material/);
    expect(text).toMatch(/Restart to a written procedure/);
    expect(text).toMatch(/stopped violently is taken off and inspected .* ring-tested where that is the practice/);
    expect(text).toMatch(/never run above the speed marked on it/);
    expect(text).toMatch(/defer to local codes .* machine builder's instructions/);
  });

  it('checks each marked wheel\'s incident speed against its marking', () => {
    const [over] = guardingRecommendations([{ station: 'arbor', part: 'saw', speed: rpm(4800), ratedSpeed: rpm(4400), over: true }]).filter((g) => g.topic.startsWith('Marked speed'));
    expect(over.text).toMatch(/ran at 4800 rpm at the incident, above the 4400 rpm marked on it\. Scrap it/);
    const [ok] = guardingRecommendations([{ station: 'arbor', part: 'saw', speed: rpm(3000), ratedSpeed: rpm(4400), over: false }]).filter((g) => g.topic.startsWith('Marked speed'));
    expect(ok.text).toMatch(/within the 4400 rpm marked on it/);
  });
});
