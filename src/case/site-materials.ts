import { LineCounter, parseDocument } from 'yaml';
import type { Material } from '../materials/material.ts';
import { CaseError } from './case-error.ts';
import { CaseReader } from './case-reader.ts';
import { controlCharacters } from './control-characters.ts';
import { readCaseMaterials } from './read-materials.ts';

/** A site's materials catalogue: the materials a plant's cases share (its mill certificates). */
export interface SiteCatalogue {
  /** The file's name as it is shown and bundled. */
  file: string;
  sha256: string;
  materials: Record<string, Material>;
}

/**
 * Parses a site catalogue's text (`materials:`, the fields of a case's `materials:`). Throws a
 * `CaseError` naming the catalogue file, with line and column, for its mistakes. No I/O.
 */
export function parseSiteCatalogue(text: string, file: string, sha256: string): SiteCatalogue {
  const controls = controlCharacters(text, 'E_TYPE', 'a materials catalogue');
  if (controls.length > 0) throw new CaseError(file, controls);
  const lines = new LineCounter();
  const doc = parseDocument(text, { lineCounter: lines, prettyErrors: false });
  if (doc.errors.length > 0) {
    const pos = lines.linePos(doc.errors[0].pos[0]);
    throw new CaseError(file, [{ code: 'E_YAML', path: '', message: `not valid YAML: ${doc.errors[0].message.split('\n')[0]}`, position: { line: pos.line, column: pos.col } }]);
  }
  const r = new CaseReader(doc, lines);
  r.map([], ['materials'], { required: true, example: 'a file with materials: and under it your materials by key, as in a case file' });
  const materials = r.problems.length === 0 ? readCaseMaterials(r, `given in the site catalogue ${file}`) : {};
  if (r.problems.length > 0) throw new CaseError(file, r.problems);
  return { file, sha256, materials };
}

/**
 * The warnings of one definition overriding another for the materials a case uses: the case's own
 * over the site's or the built-in, the site's over the built-in.
 */
export function overrideWarnings(used: readonly string[], caseKeys: ReadonlySet<string>, site: SiteCatalogue | undefined, builtIn: (key: string) => boolean): string[] {
  const out: string[] = [];
  for (const key of used) {
    const inSite = site !== undefined && Object.hasOwn(site.materials, key);
    if (caseKeys.has(key) && inSite) out.push(`The case's material "${key}" overrides the one of that name in the site catalogue ${site!.file}.`);
    else if (caseKeys.has(key) && builtIn(key)) out.push(`The case's material "${key}" overrides the built-in material of that name.`);
    else if (!caseKeys.has(key) && inSite && builtIn(key)) out.push(`The site catalogue's material "${key}" (${site!.file}) overrides the built-in material of that name.`);
  }
  return out;
}
