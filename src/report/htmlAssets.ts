// The report's inline style sheet and script. Plain text constants: nothing
// here comes from the case, and nothing is fetched.

export const REPORT_STYLE = `
:root { color-scheme: light; --ink: #1f2328; --muted: #5b6670; --rule: #d5d2ca; --paper: #fcfbf8; --vent: #a4301c; }
body { font-family: 'DejaVu Sans', Verdana, sans-serif; color: var(--ink); background: #f3f1ec; margin: 0; padding: 0 24px 40px; font-size: 14px; line-height: 1.45; }
header { padding: 18px 0 6px; }
h1 { font-size: 24px; margin: 0 0 4px; }
h2 { font-size: 18px; margin: 28px 0 8px; border-bottom: 2px solid var(--ink); padding-bottom: 3px; }
h3 { font-size: 15px; margin: 18px 0 6px; }
.subtitle { font-weight: bold; margin: 0; }
.description, .facts, .hint { color: var(--muted); margin: 4px 0; max-width: 70em; }
nav { position: sticky; top: 0; background: #f3f1ec; padding: 6px 0; border-bottom: 1px solid var(--rule); z-index: 1; }
nav a { margin-right: 14px; color: var(--ink); }
.diagram-wrap { overflow-x: auto; background: var(--paper); border: 1px solid var(--rule); }
.diagram-wrap svg { display: block; }
.diagram-wrap.fit svg { width: 100%; height: auto; }
.balance-diagram [data-id] { cursor: pointer; }
table.data { border-collapse: collapse; margin: 4px 0 10px; background: var(--paper); }
table.data th, table.data td { border: 1px solid var(--rule); padding: 3px 8px; text-align: left; vertical-align: top; }
table.data th { background: #e7e4dc; }
table.data td.num { text-align: right; white-space: nowrap; }
table.data tr.vent td { color: var(--vent); font-weight: bold; border-left: 4px double var(--vent); }
table.data tr.picked td { outline: 2px solid var(--ink); background: #fff6d8; }
.charts { display: flex; flex-wrap: wrap; gap: 32px; }
.caution { border: 2px solid var(--ink); padding: 10px 14px; background: var(--paper); max-width: 70em; }
.none { color: var(--muted); }
button { font: inherit; font-size: 12px; }
details { margin: 8px 0; }
summary { cursor: pointer; font-weight: bold; }
/* Print: each balance diagram on its own A3 landscape page (the wall copy),
   with its heading; the tables and charts on A4 portrait pages. */
@page { size: A4 portrait; margin: 12mm; }
@page wall { size: A3 landscape; margin: 8mm; }
@media print {
  body { background: #ffffff; padding: 0; font-size: 9pt; }
  nav, .hint, button { display: none; }
  body > header, section#diagram > h2, section.scenario > h2, section.scenario > p.facts { page: wall; }
  .diagram-wrap { page: wall; overflow: visible; border: none; break-inside: avoid; }
  .diagram-wrap svg { width: 100%; height: auto; max-height: 245mm; }
  h2 { break-after: avoid; margin-top: 14px; }
  table.data { break-inside: auto; font-size: 8pt; }
  tr { break-inside: avoid; }
  details > * { display: block; }
}
`;

export const REPORT_SCRIPT = `
(function () {
  var toggle = document.getElementById('fit-toggle');
  if (toggle) {
    toggle.addEventListener('click', function () {
      var wraps = document.querySelectorAll('.diagram-wrap');
      var fit = !(wraps.length > 0 && wraps[0].classList.contains('fit'));
      wraps.forEach(function (wrap) { wrap.classList.toggle('fit', fit); });
      toggle.textContent = fit ? 'Actual size' : 'Fit to width';
    });
  }
  document.querySelectorAll('.balance-diagram [data-id]').forEach(function (element) {
    element.addEventListener('click', function () {
      var id = element.getAttribute('data-id');
      var rows = document.querySelectorAll('tr[data-id]');
      var found = null;
      rows.forEach(function (row) {
        row.classList.remove('picked');
        if (!found && row.getAttribute('data-id') === id) found = row;
      });
      if (found) {
        found.classList.add('picked');
        found.scrollIntoView({ block: 'center' });
      }
    });
  });
})();
`;
