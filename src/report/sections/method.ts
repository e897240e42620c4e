import { show, sig } from '../../views/display-units.ts';
import { bulletList, escapeMarkdown } from '../markdown-text.ts';
import type { ReportSection } from '../report-context.ts';

/** How the numbers were obtained, and every assumption, in words. */
export const methodSection: ReportSection = {
  id: 'method',
  title: 'Appendix: method and assumptions',
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
    const stop =
      c.stop.duration > 0
        ? `The case states the stop took ${sig(c.stop.duration * 1000)} ms; the method still treats it as instantaneous, which overestimates the torque.`
        : 'The stop is taken as instantaneous: the shaft is held at the stop while the parts keep turning.';
    const tolerances = Object.keys(c.tolerances);
    const assumptions = [
      'The stop splits the shaft into two sides. On each side that carries parts, all of their kinetic energy at the moment of the stop, ½·J·ω², goes into elastic twist of the run of shaft between the stop and the farthest loaded station.',
      'That run of shaft is a spring of compliance C = Σ L/(G·J_p), summed over its pieces in series; storing the energy E takes a peak torque T = √(2E/C), and every piece carries that same torque.',
      "Each piece's stress is the outer-fibre shear stress τ = T·(d/2)/J_p, multiplied by the segment's stress-concentration factor kt where the case gives one; its twist is T·L/(G·J_p).",
      stop,
      `The shaft itself is taken as massless, as in the hand method: its own kinetic energy is left out (${shaftEnergy.join('; ')}).`,
      'Parts are rigid and fixed to the shaft; keys, hubs, belts and couplings do not slip and absorb nothing; nothing is lost to friction or to the jammed material. Each of these would lower the torque, so the result leans to the high side.',
      "In the elastic method the material stays linear-elastic, so a stress above shear yield means only that yield was reached. Past yield, the energy balance takes over: the real stress is capped by the material, the torque by the section's fully plastic torque, and the rest of the energy goes into permanent twist (see the findings).",
      `Stress is compared with shear yield by ${criterion}.`,
      r.uncertainty
        ? `The case states tolerances on ${tolerances.join(', ') || 'no field (the material strengths are varied by their basis)'}; the single run uses the nominal values, and a seeded Monte Carlo of ${r.uncertainty.samples} samples carries the bands through (see How sure the finding is).`
        : tolerances.length > 0
          ? `The case states tolerances on ${tolerances.join(', ')}; the numbers are for the nominal values (the Monte Carlo was switched off).`
          : 'The case states no tolerances; the numbers are for the nominal values.',
    ];
    const pastYield = r.plastic.assumptions.length > 0 ? `\n\n**Past yield:**\n\n${bulletList(r.plastic.assumptions.map(escapeMarkdown))}` : '';
    const warnings =
      r.warnings.length > 0 ? `**Warnings about the model's fit to this case:**\n\n${bulletList(r.warnings.map(escapeMarkdown))}` : "The engine raised no warnings about the model's fit to this case.";
    return `${escapeMarkdown('The numbers come from the elastic energy method for a sudden stop and, past yield, from the energy balance with elastic–plastic torsion of each piece.')}\n\n${bulletList(assumptions.map(escapeMarkdown))}${pastYield}\n\n${warnings}`;
  },
};
