import { existsSync, mkdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, sep } from 'node:path';
import { CaseError } from '../case/case-error.ts';
import { packageFile } from './package-files.ts';
import { writeNewFile } from './write-new-file.ts';

export interface CreatedCaseFolder {
  caseFile: string;
  /** Every file or folder this call created. */
  created: string[];
  /** Files that were there already and were left as they were. */
  kept: string[];
}

/**
 * Makes a case folder from the templates: `case.yaml` (metric or US), `photos/` and `README.md`.
 * Refuses, with nothing written, when the folder already holds a case; never overwrites a file.
 */
export function createCaseFolder(folder: string, units: 'metric' | 'us'): CreatedCaseFolder {
  const caseFile = join(folder, 'case.yaml');
  if (existsSync(folder) && !statSync(folder).isDirectory()) {
    throw new CaseError(folder, [{ code: 'E_FILE', path: '', message: 'is a file, not a folder; give the name of a new folder for the case, such as "cases/INC-2026-014"' }]);
  }
  if (existsSync(caseFile)) {
    throw new CaseError(caseFile, [{ code: 'E_FILE', path: '', message: 'a case is already here, and shaftcase new never overwrites one; give a new folder name, or edit this case.yaml' }]);
  }
  const created: string[] = [];
  const kept: string[] = [];
  for (const dir of [folder, join(folder, 'photos')]) {
    if (!existsSync(dir)) {
      mkdirSync(dir, { recursive: true });
      created.push(dir);
    }
  }
  const files: [string, string][] = [
    [caseFile, `templates/case-${units}.yaml`],
    [join(folder, 'README.md'), 'templates/case-folder-README.md'],
  ];
  for (const [target, template] of files) {
    try {
      const text = readFileSync(packageFile(template), 'utf8');
      writeNewFile(target, target === caseFile ? schemaComment(caseFile) + text : text);
      created.push(target);
    } catch (e) {
      if ((e as NodeJS.ErrnoException).code !== 'EEXIST') throw e;
      if (target === caseFile) throw new CaseError(caseFile, [{ code: 'E_FILE', path: '', message: 'a case appeared here while it was being created; nothing was overwritten' }]);
      kept.push(target);
    }
  }
  return { caseFile, created, kept };
}

/**
 * The first line of a new case file: the editor's YAML language server checks and completes the
 * case as it is typed against the installed schema, found by a path relative to the case (so it
 * works offline and moves with a project that keeps the tool in its node_modules).
 */
export function schemaComment(caseFile: string): string {
  const rel = relative(dirname(caseFile), packageFile('schemas/case.schema.json')).split(sep).join('/');
  return `# yaml-language-server: $schema=${rel}\n`;
}
