/**
 * The report's one stylesheet, inline in report.html: readable on screen, and on paper A4 or Letter
 * (no page size is forced, so the printer's paper is used): each section starts a new page, and no
 * figure, photo, table row or quoted verdict is cut in two.
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
@page { margin: 16mm 14mm; }
@media print {
  html, body { background: white; }
  body { font-size: 10.5pt; }
  main { max-width: none; margin: 0; padding: 0; box-shadow: none; }
  h2 { break-before: page; }
  main > h2:first-of-type { break-before: auto; }
  h2, h3 { break-after: avoid; }
  .figure, img.photo, blockquote, tr, li { break-inside: avoid; }
  p:has(> .figure), p:has(> img.photo) { break-inside: avoid; }
  img.photo { max-height: 120mm; }
  a { color: inherit; text-decoration: none; }
}
`;
