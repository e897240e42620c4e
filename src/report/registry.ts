// What the report holds, in order. Adding a section, a figure or a table is one line here (and its
// own small file): see DEVELOPERS.md, "Adding a report section or figure".
import type { ReportData, ReportSection } from './report-context.ts';
import type { FigureDrawer } from './figures/report-figure.ts';
import type { ReportTable } from './tables/report-table.ts';
import type { Results } from '../results/results.ts';
import { summarySection } from './sections/summary.ts';
import { incidentSection } from './sections/incident.ts';
import { machineSection } from './sections/machine.ts';
import { methodSection } from './sections/method.ts';
import { comparisonSection, resultsSection } from './sections/results-per-side.ts';
import { materialSection } from './sections/material.ts';
import { observationsSection } from './sections/observations.ts';
import { findingsSection } from './sections/findings.ts';
import { howSureSection } from './sections/how-sure.ts';
import { dynamicsSection } from './sections/dynamics.ts';
import { keysAndFitsSection } from './sections/keys-and-fits.ts';
import { driveProtectionSection } from './sections/drive-protection.ts';
import { couplingsSection } from './sections/couplings.ts';
import { gearboxesSection } from './sections/gearboxes.ts';
import { driveTrainSection } from './sections/drive-train.ts';
import { backlashSection } from './sections/backlash.ts';
import { optionsSection, recommendationsSection } from './sections/recommendations.ts';
import { fatigueSection } from './sections/fatigue.ts';
import { cautionsSection } from './sections/cautions.ts';
import { sourcesSection } from './sections/sources.ts';
import { appendixSection } from './sections/appendix.ts';
import { shaftSchematicFigure } from './figures/shaft-schematic.ts';
import { energyShareFigure } from './figures/energy-share.ts';
import { stressAlongShaftFigure } from './figures/stress-along-shaft.ts';
import { stressVsSpeedFigure } from './figures/stress-vs-speed.ts';
import { dynamicTorqueFigure } from './figures/dynamic-torque.ts';
import { dynamicSpeedsFigure } from './figures/dynamic-speeds.ts';
import { dynamicModesFigure } from './figures/dynamic-modes.ts';
import { torqueTwistFigure } from './figures/torque-twist-curve.ts';
import { permanentTwistSpeedFigures } from './figures/permanent-twist-speed.ts';
import { yieldRatioHistogramFigure } from './figures/yield-ratio-histogram.ts';
import { sensitivityFigure } from './figures/sensitivity-chart.ts';
import { yieldRatioAgainstDiameterFigure } from './figures/yield-ratio-vs-diameter.ts';
import { peakTorqueAgainstLimiterFigure } from './figures/peak-torque-vs-limiter.ts';
import { partsTable } from './tables/parts-table.ts';
import { segmentsTable } from './tables/segments-table.ts';
import { sidesTable } from './tables/sides-table.ts';
import { piecesTable } from './tables/pieces-table.ts';
import { materialTable } from './tables/material-table.ts';
import { plasticSidesTable } from './tables/plastic-sides-table.ts';
import { dynamicDamageTable } from './tables/dynamic-damage-table.ts';
import { plasticPiecesTable } from './tables/plastic-pieces-table.ts';
import { uncertaintyInputsTable } from './tables/uncertainty-inputs-table.ts';
import { uncertaintyPercentilesTable } from './tables/uncertainty-percentiles-table.ts';
import { uncertaintySensitivityTable } from './tables/uncertainty-sensitivity-table.ts';

/** The report's sections, in order. The template places them (`{{sections}}` or `{{section:ID}}`). */
export const REPORT_SECTIONS: readonly ReportSection[] = [
  summarySection,
  // The cautions next, where the people who inspect read before they start.
  cautionsSection,
  incidentSection,
  machineSection,
  resultsSection,
  materialSection,
  observationsSection,
  findingsSection,
  howSureSection,
  recommendationsSection,
  // The appendices: the other model, the full tables, the method, every option, the sources, the inputs.
  comparisonSection,
  dynamicsSection,
  // What gave way first and the hubs, where the case has keys, fits, couplings, limiters or pins
  // (the finding names the weakest element on page 1).
  driveTrainSection,
  keysAndFitsSection,
  fatigueSection,
  driveProtectionSection,
  couplingsSection,
  gearboxesSection,
  backlashSection,
  methodSection,
  optionsSection,
  sourcesSection,
  appendixSection,
];

/** Where the energy method's figures go: the body where the finding stands on it, else the comparison. */
const energyMethod = ({ results }: ReportData) => (results.finding.basis === 'energy method' ? 'results' : 'comparison');
/** Where the dynamic model's time histories go: the body where the finding stands on it, else the comparison. */
const dynamicModel = ({ results }: ReportData) => (results.finding.basis === 'dynamic model' ? 'results' : 'comparison');
/** The mode shapes: the dynamic model's details where the finding stands on it, else the comparison. */
const dynamicDetails = ({ results }: ReportData) => (results.finding.basis === 'dynamic model' ? 'dynamics' : 'comparison');

/**
 * The figures, each shown at the end of the section named beside it (or chosen for the case: the
 * finding's model's figures in the body, the other model's in the comparison appendix), numbered
 * in the order they appear.
 */
export const REPORT_FIGURES: readonly { section: string | ((data: ReportData) => string); draw: FigureDrawer }[] = [
  { section: 'machine', draw: ({ results }) => shaftSchematicFigure(results) },
  { section: 'machine', draw: ({ results }) => energyShareFigure(results) },
  { section: energyMethod, draw: ({ results }) => stressAlongShaftFigure(results) },
  { section: energyMethod, draw: ({ results }) => stressVsSpeedFigure(results) },
  { section: dynamicModel, draw: ({ results }) => dynamicTorqueFigure(results) },
  { section: dynamicModel, draw: ({ results }) => dynamicSpeedsFigure(results) },
  { section: dynamicDetails, draw: ({ results }) => dynamicModesFigure(results) },
  { section: 'findings', draw: ({ results }) => torqueTwistFigure(results) },
  { section: 'findings', draw: ({ results }) => permanentTwistSpeedFigures(results) },
  { section: 'uncertainty', draw: ({ results }) => yieldRatioHistogramFigure(results) },
  { section: 'uncertainty', draw: ({ results }) => sensitivityFigure(results) },
  { section: 'options', draw: ({ results, resize }) => yieldRatioAgainstDiameterFigure(results, resize) },
  { section: 'options', draw: ({ results, resize }) => peakTorqueAgainstLimiterFigure(results, resize) },
];

/**
 * The tables written to `tables/NAME.csv` (the sections show the same tables rounded); a table
 * that returns undefined has nothing to show for this case and is not written.
 */
export const REPORT_TABLES: readonly ((r: Results) => ReportTable | undefined)[] = [
  partsTable,
  segmentsTable,
  sidesTable,
  piecesTable,
  materialTable,
  dynamicDamageTable,
  plasticSidesTable,
  plasticPiecesTable,
  uncertaintyInputsTable,
  uncertaintyPercentilesTable,
  uncertaintySensitivityTable,
];
