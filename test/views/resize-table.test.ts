import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case/parse-case.ts';
import { CAUTIONS } from '../../src/results/cautions.ts';
import { analyseCase } from '../../src/results/analyse-case.ts';
import { resizeCase } from '../../src/resize/resize-case.ts';
import { renderResize } from '../../src/views/resize-table.ts';
import { caseText, type Layout } from '../helpers/layout.ts';
import { withFinding } from '../../src/finding/investigation.ts';

const render = (text: string) => {
  const c = parseCase(text);
  return renderResize(resizeCase(c, withFinding(analyseCase(c))));
};
const layout = (drive?: string): Layout => ({
  rpm: 300,
  segments: [
    [200, 40, 0, 1.5],
    [300, 50, 0],
  ],
  stations: [
    ['pulley', 0, 2, drive && `    drive: ${drive}`],
    ['jam', 500, 0],
  ],
  stop: 'jam',
});

describe('the terminal output of shaftcase resize', () => {
  it('shows the options side by side, each option in words, the guarding and the cautions', () => {
    const out = render(readFileSync(new URL('../../sample-cases/granulator-tramp-metal.yaml', import.meta.url), 'utf8'));
    for (const row of ['Present shaft', 'Scale side A', 'Resize "sheave seat" only', 'Material ', 'Torque limiter at "drive sheave"', 'Key as fuse at "drive sheave"']) expect(out).toContain(row);
    expect(out).toMatch(/Design factor N = 1\.5 .* N is the engineer's choice: confirm it against the site's rules/);
    expect(out).toMatch(/no practical shaft survives a repeat of this incident elastically\. The remedy is to limit the torque/);
    expect(out).toMatch(/No size of "sheave seat" .* alone keeps side A within the factor/);
    expect(out).toMatch(/a key is a poor and unpredictable fuse/);
    expect(out).toMatch(/bearings, hubs, keyways and fits must be rechecked/);
    // The granulator has no wheel: no wheel advice; its jam was a tramp bolt: the tramp-metal advice.
    expect(out).not.toMatch(/ring-tested/);
    expect(out).toMatch(/Foreign matter: .* metal detector/);
    // Its limiter fails its own factor (the instantaneous stop's wave), so no option alone is picked, and the flags say why;
    // the combination picked is the limiter at the middle of its window, with the order of giving way behind it.
    expect(out).toMatch(
      /Recommended: fit a torque limiter at "drive sheave" set at 2140 N·m, the middle of its window 1500 N·m to 3030 N·m, on a shaft of the present sizes and material; behind it the shaft in "sheave seat" gives way at 2\.13 × the setting, the key at "drive sheave" at 2\.73 ×\./,
    );
    expect(out).toMatch(/Limiter at "drive sheave", stated setting \(recommended\) +set 2140 N·m; present shaft +0\.482 /);
    expect(out).toMatch(/\nCombined options\n  Made where no option alone passes: a torque limiter/);
    expect(out).toMatch(/The rule: The pick is the least change/);
    expect(out).toMatch(/- Torque limiter at "drive sheave": fails its own design factor: .* 0\.717, above the 0\.667/);
    for (const c of CAUTIONS) expect(out).toContain(c);
  });

  it('says plainly when the limiter window is empty', () => {
    const out = render(caseText(layout('{ running_torque: 1500 N*m }')));
    expect(out).toMatch(/THE WINDOW IS EMPTY: the running torque 1500 N·m × service factor 1\.5 = 2250 N·m exceeds the shaft's allowable torque/);
    expect(out).toMatch(/No limiter setting both runs the machine and protects this shaft/);
    expect(out).toMatch(/NONE: window empty/);
  });

  it('says what to add when the running torque is unknown', () => {
    const out = render(caseText(layout()));
    expect(out).toMatch(/The lower end is unknown: the case gives no running torque\. Add drive: \{ power: "22 kW" \}/);
  });

  it('shows US cases in inches and lbf·ft, stock sizes as fractions', () => {
    const out = render(readFileSync(new URL('../../sample-cases/screw-conveyor-jam-us.yaml', import.meta.url), 'utf8'));
    expect(out).toMatch(/stock 3 1\/4 in/);
    expect(out).toMatch(/lbf·ft/);
  });
});
