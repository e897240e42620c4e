import { show, sig } from '../../views/display-units.ts';
import { bulletList, escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';

/** How the numbers were obtained, and every assumption, in words. */
export const methodSection: ReportSection = {
  id: 'method',
  title: 'Method and assumptions',
  render({ results: r }) {
    const c = r.case;
    const u = c.units;
    const criterion =
      c.analysis.criterion === 'max-shear'
        ? 'the maximum-shear criterion, shear yield = 0.5 × tensile yield (the more cautious of the two)'
        : 'the distortion-energy criterion, shear yield = tensile yield / √3 ≈ 0.577 × tensile yield';
    const shaftEnergy = r.sides.map((s) =>
      s.shaftKineticEnergy === undefined ? `side ${s.side}: not known (a shaft material has no density)` : `side ${s.side}: ${show(s.shaftKineticEnergy, 'energy', u)}`,
    );
    const stop = c.stop.duration > 0 ? `The case states the stop took ${sig(c.stop.duration * 1000)} ms; the method still treats it as instantaneous, which overestimates the torque.` : 'The stop is taken as instantaneous: the shaft is held at the stop while the parts keep turning.';
    const tolerances = Object.keys(c.tolerances);
    const assumptions = [
      'The stop splits the shaft into two sides. On each side that carries parts, all of their kinetic energy at the moment of the stop, ½·J·ω², goes into elastic twist of the run of shaft between the stop and the farthest loaded station.',
      'That run of shaft is a spring of compliance C = Σ L/(G·J_p), summed over its pieces in series; storing the energy E takes a peak torque T = √(2E/C), and every piece carries that same torque.',
      'Each piece\'s stress is the outer-fibre shear stress τ = T·(d/2)/J_p, multiplied by the segment\'s stress-concentration factor kt where the case gives one; its twist is T·L/(G·J_p).',
      stop,
      `The shaft itself is taken as massless, as in the hand method: its own kinetic energy is left out (${shaftEnergy.join('; ')}).`,
      'Parts are rigid and fixed to the shaft; keys, hubs, belts and couplings do not slip and absorb nothing; nothing is lost to friction or to the jammed material. Each of these would lower the torque, so the result leans to the high side.',
      'The material stays linear-elastic. A stress above shear yield therefore means only that yield was reached: the real stress is capped by the material, and the rest of the energy goes into permanent twist.',
      `Stress is compared with shear yield by ${criterion}.`,
      tolerances.length > 0
        ? `The case states tolerances on ${tolerances.join(', ')}; this version reports the nominal values and does not carry the bands through.`
        : 'The case states no tolerances; the numbers are for the nominal values.',
    ];
    const warnings = r.warnings.length > 0 ? `**Warnings about the model's fit to this case:**\n\n${bulletList(r.warnings.map(escapeMarkdown))}` : 'The engine raised no warnings about the model\'s fit to this case.';
    return `${escapeMarkdown('The numbers come from the elastic energy method for a sudden stop.')}\n\n${bulletList(assumptions.map(escapeMarkdown))}\n\n${warnings}`;
  },
};
