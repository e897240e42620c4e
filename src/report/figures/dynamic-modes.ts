import type { Results } from '../../results/results.ts';
import { modeShapeData } from '../../views/dynamic-figure-data.ts';
import type { Figure } from './figure.ts';
import { lineFigureSvg } from './line-figure.ts';

/** Shapes of the lowest three natural modes along the shaft, the stop held. */
export function dynamicModesFigure(r: Results): Figure {
  return {
    name: 'dynamic-modes',
    title: 'Mode shapes of the lowest three modes, stop held',
    caption: 'Relative angular amplitude of each node along the shaft in the lowest three modes, with the stop station held (amplitude 0 there) and belts and limiters sticking. A mode belongs to one side of the stop.',
    svg: lineFigureSvg(modeShapeData(r), { markers: true }),
  };
}
