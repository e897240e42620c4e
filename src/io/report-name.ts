/** Longest case id kept in a report's file name, characters: long enough for a ticket number and a machine tag. */
export const MAX_ID_IN_NAME = 60;

/**
 * A case id made safe for a file name on every system a report travels to (Linux, Windows, macOS,
 * a zip opened anywhere): ASCII letters, digits, `.`, `_` and `-` are kept; every run of anything
 * else (spaces, slashes, colons, accents, other scripts) becomes one `-`; leading and trailing `-`
 * and `.` are dropped, so the name is neither hidden nor `..`; it is cut to `MAX_ID_IN_NAME`
 * characters; an id with nothing left is `case`. `WO 20931/B` → `WO-20931-B`.
 */
export function fileSafeId(id: string): string {
  const safe = id
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '') // accents off their letters: "Müller" → "Muller"
    .replace(/[^A-Za-z0-9._-]+/g, '-')
    .slice(0, MAX_ID_IN_NAME)
    .replace(/^[-.]+|[-.]+$/g, '');
  return safe === '' ? 'case' : safe;
}

/** The base name of a report folder and its zip: `<case-id>-YYYY-MM-DD` (the writer adds `-N` where taken). */
export function reportBaseName(caseId: string, date: string): string {
  return `${fileSafeId(caseId)}-${date}`;
}
