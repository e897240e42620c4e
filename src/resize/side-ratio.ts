import type { SideName } from '../model/shaft-model.ts';
import type { SideResult } from '../physics/energy-method.ts';
import type { Results } from '../results/results.ts';

/** The side of a result by name. */
export function sideOf(r: Pick<Results, 'sides'>, side: SideName): SideResult {
  return r.sides.find((s) => s.side === side)!;
}

/** The highest stress / shear yield on one side of a result. */
export function sideYieldRatio(r: Pick<Results, 'sides'>, side: SideName): number {
  return Math.max(...sideOf(r, side).pieces.map((p) => p.yieldRatio));
}

/** The highest stress / shear yield of one segment's pieces on a side; undefined if it has none there. */
export function segmentYieldRatio(r: Pick<Results, 'sides'>, side: SideName, segment: number): number | undefined {
  const ratios = sideOf(r, side)
    .pieces.filter((p) => p.piece.segment.index === segment)
    .map((p) => p.yieldRatio);
  return ratios.length > 0 ? Math.max(...ratios) : undefined;
}

/** The highest stress / shear yield on a side outside one segment (0 when the segment is the whole run). */
export function othersYieldRatio(r: Pick<Results, 'sides'>, side: SideName, segment: number): number {
  return Math.max(
    0,
    ...sideOf(r, side)
      .pieces.filter((p) => p.piece.segment.index !== segment)
      .map((p) => p.yieldRatio),
  );
}

/** Indices of the segments a side's run goes through, in order from the stop. */
export function sideSegments(side: SideResult): number[] {
  return [...new Set(side.pieces.map((p) => p.piece.segment.index))];
}
