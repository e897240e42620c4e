import type { PieceResult } from '../../physics/energy-method.ts';
import { shearUltimate, shearYield } from '../../physics/shear-strength.ts';
import type { Results } from '../../results/results.ts';
import { inDisplay, unitLabel } from '../../views/display-units.ts';
import { segmentName } from './pieces-table.ts';
import type { Cell, ReportTable } from './report-table.ts';

/** How a stress compares with the material, in words. */
export function stressReading(ratioToYield: number, ratioToUltimate: number | undefined): string {
  if (ratioToUltimate !== undefined && ratioToUltimate >= 1) return 'above ultimate (est.)';
  if (ratioToYield >= 1) return 'above yield';
  return 'below yield';
}

/**
 * For each segment, its highest stress under load against the material's shear yield (the case's
 * criterion) and the ultimate shear estimate 0.67·S_ut (`shearUltimate`, an estimate for steels).
 */
export function materialTable(r: Results): ReportTable {
  const u = r.case.units;
  const pieces = r.sides.flatMap((s) => s.pieces);
  const rows: Cell[][] = r.case.shaft.segments.map((seg) => {
    const material = r.case.materials[seg.material];
    const mine = pieces.filter((p) => p.piece.segment === seg);
    const worst = mine.reduce<PieceResult | undefined>((a, b) => (a === undefined || b.yieldRatio > a.yieldRatio ? b : a), undefined);
    const tauY = worst?.shearYield ?? shearYield(material.yieldStrength!, r.case.analysis.criterion);
    const tauU = material.tensileStrength === undefined ? undefined : shearUltimate(material.tensileStrength);
    const toUltimate = worst && tauU !== undefined ? worst.shearStress / tauU : undefined;
    return [
      segmentName(seg),
      material.name,
      worst ? inDisplay(worst.shearStress, 'stress', u) : null,
      inDisplay(tauY, 'stress', u),
      worst ? worst.yieldRatio : null,
      tauU === undefined ? null : inDisplay(tauU, 'stress', u),
      toUltimate ?? null,
      worst ? stressReading(worst.yieldRatio, toUltimate) : 'carries no torque',
    ];
  });
  return {
    name: 'material',
    title: 'Stress against the material',
    columns: [
      { label: 'segment' },
      { label: 'material' },
      { label: 'highest shear stress', unit: unitLabel('stress', u) },
      { label: 'shear yield', unit: unitLabel('stress', u) },
      { label: 'stress / yield' },
      { label: 'ultimate shear, est.', unit: unitLabel('stress', u) },
      { label: 'stress / ultimate' },
      { label: 'reading' },
    ],
    rows,
  };
}
