/**
 * An incident's date as milliseconds since 1970, for ordering and intervals: a date or date-time
 * without a zone is read as UTC, so the interval between two incidents does not depend on the
 * machine's time zone. Null for no date. The case reader has checked the form (`isIsoDate`).
 */
export function occurredTime(occurred: string | null): number | null {
  if (occurred === null) return null;
  const text = occurred.replace(' ', 'T');
  const zoned = /(Z|[+-]\d{2}:?\d{2})$/.test(text) && text.includes('T');
  const t = Date.parse(zoned ? text : text.includes('T') ? `${text}Z` : `${text}T00:00Z`);
  return Number.isFinite(t) ? t : null;
}

export const DAY_MS = 86_400_000;
