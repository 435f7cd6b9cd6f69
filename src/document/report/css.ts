// The report's style sheet, inline in the HTML (nothing is loaded from elsewhere).
// Print: small type and tight tables so a sketch of up to 8 surfaces fits one
// A4 or Letter page; no page size is forced, the printer's paper is used.
export const REPORT_CSS = `
*{box-sizing:border-box}
html{color:#1b2328;background:#fff}
body{margin:0;font:10pt/1.35 Helvetica,Arial,sans-serif}
.report{max-width:200mm;margin:0 auto;padding:8mm}
h1{font-size:15pt;margin:0 0 2mm}
h2{font-size:11pt;margin:4mm 0 1.5mm;border-bottom:0.5pt solid #9aa3a8}
h3{font-size:9.5pt;margin:2.5mm 0 1mm}
.meta{display:grid;grid-template-columns:auto 1fr;gap:0 4mm;margin:0;font-size:9pt}
.meta dt{color:#55616a}.meta dd{margin:0;overflow-wrap:anywhere}
.hash{font-family:Menlo,Consolas,monospace;font-size:8pt}
.top{display:flex;flex-wrap:wrap;gap:4mm;align-items:flex-start}
.top figure{margin:0;flex:0 1 86mm}
.top figure svg{width:100%;height:auto;max-height:70mm}
.top figcaption{font-size:8pt;color:#55616a}
.top .inputs{flex:1 1 90mm;min-width:0}
.top .inputs h2{margin-top:0}
table.data{border-collapse:collapse;font-size:8.5pt;margin:1mm 0}
table.data caption{text-align:left;font-size:8.5pt;color:#55616a;padding-bottom:0.5mm}
table.data th,table.data td{border:0.5pt solid #c3c9cc;padding:0.4mm 1.4mm;vertical-align:top}
table.data thead th{background:#eef1f2;font-weight:600;text-align:left;max-width:24mm;overflow-wrap:break-word}
table.data tbody th{text-align:left;font-weight:600;max-width:42mm;overflow-wrap:break-word}
table.data td{white-space:nowrap}
table.data td.wrap{white-space:normal;min-width:24mm}
table.data th.nowrap{white-space:nowrap}
table.data td.num{text-align:right;font-variant-numeric:tabular-nums}
.note{font-size:8.5pt;color:#37434b;margin:1mm 0}
.method p{margin:1mm 0;font-size:8.5pt}
.refs{font-size:8pt;color:#37434b;margin:1mm 0}
.caution{margin-top:3mm;border:1pt solid #b5651d;background:#fff6ec;padding:1.5mm 2.5mm;font-size:8.5pt}
.failed{border-left:2pt solid #b5651d;padding-left:2mm}
.warning{font-size:8.5pt;color:#7a2e00;margin:1mm 0}
.pair{display:flex;flex-wrap:wrap;gap:0 5mm;align-items:flex-start}
.pair>section{flex:1 1 80mm;min-width:0}
.pair>section.profiles{flex:0 1 auto}
@page{margin:8mm}
@media print{
  body{font-size:7.5pt;line-height:1.2}
  .meta{grid-template-columns:auto 1fr auto 1fr}
  .meta dd.wide{grid-column:2 / 5}
  .report{max-width:none;padding:0}
  h1{font-size:12pt;margin-bottom:1mm}
  h2{font-size:9pt;margin:2mm 0 0.8mm}
  h3{font-size:8pt;margin:1.2mm 0 0.5mm}
  .meta{font-size:7.5pt}
  .hash{font-size:7pt}
  .top figure{flex-basis:78mm}
  .top figure svg{max-height:50mm}
  table.data{font-size:7pt;line-height:1.1;margin:0.5mm 0}
  table.data th,table.data td{padding:0.1mm 1mm}
  table.data.wide{font-size:6.5pt}
  table.data.wide th,table.data.wide td{padding:0.1mm 0.6mm}
  table.data.wider{font-size:5.5pt}
  table.data.wider th,table.data.wider td{padding:0 0.4mm}
  .note,.warning,.method p,.refs,.caution,table.data caption{font-size:7pt}
  .caution{margin-top:1.5mm;padding:1mm 2mm}
  table.data,figure,.caution{break-inside:avoid}
  h2,h3{break-after:avoid}
}
`;
