// The pages' one stylesheet, served from /lab/assets/lab.css so the policy can forbid inline
// styles. Targets are at least 44 px for gloved fingers at the bench.
export const LAB_STYLESHEET = `
:root { --paper: #f6f4ee; --ink: #1f2a37; --muted: #5b6472; --rule: #d9d4c7; --accent: #2b5d7c; --card: #fffdf8;
  --ok: #2e6b3f; --ok-bg: #e3f0e4; --bad: #8a2a1f; --bad-bg: #f6e0dc; --mid: #6f5200; --mid-bg: #f7ecc9; --none-bg: #e8e8e6; }
* { box-sizing: border-box; }
body { margin: 0; background: var(--paper); color: var(--ink); font: 16px/1.5 system-ui, sans-serif; }
a { color: var(--accent); }
a:focus-visible, button:focus-visible, input:focus-visible, select:focus-visible, textarea:focus-visible { outline: 3px solid #d08a1c; outline-offset: 2px; }
.skip { position: absolute; left: -9999px; } .skip:focus { left: 8px; top: 8px; background: var(--card); padding: 8px; z-index: 2; }
.masthead { display: flex; flex-wrap: wrap; align-items: center; justify-content: space-between; gap: 8px 24px; padding: 10px 20px; background: var(--ink); color: #f3efe4; }
.masthead a { color: #f3efe4; text-decoration: none; } .brand { font-weight: 700; letter-spacing: .04em; font-size: 1.1rem; }
nav { display: flex; gap: 4px 18px; align-items: center; flex-wrap: wrap; }
nav a, .link-button { display: inline-block; padding: 10px 4px; min-height: 44px; }
.link-button { background: none; border: 0; color: #f3efe4; font: inherit; cursor: pointer; text-decoration: underline; }
form.inline { display: inline; margin: 0; }
main { max-width: 1180px; margin: 0 auto; padding: 16px 20px 48px; }
h1 { font-size: 1.6rem; margin: 8px 0 4px; } h2 { font-size: 1.2rem; margin: 28px 0 8px; border-bottom: 2px solid var(--rule); padding-bottom: 4px; }
h3 { font-size: 1.05rem; margin: 18px 0 6px; }
.lede { color: var(--muted); margin-top: 0; }
.grid { display: grid; gap: 16px; grid-template-columns: repeat(auto-fit, minmax(300px, 1fr)); }
.card { background: var(--card); border: 1px solid var(--rule); border-radius: 6px; padding: 12px 16px; }
.card h2, .card h3 { margin-top: 4px; }
table { border-collapse: collapse; width: 100%; background: var(--card); }
th, td { text-align: left; padding: 6px 8px; border-bottom: 1px solid var(--rule); vertical-align: top; }
th { font-size: .85rem; font-weight: 600; color: var(--muted); }
td.num, th.num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
.table-wrap { overflow-x: auto; }
.badge { display: inline-block; padding: 2px 10px; border-radius: 999px; font-size: .85rem; font-weight: 600; white-space: nowrap; border: 1px solid transparent; }
.badge-conforming { color: var(--ok); background: var(--ok-bg); border-color: var(--ok); }
.badge-needs-annealing { color: var(--bad); background: var(--bad-bg); border-color: var(--bad); }
.badge-undecided { color: var(--mid); background: var(--mid-bg); border-color: var(--mid); }
.badge-no-readings { color: var(--muted); background: var(--none-bg); border-color: var(--muted); }
.note { color: var(--muted); font-size: .9rem; } .notes li { color: var(--muted); font-size: .9rem; }
.flash { background: var(--ok-bg); border-left: 4px solid var(--ok); padding: 8px 12px; }
.problem { background: var(--bad-bg); border-left: 4px solid var(--bad); padding: 8px 12px; }
.caution { background: var(--mid-bg); border-left: 4px solid var(--mid); padding: 8px 12px; }
dl.facts { display: grid; grid-template-columns: max-content 1fr; gap: 2px 14px; margin: 0; } dl.facts dt { color: var(--muted); } dl.facts dd { margin: 0; }
ol.timeline { list-style: none; padding: 0; margin: 0; border-left: 3px solid var(--rule); }
ol.timeline li { position: relative; padding: 4px 0 10px 16px; } ol.timeline li::before { content: ''; position: absolute; left: -8px; top: 10px; width: 13px; height: 13px; border-radius: 50%; background: var(--accent); border: 2px solid var(--paper); }
.pager { display: flex; gap: 16px; margin: 8px 0; }
.button, button.primary, button.secondary { display: inline-block; min-height: 48px; min-width: 48px; padding: 10px 20px; border-radius: 6px; font: inherit; font-weight: 600; cursor: pointer; text-decoration: none; }
button.primary, .button { background: var(--accent); color: #fff; border: 2px solid var(--accent); }
button.secondary { background: var(--card); color: var(--accent); border: 2px solid var(--accent); }
form.entry fieldset { border: 1px solid var(--rule); border-radius: 6px; margin: 0 0 14px; padding: 10px 14px; background: var(--card); }
form.entry legend { font-weight: 700; padding: 0 6px; }
.field { display: flex; flex-direction: column; gap: 4px; margin: 6px 0; } .field span.hint { color: var(--muted); font-size: .85rem; }
.fields { display: grid; gap: 8px 16px; grid-template-columns: repeat(auto-fit, minmax(200px, 1fr)); }
input[type=text], input[type=number], input[type=datetime-local], input[type=password], select, textarea { font: inherit; min-height: 44px; padding: 6px 10px; border: 1px solid #9aa1ab; border-radius: 4px; background: #fff; width: 100%; }
.choices { display: flex; flex-wrap: wrap; gap: 8px; }
.choices label { display: inline-flex; align-items: center; gap: 8px; min-height: 44px; padding: 6px 14px; border: 1px solid var(--rule); border-radius: 6px; background: #fff; cursor: pointer; }
.choices label:has(input:checked) { border-color: var(--accent); box-shadow: inset 0 0 0 2px var(--accent); }
.chip { display: inline-flex; align-items: center; min-height: 44px; padding: 6px 14px; border: 1px solid var(--rule); border-radius: 6px; background: #fff; text-decoration: none; }
.chip-on { border-color: var(--accent); box-shadow: inset 0 0 0 2px var(--accent); font-weight: 600; }
.method-inputs { display: none; }
form.entry:not(:has(.method-choice input:checked)) .method-inputs { display: block; }
form.entry:has(#method-tardy:checked) .inputs-tardy, form.entry:has(#method-senarmont:checked) .inputs-senarmont,
form.entry:has(#method-whole_order:checked) .inputs-whole_order, form.entry:has(#method-compensator:checked) .inputs-compensator,
form.entry:has(#method-direct:checked) .inputs-direct, form.entry:has(#method-white_light_colour:checked) .inputs-white_light_colour { display: block; }
.swatches { display: grid; grid-template-columns: repeat(auto-fill, minmax(52px, 1fr)); gap: 6px; }
.swatch { position: relative; display: flex; flex-direction: column; align-items: center; cursor: pointer; font-size: .72rem; color: var(--muted); }
.swatch input { position: absolute; opacity: 0; width: 1px; height: 1px; }
.swatch svg { width: 100%; height: 44px; border-radius: 4px; border: 2px solid transparent; }
.swatch:has(input:checked) svg { border-color: var(--ink); box-shadow: 0 0 0 2px #d08a1c; }
.swatch:has(input:focus-visible) svg { outline: 3px solid #d08a1c; outline-offset: 1px; }
.preview { border: 2px solid var(--accent); border-radius: 6px; padding: 10px 16px; background: var(--card); margin-bottom: 14px; }
.preview .big { font-size: 1.5rem; font-weight: 700; }
.actions { display: flex; gap: 12px; flex-wrap: wrap; margin-top: 8px; }
svg.plot { width: 100%; height: auto; background: var(--card); border: 1px solid var(--rule); border-radius: 6px; }
svg.plot text { font: 12px system-ui, sans-serif; fill: var(--ink); } svg.plot .axis line, svg.plot .axis path { stroke: #8a8f98; }
svg.plot .gridline { stroke: #e7e3d8; } svg.plot .limit { stroke: var(--bad); stroke-dasharray: 6 4; } svg.plot .centre { stroke: var(--accent); }
svg.plot .series { fill: none; stroke: var(--accent); stroke-width: 1.5; } svg.plot .point { fill: var(--accent); } svg.plot .flagged { fill: var(--bad); }
svg.plot .band { fill: #2b5d7c22; } svg.plot .planned { fill: none; stroke: var(--ink); stroke-width: 2; stroke-dasharray: 8 4; } svg.plot .measured { fill: none; stroke: #b5542a; stroke-width: 1.6; }
svg.plot .box { fill: #dfe9f0; stroke: var(--accent); } svg.plot .whisker { stroke: var(--accent); } svg.plot .median { stroke: var(--ink); stroke-width: 2.5; }
svg.sketch { width: 100%; max-width: 560px; height: auto; } svg.sketch .body { fill: #dde8ec; stroke: var(--ink); stroke-width: 1.5; }
svg.sketch .site { stroke: var(--ink); stroke-width: 1.5; } svg.sketch text { font: 13px system-ui, sans-serif; fill: var(--ink); }
svg.sketch .site-conforming { fill: #6fb07f; } svg.sketch .site-needs_annealing { fill: #d9644f; } svg.sketch .site-undecided { fill: #e3b93c; } svg.sketch .site-no_readings { fill: #fff; }
@media (max-width: 640px) { main { padding: 12px; } h1 { font-size: 1.3rem; } }
@media print {
  body { background: #fff; font-size: 11pt; } .masthead nav, .no-print, .skip { display: none; }
  .masthead { background: #fff; color: #000; border-bottom: 2px solid #000; } .masthead a { color: #000; }
  .card, table { background: #fff; } .caution { border: 2px solid #000; background: #fff; }
  a { color: #000; text-decoration: none; } h2 { break-after: avoid; } table, svg { break-inside: avoid; }
}
`;
