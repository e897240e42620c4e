// What the report holds, in order. Adding a section, a figure, a table or a recommendation is one
// line here (and its own small file): see DEVELOPERS.md, "Adding a report section or figure".
import type { ReportSection } from './report-context.ts';
import type { FigureDrawer } from './figures/report-figure.ts';
import type { ReportTable } from './tables/report-table.ts';
import type { Results } from '../results/results.ts';
import { summarySection } from './sections/summary.ts';
import { incidentSection } from './sections/incident.ts';
import { machineSection } from './sections/machine.ts';
import { methodSection } from './sections/method.ts';
import { resultsSection } from './sections/results-per-side.ts';
import { materialSection } from './sections/material.ts';
import { observationsSection } from './sections/observations.ts';
import { findingsSection } from './sections/findings.ts';
import { recommendationsSection, type Recommender } from './sections/recommendations.ts';
import { cautionsSection } from './sections/cautions.ts';
import { sourcesSection } from './sections/sources.ts';
import { appendixSection } from './sections/appendix.ts';
import { shaftSchematicFigure } from './figures/shaft-schematic.ts';
import { energyShareFigure } from './figures/energy-share.ts';
import { stressAlongShaftFigure } from './figures/stress-along-shaft.ts';
import { stressVsSpeedFigure } from './figures/stress-vs-speed.ts';
import { partsTable } from './tables/parts-table.ts';
import { segmentsTable } from './tables/segments-table.ts';
import { sidesTable } from './tables/sides-table.ts';
import { piecesTable } from './tables/pieces-table.ts';
import { materialTable } from './tables/material-table.ts';

/** Recommendations, in order; while none says anything the section shows what the investigator fills in. */
export const RECOMMENDERS: readonly Recommender[] = [];

/** The report's sections, in order. The template places them (`{{sections}}` or `{{section:ID}}`). */
export const REPORT_SECTIONS: readonly ReportSection[] = [
  summarySection,
  incidentSection,
  machineSection,
  methodSection,
  resultsSection,
  materialSection,
  observationsSection,
  findingsSection,
  recommendationsSection(RECOMMENDERS),
  cautionsSection,
  sourcesSection,
  appendixSection,
];

/** The figures, numbered in this order, each shown at the end of the section named beside it. */
export const REPORT_FIGURES: readonly { section: string; draw: FigureDrawer }[] = [
  { section: 'machine', draw: shaftSchematicFigure },
  { section: 'machine', draw: energyShareFigure },
  { section: 'results', draw: stressAlongShaftFigure },
  { section: 'results', draw: stressVsSpeedFigure },
];

/** The tables written to `tables/NAME.csv` (the sections show the same tables rounded). */
export const REPORT_TABLES: readonly ((r: Results) => ReportTable)[] = [partsTable, segmentsTable, sidesTable, piecesTable, materialTable];
