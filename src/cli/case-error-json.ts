import type { CaseError } from '../case/case-error.ts';
import { SCHEMA_VERSION } from '../views/schema-version.ts';

/**
 * A case file's mistakes as one JSON object, for `--json`: each with its stable code, the message,
 * the file, line and column (null where the mistake has no place, such as a missing file) and the
 * field path.
 */
export function caseErrorToJson(e: CaseError): Record<string, unknown> {
  const errors = e.problems.map((p) => ({
    code: p.code,
    message: p.message,
    file: e.file,
    line: p.position?.line ?? null,
    column: p.position?.column ?? null,
    field: p.path === '' ? null : p.path,
  }));
  return { schema_version: SCHEMA_VERSION, error: errors[0], errors };
}
