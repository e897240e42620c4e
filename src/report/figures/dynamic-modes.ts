import type { Results } from '../../results/results.ts';
import { modeShapeData } from '../../views/dynamic-figure-data.ts';
import type { ReportFigure } from './report-figure.ts';
import { lineFigureSvg } from './line-figure.ts';

/** Shapes of the lowest three natural modes along the shaft, the stop held. */
export function dynamicModesFigure(r: Results): ReportFigure {
  const title = 'Mode shapes of the lowest three modes, stop held';
  const caption =
    'Relative angular amplitude of each node along the shaft in the lowest three modes, with the stop station held (amplitude 0 there) and belts and limiters sticking. A mode belongs to one side of the stop.';
  return { name: 'dynamic-modes', title, caption, svg: lineFigureSvg(modeShapeData(r), title, caption, { markers: true }) };
}
