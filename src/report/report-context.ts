import type { ResizeResult } from '../resize/resize-result.ts';
import type { Investigation } from '../finding/investigation.ts';
import type { RunInfo } from './run-info.ts';

/**
 * What the report shows, each part computed once before anything is rendered
 * (`buildReportData`): the investigation's results (with how sure the finding is, where the case
 * states tolerances) and what goes back in. Sections, figures and tables read these and compute
 * nothing of their own.
 */
export interface ReportData {
  results: Investigation;
  resize: ResizeResult;
}

/** The case file a report was made from, for traceability. */
export interface CaseSource {
  /** The case file's name (no folder), as the bundle stores it. */
  file: string;
  /** Its text as given. */
  text: string;
  /** SHA-256 of the text, hex. */
  sha256: string;
}

/** What every report section reads. Sections show these values; they compute nothing of their own. */
export interface ReportContext extends ReportData {
  run: RunInfo;
  source: CaseSource;
}

/**
 * A section of the report: `render` returns its Markdown body (the heading is added from `title`),
 * or undefined when the section has nothing to say for this case and is left out.
 */
export interface ReportSection {
  /** Stable id: the template places a section with `{{section:ID}}`. */
  id: string;
  title: string;
  render: (ctx: ReportContext) => string | undefined;
}
