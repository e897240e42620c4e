/**
 * The report's one stylesheet, inline in report.html: readable on screen, and on paper A4 or Letter
 * (no page size is forced, so the printer's paper is used). On paper the first page (the title and
 * the incident finding, set a little smaller) is a page of its own, the sections of the body follow
 * one another without a page break each (no near-empty pages), the appendices start on a fresh
 * page, no figure, photo, table row, checklist item or quoted finding is cut in two, and the case
 * file's own text is left to the zip and the screen.
 */
export const REPORT_CSS = `
:root { color-scheme: light; --ink: #1b1f24; --muted: #5b6470; --rule: #d0d5db; --accent: #1f4e8c; }
* { box-sizing: border-box; }
html { background: #f4f5f7; }
body { margin: 0; color: var(--ink); font: 15px/1.5 system-ui, -apple-system, "Segoe UI", Roboto, "Noto Sans", "DejaVu Sans", sans-serif; }
main { max-width: 52rem; margin: 2rem auto; padding: 2.5rem 3rem; background: white; box-shadow: 0 1px 4px rgba(0,0,0,.12); }
h1 { font-size: 1.7rem; line-height: 1.25; margin: 0 0 .5rem; }
h2 { font-size: 1.3rem; margin: 2.2rem 0 .8rem; padding-bottom: .25rem; border-bottom: 2px solid var(--accent); color: var(--accent); }
h3 { font-size: 1.05rem; margin: 1.4rem 0 .5rem; }
p, ul, ol { margin: .6rem 0; }
li { margin: .2rem 0; }
blockquote { margin: 1rem 0; padding: .7rem 1rem; border-left: 5px solid #b22222; background: #fbf1f0; }
blockquote p { margin: .3rem 0; }
table { border-collapse: collapse; margin: .8rem 0; font-size: .82rem; width: 100%; font-variant-numeric: tabular-nums; }
th, td { border: 1px solid var(--rule); padding: .25rem .45rem; vertical-align: top; }
th { background: #eef1f4; text-align: left; }
tr:nth-child(even) td { background: #fafbfc; }
code { font-family: ui-monospace, "DejaVu Sans Mono", monospace; font-size: .85em; overflow-wrap: anywhere; }
pre { background: #f6f8fa; border: 1px solid var(--rule); padding: .7rem; font-size: .75rem; line-height: 1.35; white-space: pre-wrap; overflow-wrap: anywhere; }
.figure { display: block; margin: 1.2rem 0; }
.figure svg { display: block; width: 100%; max-width: 720px; height: auto; }
img.photo { display: block; max-width: 100%; max-height: 60vh; margin: .8rem 0 .2rem; border: 1px solid var(--rule); }
.not-embedded { color: var(--muted); font-style: italic; }
a { color: var(--accent); }
.first-page table { width: auto; min-width: 60%; }
.first-page td { min-width: 7em; }
.first-page td:nth-child(3) { min-width: 12em; }
@page { margin: 14mm 14mm 16mm; }
@media print {
  html, body { background: white; }
  body { font-size: 10pt; line-height: 1.4; }
  main { max-width: none; margin: 0; padding: 0; box-shadow: none; }
  h1 { font-size: 15pt; }
  h2 { font-size: 12.5pt; margin: 1.2rem 0 .5rem; }
  h3 { font-size: 10.5pt; margin: .9rem 0 .35rem; }
  .first-page { break-after: page; font-size: 8.6pt; line-height: 1.28; }
  .first-page h1 { font-size: 13pt; }
  .first-page h2 { font-size: 11.5pt; }
  .first-page h3 { font-size: 9.5pt; }
  .first-page h2 { margin-top: .6rem; }
  .first-page h3 { margin: .5rem 0 .2rem; }
  .first-page p, .first-page ul { margin: .3rem 0; }
  .first-page li { margin: .05rem 0; }
  .first-page blockquote { margin: .4rem 0; padding: .35rem .7rem; }
  .first-page table { margin: .4rem 0 0; font-size: 8.6pt; }
  .first-page td, .first-page th { padding: .3rem .45rem; }
  .first-appendix { break-before: page; }
  .appendix { font-size: 8.4pt; line-height: 1.28; }
  .appendix li { margin: .1rem 0; }
  .appendix .figure svg { max-width: 135mm; }
  .appendix pre { font-size: 6.8pt; line-height: 1.25; }
  h2, h3 { break-after: avoid; }
  p:has(+ p > .figure) { break-after: avoid; }
  table { font-size: 8.5pt; }
  .figure, img.photo, blockquote, tr, li { break-inside: avoid; }
  p:has(> .figure), p:has(> img.photo) { break-inside: avoid; }
  .figure svg { max-width: 165mm; margin: 0 auto; }
  pre { font-size: 7.5pt; }
  img.photo { max-height: 120mm; }
  a { color: inherit; text-decoration: none; }
  /* The case file's text (a page or more) is left off paper: the zip beside the report holds the
     file, the traceability table its SHA-256, report.html its text. */
  section:has(> h2#appendix-inputs-as-given) p:has(+ pre), section:has(> h2#appendix-inputs-as-given) pre { display: none; }
  section:has(> h2#appendix-inputs-as-given)::after { display: block; margin-top: .4rem; font-style: italic; content: "On paper the case file's text is left out: the zip beside this report holds the file (its SHA-256 above), and report.html shows it."; }
}
`;
