// The name under which report.html carries its page footer's text (the case id and the date) to the
// PDF printer (src/io/chromium.ts), kept apart so the printer loads nothing of the report's.

/** The `<meta name=…>` of the page footer's text in report.html. */
export const PAGE_FOOTER_META = 'shaftcase-page-footer';
