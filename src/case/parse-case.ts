import { isMap, isScalar, LineCounter, parseDocument, visit, type Document } from 'yaml';
import type { Material } from '../materials/material.ts';
import { CaseError, type CaseProblem } from './case-error.ts';
import { CaseReader, type ReadObserver } from './case-reader.ts';
import { CASE_SHAPE, keysOf, META_SHAPE } from './case-shape.ts';
import { controlCharacters } from './control-characters.ts';
import { SIZE_LIMITS } from './limits.ts';
import type { Case, CaseMeta } from './case.ts';
import { readAnalysis } from './read-analysis.ts';
import { checkDriveCurves } from './read-drive.ts';
import { checkFitSeat } from './read-fit.ts';
import { seatSegment } from '../model/hub-seat.ts';
import { readCaseMaterials } from './read-materials.ts';
import { checkCouplingSegments, checkProtectedSegments, readShaft } from './read-shaft.ts';
import { overrideWarnings, type SiteCatalogue } from './site-materials.ts';
import { findMaterial } from '../materials/library.ts';
import { readObserved } from './read-observed.ts';
import { readStations } from './read-stations.ts';
import { readStop } from './read-stop.ts';

/** The top-level keys of a case file. */
export const CASE_KEYS = keysOf(CASE_SHAPE);
const META_KEYS = keysOf(META_SHAPE);

/**
 * Parses and checks a case file's text. Returns the checked case (SI, names resolved) or throws a
 * `CaseError` listing every problem with its line, column and field path. No I/O: `file` is only
 * the name used in messages. `site` is the site's materials catalogue: the case's own materials
 * take precedence over it, and it over the built-in library, with a warning where one overrides
 * another.
 */
export function parseCase(text: string, file = 'case.yaml', site?: SiteCatalogue, observe?: ReadObserver): Case {
  const tooBig = sizeProblem(text);
  if (tooBig) throw new CaseError(file, [tooBig]);
  const controls = controlCharacters(text, 'E_TYPE', 'a case file');
  if (controls.length > 0) throw new CaseError(file, controls);
  const lines = new LineCounter();
  // The yaml library's own check of unique keys is quadratic in the keys of a mapping; checkKeys
  // below does it in linear time, after the mapping's size is bounded.
  const doc = parseDocument(text, { lineCounter: lines, prettyErrors: false, uniqueKeys: false });
  const keyProblems = doc.errors.length === 0 ? checkKeys(doc, lines) : [];
  if (keyProblems.length > 0) throw new CaseError(file, keyProblems);
  if (doc.errors.length > 0) {
    const problems: CaseProblem[] = doc.errors.map((e) => {
      const pos = lines.linePos(e.pos[0]);
      return {
        code: 'E_YAML',
        path: '',
        message: `not valid YAML: ${e.message.split('\n')[0]} (check the indentation and that each "key: value" has its colon and a space)`,
        position: { line: pos.line, column: pos.col },
      };
    });
    throw new CaseError(file, problems);
  }
  const r = new CaseReader(doc, lines, observe);
  if (!r.map([], CASE_KEYS, { required: true, example: 'a case file with case, speed, stop, shaft and stations' })) {
    throw new CaseError(file, r.problems);
  }

  const meta = readMeta(r);
  const units = (r.string(['units'], { allowed: ['metric', 'us'] }) ?? 'metric') as Case['units'];
  const speed = r.quantity(['speed'], 'angular_speed', { required: true, positive: true });
  const stop = readStop(r);
  const stopAt = stop.at;

  const ownMaterials = readCaseMaterials(r);
  const caseMaterials: Record<string, Material> = Object.assign(Object.create(null), site?.materials ?? {}, ownMaterials);
  const used: Record<string, Material> = Object.create(null); // keyed by the user's names: no prototype
  const shaft = readShaft(r, caseMaterials, used);
  const stations = readStations(r, shaft.length, caseMaterials, used);
  const observed = readObserved(r, stations);
  const analysis = readAnalysis(r, stations, stopAt);

  if (stopAt !== undefined && stations.length > 0 && !stations.some((s) => s.name === stopAt)) {
    r.fail('E_REFERENCE', ['stop', 'at'], `no station is named "${stopAt}"; give one of ${stations.map((s) => `"${s.name}"`).join(', ')}`);
  }
  if (r.problems.length === 0 && stopAt !== undefined) {
    // Parts at the stop's own position release nothing into the shaft (see buildShaftModel).
    const stopPosition = stations.find((s) => s.name === stopAt)?.at;
    const loaded = stations.filter((s) => s.name !== stopAt && s.parts.length > 0 && (stopPosition === undefined || Math.abs(s.at - stopPosition) > 1e-9));
    if (loaded.length === 0) {
      r.fail('E_MODEL', ['stations'], 'no station away from the one that stopped carries parts, so nothing drives the shaft; add the rotating parts (rotor, pulley, flywheel) to their stations');
    }
  }
  if (r.problems.length === 0) {
    checkDriveCurves(r, stations, speed!.value);
    checkProtectedSegments(r, shaft.segments, stations);
    checkCouplingSegments(r, shaft.segments, stations);
    const stopPosition = stations.find((s) => s.name === stopAt)!.at;
    stations.forEach((s, i) => {
      if (!s.fit) return;
      const seat = seatSegment(shaft.segments, s.at, stopPosition);
      checkFitSeat(r, ['stations', i, 'fit'], s.fit, seat.diameter, used[seat.material]);
    });
  }
  if (r.problems.length > 0) throw new CaseError(file, r.problems);

  return {
    meta,
    units,
    speed: speed!.value,
    stop: { ...stop, at: stopAt!, duration: stop.duration ?? 0 },
    materials: { ...used },
    shaft: { segments: shaft.segments },
    stations,
    analysis,
    observed,
    tolerances: { ...r.tolerances },
    ...(site ? { materialCatalogue: { file: site.file, sha256: site.sha256 } } : {}),
    materialWarnings: overrideWarnings(Object.keys(used), new Set(Object.keys(ownMaterials)), site, (k) => findMaterial(k) !== undefined),
  };
}

function readMeta(r: CaseReader): CaseMeta {
  r.map(['case'], META_KEYS, { required: true, example: 'a mapping with at least id: "INC-0042"' });
  const meta: CaseMeta = { id: r.string(['case', 'id'], { required: true, example: 'an incident id such as "INC-2026-014"' }) ?? '' };
  if (r.has(['case', 'id']) && meta.id.trim() === '') r.fail('E_MISSING', ['case', 'id'], 'is empty; give an incident id such as "INC-2026-014"');
  for (const key of META_KEYS.slice(1) as (keyof CaseMeta)[]) {
    const v = r.string(['case', key]);
    if (v !== undefined) meta[key] = v;
  }
  if (meta.occurred !== undefined && !isIsoDate(meta.occurred)) {
    r.fail('E_TYPE', ['case', 'occurred'], `"${meta.occurred}" is not an ISO date; give a date such as "2026-03-14" or "2026-03-14T06:40"`);
  }
  if (meta.asset !== undefined && meta.asset.trim() === '')
    r.fail('E_MISSING', ['case', 'asset'], 'is empty; give the machine\'s asset tag, the same in every case of that machine, such as "GR-4 rotor shaft"');
  return meta;
}

/**
 * An ISO 8601 date or local date-time that exists: `2026-03-14`, `2026-03-14T06:40`,
 * `2026-03-14 06:40:12.5+01:00`. Not `2026-13-45` nor `2026-02-30T25:00`.
 */
export function isIsoDate(text: string): boolean {
  const m = /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2})(?:\.\d+)?)?(?:Z|[+-](\d{2}):?(\d{2}))?)?$/.exec(text);
  if (!m) return false;
  const [year, month, day] = [Number(m[1]), Number(m[2]), Number(m[3])];
  const daysInMonth = new Date(Date.UTC(year, month, 0)).getUTCDate();
  if (month < 1 || month > 12 || day < 1 || day > daysInMonth) return false;
  if (m[4] !== undefined && (Number(m[4]) > 23 || Number(m[5]) > 59 || Number(m[6] ?? 0) > 59)) return false;
  if (m[7] !== undefined && (Number(m[7]) > 14 || Number(m[8]) > 59)) return false;
  return true;
}

/** The file's size, and a rough bound on its keys (colons), checked before it is parsed. */
function sizeProblem(text: string): CaseProblem | undefined {
  const bytes = Buffer.byteLength(text, 'utf8');
  if (bytes > SIZE_LIMITS.fileBytes) {
    return {
      code: 'E_RANGE',
      path: '',
      message: `the case file is ${(bytes / 1e6).toPrecision(3)} MB, more than the ${SIZE_LIMITS.fileBytes / 1e6} MB a case file may be; a case needs a few kilobytes: leave data tables and logs out of it`,
    };
  }
  let colons = 0;
  for (let i = text.indexOf(':'); i >= 0; i = text.indexOf(':', i + 1)) colons++;
  if (colons > SIZE_LIMITS.keysPerFile) {
    return { code: 'E_RANGE', path: '', message: `the case file holds ${colons} colons, more than the ${SIZE_LIMITS.keysPerFile} keys a case file may have; a case needs a few hundred` };
  }
  return undefined;
}

/** Every mapping: at most `SIZE_LIMITS.keysPerMapping` keys, each once. Linear in the keys. */
function checkKeys(doc: Document, lines: LineCounter): CaseProblem[] {
  const problems: CaseProblem[] = [];
  const at = (offset: number | undefined) => {
    const pos = lines.linePos(offset ?? 0);
    return { line: pos.line, column: pos.col };
  };
  visit(doc, {
    Map(_, map) {
      if (map.items.length > SIZE_LIMITS.keysPerMapping) {
        problems.push({
          code: 'E_RANGE',
          path: '',
          message: `a mapping with ${map.items.length} keys, more than the ${SIZE_LIMITS.keysPerMapping} one mapping may have`,
          position: at(map.range?.[0]),
        });
        return visit.BREAK;
      }
      const seen = new Set<string>();
      for (const pair of map.items) {
        const key = isScalar(pair.key) ? String(pair.key.value) : String(pair.key);
        if (seen.has(key)) {
          const range = isScalar(pair.key) || isMap(pair.key) ? pair.key.range : undefined;
          problems.push({ code: 'E_YAML', path: '', message: `not valid YAML: the key "${key}" is given twice in one mapping; give each key once`, position: at(range?.[0]) });
        }
        seen.add(key);
      }
      return undefined;
    },
  });
  return problems;
}
