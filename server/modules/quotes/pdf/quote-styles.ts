/** Print styles of the quote document; colours are the product's petrol and amber. */
export const QUOTE_CSS = `
*{box-sizing:border-box}
body{font-family:'Lato','Liberation Sans',sans-serif;font-size:10pt;color:#1b1f1a;margin:0}
h1{font-size:18pt;color:#0f4c5c;margin:0 0 2mm}
h2{font-size:11.5pt;color:#0f4c5c;margin:6mm 0 2mm;border-bottom:1px solid #0f4c5c;padding-bottom:1mm}
.head{display:flex;justify-content:space-between;align-items:flex-start;border-bottom:3px solid #0f4c5c;padding-bottom:3mm}
.supplier{font-weight:700;font-size:12pt}
.muted{color:#555}
.cols{display:flex;gap:8mm}.cols>div{flex:1}
table{width:100%;border-collapse:collapse}
th,td{padding:1.4mm 2mm;text-align:left;vertical-align:top}
thead th{background:#0f4c5c;color:#fff;font-weight:700}
tbody tr:nth-child(even){background:#f1f4f3}
.num{text-align:right;white-space:nowrap}
.kv td:first-child{color:#555;width:45%}
.totals{width:55%;margin-left:auto;margin-top:2mm}
.totals td{padding:1mm 2mm}
.totals .grand td{font-weight:700;font-size:12pt;border-top:2px solid #0f4c5c}
.caution{border-left:5px solid #b86e00;background:#fff6e6;padding:3mm 4mm;margin-top:5mm;page-break-inside:avoid}
.terms{white-space:pre-wrap}
.chart{margin-top:2mm;page-break-inside:avoid}
`
