import { describe, expect, it } from 'vitest';
import { guardingRecommendations, hasWheel, jamWasForeignMatter } from '../../src/resize/guarding.ts';
import type { Case } from '../../src/case/case.ts';

const rpm = (n: number) => (n * 2 * Math.PI) / 60;
type Machine = Pick<Case, 'meta' | 'stations'>;
const part = (name: string, ratedSpeed?: number) => ({ name, ratedSpeed }) as Case['stations'][number]['parts'][number];
const machine = (notes: string, parts: ReturnType<typeof part>[] = []): Machine => ({ meta: { id: 'X', notes }, stations: [{ name: 'arbor', at: 0, parts }] });
const text = (m: Machine, wheels: Parameters<typeof guardingRecommendations>[1] = []) =>
  guardingRecommendations(m, wheels)
    .map((g) => `${g.topic}: ${g.text}`)
    .join('\n');

describe('the guarding recommendations', () => {
  it("always cover guards, the jam's cause under lockout, the restart and the codes, in the trade's words", () => {
    const t = text(machine('A lump of set cement wedged the flight.'));
    expect(t).toMatch(/guard over exposed rotating parts .* before the machine is restarted/);
    expect(t).toMatch(/Find and deal with what jammed the machine .* locked out and tagged out/);
    expect(t).toMatch(/Restart to a written procedure: the locks and tags are removed only by the people who put them on/);
    expect(t).toMatch(/defer to local codes .* machine builder's instructions/);
  });

  it('give the tramp-metal advice only where the case says the jam was foreign matter', () => {
    expect(text(machine('A 16 mm bolt went into the feed throat.'))).toMatch(/Foreign matter: .* magnet, screen or metal detector/);
    expect(text(machine('A lifting bar left in the trough after cleaning jammed the paddles.'))).toMatch(/count tools and loose parts out and back in/);
    // The machine's own product, a loose part of the machine, a screw conveyor's own screw: none is foreign matter.
    for (const notes of ['Screw conveyor jammed on a lump of set cement.', 'The impeller worked loose on its hub and jammed against the inlet cone.', 'The strip tail folded into a cobble.']) {
      expect(jamWasForeignMatter({ meta: { id: 'X', notes } })).toBe(false);
      expect(text(machine(notes))).not.toMatch(/tramp metal|metal detector/);
    }
  });

  it('give the wheel advice only where the case has a wheel, saw or blade, by its marked speed or its name', () => {
    expect(text(machine('jam', [part('knife rotor')]))).not.toMatch(/abrasive wheel|ring-tested/);
    expect(hasWheel(machine('jam', [part('steel flywheel')]))).toBe(false);
    expect(hasWheel(machine('jam', [part('saw blade')]))).toBe(true);
    expect(hasWheel(machine('jam', [part('cup', rpm(6000))]))).toBe(true);
    expect(text(machine('jam', [part('saw blade')]))).toMatch(/stopped violently is taken off and inspected .* ring-tested where that is the practice .* never run above the speed marked on it/);
  });

  it("checks each marked wheel's incident speed against its marking", () => {
    const m = machine('jam', [part('saw', rpm(4400))]);
    const [over] = guardingRecommendations(m, [{ station: 'arbor', part: 'saw', speed: rpm(4800), ratedSpeed: rpm(4400), over: true }]).filter((g) => g.topic.startsWith('Marked speed'));
    expect(over.text).toMatch(/ran at 4800 rpm at the incident, above the 4400 rpm marked on it\. Scrap it/);
    const [ok] = guardingRecommendations(m, [{ station: 'arbor', part: 'saw', speed: rpm(3000), ratedSpeed: rpm(4400), over: false }]).filter((g) => g.topic.startsWith('Marked speed'));
    expect(ok.text).toMatch(/within the 4400 rpm marked on it/);
  });
});
